// Script: writes catalogs/catalog-config.schema.json from the zod schema.
// Run from the repository root: npx tsx generator/config/write-config-json-schema.ts
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { CONFIG_JSON_SCHEMA_PATH, configJsonSchemaText } from './config-json-schema.ts';

const target = fileURLToPath(new URL(`../../${CONFIG_JSON_SCHEMA_PATH}`, import.meta.url));
writeFileSync(target, configJsonSchemaText());
console.log(`wrote ${CONFIG_JSON_SCHEMA_PATH}`);
