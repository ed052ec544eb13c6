import { beforeAll, describe, expect, it } from 'vitest';
import { mkdir, stat } from 'node:fs/promises';
import { openApp, unstick, waitForResults, appSession } from './app-page';
import { PRESETS } from '../../src/ui/state/presets';
import { CAUTION } from '../../src/model/caution';

const OUT = 'test-artifacts';
const session = appSession();
beforeAll(() => mkdir(OUT, { recursive: true }));

const SECTIONS = ['opening', 'strata', 'lab', 'strength', 'checks', 'support', 'span', 'uncertainty', 'report'];

describe('app: screenshots of each section (written to test-artifacts/)', () => {
  it('top of the sheet and every section of the demo, SI and US', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url, { viewport: { width: 1280, height: 900 } });
    await page.screenshot({ path: `${OUT}/app-top.png` });
    await unstick(page);
    for (const units of ['SI', 'US'] as const) {
      if (units === 'US') {
        await page.locator('project-bar input[value="US"]').check();
        await waitForResults(page);
      }
      for (const id of SECTIONS) {
        const file = `${OUT}/app-${units.toLowerCase()}-${id}.png`;
        await page.locator(`lamina-app section:has(#${id}-h)`).screenshot({ path: file });
        expect((await stat(file)).size).toBeGreaterThan(1000);
      }
    }
    expect(errors).toEqual([]);
    await context.close();
  });

  it('each preset loads from the menu without errors (screenshot of its strata)', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url, { viewport: { width: 1280, height: 900 } });
    await unstick(page);
    for (const preset of PRESETS) {
      await page.locator('project-bar #preset').selectOption(preset.id);
      await waitForResults(page);
      const title = await page.evaluate(() => window.__lamina!.state().project.title);
      expect(title).toBe((preset.data as { title: string }).title);
      await page.locator('lamina-app section:has(#strata-h)').screenshot({ path: `${OUT}/app-preset-${preset.id}.png` });
      await page.locator('lamina-app section:has(#opening-h)').screenshot({ path: `${OUT}/app-preset-${preset.id}-opening.png` });
    }
    expect(errors).toEqual([]);
    await context.close();
  });

  it('print media shows the caution and the report, without the inputs, buttons or navigation', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    // the browser announces a print with beforeprint; the report is built then (emulateMedia does not send it)
    await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
    await page.waitForFunction(() => (document.getElementById('lamina-print-report')?.textContent ?? '').includes('Caution'), undefined, { timeout: 30_000 });
    await page.emulateMedia({ media: 'print' });
    await page.screenshot({ path: `${OUT}/app-print.png`, fullPage: false });
    const visible = await page.evaluate(() => {
      const shownEl = (el: Element | null | undefined) =>
        el instanceof HTMLElement ? getComputedStyle(el).display !== 'none' && el.getClientRects().length > 0 : false;
      const root = document.querySelector('lamina-app')!.shadowRoot!;
      const shown = (sel: string) => shownEl(root.querySelector(sel));
      // The report view keeps a print-only copy of the report at the top of <body>; when it is
      // there, it is the whole printout (its report carries the caution at start and end).
      const printCopy = document.getElementById('lamina-print-report');
      return {
        printCopy: printCopy !== null,
        printCopyShown: shownEl(printCopy),
        printCopyText: printCopy?.textContent?.replace(/\s+/g, ' ') ?? '',
        app: shownEl(document.querySelector('lamina-app')),
        caution: shown('caution-banner'),
        report: shown('section.print'),
        nav: shown('nav'),
        bar: shown('project-bar'),
        inputs: shown('section.inputs'),
        results: shown('section.results'),
      };
    });
    if (visible.printCopy) {
      expect(visible.printCopyShown).toBe(true);
      expect(visible.printCopyText).toContain(CAUTION);
      expect(visible.app).toBe(false);
    } else {
      expect(visible).toMatchObject({ caution: true, report: true, nav: false, bar: false, inputs: false, results: false });
    }
    // with or without the print copy, the shell itself hides its bar, navigation and inputs in print
    expect({ nav: visible.nav, bar: visible.bar, inputs: visible.inputs }).toEqual({ nav: false, bar: false, inputs: false });
    await context.close();
  });
});
