/**
 * The worksheet's support section (METHODS §12) on the coal-room demo (invented data, 6 m):
 * entering a bolt pattern adds the bolt and skin rows of the check table; bad values are refused
 * beside their field with nothing else lost; US units show kips and feet; the bolts are drawn;
 * the support needed appears after the results and "use this pattern" applies its spacing.
 * Check values: 1.8 m, 100 kN bolts at 1.2 × 1.2 m carry the 0.5 m shale (25 kN/m³):
 * 12.5 kPa × 1.44 m² = 18.0 kN, FS 5.56 (statics); 100 kN = 22.48 kip (1 kip = 4.448222 kN,
 * METHODS §13 lbf); 1.2 m = 3.937 ft (METHODS §13).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { mkdir } from 'node:fs/promises';
import type { Page } from 'playwright-core';
import { appSession, fieldFor, openApp, projectJson, unstick, waitForResults } from './app-page';

const session = appSession();
const OUT = 'test-artifacts';
beforeAll(() => mkdir(OUT, { recursive: true }));

const section = (page: Page) => page.locator('lamina-app section:has(#support-h)');
const boltsOn = async (page: Page) => {
  await page.locator('support-form #bolts-on').check();
  await waitForResults(page);
};
const supportRow = (page: Page, mode: string) => page.locator(`support-view table.support-rows tr[data-mode="${mode}"]`);
const errorOf = (page: Page, path: string) => page.locator(`quantity-input[path="${path}"] [role="alert"]`);

describe('app: support section', () => {
  it('entering a pattern adds the bolt and skin rows; changing the spacing changes them', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    expect(await supportRow(page, 'bolt').count()).toBe(0);
    await boltsOn(page);
    await fieldFor(page, 'support.bolts.capacity_kN').fill('100');
    await fieldFor(page, 'support.bolts.spacingAcross_m').fill('1.2');
    await fieldFor(page, 'support.bolts.spacingAlong_m').fill('1.2');
    await waitForResults(page);
    await expect.poll(() => supportRow(page, 'bolt').locator('td.num').first().textContent()).toBe('5.56');
    expect(await supportRow(page, 'skin').count()).toBe(1);
    // the same rows are in the checks table (one check table)
    expect(await page.locator('checks-table tr[data-mode="bolt"]').count()).toBe(1);
    await fieldFor(page, 'support.bolts.spacingAcross_m').fill('1.5');
    await waitForResults(page);
    // 12.5 kPa × 1.5 × 1.2 m² = 22.5 kN → FS 100/22.5 = 4.44 (statics)
    await expect.poll(() => supportRow(page, 'bolt').locator('td.num').first().textContent()).toBe('4.44');
    expect(errors).toEqual([]);
    await context.close();
  });

  it('bad values are refused beside their field and nothing else is lost', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    await boltsOn(page);
    const before = JSON.parse(await projectJson(page));
    const cases: Array<[string, string, RegExp]> = [
      ['support.bolts.spacingAcross_m', '-1', /support\.bolts\.spacingAcross_m/],
      ['support.bolts.length_m', '10', /support\.bolts\.length_m.*strata/],
      ['support.bolts.capacity_kN', '0', /support\.bolts\.capacity_kN/],
    ];
    for (const [path, text, message] of cases) {
      await fieldFor(page, path).fill(text);
      await expect.poll(() => errorOf(page, path).textContent()).toMatch(message);
      expect(await fieldFor(page, path).inputValue()).toBe(text);
    }
    // every refusal held: the project is as it was, the other fields keep their values
    expect(JSON.parse(await projectJson(page))).toEqual(before);
    expect(await fieldFor(page, 'support.bolts.spacingAlong_m').inputValue()).toBe('1.2');
    expect(await page.locator('lamina-app .stale-note').count()).toBeGreaterThan(0);
    await context.close();
  });

  it('US units: capacity in kip, spacing in ft; a value typed in kip is stored in kN', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    await boltsOn(page);
    await page.locator('project-bar input[value="US"]').check();
    await waitForResults(page);
    expect(await fieldFor(page, 'support.bolts.capacity_kN').inputValue()).toBe('22.48');
    expect(await page.locator('quantity-input[path="support.bolts.capacity_kN"] .unit').textContent()).toBe('kip');
    expect(await fieldFor(page, 'support.bolts.spacingAcross_m').inputValue()).toBe('3.937');
    expect(await page.locator('quantity-input[path="support.bolts.spacingAcross_m"] .unit').textContent()).toBe('ft');
    await fieldFor(page, 'support.bolts.capacity_kN').fill('30');
    await waitForResults(page);
    // 30 kip × 4.4482216 kN/kip = 133.45 kN
    expect(JSON.parse(await projectJson(page)).support.bolts.capacity_kN).toBeCloseTo(133.4466, 3);
    await context.close();
  });

  it('the drawing, the support needed and "use this pattern"; screenshots at 1280 and 390 px', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    await boltsOn(page);
    expect(await page.locator('support-view [data-chart="support-bolts"] svg g.bolt').count()).toBeGreaterThan(1);
    // bolt FS target 1.5 sets the spacing at 6 m: √(100 / (12.5 × 1.5)) = 2.309 m (statics)
    await expect.poll(() => page.locator('support-view dd[data-key="spacing"]').textContent(), { timeout: 20_000 }).toBe('2.31 m');
    await page.locator('support-view #use-pattern').click();
    await waitForResults(page);
    const bolts = JSON.parse(await projectJson(page)).support.bolts;
    expect([bolts.spacingAcross_m, bolts.spacingAlong_m]).toEqual([2.3, 2.3]);
    await unstick(page);
    await section(page).screenshot({ path: `${OUT}/app-support-1280.png` });
    // the span finder's charts gain the with/without-support lines
    const span = page.locator('lamina-app section:has(#span-h)');
    expect(await span.locator('path.support-curve.with-support').count()).toBeGreaterThan(0);
    expect(await span.locator('path.support-curve.unsupported').count()).toBeGreaterThan(0);
    await span.screenshot({ path: `${OUT}/app-support-span-1280.png` });
    await page.setViewportSize({ width: 390, height: 844 });
    await section(page).screenshot({ path: `${OUT}/app-support-390.png` });
    expect(errors).toEqual([]);
    await context.close();
  });
});
