// Screenings of CR3BP orbits in the bicircular model (Sun; Simó et al. 1995) and the elliptic model (lunar
// e = 0.0549, common practice; Szebehely 1967, ch. 10), 12 synodic months (29.530589 d each, astronomical
// almanac, from memory), 8 phases. Lap rules of orbits/lap-signature.ts (DESIGN.md).
// Checks: the CR3BP limits never break a stable cycler; an L1 Lyapunov orbit (ν ~ 1e3) breaks within two
// periods under the Sun or the eccentricity, sooner than its own round-off makes it break in the CR3BP;
// the per-period lap counts agree with a second count made with the core's EventLocator on the same run.
import { beforeAll, describe, expect, it } from 'vitest';
import { bicircularEquations, bicircularParameters, screenInModel, type ScreeningResult } from '../../generator/core/beyond/index.ts';
import { createDop853Workspace, integrateDop853 } from '../../generator/core/dop853/index.ts';
import { EventLocator } from '../../generator/core/events/event-locator.ts';
import { countLaps } from '../../generator/core/cr3bp/lap-signature.ts';
import { lyapunovL1, MU, stableE1M1, TIME_UNIT_DAYS, type TestOrbit } from './helpers/earth-moon-orbits.ts';

const SPAN_ND = (12 * 29.530589) / TIME_UNIT_DAYS;

