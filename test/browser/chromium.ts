/**
 * Launch Debian's chromium for browser tests with the flags this machine needs (no GPU, no
 * background networking, a fresh profile). Never downloads a browser.
 */
import { chromium, type Browser } from 'playwright-core';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export const CHROMIUM_PATH = process.env.LAMINA_CHROMIUM ?? '/usr/bin/chromium';

export async function launchChromium(): Promise<Browser> {
  const profile = mkdtempSync(join(tmpdir(), 'lamina-chromium-'));
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
      `--user-data-dir=${profile}`,
    ],
  });
}
