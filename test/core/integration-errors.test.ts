// Failures end with a clear IntegrationError rather than a hang or a silent wrong answer.
import { describe, expect, it } from 'vitest';
import { IntegrationError, propagate } from '../../generator/core/index.ts';
import { HNW_MU, HNW_PERIOD, HNW_STATE_PLANAR } from './hnw-orbit.ts';

const MU = 0.0121505842695; // Earth–Moon, DESIGN.md
const MOON_RADIUS_ND = 1737.4 / 384400; // DESIGN.md

/**
 * Falling straight at the Moon: radial relative velocity in the inertial frame. The Moon moves with
 * ω × r_moon = (0, 1 − μ) there, so in the rotating frame v = (−speed, −d) at distance d on the x-axis
 * (v_rot = v_in − ω × r; common practice).
 */
function fallingAtMoon(distance: number, speed: number): number[] {
  return [1 - MU + distance, 0, 0, -speed, -distance, 0];
}

function thrown(run: () => unknown): unknown {
  try {
    run();
  } catch (error) {
    return error;
  }
  return null;
}

describe('integration failures', () => {
  it('reports a collision, quickly, for a trajectory aimed at the Moon', () => {
    const started = Date.now();
    const error = thrown(() => propagate(MU, fallingAtMoon(0.02, 1), 1));
    expect(error).toBeInstanceOf(IntegrationError);
    expect((error as IntegrationError).reason).toBe('collision');
    expect((error as IntegrationError).message).toMatch(/hits a primary/);
    // Free fall from 0.02 at speed 1 reaches the centre before t = 0.02.
    expect((error as IntegrationError).timeNd).toBeGreaterThan(0);
    expect((error as IntegrationError).timeNd).toBeLessThan(0.02);
    expect(Date.now() - started).toBeLessThan(5000);
  }, 10_000);

  it('reports a collision at the surface when the collision radius is the Moon radius', () => {
    const error = thrown(() => propagate(MU, fallingAtMoon(0.02, 1), 1, { collisionRadiusNd: MOON_RADIUS_ND }));
    expect(error).toBeInstanceOf(IntegrationError);
    expect((error as IntegrationError).reason).toBe('collision');
    // Through about (0.02 − R) of the way at speed ≥ 1: before t = 0.0155 (falls faster as it goes).
    expect((error as IntegrationError).timeNd).toBeLessThan(0.02 - MOON_RADIUS_ND);
  });

  it('throws a step-limit error when maxSteps is too small', () => {
    const error = thrown(() => propagate(HNW_MU, HNW_STATE_PLANAR, HNW_PERIOD, { maxSteps: 10 }));
    expect(error).toBeInstanceOf(IntegrationError);
    expect((error as IntegrationError).reason).toBe('step-limit');
    expect((error as IntegrationError).message).toMatch(/step limit of 10/);
  });

  it('refuses a start on a primary and bad arguments with RangeError', () => {
    expect(() => propagate(MU, [-MU, 0, 0, 0, 1, 0], 1)).toThrow(RangeError);
    expect(() => propagate(MU, [0.5, 0, 0], 1)).toThrow(RangeError);
    expect(() => propagate(0.7, [0.5, 0, 0, 0], 1)).toThrow(RangeError);
    expect(() => propagate(MU, [0.5, 0, 0, 0], 1, { rtol: 0 })).toThrow(RangeError);
  });
});
