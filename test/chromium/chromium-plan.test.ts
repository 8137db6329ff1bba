// The pretest decision (test/chromium/chromium-plan.ts), every combination of the three facts.
import { describe, expect, it } from 'vitest';
import { APT_INSTALL_COMMANDS, planAfterInstall, planChromium } from './chromium-plan.ts';

const bools = [false, true];

describe('planChromium: what npm test does about chromium', () => {
  it('runs the tests whenever chromium is there, whoever runs them', () => {
    for (const isRoot of bools) for (const aptGetPresent of bools) {
      expect(planChromium({ chromiumPresent: true, isRoot, aptGetPresent })).toEqual({ action: 'run' });
    }
  });

  it('installs with apt-get as root, the same commands as .ci/run', () => {
    const plan = planChromium({ chromiumPresent: false, isRoot: true, aptGetPresent: true });
    expect(plan).toEqual({ action: 'install', commands: APT_INSTALL_COMMANDS });
    expect(APT_INSTALL_COMMANDS.map((c) => c.join(' '))).toEqual(['apt-get update -qq', 'apt-get install -y -qq chromium']);
  });

  it('stops with one line naming chromium and the install command when it cannot install', () => {
    for (const [isRoot, aptGetPresent] of [[false, true], [false, false], [true, false]]) {
      const plan = planChromium({ chromiumPresent: false, isRoot, aptGetPresent });
      expect(plan.action).toBe('stop');
      if (plan.action !== 'stop') continue;
      expect(plan.message).not.toContain('\n');
      expect(plan.message).toContain('/usr/bin/chromium');
      expect(plan.message).toContain('apt-get install -y chromium');
      expect(plan.message).not.toMatch(/skip/i);
    }
  });

  it('stops after an install that left chromium missing, runs after one that worked', () => {
    expect(planAfterInstall(true)).toEqual({ action: 'run' });
    const plan = planAfterInstall(false);
    expect(plan.action).toBe('stop');
    if (plan.action === 'stop') expect(plan.message).not.toContain('\n');
  });
});
