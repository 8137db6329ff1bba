// Everything the catalog states about one symmetric periodic orbit, from one propagation over a full
// period with the 6×6 STM and the section and close-approach events.
import { jacobiConstant } from '../cr3bp/jacobi-constant.ts';
import { closestApproach } from '../events/closest-approach.ts';
import type { EventSpec } from '../events/event-spec.ts';
import { propagate } from '../propagation/propagate.ts';
import { countLaps, type AxisCrossing, type LapCounts } from './lap-signature.ts';
import { neckHalfWidth } from './neck-half-width.ts';
import { eigenvaluePair, stabilityIndices } from './stability-indices.ts';

export interface AnalysisContext {
  mu: number;
  xL1: number;
  rtol: number;
  atol: number;
}

export interface OrbitAnalysis {
  state0: [number, number, number, number, number, number];
  periodNd: number;
  jacobi: number;
  monodromy: Float64Array;
  stabilityIndex: number;
  verticalStabilityIndex: number;
  eigenvalues: Array<[number, number]>;
  primaryMinDistanceNd: number;
  secondaryMinDistanceNd: number;
  maxDistanceNd: number;
  l1Passages: number;
  laps: LapCounts;
  closureError: number;
  jacobiDrift: number;
}

function eventsFor(mu: number, xL1: number, neckHalfWidthNd: number): EventSpec[] {
  return [
    { label: 'y=0', g: (_t, s) => s[1], direction: 0 },
    { label: 'neck', g: (_t, s) => s[0] - xL1, direction: 0, accept: (_t, s) => Math.abs(s[1]) < neckHalfWidthNd },
    closestApproach(-mu, 'primary'),
    closestApproach(1 - mu, 'secondary'),
    { label: 'farthest', g: (_t, s) => s[0] * s[3] + s[1] * s[4] + s[2] * s[5], direction: -1 },
  ];
}

export function analyseOrbit(context: AnalysisContext, x0: number, vy0: number, periodNd: number): OrbitAnalysis {
  const { mu, xL1 } = context;
  const state0: OrbitAnalysis['state0'] = [x0, 0, 0, 0, vy0, 0];
  const jacobi = jacobiConstant(mu, state0);
  const events = eventsFor(mu, xL1, neckHalfWidth(mu, xL1, jacobi));
  const run = propagate(mu, state0, periodNd, { rtol: context.rtol, atol: context.atol, stm: true, events });
  const end = run.state;
  const closureError = Math.hypot(...Array.from(end, (v, i) => v - state0[i]));
  const jacobiDrift = Math.abs(jacobiConstant(mu, end) - jacobi);
  const monodromy = run.stm!;
  const indices = stabilityIndices(monodromy);

  // Crossings strictly inside the period; the start point (also a crossing) is added once by hand.
  const edge = 1e-9 * periodNd;
  const inside = run.events.filter((e) => e.tNd > edge && e.tNd < periodNd - edge);
  const crossings: AxisCrossing[] = [{ x: x0, vy: vy0 }];
  let l1Passages = 0;
  let primaryMin = Math.hypot(x0 + mu, 0);
  let secondaryMin = Math.abs(x0 - 1 + mu);
  let farthest = Math.abs(x0);
  for (const e of inside) {
    const s = e.state;
    switch (e.label) {
      case 'y=0': crossings.push({ x: s[0], vy: s[4] }); break;
      case 'neck': l1Passages++; break;
      case 'primary': primaryMin = Math.min(primaryMin, Math.hypot(s[0] + mu, s[1], s[2])); break;
      case 'secondary': secondaryMin = Math.min(secondaryMin, Math.hypot(s[0] - 1 + mu, s[1], s[2])); break;
      case 'farthest': farthest = Math.max(farthest, Math.hypot(s[0], s[1], s[2])); break;
    }
  }
  return {
    state0,
    periodNd,
    jacobi,
    monodromy,
    stabilityIndex: indices.inPlane,
    verticalStabilityIndex: indices.vertical,
    eigenvalues: [...eigenvaluePair(indices.inPlane), ...eigenvaluePair(indices.vertical)],
    primaryMinDistanceNd: primaryMin,
    secondaryMinDistanceNd: secondaryMin,
    maxDistanceNd: farthest,
    l1Passages,
    laps: countLaps(mu, crossings),
    closureError,
    jacobiDrift,
  };
}
