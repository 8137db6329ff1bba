// The audit's own search at one Jacobi level, for one lap-signature job, one x-axis segment and one start
// direction: the roots of the seed scan (scan-axis-segment.ts, mirror theorem, Roy & Ovenden 1955),
// corrected with Newton on ẏ0 (Howell 1984) and kept when the corrected orbit has the job's lap
// signature, passes the L1 neck, misses both bodies and stays inside the job's limits (C range, period,
// the precision limit of continue-family.ts): the orbits a complete catalog must hold. Pure numerics; discovery's grid is not used (the audit checks it).
import { lagrangePoints } from '../cr3bp/lagrange-points.ts';
import { analyseOrbit, screenOrbit, type AnalysisContext } from './analyse-orbit.ts';
import { cachedScan } from './cached-scan.ts';
import { PRECISION_LIMIT_INDEX } from './continue-family.ts';
import { correctAtFixedX0, type CorrectorOptions } from './correct-on-arc.ts';
import type { AxisSegment, FamilyJob } from './family-job.ts';
import { parseSignature, type LapCounts } from '../cr3bp/lap-signature.ts';
import type { OrbitFootprint } from './lies-on-family.ts';
import type { ScanOptions, SeedCandidate } from './scan-axis-segment.ts';

/** A lap-signature job as the audit needs it (a FamilyJob whose seed rule is a lap signature). */
export type LapSignatureJob = FamilyJob & { seed: Extract<FamilyJob['seed'], { kind: 'lap-signature' }> };

/** A corrected symmetric orbit the audit found: where and how, and its two perpendicular crossings. */
export interface AuditOrbit extends OrbitFootprint {
  vy0: number;
  halfCrossings: number;
  segment: AxisSegment;
  direction: 1 | -1;
}

/** Everything the audit's numerics need about a job, worked out once per job. */
export interface AuditContext {
  job: LapSignatureJob;
  analysis: AnalysisContext;
  corrector: CorrectorOptions;
  scan: ScanOptions;
  laps: LapCounts;
  /** Start points per segment: the job's times the audit's grid factor. */
  gridPoints: number;
  primaryRadiusNd: number;
  secondaryRadiusNd: number;
}

/**
 * The audit scans a grid `gridFactor` times as dense as the job's: a coarse grid misses pairs of roots that
 * fall in one cell (no sign change between them), and the audit must not share discovery's blind spots.
 */
export function auditContext(job: LapSignatureJob, gridFactor: number): AuditContext {
  const { system, limits, tolerance } = job;
  const laps = parseSignature(job.seed.signature, system.primaryLetter, system.secondaryLetter);
  if (!laps) throw new RangeError(`${job.key}: signature must look like ${system.primaryLetter}2${system.secondaryLetter}1, got "${job.seed.signature}"`);
  const xL1 = lagrangePoints(system.mu)[0].x;
  const primaryRadiusNd = system.primaryRadiusKm / system.lengthUnitKm;
  const secondaryRadiusNd = system.secondaryRadiusKm / system.lengthUnitKm;
  // The same tolerances as the generator's: the scan only needs signs, Newton polishes.
  const loose = { rtol: Math.max(tolerance.rtol, 1e-10), atol: Math.max(tolerance.atol, 1e-10) };
  return {
    job,
    analysis: { mu: system.mu, xL1, rtol: tolerance.rtol, atol: tolerance.atol },
    corrector: {
      rtol: tolerance.rtol, atol: tolerance.atol, maxTimeNd: limits.maxPeriodNd,
      residualTolerance: Math.max(1e-11, 20 * tolerance.rtol), maxIterations: 12,
    },
    scan: { ...loose, maxHalfTimeNd: limits.maxPeriodNd / 2, primaryRadiusNd, secondaryRadiusNd, xL1, reachNd: 1.2 },
    laps,
    gridPoints: Math.round(gridFactor * job.seed.gridPoints),
    primaryRadiusNd,
    secondaryRadiusNd,
  };
}

/**
 * Laps and neck passages of scan roots, kept across the jobs of one scan task: the screen does not depend
 * on the job (for the same tolerance), and every job of a system screens the same roots.
 */
export type ScreenCache = Map<SeedCandidate, { tolerance: string; screen: ReturnType<typeof screenOrbit> }>;

function screened(context: AuditContext, c: SeedCandidate, cache?: ScreenCache): ReturnType<typeof screenOrbit> {
  const tolerance = `${context.analysis.rtol},${context.analysis.atol}`;
  const hit = cache?.get(c);
  if (hit && hit.tolerance === tolerance) return hit.screen;
  const screen = screenOrbit(context.analysis, c.x0, c.vy0, 2 * c.tHalfNd);
  cache?.set(c, { tolerance, screen });
  return screen;
}

const sameLaps = (a: LapCounts, b: LapCounts) => a.primaryLaps === b.primaryLaps && a.secondaryLaps === b.secondaryLaps;

/** The candidate corrected and kept if it is an orbit the catalog must hold; null otherwise. */
function catalogOrbitOf(context: AuditContext, c: SeedCandidate, direction: 1 | -1, screens?: ScreenCache): AuditOrbit | null {
  const { job, analysis, corrector, laps } = context;
  const mu = job.system.mu;
  const screen = screened(context, c, screens);
  if (screen.l1Passages === 0 || !sameLaps(screen.laps, laps)) return null;
  const corrected = correctAtFixedX0(mu, c.halfCrossings, c.x0, c.vy0, corrector);
  if (!corrected) return null;
  const periodNd = 2 * corrected.shot.tHalfNd;
  const orbit = analyseOrbit(analysis, corrected.x0, corrected.vy0, periodNd);
  if (orbit.l1Passages === 0 || !sameLaps(orbit.laps, laps)) return null;
  if (orbit.primaryMinDistanceNd < context.primaryRadiusNd || orbit.secondaryMinDistanceNd < context.secondaryRadiusNd) return null;
  if (orbit.jacobi < job.limits.jacobiMin || orbit.jacobi > job.limits.jacobiMax || periodNd > job.limits.maxPeriodNd) return null;
  if (Math.max(Math.abs(orbit.stabilityIndex), Math.abs(orbit.verticalStabilityIndex)) > PRECISION_LIMIT_INDEX) return null;
  return {
    x0: corrected.x0, vy0: corrected.vy0, xHalf: corrected.shot.state[0], periodNd, jacobi: orbit.jacobi,
    halfCrossings: c.halfCrossings, segment: c.segment, direction,
  };
}

export function auditScan(context: AuditContext, jacobi: number, segment: AxisSegment, direction: 1 | -1, screens?: ScreenCache): AuditOrbit[] {
  const { job } = context;
  const candidates = cachedScan(job.system.mu, jacobi, segment, direction, job.seed.maxHalfCrossings, context.gridPoints, context.scan);
  return candidates.flatMap((c) => {
    try {
      return catalogOrbitOf(context, c, direction, screens) ?? [];
    } catch {
      return []; // a propagation that fails (a collision) is no orbit of a catalog
    }
  });
}
