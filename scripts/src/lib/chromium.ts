import { existsSync } from 'node:fs';
import { aptInstall } from './apt.js';

export const CHROMIUM_PATH = '/usr/bin/chromium';

/** Makes sure Debian's Chromium (driven by playwright-core in the browser tests) is installed. */
export async function ensureChromium(): Promise<string> {
  if (!existsSync(CHROMIUM_PATH)) {
    await aptInstall(['chromium', 'fonts-liberation'], `Chromium is not installed (${CHROMIUM_PATH})`);
    if (!existsSync(CHROMIUM_PATH))
      throw new Error(`Installed chromium, but ${CHROMIUM_PATH} is still missing.`);
  }
  return CHROMIUM_PATH;
}
