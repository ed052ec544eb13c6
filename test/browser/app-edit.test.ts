import { describe, expect, it } from 'vitest';
import { fieldFor, openApp, projectJson, reportJson, waitForResults, appSession } from './app-page';

const session = appSession();

const verdictFs = (page: import('playwright-core').Page) => page.locator('verdict-line p').getAttribute('data-fs');

describe('app: editing', () => {
  it('typing a new shale thickness updates the governing FS shown, with no calculate button', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const before = Number(await verdictFs(page));
    // the demo's immediate roof is a 0.5 m shale governed by tension (fs = design/σ, σ ∝ 1/t for self-weight)
    await fieldFor(page, 'layers[0].thickness_m').fill('0.8');
    await waitForResults(page);
    await expect.poll(async () => Number(await verdictFs(page))).not.toBe(before);
    const after = Number(await verdictFs(page));
    expect(after).toBeGreaterThan(before);
    expect(JSON.parse(await projectJson(page)).layers[0].thickness_m).toBe(0.8);
    // the shown FS button carries the same number
    const shown = await page.locator('verdict-line button.traced').getAttribute('data-si-value');
    expect(Number(shown)).toBe(after);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('a number with a unit is converted to the file unit: "20 ft" gives a span of 6.096 m (1 ft = 0.3048 m, METHODS §13)', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    await fieldFor(page, 'opening.span_m').fill('20 ft');
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).opening.span_m).toBeCloseTo(6.096, 9);
    await context.close();
  });

  it('unparsable text shows an inline error naming the field and keeps the last good value', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    const before = await projectJson(page);
    await fieldFor(page, 'opening.span_m').fill('six metres');
    const msg = page.locator('quantity-input[path="opening.span_m"] [role="alert"]');
    await expect.poll(() => msg.textContent()).toMatch(/^Span: expected a length/);
    expect(await projectJson(page)).toBe(before);
    await context.close();
  });

  it('a value refused by validation (thickness −0.2 m) shows the model message with its path; the project keeps 0.5 m', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    await fieldFor(page, 'layers[0].thickness_m').fill('-0.2');
    const msg = page.locator('quantity-input[path="layers[0].thickness_m"] [role="alert"]');
    await expect.poll(() => msg.textContent()).toContain('layers[0].thickness_m: must be a number from 0.001 to 1000 m');
    expect(JSON.parse(await projectJson(page)).layers[0].thickness_m).toBe(0.5);
    // also on the fixed status line at the top, without the file-error box that would shift the sheet
    expect(await page.locator('lamina-app .status-line').textContent()).toContain('Not applied — layers[0].thickness_m: must be a number from 0.001 to 1000 m');
    expect(await page.locator('lamina-app .file-errors').count()).toBe(0);
    // typing the old value back clears the error
    await fieldFor(page, 'layers[0].thickness_m').fill('0.5');
    await expect.poll(() => page.locator('quantity-input[path="layers[0].thickness_m"] .error').count()).toBe(0);
    expect(await page.locator('lamina-app .status-line').textContent()).not.toContain('Not applied');
    await context.close();
  });

  it('switching to US units changes the displayed values and units but not the analysis', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    const report = await reportJson(page);
    const analysisId = await page.evaluate(() => {
      (window as unknown as { __a: unknown }).__a = window.__lamina!.state().analysis;
      return true;
    });
    expect(analysisId).toBe(true);
    expect(await fieldFor(page, 'opening.span_m').inputValue()).toBe('6');
    await page.locator('project-bar input[value="US"]').check();
    await expect.poll(() => fieldFor(page, 'opening.span_m').inputValue()).toBe('19.69'); // 6 m / 0.3048 = 19.685 ft, a converted input to 4 significant figures
    expect(await page.locator('quantity-input[path="opening.span_m"] .unit').textContent()).toBe('ft');
    // the strata table, out of view, follows once the page is idle after the paint
    await expect.poll(() => page.locator('quantity-input[path="layers[0].unitWeight_kNm3"] .unit').textContent()).toBe('lbf/ft³');
    // 25 kN/m³ / 0.157087 = 159.15 lbf/ft³ (METHODS §13)
    expect(Number(await fieldFor(page, 'layers[0].unitWeight_kNm3').inputValue())).toBeCloseTo(25 / 0.157087, 1);
    await waitForResults(page);
    expect(await reportJson(page)).toBe(report);
    expect(await page.evaluate(() => window.__lamina!.state().analysis === (window as unknown as { __a: unknown }).__a)).toBe(true);
    // typing a bare number in US units means feet
    await fieldFor(page, 'opening.span_m').fill('10');
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).opening.span_m).toBeCloseTo(3.048, 9);
    await context.close();
  });

  it('undo restores a change (button and Ctrl+Z), redo re-applies it', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    const original = await projectJson(page);
    const undo = page.locator('project-bar #undo');
    expect(await undo.isDisabled()).toBe(true);
    await fieldFor(page, 'loads.surcharge_kPa').fill('50');
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).loads.surcharge_kPa).toBe(50);
    await undo.click();
    await waitForResults(page);
    expect(await projectJson(page)).toBe(original);
    expect(await fieldFor(page, 'loads.surcharge_kPa').inputValue()).toBe('0');
    await page.locator('project-bar #redo').click();
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).loads.surcharge_kPa).toBe(50);
    await page.locator('lamina-app header').click();
    await page.keyboard.press('Control+z');
    await waitForResults(page);
    expect(await projectJson(page)).toBe(original);
    await context.close();
  });

  it('adding, moving and removing a layer goes through the store (and is undoable)', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const n = JSON.parse(await projectJson(page)).layers.length;
    await page.getByRole('button', { name: '+ Add a layer above' }).click();
    await waitForResults(page);
    const added = JSON.parse(await projectJson(page));
    expect(added.layers.length).toBe(n + 1);
    expect(added.layers[n].name).toBe(`Layer ${n + 1}`);
    await page.getByRole('button', { name: `Move Layer ${n + 1} down (toward the opening)` }).click();
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).layers[n - 1].name).toBe(`Layer ${n + 1}`);
    await page.getByRole('button', { name: `Remove layer ${n} (Layer ${n + 1})` }).click();
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).layers.length).toBe(n);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('switching the opening to a slab shows the long side (starting square) and the report gains the plate check', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    expect(await page.locator('quantity-input[path="opening.length_m"]').count()).toBe(0);
    await page.locator('opening-loads-form #opening-type').selectOption('slab');
    await waitForResults(page);
    const p = JSON.parse(await projectJson(page));
    expect(p.opening.type).toBe('slab');
    expect(p.opening.length_m).toBe(p.opening.span_m);
    expect(await fieldFor(page, 'opening.length_m').inputValue()).toBe(String(p.opening.span_m));
    expect(await page.evaluate(() => window.__lamina!.state().analysis!.report.layers[0].plate !== null)).toBe(true);
    await fieldFor(page, 'opening.length_m').fill('9');
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).opening.length_m).toBe(9);
    await page.locator('opening-loads-form #opening-type').selectOption('beam');
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).opening.length_m).toBeNull();
    expect(errors).toEqual([]);
    await context.close();
  });

  it('the design options say what the chosen basis means; switching the tensile basis to lab moves a default tension target from 2 to 4 and says so (METHODS §10)', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const form = page.locator('opening-loads-form');
    const basis = form.locator('select[data-path="design.basis"]');
    const tensile = form.locator('select[data-path="design.tensileBasis"]');
    const noteOf = (select: import('playwright-core').Locator) => select.locator('xpath=following-sibling::span[contains(@class, "choice-note")]').textContent();
    // the demo: intact basis, rock-mass tensile basis with its default target 2
    expect(await noteOf(basis)).toMatch(/uncracked layer must not crack/);
    expect(await noteOf(tensile)).toMatch(/Hoek–Brown rock-mass strength/);
    expect(JSON.parse(await projectJson(page)).design.fsTarget.tension).toBe(2);
    await tensile.selectOption('lab');
    await waitForResults(page);
    const design = JSON.parse(await projectJson(page)).design;
    expect(design.tensileBasis).toBe('lab');
    expect(design.fsTarget.tension).toBe(4); // METHODS §10: default 4 on the lab basis (Obert & Duvall)
    await expect.poll(() => noteOf(tensile)).toMatch(/characteristic lab strength with the size effect/);
    await expect.poll(() => page.locator('lamina-app .status-line').textContent()).toMatch(/tension target went from 2 to 4/);
    await basis.selectOption('jointed');
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).design.basis).toBe('jointed');
    await expect.poll(() => noteOf(basis)).toMatch(/whole roof is taken as cracked/);
    expect(errors).toEqual([]);
    await context.close();
  });
});
