// Lap signature E{n}M{m} (DESIGN.md, our vocabulary): over one period, n passes across the x-axis on the far side
// of the larger primary (y = 0, x < −μ, ẏ < 0) and m on the far side of the smaller one (y = 0, x > 1−μ, ẏ > 0);
// the start point counts once. Hand-built arcs are circles about a body in the rotating frame,
// r(θ) = centre + ρ(cos θ, sin θ), θ̇ = ±1: prograde (θ̇ > 0, the frame's sense of rotation) gives ẏ = ρθ̇cos θ,
// so at θ = π (the far side of the Earth, x = −μ − ρ) ẏ < 0 and at θ = 0 (the far side of the Moon, x = 1 − μ + ρ)
// ẏ > 0 — one lap per revolution; retrograde circles have the opposite signs and no laps (common practice:
// prograde = same sense as the frame's rotation).
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle } from '../../catalog-db/types.ts';
import { countLaps, formatSignature, parseSignature, type AxisCrossing } from '../../generator/core/cr3bp/lap-signature.ts';
import { E1M1_JOB, EARTH_MOON, jobResult } from './helpers/earth-moon-jobs.ts';
import { axisCrossings } from './helpers/independent-analysis.ts';

const mu = EARTH_MOON.mu;

/**
 * Crossings of y = 0 of a circle of radius ρ about (centre, 0), started at angle θ₀ ∈ {0, π} (on the axis) with
 * θ̇ = sense (±1), over `revolutions` turns: the start once, then every θ = kπ strictly inside the run.
 */
function circleCrossings(centre: number, radius: number, sense: 1 | -1, revolutions: number, theta0: 0 | 1): AxisCrossing[] {
  const out: AxisCrossing[] = [];
  for (let k = 0; k < 2 * revolutions; k++) {
    const theta = (theta0 + sense * k) * Math.PI; // θ = θ₀ + kπ·sense
    out.push({ x: centre + radius * Math.cos(theta), vy: radius * sense * Math.cos(theta) });
  }
  return out;
}

const EARTH = -mu;
const MOON = 1 - mu;

describe('countLaps on hand-built arcs', () => {
  it('counts one Earth lap per prograde revolution about the Earth, whichever side it starts on', () => {
    for (const revolutions of [1, 2, 3, 5]) {
      for (const start of [0, 1] as const) {
        expect(countLaps(mu, circleCrossings(EARTH, 0.3, 1, revolutions, start))).toEqual({ primaryLaps: revolutions, secondaryLaps: 0 });
      }
    }
  });

  it('counts no lap for a retrograde circle about the Earth', () => {
    expect(countLaps(mu, circleCrossings(EARTH, 0.3, -1, 3, 1))).toEqual({ primaryLaps: 0, secondaryLaps: 0 });
  });

  it('counts one Moon lap per prograde revolution about the Moon, none for a retrograde one', () => {
    expect(countLaps(mu, circleCrossings(MOON, 0.05, 1, 2, 0))).toEqual({ primaryLaps: 0, secondaryLaps: 2 });
    expect(countLaps(mu, circleCrossings(MOON, 0.05, -1, 2, 0))).toEqual({ primaryLaps: 0, secondaryLaps: 0 });
  });

  it('counts a prograde circle about the barycentre enclosing both bodies once on each far side', () => {
    // Radius 1.5: crossings at x = +1.5 (beyond the Moon, ẏ > 0) and x = −1.5 (beyond the Earth, ẏ < 0).
    expect(countLaps(mu, circleCrossings(0, 1.5, 1, 2, 0))).toEqual({ primaryLaps: 2, secondaryLaps: 2 });
  });

  it('counts a hand-built E2M1 cycler: two Earth loops, a neck passage, one Moon loop', () => {
    // Between the bodies (−μ < x < 1 − μ) no crossing counts, whatever its direction.
    const crossings: AxisCrossing[] = [
      ...circleCrossings(EARTH, 0.4, 1, 2, 1), // starts on the far side of the Earth: E, near, E, near
      { x: 0.83, vy: 0.4 }, // through the L1 neck
      ...circleCrossings(MOON, 0.06, 1, 1, 0), // far side of the Moon (M), near side
      { x: 0.5, vy: -0.7 }, // back between the bodies
    ];
    expect(countLaps(mu, crossings)).toEqual({ primaryLaps: 2, secondaryLaps: 1 });
  });

  it('counts only strictly beyond a body and only in the stated direction', () => {
    expect(countLaps(mu, [{ x: -mu, vy: -1 }, { x: 1 - mu, vy: 1 }])).toEqual({ primaryLaps: 0, secondaryLaps: 0 });
    expect(countLaps(mu, [{ x: -mu - 1e-9, vy: -1e-9 }, { x: 1 - mu + 1e-9, vy: 1e-9 }])).toEqual({ primaryLaps: 1, secondaryLaps: 1 });
    expect(countLaps(mu, [{ x: -0.9, vy: 0.2 }, { x: 1.1, vy: -0.2 }, { x: 0.3, vy: -1 }])).toEqual({ primaryLaps: 0, secondaryLaps: 0 });
    expect(countLaps(mu, [])).toEqual({ primaryLaps: 0, secondaryLaps: 0 });
  });
});

