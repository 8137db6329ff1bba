// Event texts of the command line, turned into the core's event specs (events/event-spec.ts).
//   y=0[:up|:down|:any][:x<NUM][:x>NUM]   crossings of the plane y = 0; up: ẏ > 0, down: ẏ < 0;
//                                          x<NUM / x>NUM keep only crossings on that side
//   perilune                                closest approaches to the smaller primary (at 1 − μ)
//   perigee                                 closest approaches to the larger primary (at −μ)
// A stop is one event text with an optional @K: the run ends at its K-th occurrence (default 1).
import { closestApproach } from '../core/events/closest-approach.ts';
import type { EventSpec } from '../core/events/event-spec.ts';
import { yAxisCrossing } from '../core/events/y-axis-crossing.ts';
import { UsageError } from '../errors/usage-error.ts';
import { readNumber } from './parse-number.ts';

export const EVENT_SYNTAX = 'y=0[:up|:down|:any][:x<NUM][:x>NUM], perilune or perigee';
const MAX_STOP_COUNT = 1_000_000;

/** One event text, e.g. "y=0:down:x<-0.0121". Its label is the text in lower case without blanks. */
export function parseEvent(option: string, text: string, mu: number): EventSpec {
  const parts = text.toLowerCase().split(':').map((part) => part.replace(/\s+/g, ''));
  const label = parts.join(':');
  const bad = (why: string) => new UsageError(`${option}: "${text.trim()}" ${why} (allowed: ${EVENT_SYNTAX})`);
  const [kind, ...rest] = parts;
  if (kind === 'perilune' || kind === 'perigee') {
    if (rest.length > 0) throw bad('takes no direction or region');
    return closestApproach(kind === 'perilune' ? 1 - mu : -mu, label);
  }
  if (kind !== 'y=0') throw bad('is not an event');
  let direction: -1 | 0 | 1 | undefined;
  let xMin: number | undefined;
  let xMax: number | undefined;
  for (const part of rest) {
    if (part === 'up' || part === 'down' || part === 'any') {
      if (direction !== undefined) throw bad('gives the direction twice');
      direction = part === 'up' ? 1 : part === 'down' ? -1 : 0;
      continue;
    }
    const region = /^x([<>])(.*)$/.exec(part);
    const bound = region ? readNumber(region[2]) : null;
    if (!region || bound === null) throw bad(`has "${part}", neither a direction nor a region x<NUM or x>NUM`);
    if (region[1] === '<') {
      if (xMax !== undefined) throw bad('gives x< twice');
      xMax = bound;
    } else {
      if (xMin !== undefined) throw bad('gives x> twice');
      xMin = bound;
    }
  }
  if (xMin !== undefined && xMax !== undefined && xMin >= xMax) throw bad('keeps no crossing: its x> bound is not below its x< bound');
  return yAxisCrossing({ direction: direction ?? 0, xMin, xMax, label });
}

/** A comma-separated list of event texts; each label at most once. */
export function parseEventList(option: string, text: string, mu: number): EventSpec[] {
  const specs = text.split(',').map((item) => {
    if (item.trim() === '') throw new UsageError(`${option}: empty item in "${text}" (allowed: ${EVENT_SYNTAX}, comma-separated)`);
    return parseEvent(option, item, mu);
  });
  const seen = new Set<string>();
  for (const spec of specs) {
    if (seen.has(spec.label)) throw new UsageError(`${option}: "${spec.label}" is listed twice`);
    seen.add(spec.label);
  }
  return specs;
}

/** "EVENT@K": the event that ends the run and at which occurrence. */
export function parseStop(option: string, text: string, mu: number): EventSpec {
  const at = text.lastIndexOf('@');
  const eventText = at < 0 ? text : text.slice(0, at);
  const countText = at < 0 ? '1' : text.slice(at + 1).trim();
  const count = Number(countText);
  if (!/^\d+$/.test(countText) || count < 1 || count > MAX_STOP_COUNT) {
    throw new UsageError(`${option}: "${text}" has occurrence "${countText}" (EVENT@K with K an integer from 1 to ${MAX_STOP_COUNT})`);
  }
  return { ...parseEvent(option, eventText, mu), terminalCount: count };
}

/** The recorded events with the stop event merged in: the same label becomes terminal, a new one is added. */
export function withStopEvent(events: readonly EventSpec[], stop: EventSpec | null): EventSpec[] {
  if (!stop) return events.slice();
  const same = events.findIndex((e) => e.label === stop.label);
  if (same < 0) return [...events, stop];
  return events.map((e, i) => (i === same ? { ...e, terminalCount: stop.terminalCount } : e));
}

/**
 * Directions are meant in forward time (up: vy > 0; a closest approach: r·v from − to +). The core compares
 * signs in the order the integration meets them, so a backward run needs every direction reversed.
 */
export function forIntegrationDirection(events: readonly EventSpec[], timeNd: number): EventSpec[] {
  if (timeNd >= 0) return events.slice();
  return events.map((e) => ({ ...e, direction: (e.direction === 0 ? 0 : -e.direction) as -1 | 0 | 1 }));
}
