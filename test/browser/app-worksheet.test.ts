/**
 * The worksheet as a new user meets it: a new project with its defaults stated, demo text left
 * in a changed project, a phone-width screen, US display precision, the stale marker and the
 * refused-file dialog. Screenshots go to test-artifacts/.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { mkdir } from 'node:fs/promises';
import type { Page } from 'playwright-core';
import { fieldFor, openApp, projectJson, waitForResults, appSession, showReport } from './app-page';
import { CAUTION_SHORT } from '../../src/model/caution';
import { NEW_PROJECT_DESCRIPTION } from '../../src/model/new-project';

const OUT = 'test-artifacts';
const session = appSession();
beforeAll(() => mkdir(OUT, { recursive: true }));

const state = (page: Page) => page.evaluate(() => window.__lamina!.state());
const reportText = async (page: Page): Promise<string> => {
  await showReport(page);
  const frame = page.locator('report-view [data-role="report"]');
  await expect.poll(() => frame.count(), { timeout: 20_000 }).toBe(1);
  return (await frame.textContent()) ?? '';
};

/**
 * Elements that stick out past the right edge of the viewport and are not inside a sideways
 * scroller (so they would be cut off or widen the page). Visually hidden labels (1 px) do not
 * count. Runs as a string: the test bundler's helpers are not defined in the page.
 */
const OUTSIDE = `(() => {
  const w = document.documentElement.clientWidth;
  const out = [];
  const parentOf = (e) => e.parentElement ?? (e.getRootNode() instanceof ShadowRoot ? e.getRootNode().host : null);
  const inScroller = (el) => {
    for (let e = parentOf(el); e; e = parentOf(e)) {
      const o = getComputedStyle(e).overflowX;
      if (o === 'auto' || o === 'scroll') return true;
    }
    return false;
  };
  const walk = (root) => {
    for (const el of root.querySelectorAll('*')) {
      const r = el.getBoundingClientRect();
      if (r.width > 1 && r.height > 1 && r.right > w + 0.5 && !inScroller(el)) out.push(el.tagName.toLowerCase() + '.' + String(el.className) + ' right ' + Math.round(r.right));
      if (el.shadowRoot) walk(el.shadowRoot);
    }
  };
  walk(document);
  return out.slice(0, 10);
})()`;

/** The text inside an element's shadow root (the text a reader sees). */
const shadowText = (page: Page, tag: string) =>
  page.evaluate(`document.querySelector('lamina-app').shadowRoot.querySelector(${JSON.stringify(tag)}).shadowRoot.textContent.replace(/\\s+/g, ' ')`) as Promise<string>;

/** Rectangle of the first element matching a selector inside <lamina-app>'s shadow root. */
const rectOf = (page: Page, selector: string) =>
  page.evaluate(`(() => {
    const el = document.querySelector('lamina-app').shadowRoot.querySelector(${JSON.stringify(selector)});
    if (!el) return null;
    const r = el.getBoundingClientRect();
    return { top: r.top, bottom: r.bottom, left: r.left, right: r.right, height: r.height };
  })()`) as Promise<{ top: number; bottom: number; left: number; right: number; height: number } | null>;

