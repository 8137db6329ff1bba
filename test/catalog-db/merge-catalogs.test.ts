// mergeCatalogs: merging shards gives the same catalog as writing everything into one file, the copy
// of a family from the run that finished later wins, and bad inputs fail before the output is touched.
// Rules under test: the header comment of catalog-db/merge-catalogs.ts.
import { existsSync } from 'node:fs';
import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { mergeCatalogs } from '../../catalog-db/merge-catalogs.ts';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import { CATALOG_SCHEMA_VERSION } from '../../catalog-db/schema-version.ts';
import type { CatalogWriter, SystemRow } from '../../catalog-db/types.ts';
import { makeBundle, makeRunInput, makeScenario, makeSystem } from './make-rows.ts';
import { useTempCatalogDir } from './temp-catalog-path.ts';

const catalogPath = useTempCatalogDir();

interface ShardRun {
  shard: string;
  startedAt: string;
  finishedAt: string | null;
  families: Array<{ id: string; offset: number; orbitCount: number; job?: string }>;
  emptyJobs?: string[];
}

const shardA: ShardRun = {
  shard: '1/2',
  startedAt: '2026-03-01T10:00:00.000Z',
  finishedAt: '2026-03-01T12:00:00.000Z',
  families: [
    { id: 'test-system/B2S1/a', offset: 0, orbitCount: 5 },
    { id: 'test-system/B2S1/b', offset: 0.25, orbitCount: 4, job: 'job:B2S1' },
  ],
  emptyJobs: ['job:B9S9'],
};
const shardB: ShardRun = {
  shard: '2/2',
  startedAt: '2026-03-01T10:00:01.000Z',
  finishedAt: '2026-03-01T11:00:00.000Z',
  families: [{ id: 'test-system/B3S1/a', offset: 0.5, orbitCount: 6, job: 'job:B3S1' }],
};

/** Writes the runs into the writer in order, as the generator would. */
function writeRuns(writer: CatalogWriter, runs: ShardRun[], system: SystemRow = makeSystem()): void {
  writer.upsertSystem(system);
  writer.setScenario(makeScenario());
  for (const run of runs) {
    const runId = writer.startRun(makeRunInput({ shard: run.shard, startedAt: run.startedAt }));
    for (const family of run.families) {
      writer.writeFamily(makeBundle(family.id, { runId, offset: family.offset, orbitCount: family.orbitCount }), family.job === undefined ? undefined : { key: family.job });
    }
    for (const job of run.emptyJobs ?? []) writer.markJobDone({ key: job }, runId);
    if (run.finishedAt !== null) writer.finishRun(runId, run.finishedAt);
  }
}

function writeCatalog(name: string, runs: ShardRun[], system?: SystemRow): string {
  const path = catalogPath(name);
  const writer = openCatalogForWrite(path);
  writeRuns(writer, runs, system);
  writer.close();
  return path;
}

/** Everything a reader sees, plus the jobs (key and run), for comparing two catalogs. */
function snapshot(path: string) {
  const reader = openCatalogForRead(path);
  const content = {
    scenario: reader.scenario(),
    systems: reader.systems(),
    runs: reader.runs(),
    families: reader.families(),
    orbits: reader.orbits(),
    stableWindows: reader.stableWindows(),
    bifurcations: reader.bifurcations(),
  };
  reader.close();
  const db = new Database(path, { readonly: true });
  const jobs = db.prepare('SELECT job_key, run_id FROM jobs ORDER BY job_key').all();
  db.close();
  return { ...content, jobs };
}

