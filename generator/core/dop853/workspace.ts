// Work buffers of one DOP853 integration, allocated once per dimension so that steps allocate nothing.
// All vectors live in one Float64Array at fixed offsets (see WORKSPACE_SLOTS): the stage loops then index a
// single typed array, which V8 compiles to far fewer checks and register spills than a dozen separate
// arrays. The named fields are views of that buffer, for the RHS and for callers.

/** Right-hand side y' = f(t, y), written into dydt. Must not keep references to y or dydt. */
export type RhsFunction = (t: number, y: Float64Array, dydt: Float64Array) => void;
/** A right-hand side, optionally marked as not depending on t (autonomous-rhs.ts). */
export type Rhs = RhsFunction & { readonly autonomous?: boolean };

/** Position (in units of n) of each vector in Dop853Workspace.buffer. */
export const SLOT_Y = 0;
export const SLOT_Y_NEW = 1;
export const SLOT_STAGE = 2;
/** k1 … k16 occupy slots SLOT_K1 … SLOT_K1 + 15. */
export const SLOT_K1 = 3;
/** Dense-output coefficients: 8 blocks of n starting at this slot. */
export const SLOT_CONT = 19;
/** State and f at the start of the last accepted step, kept (dense runs only) to build its dense output later. */
export const SLOT_Y_PREV = 27;
export const SLOT_K1_PREV = 28;
export const WORKSPACE_SLOTS = 29;

export interface Dop853Workspace {
  readonly n: number;
  /** The storage behind every vector below. */
  readonly buffer: Float64Array;
  readonly y: Float64Array; // state at the start of the current step (after a step: the new state)
  readonly yNew: Float64Array; // candidate state at t + h
  readonly yStage: Float64Array; // argument of each stage evaluation
  readonly k1: Float64Array; // f(t, y)
  readonly k2: Float64Array;
  readonly k3: Float64Array;
  readonly k4: Float64Array;
  readonly k5: Float64Array;
  readonly k6: Float64Array;
  readonly k7: Float64Array;
  readonly k8: Float64Array;
  readonly k9: Float64Array;
  readonly k10: Float64Array;
  readonly k11: Float64Array;
  readonly k12: Float64Array;
  readonly k13: Float64Array; // f(t + h, yNew), copied into k1 when the step is accepted
  readonly k14: Float64Array;
  readonly k15: Float64Array;
  readonly k16: Float64Array;
  /** Dense-output coefficients of the last accepted step, 8 blocks of n. */
  readonly cont: Float64Array;
  /** Scaled error norm of the last trial step (≤ 1: accepted). */
  errorNorm: number;
  /** Start time and size of the step the dense output describes. */
  denseT: number;
  denseH: number;
  /** The right-hand side of that step, to build its dense output on first use; null before any step. */
  denseRhs: Rhs | null;
  /** True once ws.cont holds the coefficients of that step. */
  denseReady: boolean;
  /** RHS evaluations spent building dense output (3 per step that needed it). */
  denseEvaluations: number;
}

export function createDop853Workspace(n: number): Dop853Workspace {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`dimension must be a positive integer, got ${n}`);
  const buffer = new Float64Array(WORKSPACE_SLOTS * n);
  const v = (slot: number, blocks = 1) => buffer.subarray(slot * n, (slot + blocks) * n);
  const k = (j: number) => v(SLOT_K1 + j - 1);
  return {
    n,
    buffer,
    y: v(SLOT_Y), yNew: v(SLOT_Y_NEW), yStage: v(SLOT_STAGE),
    k1: k(1), k2: k(2), k3: k(3), k4: k(4), k5: k(5), k6: k(6), k7: k(7), k8: k(8),
    k9: k(9), k10: k(10), k11: k(11), k12: k(12), k13: k(13), k14: k(14), k15: k(15), k16: k(16),
    cont: v(SLOT_CONT, 8),
    errorNorm: 0,
    denseT: 0,
    denseH: 0,
    denseRhs: null,
    denseReady: false,
    denseEvaluations: 0,
  };
}
