// The integrator's error tolerances, one shape for every caller (propagate, the corrector, jobs, the
// config), and the one default: 1e-12, near the smallest that still sits well above double round-off.

export interface Tolerance {
  rtol: number;
  atol: number;
}

export const DEFAULT_TOLERANCE: Readonly<Tolerance> = { rtol: 1e-12, atol: 1e-12 };