describe('countLaps on a real E1M1 family', () => {
  let family: FamilyBundle;
  beforeAll(() => {
    family = jobResult(E1M1_JOB).bundles[0];
  });

  it('finds E1M1 for every member from crossings found by an independent integration', () => {
    for (const orbit of family.orbits) {
      // The start point once, then every crossing strictly inside the period (odex dense output, bisection).
      const crossings: AxisCrossing[] = [
        { x: orbit.state0[0], vy: orbit.state0[4] },
        ...axisCrossings(mu, orbit.state0, orbit.period).map((c) => ({ x: c.x, vy: c.vy })),
      ];
      const laps = countLaps(mu, crossings);
      expect(laps, orbit.id).toEqual({ primaryLaps: 1, secondaryLaps: 1 });
      expect(formatSignature('E', 'M', laps)).toBe('E1M1');
      expect(orbit.signature).toBe('E1M1');
    }
  });

  it('would count the start twice if the end point were added too (the definition counts it once)', () => {
    // Guards the convention: the end point of a full period is the start point again.
    const orbit = family.orbits[0];
    const start = { x: orbit.state0[0], vy: orbit.state0[4] };
    const inside = axisCrossings(mu, orbit.state0, orbit.period);
    expect(countLaps(mu, [start, ...inside, start]).primaryLaps).toBe(2);
  });
});

describe('parseSignature and formatSignature', () => {
  it('reads and writes signatures with any system letters', () => {
    // Letters of the presets (Jupiter–Europa J/U, Saturn–Titan S/T, Pluto–Charon P/C, Sun–Earth S/E).
    expect(parseSignature('J3U2', 'J', 'U')).toEqual({ primaryLaps: 3, secondaryLaps: 2 });
    expect(parseSignature('S12T3', 'S', 'T')).toEqual({ primaryLaps: 12, secondaryLaps: 3 });
    expect(parseSignature('P0C1', 'P', 'C')).toEqual({ primaryLaps: 0, secondaryLaps: 1 });
    expect(parseSignature('S1E4', 'S', 'E')).toEqual({ primaryLaps: 1, secondaryLaps: 4 });
    expect(formatSignature('J', 'U', { primaryLaps: 3, secondaryLaps: 2 })).toBe('J3U2');
    expect(formatSignature('Sa', 'Ti', { primaryLaps: 10, secondaryLaps: 1 })).toBe('Sa10Ti1');
  });

  it('round-trips format → parse for multi-character and regex-special letters', () => {
    for (const [a, b] of [['E', 'M'], ['Sa', 'Ti'], ['+', '.'], ['(', ')'], ['X*', '?']]) {
      for (const laps of [{ primaryLaps: 0, secondaryLaps: 0 }, { primaryLaps: 2, secondaryLaps: 1 }, { primaryLaps: 17, secondaryLaps: 123 }]) {
        const text = formatSignature(a, b, laps);
        expect(parseSignature(text, a, b), text).toEqual(laps);
      }
    }
  });

  it('rejects text that is not exactly letter, count, letter, count', () => {
    for (const bad of ['E2M', 'E2', '2E1M', 'E-1M1', 'E1.5M1', 'E2M1x', ' E2M1', 'M1E2', 'EM', '', 'J3U2']) {
      expect(parseSignature(bad, 'E', 'M'), bad).toBeNull();
    }
    // A regex-special letter must not act as a pattern: '.' must not match any character.
    expect(parseSignature('E2X1', 'E', '.')).toBeNull();
  });
});
