/**
 * Shared set-up for the results-view browser tests: the app from a Vite dev server, a fresh
 * chromium page, and collectors that fail a test on any console error, page error or request
 * outside the app's own origin.
 */
import type { Browser, Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { launchChromium } from './chromium';
import { startApp, type AppServer } from './app-server';

export const ARTIFACTS = resolve(dirname(fileURLToPath(import.meta.url)), '../../test-artifacts');
mkdirSync(ARTIFACTS, { recursive: true });

export interface Harness {
  server: AppServer;
  browser: Browser;
  /** Console errors, page errors and off-origin requests seen so far. */
  problems: string[];
  open(options?: { width?: number; height?: number; hash?: string }): Promise<Page>;
  close(): Promise<void>;
}

export async function startHarness(): Promise<Harness> {
  const server = await startApp();
  const browser = await launchChromium();
  const origin = new URL(server.url).origin;
  const problems: string[] = [];
  const pages: Page[] = [];
  return {
    server,
    browser,
    problems,
    async open({ width = 1280, height = 900, hash = '' } = {}) {
      const context = await browser.newContext({ viewport: { width, height }, acceptDownloads: true });
      const page = await context.newPage();
      pages.push(page);
      page.on('console', (m) => {
        if (m.type() === 'error') problems.push(`console: ${m.text()}`);
      });
      page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
      page.on('dialog', (d) => {
        problems.push(`unexpected ${d.type()} dialog: ${d.message()}`);
        void d.dismiss();
      });
      page.on('request', (r) => {
        const url = r.url();
        if (url.startsWith('data:') || url.startsWith('blob:') || url === 'about:blank') return;
        if (new URL(url).origin !== origin) problems.push(`off-origin request: ${url}`);
      });
      await page.goto(server.url + hash);
      await waitForResults(page);
      return page;
    },
    async close() {
      for (const p of pages) await p.context().close().catch(() => undefined);
      await browser.close();
      await server.close();
    },
  };
}

/** Wait until the analysis has run and the checks table shows rows. */
export async function waitForResults(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const w = window as unknown as { __lamina?: { state(): { analysis: unknown; pending?: boolean } } };
    const s = w.__lamina?.state();
    return !!s && s.analysis !== null && !s.pending;
  }, undefined, { timeout: 30_000 });
  await page.locator('checks-table tr[data-mode]').first().waitFor({ timeout: 30_000 });
  await settle(page);
}

/** The next frame has painted and the page has been idle once after it (at most 1 s): views out of view update then (`DeferOffscreen`). */
export async function settle(page: Page): Promise<void> {
  await page.evaluate(
    () => new Promise((r) => requestAnimationFrame(() => setTimeout(() => requestIdleCallback(() => r(null), { timeout: 1000 }), 0))),
  );
}

/** Apply an edit through the app's test hook and wait for the results to render. */
export async function editNow(page: Page, path: string, value: unknown): Promise<boolean> {
  return page.evaluate(
    async ([p, v]) => {
      const w = window as unknown as { __lamina: { editNow(path: string, value: unknown): Promise<{ accepted: boolean }> } };
      return (await w.__lamina.editNow(p as string, v)).accepted;
    },
    [path, value] as const,
  );
}

/** The app state's report as JSON (the analysis, independent of display units). */
export async function reportJson(page: Page): Promise<string> {
  return page.evaluate(() => {
    const w = window as unknown as { __lamina: { state(): { analysis: { report: unknown } | null } } };
    return JSON.stringify(w.__lamina.state().analysis?.report ?? null);
  });
}

/** data-path of the deepest focused element (through shadow roots), or null. */
export async function focusedPath(page: Page): Promise<string | null> {
  return page.evaluate(() => {
    let el: Element | null = document.activeElement;
    while (el && el.shadowRoot && el.shadowRoot.activeElement) el = el.shadowRoot.activeElement;
    return el instanceof HTMLElement ? (el.dataset.path ?? null) : null;
  });
}

/**
 * The text of a located element, whitespace collapsed. Uses textContent, not innerText: the app
 * skips rendering off-screen sections (content-visibility: auto), where innerText is empty.
 */
export async function text(locator: import('playwright-core').Locator): Promise<string> {
  return ((await locator.textContent()) ?? '').replace(/\s+/g, ' ').trim();
}

/** Render every worksheet section (the app skips off-screen ones) so element screenshots are stable. */
export async function renderAllSections(page: Page): Promise<void> {
  await page.evaluate(() => {
    const root = document.querySelector('lamina-app')?.shadowRoot;
    if (!root || root.getElementById('results-test-visible')) return;
    const style = document.createElement('style');
    style.id = 'results-test-visible';
    style.textContent = '* { content-visibility: visible !important; } .top { position: static !important; }';
    root.appendChild(style);
  });
}

/** The text of a custom element's shadow root (whitespace collapsed). */
export async function shadowText(locator: import('playwright-core').Locator): Promise<string> {
  const t = await locator.evaluate((el) => (el.shadowRoot ?? el).textContent ?? '');
  return t.replace(/\s+/g, ' ').trim();
}