describe('mergeCatalogs', () => {
  it('merging two shards equals one catalog holding both', () => {
    const a = writeCatalog('a.sqlite', [shardA]);
    const b = writeCatalog('b.sqlite', [shardB]);
    const both = writeCatalog('both.sqlite', [shardA, shardB]);
    const merged = catalogPath('merged.sqlite');
    const report = mergeCatalogs(merged, [a, b]);
    const expected = snapshot(both);
    expect(expected.families).toHaveLength(3);
    expect(expected.jobs).toHaveLength(3);
    expect(snapshot(merged)).toEqual(expected);
    expect(report.inputs).toEqual([
      { path: a, runsAdded: 1, familiesWritten: 2, familiesSkipped: 0, jobsMerged: 2 },
      { path: b, runsAdded: 1, familiesWritten: 1, familiesSkipped: 0, jobsMerged: 1 },
    ]);
  });

  it('merging the same shard again changes nothing', () => {
    const a = writeCatalog('again-a.sqlite', [shardA]);
    const b = writeCatalog('again-b.sqlite', [shardB]);
    const merged = catalogPath('again-merged.sqlite');
    mergeCatalogs(merged, [a, b]);
    const once = snapshot(merged);
    const report = mergeCatalogs(merged, [b, a]);
    expect(snapshot(merged)).toEqual(once);
    expect(report.inputs.map((r) => [r.runsAdded, r.familiesWritten])).toEqual([
      [0, 0],
      [0, 0],
    ]);
  });

  it('keeps the copy of a family whose run finished later, whatever the input order', () => {
    const id = 'test-system/B2S1/a';
    const early = writeCatalog('early.sqlite', [
      { ...shardA, finishedAt: '2026-03-02T08:00:00.000Z', families: [{ id, offset: 1, orbitCount: 3 }], emptyJobs: [] },
    ]);
    const late = writeCatalog('late.sqlite', [
      { ...shardB, finishedAt: '2026-03-02T09:00:00.000Z', families: [{ id, offset: 2, orbitCount: 7 }] },
    ]);
    const unfinished = writeCatalog('unfinished.sqlite', [
      { ...shardB, shard: '3/3', finishedAt: null, families: [{ id, offset: 3, orbitCount: 4 }] },
    ]);
    const lateOrbits = snapshot(late).orbits;
    const orders = [
      [early, late, unfinished],
      [late, early, unfinished],
      [unfinished, early, late],
      [unfinished, late, early],
    ];
    for (const [index, order] of orders.entries()) {
      const merged = catalogPath(`order-${index}.sqlite`);
      mergeCatalogs(merged, order);
      const result = snapshot(merged);
      expect(result.orbits).toEqual(lateOrbits);
      expect(result.families).toHaveLength(1);
      expect(result.runs).toHaveLength(3); // every run is kept as provenance
      const winningRun = result.runs.find((run) => run.id === result.families[0]!.runId);
      expect(winningRun?.finishedAt).toBe('2026-03-02T09:00:00.000Z');
    }
  });

  it('fails before touching the output when an input is missing or has another schema version', () => {
    const a = writeCatalog('ok.sqlite', [shardA]);
    const out = catalogPath('never-written.sqlite');
    const missing = catalogPath('missing.sqlite');
    expect(() => mergeCatalogs(out, [a, missing])).toThrow(`catalog ${missing} does not exist`);
    const old = writeCatalog('old.sqlite', [shardB]);
    const raw = new Database(old);
    raw.pragma('user_version = 0');
    raw.close();
    expect(() => mergeCatalogs(out, [a, old])).toThrow(`catalog ${old} has schema version 0, this cycler-atlas needs ${CATALOG_SCHEMA_VERSION}`);
    expect(existsSync(out)).toBe(false);
    expect(() => mergeCatalogs(a, [a])).toThrow(`mergeCatalogs: input ${a} is the output catalog itself`);
    expect(() => mergeCatalogs(out, [])).toThrow('mergeCatalogs: inPaths must list at least one input catalog');
  });

  it('refuses shards whose systems disagree on the physics, leaving earlier inputs merged', () => {
    const a = writeCatalog('sys-a.sqlite', [shardA]);
    const b = writeCatalog('sys-b.sqlite', [shardB], makeSystem({ mu: 0.25 }));
    const out = catalogPath('sys-out.sqlite');
    expect(() => mergeCatalogs(out, [a, b])).toThrow(
      `mergeCatalogs: system test-system differs between ${out} and ${b} (mu: 0.30000000000000004 vs 0.25)`,
    );
    const result = snapshot(out);
    expect(result.families.map((f) => f.id)).toEqual(['test-system/B2S1/a', 'test-system/B2S1/b']);
    expect(result.runs).toHaveLength(1); // nothing of b: its transaction rolled back
  });

  it('refuses shards of different scenarios', () => {
    const a = writeCatalog('scen-a.sqlite', [shardA]);
    const bPath = catalogPath('scen-b.sqlite');
    const writer = openCatalogForWrite(bPath);
    writeRuns(writer, [shardB]);
    writer.setScenario(makeScenario({ name: 'Another scenario' }));
    writer.close();
    expect(() => mergeCatalogs(catalogPath('scen-out.sqlite'), [a, bPath])).toThrow(
      'mergeCatalogs: scenario name differs: "Storage test scenario"',
    );
  });
});
