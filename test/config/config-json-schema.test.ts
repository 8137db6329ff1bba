// The committed JSON Schema for editors must match what the zod schema generates today.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CONFIG_JSON_SCHEMA_PATH, configJsonSchemaText } from '../../generator/config/config-json-schema.ts';

describe('catalogs/catalog-config.schema.json', () => {
  const committed = readFileSync(new URL(`../../${CONFIG_JSON_SCHEMA_PATH}`, import.meta.url), 'utf8');

  it('is up to date (regenerate: npx tsx generator/config/write-config-json-schema.ts)', () => {
    expect(committed).toBe(configJsonSchemaText());
  });

  it('is strict and knows the three kinds of family entry', () => {
    const schema = JSON.parse(committed);
    expect(schema.additionalProperties).toBe(false);
    expect(schema.required).toEqual(['scenario', 'systems', 'families']);
    const kinds = schema.properties.families.items.anyOf as Array<{ required: string[]; additionalProperties: boolean }>;
    expect(kinds.map((k) => k.required.find((key) => key !== 'system'))).toEqual(['signature', 'lyapunov', 'retrograde']);
    expect(kinds.every((k) => k.additionalProperties === false)).toBe(true);
    // Tolerance bounds as documented: (0, 1e-6].
    expect(schema.properties.tolerance.properties.rtol).toMatchObject({ exclusiveMinimum: 0, maximum: 1e-6 });
  });
});
