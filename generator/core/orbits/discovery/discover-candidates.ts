// Discovery for one x-axis segment and start direction: the residual grid over (x0, C) and the root
// edges of its zero set. Every lap-signature job of a system with the same grid shares this result.
import type { AxisSegment } from '../family-job.ts';
import { segmentGrid, type ScanOptions } from '../scan-axis-segment.ts';
import type { ResidualOptions } from '../half-crossing-residual.ts';
import { computeResidualGrid, type GridProgress } from './residual-grid.ts';
import type { ZeroCandidate } from './zero-candidate.ts';
import { zeroSetCandidates } from './zero-set-candidates.ts';
import { jumpEdgeCandidates } from './jump-edge-candidates.ts';
import { zeroVelocityEdgeCandidates } from './zero-velocity-edge-candidates.ts';

/** One grid: the scan options (loose tolerance: signs, crossing times and laps only) plus its axes. */
export interface DiscoveryRequest extends ScanOptions {
  mu: number;
  segment: AxisSegment;
  direction: 1 | -1;
  /** Start points along the segment (denser toward the bodies). */
  gridPoints: number;
  /** Jacobi levels of the grid, increasing. */
  levels: number[];
  maxHalfCrossings: number;
}

export interface DiscoveryResult {
  request: DiscoveryRequest;
  /** Grid points propagated (reachable starts only count as work, but all are listed). */
  gridPoints: number;
  xs: number[];
  candidates: ZeroCandidate[];
  /** True when a stop request ended the grid early (no candidates then). */
  interrupted: boolean;
}

/** Identifies the grid a request describes; requests with equal keys give equal results. */
export function discoveryKey(request: DiscoveryRequest): string {
  const { maxHalfCrossings: _ignored, ...rest } = request;
  return JSON.stringify(rest);
}

export function collisionRadiusOf(request: Pick<DiscoveryRequest, 'primaryRadiusNd' | 'secondaryRadiusNd'>): number {
  return 0.5 * Math.min(request.primaryRadiusNd, request.secondaryRadiusNd);
}

/** How a root of the request's grid is followed: its loose tolerance, time limit and collision radius. */
export function residualOptionsOf(request: DiscoveryRequest): ResidualOptions {
  return { rtol: request.rtol, atol: request.atol, maxHalfTimeNd: request.maxHalfTimeNd, collisionRadiusNd: collisionRadiusOf(request) };
}

export function discoverCandidates(request: DiscoveryRequest, progress: GridProgress = {}): DiscoveryResult {
  const xs = segmentGrid(request.mu, request.segment, request.gridPoints, request);
  const levels = [...request.levels].sort((a, b) => a - b);
  const options = { ...residualOptionsOf(request), xL1: request.xL1 };
  const grid = computeResidualGrid(request.mu, request.segment, request.direction, xs, levels, request.maxHalfCrossings, options, progress);
  const gridPoints = xs.length * levels.length;
  if (!grid) return { request, gridPoints, xs, candidates: [], interrupted: true };
  const onGrid = zeroSetCandidates(grid);
  const firstPiece = onGrid.reduce((most, c) => Math.max(most, c.piece + 1), 0);
  const withinEdges = jumpEdgeCandidates(grid, options, firstPiece, progress.shouldStop);
  if (!withinEdges) return { request, gridPoints, xs, candidates: [], interrupted: true };
  const nextPiece = withinEdges.reduce((most, c) => Math.max(most, c.piece + 1), firstPiece);
  const atCurve = zeroVelocityEdgeCandidates(grid, options, nextPiece, progress.shouldStop);
  if (!atCurve) return { request, gridPoints, xs, candidates: [], interrupted: true };
  return { request, gridPoints, xs, candidates: [...onGrid, ...withinEdges, ...atCurve], interrupted: false };
}
