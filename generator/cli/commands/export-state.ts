// `cycler-atlas export-state --orbit ID --epoch ISO8601 [--frame F] [--units km|nd] [--db FILE]
// [--format csv|json|oem] [--periods N --step DURATION] [--out FILE]`: the state of a catalog orbit (or
// samples over N periods) dated at an epoch, in the model's rotating frame, inertial axes about either
// body, or Earth-centred EME2000 (from the instantaneous Earth–Moon frame of astronomy-engine's Moon).
// A thin shell: reading the flags and the catalog here, everything else in generator/core/state-export/
// (the orbit page's downloads use the same module). Every output states the approximation in its comments.
// Exit codes: 0 done, 1 the work failed (e.g. the integration), 2 bad arguments.
import { existsSync, writeFileSync } from 'node:fs';
import { Command } from 'commander';
import { openCatalogForRead } from '../../../catalog-db/open-catalog.ts';
import type { CatalogReader } from '../../../catalog-db/types.ts';
import { parseEpochMicros } from '../../core/state-export/epoch-text.ts';
import { exportOrbitOf, hasEarthAndMoon, type ExportOrbit } from '../../core/state-export/export-orbit.ts';
import { formatStateCsv } from '../../core/state-export/format-csv.ts';
import { formatStateJson } from '../../core/state-export/format-json.ts';
import { formatStateOem } from '../../core/state-export/format-oem.ts';
import { STATE_FRAMES, STATE_UNITS, type StateFrame, type StateUnits } from '../../core/state-export/state-frames.ts';
import { stateSeries } from '../../core/state-export/state-series.ts';
import { stepSeconds, type StepUnit } from '../../core/state-export/step-units.ts';
import { geocentricMoonAt } from '../../ephemeris/geocentric-moon.ts';
import { exitWithUsageCode, failWith } from '../command-exit.ts';
import { UsageError } from '../../errors/usage-error.ts';
import { assertOutputIsNotInput } from '../../run/path-options.ts';
import { parseNumberInRange, readNumber } from '../parse-number.ts';

const DEFAULT_DB_PATH = 'catalog-db/demo.sqlite';
const FORMATS = ['csv', 'json', 'oem'] as const;
/** The frame's name before the other frames came: still accepted. */
const FRAME_ALIASES: Record<string, StateFrame> = { 'icrf-earth': 'eme2000' };

export interface ExportStateFlags {
  orbit?: string;
  epoch?: string;
  frame: string;
  units: string;
  db: string;
  format: string;
  periods?: string;
  step?: string;
  out?: string;
}

export function createExportStateCommand(): Command {
  const command = new Command('export-state')
    .description('states of a catalog orbit dated from an epoch, in the rotating, a body-centred inertial or the Earth-centred EME2000 frame, as CSV, JSON or CCSDS OEM')
    .option('--orbit <id>', 'orbit id, e.g. earth-moon/E1M1/a/0042 (see the orbitId column of `export --format csv`)')
    .option('--epoch <iso8601>', 'epoch of the orbit\'s start state, ISO 8601 UTC, e.g. 2030-01-01T00:00:00Z')
    .option('--frame <frame>', `${STATE_FRAMES.join(', ')} (eme2000, also called icrf-earth: geocentric, EME2000 axes; Earth–Moon orbits only)`, 'eme2000')
    .option('--units <units>', 'km (km, km/s) or nd (the model\'s LU, LU/TU); OEM and eme2000 are km only', 'km')
    .option('--db <file>', 'catalog file to read', DEFAULT_DB_PATH)
    .option('--format <format>', `output: ${FORMATS.join(', ')}`, 'json')
    .option('--periods <n>', 'samples over n periods (a number in (0, 1000]); without it, the start state only')
    .option('--step <duration>', 'sample spacing with --periods: 600s, 30min, 1h, 0.5d, or 0.1tu (the catalog\'s time unit); default 1h')
    .option('--out <file>', 'output file (default: standard output)')
    .action((flags: ExportStateFlags) => {
      try {
        if (flags.out !== undefined) assertOutputIsNotInput('--out', flags.out, [['--db', flags.db]]);
        const text = runExportState(flags);
        if (flags.out === undefined) process.stdout.write(text);
        else {
          writeFileSync(flags.out, text);
          console.error(`wrote ${flags.out} (${flags.format})`);
        }
      } catch (error) {
        failWith(command, error);
      }
    });
  return exitWithUsageCode(command);
}