describe('app: new project and demo text', () => {
  it('New project gives one layer, lists each placeholder and default on screen and in the report, and a placeholder leaves the list once replaced', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    await page.locator('project-bar #new-project').click();
    await waitForResults(page);
    const p = (await state(page)).project;
    expect(p.layers).toHaveLength(1);
    expect(p.title).toBe('New project');
    expect(p.description).toBe(NEW_PROJECT_DESCRIPTION);
    const panel = page.locator('lamina-app details.new-project');
    await expect.poll(() => panel.count()).toBe(1);
    const placeholders = panel.locator('ul.placeholders li');
    const listed = await placeholders.allTextContents();
    // the defaults of model/defaults.ts, stated with their values
    expect(listed.some((t) => /^Span 6 m/.test(t))).toBe(true);
    expect(listed.some((t) => /^Layer 1 thickness 0\.5 m/.test(t))).toBe(true);
    expect(listed.some((t) => /tensile strength \(Brazilian\) 3 MPa/.test(t))).toBe(true);
    expect(await panel.locator('summary').textContent()).toMatch(/placeholders to replace/);
    expect(await panel.locator('ul.defaults li').allTextContents()).toEqual(expect.arrayContaining([expect.stringMatching(/^FS target, tension 2/)]));
    expect(await reportText(page)).toContain('Placeholder values still in use');
    await page.screenshot({ path: `${OUT}/new-project-1280.png` });

    await fieldFor(page, 'opening.span_m').fill('5.5');
    await waitForResults(page);
    await expect.poll(async () => (await placeholders.allTextContents()).some((t) => t.startsWith('Span '))).toBe(false);
    // closing the list drops the new-project description
    await page.locator('lamina-app #end-new-project').click();
    await waitForResults(page);
    expect((await state(page)).project.description).toBeUndefined();
    expect(await panel.count()).toBe(0);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('a demo whose values were changed is flagged in the app and the report, and one click clears its title and description', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const warning = page.locator('lamina-app .demo-leftover');
    // the demo as shipped: its "invented data" text is true, so no warning
    expect(await warning.count()).toBe(0);
    await fieldFor(page, 'opening.span_m').fill('7');
    await waitForResults(page);
    await expect.poll(() => warning.count()).toBe(1);
    expect(await warning.textContent()).toMatch(/invented data.*values have been changed/s);
    await expect.poll(() => reportText(page)).toContain('Demo text in a changed project');
    await page.locator('lamina-app #clear-demo-text').click();
    await waitForResults(page);
    const p = (await state(page)).project;
    expect(p.title).toBe('Untitled project');
    expect(p.description).toBeUndefined();
    expect(p.opening.span_m).toBe(7);
    expect(await warning.count()).toBe(0);
    await expect.poll(() => reportText(page)).not.toContain('Demo text in a changed project');
    expect(errors).toEqual([]);
    await context.close();
  });
});

describe('app: phone and narrow screens', () => {
  for (const viewport of [
    { width: 390, height: 844 },
    { width: 360, height: 740 },
  ]) {
    it(`${viewport.width} × ${viewport.height}: no sideways overflow anywhere, caution and verdict on screen while scrolling, every layer reachable`, async () => {
      const { page, context, errors } = await openApp(session.browser, session.url, { viewport });
      const height = (await page.evaluate('document.documentElement.scrollHeight')) as number;
      await page.screenshot({ path: `${OUT}/phone-${viewport.width}-top.png` });
      let shot = 0;
      for (let y = 0; y < height; y += Math.round(viewport.height * 0.8)) {
        await page.evaluate(`window.scrollTo(0, ${y})`);
        await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => r(null))));
        const scrollWidth = (await page.evaluate('document.documentElement.scrollWidth')) as number;
        expect(scrollWidth, `page width at y = ${y}`).toBeLessThanOrEqual(viewport.width);
        expect(await page.evaluate(OUTSIDE), `elements cut off at y = ${y}`).toEqual([]);
        // a caution is fully on screen: the full one at the top, or the pinned one-line caution
        const cautions = (await page.evaluate(`(() => [...document.querySelector('lamina-app').shadowRoot.querySelectorAll('caution-banner')].map((c) => {
          const r = c.getBoundingClientRect();
          return r.height > 0 && r.top >= 0 && r.bottom <= innerHeight;
        }))()`)) as boolean[];
        expect(cautions.some(Boolean), `caution on screen at y = ${y}`).toBe(true);
        const verdict = [await rectOf(page, 'verdict-line'), await rectOf(page, 'verdict-chip')];
        expect(verdict.some((r) => r !== null && r.height > 0 && r.top >= 0 && r.bottom <= viewport.height), `verdict on screen at y = ${y}`).toBe(true);
        if (y > 2 * viewport.height && shot < 3) await page.screenshot({ path: `${OUT}/phone-${viewport.width}-scrolled-${++shot}.png` });
      }
      // the pinned caution is the one-line text
      expect(await page.locator('lamina-app .pin caution-banner .text').textContent()).toBe(CAUTION_SHORT);
      // strata as stacked cards: one per layer, each reachable and inside the screen's width
      const n = (await state(page)).project.layers.length;
      expect(n).toBeGreaterThan(1);
      const cards = page.locator('strata-editor section.card');
      expect(await cards.count()).toBe(n);
      expect(await page.locator('strata-editor .layer-index a').count()).toBe(n);
      for (let i = 0; i < n; i++) {
        await page.locator('strata-editor .layer-index a').nth(i).click();
        const box = await cards.nth(i).boundingBox();
        expect(box, `layer ${i + 1} card`).not.toBeNull();
        expect(box!.x).toBeGreaterThanOrEqual(0);
        expect(box!.x + box!.width).toBeLessThanOrEqual(viewport.width);
        expect(box!.y).toBeLessThan(viewport.height);
        const thickness = fieldFor(page, `layers[${i}].thickness_m`);
        expect(await thickness.isVisible()).toBe(true);
      }
      await cards.nth(n - 1).screenshot({ path: `${OUT}/phone-${viewport.width}-last-layer.png` });
      expect(errors).toEqual([]);
      await context.close();
    });
  }
});

