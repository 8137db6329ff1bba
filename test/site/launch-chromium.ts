// Debian's chromium driven by playwright-core: headless, no sandbox (CI runs as root) and no background
// networking, which this machine's closed network would refuse (common practice here; never downloads a browser).
import { chromium, type Browser } from 'playwright-core';

export const CHROMIUM_PATH = '/usr/bin/chromium';

export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: ['--no-sandbox', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}
