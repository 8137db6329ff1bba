// One job of the generator: find the seeds its rule asks for (lap signatures: root edges of the (x0, C)
// discovery grids, discovery/), continue every distinct family they start,
// locate the stability changes, screen the stable members (job.screening: screen-stable-members.ts) and
// hand back catalog-ready bundles. Pure numerics, synchronous.
import type { FamilyBundle, FamilyKind } from './family-rows.ts';
import { lagrangePoints } from '../cr3bp/lagrange-points.ts';
import type { AnalysisContext } from './analyse-orbit.ts';
import { buildFamilyBundle } from './build-family-bundle.ts';
import { continueFamily, endReasonOf, memberFrom, type ContinuationRules } from './continue-family.ts';
import { correctAtFixedX0, type CorrectedOrbit, type CorrectorOptions } from './correct-on-arc.ts';
import type { FamilyJob, JobHooks, JobInputs, JobResult } from './family-job.ts';
import type { FamilyMember } from './family-member.ts';
import { parseSignature } from '../cr3bp/lap-signature.ts';
import { footprintOf, liesOnFamily } from './lies-on-family.ts';
import { partOffKnownFamilies } from './part-off-known-families.ts';
import { locateStabilityChanges } from './locate-stability-changes.ts';
import { lyapunovGuess, retrogradeGuess } from './reference-seeds.ts';
import { discoverCandidates, residualOptionsOf, type DiscoveryResult } from './discovery/discover-candidates.ts';
import { FamilyCoverage } from './discovery/family-coverage.ts';
import { jobDiscoveryRequests } from './discovery/job-discovery-requests.ts';
import { candidatesOfSignature, orderCandidates } from './discovery/order-candidates.ts';
import { refineCandidate } from './discovery/refine-candidate.ts';
import { screenStableMembers } from './screen-stable-members.ts';
import { asFamilyMembers, storedOrbitFootprint } from './audit-footprint.ts';
import { axisSegmentOf } from '../cr3bp/axis-segment.ts';
import { storedFamilyTrace } from './stored-family-trace.ts';

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
 * primaries, where the half-period shot is least sensitive (the other half is its mirror image). Where that
 * crossing lies near the zero-velocity curve the correction there can fail or slide onto a neighbouring
 * root (near-brake orbits crowd): then the orbit is kept as found.
 */
function betterConditionedStart(mu: number, halfCrossings: number, orbit: CorrectedOrbit, corrector: CorrectorOptions): CorrectedOrbit {
  const xHalf = orbit.shot.state[0];
  if (clearance(mu, xHalf) <= clearance(mu, orbit.x0)) return orbit;
  const mirrored = correctAtFixedX0(mu, halfCrossings, xHalf, orbit.shot.state[3], corrector);
  const sameOrbit = mirrored && Math.abs(mirrored.shot.tHalfNd - orbit.shot.tHalfNd) <= SAME_HALF_PERIOD_ND * Math.max(1, orbit.shot.tHalfNd);
  return sameOrbit ? mirrored : orbit;
}

/** Half periods this close (relative) belong to one orbit seen from its two crossings. */
const SAME_HALF_PERIOD_ND = 1e-6;

