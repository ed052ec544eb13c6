/**
 * Content-Security-Policy (issue 14 item 9), in chromium: the app works under its policy in
 * the Vite dev server and in the production build, and what the policy forbids (an inline
 * script, an image from another origin) is blocked and reported as a `securitypolicyviolation`.
 * The downloaded HTML report renders under its own policy, which refuses any script.
 * Source of the expected behaviour: W3C Content Security Policy Level 3 (§ 6.1 fetch
 * directives, § 5.3 violation reports).
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { build, preview, type PreviewServer } from 'vite';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { appSession, fieldFor, openApp, waitForResults } from './app-page';
import { launchChromium } from './chromium';
import { readProjectText } from '../../src/model/project-file';
import { analyse, spanCurve } from '../../src/analysis/index';
import { buildReportDocument } from '../../src/report/report-document';
import { renderHtml } from '../../src/report/render-html';
import { presetText } from '../report/fixtures';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');

interface Violation { directive: string; blocked: string }

/** Record every CSP violation of the page in window.__csp (set before any page script runs). */
async function recordViolations(context: BrowserContext): Promise<void> {
  await context.addInitScript(() => {
    const list: { directive: string; blocked: string }[] = [];
    (window as unknown as { __csp: typeof list }).__csp = list;
    document.addEventListener('securitypolicyviolation', (e) => list.push({ directive: e.effectiveDirective, blocked: e.blockedURI }));
  });
}

const violations = (page: Page): Promise<Violation[]> => page.evaluate(() => (window as unknown as { __csp: Violation[] }).__csp);

/** Use the app (edit a field with a unit and a decimal comma), then try what the policy forbids. */
async function exercise(page: Page): Promise<void> {
  await fieldFor(page, 'opening.span_m').fill('6,5 m');
  await page.waitForFunction(() => window.__lamina!.state().project.opening.span_m === 6.5);
  await waitForResults(page);
  expect(await violations(page)).toEqual([]);

  const ran = await page.evaluate(async () => {
    const s = document.createElement('script');
    s.textContent = 'window.__inlineRan = true';
    document.body.append(s);
    const img = document.createElement('img');
    img.src = 'http://example.invalid/pixel.png';
    document.body.append(img);
    await new Promise((r) => setTimeout(r, 200));
    return (window as unknown as { __inlineRan?: boolean }).__inlineRan === true;
  });
  expect(ran).toBe(false);
  // no 'unsafe-eval': a same-origin script that evaluates a string as code is refused (lit and
  // mathjs need no eval: the edit above ran with no violation). page.evaluate itself is exempt.
  const probe = `${new URL(page.url()).origin}/__eval-probe.js`;
  await page.route(probe, (route) =>
    route.fulfill({ contentType: 'text/javascript', body: "try { window.__evalResult = new Function('return 1')() === 1 ? 'ran' : 'odd'; } catch { window.__evalResult = 'blocked'; }" }),
  );
  await page.evaluate((src) => new Promise((done) => {
    const s = document.createElement('script');
    s.src = src;
    s.onload = s.onerror = () => done(null);
    document.body.append(s);
  }), probe);
  expect(await page.evaluate(() => (window as unknown as { __evalResult?: string }).__evalResult)).toBe('blocked');
  await expect.poll(async () => (await violations(page)).map((v) => v.directive).sort()).toEqual(['img-src', 'script-src', 'script-src-elem']);
}

describe('Content-Security-Policy: the app', () => {
  const session = appSession();

  it('the worksheet works under its policy in the dev server, and an inline script and a foreign image are blocked and reported', async () => {
    const context = await session.browser.newContext({ viewport: { width: 1280, height: 900 } });
    await recordViolations(context);
    const { page, errors, external } = await openApp(session.browser, session.url, { context });
    const policy = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
    expect(policy).toMatch(/script-src 'self'(;|$)/);
    expect(policy).not.toMatch(/unsafe-eval/);
    await exercise(page);
    // chromium announces the refused image as a request that then fails; nothing else left
    expect(external.filter((u) => !u.startsWith('http://example.invalid/'))).toEqual([]);
    expect(errors.filter((e) => !/Content Security Policy|example\.invalid/.test(e))).toEqual([]);
    await context.close();
  });
});

describe('Content-Security-Policy: the production build and the HTML report', () => {
  let browser: Browser;
  let server: PreviewServer | undefined;
  let outDir = '';
  beforeAll(async () => {
    outDir = await mkdtemp(join(tmpdir(), 'lamina-csp-'));
    await build({ root, configFile: resolve(root, 'vite.config.ts'), logLevel: 'error', build: { outDir, emptyOutDir: true } });
    server = await preview({ root, configFile: resolve(root, 'vite.config.ts'), logLevel: 'error', build: { outDir }, preview: { host: '127.0.0.1', port: 0, strictPort: false, open: false } });
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
    if (outDir) await rm(outDir, { recursive: true, force: true });
  });

  it('the built app runs with no violation; the policy still blocks an inline script', async () => {
    const url = server!.resolvedUrls?.local[0];
    if (!url) throw new Error('vite preview did not report a local URL');
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    await recordViolations(context);
    const { page, errors } = await openApp(browser, url, { context });
    await exercise(page);
    expect(errors.filter((e) => !/Content Security Policy|example\.invalid/.test(e))).toEqual([]);
    await context.close();
  });

  it('the HTML report renders under its own policy (inline CSS, SVG) and refuses a script', async () => {
    const text = presetText('coal-room-shale');
    const { project } = readProjectText(text);
    const doc = buildReportDocument({ project, analysis: analyse(project), curve: spanCurve(project, { samples: 40 }), projectText: text, units: 'SI', version: '0.1.0', date: '2026-12-01' });
    // a script that slipped into the file (not through the escaping, which would stop it) must not run
    const html = renderHtml(doc).replace('</body>', '<script>document.title = "ran"</script><img src="http://example.invalid/x.png"></body>');
    const context = await browser.newContext();
    await recordViolations(context);
    const page = await context.newPage();
    const external: string[] = [];
    page.on('request', (r) => {
      if (!/^(data:|about:blank|http:\/\/report\.lamina\.test\/|http:\/\/example\.invalid\/)/.test(r.url())) external.push(r.url());
    });
    // served from an address of its own (setContent's document.open would drop the listener)
    await page.route('http://report.lamina.test/report.html', (route) => route.fulfill({ body: html, contentType: 'text/html; charset=utf-8' }));
    await page.goto('http://report.lamina.test/report.html', { waitUntil: 'load' });
    expect(await page.title()).not.toBe('ran');
    await expect.poll(async () => (await violations(page)).map((v) => v.directive).sort()).toEqual(['img-src', 'script-src-elem']);
    expect(external).toEqual([]);
    // the inline styles apply: the report's table borders are drawn (not the browser default 0)
    const h2Border = await page.locator('.lamina-report h2').first().evaluate((el) => getComputedStyle(el).borderBottomWidth);
    expect(h2Border).not.toBe('0px');
    expect(await page.locator('svg').count()).toBeGreaterThan(3);
    await context.close();
  });
});
