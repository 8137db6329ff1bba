// Everything the catalog states about one symmetric periodic orbit, from one propagation over a full
// period with the 6×6 STM and the section and close-approach events.
import { jacobiConstant } from '../cr3bp/jacobi-constant.ts';
import { closestApproach } from '../events/closest-approach.ts';
import type { EventHit, EventSpec } from '../events/event-spec.ts';
import { propagate } from '../propagation/propagate.ts';
import { countLaps, type AxisCrossing, type LapCounts } from '../cr3bp/lap-signature.ts';
import { neckHalfWidth } from './neck-half-width.ts';
import { eigenvaluePair, stabilityIndices } from './stability-indices.ts';
import { orbitCheck } from './verify-orbit.ts';

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

interface EventSummary {
  laps: LapCounts;
  l1Passages: number;
  primaryMin: number;
  secondaryMin: number;
  farthest: number;
}

/** Laps, neck passages and extreme distances from the events of one full period. */
function summariseEvents(mu: number, x0: number, vy0: number, periodNd: number, events: readonly EventHit[]): EventSummary {
  // Crossings strictly inside the period; the start point (also a crossing) is added once by hand.
  const edge = 1e-6 * periodNd; // events this close to either end are the end points themselves
  const crossings: AxisCrossing[] = [{ x: x0, vy: vy0 }];
  const summary = {
    l1Passages: 0,
    primaryMin: Math.abs(x0 + mu),
    secondaryMin: Math.abs(x0 - 1 + mu),
    farthest: Math.abs(x0),
  };
  for (const e of events) {
    if (e.tNd <= edge || e.tNd >= periodNd - edge) continue;
    const s = e.state;
    switch (e.label) {
      case 'y=0': crossings.push({ x: s[0], vy: s[4] }); break;
      case 'neck': summary.l1Passages++; break;
      case 'primary': summary.primaryMin = Math.min(summary.primaryMin, Math.hypot(s[0] + mu, s[1], s[2])); break;
      case 'secondary': summary.secondaryMin = Math.min(summary.secondaryMin, Math.hypot(s[0] - 1 + mu, s[1], s[2])); break;
      case 'farthest': summary.farthest = Math.max(summary.farthest, Math.hypot(s[0], s[1], s[2])); break;
    }
  }
  return { ...summary, laps: countLaps(mu, crossings) };
}

/**
 * Lap counts and neck passages of the whole period from its first half: by the mirror theorem the second
 * half repeats the first half's crossings mirrored in y, which keep their x and ẏ, so the first half's
 * events count twice, the start once (summariseEvents counts it with the first half) and the T/2 crossing
 * once. Counting a full propagation instead is fragile for very unstable orbits: its return to the start
 * drifts in time (by 2.7e-3 TU for ν ≈ 1e7 near a brake orbit), so the start crossing is counted twice.
 */
function mirroredCounts(mu: number, x0: number, vy0: number, half: EventSummary, turn: AxisCrossing): { laps: LapCounts; l1Passages: number } {
  const turnLaps = countLaps(mu, [turn]);
  const start = countLaps(mu, [{ x: x0, vy: vy0 }]);
  return {
    laps: {
      primaryLaps: 2 * half.laps.primaryLaps - start.primaryLaps + turnLaps.primaryLaps,
      secondaryLaps: 2 * half.laps.secondaryLaps - start.secondaryLaps + turnLaps.secondaryLaps,
    },
    l1Passages: 2 * half.l1Passages,
  };
}

/** Lap counts and neck passages only, from half a period without the STM: a cheap screen before a seed is corrected. */
export function screenOrbit(context: AnalysisContext, x0: number, vy0: number, periodNd: number): { laps: LapCounts; l1Passages: number } {
  const { mu, xL1 } = context;
  const state0 = [x0, 0, 0, 0, vy0, 0];
  const events = eventsFor(mu, xL1, neckHalfWidth(mu, xL1, jacobiConstant(mu, state0)));
  const halfNd = periodNd / 2;
  const run = propagate(mu, state0, halfNd, { rtol: context.rtol, atol: context.atol, events });
  return mirroredCounts(mu, x0, vy0, summariseEvents(mu, x0, vy0, halfNd, run.events), { x: run.state[0], vy: run.state[4] });
}

/** The crossing of y = 0 nearest to T/2 (the orbit's other perpendicular crossing). */
function turnCrossing(events: readonly EventHit[], halfNd: number): AxisCrossing | null {
  let best: EventHit | null = null;
  for (const e of events) if (e.label === 'y=0' && (!best || Math.abs(e.tNd - halfNd) < Math.abs(best.tNd - halfNd))) best = e;
  return best ? { x: best.state[0], vy: best.state[4] } : null;
}

export function analyseOrbit(context: AnalysisContext, x0: number, vy0: number, periodNd: number): OrbitAnalysis {
  const { mu, xL1 } = context;
  const state0: OrbitAnalysis['state0'] = [x0, 0, 0, 0, vy0, 0];
  const jacobi = jacobiConstant(mu, state0);
  const events = eventsFor(mu, xL1, neckHalfWidth(mu, xL1, jacobi));
  const run = propagate(mu, state0, periodNd, { rtol: context.rtol, atol: context.atol, stm: true, events });
  const end = run.state;
  const monodromy = run.stm!;
  const indices = stabilityIndices(monodromy);
  const summary = summariseEvents(mu, x0, vy0, periodNd, run.events);
  const halfNd = periodNd / 2;
  const turn = turnCrossing(run.events, halfNd);
  const counts = turn
    ? mirroredCounts(mu, x0, vy0, summariseEvents(mu, x0, vy0, halfNd, run.events.filter((e) => e.tNd < halfNd)), turn)
    : { laps: summary.laps, l1Passages: summary.l1Passages };
  return {
    state0,
    periodNd,
    jacobi,
    monodromy,
    stabilityIndex: indices.inPlane,
    verticalStabilityIndex: indices.vertical,
    eigenvalues: [...eigenvaluePair(indices.inPlane), ...eigenvaluePair(indices.vertical)],
    primaryMinDistanceNd: summary.primaryMin,
    secondaryMinDistanceNd: summary.secondaryMin,
    maxDistanceNd: summary.farthest,
    l1Passages: counts.l1Passages,
    laps: counts.laps,
    ...orbitCheck(mu, state0, end),
  };
}