export function runFamilyJob(job: FamilyJob, hooks: JobHooks = {}, inputs: JobInputs = {}): JobResult {
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
    // Steep stretches need steps this short (ν can change by 1e8 per unit arclength near degenerate
    // orbits); 1e-12 is still some 50 times the corrector's resolution of x0 and ẏ0.
    minStepNd: 1e-12,
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

  const referenceSeeds = (): Seed[] => {
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
    return [];
  };

  const bundles: FamilyBundle[] = [];
  const continued: FamilyMember[][] = [];
  const notes: string[] = [];
  const isKnown = (m: FamilyMember) => continued.some((members) => liesOnFamily(footprintOf(m), members));

  /** Continues the family of one seed; 'known' and 'rejected' tell the seed search it was fruitless. */
  const followSeed = (seed: Seed): 'known' | 'rejected' | 'written' | 'interrupted' => {
    let start: FamilyMember;
    try {
      start = memberFrom(context, seed.corrected, 0);
    } catch {
      return 'rejected';
    }
    const a = start.analysis;
    if (isKnown(start)) return 'known';
    if (laps && (a.laps.primaryLaps !== laps.primaryLaps || a.laps.secondaryLaps !== laps.secondaryLaps || a.l1Passages === 0)) return 'rejected';
    if (a.primaryMinDistanceNd < primaryRadiusNd || a.secondaryMinDistanceNd < secondaryRadiusNd) return 'rejected';
    // Corrected at fixed x0, a seed can land outside the range (C, period, trusted |ν|); a family that enters
    // it has seeds inside. Kept, such a seed was a family of one orbit ended at its own start.
    const outside = endReasonOf(start, Math.sign(start.vy0), rules);
    if (outside === 'jacobi-range' || outside === 'period-limit' || outside === 'precision-limit') return 'rejected';

    const letter = familyLetter(continued.length);
    const familyLabel = `${label}/${letter}`;
    const progress = (members: number) => hooks.onProgress?.({
      jobKey: job.key, familyLabel, familiesDone: continued.length, members, maxMembers: limits.maxMembers,
    });
    progress(1);
    const continuation = continueFamily(context, start, rules, corrector, {
      onMember: progress,
      shouldStop: hooks.shouldStop,
    });
    if (continuation.endReasonStart === 'interrupted' || continuation.endReasonEnd === 'interrupted') return 'interrupted';
    // A seed off the known members can still lead onto a known family: it is that family again, or a part
    // of it that the known one did not reach (kept up to where they meet). Sampled first: most do not touch.
    const touches = continuation.members.some((m, i) => i % 4 === 0 && isKnown(m));
    const parted = touches ? partOffKnownFamilies(continuation, start, isKnown) : { kind: 'new' as const, result: continuation };
    if (parted.kind === 'known') return 'known';
    const result = parted.result;
    continued.push(result.members);
    coverage?.addFamily(result.members.map((m) => ({ x0: m.x0, vy0: m.vy0, xHalf: m.xHalf, vyHalf: m.vyHalf, jacobi: m.analysis.jacobi, halfCrossings: m.halfCrossings })));
    const map = locateStabilityChanges(context, result.members, job.indexTolerance, corrector, hooks.shouldStop);
    if (!map) return 'interrupted';
    const bundle = buildFamilyBundle(system, {
      id: `${system.id}/${label}/${letter}`, jobKey: job.key, name: rule.kind === 'lap-signature' ? `${job.name} (${letter})` : job.name, kind, signature: label, seedSegment: seed.segment,
    }, map, {
      start: result.endReasonStart, end: result.endReasonEnd, beyondStart: result.beyondStart, beyondEnd: result.beyondEnd,
    });
    if (job.screening && bundle.stableWindows.length > 0) {
      const screened = screenStableMembers(system, bundle, job.screening, tolerance, {
        // From the first member screened on: the displays read members 0 as "seed search".
        onMember: (done, total) => done > 0 && hooks.onProgress?.({
          jobKey: job.key, familyLabel: `${familyLabel} screening`, familiesDone: continued.length - 1, members: done, maxMembers: total,
        }),
        shouldStop: hooks.shouldStop,
      });
      if (screened.interrupted) return 'interrupted';
      bundle.holdRadii = screened.holdRadii;
      bundle.modelScreenings = screened.modelScreenings;
      notes.push(...screened.notes);
    }
    // Only a finished family (continued, windows located, screened) leaves the job: a run that stops
    // later keeps it, one that stops earlier recomputes it.
    bundles.push(bundle);
    hooks.onFamily?.(bundle);
    return 'written';
  };

  let coverage: FamilyCoverage | null = null;
  let seedSearch: JobResult['seedSearch'];
  const finish = (interrupted: boolean): JobResult => ({
    bundles, interrupted, ...(notes.length > 0 ? { notes } : {}), ...(seedSearch ? { seedSearch } : {}),
  });
  // Families a stopped run already wrote for this job come first, in their order: the search skips
  // their seeds, and the families it finds next get the letters they would have had in one run.
  const stored = (inputs.stored ?? []).map((family) => storedFamilyTrace(mu, family, tolerance));
  for (const family of stored) continued.push(asFamilyMembers(family.points));
  if (rule.kind !== 'lap-signature') {
    for (const seed of referenceSeeds()) {
      if (hooks.shouldStop?.()) return finish(true);
      if (followSeed(seed) === 'interrupted') return finish(true);
    }
    return finish(false);
  }

  if (inputs.handoffs) {
    for (const handoff of inputs.handoffs) {
      if (hooks.shouldStop?.()) return finish(true);
      // The half period ends at the crossing count the orbit itself has (its mirror image is the other half).
      const { halfCrossings } = storedOrbitFootprint(mu, handoff.state0, handoff.periodNd, tolerance);
      const corrected = correctAtFixedX0(mu, halfCrossings, handoff.state0[0]!, handoff.state0[4]!, corrector);
      const start = corrected && betterConditionedStart(mu, halfCrossings, corrected, corrector);
      if (start && followSeed({ corrected: start, halfCrossings, segment: axisSegmentOf(mu, start.x0) }) === 'interrupted') return finish(true);
    }
    return finish(false);
  }
  const discovered = inputs.discovered ?? discoverForJob(job, hooks);
  if (discovered === null) return finish(true);
  coverage = new FamilyCoverage(mu, new Map(discovered.map((d) => [FamilyCoverage.gridId(d.request.segment, d.request.direction), { xs: d.xs, levels: d.request.levels }])));
  for (const family of stored) coverage.addFamily(family.points);
  const wanted = discovered
    .filter((d) => rule.segments.includes(d.request.segment) && rule.directions.includes(d.request.direction))
    .flatMap((d) => candidatesOfSignature(d.candidates, laps!, rule.maxHalfCrossings));
  // Roots are refined as their grids were computed (every grid of the job shares these settings).
  const residualOptions = residualOptionsOf(jobDiscoveryRequests(job)[0]!);
  const fruitless = new Map<string, { known: number; rejected: number }>();
  const ordered = orderCandidates(wanted);
  seedSearch = { candidates: ordered.length, covered: 0, tried: 0 };
  for (const candidate of ordered) {
    if (hooks.shouldStop?.()) return finish(true);
    if (coverage.covers(candidate)) {
      seedSearch.covered++;
      continue;
    }
    const piece = `${candidate.segment}${candidate.direction}:${candidate.piece}`;
    const tries = fruitless.get(piece) ?? { known: 0, rejected: 0 };
    if (tries.known >= MAX_KNOWN_TRIES_PER_PIECE || tries.rejected >= MAX_REJECTED_TRIES_PER_PIECE) continue;
    seedSearch.tried++;
    const root = refineCandidate(mu, candidate, residualOptions);
    const corrected = root && correctAtFixedX0(mu, candidate.halfCrossings, root.x0, root.vy0, corrector);
    const start = corrected && betterConditionedStart(mu, candidate.halfCrossings, corrected, corrector);
    const outcome = start ? followSeed({ corrected: start, halfCrossings: candidate.halfCrossings, segment: candidate.segment }) : 'rejected';
    if (outcome === 'interrupted') return finish(true);
    if (outcome === 'known') tries.known++;
    if (outcome === 'rejected') tries.rejected++;
    fruitless.set(piece, tries);
  }
  return finish(false);
}

/**
 * Root edges of one piece of the zero set that lead to a known family, or to nothing (no root, no
 * convergence, another signature, a collision), before the rest of the piece is given up: bounds the
 * work on pieces that are one known family the coverage resolves poorly, or no family at all.
 */
const MAX_KNOWN_TRIES_PER_PIECE = 40;
const MAX_REJECTED_TRIES_PER_PIECE = 12;

/** The job's own discovery grids, when the run layer did not compute them once for all jobs. */
function discoverForJob(job: FamilyJob, hooks: JobHooks): DiscoveryResult[] | null {
  const requests = jobDiscoveryRequests(job);
  const total = requests.length;
  const results: DiscoveryResult[] = [];
  for (const [n, request] of requests.entries()) {
    const result = discoverCandidates(request, {
      shouldStop: hooks.shouldStop,
      onLevel: (done, all) => hooks.onDiscovery?.({ jobKey: job.key, gridsDone: n, grids: total, pointsDone: done, points: all }),
    });
    if (result.interrupted) return null;
    results.push(result);
  }
  return results;
}
