// Reads a catalog config file (YAML), validates it and keeps its text (hashed into the run row).
import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import { parseDocument } from 'yaml';
import type { CatalogConfig } from './config-schema.ts';
import { decodeConfigText } from './decode-config-text.ts';
import { ConfigError, validateConfig } from './validate-config.ts';

export interface LoadedConfig {
  config: CatalogConfig;
  configPath: string;
  /** The file's text exactly as read (its sha256 is the run's config hash). */
  text: string;
}

export function loadConfig(configPath: string): LoadedConfig {
  const label = basename(configPath);
  let bytes: Buffer;
  try {
    bytes = readFileSync(configPath);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'the file does not exist' : code === 'EISDIR' ? 'is a directory (a YAML file)' : `cannot read the file (${code ?? String(error)})`;
    throw new ConfigError(`config ${configPath}: ${why}`);
  }
  const text = decodeConfigText(bytes, label);
  return { config: parseConfigText(text, label), configPath, text };
}

/** YAML text to a validated config; label names the source in messages. */
export function parseConfigText(text: string, label: string): CatalogConfig {
  const document = parseDocument(text, { uniqueKeys: true });
  const error = document.errors[0];
  if (error) {
    const where = error.linePos?.[0] ? ` at line ${error.linePos[0].line}, column ${error.linePos[0].col}` : '';
    // The library's message carries its own position and a code excerpt after the first line.
    const detail = error.message.split('\n')[0]?.replace(/ at line \d+, column \d+:?$/, '');
    throw new ConfigError(`config ${label}: YAML syntax error${where}: ${detail}`);
  }
  return validateConfig(toPlainObject(document, label), label);
}

/** Aliases may repeat a node at most this many times in all: a real config uses a handful, while a
 *  "billion laughs" file expands a few lines into millions of nodes. */
const MAX_ALIAS_COUNT = 1000;

function toPlainObject(document: ReturnType<typeof parseDocument>, label: string): unknown {
  try {
    return document.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    if (!/alias/i.test(message)) throw error;
    throw new ConfigError(`config ${label}: YAML aliases expand too far (at most ${MAX_ALIAS_COUNT} alias uses; ${message.split('\n')[0]})`);
  }
}
