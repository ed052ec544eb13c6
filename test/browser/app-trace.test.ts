import { describe, expect, it } from 'vitest';
import { openApp, projectJson, waitForResults, appSession } from './app-page';
import { encodeShareHash } from '../../src/ui/state/share-link';

const session = appSession();

describe('app: traces, keyboard and links in an open page', () => {
  it('a traced number in the lab panel opens the trace dialog for its path; Escape closes it and focus returns', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const hasDialog = await page.evaluate(() => customElements.get('trace-dialog') !== undefined);
    const button = page.locator('lab-tests-panel .characteristic button.traced');
    expect(await button.getAttribute('data-path')).toBe('layers[0].strength.characteristic_MPa');
    await button.focus();
    await page.keyboard.press('Enter');
    const dialog = page.locator('lamina-app trace-dialog');
    await expect.poll(() => dialog.evaluate((d) => (d as HTMLElement & { path: string }).path)).toBe('layers[0].strength.characteristic_MPa');
    if (hasDialog) {
      await expect.poll(() => dialog.getAttribute('open')).not.toBeNull();
      await page.keyboard.press('Escape');
      await expect.poll(() => dialog.getAttribute('open')).toBeNull();
      const focused = await page.evaluate(() => {
        let el: Element | null = document.activeElement;
        while (el?.shadowRoot?.activeElement) el = el.shadowRoot.activeElement;
        return el?.getAttribute('data-path') ?? null;
      });
      expect(focused).toBe('layers[0].strength.characteristic_MPa');
    }
    expect(errors).toEqual([]);
    await context.close();
  });

  it('the trace of n shows the search: its fc(n) chart with the minimum, the table of trials; the beam tension lists only what it uses', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    await waitForResults(page);
    const show = (path: string) =>
      page.locator('lamina-app').evaluate((el, p) => el.dispatchEvent(new CustomEvent('show-trace', { detail: { path: p }, bubbles: true, composed: true })), path);
    await show('layers[0].voussoir.n');
    const dialog = page.locator('lamina-app trace-dialog');
    await expect.poll(() => dialog.getAttribute('open')).not.toBeNull();
    await expect.poll(() => dialog.locator('[data-role="steps"] tbody tr').count()).toBeGreaterThan(9); // 9 scan points and the refinement
    expect(await dialog.locator('[data-role="steps-chart"] svg').count()).toBe(1);
    expect(await dialog.locator('[data-role="steps-chart"]').textContent()).toContain('minimum: n =');
    expect(await dialog.locator('[data-role="steps"] tr[aria-current="true"]').textContent()).toContain('minimum');
    await page.keyboard.press('Escape');
    await expect.poll(() => dialog.getAttribute('open')).toBeNull();

    await show('layers[0].voussoir.leverArm_m');
    await expect.poll(() => dialog.locator('[data-role="steps"] tr[aria-current="true"]').textContent()).toContain('converged');
    await page.keyboard.press('Escape');

    await show('layers[0].elastic.maxTension_MPa');
    await expect.poll(() => dialog.getAttribute('open')).not.toBeNull();
    const related = await dialog.locator('[data-role="related"] button').evaluateAll((bs) => bs.map((b) => b.getAttribute('data-path') ?? ''));
    expect(related).toContain('layers[0].load_kPa');
    expect(related.some((p) => p.includes('.lab.'))).toBe(false); // no Brazilian disc
    expect(related.length).toBeLessThan(12);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('the section navigation moves focus to the chosen section heading', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    await page.locator('lamina-app nav a', { hasText: '3 Lab tests' }).click();
    const focused = await page.evaluate(() => document.querySelector('lamina-app')!.shadowRoot!.activeElement?.id ?? null);
    expect(focused).toBe('lab-h');
    await context.close();
  });

  it('a project link pasted into an open page replaces the project (and can be undone)', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const before = await projectJson(page);
    const p = JSON.parse(before);
    p.title = 'Pasted link project';
    p.opening.span_m = 4.5;
    await page.evaluate((hash) => {
      location.hash = hash;
    }, encodeShareHash(p));
    await expect.poll(async () => JSON.parse(await projectJson(page)).title).toBe('Pasted link project');
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).opening.span_m).toBe(4.5);
    await page.locator('project-bar #undo').click();
    await waitForResults(page);
    expect(await projectJson(page)).toBe(before);
    expect(errors).toEqual([]);
    await context.close();
  });
});
