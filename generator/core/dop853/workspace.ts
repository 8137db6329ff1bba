// Work buffers of one DOP853 integration, allocated once per dimension so that steps allocate nothing.

/** Right-hand side y' = f(t, y), written into dydt. Must not keep references to y or dydt. */
export type Rhs = (t: number, y: Float64Array, dydt: Float64Array) => void;

export interface Dop853Workspace {
  readonly n: number;
  y: Float64Array; // state at the start of the current step (after a step: the new state)
  yNew: Float64Array; // candidate state at t + h
  yStage: Float64Array; // argument of each stage evaluation
  k1: Float64Array; // f(t, y)
  k2: Float64Array;
  k3: Float64Array;
  k4: Float64Array;
  k5: Float64Array;
  k6: Float64Array;
  k7: Float64Array;
  k8: Float64Array;
  k9: Float64Array;
  k10: Float64Array;
  k11: Float64Array;
  k12: Float64Array;
  k13: Float64Array; // f(t + h, yNew), reused as the next step's k1
  k14: Float64Array;
  k15: Float64Array;
  k16: Float64Array;
  /** Dense-output coefficients of the last accepted step, 8 blocks of n. */
  cont: Float64Array;
  /** Start time and size of the step the dense output describes. */
  denseT: number;
  denseH: number;
}

export function createDop853Workspace(n: number): Dop853Workspace {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`dimension must be a positive integer, got ${n}`);
  const v = () => new Float64Array(n);
  return {
    n,
    y: v(), yNew: v(), yStage: v(),
    k1: v(), k2: v(), k3: v(), k4: v(), k5: v(), k6: v(), k7: v(), k8: v(),
    k9: v(), k10: v(), k11: v(), k12: v(), k13: v(), k14: v(), k15: v(), k16: v(),
    cont: new Float64Array(8 * n),
    denseT: 0,
    denseH: 0,
  };
}
