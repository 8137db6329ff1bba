// Field paths in messages, written the way one would index the YAML: families[3].jacobi[0].
export type ConfigPath = ReadonlyArray<PropertyKey>;

export function formatConfigPath(path: ConfigPath): string {
  let out = '';
  for (const part of path) {
    if (typeof part === 'number') out += `[${part}]`;
    else out += out === '' ? String(part) : `.${String(part)}`;
  }
  return out === '' ? '(top level)' : out;
}

/** A problem found in a config: where, and what (the message starts with the offending value). */
export interface ConfigIssue {
  path: ConfigPath;
  message: string;
}