/** Validates every flag (UsageError, exit 2), reads the orbit, samples and maps it; returns the text. */
export function runExportState(flags: ExportStateFlags, nowMs: number = Date.now()): string {
  if (flags.orbit === undefined || flags.orbit.trim() === '') throw new UsageError('--orbit: missing (an orbit id, e.g. earth-moon/E1M1/a/0042)');
  if (flags.epoch === undefined) throw new UsageError('--epoch: missing (ISO 8601 in UTC, e.g. 2030-01-01T00:00:00Z)');
  const startEpochMicros = asUsage('--epoch: ', () => parseEpochMicros(flags.epoch!));
  const frame = FRAME_ALIASES[flags.frame] ?? flags.frame;
  if (!(STATE_FRAMES as readonly string[]).includes(frame)) {
    throw new UsageError(`--frame: "${flags.frame}" is not allowed (allowed: ${STATE_FRAMES.join(', ')}, icrf-earth)`);
  }
  if (!(FORMATS as readonly string[]).includes(flags.format)) {
    throw new UsageError(`--format: "${flags.format}" is not allowed (allowed: ${FORMATS.join(', ')})`);
  }
  if (!(STATE_UNITS as readonly string[]).includes(flags.units)) {
    throw new UsageError(`--units: "${flags.units}" is not allowed (allowed: ${STATE_UNITS.join(', ')})`);
  }
  if (flags.units !== 'km' && (flags.format === 'oem' || frame === 'eme2000')) {
    throw new UsageError(`--units: "${flags.units}" is not allowed with ${flags.format === 'oem' ? '--format oem' : '--frame eme2000'} (allowed: km)`);
  }
  const periods = flags.periods === undefined ? null : parseNumberInRange('--periods', flags.periods, { min: 0, max: 1000, minOpen: true });
  if (flags.step !== undefined && periods === null) throw new UsageError('--step: only allowed with --periods (the span to sample)');
  if (!existsSync(flags.db)) throw new UsageError(`--db: "${flags.db}" does not exist (a catalog file written by generate)`);

  const orbit = readExportOrbit(flags.db, flags.orbit);
  if (frame === 'eme2000' && !hasEarthAndMoon(orbit)) {
    throw new UsageError(`--frame: ${flags.frame} needs an Earth–Moon orbit, ${orbit.orbitId} belongs to ${orbit.systemName} (allowed: rotating, inertial-primary, inertial-secondary)`);
  }
  const stepText = flags.step ?? '1h';
  const span = periods === null ? null : { periods, stepS: parseStepS(stepText, orbit.timeUnitS) };
  const series = asUsage(`--step: "${stepText}" `, () => stateSeries(
    orbit, { frame: frame as StateFrame, units: flags.units as StateUnits, startEpochMicros, span }, geocentricMoonAt,
  ), (e) => /^gives /.test(e.message));
  if (flags.format === 'csv') return formatStateCsv(series);
  if (flags.format === 'oem') return formatStateOem(series, nowMs * 1000);
  return formatStateJson(series);
}

/** The sample step: a duration with a unit (s, min, h, d, tu); a plain number is in tu. */
function parseStepS(text: string, timeUnitS: number): number {
  const match = /^\s*([^a-z\s]+)\s*(s|min|h|d|tu)?\s*$/.exec(text);
  const value = match ? readNumber(match[1]!) : null;
  if (!match || value === null || !(value > 0)) {
    throw new UsageError(`--step: "${text}" is not allowed (a positive duration such as 600s, 30min, 1h, 0.5d, or 0.1tu in the model's time unit)`);
  }
  return stepSeconds(value, (match[2] ?? 'tu') as StepUnit, timeUnitS);
}

/** Runs make; a RangeError it throws (and that `mine` accepts) becomes a UsageError, its message after prefix. */
function asUsage<T>(prefix: string, make: () => T, mine: (error: Error) => boolean = () => true): T {
  try {
    return make();
  } catch (error) {
    if (error instanceof RangeError && mine(error)) throw new UsageError(`${prefix}${error.message}`);
    throw error;
  }
}

function readExportOrbit(dbPath: string, orbitId: string): ExportOrbit {
  const reader: CatalogReader = openCatalogForRead(dbPath);
  try {
    const orbit = reader.orbit(orbitId);
    if (orbit === undefined) throw new UsageError(`--orbit: "${orbitId}" is not in ${dbPath} (see the orbitId column of \`export --format csv\`)`);
    const family = reader.family(orbit.familyId);
    const system = family && reader.systems().find((s) => s.id === family.systemId);
    const run = family && reader.runs().find((r) => r.id === family.runId);
    if (family === undefined || system === undefined || run === undefined) throw new Error(`catalog ${dbPath}: orbit ${orbitId} has no family, system or run row`);
    return exportOrbitOf({ orbit, family, system, run });
  } finally {
    reader.close();
  }
}
