// The "pretest" step of package.json: looks at this machine (chromium at its Debian path, root, apt-get on
// PATH) and carries out planChromium's plan; exit 1 with its one line when the tests cannot run.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { delimiter, join } from 'node:path';
import { CHROMIUM_PATH } from '../site/launch-chromium.ts';
import { planAfterInstall, planChromium, type ChromiumPlan } from './chromium-plan.ts';

function onPath(command: string): boolean {
  return (process.env.PATH ?? '').split(delimiter).some((dir) => dir !== '' && existsSync(join(dir, command)));
}

function stop(plan: ChromiumPlan): never | void {
  if (plan.action !== 'stop') return;
  console.error(plan.message);
  process.exit(1);
}

const plan = planChromium({
  chromiumPresent: existsSync(CHROMIUM_PATH),
  isRoot: typeof process.getuid === 'function' && process.getuid() === 0,
  aptGetPresent: onPath('apt-get'),
});
stop(plan);
if (plan.action === 'install') {
  console.error(`npm test: installing Debian's chromium for the browser tests (${CHROMIUM_PATH} is missing)`);
  for (const [command, ...args] of plan.commands) {
    const result = spawnSync(command, args, { stdio: ['ignore', 'ignore', 'inherit'], env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
    if (result.status !== 0) {
      console.error(`npm test: \`${[command, ...args].join(' ')}\` failed (exit ${result.status ?? result.signal}); chromium is needed for the browser tests`);
      process.exit(1);
    }
  }
  stop(planAfterInstall(existsSync(CHROMIUM_PATH)));
}
