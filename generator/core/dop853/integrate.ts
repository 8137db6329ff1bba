// DOP853 driver: adaptive steps with the step-size control of Hairer, Nørsett & Wanner (1993), §II.4
// (dop853.f with β = 0, so the previous error plays no part), optional dense output, and an observer called after every accepted step.
import { attemptStep } from './attempt-step.ts';
import { evaluateDenseOutput, keepStepForDenseOutput } from './dense-output.ts';
import { initialStepSize } from './initial-step.ts';
import { IntegrationError } from './integration-error.ts';
import { SLOT_K1, SLOT_Y, SLOT_Y_NEW, type Dop853Workspace, type Rhs } from './workspace.ts';

export interface Dop853Options {
  rtol: number;
  atol: number;
  /** Largest |h| allowed (default: the whole span). */
  maxStep?: number;
  /** Accepted + rejected steps allowed before giving up (default 1e6). */
  maxSteps?: number;
  /** First step; 0 or absent: estimated. */
  initialStep?: number;
  /** Make dense output available in the observer (3 more RHS evaluations for each step where it is used). */
  dense?: boolean;
}

export interface StepObserver {
  /**
   * Called after each accepted step from tOld to tNew; ws.y holds the state at tNew and, with dense output on,
   * evaluateDenseOutput interpolates the step (built on its first call). Returns a time in [tOld, tNew] at
   * which to stop, or NaN to go on.
   */
  afterStep(ws: Dop853Workspace, tOld: number, tNew: number): number;
}

export interface Dop853Stats {
  rhsEvaluations: number;
  steps: number;
  rejectedSteps: number;
}

export interface Dop853Result extends Dop853Stats {
  /** Time reached: tEnd, or where the observer stopped the integration. The state is in ws.y. */
  tFinal: number;
  stoppedByObserver: boolean;
}

const SAFETY = 0.9;
const FAC_MIN_INV = 1 / 0.333; // largest shrink 1/0.333
const FAC_MAX_INV = 1 / 6; // largest growth 6
const UNIT_ROUNDOFF = 2.3e-16;

const NATIVE_POW = Math.pow;

// err^(1/8) / SAFETY: h / stepFactor is the step that would just meet the tolerance, times SAFETY.
// The root sits on the critical path of every trial step, and V8's pow takes about three times as long as
// its log and exp together, so it is taken as e^(ln(err)/8), the same number up to round-off. A state export
// swaps in a portable Math.pow so that Node and a browser take the same steps
// (core/state-export/portable-math.ts): while it is swapped, the root is taken with it.
function stepFactor(err: number): number {
  if (Math.pow !== NATIVE_POW) return Math.pow(err, 0.125) / SAFETY;
  return Math.exp(Math.log(err) * 0.125) / SAFETY;
}

/** Integrates y' = f(t, y) from (t0, y0) to tEnd. The final state is left in ws.y. */
export function integrateDop853(
  rhs: Rhs, ws: Dop853Workspace, t0: number, y0: ArrayLike<number>, tEnd: number,
  options: Dop853Options, observer?: StepObserver,
): Dop853Result {
  const n = ws.n;
  const { rtol, atol } = options;
  if (!(rtol > 0) || !(atol > 0)) throw new RangeError(`tolerances must be positive (rtol ${rtol}, atol ${atol})`);
  const span = tEnd - t0;
  const direction = span >= 0 ? 1 : -1;
  const maxStep = Math.abs(options.maxStep ?? span) || Math.abs(span);
  const maxSteps = options.maxSteps ?? 1_000_000;
  const dense = options.dense ?? false;
  for (let i = 0; i < n; i++) ws.y[i] = y0[i];
  ws.denseRhs = null;
  ws.denseReady = false;
  ws.denseEvaluations = 0;
  const result: Dop853Result = { tFinal: t0, stoppedByObserver: false, rhsEvaluations: 0, steps: 0, rejectedSteps: 0 };
  if (span === 0) return result;

  let t = t0;
  rhs(t, ws.y, ws.k1);
  let nfcn = 1;
  let h = options.initialStep ? Math.abs(options.initialStep) * direction : 0;
  if (h === 0) {
    h = initialStepSize(rhs, ws, t, direction, maxStep, rtol, atol);
    nfcn++;
  }
  let rejected = false;
  let last = false;
  let accepted = 0;
  let rejections = 0;
  let attempts = 0;

  for (;;) {
    if (attempts++ >= maxSteps) {
      throw new IntegrationError(`step limit of ${maxSteps} steps reached at t = ${t}`, 'step-limit', t);
    }
    if (0.1 * Math.abs(h) <= Math.abs(t) * UNIT_ROUNDOFF || Math.abs(h) < 1e-300) {
      throw new IntegrationError(`step size underflow (h = ${h}) at t = ${t}`, 'step-underflow', t);
    }
    if ((t + 1.01 * h - tEnd) * direction > 0) {
      h = tEnd - t;
      last = true;
    }
    attemptStep(rhs, ws, t, h, rtol, atol);
    const err = ws.errorNorm;
    nfcn += 11;
    if (!Number.isFinite(err)) {
      // A stage hit a singularity or overflowed: shrink hard and retry.
      h *= 0.1;
      rejected = true;
      last = false;
      rejections++;
      continue;
    }
    if (err <= 1) {
      accepted++;
      const tNew = last ? tEnd : t + h;
      // f at the new point (FSAL) first: it does not depend on the next step size, so the CPU overlaps it
      // with the slow root below.
      rhs(tNew, ws.yNew, ws.k13);
      nfcn++;
      if (dense) keepStepForDenseOutput(rhs, ws, t, h);
      // yNew becomes y and f(t + h) the next k1 (FSAL). The vectors stay at fixed places in ws.buffer.
      const buffer = ws.buffer;
      for (let i = 0, oY = SLOT_Y * n, oNew = SLOT_Y_NEW * n, o1 = SLOT_K1 * n, o13 = o1 + 12 * n; i < n; i++) {
        buffer[oY + i] = buffer[oNew + i];
        buffer[o1 + i] = buffer[o13 + i];
      }
      let hNew = h / Math.max(FAC_MAX_INV, Math.min(FAC_MIN_INV, stepFactor(err)));
      const tOld = t;
      t = tNew;
      if (observer) {
        const tStop = observer.afterStep(ws, tOld, t);
        if (tStop === tStop) {
          if (tStop !== t) evaluateDenseOutput(ws, tStop, ws.y);
          t = tStop;
          result.stoppedByObserver = true;
          break;
        }
      }
      if (last) break;
      if (Math.abs(hNew) > maxStep) hNew = direction * maxStep;
      if (rejected) hNew = direction * Math.min(Math.abs(hNew), Math.abs(h));
      rejected = false;
      h = hNew;
    } else {
      h /= Math.min(FAC_MIN_INV, stepFactor(err));
      rejected = true;
      last = false;
      if (accepted >= 1) rejections++;
    }
  }
  result.tFinal = t;
  result.rhsEvaluations = nfcn + ws.denseEvaluations;
  result.steps = accepted;
  result.rejectedSteps = rejections;
  return result;
}
