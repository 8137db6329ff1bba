// `cycler-atlas export-state --orbit ID --epoch ISO8601 [--frame icrf-earth|rotating] [--db FILE]
// [--format csv|json|oem] [--periods N --step DURATION] [--out FILE]`: the state of a catalog orbit (or
// samples over N periods) dated at an epoch, as an Earth-centred inertial state (EME2000 axes, from the
// instantaneous Earth–Moon frame of astronomy-engine's Moon) or in the model's rotating frame, in km and
// km/s; CSV, JSON or CCSDS OEM (KVN). Every output states the approximation in its comments.
// Exit codes: 0 done, 1 the work failed (e.g. the integration), 2 bad arguments.
import { existsSync, writeFileSync } from 'node:fs';
import { Command } from 'commander';
import { openCatalogForRead } from '../../../catalog-db/open-catalog.ts';
import type { CatalogReader } from '../../../catalog-db/types.ts';
import { findSystemPreset, massRatioOf } from '../../core/cr3bp/system-presets.ts';
import { sampleTrajectory } from '../../core/propagation/sample-trajectory.ts';
import { exitWithUsageCode, failWith } from '../../run/command-exit.ts';
import { UsageError } from '../../run/command-line-values.ts';
import { assertOutputIsNotInput } from '../../run/path-options.ts';
import { parseNumberInRange } from '../parse-number.ts';
import { describeExport } from '../state-export/export-description.ts';
import { formatStateCsv } from '../state-export/format-state-csv.ts';
import { formatStateJson } from '../state-export/format-state-json.ts';
import { formatStateOem } from '../state-export/format-state-oem.ts';
import { parseEpochUtc } from '../state-export/parse-epoch.ts';
import { earthMoonRateRadS, moonStateAt } from '../state-export/moon-state-at.ts';
import { parseStepNd } from '../state-export/parse-step.ts';
import { EXPORT_FRAMES, stateSeries, type ExportFrame } from '../state-export/state-series.ts';

const DEFAULT_DB_PATH = 'catalog-db/demo.sqlite';
const FORMATS = ['csv', 'json', 'oem'] as const;
const MAX_SAMPLES = 1_000_000;
const SAMPLE_TOLERANCE = { rtol: 1e-12, atol: 1e-12 };
/** μ of the Earth–Moon preset: icrf-earth needs an orbit of that system (the map uses the real Moon). */
const EARTH_MOON_MU = massRatioOf(findSystemPreset('earth-moon'));

export interface ExportStateFlags {
  orbit?: string;
  epoch?: string;
  frame: string;
  db: string;
  format: string;
  periods?: string;
  step?: string;
  out?: string;
}

