import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { CAUTION } from '../../src/model/caution';
import { ARTIFACTS, startHarness, type Harness, text, renderAllSections } from './results-harness';
import { showReport } from './app-page';

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => {
  await h?.close();
});

type Page = import('playwright-core').Page;
const state = (page: Page) => page.evaluate(() => (window as any).__lamina.state());

async function reportReady(page: Page): Promise<void> {
  await showReport(page);
}

/** Count PDF page objects: "/Type /Page" not followed by "s" (that would be the /Pages tree). */
function pdfPageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?!s)/g) ?? []).length;
}

describe('<report-view> in the app (coal-room demo)', () => {
  it('shows the report with the caution and every layer', async () => {
    const page = await h.open();
    await reportReady(page);
    const shown = await text(page.locator('report-view [data-role="report"]'));
    expect(shown).toContain(CAUTION);
    const s = await state(page);
    for (const layer of s.project.layers) expect(shown).toContain(layer.name);
    await renderAllSections(page);
    await page.locator('report-view [data-role="report"] section.lr-section-verdict').screenshot({ path: resolve(ARTIFACTS, 'results-report-verdict.png') });
    expect(h.problems).toEqual([]);
  });

  it('print media shows only the report, with the caution and no buttons or inputs', async () => {
    const page = await h.open();
    await reportReady(page);
    await page.emulateMedia({ media: 'print' });
    const seen = await page.evaluate(() => {
      const visible = (el: Element) => {
        const r = (el as HTMLElement).getBoundingClientRect();
        return r.width > 0 && r.height > 0 && getComputedStyle(el).visibility !== 'hidden';
      };
      const deep = (root: Document | ShadowRoot, sel: string, out: Element[] = []) => {
        root.querySelectorAll(sel).forEach((e) => out.push(e));
        root.querySelectorAll('*').forEach((e) => e.shadowRoot && deep(e.shadowRoot, sel, out));
        return out;
      };
      const container = document.getElementById('lamina-print-report');
      return {
        containerVisible: !!container && visible(container),
        containerText: container?.innerText ?? '',
        visibleButtons: deep(document, 'button').filter(visible).length,
        visibleInputs: deep(document, 'input, select, textarea').filter(visible).length,
        appVisible: visible(document.querySelector('lamina-app')!),
      };
    });
    expect(seen.containerVisible).toBe(true);
    expect(seen.appVisible).toBe(false);
    expect(seen.visibleButtons).toBe(0);
    expect(seen.visibleInputs).toBe(0);
    expect(seen.containerText.replace(/\s+/g, ' ')).toContain(CAUTION);
    const s = await state(page);
    for (const layer of s.project.layers) expect(seen.containerText).toContain(layer.name);
    await page.screenshot({ path: resolve(ARTIFACTS, 'results-print.png'), fullPage: false });
    await page.emulateMedia({ media: 'screen' });
    expect(h.problems).toEqual([]);
  });

  it('page.pdf() of the app prints the report over several pages', async () => {
    const page = await h.open();
    await reportReady(page);
    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    writeFileSync(resolve(ARTIFACTS, 'results-app-print.pdf'), pdf);
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdfPageCount(pdf)).toBeGreaterThanOrEqual(2);
    expect(h.problems).toEqual([]);
  });

  it('the trace switch: off prints the summary alone (≤ 4 A4 pages, caution kept); on adds the appendix, each trace entry once', async () => {
    const page = await h.open();
    await reportReady(page);
    const frame = page.locator('report-view [data-role="report"]');
    const s = await state(page);
    expect(await frame.locator('section.lr-section-trace').count()).toBe(1);
    const paths = await frame.locator('section.lr-section-trace .lr-formula code').allTextContents();
    expect(new Set(paths).size).toBe(paths.length);
    expect(paths.length).toBe(s.analysis.report.trace.length);
    expect(await frame.locator('.lr-formula').count()).toBe(paths.length); // none outside the trace appendix
    await page.locator('report-view [data-role="with-trace"]').uncheck();
    await expect.poll(() => frame.locator('section.lr-section-trace').count(), { timeout: 10_000 }).toBe(0);
    expect(await frame.locator('section.lr-appendix').count()).toBe(0);
    expect((await text(frame)).replace(/\s+/g, ' ')).toContain(CAUTION);
    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    writeFileSync(resolve(ARTIFACTS, 'results-app-summary.pdf'), pdf);
    expect(pdfPageCount(pdf)).toBeLessThanOrEqual(4);
    await page.locator('report-view [data-role="with-trace"]').check();
    await expect.poll(() => frame.locator('section.lr-section-trace').count(), { timeout: 10_000 }).toBe(1);
    expect(h.problems).toEqual([]);
  });

  it('"Download HTML report" saves <title>-report.html: a whole HTML file with the caution and each layer', async () => {
    const page = await h.open();
    await reportReady(page);
    const s = await state(page);
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.locator('report-view [data-role="download"]').click(),
    ]);
    expect(download.suggestedFilename()).toBe(`${s.project.title.replace(/[\\/:*?"<>|]+/g, '-')}-report.html`);
    const path = resolve(ARTIFACTS, 'results-download-report.html');
    await download.saveAs(path);
    const html = readFileSync(path, 'utf8');
    expect(html.startsWith('<!doctype html>')).toBe(true);
    expect(html).toContain(CAUTION);
    for (const layer of s.project.layers) expect(html).toContain(layer.name);
    expect(html).not.toMatch(/NaN|Infinity/);
    expect(h.problems).toEqual([]);
  });

  it('"Print / Save as PDF" calls window.print()', async () => {
    const page = await h.open();
    await reportReady(page);
    await page.evaluate(() => {
      (window as any).__printed = 0;
      window.print = () => {
        (window as any).__printed++;
      };
    });
    await page.locator('report-view [data-role="print"]').click();
    expect(await page.evaluate(() => (window as any).__printed)).toBe(1);
    expect(h.problems).toEqual([]);
  });

  it('the report is not built until it is shown: no report element and an empty print copy before, the report after', async () => {
    const page = await h.open();
    const before = await page.evaluate(() => ({
      report: document.querySelector('lamina-app')!.shadowRoot!.querySelector('report-view')!.shadowRoot!.querySelectorAll('[data-role="report"], article').length,
      printCopy: document.getElementById('lamina-print-report')?.innerHTML.length ?? -1,
    }));
    expect(before).toEqual({ report: 0, printCopy: 0 });
    await showReport(page);
    expect(await page.locator('report-view [data-role="toggle"]').getAttribute('aria-expanded')).toBe('true');
    expect(await text(page.locator('report-view [data-role="report"]'))).toContain(CAUTION);
    // hiding it removes it from the page
    await page.locator('report-view [data-role="toggle"]').click();
    await expect.poll(() => page.locator('report-view [data-role="report"]').count()).toBe(0);
    expect(h.problems).toEqual([]);
  });

  it('"Print / Save as PDF" with the report closed builds the report first, then prints it', async () => {
    const page = await h.open();
    await page.evaluate(() => {
      (window as any).__printedText = null;
      window.print = () => {
        (window as any).__printedText = document.getElementById('lamina-print-report')?.textContent ?? '';
      };
    });
    await page.locator('report-view [data-role="print"]').click();
    await page.waitForFunction(() => (window as any).__printedText !== null, undefined, { timeout: 30_000 });
    const printed = ((await page.evaluate(() => (window as any).__printedText)) as string).replace(/\s+/g, ' ');
    expect(printed).toContain(CAUTION);
    const s = await state(page);
    for (const layer of s.project.layers) expect(printed).toContain(layer.name);
    expect(h.problems).toEqual([]);
  });

  it("the browser's own print (beforeprint) fills the print copy with the report of the current values", async () => {
    const page = await h.open();
    await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
    // at once when the report code is loaded; otherwise a note now and the report once it loads
    await expect
      .poll(async () => (await page.evaluate(() => document.getElementById('lamina-print-report')?.textContent ?? '')).replace(/\s+/g, ' '), { timeout: 30_000 })
      .toContain(CAUTION);
    expect(h.problems).toEqual([]);
  });

  it('US units: the report follows the display units', async () => {
    const page = await h.open();
    await reportReady(page);
    await page.locator('project-bar input[type="radio"][value="US"]').check();
    await expect.poll(async () => (await text(page.locator('report-view [data-role="report"]'))).includes(' ft'), { timeout: 10_000 }).toBe(true);
    expect(h.problems).toEqual([]);
  });
});
