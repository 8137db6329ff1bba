// What `npm test` does about the browser tests' chromium before vitest starts: run, install it (root with
// apt-get, as .ci/run does), or stop at once with one line naming what is missing and the command that
// installs it. Never "skip the browser tests". Pure: the facts come in, the plan goes out.
import { CHROMIUM_PATH } from '../site/launch-chromium.ts';

export interface ChromiumFacts {
  chromiumPresent: boolean;
  isRoot: boolean;
  aptGetPresent: boolean;
}

export type ChromiumPlan =
  | { action: 'run' }
  | { action: 'install'; commands: readonly (readonly string[])[] }
  | { action: 'stop'; message: string };

export const APT_INSTALL_COMMANDS: readonly (readonly string[])[] = [
  ['apt-get', 'update', '-qq'],
  ['apt-get', 'install', '-y', '-qq', 'chromium'],
];

const SUDO_HINT = 'sudo apt-get update && sudo apt-get install -y chromium';

export function planChromium(facts: ChromiumFacts): ChromiumPlan {
  if (facts.chromiumPresent) return { action: 'run' };
  if (facts.isRoot && facts.aptGetPresent) return { action: 'install', commands: APT_INSTALL_COMMANDS };
  if (facts.aptGetPresent) {
    return { action: 'stop', message: `npm test: Debian's chromium (${CHROMIUM_PATH}) is missing for the browser tests; install it with: ${SUDO_HINT}` };
  }
  return {
    action: 'stop',
    message: `npm test: Debian's chromium (${CHROMIUM_PATH}) is missing for the browser tests and there is no apt-get here; install Debian's chromium package (on Debian: ${SUDO_HINT})`,
  };
}

/** After an install attempt: chromium there, or one line saying the install did not provide it. */
export function planAfterInstall(chromiumPresent: boolean): ChromiumPlan {
  if (chromiumPresent) return { action: 'run' };
  return { action: 'stop', message: `npm test: apt-get install chromium ran but ${CHROMIUM_PATH} is still missing; install it by hand: ${SUDO_HINT}` };
}
