/**
 * Launch Debian's chromium for browser tests with the flags this machine needs (no GPU, no
 * background networking, a fresh profile per launch). Never downloads a browser.
 */
import { chromium, type Browser } from 'playwright-core';

export const CHROMIUM_PATH = process.env.LAMINA_CHROMIUM ?? '/usr/bin/chromium';

export async function launchChromium(): Promise<Browser> {
  // playwright-core gives every launch a fresh, empty profile directory of its own (it refuses
  // a --user-data-dir argument), so each run starts clean.
  return chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}
