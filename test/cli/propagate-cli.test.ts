// `cycler-atlas propagate` end to end: exit codes, one-line errors naming the field, and the JSON/CSV contract.
import { describe, expect, it } from 'vitest';
import { createPropagateCommand, runPropagate, type PropagateFlags } from '../../generator/cli/commands/propagate.ts';
import { propagate } from '../../generator/core/index.ts';
import { UsageError } from '../../generator/errors/usage-error.ts';
import { runCli } from './run-cli.ts';

// HNW test orbit (Hairer, Nørsett & Wanner 1993, §II.0; DESIGN.md).
const HNW = { mu: '0.012277471', state: '0.994,0,0,-2.00158510637908252240537862224', period: '17.0652165601579625588917206249' };
const GOOD = ['propagate', '--mu', HNW.mu, '--state', HNW.state, '--time', HNW.period];

/** Good arguments with one flag replaced (or added). */
function withFlag(flag: string, value: string | null): string[] {
  const args = GOOD.slice();
  const at = args.indexOf(flag);
  if (at >= 0) args.splice(at, 2, ...(value === null ? [] : [flag, value]));
  else if (value !== null) args.push(flag, value);
  return args;
}

const BAD_INPUTS: { name: string; args: string[]; field: string }[] = [
  { name: 'μ not a number', args: withFlag('--mu', 'abc'), field: '--mu' },
  { name: 'μ NaN', args: withFlag('--mu', 'NaN'), field: '--mu' },
  { name: 'μ above 0.5', args: withFlag('--mu', '0.6'), field: '--mu' },
  { name: 'μ zero', args: withFlag('--mu', '0'), field: '--mu' },
  { name: 'μ and system both', args: withFlag('--system', 'earth-moon'), field: '--mu' },
  { name: 'neither μ nor system', args: withFlag('--mu', null), field: '--mu' },
  { name: 'unknown system', args: [...withFlag('--mu', null), '--system', 'mars-phobos'], field: '--system' },
  { name: 'state too short', args: withFlag('--state', '1,0,0'), field: '--state' },
  { name: 'state of 5 numbers', args: withFlag('--state', '1,0,0,0,0'), field: '--state' },
  { name: 'state with a word', args: withFlag('--state', '1,0,zero,0'), field: '--state' },
  { name: 'state with Infinity', args: withFlag('--state', '1,0,Infinity,0'), field: '--state' },
  { name: 'state on the smaller primary', args: withFlag('--state', `${1 - 0.012277471},0,0,1`), field: '--state' },
  { name: 'state missing', args: withFlag('--state', null), field: '--state' },
  { name: 'time zero', args: withFlag('--time', '0'), field: '--time' },
  { name: 'time not a number', args: withFlag('--time', '1O'), field: '--time' },
  { name: 'rtol zero', args: withFlag('--rtol', '0'), field: '--rtol' },
  { name: 'atol negative', args: withFlag('--atol', '-1e-10'), field: '--atol' },
  { name: 'unknown event', args: withFlag('--events', 'x=0'), field: '--events' },
  { name: 'event with a bad direction', args: withFlag('--events', 'y=0:left'), field: '--events' },
  { name: 'event with a bad region', args: withFlag('--events', 'y=0:x<abc'), field: '--events' },
  { name: 'stop at occurrence 0', args: withFlag('--stop-at', 'y=0@0'), field: '--stop-at' },
  { name: 'stop at a bad event', args: withFlag('--stop-at', 'apoapsis@2'), field: '--stop-at' },
  { name: 'samples 1', args: withFlag('--samples', '1'), field: '--samples' },
  { name: 'samples not an integer', args: withFlag('--samples', '2.5'), field: '--samples' },
  { name: 'unknown format', args: withFlag('--format', 'xml'), field: '--format' },
  { name: 'csv without samples', args: withFlag('--format', 'csv'), field: '--format' },
];