export function createExportStateCommand(): Command {
  const command = new Command('export-state')
    .description('state of a catalog orbit dated at an epoch: Earth-centred inertial (EME2000) or rotating, as CSV, JSON or CCSDS OEM')
    .option('--orbit <id>', 'orbit id, e.g. earth-moon/E1M1/a/0042 (see the orbitId column of `export --format csv`)')
    .option('--epoch <iso8601>', 'epoch of the orbit\'s start state, ISO 8601 UTC, e.g. 2030-01-01T00:00:00Z')
    .option('--frame <frame>', `${EXPORT_FRAMES.join(' or ')} (icrf-earth: geocentric, EME2000 axes; Earth–Moon orbits only)`, 'icrf-earth')
    .option('--db <file>', 'catalog file to read', DEFAULT_DB_PATH)
    .option('--format <format>', `output: ${FORMATS.join(', ')}`, 'json')
    .option('--periods <n>', 'samples over n periods (a number in (0, 1000]); without it, the start state only')
    .option('--step <duration>', 'sample spacing with --periods: 600s, 30min, 1h, 0.5d (at the start epoch), or nondimensional model time (default 1h)')
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
  const startEpochMs = parseEpochUtc('--epoch', flags.epoch);
  if (!(EXPORT_FRAMES as readonly string[]).includes(flags.frame)) {
    throw new UsageError(`--frame: "${flags.frame}" is not allowed (allowed: ${EXPORT_FRAMES.join(', ')})`);
  }
  const frame = flags.frame as ExportFrame;
  if (!(FORMATS as readonly string[]).includes(flags.format)) {
    throw new UsageError(`--format: "${flags.format}" is not allowed (allowed: ${FORMATS.join(', ')})`);
  }
  const periods = flags.periods === undefined ? 0 : parseNumberInRange('--periods', flags.periods, { min: 0, max: 1000, minOpen: true });
  if (flags.step !== undefined && flags.periods === undefined) throw new UsageError('--step: only allowed with --periods (the span to sample)');
  if (!existsSync(flags.db)) throw new UsageError(`--db: "${flags.db}" does not exist (a catalog file written by generate)`);

  const reader = openCatalogForRead(flags.db);
  let found: ReturnType<typeof findOrbit>;
  try {
    found = findOrbit(reader, flags.orbit, flags.db);
  } finally {
    reader.close();
  }
  const { orbit, family, system } = found;
  if (frame === 'icrf-earth' && Math.abs(system.mu - EARTH_MOON_MU) > 1e-6 * EARTH_MOON_MU) {
    throw new UsageError(`--frame: icrf-earth needs an Earth–Moon orbit, ${orbit.id} belongs to ${system.id} (mu = ${system.mu}); use --frame rotating`);
  }
  // A duration step is model time at the rate of the frame: for icrf-earth the Earth–Moon line's rate at
  // the start epoch (so the first step is exactly the duration asked), for rotating the catalog's time unit.
  const stepTimeUnitS = frame === 'icrf-earth' ? 1 / earthMoonRateRadS(moonStateAt(startEpochMs)) : system.timeUnitS;
  const stepNd = periods > 0 ? parseStepNd('--step', flags.step ?? '1h', stepTimeUnitS) : null;
  let timesNd: ArrayLike<number> = [0];
  let statesNd: ArrayLike<number> = orbit.state0;
  if (stepNd !== null) {
    const spanNd = periods * orbit.period;
    const count = Math.ceil(spanNd / stepNd - 1e-9) + 1;
    if (count > MAX_SAMPLES) {
      throw new UsageError(`--step: "${flags.step ?? '1h'}" gives ${count} samples over ${periods} period(s), more than ${MAX_SAMPLES} (take a longer step)`);
    }
    // Whole steps: the last sample is at or just past N periods, so that the step is exactly the one asked.
    const samples = sampleTrajectory(system.mu, orbit.state0, (Math.max(2, count) - 1) * stepNd, Math.max(2, count), SAMPLE_TOLERANCE);
    timesNd = samples.timesNd;
    statesNd = samples.states;
  }
  const records = stateSeries({
    mu: system.mu, lengthUnitKm: system.lengthUnitKm, timeUnitS: system.timeUnitS, frame, startEpochMs, timesNd, statesNd,
  });
  const description = describeExport({
    orbitId: orbit.id, familyId: family.id, familyName: family.name, signature: orbit.signature, system,
    periodNd: orbit.period, periodDays: orbit.periodDays, frame, periods,
    stepNd,
  });
  if (flags.format === 'csv') return formatStateCsv(description, records);
  if (flags.format === 'oem') return formatStateOem(description, records, nowMs);
  return formatStateJson(description, records);
}

function findOrbit(reader: CatalogReader, orbitId: string, dbPath: string) {
  const orbit = reader.orbit(orbitId);
  if (orbit === undefined) throw new UsageError(`--orbit: "${orbitId}" is not in ${dbPath} (see the orbitId column of \`export --format csv\`)`);
  const family = reader.family(orbit.familyId);
  const system = family && reader.systems().find((s) => s.id === family.systemId);
  if (family === undefined || system === undefined) throw new Error(`catalog ${dbPath}: orbit ${orbitId} has no family or system row`);
  return { orbit, family, system };
}
