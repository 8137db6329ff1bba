// 7th-order continuous extension of DOP853 (Hairer, Nørsett & Wanner 1993, §II.6; dop853.f CONTD8).
import * as K from './coefficients.ts';

// Copied into module constants: property loads from the namespace object are slow in some loaders.
const {
  C14, C15, C16, D41, D46, D47, D48, D49, D51, D56,
  D57, D58, D59, D61, D66, D67, D68, D69, D71, D76,
  D77, D78, D79, A141, A147, A148, A149, A151, A156, A157,
  A158, A161, A166, A167, A168, A169, D410, D411, D412, D413,
  D414, D415, D416, D510, D511, D512, D513, D514, D515, D516,
  D610, D611, D612, D613, D614, D615, D616, D710, D711, D712,
  D713, D714, D715, D716, A1410, A1411, A1412, A1413, A1511, A1512,
  A1513, A1514, A1613, A1614, A1615,
} = K;
import type { Dop853Workspace, Rhs } from './workspace.ts';

/**
 * After an accepted step from (t, ws.y) to (t + h, ws.yNew), with ws.k13 = f(t + h, yNew):
 * evaluates the three extra stages and stores the interpolation coefficients in ws.cont.
 */
export function prepareDenseOutput(rhs: Rhs, ws: Dop853Workspace, t: number, h: number): void {
  const n = ws.n;
  const { y, yNew, yStage: s, cont, k1, k6, k7, k8, k9, k10, k11, k12, k13, k14, k15, k16 } = ws;
  let i = 0;
  for (i = 0; i < n; i++) {
    s[i] = y[i] + h * (A141 * k1[i] + A147 * k7[i] + A148 * k8[i] + A149 * k9[i] + A1410 * k10[i]
      + A1411 * k11[i] + A1412 * k12[i] + A1413 * k13[i]);
  }
  rhs(t + C14 * h, s, k14);
  for (i = 0; i < n; i++) {
    s[i] = y[i] + h * (A151 * k1[i] + A156 * k6[i] + A157 * k7[i] + A158 * k8[i] + A1511 * k11[i]
      + A1512 * k12[i] + A1513 * k13[i] + A1514 * k14[i]);
  }
  rhs(t + C15 * h, s, k15);
  for (i = 0; i < n; i++) {
    s[i] = y[i] + h * (A161 * k1[i] + A166 * k6[i] + A167 * k7[i] + A168 * k8[i] + A169 * k9[i]
      + A1613 * k13[i] + A1614 * k14[i] + A1615 * k15[i]);
  }
  rhs(t + C16 * h, s, k16);

  for (i = 0; i < n; i++) {
    const yDiff = yNew[i] - y[i];
    const bSpline = h * k1[i] - yDiff;
    cont[i] = y[i];
    cont[n + i] = yDiff;
    cont[2 * n + i] = bSpline;
    cont[3 * n + i] = yDiff - h * k13[i] - bSpline;
    cont[4 * n + i] = h * (D41 * k1[i] + D46 * k6[i] + D47 * k7[i] + D48 * k8[i] + D49 * k9[i]
      + D410 * k10[i] + D411 * k11[i] + D412 * k12[i] + D413 * k13[i] + D414 * k14[i]
      + D415 * k15[i] + D416 * k16[i]);
    cont[5 * n + i] = h * (D51 * k1[i] + D56 * k6[i] + D57 * k7[i] + D58 * k8[i] + D59 * k9[i]
      + D510 * k10[i] + D511 * k11[i] + D512 * k12[i] + D513 * k13[i] + D514 * k14[i]
      + D515 * k15[i] + D516 * k16[i]);
    cont[6 * n + i] = h * (D61 * k1[i] + D66 * k6[i] + D67 * k7[i] + D68 * k8[i] + D69 * k9[i]
      + D610 * k10[i] + D611 * k11[i] + D612 * k12[i] + D613 * k13[i] + D614 * k14[i]
      + D615 * k15[i] + D616 * k16[i]);
    cont[7 * n + i] = h * (D71 * k1[i] + D76 * k6[i] + D77 * k7[i] + D78 * k8[i] + D79 * k9[i]
      + D710 * k10[i] + D711 * k11[i] + D712 * k12[i] + D713 * k13[i] + D714 * k14[i]
      + D715 * k15[i] + D716 * k16[i]);
  }
  ws.denseT = t;
  ws.denseH = h;
}

/** Writes the first `count` components of the interpolated state at time t (inside the last step) into out. */
export function evaluateDenseOutput(ws: Dop853Workspace, t: number, out: Float64Array, count: number = ws.n): void {
  const n = ws.n;
  const c = ws.cont;
  const s = (t - ws.denseT) / ws.denseH;
  const s1 = 1 - s;
  for (let i = 0; i < count; i++) {
    const inner = c[4 * n + i] + s * (c[5 * n + i] + s1 * (c[6 * n + i] + s * c[7 * n + i]));
    out[i] = c[i] + s * (c[n + i] + s1 * (c[2 * n + i] + s * (c[3 * n + i] + s1 * inner)));
  }
}
