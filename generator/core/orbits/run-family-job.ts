// One job of the generator: find the seeds its rule asks for, continue every distinct family they start,
// locate the stability changes, screen the stable members (job.screening: screen-stable-members.ts) and
// hand back catalog-ready bundles. Pure numerics, synchronous.
import type { FamilyBundle, FamilyKind } from '../../../catalog-db/types.ts';
import { lagrangePoints } from '../cr3bp/lagrange-points.ts';
import { screenOrbit, type AnalysisContext } from './analyse-orbit.ts';
import { buildFamilyBundle } from './build-family-bundle.ts';
import { continueFamily, memberFrom, type ContinuationRules } from './continue-family.ts';
import { correctAtFixedX0, type CorrectedOrbit, type CorrectorOptions } from './correct-on-arc.ts';
import type { FamilyJob, JobHooks, JobResult } from './family-job.ts';
import type { FamilyMember } from './family-member.ts';
import { parseSignature } from './lap-signature.ts';
import { footprintOf, liesOnFamily } from './lies-on-family.ts';
import { locateStabilityChanges } from './locate-stability-changes.ts';
import { lyapunovGuess, retrogradeGuess } from './reference-seeds.ts';
import { cachedScan } from './cached-scan.ts';
import { screenStableMembers } from './screen-stable-members.ts';
import type { SeedCandidate } from './scan-axis-segment.ts';

interface Seed {
  corrected: CorrectedOrbit;
  halfCrossings: number;
  segment: string;
}

const familyLetter = (k: number): string => (k < 26 ? String.fromCharCode(97 + k) : `${familyLetter(Math.floor(k / 26) - 1)}${familyLetter(k % 26)}`);

/** Distance from the nearer primary: the farther a perpendicular start is, the better conditioned its shot. */
function clearance(mu: number, x: number): number {
  return Math.min(Math.abs(x + mu), Math.abs(x - 1 + mu));
}

/**
 * A symmetric orbit has two perpendicular crossings; the family is continued from the one farther from the
 * primaries, where the half-period shot is least sensitive (the other half is its mirror image).
 */
function betterConditionedStart(mu: number, halfCrossings: number, orbit: CorrectedOrbit, corrector: CorrectorOptions): CorrectedOrbit | null {
  const xHalf = orbit.shot.state[0];
  if (clearance(mu, xHalf) <= clearance(mu, orbit.x0)) return orbit;
  return correctAtFixedX0(mu, halfCrossings, xHalf, orbit.shot.state[3], corrector);
}

