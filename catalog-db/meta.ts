// Catalog-wide facts in the meta key/value table; the scenario is stored as three keys.
import type { Database } from 'better-sqlite3';
import type { ScenarioMeta } from './types.ts';

const scenarioKeys = {
  name: 'scenario.name',
  description: 'scenario.description',
  team: 'scenario.team',
} as const satisfies Record<keyof ScenarioMeta, string>;

const scenarioFields = ['name', 'description', 'team'] as const;

export interface MetaStore {
  getMeta(key: string): string | undefined;
  setMeta(key: string, value: string): void;
  /** null until a scenario has been stored (the name is the marker). */
  getScenario(): ScenarioMeta | null;
  /** Writes all three keys in one transaction. */
  setScenario(scenario: ScenarioMeta): void;
}

/** Prepares the statements once (the setter ones only on a writable connection). */
export function prepareMetaStore(db: Database): MetaStore {
  const select = db.prepare('SELECT value FROM meta WHERE key = ?').pluck();
  const upsert = db.readonly
    ? undefined
    : db.prepare('INSERT INTO meta (key, value) VALUES (?, ?) ON CONFLICT (key) DO UPDATE SET value = excluded.value');
  const getMeta = (key: string) => select.get(key) as string | undefined;
  const setMeta = (key: string, value: string) => {
    if (upsert === undefined) throw new Error('setMeta: the catalog is open read-only');
    upsert.run(key, value);
  };
  const writeScenario = db.transaction((scenario: ScenarioMeta) => {
    for (const field of scenarioFields) setMeta(scenarioKeys[field], scenario[field]);
  });
  return {
    getMeta,
    setMeta,
    getScenario() {
      const name = getMeta(scenarioKeys.name);
      if (name === undefined) return null;
      return {
        name,
        description: getMeta(scenarioKeys.description) ?? '',
        team: getMeta(scenarioKeys.team) ?? '',
      };
    },
    setScenario(scenario) {
      for (const field of scenarioFields) {
        if (typeof scenario?.[field] !== 'string') {
          throw new Error(`setScenario: ${field} must be a string, got ${typeof scenario?.[field]}`);
        }
      }
      writeScenario(scenario);
    },
  };
}
