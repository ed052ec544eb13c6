import { describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { fieldFor, openApp, projectJson, waitForResults, appSession } from './app-page';

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

  describe('paste as data comes (issue 13)', () => {
    const specimens = (page: Page) => projectJson(page).then((t) => JSON.parse(t).layers[0].tensile.specimens as { id: string; diameter_mm: number; thickness_mm: number; peakLoad_kN: number; valid: boolean }[]);
    const preview = (page: Page) => page.locator('lab-tests-panel .preview');

    it('a spreadsheet header `Sample, Dia (mm), Thk (mm), Load (kN), Valid` is recognised, previewed, and applied on Apply', async () => {
      const { page, context, errors } = await openApp(session.browser, session.url);
      const before = await projectJson(page);
      const n0 = (await specimens(page)).length;
      await page.locator('lab-tests-panel textarea').fill('Sample, Dia (mm), Thk (mm), Load (kN), Valid\nH-1, 54, 27, 12, Y\nH-2, 54, 27.5, 11, N\n');
      await page.locator('lab-tests-panel #paste-append').click();
      await expect.poll(() => preview(page).count()).toBe(1);
      const columns = await preview(page).locator('.columns-read li').allTextContents();
      expect(columns).toEqual(['Sample → id', 'Dia (mm) → diameter, in mm', 'Thk (mm) → thickness, in mm', 'Load (kN) → peak load, in kN', 'Valid → valid break']);
      expect(await projectJson(page)).toBe(before); // nothing applied yet
      await page.locator('lab-tests-panel #paste-apply').click();
      await waitForResults(page);
      const after = await specimens(page);
      expect(after.length).toBe(n0 + 2);
      expect(after[n0]).toEqual({ id: 'H-1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 12, valid: true });
      expect(after[n0 + 1].valid).toBe(false);
      expect(await preview(page).count()).toBe(0);
      expect(errors).toEqual([]);
      await context.close();
    });

    it('a headerless paste is read by column order and previewed; Cancel applies nothing, Apply adds the rows', async () => {
      const { page, context } = await openApp(session.browser, session.url);
      const before = await projectJson(page);
      const n0 = (await specimens(page)).length;
      await page.locator('lab-tests-panel textarea').fill('N-1\t54\t27\t9.5\nN-2\t54\t26\t10.5\n');
      await page.locator('lab-tests-panel #paste-append').click();
      await expect.poll(() => preview(page).count()).toBe(1);
      expect(await preview(page).textContent()).toContain('No header: the columns were taken in order.');
      expect(await preview(page).locator('.columns-read li').allTextContents()).toEqual([
        'column 1 → id', 'column 2 → diameter, in mm (assumed: no unit given)', 'column 3 → thickness, in mm (assumed: no unit given)', 'column 4 → peak load, in kN (assumed: no unit given)',
      ]);
      expect(await preview(page).locator('tbody tr').count()).toBe(2);
      await page.locator('lab-tests-panel #paste-cancel').click();
      expect(await preview(page).count()).toBe(0);
      expect(await projectJson(page)).toBe(before);
      expect(await page.locator('lab-tests-panel textarea').inputValue()).toContain('N-1');
      await page.locator('lab-tests-panel #paste-append').click();
      await page.locator('lab-tests-panel #paste-apply').click();
      await waitForResults(page);
      expect((await specimens(page)).slice(n0).map((s) => [s.id, s.thickness_mm, s.peakLoad_kN])).toEqual([['N-1', 27, 9.5], ['N-2', 26, 10.5]]);
      await context.close();
    });

    it('a semicolon paste with decimal commas is read as decimals (preview says so); a comma paste with decimal commas is refused with row and column', async () => {
      const { page, context } = await openApp(session.browser, session.url);
      const n0 = (await specimens(page)).length;
      await page.locator('lab-tests-panel textarea').fill('id;diameter_mm;thickness_mm;peakLoad_kN\nE-1;54,1;27,5;10,25\n');
      await page.locator('lab-tests-panel #paste-append').click();
      await expect.poll(() => preview(page).count()).toBe(1);
      expect(await preview(page).textContent()).toContain('separated by semicolons, decimal commas read as decimal points');
      await page.locator('lab-tests-panel #paste-apply').click();
      await waitForResults(page);
      expect((await specimens(page))[n0]).toEqual({ id: 'E-1', diameter_mm: 54.1, thickness_mm: 27.5, peakLoad_kN: 10.25, valid: true });

      const before = await projectJson(page);
      await page.locator('lab-tests-panel textarea').fill('id,diameter_mm,thickness_mm,peakLoad_kN,valid\nB1,54,1,27,0,10,2\n');
      await page.locator('lab-tests-panel #paste-append').click();
      const problems = page.locator('lab-tests-panel .problems li');
      await expect.poll(() => problems.count()).toBe(1);
      expect(await problems.first().textContent()).toMatch(/^row 2, column diameter_mm: row 2, diameter_mm: the row has 7 cells where the header has 5; a decimal comma cannot be told from the separator/);
      expect(await projectJson(page)).toBe(before);
      await context.close();
    });

    it('a decimal comma in a field is read as a decimal point ("6,5 m" → 6.5 m; "0,3" in a plain number field)', async () => {
      const { page, context, errors } = await openApp(session.browser, session.url);
      await fieldFor(page, 'opening.span_m').fill('6,5 m');
      await expect.poll(() => page.evaluate(() => window.__lamina!.state().project.opening.span_m)).toBe(6.5);
      await fieldFor(page, 'layers[0].poisson').fill('0,3');
      await expect.poll(() => page.evaluate(() => window.__lamina!.state().project.layers[0].poisson)).toBe(0.3);
      await fieldFor(page, 'opening.span_m').fill('1,250');
      await expect.poll(() => page.locator('quantity-input[path="opening.span_m"]').evaluate((el) => el.shadowRoot?.textContent ?? '')).toMatch(/ambiguous/);
      expect(await page.evaluate(() => window.__lamina!.state().project.opening.span_m)).toBe(6.5);
      expect(errors).toEqual([]);
      await context.close();
    });
  });
});

