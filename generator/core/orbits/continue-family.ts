// Pseudo-arclength continuation of a family of symmetric periodic orbits (Keller 1977; Doedel et al. 2007)
// in (x0, vy0), through folds of C, with a step rule that keeps every change of asinh(ν) small so that
// no stable window is stepped over.
import { analyseOrbit, type AnalysisContext } from './analyse-orbit.ts';
import { correctAtFixedX0, correctOnArc, familyTangent, type CorrectedOrbit, type CorrectorOptions } from './correct-on-arc.ts';
import type { FamilyMember } from './family-member.ts';

export type EndReason =
  | 'member-limit' | 'jacobi-range' | 'period-limit' | 'collision-primary' | 'collision-secondary'
  | 'brake-orbit' | 'signature-change' | 'lost-l1-passage' | 'precision-limit' | 'no-convergence'
  | 'unstable-far-from-windows' | 'closed-loop' | 'joins-family' | 'interrupted';

/**
 * Largest |ν| (either plane) of a member the catalog still trusts. Round-off in the half-period shot
 * grows like ε·√|λ| and in the monodromy like ε·|λ| (|λ| ≈ 2|ν|): at |λ| = 1e10 the corrector's
 * residual floor (ε·√|λ| ≈ 2e-11) meets its tolerance and the monodromy's small eigenvalue 1/λ is
 * below round-off, so past it single shooting in double precision gives no meaningful orbit.
 */
export const PRECISION_LIMIT_INDEX = 5e9;

/**
 * Below this |ν| round-off moves ν by about ε·|λ| < 1e-8 of itself, far less than the step rule allows: two
 * statements of one orbit that disagree there, or a change that does not fall with the step, mean the
 * corrector reached another orbit, so such an end is 'no-convergence', not 'precision-limit'.
 */
export const ROUND_OFF_VISIBLE_INDEX = PRECISION_LIMIT_INDEX / 100;

const roundOffVisible = (m: FamilyMember) => Math.max(Math.abs(m.analysis.stabilityIndex), Math.abs(m.analysis.verticalStabilityIndex)) >= ROUND_OFF_VISIBLE_INDEX;

/** |ẏ0| below this (≈ 1 m/s in Earth–Moon units) is a start on the zero-velocity curve: a brake orbit. */
export const BRAKE_SPEED_ND = 1e-3;

/** |ẏ| at a crossing below this (≈ 10 m/s) is near enough the zero-velocity curve that y = 0 degenerates there. */
const NEAR_BRAKE_SPEED_ND = 10 * BRAKE_SPEED_ND;

export interface ContinuationRules {
  maxMembers: number;
  jacobiMin: number;
  jacobiMax: number;
  maxPeriodNd: number;
  unstableStop: { indexAbove: number; members: number } | null;
  initialStepNd: number;
  maxStepNd: number;
  minStepNd: number;
  /** Largest change of asinh(ν) (in-plane and vertical) between neighbours. */
  maxIndexJump: number;
  /** Largest relative change of the period between neighbours. */
  maxPeriodJump: number;
  primaryRadiusNd: number;
  secondaryRadiusNd: number;
  /** Lap counts the family must keep (null: not checked, for reference families). */
  laps: { primaryLaps: number; secondaryLaps: number } | null;
  /** The family passes the L1 neck and must keep doing so. */
  needsNeckPassage: boolean;
}

export interface ContinuationResult {
  members: FamilyMember[];
  endReasonStart: EndReason;
  endReasonEnd: EndReason;
  /** At a 'signature-change' end: the first corrected orbit past it, which has the new signature. */
  beyondStart?: FamilyMember;
  beyondEnd?: FamilyMember;
}

export interface ContinuationHooks {
  onMember?(count: number): void;
  shouldStop?(): boolean;
}

