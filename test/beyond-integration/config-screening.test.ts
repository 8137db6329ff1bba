// The `screening` block of the catalog config (top level and per family): one-line errors naming the
// field, the value and the allowed range, as for every other key (bad-configs.test.ts); each setting
// taken from the family entry, else the top level, else the built-in defaults (all on); the demo config
// has every screening on; the editors' JSON Schema knows the block.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { buildJobs } from '../../generator/config/build-jobs.ts';
import { DEFAULT_SCREENING } from '../../generator/config/default-settings.ts';
import { loadConfig } from '../../generator/config/load-config.ts';
import { singleFamilyConfig } from '../../generator/config/single-family-config.ts';
import { ConfigError, validateConfig } from '../../generator/config/validate-config.ts';
import { validConfigObject } from '../config/valid-config-object.ts';

type Config = ReturnType<typeof validConfigObject>;

const cases: Array<[string, (c: Config) => void, string]> = [
  ['too few returns', (c) => { c.screening = { holdRadius: { returns: 10 } }; },
    'screening.holdRadius.returns: 10 is outside the allowed range [20, 1000] (returns of the map per trial)'],
  ['fractional returns', (c) => { c.screening = { holdRadius: { returns: 200.5 } }; },
    'screening.holdRadius.returns: 200.5 is not an integer (allowed: an integer in [20, 1000], returns of the map per trial)'],
  ['enabled as text', (c) => { c.screening = { holdRadius: { enabled: 'yes' } }; },
    'screening.holdRadius.enabled: "yes" is not allowed (true or false)'],
  ['negative members per window', (c) => { c.screening = { holdRadius: { membersPerWindow: -1 } }; },
    'screening.holdRadius.membersPerWindow: -1 is outside the allowed range [0, 50] (members besides the middle one of each stable window)'],
  ['no phases', (c) => { c.screening = { sun: { phases: 0 } }; },
    'screening.sun.phases: 0 is outside the allowed range [1, 64] (a positive integer)'],
  ['negative span', (c) => { c.screening = { eccentricity: { spanSynodicMonths: -1 } }; },
    'screening.eccentricity.spanSynodicMonths: -1 is outside the allowed range (0, 120] (synodic months)'],
  ['unknown screening', (c) => { c.screening = { moon: {} }; },
    'screening: unknown key "moon" (allowed: holdRadius, sun, eccentricity)'],
  ['misspelt key in a family override', (c) => { c.families[0].screening = { eccentricity: { span: 3 } }; },
    'families[0].screening.eccentricity: unknown key "span" (allowed: enabled, spanSynodicMonths, phases)'],
  ['too many members in a family override', (c) => { c.families[1].screening = { holdRadius: { membersPerWindow: 51 } }; },
    'families[1].screening.holdRadius.membersPerWindow: 51 is outside the allowed range [0, 50] (members besides the middle one of each stable window)'],
  ['a word for the block', (c) => { c.screening = 'on'; },
    'screening: "on" is not a mapping (holdRadius, sun and eccentricity settings)'],
  ['null for a model', (c) => { c.families[2].screening = { sun: null }; },
    'families[2].screening.sun: null is not a mapping (enabled, spanSynodicMonths and phases of the Sun screening)'],
];

describe('screening settings in the config', () => {
  it.each(cases)('%s gives one line naming the field', (_name, edit, expected) => {
    const config = validConfigObject();
    edit(config);
    let error: unknown;
    try {
      validateConfig(config, 'bad.yaml');
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ConfigError);
    expect((error as Error).message).toBe(`config bad.yaml: ${expected}`);
    expect((error as Error).message).not.toContain('\n');
  });

  it('takes each key from the family, else the top level, else the built-in defaults (all on)', () => {
    const config = validConfigObject();
    config.screening = { holdRadius: { returns: 300 }, sun: { enabled: false } };
    config.families[0].screening = { holdRadius: { membersPerWindow: 1 }, sun: { enabled: true, phases: 4 } };
    const jobs = buildJobs(validateConfig(config, 'ok.yaml'), 'ok.yaml');
    expect(jobs[0]!.screening).toEqual({
      holdRadius: { enabled: true, returns: 300, membersPerWindow: 1 },
      sun: { enabled: true, spanSynodicMonths: DEFAULT_SCREENING.sun.spanSynodicMonths, phases: 4 },
      eccentricity: DEFAULT_SCREENING.eccentricity,
    });
    expect(jobs[1]!.screening).toEqual({
      holdRadius: { ...DEFAULT_SCREENING.holdRadius, returns: 300 },
      sun: { ...DEFAULT_SCREENING.sun, enabled: false },
      eccentricity: DEFAULT_SCREENING.eccentricity,
    });
    // Nothing configured: the built-in defaults, every screening on, N ≥ 200 returns as the issue asks.
    const plain = buildJobs(validateConfig(validConfigObject(), 'plain.yaml'), 'plain.yaml');
    for (const job of plain) expect(job.screening).toEqual(DEFAULT_SCREENING);
    expect([DEFAULT_SCREENING.holdRadius.enabled, DEFAULT_SCREENING.sun.enabled, DEFAULT_SCREENING.eccentricity.enabled]).toEqual([true, true, true]);
    expect(DEFAULT_SCREENING.holdRadius.returns).toBeGreaterThanOrEqual(200);
    expect(DEFAULT_SCREENING.sun).toMatchObject({ spanSynodicMonths: 12, phases: 8 });
    const single = singleFamilyConfig({ system: 'earth-moon', lyapunov: 'L1' });
    expect(buildJobs(single.config, single.configPath)[0]!.screening).toEqual(DEFAULT_SCREENING);
  });

  it('is on for every family of the demo catalog, as written in catalogs/demo.yaml', () => {
    const path = new URL('../../catalogs/demo.yaml', import.meta.url).pathname;
    const raw = parse(readFileSync(path, 'utf8'));
    const loaded = loadConfig(path);
    for (const job of buildJobs(loaded.config, loaded.configPath)) {
      expect(job.screening).toEqual({
        holdRadius: { ...DEFAULT_SCREENING.holdRadius, ...raw.screening.holdRadius },
        sun: { ...DEFAULT_SCREENING.sun, ...raw.screening.sun },
        eccentricity: { ...DEFAULT_SCREENING.eccentricity, ...raw.screening.eccentricity },
      });
      expect([job.screening!.holdRadius.enabled, job.screening!.sun.enabled, job.screening!.eccentricity.enabled]).toEqual([true, true, true]);
      expect(job.screening!.holdRadius.returns).toBeGreaterThanOrEqual(200);
    }
  });

  it('is in the editors\' JSON Schema, optional, at the top level and in each kind of family entry', () => {
    const schema = JSON.parse(readFileSync(new URL('../../catalogs/catalog-config.schema.json', import.meta.url), 'utf8'));
    expect(schema.properties.screening.properties.holdRadius.properties.returns).toMatchObject({ type: 'integer', minimum: 20, maximum: 1000 });
    expect(schema.required).not.toContain('screening');
    for (const kind of schema.properties.families.items.anyOf) expect(kind.properties).toHaveProperty('screening');
  });
});
