import { describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { openApp, projectJson, waitForResults, appSession } from './app-page';

const session = appSession();

const characteristicShown = (page: Page) => page.locator('lab-tests-panel .characteristic button.traced').getAttribute('data-si-value');

describe('app: lab tests', () => {
  it('pasting tab-separated rows from a spreadsheet adds specimens and moves the strength chain', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const n0 = JSON.parse(await projectJson(page)).layers[0].tensile.specimens.length;
    const before = Number(await characteristicShown(page));
    const chainBefore = await page.evaluate(() => window.__lamina!.state().analysis!.report.layers[0].strength.characteristic_MPa);
    expect(Number(before)).toBeCloseTo(chainBefore, 12);
    const chainText = () => page.locator('strength-chain-view').evaluate((el) => el.shadowRoot?.textContent ?? '');
    const strengthViewBefore = await chainText();
    // two strong discs: 2P/(πDL) with P = 20 kN, D = 54 mm, L = 27 mm is 8.733 MPa (METHODS §5)
    const tsv = 'id\tdiameter_mm\tthickness_mm\tpeakLoad_kN\tvalid\nP-1\t54\t27\t20\tyes\nP-2\t54\t27\t20\tyes\n';
    await page.locator('lab-tests-panel textarea').fill(tsv);
    await page.locator('lab-tests-panel #paste-append').click();
    await waitForResults(page);
    const specs = JSON.parse(await projectJson(page)).layers[0].tensile.specimens;
    expect(specs.length).toBe(n0 + 2);
    expect(specs[n0]).toEqual({ id: 'P-1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 20, valid: true });
    await expect.poll(async () => Number(await characteristicShown(page))).toBeGreaterThan(before);
    // the new rows show their Brazilian strength: 8.73 MPa (METHODS §5 check value 8.733)
    const row = page.locator(`lab-tests-panel tr[data-specimen="${n0}"]`);
    expect(Number(await row.locator('button.traced').getAttribute('data-si-value'))).toBeCloseTo(8.733, 3);
    if (await page.evaluate(() => customElements.get('strength-chain-view') !== undefined)) {
      expect(strengthViewBefore).not.toBe('');
      await expect.poll(chainText).not.toBe(strengthViewBefore);
    }
    expect(errors).toEqual([]);
    await context.close();
  });

  it('a paste with a bad row applies nothing and lists the row and column', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    const before = await projectJson(page);
    const csv = 'id,diameter_mm,thickness_mm,peakLoad_kN\nQ-1,54,27,10\nQ-2,54,abc,10\n';
    await page.locator('lab-tests-panel textarea').fill(csv);
    await page.locator('lab-tests-panel #paste-append').click();
    const problems = page.locator('lab-tests-panel .problems li');
    await expect.poll(() => problems.count()).toBe(1);
    expect(await problems.first().textContent()).toMatch(/^row 3, column thickness_mm: /);
    expect(await projectJson(page)).toBe(before);
    await context.close();
  });

  it('unticking "valid break" drops the specimen from the statistics (n falls by one)', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    const n = await page.evaluate(() => window.__lamina!.state().analysis!.layers[0].lab.n);
    const box = page.locator('lab-tests-panel tr[data-specimen="0"] input[type="checkbox"]');
    expect(await box.isChecked()).toBe(true);
    await box.uncheck();
    await waitForResults(page);
    expect(await page.evaluate(() => window.__lamina!.state().analysis!.layers[0].lab.n)).toBe(n - 1);
    expect(await page.locator('lab-tests-panel tr[data-specimen="0"]').textContent()).toContain('not used ✗');
    await context.close();
  });
});
