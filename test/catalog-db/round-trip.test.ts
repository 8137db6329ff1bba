// Storage round trip: every row type written through CatalogWriter reads back equal through
// CatalogReader (exact doubles included: SQLite REAL and JSON text both keep IEEE doubles exactly,
// common practice), in the order the interfaces in catalog-db/types.ts promise.
import { describe, expect, it } from 'vitest';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import { makeBundle, makeRunInput, makeScenario, makeSystem } from './make-rows.ts';
import { useTempCatalogDir } from './temp-catalog-path.ts';

const catalogPath = useTempCatalogDir();

describe('catalog round trip', () => {
  it('reads back every row type exactly as written', () => {
    const path = catalogPath('round-trip.sqlite');
    const writer = openCatalogForWrite(path);
    const system = makeSystem();
    const other = makeSystem({ id: 'other-system', synodicPeriodDays: 29.530589, mu: 5e-324 });
    writer.upsertSystem(system);
    writer.upsertSystem(other);
    const runInput = makeRunInput();
    const runId = writer.startRun(runInput);
    writer.finishRun(runId, '2026-01-02T04:00:00.000Z');
    const openRunId = writer.startRun(makeRunInput({ startedAt: '2026-02-01T00:00:00.000Z', shard: '2/3' }));
    const scenario = makeScenario();
    writer.setScenario(scenario);
    const bundleA = makeBundle('test-system/B2S1/a', { runId, orbitCount: 6 });
    const bundleB = makeBundle('other-system/B1S1/a', { runId: openRunId, systemId: 'other-system', orbitCount: 3, offset: 0.5, signature: 'B1S1' });
    writer.writeFamily(bundleA);
    writer.writeFamily(bundleB);
    writer.close();

    const reader = openCatalogForRead(path);
    expect(reader.systems()).toEqual([other, system]); // ordered by id
    // runs(): newest first
    expect(reader.runs()).toEqual([
      { ...makeRunInput({ startedAt: '2026-02-01T00:00:00.000Z', shard: '2/3' }), id: openRunId, finishedAt: null },
      { ...runInput, id: runId, finishedAt: '2026-01-02T04:00:00.000Z' },
    ]);
    expect(reader.scenario()).toEqual(scenario);
    // families(): by systemId, then signature, then id
    expect(reader.families()).toEqual([bundleB.family, bundleA.family]);
    expect(reader.family(bundleA.family.id)).toEqual(bundleA.family);
    expect(reader.family('no/such/family')).toBeUndefined();
    // orbits(): by familyId then seq
    expect(reader.orbits()).toEqual([...bundleB.orbits, ...bundleA.orbits]);
    expect(reader.orbits(bundleA.family.id)).toEqual(bundleA.orbits);
    expect(reader.orbit(bundleA.orbits[4]!.id)).toEqual(bundleA.orbits[4]);
    expect(reader.orbit('missing')).toBeUndefined();
    expect(reader.stableWindows(bundleA.family.id)).toEqual(bundleA.stableWindows);
    expect(reader.stableWindows()).toEqual([...bundleB.stableWindows, ...bundleA.stableWindows]);
    expect(reader.bifurcations(bundleB.family.id)).toEqual(bundleB.bifurcations);
    expect(reader.bifurcations()).toEqual([...bundleB.bifurcations, ...bundleA.bifurcations]);
    reader.close();
  });

  it('returns orbits in seq order even when written out of order', () => {
    const path = catalogPath('order.sqlite');
    const writer = openCatalogForWrite(path);
    writer.upsertSystem(makeSystem());
    const runId = writer.startRun(makeRunInput());
    const bundle = makeBundle('test-system/B2S1/a', { runId, orbitCount: 5 });
    writer.writeFamily({ ...bundle, orbits: [...bundle.orbits].reverse() });
    writer.close();
    const reader = openCatalogForRead(path);
    expect(reader.orbits(bundle.family.id).map((o) => o.seq)).toEqual([0, 1, 2, 3, 4]);
    reader.close();
  });

  it('upsertSystem replaces a system and setScenario replaces the scenario', () => {
    const path = catalogPath('upsert.sqlite');
    const writer = openCatalogForWrite(path);
    writer.upsertSystem(makeSystem());
    writer.upsertSystem(makeSystem({ name: 'Renamed', synodicPeriodDays: 1.5 }));
    writer.setScenario(makeScenario());
    writer.setScenario(makeScenario({ team: 'Other team' }));
    writer.close();
    const reader = openCatalogForRead(path);
    expect(reader.systems()).toEqual([makeSystem({ name: 'Renamed', synodicPeriodDays: 1.5 })]);
    expect(reader.scenario()).toEqual(makeScenario({ team: 'Other team' }));
    reader.close();
  });

  it('has no scenario until one is set', () => {
    const path = catalogPath('no-scenario.sqlite');
    openCatalogForWrite(path).close();
    const reader = openCatalogForRead(path);
    expect(reader.scenario()).toBeNull();
    expect(reader.families()).toEqual([]);
    reader.close();
  });

  it('refuses numbers SQLite or JSON would not keep, naming the row and field', () => {
    const writer = openCatalogForWrite(catalogPath('bad-numbers.sqlite'));
    expect(() => writer.upsertSystem(makeSystem({ mu: Number.NaN }))).toThrow(
      'system test-system: mu must be a finite number, got NaN',
    );
    writer.upsertSystem(makeSystem());
    const runId = writer.startRun(makeRunInput());
    const bundle = makeBundle('f', { runId, orbitCount: 3 });
    bundle.orbits[2]!.state0[4] = Number.POSITIVE_INFINITY;
    expect(() => writer.writeFamily(bundle)).toThrow('orbit f/0002: state0 must be an array of 6 finite numbers');
    const short = makeBundle('f', { runId, orbitCount: 3 });
    short.orbits[0]!.monodromy = short.orbits[0]!.monodromy.slice(1);
    expect(() => writer.writeFamily(short)).toThrow('orbit f/0000: monodromy must be an array of 36 finite numbers');
    const fractional = makeBundle('f', { runId, orbitCount: 3 });
    fractional.orbits[1]!.l1Passages = 1.5;
    expect(() => writer.writeFamily(fractional)).toThrow('orbit f/0001: l1Passages must be an integer, got 1.5');
    expect(() => writer.finishRun(runId, 'yesterday')).toThrow('finishRun: finishedAtIso must be an ISO 8601');
    expect(() => writer.finishRun(runId + 100, '2026-01-01T00:00:00Z')).toThrow(`runId ${runId + 100} is not in the catalog`);
    writer.close();
  });
});
