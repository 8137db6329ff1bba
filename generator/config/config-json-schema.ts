// JSON Schema of the catalog config for editors (YAML language servers), generated from the zod
// schema. Ranges that depend on the system (Jacobi constants, signature letters) are checked only
// by the generator itself.
import { z } from 'zod';
import { catalogConfigShape } from './config-schema.ts';

export const CONFIG_JSON_SCHEMA_PATH = 'catalogs/catalog-config.schema.json';

export function configJsonSchemaText(): string {
  const schema = z.toJSONSchema(catalogConfigShape, { io: 'input', unrepresentable: 'any' });
  const described = {
    ...schema,
    $id: 'https://cycler-atlas.invalid/catalog-config.schema.json',
    title: 'cycler-atlas catalog config',
    description:
      'Catalog config of the cycler-atlas generator. Generated from generator/config/config-schema.ts by ' +
      '`npx tsx generator/config/write-config-json-schema.ts`; do not edit by hand.',
  };
  return `${JSON.stringify(described, null, 2)}\n`;
}
