// Each bad config gives exactly one line naming the field path, the value and what is allowed.
// The Jacobi bounds in the messages are C(L3) and C(L1) of each system; for Earth–Moon they agree
// with the table in /work/shared/DESIGN.md (3.012147149, 3.188341105; quintic roots for μ from the
// DE430 GMs, Szebehely 1967 tabulates the positions), checked in build-jobs.test.ts.
import { describe, expect, it } from 'vitest';
import { stringify } from 'yaml';
import { parseConfigText } from '../../generator/config/load-config.ts';
import { ConfigError } from '../../generator/config/validate-config.ts';
import { validConfigObject } from './valid-config-object.ts';

type Config = ReturnType<typeof validConfigObject>;

const cases: Array<[string, (c: Config) => void, string]> = [
  ['Jacobi value above C(L1)', (c) => { c.families[0].jacobi[1] = 3.5; },
    'families[0].jacobi[1]: 3.5 is outside the allowed range [1.98800, 3.18834) for earth-moon (from C(L4) − 1 up to the L1 Jacobi constant)'],
  ['Jacobi value below C(L4) − 1', (c) => { c.families[0].jacobi[0] = 1.5; },
    'families[0].jacobi[0]: 1.5 is outside the allowed range [1.98800, 3.18834) for earth-moon (from C(L4) − 1 up to the L1 Jacobi constant)'],
  ['default grid levels outside Pluto–Charon\'s range', (c) => { delete c.families[3].jacobi; c.defaults.search.jacobi = [3.7]; },
    'defaults.search.jacobi[0]: 3.7 is outside the allowed range [1.90324, 3.62042) for pluto-charon (from C(L4) − 1 up to the L1 Jacobi constant)'],
  ['lowest grid level at C(L1)', (c) => { c.families[0].jacobiLowest = 3.1884; delete c.families[0].jacobi; },
    'families[0].jacobiLowest: 3.1884 is outside the allowed range [1.98800, 3.18833) for the lowest discovery level (from C(L4) − 1 to C(L1) − jacobiGapBelowL1)'],
  ['rtol too loose', (c) => { c.tolerance.rtol = 1e-5; },
    'tolerance.rtol: 1e-5 is outside the allowed range (0, 1e-6] (integration tolerance)'],
  ['atol zero', (c) => { c.tolerance.atol = 0; },
    'tolerance.atol: 0 is outside the allowed range (0, 1e-6] (integration tolerance)'],
  ['rtol not a number', (c) => { c.tolerance.rtol = 'tight'; },
    'tolerance.rtol: "tight" is not a number (allowed: a number in (0, 1e-6], integration tolerance)'],
  ['rtol missing', (c) => { delete c.tolerance.rtol; },
    'tolerance.rtol: is missing (a number in (0, 1e-6], integration tolerance)'],
  ['indexTolerance too loose', (c) => { c.indexTolerance = 0.1; },
    'indexTolerance: 0.1 is outside the allowed range (0, 0.01] (accuracy of stable-window edges in ν)'],
  ['signature with a foreign letter', (c) => { c.families[0].signature = 'E2X1'; },
    'families[0].signature: "E2X1" is not a lap signature E<n>M<m> for earth-moon (n and m integers from 1 to 20, e.g. E2M1)'],
  ['signature with zero laps', (c) => { c.families[0].signature = 'E0M1'; },
    'families[0].signature: "E0M1" is not a lap signature E<n>M<m> for earth-moon (n and m integers from 1 to 20, e.g. E2M1)'],
  ['signature with the other system\'s letters', (c) => { c.families[3].signature = 'E1M1'; },
    'families[3].signature: "E1M1" is not a lap signature P<n>C<m> for pluto-charon (n and m integers from 1 to 20, e.g. P2C1)'],
  ['misspelt key in a family', (c) => { c.families[0].jacobbi = [3.1]; },
    'families[0]: unknown key "jacobbi" (allowed: system, name, limits, screening, signature, jacobi, segments, directions, maxHalfCrossings, gridPoints, jacobiLevels, jacobiLowest, jacobiGapBelowL1)'],
  ['unknown top-level key', (c) => { c.output = 'x.sqlite'; },
    '(top level): unknown key "output" (allowed: scenario, systems, tolerance, indexTolerance, defaults, screening, families)'],
  ['family of no kind', (c) => { c.families[1] = { system: 'earth-moon' }; },
    'families[1]: has none of the keys signature, lyapunov, retrograde (a family entry needs exactly one of them)'],
  ['family of two kinds', (c) => { c.families[1].signature = 'E1M1'; },
    'families[1]: has signature and lyapunov of the keys signature, lyapunov, retrograde (a family entry needs exactly one of them)'],
  ['grid of zero points', (c) => { c.families[0].gridPoints = 0; },
    'families[0].gridPoints: 0 is outside the allowed range [2, 100000] (an integer from 2)'],
  ['fractional member count', (c) => { c.defaults.limits.maxMembers = 2.5; },
    'defaults.limits.maxMembers: 2.5 is not an integer (allowed: an integer in [1, 100000], a positive integer)'],
  ['too many half crossings', (c) => { c.families[0].maxHalfCrossings = 500; },
    'families[0].maxHalfCrossings: 500 is outside the allowed range [1, 64] (a positive integer)'],
  ['Lyapunov family at L3', (c) => { c.families[1].lyapunov = 'L3'; },
    'families[1].lyapunov: "L3" is not allowed (allowed: L1, L2)'],
  ['Lyapunov amplitude too large', (c) => { c.families[1].amplitudeNd = 0.5; },
    'families[1].amplitudeNd: 0.5 is outside the allowed range (0, 0.2] (nondimensional x-amplitude of the first member)'],
  ['system not configured', (c) => { c.families[2].system = 'jupiter-europa'; },
    'families[2].system: "jupiter-europa" is not one of the configured systems (earth-moon, pluto-charon)'],
  ['unknown preset', (c) => { c.systems[1].preset = 'earth-mars'; },
    'systems[1].preset: "earth-mars" is not allowed (allowed: earth-moon, sun-earth, jupiter-europa, saturn-titan, pluto-charon)'],
  ['system listed twice', (c) => { c.systems.push({ preset: 'earth-moon' }); },
    'systems[2]: "earth-moon" is listed twice (give the second an id of its own)'],
  ['same letter for both bodies', (c) => { c.systems[0].secondaryLetter = 'E'; },
    'systems[0].secondaryLetter: "E" is the letter of both bodies of earth-moon (lap signatures need two different letters)'],
  ['lower-case body letter', (c) => { c.systems[0].primaryLetter = 'e'; },
    'systems[0].primaryLetter: "e" is not allowed (one capital letter A–Z)'],
  ['family listed twice', (c) => { c.families.push({ system: 'earth-moon', signature: 'E2M1' }); },
    'families[4]: repeats families[0] (both are earth-moon:E2M1; merge their settings into one entry)'],
  ['Jacobi limits in the wrong order', (c) => { c.families[1].limits = { jacobiMin: 3.1, jacobiMax: 3.0 }; },
    'families[1].limits.jacobiMin: 3.1 must be below jacobiMax 3 (families[1].limits.jacobiMax)'],
  ['jacobiMin above the built-in jacobiMax', (c) => { c.families[1].limits = { jacobiMin: 3.3 }; },
    'families[1].limits.jacobiMin: 3.3 must be below jacobiMax 3.1883411053917574 (built-in default for earth-moon)'],
  ['first step above the largest step', (c) => { c.defaults.limits.initialStepNd = 0.05; },
    'defaults.limits.initialStepNd: 0.05 must be at most maxStepNd 0.02 (defaults.limits.maxStepNd)'],
  ['retrograde orbit inside the Moon', (c) => { c.families[2].retrograde.distanceKm = 1000; },
    'families[2].retrograde.distanceKm: 1000 is outside the allowed range (1737.4, 192200) for earth-moon (km from the Moon\'s centre: above its radius, below half the primaries\' distance)'],
  ['start direction 2', (c) => { c.defaults.search.directions = [1, 2]; },
    'defaults.search.directions[1]: 2 is not allowed (allowed: 1, -1)'],
  ['segment listed twice', (c) => { c.families[0].segments = ['between', 'between']; },
    'families[0].segments: "between" is listed twice (each value at most once)'],
  ['unknown segment', (c) => { c.families[0].segments = ['near-moon']; },
    'families[0].segments[0]: "near-moon" is not allowed (allowed: far-primary, between, far-secondary)'],
  ['no families', (c) => { c.families = []; },
    'families: must list at least 1 (families to generate)'],
  ['scenario missing', (c) => { delete c.scenario; },
    'scenario: is missing (name, team and description)'],
  ['empty team name', (c) => { c.scenario.team = ''; },
    'scenario.team: must not be empty (team name)'],
  ['unknown key in unstableStop', (c) => { c.defaults.limits.unstableStop.after = 3; },
    'defaults.limits.unstableStop: unknown key "after" (allowed: indexAbove, members)'],
];

describe('bad catalog configs give one line naming field, value and allowed range', () => {
  it('accepts the valid base config', () => {
    expect(() => parseConfigText(stringify(validConfigObject()), 'bad.yaml')).not.toThrow();
  });

  it.each(cases)('%s', (_, mutate, expected) => {
    const config = validConfigObject();
    mutate(config);
    const run = () => parseConfigText(stringify(config), 'bad.yaml');
    expect(run).toThrow(ConfigError);
    let message = '';
    try {
      run();
    } catch (error) {
      message = (error as Error).message;
    }
    expect(message).toBe(`config bad.yaml: ${expected}`);
    expect(message).not.toContain('\n');
  });

  it('reports YAML syntax errors with their line', () => {
    const text = 'scenario: { name: x\nsystems: [\n';
    expect(() => parseConfigText(text, 'broken.yaml')).toThrow(/^config broken\.yaml: YAML syntax error at line \d+, column \d+: /);
  });

  it('rejects a key given twice in YAML', () => {
    const text = `${stringify(validConfigObject())}indexTolerance: 1e-7\n`;
    expect(() => parseConfigText(text, 'twice.yaml')).toThrow(/^config twice\.yaml: YAML syntax error at line \d+, column \d+: Map keys must be unique/);
  });
});
