// The `screening` block of the catalog config (top level, and per family as an override): hold radius,
// Sun (bicircular model) and lunar eccentricity (elliptic model) screenings of stable members. Every key
// is optional; family-settings.ts fills the gaps from the top level, then from the built-in defaults.
import { z } from 'zod';
import { count, ruledNumber, strictObject } from './config-rules.ts';
import { formatValue } from './format-value.ts';

const enabled = z
  .boolean({ error: (iss) => (iss.input === undefined ? 'is missing (true or false)' : `${formatValue(iss.input)} is not allowed (true or false)`) })
  .meta({ description: 'true or false.' });

/** Span of each run in synodic months (a year is about 12.4). */
const spanSynodicMonths = ruledNumber({ min: 0, max: 120, minOpen: true, note: 'synodic months' });
/** Phases of the perturbation, evenly spaced over a full turn. */
const phases = count(64);

const modelRun = (what: string) =>
  strictObject({ enabled: enabled.optional(), spanSynodicMonths: spanSynodicMonths.optional(), phases: phases.optional() }, what);

export const screeningSchema = strictObject(
  {
    holdRadius: strictObject(
      {
        enabled: enabled.optional(),
        // The map runs at tolerance 1e-10, which holds for up to ~1000 returns (core/beyond/hold-radius.ts).
        returns: ruledNumber({ min: 20, max: 1000, integer: true, note: 'returns of the map per trial' }).optional(),
        membersPerWindow: ruledNumber({ min: 0, max: 50, integer: true, note: 'members besides the middle one of each stable window' }).optional(),
      },
      'enabled, returns and membersPerWindow',
    ).optional(),
    sun: modelRun('enabled, spanSynodicMonths and phases of the Sun screening').optional(),
    eccentricity: modelRun('enabled, spanSynodicMonths and phases of the eccentricity screening').optional(),
  },
  'holdRadius, sun and eccentricity settings',
);

export type ScreeningEntry = z.output<typeof screeningSchema>;