/** The command's own option parsing (defaults included), in this process, without running the action. */
function flagsOf(args: string[]): PropagateFlags {
  const command = createPropagateCommand().action(() => {});
  command.parse(args.slice(1), { from: 'user' });
  return command.opts<PropagateFlags>();
}

describe('cycler-atlas propagate: bad input', () => {
  // Every case in this process first (fast): the validation throws a UsageError naming the field.
  it.each(BAD_INPUTS)('$name: refused, naming $field', ({ args, field }) => {
    let error: unknown = null;
    try {
      runPropagate(flagsOf(args));
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(UsageError);
    expect((error as UsageError).message.startsWith(`${field}: `)).toBe(true);
    expect((error as UsageError).message).not.toContain('\n');
  });

  // Then the real binary, once per field (each start costs about a second): exit 2 and one line on stderr.
  const firstPerField = BAD_INPUTS.filter((c, i) => BAD_INPUTS.findIndex((d) => d.field === c.field) === i);
  it.concurrent.each(firstPerField)('binary, $name: exit 2, one line "cycler-atlas: $field: ..."', async ({ args, field }) => {
    const run = await runCli(args);
    expect(run.code).toBe(2);
    expect(run.stdout).toBe('');
    const lines = run.stderr.trimEnd().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0].startsWith(`cycler-atlas: ${field}: `)).toBe(true);
  });

  it.concurrent('binary, an unknown option: exit 2, one line', async () => {
    const run = await runCli([...GOOD, '--tolerance', '1e-9']);
    expect(run.code).toBe(2);
    expect(run.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(run.stderr).toMatch(/^cycler-atlas: .*--tolerance/);
  });
});

