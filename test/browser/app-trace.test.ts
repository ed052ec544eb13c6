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
