// What the screenings "beyond the three-body model" add to the demo catalog (catalogs/demo.yaml):
//  1. the whole demo with 2 worker threads, screenings off and on (wall seconds; the difference is the
//     total added as the user sees it);
//  2. from the catalog built without screenings, each screening alone on every family with a stable window
//     (one thread, as a worker runs them): seconds per member for the hold radius, the Sun (bicircular) and
//     the eccentricity (elliptic) screening, and their sum.
// The settings are the demo's own (returns, membersPerWindow, spans, phases), at the demo's tolerance.
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { openCatalogForRead } from '../catalog-db/open-catalog.ts';
import type { SystemRow } from '../catalog-db/types.ts';
import { buildJobs } from '../generator/config/build-jobs.ts';
import { parseConfigText } from '../generator/config/load-config.ts';
import type { ScreeningSettings } from '../generator/core/orbits/family-job.ts';
import { screenStableMembers } from '../generator/core/orbits/screen-stable-members.ts';
import { generateFromConfig } from '../generator/run/generate-catalog.ts';

const CONFIG_PATH = fileURLToPath(new URL('../catalogs/demo.yaml', import.meta.url));
const WORKERS = 2;

type Kind = 'holdRadius' | 'sun' | 'eccentricity';
const KINDS: Array<[Kind, string]> = [['holdRadius', 'hold radius'], ['sun', 'Sun (bicircular)'], ['eccentricity', 'eccentricity (elliptic)']];

async function wholeDemo(text: string, screeningOn: boolean, dbPath: string): Promise<number> {
  // The demo config with every screening switched as asked (the block is replaced, families keep theirs).
  const config = structuredClone(parseConfigText(text, CONFIG_PATH));
  if (!screeningOn) {
    config.screening = { holdRadius: { enabled: false }, sun: { enabled: false }, eccentricity: { enabled: false } };
    for (const family of config.families) delete family.screening;
  }
  const summary = await generateFromConfig({ config, configPath: CONFIG_PATH, text }, { dbPath, workers: WORKERS, progress: 'lines', handleSigint: false, log: () => {} });
  if (summary.jobsFailed.length > 0) throw new Error(`demo run failed: ${summary.jobsFailed.map((f) => f.key).join(', ')}`);
  return summary.seconds;
}

export async function run(): Promise<void> {
  const text = readFileSync(CONFIG_PATH, 'utf8');
  const jobs = buildJobs(parseConfigText(text, CONFIG_PATH), CONFIG_PATH);
  const settingsOf = new Map(jobs.map((job) => [job.key, job]));
  const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-bench-beyond-'));
  try {
    const offPath = join(dir, 'off.sqlite');
    const off = await wholeDemo(text, false, offPath);
    const on = await wholeDemo(text, true, join(dir, 'on.sqlite'));
    console.log(`whole demo, ${WORKERS} workers: ${off.toFixed(1)} s without screenings, ${on.toFixed(1)} s with them `
      + `(added ${(on - off).toFixed(1)} s wall, ${((100 * (on - off)) / off).toFixed(0)} %)`);

    const reader = openCatalogForRead(offPath);
    const systems = new Map(reader.systems().map((s: SystemRow) => [s.id, s]));
    const totals = new Map<Kind, { seconds: number; members: number }>(KINDS.map(([kind]) => [kind, { seconds: 0, members: 0 }]));
    let windows = 0;
    try {
      for (const family of reader.families()) {
        const stableWindows = reader.stableWindows(family.id);
        if (stableWindows.length === 0) continue;
        windows += stableWindows.length;
        const job = settingsOf.get(family.configKey)!;
        const bundle = { family, orbits: reader.orbits(family.id), stableWindows };
        for (const [kind] of KINDS) {
          const only: ScreeningSettings = {
            holdRadius: { ...job.screening!.holdRadius, enabled: kind === 'holdRadius' },
            sun: { ...job.screening!.sun, enabled: kind === 'sun' },
            eccentricity: { ...job.screening!.eccentricity, enabled: kind === 'eccentricity' },
          };
          const t0 = performance.now();
          const result = screenStableMembers(systems.get(family.systemId)!, bundle, only, job.tolerance);
          const total = totals.get(kind)!;
          total.seconds += (performance.now() - t0) / 1000;
          total.members += kind === 'holdRadius' ? result.holdRadiusCount : result.screenedCount;
        }
      }
    } finally {
      reader.close();
    }
    const s = jobs[0]!.screening!;
    console.log(`settings: hold radius ${s.holdRadius.returns} returns, middle + ${s.holdRadius.membersPerWindow} per window; `
      + `Sun and eccentricity ${s.sun.spanSynodicMonths} synodic months × ${s.sun.phases} phases; ${windows} stable windows`);
    let sum = 0;
    for (const [kind, label] of KINDS) {
      const { seconds, members } = totals.get(kind)!;
      sum += seconds;
      console.log(`${label}: ${members} members, ${(seconds / Math.max(1, members)).toFixed(3)} s per member, ${seconds.toFixed(1)} s in all (one thread)`);
    }
    console.log(`screenings in all: ${sum.toFixed(1)} s of one thread (about ${(sum / WORKERS).toFixed(1)} s on ${WORKERS} workers if evenly spread)`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
