// 7th-order continuous extension of DOP853 (Hairer, Nørsett & Wanner 1993, §II.6; dop853.f CONTD8).
// Like attempt-step.ts, reads and writes the workspace's single buffer at fixed offsets, for speed.
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
import {
  SLOT_CONT, SLOT_K1, SLOT_K1_PREV, SLOT_STAGE, SLOT_Y, SLOT_Y_NEW, SLOT_Y_PREV, type Dop853Workspace, type Rhs,
} from './workspace.ts';

/**
 * After an accepted step from (t, ws.y) to (t + h, ws.yNew), with ws.k13 = f(t + h, yNew), and before yNew and
 * k13 replace y and k1: keeps what the step's dense output needs. Nothing is built yet: most steps of an event
 * search never need it, and building costs three more RHS evaluations.
 */
export function keepStepForDenseOutput(rhs: Rhs, ws: Dop853Workspace, t: number, h: number): void {
  const n = ws.n;
  const b = ws.buffer;
  for (let i = 0, oY = SLOT_Y * n, oP = SLOT_Y_PREV * n, o1 = SLOT_K1 * n, o1P = SLOT_K1_PREV * n; i < n; i++) {
    b[oP + i] = b[oY + i];
    b[o1P + i] = b[o1 + i];
  }
  ws.denseT = t;
  ws.denseH = h;
  ws.denseRhs = rhs;
  ws.denseReady = false;
}

/** Evaluates the three extra stages of the kept step and stores its interpolation coefficients in ws.cont. */
function buildDenseOutput(ws: Dop853Workspace): void {
  const rhs = ws.denseRhs;
  if (rhs === null) throw new Error('dense output asked for before any accepted step with dense output on');
  const t = ws.denseT;
  const h = ws.denseH;
  const n = ws.n;
  const b = ws.buffer;
  const s = ws.yStage;
  // The step's start state and f there sit in the kept slots: y and k1 already hold the step's end.
  const oY = SLOT_Y_PREV * n, oNew = SLOT_Y_NEW * n, oS = SLOT_STAGE * n, oC = SLOT_CONT * n;
  const o1 = SLOT_K1_PREV * n, o6 = SLOT_K1 * n + 5 * n, o7 = o6 + n, o8 = o7 + n, o9 = o8 + n, o10 = o9 + n;
  const o11 = o10 + n, o12 = o11 + n, o13 = o12 + n, o14 = o13 + n, o15 = o14 + n, o16 = o15 + n;
  let i = 0;
  for (i = 0; i < n; i++) {
    b[oS + i] = b[oY + i] + h * (A141 * b[o1 + i] + A147 * b[o7 + i] + A148 * b[o8 + i] + A149 * b[o9 + i]
      + A1410 * b[o10 + i] + A1411 * b[o11 + i] + A1412 * b[o12 + i] + A1413 * b[o13 + i]);
  }
  rhs(t + C14 * h, s, ws.k14);
  for (i = 0; i < n; i++) {
    b[oS + i] = b[oY + i] + h * (A151 * b[o1 + i] + A156 * b[o6 + i] + A157 * b[o7 + i] + A158 * b[o8 + i]
      + A1511 * b[o11 + i] + A1512 * b[o12 + i] + A1513 * b[o13 + i] + A1514 * b[o14 + i]);
  }
  rhs(t + C15 * h, s, ws.k15);
  for (i = 0; i < n; i++) {
    b[oS + i] = b[oY + i] + h * (A161 * b[o1 + i] + A166 * b[o6 + i] + A167 * b[o7 + i] + A168 * b[o8 + i]
      + A169 * b[o9 + i] + A1613 * b[o13 + i] + A1614 * b[o14 + i] + A1615 * b[o15 + i]);
  }
  rhs(t + C16 * h, s, ws.k16);

  for (i = 0; i < n; i++) {
    const yDiff = b[oNew + i] - b[oY + i];
    const bSpline = h * b[o1 + i] - yDiff;
    b[oC + i] = b[oY + i];
    b[oC + n + i] = yDiff;
    b[oC + 2 * n + i] = bSpline;
    b[oC + 3 * n + i] = yDiff - h * b[o13 + i] - bSpline;
    b[oC + 4 * n + i] = h * (D41 * b[o1 + i] + D46 * b[o6 + i] + D47 * b[o7 + i] + D48 * b[o8 + i]
      + D49 * b[o9 + i] + D410 * b[o10 + i] + D411 * b[o11 + i] + D412 * b[o12 + i] + D413 * b[o13 + i]
      + D414 * b[o14 + i] + D415 * b[o15 + i] + D416 * b[o16 + i]);
    b[oC + 5 * n + i] = h * (D51 * b[o1 + i] + D56 * b[o6 + i] + D57 * b[o7 + i] + D58 * b[o8 + i]
      + D59 * b[o9 + i] + D510 * b[o10 + i] + D511 * b[o11 + i] + D512 * b[o12 + i] + D513 * b[o13 + i]
      + D514 * b[o14 + i] + D515 * b[o15 + i] + D516 * b[o16 + i]);
    b[oC + 6 * n + i] = h * (D61 * b[o1 + i] + D66 * b[o6 + i] + D67 * b[o7 + i] + D68 * b[o8 + i]
      + D69 * b[o9 + i] + D610 * b[o10 + i] + D611 * b[o11 + i] + D612 * b[o12 + i] + D613 * b[o13 + i]
      + D614 * b[o14 + i] + D615 * b[o15 + i] + D616 * b[o16 + i]);
    b[oC + 7 * n + i] = h * (D71 * b[o1 + i] + D76 * b[o6 + i] + D77 * b[o7 + i] + D78 * b[o8 + i]
      + D79 * b[o9 + i] + D710 * b[o10 + i] + D711 * b[o11 + i] + D712 * b[o12 + i] + D713 * b[o13 + i]
      + D714 * b[o14 + i] + D715 * b[o15 + i] + D716 * b[o16 + i]);
  }
  ws.denseReady = true;
  ws.denseEvaluations += 3;
}

/**
 * Writes the first `count` components of the interpolated state at time t (inside the last accepted step)
 * into out. Builds the step's dense output on first use.
 */
export function evaluateDenseOutput(ws: Dop853Workspace, t: number, out: Float64Array, count: number = ws.n): void {
  if (!ws.denseReady) buildDenseOutput(ws);
  const n = ws.n;
  const c = ws.cont;
  const s = (t - ws.denseT) / ws.denseH;
  const s1 = 1 - s;
  for (let i = 0; i < count; i++) {
    const inner = c[4 * n + i] + s * (c[5 * n + i] + s1 * (c[6 * n + i] + s * c[7 * n + i]));
    out[i] = c[i] + s * (c[n + i] + s1 * (c[2 * n + i] + s * (c[3 * n + i] + s1 * inner)));
  }
}
