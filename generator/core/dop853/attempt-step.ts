// One trial step of DOP853: stages 2–12, the 8th-order solution and the combined 5th/3rd-order
// error estimate of Hairer, Nørsett & Wanner (1993), §II.5 and the reference code dop853.f.
import * as K from './coefficients.ts';

// Copied into module constants: property loads from the namespace object are slow in some loaders.
const {
  B1, B6, B7, B8, B9, C2, C3, C4, C5, C6,
  C7, C8, C9, A21, A31, A32, A41, A43, A51, A53,
  A54, A61, A64, A65, A71, A74, A75, A76, A81, A84,
  A85, A86, A87, A91, A94, A95, A96, A97, A98, B10,
  B11, B12, C10, C11, ER1, ER6, ER7, ER8, ER9, A101,
  A104, A105, A106, A107, A108, A109, A111, A114, A115, A116,
  A117, A118, A119, A121, A124, A125, A126, A127, A128, A129,
  BHH1, BHH2, BHH3, ER10, ER11, ER12, A1110, A1210, A1211,
} = K;
import type { Dop853Workspace, Rhs } from './workspace.ts';

/**
 * Fills ws.yNew with the step from (t, ws.y) of size h, ws.k1 holding f(t, y) on entry.
 * Returns the scaled error norm: the step is accepted when it is ≤ 1.
 */
export function attemptStep(rhs: Rhs, ws: Dop853Workspace, t: number, h: number, rtol: number, atol: number): number {
  const n = ws.n;
  const { y, yNew, yStage: s, k1, k2, k3, k4, k5, k6, k7, k8, k9, k10, k11, k12 } = ws;
  let i = 0;
  for (i = 0; i < n; i++) s[i] = y[i] + h * A21 * k1[i];
  rhs(t + C2 * h, s, k2);
  for (i = 0; i < n; i++) s[i] = y[i] + h * (A31 * k1[i] + A32 * k2[i]);
  rhs(t + C3 * h, s, k3);
  for (i = 0; i < n; i++) s[i] = y[i] + h * (A41 * k1[i] + A43 * k3[i]);
  rhs(t + C4 * h, s, k4);
  for (i = 0; i < n; i++) s[i] = y[i] + h * (A51 * k1[i] + A53 * k3[i] + A54 * k4[i]);
  rhs(t + C5 * h, s, k5);
  for (i = 0; i < n; i++) s[i] = y[i] + h * (A61 * k1[i] + A64 * k4[i] + A65 * k5[i]);
  rhs(t + C6 * h, s, k6);
  for (i = 0; i < n; i++) s[i] = y[i] + h * (A71 * k1[i] + A74 * k4[i] + A75 * k5[i] + A76 * k6[i]);
  rhs(t + C7 * h, s, k7);
  for (i = 0; i < n; i++) {
    s[i] = y[i] + h * (A81 * k1[i] + A84 * k4[i] + A85 * k5[i] + A86 * k6[i] + A87 * k7[i]);
  }
  rhs(t + C8 * h, s, k8);
  for (i = 0; i < n; i++) {
    s[i] = y[i] + h * (A91 * k1[i] + A94 * k4[i] + A95 * k5[i] + A96 * k6[i] + A97 * k7[i] + A98 * k8[i]);
  }
  rhs(t + C9 * h, s, k9);
  for (i = 0; i < n; i++) {
    s[i] = y[i] + h * (A101 * k1[i] + A104 * k4[i] + A105 * k5[i] + A106 * k6[i] + A107 * k7[i]
      + A108 * k8[i] + A109 * k9[i]);
  }
  rhs(t + C10 * h, s, k10);
  for (i = 0; i < n; i++) {
    s[i] = y[i] + h * (A111 * k1[i] + A114 * k4[i] + A115 * k5[i] + A116 * k6[i] + A117 * k7[i]
      + A118 * k8[i] + A119 * k9[i] + A1110 * k10[i]);
  }
  rhs(t + C11 * h, s, k11);
  for (i = 0; i < n; i++) {
    s[i] = y[i] + h * (A121 * k1[i] + A124 * k4[i] + A125 * k5[i] + A126 * k6[i] + A127 * k7[i]
      + A128 * k8[i] + A129 * k9[i] + A1210 * k10[i] + A1211 * k11[i]);
  }
  rhs(t + h, s, k12);

  let err5 = 0;
  let err3 = 0;
  for (i = 0; i < n; i++) {
    const slope = B1 * k1[i] + B6 * k6[i] + B7 * k7[i] + B8 * k8[i] + B9 * k9[i]
      + B10 * k10[i] + B11 * k11[i] + B12 * k12[i];
    const yi = y[i];
    const yn = yi + h * slope;
    yNew[i] = yn;
    const scale = atol + rtol * Math.max(Math.abs(yi), Math.abs(yn));
    const e3 = (slope - BHH1 * k1[i] - BHH2 * k9[i] - BHH3 * k12[i]) / scale;
    const e5 = (ER1 * k1[i] + ER6 * k6[i] + ER7 * k7[i] + ER8 * k8[i] + ER9 * k9[i]
      + ER10 * k10[i] + ER11 * k11[i] + ER12 * k12[i]) / scale;
    err3 += e3 * e3;
    err5 += e5 * e5;
  }
  let denominator = err5 + 0.01 * err3;
  if (denominator <= 0) denominator = 1;
  return Math.abs(h) * err5 * Math.sqrt(1 / (n * denominator));
}
