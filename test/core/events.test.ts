// Events located on DOP853's dense output (sign change over a step, then Brent on the interpolant; HNW 1993,
// §II.6) against brute force: a finely stepped integration brackets each event and bisection refines it,
// every trial time integrated afresh from t = 0 (common practice). Orbit: HNW 1993, §II.0.
import { describe, expect, it } from 'vitest';
import { closestApproach, propagate, yAxisCrossing, type EventSpec } from '../../generator/core/index.ts';
import { HNW_MU as MU, HNW_PERIOD, HNW_STATE_PLANAR as STATE0, maxAbsDifference } from './hnw-orbit.ts';

const TOLERANCE = 1e-13;
const DURATION = HNW_PERIOD - 0.05; // stop short of the return to the start, itself a perilune and a crossing
const GRID_STEP = 0.01;
const X_MOON = 1 - MU;
const X_EARTH = -MU;

const stateAt = (t: number) => propagate(MU, STATE0, t, { rtol: TOLERANCE, atol: TOLERANCE }).state;

/** The states on a fine grid, each segment integrated from the previous grid state. */
function gridStates(): { t: number; s: Float64Array }[] {
  const points: { t: number; s: Float64Array }[] = [{ t: 0, s: Float64Array.from(STATE0) }];
  for (let t = GRID_STEP; t < DURATION; t += GRID_STEP) {
    const previous = points[points.length - 1];
    points.push({ t, s: propagate(MU, previous.s, t - previous.t, { rtol: TOLERANCE, atol: TOLERANCE }).state });
  }
  return points;
}

/** Bisection on the sign of f(state(t)), each state integrated from t = 0. */
function bisect(f: (s: Float64Array) => number, a: number, b: number): number {
  let fa = f(stateAt(a));
  while (b - a > 1e-12) {
    const m = 0.5 * (a + b);
    const fm = f(stateAt(m));
    if (Math.sign(fm) === Math.sign(fa)) {
      a = m;
      fa = fm;
    } else b = m;
  }
  return 0.5 * (a + b);
}

function golden(f: (t: number) => number, a: number, b: number): number {
  const r = (Math.sqrt(5) - 1) / 2;
  let c = b - r * (b - a);
  let d = a + r * (b - a);
  while (b - a > 1e-9) {
    if (f(c) < f(d)) b = d;
    else a = c;
    c = b - r * (b - a);
    d = a + r * (b - a);
  }
  return 0.5 * (a + b);
}

const grid = gridStates();
const y = (s: Float64Array) => s[1];

/** Brute-force y = 0 crossings: times, x and vy there. */
const bruteCrossings = grid.slice(1)
  .map((p, k) => ({ a: grid[k], b: p }))
  .filter(({ a, b }) => y(a.s) * y(b.s) < 0) // strict: the start, on y = 0 itself, is not a crossing
  .map(({ a, b }) => {
    const t = bisect(y, a.t, b.t);
    const s = stateAt(t);
    return { t, x: s[0], vy: s[3] };
  });

function runEvents(events: EventSpec[]) {
  return propagate(MU, STATE0, DURATION, { rtol: TOLERANCE, atol: TOLERANCE, events });
}

