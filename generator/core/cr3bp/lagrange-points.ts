// The five equilibria of the CR3BP (Szebehely 1967, ch. 4): L1–L3 on the x-axis as roots of Ω_x = 0,
// found by bisection on the interval where Ω_x is monotone, then polished by Newton.
import { jacobiConstant } from './jacobi-constant.ts';

export interface LagrangePoint {
  name: 'L1' | 'L2' | 'L3' | 'L4' | 'L5';
  x: number;
  y: number;
  jacobi: number;
}

/** Ω_x on the x-axis; increasing wherever it is continuous. */
function axialForce(mu: number, x: number): number {
  const d1 = x + mu;
  const d2 = x - 1 + mu;
  return x - ((1 - mu) * d1) / Math.abs(d1) ** 3 - (mu * d2) / Math.abs(d2) ** 3;
}

function axialForceSlope(mu: number, x: number): number {
  return 1 + (2 * (1 - mu)) / Math.abs(x + mu) ** 3 + (2 * mu) / Math.abs(x - 1 + mu) ** 3;
}

function collinearRoot(mu: number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  for (let i = 0; i < 200 && b - a > 1e-15 * Math.max(1, Math.abs(a)); i++) {
    const m = 0.5 * (a + b);
    if (axialForce(mu, m) < 0) a = m;
    else b = m;
  }
  let x = 0.5 * (a + b);
  for (let i = 0; i < 3; i++) x -= axialForce(mu, x) / axialForceSlope(mu, x);
  return x;
}

export function assertMassRatio(mu: number): void {
  if (!(Number.isFinite(mu) && mu > 0 && mu <= 0.5)) {
    throw new RangeError(`mu must be a number in (0, 0.5], got ${mu}`);
  }
}

export function lagrangePoints(mu: number): LagrangePoint[] {
  assertMassRatio(mu);
  const gap = 1e-12;
  const xL1 = collinearRoot(mu, -mu + gap, 1 - mu - gap);
  const xL2 = collinearRoot(mu, 1 - mu + gap, 3);
  const xL3 = collinearRoot(mu, -3, -mu - gap);
  const point = (name: LagrangePoint['name'], x: number, y: number): LagrangePoint => ({
    name, x, y, jacobi: jacobiConstant(mu, [x, y, 0, 0, 0, 0]),
  });
  const h = Math.sqrt(3) / 2;
  return [point('L1', xL1, 0), point('L2', xL2, 0), point('L3', xL3, 0), point('L4', 0.5 - mu, h), point('L5', 0.5 - mu, -h)];
}
