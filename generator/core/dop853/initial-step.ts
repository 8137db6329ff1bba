// Starting step size guess of Hairer, Nørsett & Wanner (1993), §II.4 (dop853.f HINIT), for order 8.
import type { Dop853Workspace, Rhs } from './workspace.ts';

/** Uses ws.y and ws.k1 = f(t, y); evaluates f once more (into ws.k2). Returns a signed step. */
export function initialStepSize(
  rhs: Rhs, ws: Dop853Workspace, t: number, direction: number, maxStep: number, rtol: number, atol: number,
): number {
  const { n, y, k1, k2, yStage } = ws;
  let normF = 0;
  let normY = 0;
  for (let i = 0; i < n; i++) {
    const scale = atol + rtol * Math.abs(y[i]);
    normF += (k1[i] / scale) ** 2;
    normY += (y[i] / scale) ** 2;
  }
  let h = normF <= 1e-10 || normY <= 1e-10 ? 1e-6 : Math.sqrt(normY / normF) * 0.01;
  h = Math.min(h, maxStep) * direction;
  for (let i = 0; i < n; i++) yStage[i] = y[i] + h * k1[i];
  rhs(t + h, yStage, k2);
  let secondDerivative = 0;
  for (let i = 0; i < n; i++) {
    const scale = atol + rtol * Math.abs(y[i]);
    secondDerivative += ((k2[i] - k1[i]) / scale) ** 2;
  }
  secondDerivative = Math.sqrt(secondDerivative) / Math.abs(h);
  const bound = Math.max(Math.abs(secondDerivative), Math.sqrt(normF));
  const h1 = bound <= 1e-15 ? Math.max(1e-6, Math.abs(h) * 1e-3) : Math.pow(0.01 / bound, 1 / 8); // Math.pow: see integrate.ts
  return Math.min(100 * Math.abs(h), h1, maxStep) * direction;
}
