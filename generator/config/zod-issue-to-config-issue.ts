// Turns the first zod issue into a ConfigIssue. The messages come from config-rules.ts already; the
// one case needing work is a family entry matching none of the three kinds (a zod union error),
// where the entry's own key (signature, lyapunov or retrograde) says which kind's error to show.
import type { z } from 'zod';
import type { ConfigIssue } from './config-path.ts';
import { FAMILY_KIND_KEYS } from './config-schema.ts';

type Issue = z.core.$ZodIssue;

export function zodIssueToConfigIssue(issue: Issue, input: unknown): ConfigIssue {
  if (issue.code === 'invalid_union') {
    const entry = valueAt(input, issue.path);
    const present =
      entry !== null && typeof entry === 'object' && !Array.isArray(entry)
        ? FAMILY_KIND_KEYS.filter((key) => key in entry)
        : [];
    if (present.length !== 1) {
      const what = present.length === 0 ? 'has none' : `has ${present.join(' and ')}`;
      return {
        path: issue.path,
        message: `${what} of the keys ${FAMILY_KIND_KEYS.join(', ')} (a family entry needs exactly one of them)`,
      };
    }
    const branch = issue.errors[FAMILY_KIND_KEYS.indexOf(present[0] as (typeof FAMILY_KIND_KEYS)[number])] ?? [];
    const first = branch[0];
    if (first) return zodIssueToConfigIssue({ ...first, path: [...issue.path, ...first.path] } as Issue, input);
  }
  return { path: issue.path, message: issue.message };
}

function valueAt(input: unknown, path: ReadonlyArray<PropertyKey>): unknown {
  let value = input;
  for (const key of path) {
    if (value === null || typeof value !== 'object') return undefined;
    value = (value as Record<PropertyKey, unknown>)[key];
  }
  return value;
}
