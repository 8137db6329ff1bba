// One small catalog (a six-member L1 Lyapunov family, under a second) and config texts that differ from
// it in one thing each, for the hostile-input table test.
import { copyFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseConfigText } from '../../generator/config/load-config.ts';
import { generateFromConfig } from '../../generator/run/generate-catalog.ts';

export const TINY_CONFIG = `scenario: { name: Hostile inputs, team: Test bench (invented), description: One short family. }
systems:
  - preset: earth-moon
tolerance: { rtol: 1.0e-12, atol: 1.0e-12 }
defaults:
  limits: { maxMembers: 6, maxStepNd: 1.0e-2 }
families:
  - { system: earth-moon, lyapunov: L1, amplitudeNd: 1.0e-3 }
`;

/** The tiny config with one text replacement (which must apply). */
export function tinyConfigWith(from: string, to: string): string {
  if (!TINY_CONFIG.includes(from)) throw new Error(`tinyConfigWith: "${from}" is not in the tiny config`);
  return TINY_CONFIG.replace(from, to);
}

export async function generateTiny(dbPath: string, text = TINY_CONFIG, configPath = 'tiny.yaml'): Promise<void> {
  const config = parseConfigText(text, configPath);
  const summary = await generateFromConfig({ config, configPath, text }, {
    dbPath,
    workers: 1,
    progress: 'lines',
    log: () => {},
    handleSigint: false,
  });
  if (summary.jobsFailed.length > 0 || summary.interrupted) throw new Error(`generateTiny: ${JSON.stringify(summary.jobsFailed)}`);
}

export function writeText(dir: string, name: string, text: string | Buffer): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

export function copyCatalog(from: string, to: string): string {
  copyFileSync(from, to);
  return to;
}
