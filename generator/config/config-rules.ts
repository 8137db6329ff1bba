// Building blocks of the config schema whose zod errors already read as the one-line messages we
// print: "<value> is outside the allowed range (0, 1e-6]". The field path is added by the formatter.
import { z } from 'zod';
import { formatRange, formatValue } from './format-value.ts';

export interface NumberRule {
  min: number;
  max: number;
  minOpen?: boolean;
  maxOpen?: boolean;
  integer?: boolean;
  /** Why the range, shown after it, e.g. "a positive integer". */
  note?: string;
}

function describeRange(rule: NumberRule): string {
  return formatRange(rule.min, rule.max, rule.minOpen ?? false, rule.maxOpen ?? false);
}

/** A finite number (integer if asked) inside the rule's range; every failure names value and range. */
export function ruledNumber(rule: NumberRule) {
  const range = describeRange(rule);
  const note = rule.note ? ` (${rule.note})` : '';
  const kind = rule.integer ? 'an integer' : 'a number';
  const expected = `${kind} in ${range}${rule.note ? `, ${rule.note}` : ''}`;
  const outside = (iss: { input?: unknown }) => `${formatValue(iss.input)} is outside the allowed range ${range}${note}`;
  let schema = z.number({
    error: (iss) => (iss.input === undefined ? `is missing (${expected})` : `${formatValue(iss.input)} is not ${kind} (allowed: ${expected})`),
  });
  if (rule.integer) {
    schema = schema.int({ error: (iss) => `${formatValue(iss.input)} is not an integer (allowed: ${expected})` });
  }
  schema = rule.minOpen ? schema.gt(rule.min, { error: outside }) : schema.gte(rule.min, { error: outside });
  schema = rule.maxOpen ? schema.lt(rule.max, { error: outside }) : schema.lte(rule.max, { error: outside });
  return schema.meta({ description: `${kind[0]!.toUpperCase()}${kind.slice(1)} in ${range}${note}.` });
}

/** A positive integer count with a sane upper bound. */
export function count(max: number, min = 1) {
  return ruledNumber({ min, max, integer: true, note: min === 1 ? 'a positive integer' : `an integer from ${min}` });
}

/** One of a fixed list of strings (or numbers). */
export function oneOf<const T extends readonly [string, ...string[]]>(values: T) {
  return z.enum(values, {
    error: (iss) => `${formatValue(iss.input)} is not allowed (allowed: ${values.join(', ')})`,
  });
}

export function text(what: string, maxLength = 500) {
  return z
    .string({ error: (iss) => (iss.input === undefined ? `is missing (${what})` : `${formatValue(iss.input)} is not text (${what})`) })
    .min(1, { error: () => `must not be empty (${what})` })
    .max(maxLength, { error: () => `is longer than ${maxLength} characters (${what})` });
}

/** An array with a length range; element errors carry their own messages. */
export function list<T extends z.ZodType>(item: T, minItems: number, maxItems: number, what: string) {
  return z
    .array(item, { error: (iss) => `${formatValue(iss.input)} is not a list (${what})` })
    .min(minItems, { error: () => `must list at least ${minItems} (${what})` })
    .max(maxItems, { error: () => `must list at most ${maxItems} (${what})` });
}

/** An object rejecting unknown keys, with a message naming the allowed ones. */
export function strictObject<S extends z.ZodRawShape>(shape: S, what: string) {
  const allowed = Object.keys(shape).join(', ');
  return z.strictObject(shape, {
    error: (iss) => {
      if (iss.code === 'unrecognized_keys') {
        const keys = (iss as { keys: string[] }).keys;
        return `unknown key${keys.length > 1 ? 's' : ''} ${keys.map((k) => JSON.stringify(k)).join(', ')} (allowed: ${allowed})`;
      }
      return iss.input === undefined ? `is missing (${what})` : `${formatValue(iss.input)} is not a mapping (${what})`;
    },
  });
}