describe('cycler-atlas propagate: good runs', () => {
  it.concurrent('prints the JSON contract; the HNW orbit closes to 1e-9', async () => {
    const run = await runCli(GOOD);
    expect(run.code).toBe(0);
    expect(run.stderr).toBe('');
    const out = JSON.parse(run.stdout);
    expect(out.state).toHaveLength(4);
    const state0 = HNW.state.split(',').map(Number);
    // Closure after one period (HNW 1993, §II.0): the default tolerance is 1e-12.
    expect(Math.max(...out.state.map((v: number, i: number) => Math.abs(v - state0[i])))).toBeLessThanOrEqual(1e-9);
    // The same numbers as the core gives in-process.
    const core = propagate(Number(HNW.mu), state0, Number(HNW.period));
    expect(out.state).toEqual(Array.from(core.state));
    expect(out.rhsEvaluations).toBe(core.rhsEvaluations);
    expect(out.steps).toBe(core.steps);
    expect(out.rejectedSteps).toBe(core.rejectedSteps);
    expect(out.seconds).toBeGreaterThan(0);
    expect(out.seconds).toBeLessThan(60);
    expect(out.stm).toBeUndefined();
    expect(out.events).toBeUndefined();
    // And the binary prints exactly what runPropagate returns, apart from the timing.
    const inProcess = JSON.parse(runPropagate(flagsOf(GOOD)));
    expect({ ...out, seconds: 0 }).toEqual({ ...inProcess, seconds: 0 });
  });

  // In this process (the binary prints what runPropagate returns, checked above).
  it('adds the STM (row-major, 36 numbers for a spatial state) and events with label, count, t, state', () => {
    const out = JSON.parse(runPropagate(flagsOf([
      'propagate', '--system', 'earth-moon', '--state', '0.85,0,0.01,0,0.3,0.02', '--time', '3', '--stm',
      '--events', 'y=0,y=0:down,perigee', '--rtol', '1e-11', '--atol', '1e-11',
    ])));
    expect(out.system).toBe('earth-moon');
    expect(out.state).toHaveLength(6);
    expect(out.stm).toHaveLength(36);
    expect(out.events.length).toBeGreaterThan(0);
    for (const event of out.events) {
      expect(Object.keys(event)).toEqual(expect.arrayContaining(['label', 'count', 't', 'state']));
      expect(event.state).toHaveLength(6);
      expect(event.t).toBeGreaterThan(0);
      expect(event.t).toBeLessThanOrEqual(3);
    }
    const crossings = out.events.filter((e: { label: string }) => e.label === 'y=0');
    expect(crossings.map((e: { count: number }) => e.count)).toEqual(crossings.map((_: unknown, i: number) => i + 1));
    for (const e of crossings) expect(Math.abs(e.state[1])).toBeLessThan(1e-10);
    for (const e of out.events.filter((e: { label: string }) => e.label === 'y=0:down')) expect(e.state[4]).toBeLessThan(0);
  });

  it('stops at the k-th occurrence with --stop-at', () => {
    const out = JSON.parse(runPropagate(flagsOf([...GOOD, '--events', 'y=0', '--stop-at', 'y=0@3'])));
    expect(out.stoppedByEvent).toBe(true);
    expect(out.events.map((e: { count: number }) => e.count)).toEqual([1, 2, 3]);
    // Third crossing of the HNW orbit: the far side, at half the period (symmetric orbit, HNW 1993, §II.0).
    expect(out.tFinalNd).toBeCloseTo(Number(HNW.period) / 2, 8);
  });

  it('meets the same events backwards: the HNW orbit is its own mirror image in time (Roy & Ovenden 1955)', () => {
    // Started perpendicular on the x-axis, state(−t) is the mirror of state(t): events at −t for events at t,
    // with "up" still meaning vy > 0 and perilune still a minimum of the distance.
    const events = ['--events', 'y=0:up,perilune'];
    const forward = JSON.parse(runPropagate(flagsOf([...GOOD, ...events])));
    const backward = JSON.parse(runPropagate(flagsOf([...withFlag('--time', `-${HNW.period}`), ...events])));
    expect(forward.events.length).toBeGreaterThan(2);
    expect(backward.events.map((e: { label: string }) => e.label)).toEqual(forward.events.map((e: { label: string }) => e.label));
    backward.events.forEach((e: { t: number; state: number[] }, i: number) => {
      expect(e.t).toBeCloseTo(-forward.events[i].t, 8);
      if (forward.events[i].label === 'y=0:up') expect(e.state[3]).toBeGreaterThan(0);
    });
  });

  it.concurrent('prints samples as CSV (t,x,y,z,vx,vy,vz) with --samples N --format csv', async () => {
    const run = await runCli([...GOOD, '--samples', '5', '--format', 'csv']);
    expect(run.code).toBe(0);
    const lines = run.stdout.trimEnd().split('\n');
    expect(lines[0]).toBe('t,x,y,z,vx,vy,vz');
    expect(lines).toHaveLength(6);
    const first = lines[1].split(',').map(Number);
    expect(first).toEqual([0, 0.994, 0, 0, 0, Number(HNW.state.split(',')[3]), 0]);
    const middle = lines[3].split(',').map(Number);
    expect(middle[0]).toBeCloseTo(Number(HNW.period) / 2, 12);
    expect(Math.abs(middle[2])).toBeLessThan(1e-8); // on the x-axis at T/2 (mirror symmetry)
  });

  it.concurrent('exits 1 with one line when the trajectory hits a primary', async () => {
    // Straight at the Moon in the inertial frame: v_rot = (−1, −d) at distance d = 0.02 (common practice).
    const mu = 0.0121505842695;
    const run = await runCli(['propagate', '--mu', String(mu), '--state', `${1 - mu + 0.02},0,-1,-0.02`, '--time', '1']);
    expect(run.code).toBe(1);
    expect(run.stdout).toBe('');
    expect(run.stderr.trimEnd().split('\n')).toHaveLength(1);
    expect(run.stderr).toMatch(/^cycler-atlas: propagation failed: .*hits a primary/);
  });
});