export function memberFrom(context: AnalysisContext, corrected: CorrectedOrbit, arclength: number, previousTangent?: readonly [number, number]): FamilyMember {
  const tHalf = corrected.shot.tHalfNd;
  return {
    x0: corrected.x0,
    vy0: corrected.vy0,
    xHalf: corrected.shot.state[0],
    vyHalf: corrected.shot.state[3],
    halfCrossings: corrected.halfCrossings,
    tHalfNd: tHalf,
    arclength,
    analysis: analyseOrbit(context, corrected.x0, corrected.vy0, 2 * tHalf),
    tangent: familyTangent(corrected.shot, previousTangent),
  };
}

/** Why this member may not join the family (started with ẏ0 of sign `direction`), or null when it may. */
export function endReasonOf(member: FamilyMember, direction: number, rules: ContinuationRules): EndReason | null {
  const a = member.analysis;
  // ẏ0 through zero: the start crossing reached the zero-velocity curve (a brake orbit there). The march
  // goes on from the orbit's other crossing where it can; a family ends here when that crossing is a
  // brake point too or does not correct. (Reference families shrink to their equilibrium: not checked.)
  if (rules.laps && (member.vy0 * direction <= 0 || Math.abs(member.vy0) < BRAKE_SPEED_ND)) return 'brake-orbit';
  if (a.primaryMinDistanceNd < rules.primaryRadiusNd) return 'collision-primary';
  if (a.secondaryMinDistanceNd < rules.secondaryRadiusNd) return 'collision-secondary';
  if (a.jacobi < rules.jacobiMin || a.jacobi > rules.jacobiMax) return 'jacobi-range';
  if (a.periodNd > rules.maxPeriodNd) return 'period-limit';
  if (Math.max(Math.abs(a.stabilityIndex), Math.abs(a.verticalStabilityIndex)) > PRECISION_LIMIT_INDEX) return 'precision-limit';
  if (rules.needsNeckPassage && a.l1Passages === 0) return 'lost-l1-passage';
  if (rules.laps && (a.laps.primaryLaps !== rules.laps.primaryLaps || a.laps.secondaryLaps !== rules.laps.secondaryLaps)) {
    return 'signature-change';
  }
  return null;
}

/** How far a step goes against the step rule: above 1 it changes an index or the period too much. */
function stepExcess(previous: FamilyMember, next: FamilyMember, rules: ContinuationRules): number {
  const a = previous.analysis, b = next.analysis;
  return Math.max(
    Math.abs(Math.asinh(a.stabilityIndex) - Math.asinh(b.stabilityIndex)) / rules.maxIndexJump,
    Math.abs(Math.asinh(a.verticalStabilityIndex) - Math.asinh(b.verticalStabilityIndex)) / rules.maxIndexJump,
    Math.abs(a.periodNd - b.periodNd) / (rules.maxPeriodJump * a.periodNd),
  );
}

function tooFar(previous: FamilyMember, next: FamilyMember, rules: ContinuationRules): boolean {
  return stepExcess(previous, next, rules) > 1;
}

/**
 * Closing in on an end stops at steps this short (nondimensional): the end is then located far below
 * anything a user reads, and the finer minimum step is kept for steep stretches of a family.
 */
const CLOSE_IN_STEP_ND = 6.4e-8;

/**
 * A step's change of the indices falls in proportion to the step where ν is a smooth function along the
 * family; when halving the step leaves more than this share of the change, ν is round-off at that scale.
 */
const SMOOTH_CHANGE_SHARE = 0.75;

/**
 * A march that comes back, moving the same way, to an orbit already stored (its seed, or where the other
 * march stopped) within this many of its current steps has gone round a closed family (an isola in
 * (x0, ẏ0)); it must have travelled this many steps first, so that leaving the seed is not taken for coming back.
 */
const CLOSED_LOOP_STEPS = 1.5;
const CLOSED_LOOP_MIN_TRAVEL_STEPS = 20;

