import { describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import { fieldFor, openApp, projectJson, waitForResults, appSession } from './app-page';
import { readProjectText } from '../../src/model/project-file';

const session = appSession();

describe('app: files, autosave and links', () => {
  it('a bad project file lists its field errors and keeps the current project', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const before = await projectJson(page);
    const bad = JSON.parse(before);
    bad.layers[1].thickness_m = -0.2;
    bad.opening.span_m = 0;
    await page.locator('#open-file').setInputFiles({ name: 'bad.lamina.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bad)) });
    const list = page.locator('lamina-app .file-errors li');
    await expect.poll(() => list.count()).toBeGreaterThanOrEqual(2);
    const texts = await list.allTextContents();
    expect(texts.some((t) => t.startsWith('layers[1].thickness_m:'))).toBe(true);
    expect(texts.some((t) => t.startsWith('opening.span_m:'))).toBe(true);
    expect(await page.locator('lamina-app .status-line').textContent()).toContain('bad.lamina.json: not opened');
    expect(await projectJson(page)).toBe(before);
    // text that is not JSON at all is refused with its position, too
    await page.locator('#open-file').setInputFiles({ name: 'broken.lamina.json', mimeType: 'application/json', buffer: Buffer.from('{"schema": "lamina/1",') });
    await expect.poll(() => list.first().textContent()).toMatch(/not valid JSON/);
    expect(await projectJson(page)).toBe(before);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('save then open gives the same project back (round trip through a downloaded *.lamina.json)', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    await fieldFor(page, 'opening.span_m').fill('7.25');
    await waitForResults(page);
    const saved = await projectJson(page);
    const [download] = await Promise.all([page.waitForEvent('download'), page.locator('project-bar #save').click()]);
    expect(download.suggestedFilename()).toMatch(/\.lamina\.json$/);
    const path = await download.path();
    const text = await readFile(path, 'utf8');
    expect(readProjectText(text).project).toEqual(JSON.parse(saved));
    // change the project, then open the saved file
    await fieldFor(page, 'opening.span_m').fill('4');
    await waitForResults(page);
    expect(JSON.parse(await projectJson(page)).opening.span_m).toBe(4);
    await page.locator('#open-file').setInputFiles(path);
    await expect.poll(async () => JSON.parse(await projectJson(page)).opening.span_m).toBe(7.25);
    await waitForResults(page);
    expect(await projectJson(page)).toBe(saved);
    await context.close();
  });

  it('a reload keeps the edited project (autosave)', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    await fieldFor(page, 'layers[0].thickness_m').fill('0.65');
    await waitForResults(page);
    const edited = await projectJson(page);
    await page.reload();
    await waitForResults(page);
    expect(await projectJson(page)).toBe(edited);
    expect(await fieldFor(page, 'layers[0].thickness_m').inputValue()).toBe('0.65');
    await context.close();
  });

  it('a damaged autosave is ignored with a notice, and the demo opens', async () => {
    const context = await session.browser.newContext();
    await context.addInitScript(() => {
      if (!sessionStorage.getItem('seeded')) {
        localStorage.setItem('lamina:autosave', '{"schema": "lamina/1", "layers": [');
        sessionStorage.setItem('seeded', '1');
      }
    });
    const { page, errors } = await openApp(session.browser, session.url, { context });
    expect(await page.locator('lamina-app .status-line').textContent()).toMatch(/autosaved project could not be read/);
    expect(JSON.parse(await projectJson(page)).title).toMatch(/coal room/i);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('the share link reproduces the project in a new page (new browser context, empty storage)', async () => {
    const { page, context } = await openApp(session.browser, session.url);
    await fieldFor(page, 'opening.span_m').fill('5.5');
    await page.locator('lamina-app header input').fill('Shared — ü < check');
    await page.locator('lamina-app header input').press('Tab');
    await waitForResults(page);
    const shared = await projectJson(page);
    await page.locator('project-bar #share').click();
    const link = await page.locator('project-bar #share-link').inputValue();
    expect(link.startsWith(session.url)).toBe(true);
    expect(link).toMatch(/#p=[A-Za-z0-9_-]+$/);
    const other = await openApp(session.browser, link);
    expect(await projectJson(other.page)).toBe(shared);
    // the hash is dropped once loaded, so a reload keeps later edits
    expect(new URL(other.page.url()).hash).toBe('');
    expect(other.errors).toEqual([]);
    await other.context.close();
    await context.close();
  });
});
