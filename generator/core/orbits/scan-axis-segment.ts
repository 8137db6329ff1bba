// Seed search at fixed Jacobi constant: start points along one segment of the x-axis, perpendicular
// (ẋ = 0, ẏ from C), and the roots of ẋ at the k-th crossing of y = 0 for k = 1..K (mirror theorem,
// Roy & Ovenden 1955): each root is a symmetric periodic orbit with half period at that crossing.
import { axisSpeedSquared } from '../cr3bp/axis-speed-squared.ts';
import { findRootBrent } from '../events/find-root-brent.ts';
import { yAxisCrossing } from '../events/y-axis-crossing.ts';
import { propagate } from '../propagation/propagate.ts';
import type { AxisSegment } from './family-job.ts';
import { halfCrossingResidual } from './half-crossing-residual.ts';

export interface SeedCandidate {
  x0: number;
  vy0: number;
  halfCrossings: number;
  tHalfNd: number;
  jacobi: number;
  segment: AxisSegment;
}

export interface ScanOptions {
  /** Tolerance of the scan and of the root bracketing: loose, the roots are polished with the STM later. */
  rtol: number;
  atol: number;
  maxHalfTimeNd: number;
  primaryRadiusNd: number;
  secondaryRadiusNd: number;
  xL1: number;
  /** Largest distance from the nearer primary scanned on the far sides (nondimensional). */
  reachNd: number;
}

/** ẏ of a perpendicular start at (x, 0) with Jacobi constant C; NaN where the point is not reachable. */
export function perpendicularSpeed(mu: number, x: number, jacobi: number): number {
  const vSquared = axisSpeedSquared(mu, x, jacobi);
  return vSquared > 0 ? Math.sqrt(vSquared) : NaN;
}

/** Start points of a segment, denser toward the body they border (where roots crowd). */
export function segmentGrid(mu: number, segment: AxisSegment, points: number, o: ScanOptions): number[] {
  const grid: number[] = [];
  const stretched = (from: number, to: number, count: number) => {
    for (let i = 0; i < count; i++) {
      const u = (i + 0.5) / count;
      grid.push(from + (to - from) * u * u);
    }
  };
  const margin = 1.02;
  if (segment === 'far-primary') stretched(-mu - margin * o.primaryRadiusNd, -mu - o.reachNd, points);
  else if (segment === 'far-secondary') stretched(1 - mu + margin * o.secondaryRadiusNd, 1 - mu + o.reachNd, points);
  else {
    const half = Math.ceil(points / 2);
    stretched(-mu + margin * o.primaryRadiusNd, o.xL1, half);
    stretched(1 - mu - margin * o.secondaryRadiusNd, o.xL1, points - half);
  }
  return grid.sort((a, b) => a - b);
}

function crossingVx(mu: number, x0: number, vy0: number, maxCrossings: number, o: ScanOptions): number[] {
  const out: number[] = new Array(maxCrossings).fill(NaN);
  try {
    const run = propagate(mu, [x0, 0, 0, vy0], o.maxHalfTimeNd, {
      rtol: o.rtol, atol: o.atol, events: [yAxisCrossing({ terminalCount: maxCrossings })],
      collisionRadiusNd: Math.min(o.primaryRadiusNd, o.secondaryRadiusNd) * 0.5,
    });
    for (const hit of run.events) out[hit.count - 1] = hit.state[3];
  } catch {
    // Collisions and failed propagations leave NaN: no bracket uses them.
  }
  return out;
}

function halfCrossingAt(mu: number, x0: number, vy0: number, k: number, o: ScanOptions): { vx: number; t: number; earlier: number[] } {
  const r = halfCrossingResidual(mu, x0, vy0, k, { ...o, collisionRadiusNd: Math.min(o.primaryRadiusNd, o.secondaryRadiusNd) * 0.5 });
  return { vx: r.vx, t: r.tNd, earlier: r.earlierVx };
}

export function scanAxisSegment(
  mu: number, jacobi: number, segment: AxisSegment, direction: 1 | -1, maxHalfCrossings: number,
  gridPoints: number, o: ScanOptions,
): SeedCandidate[] {
  const xs = segmentGrid(mu, segment, gridPoints, o).filter((x) => perpendicularSpeed(mu, x, jacobi) > 0);
  const table = xs.map((x) => crossingVx(mu, x, direction * perpendicularSpeed(mu, x, jacobi), maxHalfCrossings, o));
  const found: SeedCandidate[] = [];
  for (let k = 1; k <= maxHalfCrossings; k++) {
    for (let i = 0; i + 1 < xs.length; i++) {
      const fa = table[i][k - 1], fb = table[i + 1][k - 1];
      if (!(fa * fb < 0)) continue;
      const vxAt = (x: number) => {
        const r = halfCrossingAt(mu, x, direction * perpendicularSpeed(mu, x, jacobi), k, o);
        if (!Number.isFinite(r.vx)) throw new Error('crossing lost');
        return r.vx;
      };
      let x0: number;
      try {
        x0 = findRootBrent(vxAt, xs[i], xs[i + 1], fa, fb, 1e-13, 100 * o.rtol);
      } catch {
        continue;
      }
      const vy0 = direction * perpendicularSpeed(mu, x0, jacobi);
      const check = halfCrossingAt(mu, x0, vy0, k, o);
      // A jump of ẋ (the crossing structure changed inside the bracket) is no root.
      if (!(Math.abs(check.vx) < 1e-4)) continue;
      // A root that already closed at an earlier crossing is a multiple cover of a shorter orbit.
      if (check.earlier.some((vx) => Math.abs(vx) < 1e-6)) continue;
      found.push({ x0, vy0, halfCrossings: k, tHalfNd: check.t, jacobi, segment });
    }
  }
  return found;
}
