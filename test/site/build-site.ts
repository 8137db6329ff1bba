// Builds the site with Astro from a given catalog into a given folder (as `npm run site` does), for the
// browser tests and the build benchmark.
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const REPO_ROOT = fileURLToPath(new URL('../../', import.meta.url));

export interface SiteBuild {
  ms: number;
  log: string;
}

/**
 * The environment without the variables vitest/vite put into process.env (BASE_URL, MODE, ...): Astro reads
 * process.env for import.meta.env in server code, so an inherited BASE_URL=/ would override the configured base.
 */
function cleanEnv(): NodeJS.ProcessEnv {
  const env = { ...process.env };
  for (const key of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR']) delete env[key];
  for (const key of Object.keys(env)) if (key.startsWith('VITEST') || key.startsWith('VITE_')) delete env[key];
  return env;
}

export function buildSite(options: { dbPath: string; outDir: string; base?: string }): Promise<SiteBuild> {
  const started = performance.now();
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['node_modules/astro/astro.js', 'build', '--outDir', options.outDir], {
      cwd: REPO_ROOT,
      env: {
        ...cleanEnv(),
        CYCLER_ATLAS_DB: options.dbPath,
        CYCLER_ATLAS_BASE: options.base ?? '/',
        ASTRO_TELEMETRY_DISABLED: '1',
        NODE_ENV: 'production',
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let log = '';
    child.stdout.on('data', (chunk) => (log += chunk));
    child.stderr.on('data', (chunk) => (log += chunk));
    child.on('error', reject);
    child.on('close', (code) => {
      if (code === 0) resolve({ ms: performance.now() - started, log });
      else reject(new Error(`astro build exited with ${code}:\n${log.slice(-4000)}`));
    });
  });
}
