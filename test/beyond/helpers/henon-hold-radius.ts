// The hold-radius machinery (invariant-curve-judge.ts, hold-radius-search.ts) on Hénon's map: displacement
// d along the x-axis from the elliptic fixed point at the origin, N iterates per trial. The map's own check
// before it is trusted with the Poincaré map of an orbit.
import { henonStep } from './henon-map.ts';
import { DEFAULT_CURVE_JUDGE, InvariantCurveJudge, type CurveJudgeSettings, type CurveVerdict } from '../../../generator/core/beyond/invariant-curve-judge.ts';
import { searchHoldRadius, type SearchResult, type SearchSettings } from '../../../generator/core/beyond/hold-radius-search.ts';

export interface HenonHoldOptions {
  iterates?: number;
  search?: Partial<SearchSettings>;
  judge?: Partial<CurveJudgeSettings>;
}

export interface HenonTrialDetail {
  verdict: CurveVerdict;
  /** Iterates of the trial (x, y interleaved), up to where it stopped. */
  points: Float64Array;
}

/** Runs one trial from (d, 0): the judge's verdict and the iterates. */
export function henonTrial(cosAlpha: number, displacement: number, iterates: number, judge: InvariantCurveJudge): HenonTrialDetail {
  const sinAlpha = Math.sqrt(1 - cosAlpha * cosAlpha);
  const p = Float64Array.of(displacement, 0);
  const points = new Float64Array(2 * iterates);
  judge.begin(displacement, 0, Math.atan2(sinAlpha, cosAlpha));
  let i = 0;
  for (; i < iterates; i++) {
    henonStep(cosAlpha, sinAlpha, p);
    points[2 * i] = p[0];
    points[2 * i + 1] = p[1];
    if (!judge.add(p[0], p[1])) {
      i++;
      break;
    }
  }
  return { verdict: judge.verdict(), points: points.slice(0, 2 * i) };
}

export function henonHoldRadius(cosAlpha: number, options: HenonHoldOptions = {}): SearchResult<HenonTrialDetail> {
  if (!(Math.abs(cosAlpha) < 1)) throw new RangeError(`cosAlpha must be in (−1, 1), got ${cosAlpha}`);
  const iterates = options.iterates ?? 200;
  const judge = new InvariantCurveJudge(iterates, { ...DEFAULT_CURVE_JUDGE, ...options.judge });
  const search: SearchSettings = { firstDisplacementNd: 1e-3, growthFactor: 2, maxDisplacementNd: 2, bisections: 10, ...options.search };
  return searchHoldRadius((d) => {
    const detail = henonTrial(cosAlpha, d, iterates, judge);
    return { holds: detail.verdict.holds, detail };
  }, search);
}
