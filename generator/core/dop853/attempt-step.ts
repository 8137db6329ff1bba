// One trial step of DOP853: stages 2–12, the 8th-order solution and the combined 5th/3rd-order
// error estimate of Hairer, Nørsett & Wanner (1993), §II.5 and the reference code dop853.f.
// Speed: every vector is read from the workspace's single buffer at a fixed offset (see workspace.ts);
// the arithmetic, including its order, is exactly that of the reference code.
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
import { SLOT_K1, SLOT_STAGE, SLOT_Y, SLOT_Y_NEW, type Dop853Workspace, type Rhs } from './workspace.ts';

/**
 * Fills ws.yNew with the step from (t, ws.y) of size h, ws.k1 holding f(t, y) on entry, and ws.errorNorm
 * with the scaled error norm: the step is accepted when it is ≤ 1. (Stored, not returned: a returned double
 * is boxed on the heap at every trial step.)
 */
export function attemptStep(rhs: Rhs, ws: Dop853Workspace, t: number, h: number, rtol: number, atol: number): void {
  const n = ws.n;
  const b = ws.buffer;
  const s = ws.yStage;
  const oY = SLOT_Y * n, oNew = SLOT_Y_NEW * n, oS = SLOT_STAGE * n;
  const o1 = SLOT_K1 * n, o2 = o1 + n, o3 = o2 + n, o4 = o3 + n, o5 = o4 + n, o6 = o5 + n;
  const o7 = o6 + n, o8 = o7 + n, o9 = o8 + n, o10 = o9 + n, o11 = o10 + n, o12 = o11 + n;
  // An autonomous RHS gets the step's start time at every stage (autonomous-rhs.ts says why).
  const timeless = rhs.autonomous === true;
  let i = 0;
  for (i = 0; i < n; i++) b[oS + i] = b[oY + i] + h * A21 * b[o1 + i];
  rhs(timeless ? t : t + C2 * h, s, ws.k2);
  for (i = 0; i < n; i++) b[oS + i] = b[oY + i] + h * (A31 * b[o1 + i] + A32 * b[o2 + i]);
  rhs(timeless ? t : t + C3 * h, s, ws.k3);
  for (i = 0; i < n; i++) b[oS + i] = b[oY + i] + h * (A41 * b[o1 + i] + A43 * b[o3 + i]);
  rhs(timeless ? t : t + C4 * h, s, ws.k4);
  for (i = 0; i < n; i++) b[oS + i] = b[oY + i] + h * (A51 * b[o1 + i] + A53 * b[o3 + i] + A54 * b[o4 + i]);
  rhs(timeless ? t : t + C5 * h, s, ws.k5);
  for (i = 0; i < n; i++) b[oS + i] = b[oY + i] + h * (A61 * b[o1 + i] + A64 * b[o4 + i] + A65 * b[o5 + i]);
  rhs(timeless ? t : t + C6 * h, s, ws.k6);
  for (i = 0; i < n; i++) {
    b[oS + i] = b[oY + i] + h * (A71 * b[o1 + i] + A74 * b[o4 + i] + A75 * b[o5 + i] + A76 * b[o6 + i]);
  }
  rhs(timeless ? t : t + C7 * h, s, ws.k7);
  for (i = 0; i < n; i++) {
    b[oS + i] = b[oY + i] + h * (A81 * b[o1 + i] + A84 * b[o4 + i] + A85 * b[o5 + i] + A86 * b[o6 + i]
      + A87 * b[o7 + i]);
  }
  rhs(timeless ? t : t + C8 * h, s, ws.k8);
  for (i = 0; i < n; i++) {
    b[oS + i] = b[oY + i] + h * (A91 * b[o1 + i] + A94 * b[o4 + i] + A95 * b[o5 + i] + A96 * b[o6 + i]
      + A97 * b[o7 + i] + A98 * b[o8 + i]);
  }
  rhs(timeless ? t : t + C9 * h, s, ws.k9);
  for (i = 0; i < n; i++) {
    b[oS + i] = b[oY + i] + h * (A101 * b[o1 + i] + A104 * b[o4 + i] + A105 * b[o5 + i] + A106 * b[o6 + i]
      + A107 * b[o7 + i] + A108 * b[o8 + i] + A109 * b[o9 + i]);
  }
  rhs(timeless ? t : t + C10 * h, s, ws.k10);
  for (i = 0; i < n; i++) {
    b[oS + i] = b[oY + i] + h * (A111 * b[o1 + i] + A114 * b[o4 + i] + A115 * b[o5 + i] + A116 * b[o6 + i]
      + A117 * b[o7 + i] + A118 * b[o8 + i] + A119 * b[o9 + i] + A1110 * b[o10 + i]);
  }
  rhs(timeless ? t : t + C11 * h, s, ws.k11);
  for (i = 0; i < n; i++) {
    b[oS + i] = b[oY + i] + h * (A121 * b[o1 + i] + A124 * b[o4 + i] + A125 * b[o5 + i] + A126 * b[o6 + i]
      + A127 * b[o7 + i] + A128 * b[o8 + i] + A129 * b[o9 + i] + A1210 * b[o10 + i] + A1211 * b[o11 + i]);
  }
  rhs(timeless ? t : t + h, s, ws.k12);

  let err5 = 0;
  let err3 = 0;
  for (i = 0; i < n; i++) {
    const slope = B1 * b[o1 + i] + B6 * b[o6 + i] + B7 * b[o7 + i] + B8 * b[o8 + i] + B9 * b[o9 + i]
      + B10 * b[o10 + i] + B11 * b[o11 + i] + B12 * b[o12 + i];
    const yi = b[oY + i];
    const yn = yi + h * slope;
    b[oNew + i] = yn;
    const scale = atol + rtol * Math.max(Math.abs(yi), Math.abs(yn));
    const e3 = (slope - BHH1 * b[o1 + i] - BHH2 * b[o9 + i] - BHH3 * b[o12 + i]) / scale;
    const e5 = (ER1 * b[o1 + i] + ER6 * b[o6 + i] + ER7 * b[o7 + i] + ER8 * b[o8 + i] + ER9 * b[o9 + i]
      + ER10 * b[o10 + i] + ER11 * b[o11 + i] + ER12 * b[o12 + i]) / scale;
    err3 += e3 * e3;
    err5 += e5 * e5;
  }
  let denominator = err5 + 0.01 * err3;
  if (denominator <= 0) denominator = 1;
  ws.errorNorm = Math.abs(h) * err5 * Math.sqrt(1 / (n * denominator));
}