/**
 * Whether `member`, reached with a step of `stepNd` after `travelled`, is back at `target`: the same crossing
 * count, within the closing distance and, when stated from the same crossing, with the stored tangents (both
 * toward growing arclength) parallel. The seed may also be met stated from its other crossing, where the
 * tangents are not comparable.
 */
function closesOn(member: FamilyMember, target: FamilyMember, stepNd: number, travelled: number): boolean {
  if (member.halfCrossings !== target.halfCrossings || travelled < CLOSED_LOOP_MIN_TRAVEL_STEPS * stepNd) return false;
  const near = (x: number, vy: number) => Math.hypot(member.x0 - x, member.vy0 - vy) < CLOSED_LOOP_STEPS * stepNd;
  if (near(target.x0, target.vy0)) return member.tangent[0] * target.tangent[0] + member.tangent[1] * target.tangent[1] > 0.5;
  return near(target.xHalf, target.vyHalf);
}

/** Changes of the starting crossing one march may make (each re-states one orbit from its other crossing). */
const MAX_CROSSING_SWITCHES = 8;

/**
 * The same orbit stated from its other perpendicular crossing, with the marching direction there, or null
 * when that crossing is itself near the zero-velocity curve or does not correct. Used where the current
 * start crossing stops being a good continuation parameter: it reaches the zero-velocity curve (ẏ0 → 0,
 * a brake orbit at that crossing only) or the corrector fails there. The direction points away from the
 * previous member stated from the same crossing, so the march goes on along the family.
 */
function fromOtherCrossing(
  context: AnalysisContext, current: FamilyMember, previous: FamilyMember | null, corrector: CorrectorOptions,
): { member: FamilyMember; tangent: [number, number] } | null {
  if (!(Math.abs(current.vyHalf) > NEAR_BRAKE_SPEED_ND)) return null;
  // The second half mirrors the first, so T/2 is the same crossing count from either end.
  const corrected = correctAtFixedX0(context.mu, current.halfCrossings, current.xHalf, current.vyHalf, corrector);
  if (!corrected) return null;
  let member: FamilyMember;
  try {
    member = memberFrom(context, corrected, current.arclength);
  } catch {
    return null;
  }
  let tangent = member.tangent;
  if (previous) {
    const away = [member.x0 - previous.xHalf, member.vy0 - previous.vyHalf];
    if (tangent[0] * away[0]! + tangent[1] * away[1]! < 0) tangent = [-tangent[0], -tangent[1]];
  }
  return { member, tangent };
}

/**
 * One step beyond `current` with T/2 two crossings later or earlier: where the orbit touches the x-axis
 * (a tangency), a pair of crossings appears or vanishes before T/2 and the residual at the old count
 * jumps, though the family goes on. Null when neither count corrects to a continuous neighbour.
 */
function acrossTangency(
  context: AnalysisContext, current: FamilyMember, tangent: [number, number], sign: 1 | -1, stepNd: number,
  rules: ContinuationRules, corrector: CorrectorOptions,
): { member: FamilyMember; corrected: CorrectedOrbit } | null {
  for (const k of [current.halfCrossings + 2, current.halfCrossings - 2]) {
    if (k < 1) continue;
    const options = { ...corrector, maxTimeNd: Math.min(rules.maxPeriodNd, 3 * current.tHalfNd) };
    for (const step of [stepNd, 4 * stepNd, 16 * stepNd]) {
      const corrected = correctOnArc(context.mu, k, [current.x0, current.vy0], tangent, step, options);
      if (!corrected || corrected.shot.earlierVx.some((vx) => Math.abs(vx) < 1e-6)) continue;
      let member: FamilyMember;
      try {
        member = memberFrom(context, corrected, current.arclength + sign * Math.hypot(corrected.x0 - current.x0, corrected.vy0 - current.vy0), tangent);
      } catch {
        continue;
      }
      if (!tooFar(current, member, rules)) return { member, corrected };
    }
  }
  return null;
}