describe('y = 0 crossings', () => {
  it('finds the same crossings as brute force, at the same times (to 1e-9)', () => {
    const run = runEvents([yAxisCrossing()]);
    expect(bruteCrossings.length).toBe(5); // the orbit's own shape: 5 interior crossings (HNW 1993, Fig. 0.1)
    expect(run.events.map((e) => e.count)).toEqual([1, 2, 3, 4, 5]);
    run.events.forEach((event, i) => {
      expect(Math.abs(event.tNd - bruteCrossings[i].t)).toBeLessThanOrEqual(1e-9);
      expect(Math.abs(event.state[1])).toBeLessThanOrEqual(1e-12);
      expect(maxAbsDifference(event.state, [...stateAt(event.tNd)].flatMap((v, k) => (k === 2 ? [0, v] : k === 3 ? [v, 0] : [v]))))
        .toBeLessThanOrEqual(1e-9);
    });
  });

  it('keeps only the crossings in the asked direction', () => {
    const up = runEvents([yAxisCrossing({ direction: 1 })]).events.map((e) => e.tNd);
    const down = runEvents([yAxisCrossing({ direction: -1 })]).events.map((e) => e.tNd);
    const expectedUp = bruteCrossings.filter((c) => c.vy > 0);
    const expectedDown = bruteCrossings.filter((c) => c.vy < 0);
    expect(expectedUp.length).toBeGreaterThan(0);
    expect(expectedDown.length).toBeGreaterThan(0);
    expect(up.length).toBe(expectedUp.length);
    expect(down.length).toBe(expectedDown.length);
    up.forEach((t, i) => expect(Math.abs(t - expectedUp[i].t)).toBeLessThanOrEqual(1e-9));
    down.forEach((t, i) => expect(Math.abs(t - expectedDown[i].t)).toBeLessThanOrEqual(1e-9));
  });

  it('keeps only the crossings inside a region of x, counting only those', () => {
    const run = runEvents([yAxisCrossing({ direction: 0, xMax: -0.6 }), yAxisCrossing({ xMin: 0, label: 'right' })]);
    const left = run.events.filter((e) => e.eventIndex === 0);
    const right = run.events.filter((e) => e.eventIndex === 1);
    const expectedLeft = bruteCrossings.filter((c) => c.x < -0.6);
    const expectedRight = bruteCrossings.filter((c) => c.x > 0);
    expect(left.map((e) => e.count)).toEqual(expectedLeft.map((_, i) => i + 1));
    expect(right.map((e) => e.label)).toEqual(expectedRight.map(() => 'right'));
    left.forEach((e, i) => expect(Math.abs(e.tNd - expectedLeft[i].t)).toBeLessThanOrEqual(1e-9));
    right.forEach((e, i) => expect(Math.abs(e.tNd - expectedRight[i].t)).toBeLessThanOrEqual(1e-9));
  });

  it('stops at the k-th crossing when terminal, leaving the state there', () => {
    for (const k of [1, 3]) {
      const run = runEvents([yAxisCrossing({ terminalCount: k })]);
      expect(run.terminated).toBe(true);
      expect(Math.abs(run.tFinalNd - bruteCrossings[k - 1].t)).toBeLessThanOrEqual(1e-9);
      expect(run.events.length).toBe(k);
      expect(maxAbsDifference(run.state, stateAt(run.tFinalNd))).toBeLessThanOrEqual(1e-9);
    }
    // A terminal count never reached: the run ends at the requested time.
    const unreached = runEvents([yAxisCrossing({ terminalCount: 99 })]);
    expect(unreached.terminated).toBe(false);
    expect(unreached.tFinalNd).toBe(DURATION);
  });

  // Two events with roots in the same step: each must be located from the true end-of-step state.
  it('stops at the 2nd downward crossing while another event fires in the same steps', () => {
    const down = bruteCrossings.filter((c) => c.vy < 0);
    const run = runEvents([yAxisCrossing({ label: 'all' }), yAxisCrossing({ direction: -1, terminalCount: 2, label: 'down' })]);
    expect(Math.abs(run.tFinalNd - down[1].t)).toBeLessThanOrEqual(1e-9);
    expect(run.events.filter((e) => e.label === 'all').length).toBe(bruteCrossings.filter((c) => c.t <= down[1].t).length);
  });
});

describe('closest approaches', () => {
  for (const [name, xBody] of [['perilune', X_MOON], ['perigee', X_EARTH]] as const) {
    it(`${name}: times and distances as brute-force minimisation of the distance`, () => {
      const distance = (s: ArrayLike<number>) => Math.hypot(s[0] - xBody, s[1]);
      const d = grid.map((p) => distance(p.s));
      const minima: { t: number; distance: number }[] = [];
      for (let k = 1; k < grid.length - 1; k++) {
        if (d[k] < d[k - 1] && d[k] <= d[k + 1]) {
          // Time of the minimum: the sign change of r·v (well conditioned), by bisection with restarts.
          const t = bisect((s) => (s[0] - xBody) * s[2] + s[1] * s[3], grid[k - 1].t, grid[k + 1].t);
          // Its value: golden-section search on the distance itself (slow but independent of r·v).
          const tGolden = golden((time) => distance(stateAt(time)), grid[k - 1].t, grid[k + 1].t);
          minima.push({ t, distance: distance(stateAt(tGolden)) });
        }
      }
      const run = runEvents([closestApproach(xBody, name)]);
      expect(minima.length).toBeGreaterThan(0);
      expect(run.events.length).toBe(minima.length);
      run.events.forEach((event, i) => {
        expect(Math.abs(event.tNd - minima[i].t)).toBeLessThanOrEqual(1e-9);
        expect(Math.abs(distance(event.state) - minima[i].distance)).toBeLessThanOrEqual(1e-10);
      });
    });
  }
});
