// Hold radius (our term, DESIGN.md): Poincaré return map at fixed Jacobi constant on the orbit's start section.
// Checks against outside facts: the linearised section map is area-preserving with trace 2ν (Hénon 1973, A&A 28,
// ν from the generator's independent full monodromy); a stable E1M1 cycler (|ν| < 1) holds a positive
// radius whose curve points keep the Jacobi constant and lie in circle order; an L1 Lyapunov orbit (ν ~ 1e3,
// unstable: displaced points leave along the unstable direction by the factor λ ≈ 2ν per return) holds none.
import { beforeAll, describe, expect, it } from 'vitest';
import { holdRadius, sectionLinearMap, circleOrderViolations, normalFrame, type HoldRadiusResult } from '../../generator/core/beyond/index.ts';
import { jacobiConstant } from '../../generator/core/cr3bp/jacobi-constant.ts';
import { propagate } from '../../generator/core/propagation/propagate.ts';
import { yAxisCrossing } from '../../generator/core/events/y-axis-crossing.ts';
import { LENGTH_UNIT_KM, lyapunovL1, MU, stableE1M1, type TestOrbit } from './helpers/earth-moon-orbits.ts';

describe('hold radius', () => {
  let stable: TestOrbit;
  let lyapunov: TestOrbit;
  let held: HoldRadiusResult;
  beforeAll(() => {
    stable = stableE1M1();
    lyapunov = lyapunovL1();
    held = holdRadius({ mu: MU, state0: stable.state0, periodNd: stable.periodNd });
  });

  it('linearises the section map with det 1 and trace 2ν of the full monodromy (Hénon 1973)', () => {
    for (const orbit of [stable, lyapunov]) {
      const [x0, , , vx0, vy0] = orbit.state0;
      const L = sectionLinearMap(MU, x0, vx0, vy0, orbit.periodNd);
      const nu = orbit.analysis.stabilityIndex;
      expect(L.a * L.d - L.b * L.c).toBeCloseTo(1, 6);
      expect(Math.abs((L.a + L.d) / 2 - nu)).toBeLessThan(1e-6 * Math.max(1, Math.abs(nu)));
    }
  });

  it('is positive for a stable E1M1 cycler, between the last holding and the first failing trial', () => {
    expect(Math.abs(stable.analysis.stabilityIndex)).toBeLessThan(1);
    expect(stable.analysis.laps).toEqual({ primaryLaps: 1, secondaryLaps: 1 });
    expect(held.frame.elliptic).toBe(true);
    expect(held.holdRadiusNd).toBeGreaterThan(1e-5); // more than ~4 km
    expect(held.failingDisplacementNd).toBeGreaterThan(held.holdRadiusNd);
    expect(held.failingDisplacementNd - held.holdRadiusNd).toBeLessThan(0.05 * held.holdRadiusNd);
    expect(held.trials.find((t) => t.displacementNd === held.holdRadiusNd)?.holds).toBe(true);
    const failing = held.trials.find((t) => t.displacementNd === held.failingDisplacementNd)!;
    expect(failing.holds).toBe(false);
    expect(failing.failure).not.toBeNull();
    // Sanity of scale: well under the distance to the Moon's surface at perilune (~1500 km at this member).
    expect(held.holdRadiusNd * LENGTH_UNIT_KM).toBeLessThan(1500);
  });

  it('returns the outermost holding curve: ≤ 400 section points at the orbit’s Jacobi constant, in circle order', () => {
    const n = held.curveX.length;
    expect(n).toBeGreaterThan(100);
    expect(n).toBeLessThanOrEqual(400);
    const [x0, , , , vy0] = stable.state0;
    const angles: number[] = [];
    for (let i = 0; i < n; i++) {
      // ẏ from C at the section point, sign of the start: the point must be reachable at that C …
      const x = held.curveX[i], vx = held.curveVx[i];
      const twiceOmega = x * x + (2 * (1 - MU)) / Math.abs(x + MU) + (2 * MU) / Math.abs(x - 1 + MU);
      const vy2 = twiceOmega - held.jacobi - vx * vx;
      expect(vy2).toBeGreaterThan(0);
      expect(jacobiConstant(MU, [x, 0, 0, vx, Math.sign(vy0) * Math.sqrt(vy2), 0])).toBeCloseTo(held.jacobi, 12);
      const u = x - x0, v = vx;
      angles.push(Math.atan2(held.frame.m10 * u + held.frame.m11 * v, held.frame.m00 * u + held.frame.m01 * v));
    }
    // … and, in the normal frame, the points (every return: 200 ≤ 400 are kept) keep the order of a rotation.
    expect(circleOrderViolations(angles)).toBe(0);
  });

  it('uses returns of the core CR3BP propagator: one return from the curve’s first point lands on its second', () => {
    // Independent of the section watch: the core propagate with a y = 0 event (ẏ < 0 on the far side of the Earth).
    const [x0, , , , vy0] = stable.state0;
    const x = held.curveX[0], vx = held.curveVx[0];
    const twiceOmega = x * x + (2 * (1 - MU)) / Math.abs(x + MU) + (2 * MU) / Math.abs(x - 1 + MU);
    const start = [x, 0, 0, vx, Math.sign(vy0) * Math.sqrt(twiceOmega - held.jacobi - vx * vx), 0];
    const run = propagate(MU, start, 1.5 * stable.periodNd, {
      rtol: 1e-12, atol: 1e-12, events: [yAxisCrossing({ direction: Math.sign(vy0) as 1 | -1, xMax: -MU, terminalCount: held.sectionCrossingsPerReturn })],
    });
    expect(run.terminated).toBe(true);
    expect(Math.abs(run.state[0] - held.curveX[1])).toBeLessThan(1e-7);
    expect(Math.abs(run.state[3] - held.curveVx[1])).toBeLessThan(1e-7);
    expect(Math.abs(x0 - held.curveX[1])).toBeLessThan(3 * held.holdRadiusNd);
  });

  it('is 0 for an unstable L1 Lyapunov orbit (ν ~ 1e3): the smallest displacement already leaves', () => {
    expect(lyapunov.analysis.stabilityIndex).toBeGreaterThan(100);
    const result = holdRadius({ mu: MU, state0: lyapunov.state0, periodNd: lyapunov.periodNd });
    expect(result.frame.elliptic).toBe(false);
    expect(result.holdRadiusNd).toBe(0);
    expect(result.trials).toHaveLength(1);
    expect(result.trials[0].failure).toBe('annulus');
    expect(result.trials[0].returns).toBeLessThanOrEqual(2);
    expect(result.curveX.length).toBe(0);
  });

  it('rejects bad input with a message naming the field', () => {
    expect(() => holdRadius({ mu: MU, state0: stable.state0, periodNd: -1 })).toThrow(/periodNd/);
    expect(() => holdRadius({ mu: MU, state0: [0.8, 0, 0.1, 0, 0.3, 0], periodNd: 3 })).toThrow(/planar/);
    expect(() => holdRadius({ mu: MU, state0: stable.state0, periodNd: stable.periodNd, returns: 2 })).toThrow(/returns/);
    expect(() => holdRadius({ mu: MU, state0: stable.state0, periodNd: stable.periodNd, search: { growthFactor: 1 } })).toThrow(/growthFactor/);
    expect(() => normalFrame(NaN, 0, 0, 1)).toThrow(/finite/);
  });
});
