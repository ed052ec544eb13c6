/**
 * Autosave data loss (issue 14 item 5) in chromium, with the browser's real localStorage
 * quota (about 5 MB per origin in chromium; WHATWG Web Storage): a 3,000,068-character
 * autosave that fails validation cannot be set aside, so it is kept untouched, autosave
 * pauses, and the worksheet offers the text as a file.
 */
import { describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import { appSession, fieldFor, openApp, waitForResults } from './app-page';

const session = appSession();
const KEY = 'lamina:autosave';

describe('app: autosave under the storage quota', () => {
  it('keeps a refused 3 MB autosave that cannot be backed up, pauses autosave, and offers it as a download', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const length = await page.evaluate((key) => {
      const text = `{"schema":"lamina/1","title":"${'x'.repeat(3_000_000)}","layers":"not a list, refused!!!!!"}`;
      localStorage.clear();
      localStorage.setItem(key, text);
      return localStorage.getItem(key)!.length;
    }, KEY);
    expect(length).toBe(3_000_068);
    await page.reload();
    await waitForResults(page);

    const alert = page.locator('lamina-app .autosave-alert');
    await expect.poll(() => alert.count()).toBe(1);
    expect(await alert.textContent()).toMatch(/could not be set aside: the browser's storage for this page is full \(QuotaExceededError\)/);
    expect(await page.evaluate((key) => localStorage.getItem(key)?.length, KEY)).toBe(3_000_068);

    // edits do not overwrite it
    await fieldFor(page, 'opening.span_m').fill('7 m');
    await expect.poll(() => page.evaluate(() => window.__lamina!.state().project.opening.span_m)).toBe(7);
    await waitForResults(page);
    expect(await page.evaluate((key) => localStorage.getItem(key)?.length, KEY)).toBe(3_000_068);

    // the user keeps it as a file: the download is the exact text
    const [download] = await Promise.all([page.waitForEvent('download'), alert.locator('#autosave-download').click()]);
    const saved = await readFile((await download.path())!, 'utf8');
    expect(saved.length).toBe(3_000_068);
    expect(saved.startsWith('{"schema":"lamina/1","title":"xxx')).toBe(true);

    // then resumes: the current project is autosaved again and the message goes
    await alert.locator('#autosave-resume').click();
    await expect.poll(() => alert.count()).toBe(0);
    // (the autosave is written once the page is idle after the paint)
    await expect.poll(() => page.evaluate((key) => JSON.parse(localStorage.getItem(key)!).opening?.span_m, KEY)).toBe(7);
    expect(errors).toEqual([]);
    await context.close();
  });
});
