/**
 * Shared steps for the app browser tests: open the worksheet in a fresh page, collect console
 * errors, page errors and any request that leaves the app's origin, and wait until the
 * analysis has run and rendered.
 */
import { afterAll, beforeAll } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchChromium } from './chromium';
import { startApp, type AppServer } from './app-server';

export interface AppPage {
  page: Page;
  context: BrowserContext;
  /** Console errors and uncaught page errors. */
  errors: string[];
  /** Requests whose URL is not on the app's origin (data: and blob: URLs are local). */
  external: string[];
}

export async function openApp(browser: Browser, url: string, options: { context?: BrowserContext; viewport?: { width: number; height: number } } = {}): Promise<AppPage> {
  const context = options.context ?? (await browser.newContext({ viewport: options.viewport ?? { width: 1280, height: 900 }, acceptDownloads: true }));
  const page = await context.newPage();
  const errors: string[] = [];
  const external: string[] = [];
  const origin = new URL(url).origin;
  page.on('console', (m) => {
    if (m.type() === 'error') errors.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => errors.push(`page: ${e.message}`));
  page.on('request', (r) => {
    const u = r.url();
    if (u.startsWith('data:') || u.startsWith('blob:')) return;
    if (new URL(u).origin !== origin) external.push(u);
  });
  await page.goto(url);
  await waitForResults(page);
  return { page, context, errors, external };
}

/**
 * Wait until the store holds a finished analysis and the page has rendered it: the whole sheet
 * (its lower sections load after the first results: `lamina:sheet-complete`), and the views out
 * of view, which update once the page is idle after the paint (`DeferOffscreen`).
 */
export async function waitForResults(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const hook = window.__lamina;
    if (!hook) return false;
    const s = hook.state();
    return s.analysis !== null && !s.pending && performance.getEntriesByName('lamina:sheet-complete').length > 0;
  }, null, { timeout: 30_000 });
  await page.evaluate(() => window.__lamina!.app.updateComplete);
  await settle(page);
}

/** The next frame has painted and the page has been idle once after it (at most 1 s). */
export async function settle(page: Page): Promise<void> {
  await page.evaluate(
    () => new Promise((r) => requestAnimationFrame(() => setTimeout(() => requestIdleCallback(() => r(null), { timeout: 1000 }), 0))),
  );
}

/** The current project JSON held by the store. */
export const projectJson = (page: Page): Promise<string> => page.evaluate(() => JSON.stringify(window.__lamina!.state().project));

/** The current report JSON held by the store. */
export const reportJson = (page: Page): Promise<string> => page.evaluate(() => JSON.stringify(window.__lamina!.state().analysis?.report ?? null));

/** A `<quantity-input>`'s text box by its project path. */
export const fieldFor = (page: Page, path: string) => page.locator(`quantity-input[path="${path}"] input`);

/** Make the sticky top block static so element screenshots are not covered by it. */
export async function unstick(page: Page): Promise<void> {
  await page.evaluate(() => {
    const top = document.querySelector('lamina-app')?.shadowRoot?.querySelector<HTMLElement>('.top');
    if (top) top.style.position = 'static';
  });
}

export interface AppSession {
  browser: Browser;
  url: string;
}

/**
 * One dev server and one chromium for a test file: started in beforeAll, closed in afterAll.
 * Read `session.browser` and `session.url` inside the tests (they are set once beforeAll ran).
 */
export function appSession(): AppSession {
  let server: AppServer | undefined;
  const session = {} as AppSession;
  beforeAll(async () => {
    server = await startApp();
    session.url = server.url;
    session.browser = await launchChromium();
  });
  afterAll(async () => {
    await session.browser?.close();
    await server?.close();
  });
  return session;
}

/**
 * Open the report section (it is built only when shown, printed or downloaded) and wait until
 * the report of the current values is in it.
 */
export async function showReport(page: Page): Promise<void> {
  const toggle = page.locator('report-view [data-role="toggle"]');
  await toggle.waitFor({ timeout: 20_000 });
  if ((await toggle.getAttribute('aria-expanded')) !== 'true') await toggle.click();
  await page.locator('report-view [data-role="report"] article.lamina-report').waitFor({ timeout: 30_000 });
}
