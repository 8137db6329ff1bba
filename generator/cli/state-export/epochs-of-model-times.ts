// Epochs of model times when the model's rotating frame is pinned to the real Earth–Moon line: the frame
// angle t (nondimensional time = radians of turn) advances with the line's actual angular rate n(τ), so
// dτ/dt = 1/n(τ) (τ in seconds). Integrated with classical RK4 in t, in substeps of at most 0.01 (about
// an hour; n changes on the scale of a month, so the error is far below a millisecond). With these epochs
// the velocities of rotatingToInertialAtEpoch (scaled by n at each epoch) agree with the motion of the
// mapped positions from epoch to epoch.
const MAX_SUBSTEP_ND = 0.01;

/** timesNd ascending from 0; rateRadS(ms) is n at an epoch. Returns fractional ms since 1970. */
export function epochsOfModelTimes(startMs: number, timesNd: ArrayLike<number>, rateRadS: (ms: number) => number): Float64Array {
  const out = new Float64Array(timesNd.length);
  const slope = (ms: number) => {
    const n = rateRadS(ms);
    if (!(n > 0) || !Number.isFinite(n)) throw new RangeError(`rate of the Earth–Moon line must be positive and finite, got ${n}`);
    return 1000 / n; // ms per unit of model time
  };
  let t = 0;
  let ms = startMs;
  for (let i = 0; i < timesNd.length; i++) {
    const target = timesNd[i]!;
    if (!(target >= t)) throw new RangeError(`timesNd must ascend from 0, got ${target} after ${t}`);
    const steps = Math.ceil((target - t) / MAX_SUBSTEP_ND);
    const h = steps > 0 ? (target - t) / steps : 0;
    for (let k = 0; k < steps; k++) {
      const k1 = slope(ms);
      const k2 = slope(ms + 0.5 * h * k1);
      const k3 = slope(ms + 0.5 * h * k2);
      const k4 = slope(ms + h * k3);
      ms += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    }
    t = target;
    out[i] = ms;
  }
  return out;
}