/** Continues from `start` in one direction (sign ±1 along its tangent); returns the new members in order. */
function march(
  context: AnalysisContext, start: FamilyMember, sign: 1 | -1, budget: number,
  rules: ContinuationRules, corrector: CorrectorOptions, hooks: ContinuationHooks, counted: { n: number },
  meet?: FamilyMember,
): { members: FamilyMember[]; end: EndReason; beyond?: FamilyMember } {
  const members: FamilyMember[] = [];
  let current = start;
  let previous: FamilyMember | null = null;
  let tangent: [number, number] = [sign * start.tangent[0], sign * start.tangent[1]];
  let travelled = 0;
  let step = rules.initialStepNd;
  let unstableRun = 0;
  let switches = 0;
  const accept = (member: FamilyMember) => {
    // The stored tangent points toward growing arclength whichever way we march.
    member.tangent = sign === 1 ? member.tangent : [-member.tangent[0], -member.tangent[1]];
    members.push(member);
    counted.n++;
    hooks.onMember?.(counted.n);
  };
  /**
   * Excess of the rejected steps from the current member, shortest last. A family can be very steep in ν
   * (near-degenerate orbits: ν changes by 1e8 per unit of arclength) and still smooth: the minimum step
   * lets the march pass such stretches, and the excesses tell a smooth stretch from round-off.
   */
  let rejected: number[] = [];
  let justSwitched = false;
  /**
   * Goes on from the current orbit's other crossing: 'switched', 'precision-limit' when the orbit's two
   * statements disagree on ν, or null when no switch is possible (never straight back to the crossing
   * just left: that would store the same orbit again and again).
   */
  const switchCrossing = (): 'switched' | 'precision-limit' | null => {
    if (justSwitched || switches >= MAX_CROSSING_SWITCHES || members.length >= budget) return null;
    const other = fromOtherCrossing(context, current, previous, corrector);
    if (!other) return null;
    // One orbit has one monodromy: its two statements differing by more than the step rule allows mean
    // double precision no longer resolves ν here (it grows faster than round-off can follow).
    if (tooFar(current, other.member, rules)) return roundOffVisible(current) ? 'precision-limit' : null;
    switches++;
    // The orbit is stored once more as stated from there, so that neighbours always share a crossing.
    accept(other.member);
    justSwitched = true;
    previous = null;
    current = other.member;
    rejected = [];
    tangent = other.tangent;
    step = rules.initialStepNd;
    return 'switched';
  };
  /**
   * Where no crossing corrects further: a brake point at either crossing is the family's own end; so is
   * a change of ν that no longer falls with the step (ν is round-off there: the precision limit).
   */
  const stuckEnd = (): EndReason => {
    if (rules.laps && Math.min(Math.abs(current.vy0), Math.abs(current.vyHalf)) < NEAR_BRAKE_SPEED_ND) return 'brake-orbit';
    const [longer, shorter] = rejected.slice(-2);
    if (longer !== undefined && shorter !== undefined && Number.isFinite(longer) && shorter > SMOOTH_CHANGE_SHARE * longer && roundOffVisible(current)) return 'precision-limit';
    return 'no-convergence';
  };
  for (;;) {
    if (members.length >= budget) return { members, end: 'member-limit' };
    if (hooks.shouldStop?.()) return { members, end: 'interrupted' };
    const options = { ...corrector, maxTimeNd: Math.min(rules.maxPeriodNd, 3 * current.tHalfNd) };
    let corrected = correctOnArc(context.mu, current.halfCrossings, [current.x0, current.vy0], tangent, step, options);
    let next: FamilyMember | null = null;
    let acrossCount = false;
    if (corrected) {
      try {
        next = memberFrom(context, corrected, current.arclength + sign * Math.hypot(corrected.x0 - current.x0, corrected.vy0 - current.vy0), tangent);
      } catch {
        next = null; // the full-period propagation failed (collision inside a body's centre, step limit)
      }
    }
    // Indices and period change continuously along a family: a jump that no step size removes is a breakdown.
    if (!next || tooFar(current, next, rules)) {
      rejected.push(next ? stepExcess(current, next, rules) : Infinity);
      step *= 0.5;
      if (step >= rules.minStepNd) continue;
      // No step at this crossing count and start crossing: another count (a tangency), or the other crossing.
      const across = acrossTangency(context, current, tangent, sign, rules.initialStepNd, rules, corrector);
      if (across) {
        next = across.member;
        corrected = across.corrected;
        step = rules.initialStepNd;
        acrossCount = true;
      } else {
        const switched = switchCrossing();
        if (switched === 'switched') continue;
        return { members, end: switched ?? stuckEnd() };
      }
    }
    const reason = endReasonOf(next, Math.sign(current.vy0), rules);
    if (reason) {
      // Close in on the boundary before giving up, so the family reaches as far as it truly goes. Not when
      // the step came from another crossing count: the old count cannot reach the boundary, and retrying
      // it would fall back to the same step and the same end for ever.
      if (!acrossCount && step * 0.25 >= CLOSE_IN_STEP_ND) {
        step *= 0.25;
        continue;
      }
      // A brake orbit at this crossing only: the family goes on, followed from the other crossing.
      if (reason === 'brake-orbit') {
        const switched = switchCrossing();
        if (switched === 'switched') continue;
        if (switched) return { members, end: switched };
      }
      // The orbit past a signature change is where the family continues into another one (kept to link them).
      if (reason === 'signature-change') return { members, end: reason, beyond: next };
      return { members, end: reason };
    }
    accept(next);
    rejected = [];
    justSwitched = false;
    travelled += Math.hypot(next.x0 - current.x0, next.vy0 - current.vy0);
    if (closesOn(next, start, step, travelled) || (meet && closesOn(next, meet, step, travelled))) return { members, end: 'closed-loop' };
    tangent = familyTangent(corrected!.shot, tangent);
    if (rules.unstableStop) {
      unstableRun = Math.abs(next.analysis.stabilityIndex) > rules.unstableStop.indexAbove ? unstableRun + 1 : 0;
      if (unstableRun >= rules.unstableStop.members) return { members, end: 'unstable-far-from-windows' };
    }
    if (corrected!.iterations <= 3 && !tooFar(current, next, { ...rules, maxIndexJump: rules.maxIndexJump / 2, maxPeriodJump: rules.maxPeriodJump / 2 })) {
      step = Math.min(step * 1.5, rules.maxStepNd);
    }
    previous = current;
    current = next;
  }
}

/** Continues a family both ways from a corrected seed; members come ordered by arclength. */
export function continueFamily(
  context: AnalysisContext, seed: FamilyMember, rules: ContinuationRules,
  corrector: CorrectorOptions, hooks: ContinuationHooks = {},
): ContinuationResult {
  const counted = { n: 1 };
  const budget = Math.max(0, rules.maxMembers - 1);
  const forward = march(context, seed, 1, Math.ceil(budget / 2), rules, corrector, hooks, counted);
  // Round a closed family and back: the other way would only go round it again.
  const backward = forward.end === 'closed-loop' ? { members: [], end: 'closed-loop' as const }
    : march(context, seed, -1, budget - forward.members.length, rules, corrector, hooks, counted, forward.members.at(-1));
  // The backward march came round to where the forward one stopped: the family is closed at both ends.
  const closed = backward.end === 'closed-loop';
  return {
    members: [...backward.members.reverse(), seed, ...forward.members],
    endReasonStart: backward.end,
    endReasonEnd: closed ? 'closed-loop' : forward.end,
    ...(backward.beyond ? { beyondStart: backward.beyond } : {}),
    ...(forward.beyond ? { beyondEnd: forward.beyond } : {}),
  };
}