export function runFamilyJob(job: FamilyJob, hooks: JobHooks = {}): JobResult {
  const { system, seed: rule, limits, tolerance } = job;
  const mu = system.mu;
  const [L1, L2] = lagrangePoints(mu);
  const context: AnalysisContext = { mu, xL1: L1.x, rtol: tolerance.rtol, atol: tolerance.atol };
  const corrector: CorrectorOptions = {
    rtol: tolerance.rtol, atol: tolerance.atol, maxTimeNd: limits.maxPeriodNd,
    residualTolerance: Math.max(1e-11, 20 * tolerance.rtol), maxIterations: 12,
  };
  const primaryRadiusNd = system.primaryRadiusKm / system.lengthUnitKm;
  const secondaryRadiusNd = system.secondaryRadiusKm / system.lengthUnitKm;
  const laps = rule.kind === 'lap-signature' ? parseSignature(rule.signature, system.primaryLetter, system.secondaryLetter) : null;
  if (rule.kind === 'lap-signature' && !laps) {
    throw new RangeError(`signature must look like ${system.primaryLetter}2${system.secondaryLetter}1, got "${rule.signature}"`);
  }
  const rules: ContinuationRules = {
    ...limits,
    minStepNd: 1e-9,
    maxIndexJump: 0.25,
    maxPeriodJump: 0.02,
    primaryRadiusNd,
    secondaryRadiusNd,
    laps,
    needsNeckPassage: rule.kind === 'lap-signature',
  };

  const label = rule.kind === 'lap-signature' ? rule.signature : rule.kind === 'lyapunov' ? `${rule.point}-Lyapunov` : 'retrograde';
  const kind: FamilyKind = rule.kind === 'lap-signature' ? 'cycler'
    : rule.kind === 'lyapunov' ? (rule.point === 'L1' ? 'lyapunov-l1' : 'lyapunov-l2') : 'retrograde';

  const seeds = (): Seed[] => {
    if (rule.kind === 'lyapunov') {
      const point = rule.point === 'L1' ? L1 : L2;
      const [x0, vy0] = lyapunovGuess(mu, point.x, rule.amplitudeNd);
      const corrected = correctAtFixedX0(mu, 1, x0, vy0, corrector) ?? correctAtFixedX0(mu, 1, x0, -vy0, corrector);
      return corrected ? [{ corrected, halfCrossings: 1, segment: 'between' }] : [];
    }
    if (rule.kind === 'retrograde') {
      const [x0, vy0] = retrogradeGuess(mu, rule.distanceNd);
      const corrected = correctAtFixedX0(mu, 1, x0, vy0, corrector);
      return corrected ? [{ corrected, halfCrossings: 1, segment: 'far-secondary' }] : [];
    }
    const candidates: SeedCandidate[] = [];
    // Scan and screen at a loose tolerance: only signs and lap counts are needed; Newton polishes later.
    const loose = { rtol: Math.max(tolerance.rtol, 1e-10), atol: Math.max(tolerance.atol, 1e-10) };
    const scan = {
      ...loose, maxHalfTimeNd: limits.maxPeriodNd / 2, primaryRadiusNd,
      secondaryRadiusNd, xL1: L1.x, reachNd: 1.2,
    };
    for (const jacobi of rule.jacobiValues) {
      for (const segment of rule.segments) {
        for (const direction of rule.directions) {
          if (hooks.shouldStop?.()) return [];
          candidates.push(...cachedScan(mu, jacobi, segment, direction, rule.maxHalfCrossings, rule.gridPoints, scan));
        }
      }
    }
    return candidates.flatMap((c) => {
      const screen = screenOrbit(context, c.x0, c.vy0, 2 * c.tHalfNd);
      if (screen.l1Passages === 0 || screen.laps.primaryLaps !== laps!.primaryLaps || screen.laps.secondaryLaps !== laps!.secondaryLaps) {
        return [];
      }
      const corrected = correctAtFixedX0(mu, c.halfCrossings, c.x0, c.vy0, corrector);
      const start = corrected && betterConditionedStart(mu, c.halfCrossings, corrected, corrector);
      return start ? [{ corrected: start, halfCrossings: c.halfCrossings, segment: c.segment }] : [];
    });
  };

  const bundles: FamilyBundle[] = [];
  const continued: FamilyMember[][] = [];
  const notes: string[] = [];
  let interrupted = false;
  for (const seed of seeds()) {
    if (hooks.shouldStop?.()) {
      interrupted = true;
      break;
    }
    let start: FamilyMember;
    try {
      start = memberFrom(context, seed.corrected, 0);
    } catch {
      continue;
    }
    const a = start.analysis;
    const isKnown = (m: FamilyMember) => continued.some((members) => liesOnFamily(footprintOf(m), members));
    if (isKnown(start)) continue;
    if (laps && (a.laps.primaryLaps !== laps.primaryLaps || a.laps.secondaryLaps !== laps.secondaryLaps || a.l1Passages === 0)) continue;
    if (a.primaryMinDistanceNd < primaryRadiusNd || a.secondaryMinDistanceNd < secondaryRadiusNd) continue;

    const letter = familyLetter(continued.length);
    const familyLabel = `${label}/${letter}`;
    const progress = (members: number) => hooks.onProgress?.({
      jobKey: job.key, familyLabel, familiesDone: continued.length, members, maxMembers: limits.maxMembers,
    });
    progress(1);
    const result = continueFamily(context, seed.halfCrossings, start, rules, corrector, {
      onMember: progress,
      shouldStop: hooks.shouldStop,
    });
    const stopped = result.endReasonStart === 'interrupted' || result.endReasonEnd === 'interrupted';
    // A seed off the known members can still lead back onto a known family (it was found beyond that
    // family's ends or between sparse members): then it is that family again.
    if (!stopped && result.members.filter((m, i) => i % 4 === 0 && isKnown(m)).length >= 2) continue;
    continued.push(result.members);
    const map = stopped
      ? { members: result.members, changes: [], windows: [] }
      : locateStabilityChanges(context, seed.halfCrossings, result.members, job.indexTolerance, corrector);
    const bundle = buildFamilyBundle(system, {
      id: `${system.id}/${label}/${letter}`, jobKey: job.key, name: rule.kind === 'lap-signature' ? `${job.name} (${letter})` : job.name, kind, signature: label, seedSegment: seed.segment,
    }, map, { start: result.endReasonStart, end: result.endReasonEnd });
    bundles.push(bundle);
    if (!stopped && job.screening && bundle.stableWindows.length > 0) {
      const screened = screenStableMembers(system, bundle, job.screening, tolerance, {
        // From the first member screened on: the displays read members 0 as "seed search".
        onMember: (done, total) => done > 0 && hooks.onProgress?.({
          jobKey: job.key, familyLabel: `${familyLabel} screening`, familiesDone: continued.length - 1, members: done, maxMembers: total,
        }),
        shouldStop: hooks.shouldStop,
      });
      bundle.holdRadii = screened.holdRadii;
      bundle.modelScreenings = screened.modelScreenings;
      notes.push(...screened.notes);
      if (screened.interrupted) interrupted = true;
    }
    if (stopped || interrupted) {
      interrupted = true;
      break;
    }
  }
  return notes.length > 0 ? { bundles, interrupted, notes } : { bundles, interrupted };
}
