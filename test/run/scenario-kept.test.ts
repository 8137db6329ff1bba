// A config run sets the catalog's scenario; one family from the command line adds its family to an
// existing catalog without replacing the scenario (and sets one only if the catalog has none).
import { describe, expect, it } from 'vitest';
import { openCatalogForRead } from '../../catalog-db/open-catalog.ts';
import { parseConfigText } from '../../generator/config/load-config.ts';
import { singleFamilyConfig } from '../../generator/config/single-family-config.ts';
import { generateFromConfig } from '../../generator/run/generate-catalog.ts';
import { useTempCatalogDir } from '../catalog-db/temp-catalog-path.ts';

const tempPath = useTempCatalogDir();
const quiet = { progress: 'lines' as const, handleSigint: false, log: () => {}, workers: 1 };
const configText = `
scenario: { name: Scenario kept, team: Test team (invented), description: One short family. }
systems: [{ preset: earth-moon }]
families: [{ system: earth-moon, lyapunov: L1, limits: { maxMembers: 5 } }]
`;

function catalogState(dbPath: string) {
  const reader = openCatalogForRead(dbPath);
  try {
    return { scenario: reader.scenario()?.name, families: reader.families().map((f) => f.id) };
  } finally {
    reader.close();
  }
}

describe('scenario of a catalog', () => {
  it('is kept when one family is added from the command line', async () => {
    const dbPath = tempPath('kept.sqlite');
    await generateFromConfig({ config: parseConfigText(configText, 'kept.yaml'), configPath: 'kept.yaml', text: configText }, { ...quiet, dbPath });
    expect(catalogState(dbPath)).toEqual({ scenario: 'Scenario kept', families: ['earth-moon/L1-Lyapunov/a'] });
    await generateFromConfig(singleFamilyConfig({ system: 'earth-moon', lyapunov: 'L2', maxMembers: 5 }), { ...quiet, dbPath, scenario: 'if-missing' });
    expect(catalogState(dbPath)).toEqual({ scenario: 'Scenario kept', families: ['earth-moon/L1-Lyapunov/a', 'earth-moon/L2-Lyapunov/a'] });
  });

  it('is set by a command-line family when the catalog is new', async () => {
    const dbPath = tempPath('new.sqlite');
    await generateFromConfig(singleFamilyConfig({ system: 'earth-moon', lyapunov: 'L2', maxMembers: 5 }), { ...quiet, dbPath, scenario: 'if-missing' });
    expect(catalogState(dbPath).scenario).toBe('Command-line families');
  });
});
