import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resolve } from 'node:path';
import { showReport } from './app-page';
import { ARTIFACTS, editNow, focusedPath, startHarness, type Harness, text, renderAllSections, shadowText } from './results-harness';

const MODES = ['tension', 'crushing', 'sliding', 'deflection', 'snapThrough'];
const STATUS_TEXT = /^(meets ✓|below ✗|n\/a –|info ○)$/;

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => {
  await h?.close();
});

describe('<checks-table> in the app (coal-room demo)', () => {
  it('shows every mode of every layer with a status word and symbol, and one governing sentence', async () => {
    const page = await h.open();
    const layers = await page.evaluate(() => (window as any).__lamina.state().project.layers.length as number);
    const rows = page.locator('checks-table tbody tr[data-mode]');
    expect(await rows.count()).toBe(layers * MODES.length);
    for (let i = 0; i < layers; i++) {
      for (const mode of MODES) {
        const row = page.locator(`checks-table tr[data-layer="${i}"][data-mode="${mode}"]`);
        expect(await row.count(), `layer ${i} ${mode}`).toBe(1);
        const status = (await text(row.locator('.status')));
        expect(status, `status of layer ${i} ${mode}`).toMatch(STATUS_TEXT);
      }
    }
    const verdict = (await text(page.locator('checks-table [data-role="verdict"]')));
    expect(verdict).toMatch(/^Governing check: tension in layer 1 “Laminated grey shale”, FS [\d.]+ against a target of 2 — it is below the target ✗/);
    expect(verdict).toContain('As an intact beam, layer 1 “Laminated grey shale” would crack');
    expect(verdict).toContain('post-cracking reserve');
    await renderAllSections(page);
    await page.locator('checks-table').screenshot({ path: resolve(ARTIFACTS, 'results-checks.png') });
    expect(h.problems).toEqual([]);
  });

  it('clicking a traced FS opens the trace dialog with formula, values and source; Esc closes it and focus returns', async () => {
    const page = await h.open();
    const button = page.locator('checks-table button.traced[data-path="layers[0].elastic.fsTension"]');
    await button.click();
    const dialog = page.locator('trace-dialog dialog[open]');
    await dialog.waitFor();
    expect(await text(page.locator('trace-dialog [data-role="trace-path"]'))).toBe('layers[0].elastic.fsTension');
    const formula = await text(page.locator('trace-dialog [data-role="formula"]'));
    expect(formula.length).toBeGreaterThan(0);
    expect(formula).not.toContain('*'); // rendered, not the raw mathjs text
    const substituted = await text(page.locator('trace-dialog [data-role="substituted"]'));
    expect(substituted).toMatch(/MPa/);
    expect(await page.locator('trace-dialog [data-role="values"] tbody tr').count()).toBeGreaterThan(0);
    expect((await text(page.locator('trace-dialog [data-role="source"]'))).length).toBeGreaterThan(0);
    await renderAllSections(page);
    await page.locator('trace-dialog dialog').screenshot({ path: resolve(ARTIFACTS, 'results-trace-dialog.png') });
    await page.screenshot({ path: resolve(ARTIFACTS, 'results-trace-dialog-page.png') });

    // Step to the previous related entry of the same layer, then close with Esc.
    await page.locator('trace-dialog [data-role="prev"]').click();
    const stepped = await text(page.locator('trace-dialog [data-role="trace-path"]'));
    expect(stepped).not.toBe('layers[0].elastic.fsTension');
    expect(stepped).toMatch(/^(detail\.)?layers\[0\]/);
    await page.keyboard.press('Escape');
    await page.locator('trace-dialog dialog[open]').waitFor({ state: 'detached' });
    expect(await focusedPath(page)).toBe('layers[0].elastic.fsTension');
    expect(h.problems).toEqual([]);
  });

  it('the trace dialog says so when a path has no entry', async () => {
    const page = await h.open();
    await page.evaluate(() => {
      const table = document.querySelector('lamina-app')!.shadowRoot!.querySelector('checks-table')!;
      table.dispatchEvent(new CustomEvent('show-trace', { detail: { path: 'layers[0].nothing' }, bubbles: true, composed: true }));
    });
    await page.locator('trace-dialog [data-role="missing"]').waitFor();
    expect(await text(page.locator('trace-dialog [data-role="missing"]'))).toContain('layers[0].nothing');
    await page.locator('trace-dialog [data-role="close"]').click();
    await page.locator('trace-dialog dialog[open]').waitFor({ state: 'detached' });
    expect(h.problems).toEqual([]);
  });

  it('a layer named <img src=x onerror=alert(1)> shows as text in every results view', async () => {
    const page = await h.open();
    const evil = '<img src=x onerror=alert(1)>';
    expect(await editNow(page, 'layers[0].name', evil)).toBe(true);
    await showReport(page); // the report and its print copy are built when shown
    const injected = await page.evaluate(() => {
      const root = document.querySelector('lamina-app')!.shadowRoot!;
      let count = 0;
      for (const tag of ['checks-table', 'strength-chain-view', 'span-finder-view', 'beam-charts-view', 'report-view']) {
        const el = root.querySelector(tag);
        count += el?.shadowRoot?.querySelectorAll('img').length ?? 0;
      }
      return count + document.querySelectorAll('#lamina-print-report img').length;
    });
    expect(injected).toBe(0);
    expect(await text(page.locator('checks-table tbody th').first())).toBe(evil);
    expect(await text(page.locator('strength-chain-view h3').first())).toBe(evil);
    expect(h.problems).toEqual([]);
  });

  it('US units change the displayed units of the checks, not the analysis', async () => {
    const page = await h.open();
    const before = await page.evaluate(() => JSON.stringify((window as any).__lamina.state().analysis.report));
    const demand = page.locator('checks-table tr[data-layer="0"][data-mode="tension"] td.num').first();
    expect(await text(demand)).toContain('MPa');
    await page.locator('project-bar input[type="radio"][value="US"]').check();
    await page.waitForFunction(() => (window as any).__lamina.state().units === 'US');
    await page.locator('checks-table').evaluate((el: any) => el.updateComplete);
    expect(await text(demand)).toContain('psi');
    const after = await page.evaluate(() => JSON.stringify((window as any).__lamina.state().analysis.report));
    expect(after).toBe(before);
    // The SI value behind the shown number is unchanged.
    const si = await page.locator('checks-table button.traced[data-path="layers[0].elastic.maxTension_MPa"]').getAttribute('data-si-value');
    const report = JSON.parse(after);
    expect(Number(si)).toBe(report.layers[0].elastic.maxTension_MPa);
    expect(h.problems).toEqual([]);
  });

  it.each(['coal-room-shale', 'drift-limestone', 'quarry-bench-overhang'])(
    'preset %s: every results view renders, with no NaN or Infinity anywhere',
    async (preset) => {
      const page = await h.open();
      await page.evaluate(async (name) => {
        const w = (window as any).__lamina;
        const project = await (await fetch(`/presets/${name}.lamina.json`)).json();
        if (!w.store.replace(project, 'test')) throw new Error('preset refused');
        await w.store.settled();
      }, preset);
      await page.waitForFunction((name) => {
        const s = (window as any).__lamina.state();
        return s.analysis && !s.pending && s.project.title.length > 0 && name.length > 0;
      }, preset);
      await showReport(page);
      for (const tag of ['strength-chain-view', 'checks-table', 'span-finder-view', 'beam-charts-view', 'report-view']) {
        const shown = await shadowText(page.locator(tag));
        expect(shown.length, tag).toBeGreaterThan(100);
        expect(shown, tag).not.toMatch(/NaN|Infinity|undefined|\[object Object\]/);
      }
      for (const u of ['US']) {
        await page.locator(`project-bar input[type="radio"][value="${u}"]`).check();
        await page.waitForFunction((x) => (window as any).__lamina.state().units === x, u);
        for (const tag of ['strength-chain-view', 'checks-table', 'span-finder-view', 'beam-charts-view']) {
          await page.locator(tag).evaluate((el: any) => el.updateComplete);
          expect(await shadowText(page.locator(tag)), `${tag} in ${u}`).not.toMatch(/NaN|Infinity|undefined/);
        }
      }
      expect(h.problems).toEqual([]);
    },
  );
});
