// The Poincaré section through an orbit's start point: y = 0, ẏ with the start's sign, x on the start's
// segment of the x-axis (far side of the larger primary, between the primaries, far side of the smaller one).
import { axisSegmentOf, type AxisSegment } from '../cr3bp/axis-segment.ts';

export interface StartSection {
  mu: number;
  segment: AxisSegment;
  /** Open x-interval of the segment. */
  xMinNd: number;
  xMaxNd: number;
  /** Sign of ẏ on the section. */
  direction: 1 | -1;
  /** The start point (x, z, ẋ, ẏ, ż); y = 0 there. */
  x0: number;
  z0: number;
  vx0: number;
  vy0: number;
  vz0: number;
}

export function startSection(mu: number, state0: ArrayLike<number>): StartSection {
  if (state0.length !== 6) throw new RangeError(`state0 must have 6 numbers, got ${state0.length}`);
  for (let i = 0; i < 6; i++) if (!Number.isFinite(state0[i])) throw new RangeError(`state0[${i}] must be finite, got ${state0[i]}`);
  if (Math.abs(state0[1]) > 1e-9) throw new RangeError(`state0 must start on the section y = 0 (|y| ≤ 1e-9), got y = ${state0[1]}`);
  if (state0[4] === 0) throw new RangeError('state0 must cross y = 0 (ẏ ≠ 0)');
  const x0 = state0[0];
  if (x0 === -mu || x0 === 1 - mu) throw new RangeError(`state0 must not start on a primary (x = ${x0})`);
  const segment = axisSegmentOf(mu, x0);
  const [xMinNd, xMaxNd] = segment === 'far-primary' ? [-Infinity, -mu] : segment === 'between' ? [-mu, 1 - mu] : [1 - mu, Infinity];
  return {
    mu, segment, xMinNd, xMaxNd, direction: state0[4] > 0 ? 1 : -1,
    x0, z0: state0[2], vx0: state0[3], vy0: state0[4], vz0: state0[5],
  };
}

/** Whether a crossing of y = 0 lies on the section. */
export function isOnSection(section: StartSection, state: ArrayLike<number>): boolean {
  return state[4] * section.direction > 0 && state[0] > section.xMinNd && state[0] < section.xMaxNd;
}
