// The error of bad input from the user (a command-line argument, an environment variable, a path), as
// opposed to a failure while working. Its own folder because the run layer throws it and the CLI maps it
// to the exit code: run may not import cli (cli imports run).

export const USAGE_EXIT_CODE = 2;

/** A bad command-line argument (exit code 2), as opposed to a failure while working. */
export class UsageError extends Error {
  override name = 'UsageError';
}
