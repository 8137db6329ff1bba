// Whether the iterates of an area-preserving map starting near an elliptic fixed point lie on an invariant
// curve around it (a KAM curve, or a chain of islands around it) rather than wandering off. Our criterion,
// applied to iterates in the normal frame of the fixed point (normal-frame.ts), where invariant curves near
// the fixed point are nearly circles:
//  1. every iterate exists (the caller fails the trial when a return is missing);
//  2. annulus: every iterate's distance from the fixed point stays within a factor radiusRatioLimit (4) of the
//     start's (checked as the iterates come, so escaping orbits stop early; invariant curves seen so far, up to
//     the last one around the fixed point, stay within a factor 2.6 of their start in the normal frame);
//  3. circle order: the angles about the fixed point of the start and its iterates keep the cyclic order of
//     a rotation (circle-order-violations.ts; at most orderViolationsAllowed exceptions, default 0). The
//     map on an invariant curve around the fixed point is an orientation-preserving circle homeomorphism,
//     so this holds exactly for any number of iterates, even next to a resonance; iterates in a chaotic
//     layer, or circling an island away from the centre, break it.
// A finite number of iterates cannot tell a curve from a "sticky" chaotic orbit that lingers near one for
// longer: with N = 200 such an orbit passes (Hénon's map has one that escapes only after ~7600 iterates), which
// is why the hold radius is defined "for N returns".
// The mean turn per iterate is reported too, as a weighted Birkhoff average (Das, Saiki, Sander & Yorke
// 2017, Nonlinearity 30) over all iterates, with the difference of the two half-run averages. That
// difference was our first criterion and is not one: with 200 iterates it converges too slowly near a
// resonance (it needs many beat periods) to tell a curve from a chaotic layer.
import { circleOrderViolations } from './circle-order-violations.ts';
import { weightedBirkhoffAverage } from './weighted-birkhoff-average.ts';

export interface CurveJudgeSettings {
  /** Largest ratio of an iterate's distance to the start's, either way (default 4). */
  radiusRatioLimit: number;
  /** Order violations tolerated (default 0). */
  orderViolationsAllowed: number;
}

export const DEFAULT_CURVE_JUDGE: CurveJudgeSettings = { radiusRatioLimit: 4, orderViolationsAllowed: 0 };

export type CurveFailure = 'annulus' | 'order' | 'too-few';

export interface CurveVerdict {
  holds: boolean;
  failure: CurveFailure | null;
  /** Mean turn per iterate (rad), weighted Birkhoff average over all iterates; NaN with fewer than 4. */
  rotationRad: number;
  /** |difference| of the two half-run averages (rad); NaN with fewer than 4 iterates. */
  rotationMismatchRad: number;
  /** Circle-order violations among the start and the iterates (0 on an invariant curve). */
  orderViolations: number;
  /** Largest and smallest distance over the start's. */
  radiusRatioMax: number;
  radiusRatioMin: number;
}

const TWO_PI = 2 * Math.PI;

export class InvariantCurveJudge {
  private readonly turns: Float64Array;
  /** Angles of the start (index 0) and of the iterates. */
  private readonly angles: Float64Array;
  private count = 0;
  private previousAngle = 0;
  private radius0 = 0;
  private linearAngle = 0;
  private ratioMax = 1;
  private ratioMin = 1;
  private failed: CurveFailure | null = null;

  constructor(readonly capacity: number, readonly settings: CurveJudgeSettings = DEFAULT_CURVE_JUDGE) {
    if (!Number.isInteger(capacity) || capacity < 4) throw new RangeError(`iterate count must be an integer ≥ 4, got ${capacity}`);
    if (!(settings.radiusRatioLimit > 1)) throw new RangeError(`radiusRatioLimit must be > 1, got ${settings.radiusRatioLimit}`);
    if (!Number.isInteger(settings.orderViolationsAllowed) || settings.orderViolationsAllowed < 0) {
      throw new RangeError(`orderViolationsAllowed must be an integer ≥ 0, got ${settings.orderViolationsAllowed}`);
    }
    this.turns = new Float64Array(capacity);
    this.angles = new Float64Array(capacity + 1);
  }

  /** Starts a trial at (X0, Y0) (normal-frame offset from the fixed point, not zero). */
  begin(X0: number, Y0: number, linearAngleRad: number): void {
    this.radius0 = Math.hypot(X0, Y0);
    if (!(this.radius0 > 0)) throw new RangeError('the start must differ from the fixed point');
    this.previousAngle = Math.atan2(Y0, X0);
    this.angles[0] = this.previousAngle;
    this.linearAngle = linearAngleRad;
    this.count = 0;
    this.ratioMax = 1;
    this.ratioMin = 1;
    this.failed = null;
  }

  /** Adds the next iterate; false once the trial has failed (the caller may stop iterating). */
  add(X: number, Y: number): boolean {
    if (this.failed) return false;
    const ratio = Math.hypot(X, Y) / this.radius0;
    if (ratio > this.ratioMax) this.ratioMax = ratio;
    if (ratio < this.ratioMin) this.ratioMin = ratio;
    const limit = this.settings.radiusRatioLimit;
    if (!(ratio <= limit && ratio >= 1 / limit)) {
      this.failed = 'annulus';
      return false;
    }
    const angle = Math.atan2(Y, X);
    // Turn on the branch nearest the linear turn: (linear − π, linear + π].
    let turn = angle - this.previousAngle - this.linearAngle;
    turn -= TWO_PI * Math.round(turn / TWO_PI);
    this.previousAngle = angle;
    if (this.count < this.capacity) {
      this.turns[this.count++] = turn + this.linearAngle;
      this.angles[this.count] = angle;
    }
    return true;
  }

  get iterates(): number {
    return this.count;
  }

  verdict(): CurveVerdict {
    const n = this.count;
    const enough = n >= 4;
    const half = n >> 1;
    const first = enough ? weightedBirkhoffAverage(this.turns, 0, half) : NaN;
    const second = enough ? weightedBirkhoffAverage(this.turns, half, n) : NaN;
    const mismatch = Math.abs(first - second);
    const violations = circleOrderViolations(this.angles, n + 1);
    let failure: CurveFailure | null = this.failed;
    if (!failure && !enough) failure = 'too-few';
    if (!failure && violations > this.settings.orderViolationsAllowed) failure = 'order';
    return {
      holds: failure === null,
      failure,
      rotationRad: enough ? weightedBirkhoffAverage(this.turns, 0, n) : NaN,
      rotationMismatchRad: enough ? mismatch : NaN,
      orderViolations: violations,
      radiusRatioMax: this.ratioMax,
      radiusRatioMin: this.ratioMin,
    };
  }
}
