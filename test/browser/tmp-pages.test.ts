import { it } from 'vitest';
import { writeFileSync, mkdirSync } from 'node:fs';
import { analyse, spanCurve } from '../../src/analysis/index';
import { readProjectText } from '../../src/model/project-file';
import { buildReportDocument } from '../../src/report/report-document';
import { renderHtml } from '../../src/report/render-html';
import { presetText } from '../report/fixtures';
import { launchChromium } from './chromium';
import { countPdfPages } from './report-pdf.test';
it('pages', async () => {
  const browser = await launchChromium();
  mkdirSync('test-artifacts', { recursive: true });
  for (const name of ['coal-room-shale', 'drift-limestone', 'intersection-limestone', 'quarry-bench-overhang']) {
    const text = presetText(name);
    const { project } = readProjectText(text);
    const analysis = analyse(project);
    for (const trace of [false, true]) {
      const doc = buildReportDocument({ project, analysis, curve: spanCurve(project), projectText: text, units: 'SI', version: '0.1.0', date: '2026-12-01', trace });
      const page = await browser.newPage();
      await page.setViewportSize({ width: 688, height: 1000 });
      await page.emulateMedia({ media: 'print' });
      await page.setContent(renderHtml(doc), { waitUntil: 'load' });
      if (!trace && name === 'coal-room-shale') { for (let k = 0; k < 4; k++) await page.screenshot({ path: `/tmp/sum${k}.png`, fullPage: true, clip: { x: 0, y: k * 1000, width: 688, height: 1000 } }); }
      if (!trace && name === 'coal-room-shale') console.log(await page.evaluate(() => [...document.querySelectorAll('section')].map((s) => s.id + ' ' + Math.round(s.getBoundingClientRect().height) + ' [' + [...s.children].map((c) => c.tagName + ':' + Math.round(c.getBoundingClientRect().height)).join(' ') + ']').join('\n')));
      const pdf = await page.pdf({ format: 'A4', printBackground: true });
      writeFileSync(`test-artifacts/tmp-${name}-${trace}.pdf`, pdf);
      console.log(name, trace, countPdfPages(pdf));
      await page.close();
    }
  }
  await browser.close();
}, 120000);
