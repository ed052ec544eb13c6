/**
 * The HTML report prints: render a preset's report, open it in headless chromium, print it to
 * an A4 PDF and check that the PDF is valid, has at least two pages, and that the printed page
 * carries the caution. A copy goes to test-artifacts/ (gitignored) for a person to look at.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { execFileSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { analyse, spanCurve } from '../../src/analysis/index';
import { CAUTION } from '../../src/model/caution';
import { readProjectText } from '../../src/model/project-file';
import { buildReportDocument } from '../../src/report/report-document';
import { renderHtml } from '../../src/report/render-html';
import { presetText } from '../report/fixtures';
import { launchChromium } from './chromium';

/** Count page objects: `/Type /Page` not followed by `s` (which would be the `/Pages` tree). */
export function countPdfPages(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-zA-Z])/g) ?? []).length;
}

function hasPdftotext(): boolean {
  try {
    execFileSync('pdftotext', ['-v'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe('HTML report → PDF (chromium print)', () => {
  it('the coal-room report prints to a valid A4 PDF of ≥ 2 pages that carries the caution', async () => {
    const text = presetText('coal-room-shale');
    const { project } = readProjectText(text);
    const analysis = analyse(project);
    const doc = buildReportDocument({ project, analysis, curve: spanCurve(project), projectText: text, units: 'SI', version: '0.1.0', date: '2026-12-01' });
    const html = renderHtml(doc);

    const page = await browser.newPage();
    const external: string[] = [];
    page.on('request', (r) => {
      if (!r.url().startsWith('data:') && r.url() !== 'about:blank') external.push(r.url());
    });
    await page.setContent(html, { waitUntil: 'load' });
    const body = (await page.textContent('body')) ?? '';
    expect(body).toContain(CAUTION);
    expect(body).toContain(project.layers[0]?.name ?? '');
    expect(await page.locator('svg').count()).toBeGreaterThan(3);

    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    await page.close();
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdf.subarray(-1024).toString('latin1')).toContain('%%EOF');
    const pages = countPdfPages(pdf);
    expect(pages).toBeGreaterThanOrEqual(2);
    expect(external).toEqual([]);

    mkdirSync('test-artifacts', { recursive: true });
    const out = 'test-artifacts/report-coal-room-shale.pdf';
    writeFileSync(out, pdf);
    if (hasPdftotext()) {
      const printed = execFileSync('pdftotext', ['-layout', out, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      expect(printed).toContain('Roof and overhang falls injure and kill.');
    }
  });

  it('every preset: the summary (trace: false) prints on at most 4 A4 pages in SI and US; the full report adds the appendix, each trace entry once', async () => {
    for (const name of ['coal-room-shale', 'drift-limestone', 'intersection-limestone', 'quarry-bench-overhang']) {
      const text = presetText(name);
      const { project } = readProjectText(text);
      const analysis = analyse(project);
      const curve = spanCurve(project);
      for (const units of ['SI', 'US'] as const) {
        for (const trace of [false, true]) {
          const doc = buildReportDocument({ project, analysis, curve, projectText: text, units, version: '0.1.0', date: '2026-12-01', trace });
          const page = await browser.newPage();
          await page.setContent(renderHtml(doc), { waitUntil: 'load' });
          const found = await page.evaluate(() => ({
            appendix: document.querySelectorAll('section.lr-appendix').length,
            trace: document.querySelectorAll('section.lr-section-trace').length,
            paths: [...document.querySelectorAll('.lr-formula code')].map((c) => c.textContent ?? ''),
            body: document.body.innerText.replace(/\s+/g, ' '),
          }));
          expect(found.body).toContain(CAUTION);
          if (trace) {
            expect(found.trace).toBe(1);
            expect(new Set(found.paths).size).toBe(found.paths.length);
            expect(found.paths.length).toBe(analysis.report.trace.length);
          } else {
            expect(found.appendix).toBe(0);
            expect(found.paths).toEqual([]);
            const pdf = await page.pdf({ format: 'A4', printBackground: true });
            const pages = countPdfPages(pdf);
            expect(pages, `${name} ${units} summary: ${pages} pages`).toBeLessThanOrEqual(4);
            expect(pages).toBeGreaterThanOrEqual(2);
            if (units === 'SI') writeFileSync(`test-artifacts/report-${name}-summary.pdf`, pdf);
          }
          await page.close();
        }
      }
    }
  });
});
