// Hold radius of a planar periodic CR3BP orbit (our term, DESIGN.md): the largest displacement along the
// section from the orbit's start point whose Poincaré return-map points stay on an invariant curve around the
// fixed point for N returns.
// Map: section y = 0 with ẏ of the start's sign and x on the start's segment (start-section.ts), at the
// orbit's Jacobi constant; one return = as many section crossings as the orbit itself makes in one period.
// Trial at displacement d: start (x0 + d, 0, 0, ẋ0, ẏ, 0) with ẏ from C (same sign), iterate N returns,
// judge the iterates in the normal frame of the linearised map (normal-frame.ts) with the criterion of
// invariant-curve-judge.ts; a missing return (none within 1.5 periods, an impact, or a start outside the
// Hill region) fails the trial. Search: hold-radius-search.ts.
// Displacements are tried from 1e-6 (0.4 km in the Earth–Moon system) up: a radius below that is reported
// as 0, which is what an unstable orbit gets (its first trial leaves the annulus within a return or two).
// Tolerance: the map runs at 1e-10 unless told otherwise, but that is not always enough: a return drifts by
// the integration error (~4e-10 per return at 1e-10 on a catalog E1M1 member with ν = 0.29), which over 200
// returns exceeds the smallest displacement tried and reads as a broken curve (radius 0, where 1e-12 finds
// ~400 km). The generator therefore runs it at the job's own tolerance (1e-12 in the demo). On the bench's
// E1M1 member both tolerances agree. Over 1000 returns even 1e-12 should be checked against a tighter run.
import { jacobiConstant } from '../cr3bp/jacobi-constant.ts';
import { assertMassRatio } from '../cr3bp/lagrange-points.ts';
import { searchHoldRadius, type SearchSettings } from './hold-radius-search.ts';
import { DEFAULT_CURVE_JUDGE, InvariantCurveJudge, type CurveFailure, type CurveJudgeSettings, type CurveVerdict } from './invariant-curve-judge.ts';
import { normalFrame, type NormalFrame } from './normal-frame.ts';
import { referencePeriod } from './reference-period.ts';
import { sectionLinearMap, type SectionLinearMap } from './section-linear-map.ts';
import { iterateSectionMap, sectionMap, type MapFailure } from './section-return-map.ts';

export interface HoldRadiusOptions {
  mu: number;
  /** Start state (x0, 0, 0, ẋ0, ẏ0, 0) of a planar periodic orbit on y = 0. */
  state0: ArrayLike<number>;
  periodNd: number;
  /** Returns per trial (default 200). */
  returns?: number;
  /** DOP853 tolerances of the map (default 1e-10 both). */
  rtol?: number;
  atol?: number;
  /** +1: displacements toward larger x (default), −1: toward smaller x. */
  side?: 1 | -1;
  search?: Partial<SearchSettings>;
  judge?: Partial<CurveJudgeSettings>;
  /** A step ending closer than this to a body's centre fails the trial (default 1e-9: the centres only). */
  primaryRadiusNd?: number;
  secondaryRadiusNd?: number;
  /** Most section points returned for the outermost holding curve (default 400). */
  maxCurvePoints?: number;
}

export type TrialFailure = CurveFailure | MapFailure;

export interface HoldTrial {
  displacementNd: number;
  holds: boolean;
  failure: TrialFailure | null;
  returns: number;
  verdict: CurveVerdict | null;
}

export interface HoldRadiusResult {
  /** Largest displacement along x (signed by side) that held; 0 when the smallest tried failed. */
  holdRadiusNd: number;
  /** Smallest displacement found to fail (Infinity when the cap held). */
  failingDisplacementNd: number;
  jacobi: number;
  /** In-plane stability index from the linearised section map, (a + d)/2. */
  sectionIndex: number;
  linearMap: SectionLinearMap;
  frame: NormalFrame;
  /** Turn per return about the fixed point on the outermost holding curve (rad), or NaN. */
  rotationPerReturnRad: number;
  /** Section points (x, ẋ) of the outermost holding curve, decimated; empty when none held. */
  curveX: Float64Array;
  curveVx: Float64Array;
  trials: HoldTrial[];
  sectionCrossingsPerReturn: number;
}

interface TrialDetail {
  trial: HoldTrial;
  xs: Float64Array;
  vxs: Float64Array;
}

