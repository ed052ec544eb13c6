import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resolve } from 'node:path';
import { ARTIFACTS, focusedPath, startHarness, type Harness, renderAllSections } from './results-harness';

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(async () => {
  await h?.close();
});

const STEPS = ['lab', 'direct', 'characteristic', 'block', 'mass', 'design'];

describe('<strength-chain-view> in the app (coal-room demo)', () => {
  it('shows for every layer the six steps with traced values, reasons and sources, and the step chart', async () => {
    const page = await h.open();
    const s = await page.evaluate(() => (window as any).__lamina.state());
    // the step charts are drawn once the view is scrolled near
    await page.locator('strength-chain-view').scrollIntoViewIfNeeded();
    await page.locator('strength-chain-view .chart svg').first().waitFor({ timeout: 20_000 });
    for (let i = 0; i < s.project.layers.length; i++) {
      const section = page.locator(`strength-chain-view section[data-layer="${i}"]`);
      expect((await section.locator('h3').textContent())?.trim()).toBe(s.project.layers[i].name);
      for (const key of STEPS) {
        const row = section.locator(`tr[data-step="${key}"]`);
        expect(await row.count(), `layer ${i} step ${key}`).toBe(1);
        const button = row.locator('button.traced');
        const field = `${key}_MPa`;
        expect(await button.getAttribute('data-path')).toBe(`layers[${i}].strength.${field}`);
        expect(Number(await button.getAttribute('data-si-value'))).toBe(s.analysis.report.layers[i].strength[field]);
        expect((await row.locator('.reason').textContent() ?? '').trim().length).toBeGreaterThan(0);
        expect((await row.locator('.source').textContent() ?? '').trim().length).toBeGreaterThan(0);
      }
      expect(await section.locator('.chart svg').count()).toBe(1);
      const cross = (await section.locator('tr[data-role="cross-jointed"]').textContent() ?? '').replace(/\s+/g, ' ');
      expect(cross).toContain(s.analysis.report.layers[i].strength.crossJointed ? 'yes' : 'no');
      expect(cross).toContain('cross-joint spacing is less than the span');
    }
    await renderAllSections(page);
    await page.locator('strength-chain-view').screenshot({ path: resolve(ARTIFACTS, 'results-strength-chain.png') });
    expect(h.problems).toEqual([]);
  });

  it('a traced number opens its trace from the keyboard (Tab focus, Enter), and the chain shows psi in US units', async () => {
    const page = await h.open();
    const button = page.locator('strength-chain-view button.traced[data-path="layers[0].strength.gsi"]');
    await button.focus();
    expect(await focusedPath(page)).toBe('layers[0].strength.gsi');
    await page.keyboard.press('Enter');
    await page.locator('trace-dialog dialog[open]').waitFor();
    expect(await page.locator('trace-dialog [data-role="trace-path"]').innerText()).toBe('layers[0].strength.gsi');
    await page.keyboard.press('Escape');
    await page.locator('trace-dialog dialog[open]').waitFor({ state: 'detached' });
    expect(await focusedPath(page)).toBe('layers[0].strength.gsi');

    const design = page.locator('strength-chain-view button.traced[data-path="layers[0].strength.design_MPa"]');
    const text = async () => ((await design.textContent()) ?? '').replace(/\s+/g, ' ').trim();
    expect(await text()).toMatch(/MPa$/);
    await page.locator('project-bar input[type="radio"][value="US"]').check();
    await expect.poll(text).toMatch(/psi$/);
    await page.locator('strength-chain-view').scrollIntoViewIfNeeded();
    await expect.poll(async () => (await page.locator('strength-chain-view section[data-layer="0"] .chart').textContent()) ?? '', { timeout: 20_000 }).toContain('psi');
    expect(h.problems).toEqual([]);
  });
});
