// Samples of one period for the build-time pictures, from the generator's own propagator. A looser
// tolerance than the downloads use: the pictures need a tenth of a pixel, not 1e-12.
import { sampleTrajectory } from '../../generator/core/propagation/sample-trajectory.ts';
import type { TrajectorySamples } from './trajectory-figures.ts';

export const PLOT_TOLERANCE = { rtol: 1e-10, atol: 1e-12 };
export const ORBIT_PAGE_SAMPLES = 1500;
export const THUMBNAIL_SAMPLES = 400;

export type PlotSamplesResult = { ok: true; samples: TrajectorySamples } | { ok: false; error: string };

export function plotSamples(mu: number, state0: ArrayLike<number>, periodNd: number, count: number): PlotSamplesResult {
  try {
    return { ok: true, samples: sampleTrajectory(mu, state0, periodNd, count, PLOT_TOLERANCE) };
  } catch (error) {
    return { ok: false, error: (error as Error).message };
  }
}
