// `cycler-atlas propagate`: integrates one CR3BP state with the numerical core and prints the final state
// (and STM, events, samples) as one JSON object, or the samples as CSV.
// Exit codes: 0 done, 1 the integration failed (collision, step-size underflow, step limit), 2 bad arguments.
import { Command } from 'commander';
import { IntegrationError } from '../../core/dop853/integration-error.ts';
import { propagate } from '../../core/propagation/propagate.ts';
import { DEFAULT_TOLERANCE } from '../../core/propagation/tolerance.ts';
import { sampleTrajectory } from '../../core/propagation/sample-trajectory.ts';
import { SYSTEM_PRESETS } from '../../core/cr3bp/system-presets.ts';
import type { EventSpec } from '../../core/events/event-spec.ts';
import { exitWithUsageCode, failWith } from '../command-exit.ts';
import { parseIntegerOption } from '../../run/command-line-values.ts';
import { UsageError } from '../../errors/usage-error.ts';
import { parseMassRatio } from '../parse-mass-ratio.ts';
import { describeRange, parseNumberInRange, readNumber, type NumberRange } from '../parse-number.ts';
import { EVENT_SYNTAX, forIntegrationDirection, parseEventList, parseStop, withStopEvent } from '../parse-events.ts';
import { parseState } from '../parse-state.ts';
import { propagationReport, samplesCsv } from '../propagation-report.ts';

/** Relative and absolute tolerance: positive, and loose enough for double precision (common practice). */
const TOLERANCE_RANGE: NumberRange = { min: 1e-15, max: 0.1 };
/** Closer than this to a primary's centre is a collision, at the start or along the way. */
const COLLISION_RADIUS_ND = 1e-9;
const MAX_SAMPLES = 1_000_000;
const FORMATS = ['json', 'csv'] as const;

export interface PropagateFlags {
  mu?: string;
  system?: string;
  state?: string;
  time?: string;
  rtol: string;
  atol: string;
  stm?: boolean;
  events?: string;
  stopAt?: string;
  samples?: string;
  format: string;
}

const EVENTS_HELP = `
Events (--events, comma-separated; --stop-at takes one, with @K for its K-th occurrence):
  y=0                crossings of the plane y = 0, both directions (same as y=0:any)
  y=0:up, y=0:down   only crossings with vy > 0, or with vy < 0
  y=0:down:x<-0.0121 only crossings where x < -0.0121 (x>NUM likewise; both may be given)
  perilune           closest approaches to the smaller primary, at (1-mu, 0, 0)
  perigee            closest approaches to the larger primary, at (-mu, 0, 0)
Examples:
  cycler-atlas propagate --system earth-moon --state 0.994,0,0,-2.0016 --time 17.07 --events "y=0:down,perilune"
  cycler-atlas propagate --mu 0.0121505842695 --state 1.1,0,0,0,-0.3,0.1 --time 10 --stm --stop-at "y=0@2"
  cycler-atlas propagate --system earth-moon --state 0.994,0,0,-2.0016 --time 17.07 --samples 200 --format csv
Units are nondimensional (length: distance between the primaries; time: 1/(angular rate)).
`;

export function createPropagateCommand(): Command {
  const command = new Command('propagate')
    .description('integrate one state of the circular restricted three-body problem (rotating frame, nondimensional)')
    .option('--mu <mu>', 'mass ratio m2/(m1+m2), in (0, 0.5]')
    .option('--system <id>', `instead of --mu: ${SYSTEM_PRESETS.map((p) => p.id).join(', ')}`)
    .option('--state <list>', 'x,y,z,vx,vy,vz, or x,y,vx,vy for a planar state')
    .option('--time <t>', 'duration, nondimensional (negative: backwards in time)')
    .option('--rtol <r>', `relative tolerance, ${describeRange(TOLERANCE_RANGE)}`, String(DEFAULT_TOLERANCE.rtol))
    .option('--atol <a>', `absolute tolerance, ${describeRange(TOLERANCE_RANGE)}`, String(DEFAULT_TOLERANCE.atol))
    .option('--stm', 'also integrate the state-transition matrix (printed row-major)')
    .option('--events <list>', `events to record: ${EVENT_SYNTAX} (see below)`)
    .option('--stop-at <event@k>', 'stop at the k-th occurrence of this event (k defaults to 1)')
    .option('--samples <n>', `add n evenly spaced states from start to end ("samples" in the JSON), 2 to ${MAX_SAMPLES}`)
    .option('--format <format>', `output: ${FORMATS.join(' or ')} (csv prints the samples: t,x,y,z,vx,vy,vz)`, 'json')
    .addHelpText('after', EVENTS_HELP)
    .action((flags: PropagateFlags) => {
      try {
        process.stdout.write(runPropagate(flags));
      } catch (error) {
        const failure = error instanceof IntegrationError ? new Error(`propagation failed: ${error.message}`) : error;
        failWith(command, failure);
      }
    });
  return exitWithUsageCode(command);
}

function parseTime(text: string | undefined): number {
  if (text === undefined) throw new UsageError('--time: missing (a nonzero finite number, the duration)');
  const value = readNumber(text);
  if (value === null || value === 0) throw new UsageError(`--time: "${text}" is not allowed (a nonzero finite number)`);
  return value;
}

/** Validates every flag first (exit 2 on any), then integrates; returns the text to print. */
export function runPropagate(flags: PropagateFlags): string {
  const { mu, system } = parseMassRatio(flags);
  if (flags.state === undefined) throw new UsageError('--state: missing (x,y,z,vx,vy,vz, or x,y,vx,vy for a planar state)');
  const state0 = parseState('--state', flags.state, mu, COLLISION_RADIUS_ND);
  const timeNd = parseTime(flags.time);
  const rtol = parseNumberInRange('--rtol', flags.rtol, TOLERANCE_RANGE);
  const atol = parseNumberInRange('--atol', flags.atol, TOLERANCE_RANGE);
  const recorded: EventSpec[] = flags.events === undefined ? [] : parseEventList('--events', flags.events, mu);
  const stop = flags.stopAt === undefined ? null : parseStop('--stop-at', flags.stopAt, mu);
  const sampleCount = flags.samples === undefined ? 0 : parseIntegerOption('--samples', flags.samples, 2, MAX_SAMPLES);
  if (!(FORMATS as readonly string[]).includes(flags.format)) {
    throw new UsageError(`--format: "${flags.format}" is not allowed (allowed: ${FORMATS.join(', ')})`);
  }
  if (flags.format === 'csv' && sampleCount === 0) throw new UsageError('--format: csv prints the samples, so it needs --samples N');

  const events = forIntegrationDirection(withStopEvent(recorded, stop), timeNd);
  const withStm = flags.stm === true;
  const start = performance.now();
  const result = propagate(mu, state0, timeNd, { rtol, atol, stm: withStm, events, collisionRadiusNd: COLLISION_RADIUS_ND });
  const seconds = (performance.now() - start) / 1000;
  // Samples come from a second, state-only run over the same span (to the stop event, if one ended the run).
  const spatial0 = state0.length === 6 ? state0 : [state0[0], state0[1], 0, state0[2], state0[3], 0];
  const samples = sampleCount > 0 && result.tFinalNd !== 0
    ? sampleTrajectory(mu, spatial0, result.tFinalNd, sampleCount, { rtol, atol })
    : null;
  if (flags.format === 'csv' && samples) return samplesCsv(samples);
  const report = propagationReport({
    mu, systemId: system?.id ?? null, state0, timeNd, result, withStm, withEvents: events.length > 0, seconds, samples,
  });
  return `${JSON.stringify(report)}\n`;
}
