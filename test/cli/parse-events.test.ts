// The --events / --stop-at syntax of `cycler-atlas propagate` (our own; documented in its --help), checked on
// states whose event function values are known by construction (common practice for unit tests of parsers).
import { describe, expect, it } from 'vitest';
import { forIntegrationDirection, parseEvent, parseEventList, parseStop, withStopEvent } from '../../generator/cli/parse-events.ts';
import { UsageError } from '../../generator/errors/usage-error.ts';

const MU = 0.0121505842695;
const at = (x: number, y: number, vx = 0, vy = 0) => Float64Array.from([x, y, 0, vx, vy, 0]);

describe('event texts', () => {
  it('y=0 is the plane y = 0 in both directions, with a normalised label', () => {
    const spec = parseEvent('--events', ' Y=0 : ANY ', MU);
    expect(spec.label).toBe('y=0:any');
    expect(spec.direction).toBe(0);
    expect(spec.g(0, at(0.5, 0.25))).toBe(0.25);
    expect(spec.accept).toBeUndefined();
  });

  it('up and down select the sign of vy at the crossing', () => {
    expect(parseEvent('--events', 'y=0:up', MU).direction).toBe(1);
    expect(parseEvent('--events', 'y=0:down', MU).direction).toBe(-1);
  });

  it('x<NUM and x>NUM keep crossings on that side only', () => {
    const spec = parseEvent('--events', 'y=0:down:x<-0.0121:x>-2', MU);
    expect(spec.accept!(0, at(-0.5, 0))).toBe(true);
    expect(spec.accept!(0, at(0.5, 0))).toBe(false);
    expect(spec.accept!(0, at(-3, 0))).toBe(false);
  });

  it('perilune and perigee are minima of the distance to the smaller and the larger primary', () => {
    const perilune = parseEvent('--events', 'perilune', MU);
    const perigee = parseEvent('--events', 'perigee', MU);
    // g = ½ d(r²)/dt = (r − r_body)·v: negative while approaching, so a minimum is a rise through 0.
    expect(perilune.direction).toBe(1);
    expect(perilune.g(0, at(1 - MU + 0.1, 0, -1, 0))).toBeCloseTo(-0.1, 15);
    expect(perigee.g(0, at(-MU + 0.2, 0, 1, 0))).toBeCloseTo(0.2, 15);
  });

  it('refuses anything else with a UsageError naming the option', () => {
    for (const text of ['x=0', 'y=0:up:down', 'y=0:x<1:x<2', 'y=0:x>1:x<0', 'y=0:x<', 'perilune:x<0', 'apolune']) {
      expect(() => parseEvent('--events', text, MU), text).toThrow(UsageError);
      expect(() => parseEvent('--events', text, MU), text).toThrow(/^--events: /);
    }
  });

  it('lists are comma-separated, each event at most once', () => {
    expect(parseEventList('--events', 'y=0,perilune,perigee', MU).map((e) => e.label)).toEqual(['y=0', 'perilune', 'perigee']);
    expect(() => parseEventList('--events', 'perilune,perilune', MU)).toThrow(/listed twice/);
    expect(() => parseEventList('--events', 'y=0,,perilune', MU)).toThrow(/empty item/);
  });
});

describe('stop event', () => {
  it('EVENT@K stops at the K-th occurrence, K = 1 when absent', () => {
    expect(parseStop('--stop-at', 'y=0:down@3', MU).terminalCount).toBe(3);
    expect(parseStop('--stop-at', 'perilune', MU).terminalCount).toBe(1);
    for (const text of ['y=0@0', 'y=0@-1', 'y=0@1.5', 'y=0@', 'y=0@two']) {
      expect(() => parseStop('--stop-at', text, MU), text).toThrow(/^--stop-at: /);
    }
  });

  it('merges with the same recorded event, or is added after the others', () => {
    const recorded = parseEventList('--events', 'y=0:down,perilune', MU);
    const same = withStopEvent(recorded, parseStop('--stop-at', 'Y=0:DOWN@2', MU));
    expect(same.map((e) => [e.label, e.terminalCount])).toEqual([['y=0:down', 2], ['perilune', undefined]]);
    const added = withStopEvent(recorded, parseStop('--stop-at', 'perigee@4', MU));
    expect(added.map((e) => e.label)).toEqual(['y=0:down', 'perilune', 'perigee']);
    expect(added[2].terminalCount).toBe(4);
    expect(withStopEvent(recorded, null)).toEqual(recorded);
  });
});

describe('backward runs', () => {
  it('reverse every direction when the time is negative, and nothing else', () => {
    const events = parseEventList('--events', 'y=0:up,y=0,perilune', MU);
    expect(forIntegrationDirection(events, -1).map((e) => e.direction)).toEqual([-1, 0, -1]);
    expect(forIntegrationDirection(events, 1).map((e) => e.direction)).toEqual([1, 0, 1]);
    expect(forIntegrationDirection(events, -1).map((e) => e.label)).toEqual(events.map((e) => e.label));
  });
});
