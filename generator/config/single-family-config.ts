// The config behind `generate --system ID --signature E2M1` (one family, no config file): the same
// schema and the same built-in defaults as a config file, so both paths validate and behave alike.
import { stringify } from 'yaml';
import { findSystemPreset } from '../core/cr3bp/system-presets.ts';
import type { LoadedConfig } from './load-config.ts';
import { validateConfig } from './validate-config.ts';

export interface SingleFamilyRequest {
  system: string;
  signature?: string;
  lyapunov?: string;
  jacobi?: number[];
  maxMembers?: number;
}

/** Path in the generated config → the command-line option that set it (for error messages). */
export const SINGLE_FAMILY_OPTION_OF_PATH: ReadonlyArray<[RegExp, string]> = [
  [/^systems\[0\]/, '--system'],
  [/^families\[0\]\.system/, '--system'],
  [/^families\[0\]\.signature/, '--signature'],
  [/^families\[0\]\.lyapunov/, '--lyapunov'],
  [/^families\[0\]\.jacobi/, '--jacobi'],
  [/^families\[0\]\.limits\.maxMembers/, '--max-members'],
];

export const SINGLE_FAMILY_CONFIG_PATH = '(command line)';

/** Throws ConfigError (label "command line") if a value is out of range. */
export function singleFamilyConfig(request: SingleFamilyRequest): LoadedConfig {
  const presetName = safePresetName(request.system);
  const family: Record<string, unknown> = { system: request.system };
  if (request.signature !== undefined) family.signature = request.signature;
  if (request.lyapunov !== undefined) family.lyapunov = request.lyapunov;
  if (request.jacobi !== undefined) family.jacobi = request.jacobi;
  if (request.maxMembers !== undefined) family.limits = { maxMembers: request.maxMembers };
  const object = {
    scenario: {
      name: 'Command-line families',
      team: 'command line',
      description: `Families generated one at a time from the command line${presetName ? ` (${presetName})` : ''}.`,
    },
    systems: [{ preset: request.system }],
    families: [family],
  };
  const text = stringify(object);
  return { config: validateConfig(object, 'command line'), configPath: SINGLE_FAMILY_CONFIG_PATH, text };
}

function safePresetName(id: string): string | null {
  try {
    return findSystemPreset(id).name;
  } catch {
    return null; // the schema reports the unknown system with the allowed ids
  }
}