function checkPositive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be a positive finite number, got ${value}`);
}

export function holdRadius(options: HoldRadiusOptions): HoldRadiusResult {
  const { mu, state0, periodNd } = options;
  assertMassRatio(mu);
  checkPositive('periodNd', periodNd);
  if (state0.length !== 6 || state0[2] !== 0 || state0[5] !== 0) {
    throw new RangeError('state0 must be a planar 6-state (z = ż = 0): the hold radius uses the planar section map');
  }
  const returns = options.returns ?? 200;
  if (!Number.isInteger(returns) || returns < 4 || returns > 100000) throw new RangeError(`returns must be an integer in [4, 100000], got ${returns}`);
  const tolerance = { rtol: options.rtol ?? 1e-10, atol: options.atol ?? 1e-10 };
  checkPositive('rtol', tolerance.rtol);
  checkPositive('atol', tolerance.atol);
  const side = options.side ?? 1;
  if (side !== 1 && side !== -1) throw new RangeError(`side must be 1 or -1, got ${side}`);
  const maxCurvePoints = options.maxCurvePoints ?? 400;
  if (!Number.isInteger(maxCurvePoints) || maxCurvePoints < 1) throw new RangeError(`maxCurvePoints must be a positive integer, got ${maxCurvePoints}`);
  const primaryRadiusNd = options.primaryRadiusNd ?? 1e-9;
  const secondaryRadiusNd = options.secondaryRadiusNd ?? 1e-9;
  checkPositive('primaryRadiusNd', primaryRadiusNd);
  checkPositive('secondaryRadiusNd', secondaryRadiusNd);

  const reference = referencePeriod(mu, state0, periodNd, tolerance);
  const section = reference.section;
  const jacobi = jacobiConstant(mu, state0);
  const map = sectionMap(mu, section, jacobi, reference.sectionCrossingsPerPeriod, periodNd, tolerance, primaryRadiusNd, secondaryRadiusNd);
  const linearMap = sectionLinearMap(mu, section.x0, section.vx0, section.vy0, periodNd);
  const frame = normalFrame(linearMap.a, linearMap.b, linearMap.c, linearMap.d);
  const judge = new InvariantCurveJudge(returns, { ...DEFAULT_CURVE_JUDGE, ...options.judge });
  const xs = new Float64Array(returns);
  const vxs = new Float64Array(returns);

  const trialAt = (d: number): TrialDetail => {
    const u0 = side * d;
    judge.begin(frame.m00 * u0, frame.m10 * u0, frame.linearAngleRad);
    const run = iterateSectionMap(map, section.x0 + u0, section.vx0, returns, (x, vx, i) => {
      xs[i] = x;
      vxs[i] = vx;
      const u = x - section.x0, v = vx - section.vx0;
      return judge.add(frame.m00 * u + frame.m01 * v, frame.m10 * u + frame.m11 * v);
    });
    const trial: HoldTrial = { displacementNd: d, holds: false, failure: run.failure, returns: run.returns, verdict: null };
    if (!run.failure) {
      trial.verdict = judge.verdict();
      trial.holds = trial.verdict.holds;
      trial.failure = trial.verdict.failure;
    }
    return { trial, xs: xs.slice(0, run.returns), vxs: vxs.slice(0, run.returns) };
  };

  const found = searchHoldRadius((d) => {
    const detail = trialAt(d);
    return { holds: detail.trial.holds, detail };
  }, {
    firstDisplacementNd: 1e-6, growthFactor: 2, maxDisplacementNd: 0.5, bisections: 6, ...options.search,
  });

  let curveX = new Float64Array(0), curveVx = new Float64Array(0);
  if (found.outermost) {
    const { xs: cx, vxs: cv } = found.outermost.detail;
    const stride = Math.ceil(cx.length / maxCurvePoints);
    const kept = Math.ceil(cx.length / stride);
    curveX = new Float64Array(kept);
    curveVx = new Float64Array(kept);
    for (let i = 0; i < kept; i++) {
      curveX[i] = cx[i * stride];
      curveVx[i] = cv[i * stride];
    }
  }
  return {
    holdRadiusNd: found.radiusNd,
    failingDisplacementNd: found.failingNd,
    jacobi,
    sectionIndex: (linearMap.a + linearMap.d) / 2,
    linearMap,
    frame,
    rotationPerReturnRad: found.outermost?.detail.trial.verdict?.rotationRad ?? NaN,
    curveX,
    curveVx,
    trials: found.trials.map((t) => t.detail.trial),
    sectionCrossingsPerReturn: reference.sectionCrossingsPerPeriod,
  };
}
