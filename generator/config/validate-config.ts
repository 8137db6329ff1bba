// Validates a parsed config object: the schema first (structure and ranges), then the checks that
// depend on the systems. Errors are one line: "config <file>: <field path>: <value> <problem>".
import { catalogConfigShape, type CatalogConfig } from './config-schema.ts';
import { checkConfigSemantics } from './check-config-semantics.ts';
import { formatConfigPath, type ConfigIssue } from './config-path.ts';
import { zodIssueToConfigIssue } from './zod-issue-to-config-issue.ts';

export class ConfigError extends Error {
  override name = 'ConfigError';
  /** The problem behind the message, when it is one field (lets the CLI name its option instead). */
  readonly issue: ConfigIssue | undefined;

  constructor(message: string, issue?: ConfigIssue) {
    super(message);
    this.issue = issue;
  }
}

export function configErrorMessage(label: string, issue: ConfigIssue): string {
  return `config ${label}: ${formatConfigPath(issue.path)}: ${issue.message}`;
}

/** Label: how the config is named in messages (usually the file name). Throws ConfigError. */
export function validateConfig(input: unknown, label: string): CatalogConfig {
  const parsed = catalogConfigShape.safeParse(input);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    const issue = first ? zodIssueToConfigIssue(first, input) : { path: [], message: 'is not a valid config' };
    throw new ConfigError(configErrorMessage(label, issue), issue);
  }
  const issue = checkConfigSemantics(parsed.data);
  if (issue) throw new ConfigError(configErrorMessage(label, issue), issue);
  return parsed.data;
}