describe('screening in the bicircular and elliptic models', () => {
  let stable: TestOrbit;
  let lyapunov: TestOrbit;
  let sunStable: ScreeningResult;
  beforeAll(() => {
    stable = stableE1M1();
    lyapunov = lyapunovL1();
    sunStable = screenInModel({ model: 'bicircular', mu: MU, state0: stable.state0, periodNd: stable.periodNd, laps: stable.analysis.laps, spanNd: SPAN_ND });
  });

  it('never breaks a stable E1M1 cycler in the CR3BP limits (sunMass = 0, e = 0), all 8 phases', () => {
    expect(Math.abs(stable.analysis.stabilityIndex)).toBeLessThan(1);
    const wholePeriods = Math.floor(SPAN_ND / stable.periodNd);
    for (const limit of [
      { model: 'bicircular' as const, sun: { sunMass: 0 } },
      { model: 'elliptic' as const, eccentricity: 0 },
    ]) {
      const result = screenInModel({ ...limit, mu: MU, state0: stable.state0, periodNd: stable.periodNd, laps: stable.analysis.laps, spanNd: SPAN_ND });
      expect(result.phases).toHaveLength(8);
      expect(result.survivingFraction).toBe(1);
      expect(result.sectionCrossingsPerPeriod).toBe(1);
      for (const phase of result.phases) {
        expect(phase.survived).toBe(true);
        expect(phase.firstBrokenPeriod).toBeNull();
        expect(phase.periodsHeld).toBe(wholePeriods);
        // Back on the fixed point every period, to the integration error of the 1e-10 runs.
        expect(phase.maxDepartureNd).toBeLessThan(1e-7);
        for (const period of phase.periods) {
          expect([period.primaryLaps, period.secondaryLaps]).toEqual([1, 1]);
          expect(period.endNd).toBeCloseTo((phase.periods.indexOf(period) + 1) * stable.periodNd, 6);
        }
      }
    }
  });

  it('breaks an L1 Lyapunov orbit within two periods in both models, at every phase', () => {
    for (const model of ['bicircular', 'elliptic'] as const) {
      const result = screenInModel({ model, mu: MU, state0: lyapunov.state0, periodNd: lyapunov.periodNd, laps: lyapunov.analysis.laps, spanNd: SPAN_ND });
      expect(result.survivingFraction).toBe(0);
      for (const phase of result.phases) {
        expect(phase.firstBrokenPeriod, `${model} phase ${phase.phaseRad}`).not.toBeNull();
        expect(phase.firstBrokenPeriod!).toBeLessThanOrEqual(2);
        // Early stop: the run ends at the break, long before the span.
        expect(phase.breakAtNd!).toBeLessThan(2.5 * lyapunov.periodNd);
        expect(phase.periods.at(-1)!.holds).toBe(false);
      }
    }
  });

  it('breaks it sooner than the CR3BP run itself does (there round-off grows ~2ν ≈ 2500× per period)', () => {
    const opts = { mu: MU, state0: lyapunov.state0, periodNd: lyapunov.periodNd, laps: lyapunov.analysis.laps, spanNd: SPAN_ND, rtol: 1e-12, atol: 1e-12 };
    const alone = screenInModel({ ...opts, model: 'bicircular', sun: { sunMass: 0 }, phasesCount: 1 }).phases[0];
    expect(alone.periodsHeld).toBeGreaterThanOrEqual(3);
    const withSun = screenInModel({ ...opts, model: 'bicircular' });
    for (const phase of withSun.phases) expect(phase.periodsHeld).toBeLessThan(alone.periodsHeld);
  });

  it('counts the laps of every period as the core EventLocator does on the same bicircular run', () => {
    const [x0, , , , vy0] = stable.state0;
    for (const phase of sunStable.phases) {
      const rhs = bicircularEquations(MU, bicircularParameters({ sunPhaseRad: phase.phaseRad }));
      const ws = createDop853Workspace(6);
      const locator = new EventLocator([{ label: 'y=0', g: (_t, s) => s[1], direction: 0 }], false, 6);
      locator.start(0, stable.state0);
      const end = phase.breakAtNd ?? SPAN_ND;
      integrateDop853(rhs, ws, 0, stable.state0, end + 1e-9, { rtol: 1e-10, atol: 1e-10, dense: true }, locator);
      // Periods end at returns to the start section: y = 0 with ẏ < 0 and x < −μ (one per period for this orbit).
      let crossings = [{ x: x0, vy: vy0 }];
      const periods: Array<[number, number]> = [];
      for (const hit of locator.hits) {
        const s = hit.state;
        if (s[4] < 0 && s[0] < -MU) {
          const laps = countLaps(MU, crossings);
          periods.push([laps.primaryLaps, laps.secondaryLaps]);
          crossings = [{ x: s[0], vy: s[4] }];
        } else crossings.push({ x: s[0], vy: s[4] });
      }
      const whole = phase.periods.filter((p) => Number.isFinite(p.departureNd));
      expect(periods.slice(0, whole.length)).toEqual(whole.map((p) => [p.primaryLaps, p.secondaryLaps]));
      if (phase.breakReason === 'laps' && !Number.isFinite(phase.periods.at(-1)!.departureNd)) {
        // Broken mid-period: the open period's counts so far.
        const laps = countLaps(MU, crossings);
        expect([laps.primaryLaps, laps.secondaryLaps]).toEqual([phase.periods.at(-1)!.primaryLaps, phase.periods.at(-1)!.secondaryLaps]);
      }
    }
  });

  it('reports consistent phases: break fields together, departures only from held periods', () => {
    expect(sunStable.sun!.sunMass).toBeGreaterThan(3e5);
    expect(sunStable.phases.map((p) => p.phaseRad)).toEqual(Array.from({ length: 8 }, (_, k) => (2 * Math.PI * k) / 8));
    for (const phase of sunStable.phases) {
      expect(phase.survived).toBe(phase.firstBrokenPeriod === null);
      expect(phase.breakReason === null).toBe(phase.survived);
      if (!phase.survived) expect(phase.firstBrokenPeriod).toBe(phase.periodsHeld + 1);
      const held = phase.periods.filter((p) => p.holds);
      expect(held).toHaveLength(phase.periodsHeld);
      expect(phase.maxDepartureNd).toBe(held.length ? Math.max(...held.map((p) => p.departureNd)) : 0);
      expect(phase.maxPositionDepartureNd).toBeLessThanOrEqual(phase.maxDepartureNd);
    }
    expect(sunStable.survivingFraction).toBe(sunStable.phases.filter((p) => p.survived).length / 8);
  });

  it('rejects bad input with a message naming the field', () => {
    const base = { model: 'bicircular' as const, mu: MU, state0: stable.state0, periodNd: stable.periodNd, laps: stable.analysis.laps, spanNd: 10 };
    expect(() => screenInModel({ ...base, laps: { primaryLaps: 2, secondaryLaps: 1 } })).toThrow(/laps/);
    expect(() => screenInModel({ ...base, model: 'quadcircular' as never })).toThrow(/model/);
    expect(() => screenInModel({ ...base, phasesCount: 0 })).toThrow(/phasesCount/);
    expect(() => screenInModel({ ...base, spanNd: -1 })).toThrow(/spanNd/);
    expect(() => screenInModel({ ...base, state0: [0.8, 0.1, 0, 0, 0.3, 0] })).toThrow(/y = 0/);
    expect(() => screenInModel({ ...base, model: 'elliptic', eccentricity: 1 })).toThrow(/eccentricity/);
  });
});