describe('app: precision, stale results and refused files', () => {
  it('US display: converted inputs to 4 significant figures, results to 3, typed text kept as typed', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    await page.locator('project-bar input[value="US"]').check();
    await waitForResults(page);
    // 6 m / 0.3048 = 19.685 ft → "19.69"; 0.5 m / 0.3048 = 1.6404 ft → "1.64" (METHODS §13)
    await expect.poll(() => fieldFor(page, 'opening.span_m').inputValue()).toBe('19.69');
    expect(await fieldFor(page, 'layers[0].thickness_m').inputValue()).toBe('1.64');
    const p = (await state(page)).project;
    // unit weight: 1 lbf/ft³ = 0.157087 kN/m³ (METHODS §13), 4 significant figures
    const uw = Number(await fieldFor(page, 'layers[0].unitWeight_kNm3').inputValue());
    expect(Math.abs(uw - p.layers[0].unitWeight_kNm3 / 0.157087)).toBeLessThan(0.05);
    // no input box and no result on the sheet shows more than 4 significant figures
    const values = await page.locator('quantity-input input').evaluateAll((els) => els.map((e) => (e as HTMLInputElement).value));
    // (whole-number digits are never rounded away: 85 GPa is 12328 ksi)
    for (const v of values) {
      const whole = v.split('.')[0].replace('-', '').replace(/^0+/, '').length;
      expect(v.replace(/^[-0.]+/, '').replace('.', '').length, v).toBeLessThanOrEqual(Math.max(4, whole));
    }
    // (the span section also echoes the current span, an input, to 4 figures: results views only here)
    const sheet = await Promise.all(['verdict-line', 'checks-table', 'strength-chain-view'].map((tag) => shadowText(page, tag)));
    for (const text of sheet) expect(text.length).toBeGreaterThan(50);
    // every decimal shown has at most 3 significant figures (whole-number digits aside)
    for (const text of sheet) {
      for (const [n] of text.matchAll(/\d+\.\d+/g)) {
        const [whole, frac] = n.split('.');
        const w = whole.replace(/^0+/, '').length;
        const significant = w > 0 ? w + frac.length : frac.replace(/^0+/, '').length;
        expect(significant, `${n} in ${text.slice(0, 40)}…`).toBeLessThanOrEqual(Math.max(3, w));
      }
    }
    // the governing largest span in ft is the SI value / 0.3048 to 3 significant figures
    const span = (await state(page)).analysis!.report.maxSpan_m!.governing!;
    expect(sheet[0]).toContain(`${Number((span / 0.3048).toPrecision(3))} ft`);
    // text typed by the user stays as typed after leaving the field
    await fieldFor(page, 'opening.span_m').fill('20.50');
    await fieldFor(page, 'opening.span_m').blur();
    await waitForResults(page);
    expect(await fieldFor(page, 'opening.span_m').inputValue()).toBe('20.50');
    expect((await state(page)).project.opening.span_m).toBeCloseTo(20.5 * 0.3048, 9);
    await page.screenshot({ path: `${OUT}/us-precision-1280.png` });
    expect(errors).toEqual([]);
    await context.close();
  });

  it('while a field holds a refused value the verdict and results say "Stale", until the field is accepted', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url, { viewport: { width: 390, height: 844 } });
    const staleNotes = page.locator('lamina-app .stale-note');
    expect(await staleNotes.count()).toBe(0);
    await fieldFor(page, 'layers[0].thickness_m').fill('-0.2');
    await expect.poll(() => staleNotes.count()).toBeGreaterThanOrEqual(5); // verdict + sections 4–7
    expect(await staleNotes.first().textContent()).toMatch(/Stale.*last accepted values/s);
    expect(await page.locator('verdict-chip .stale').textContent()).toBe('Stale');
    // another field accepted meanwhile: the refused one still holds its text, so still stale
    await fieldFor(page, 'opening.span_m').fill('5');
    await waitForResults(page);
    expect((await state(page)).stale).toBe(true);
    expect(await fieldFor(page, 'layers[0].thickness_m').inputValue()).toBe('-0.2');
    await page.evaluate('window.scrollTo(0, 3000)');
    await page.screenshot({ path: `${OUT}/stale-390.png` });
    await fieldFor(page, 'layers[0].thickness_m').fill('0.5');
    await expect.poll(() => staleNotes.count()).toBe(0);
    // unreadable text counts too
    await fieldFor(page, 'layers[1].ucs_MPa').fill('strong');
    await expect.poll(() => staleNotes.count()).toBeGreaterThanOrEqual(5);
    await fieldFor(page, 'layers[1].ucs_MPa').fill('60');
    await expect.poll(() => staleNotes.count()).toBe(0);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('a refused file lists its errors in a dialog, never on the current fields, and the project is unchanged', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const before = await projectJson(page);
    const bad = JSON.parse(before);
    bad.opening.span_m = -3;
    bad.layers[0].thickness_m = 0;
    await page.locator('#open-file').setInputFiles({ name: 'site-7.lamina.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bad)) });
    const dialog = page.locator('lamina-app dialog.file-dialog');
    await expect.poll(() => dialog.evaluate((d) => (d as HTMLDialogElement).open)).toBe(true);
    expect(await dialog.locator('h2').textContent()).toBe('Not opened: site-7.lamina.json');
    const items = await dialog.locator('li').allTextContents();
    expect(items.some((t) => t.startsWith('opening.span_m:'))).toBe(true);
    expect(items.some((t) => t.startsWith('layers[0].thickness_m:'))).toBe(true);
    await page.screenshot({ path: `${OUT}/bad-file-dialog.png` });
    // the valid fields of the open project carry no error and nothing is stale
    for (const path of ['opening.span_m', 'layers[0].thickness_m']) {
      expect(await fieldFor(page, path).getAttribute('aria-invalid')).toBe('false');
      expect(await page.locator(`quantity-input[path="${path}"] .error`).count()).toBe(0);
    }
    expect((await state(page)).stale).toBe(false);
    expect(await projectJson(page)).toBe(before);
    await dialog.locator('#file-dialog-close').click();
    await expect.poll(() => dialog.evaluate((d) => (d as HTMLDialogElement).open)).toBe(false);
    expect((await state(page)).fileErrors).toBeNull();
    expect(errors).toEqual([]);
    await context.close();
  });
});
