/**
 * The worksheet's uncertainty section in chromium (issue: "an uncertainty section in the
 * worksheet"): variables added by field path, a bad variable refused with its path, the
 * one-click Brazilian lognormal, a run in the compute worker showing P_f, β and the charts,
 * cancel, and an edit that cancels a running study or marks a shown result stale.
 * References: the one-click lognormal against the ISRM Brazilian formula σt = 2P/(πDt)
 * (ISRM 1978) over the preset's valid discs, computed here; the run's P_f against
 * `runUncertainty` in node on the same project (the library path; test/browser/uncertainty-repro
 * shows the two engines count the same failures).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { appSession, openApp, waitForResults } from './app-page';
import { parseProject } from '../../src/model/validate';
import { runUncertainty } from '../../src/uncertainty/run';
import type { Project } from '../../src/model/types';

const session = appSession();

const presetRaw = (name: string): Record<string, unknown> & { layers: { tensile: { specimens: { diameter_mm: number; thickness_mm: number; peakLoad_kN: number; valid: boolean }[] } }[] } =>
  JSON.parse(readFileSync(new URL(`../../presets/${name}.lamina.json`, import.meta.url), 'utf8'));

async function load(page: Page, raw: unknown): Promise<void> {
  await page.evaluate((p) => window.__lamina!.store.replace(p, 'Test project'), raw);
  await waitForResults(page);
}

const project = (page: Page): Promise<Project> => page.evaluate(() => window.__lamina!.state().project);
const section = (page: Page) => page.locator('uncertainty-section');

async function addPath(page: Page, path: string): Promise<void> {
  await section(page).locator('#new-path').fill(path);
  await section(page).locator('[data-role=add-variable]').click();
}

describe('the uncertainty section', () => {
  it('adds variables by field path; refuses a bad one with its path and keeps the project', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    await load(page, presetRaw('drift-limestone'));
    await addPath(page, 'layers[0].thickness_m');
    await expect.poll(async () => (await project(page)).uncertainty?.variables.map((v) => v.path)).toEqual(['layers[0].thickness_m']);
    await expect.poll(() => section(page).locator('tr[data-path="layers[0].thickness_m"]').count()).toBe(1);
    const before = JSON.stringify(await project(page));

    // unknown path
    await addPath(page, 'layers[0].name');
    const alert = section(page).locator('[data-role=uncertainty-errors]');
    await expect.poll(() => alert.textContent()).toContain('uncertainty.variables[1].path');
    expect(await alert.textContent()).toContain('layers[0].name');
    expect(JSON.stringify(await project(page))).toBe(before);

    // negative CoV, typed into the row
    await section(page).locator('tr[data-path="layers[0].thickness_m"] quantity-input[path="uncertainty.variables[0].cov"] input').fill('-0.2');
    await section(page).locator('tr[data-path="layers[0].thickness_m"] quantity-input[path="uncertainty.variables[0].cov"] input').press('Enter');
    await expect.poll(() => alert.textContent()).toContain('uncertainty.variables[0].cov');
    expect(JSON.stringify(await project(page))).toBe(before);

    // min ≥ max
    const row = section(page).locator('tr[data-path="layers[0].thickness_m"]');
    await row.locator('quantity-input[path="uncertainty.variables[0].min"] input').fill('0.5');
    await row.locator('quantity-input[path="uncertainty.variables[0].min"] input').press('Enter');
    await row.locator('quantity-input[path="uncertainty.variables[0].max"] input').fill('0.4');
    await row.locator('quantity-input[path="uncertainty.variables[0].max"] input').press('Enter');
    await expect.poll(() => alert.textContent()).toContain('uncertainty.variables[0].max');
    expect((await project(page)).uncertainty?.variables[0].max).toBeUndefined();
    expect(errors).toEqual([]);
    await context.close();
  }, 60_000);

  it('one click gives the lognormal of a layer’s valid Brazilian specimens (mean and CoV)', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const raw = presetRaw('coal-room-shale');
    await load(page, raw);
    await section(page).locator('[data-role=brazilian][data-layer="0"]').click();
    await expect.poll(async () => (await project(page)).uncertainty?.variables.length).toBe(1);
    const v = (await project(page)).uncertainty!.variables[0];
    // ISRM (1978) Brazilian test: σt = 2P/(π D t); P in N, D and t in mm → MPa. Valid discs only.
    const s = raw.layers[0].tensile.specimens.filter((x) => x.valid && x.thickness_mm <= x.diameter_mm)
      .map((x) => (2 * x.peakLoad_kN * 1e3) / (Math.PI * x.diameter_mm * x.thickness_mm));
    const mean = s.reduce((a, b) => a + b, 0) / s.length;
    const sd = Math.sqrt(s.reduce((a, b) => a + (b - mean) ** 2, 0) / (s.length - 1)); // sample SD
    expect(v.path).toBe('layers[0].tensile.value_MPa');
    expect(v.distribution).toBe('lognormal');
    expect(v.mean).toBeCloseTo(mean, 10);
    expect(v.cov).toBeCloseTo(sd / mean, 10);
    expect(errors).toEqual([]);
    await context.close();
  }, 60_000);

  it('runs in the worker and shows P_f (as node computes it), β, P_f per mode and the charts; an edit marks the result stale', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const raw = presetRaw('drift-limestone');
    raw.uncertainty = {
      samples: 2000, seed: 7, method: 'latinHypercube', acceptablePf: null,
      variables: [
        { path: 'layers[0].thickness_m', distribution: 'lognormal', cov: 0.3 },
        { path: 'opening.span_m', distribution: 'uniform', min: 8, max: 16 },
      ],
    };
    await load(page, raw);
    await section(page).locator('[data-role=start-run]').click();
    const result = section(page).locator('[data-role=uncertainty-result]');
    await result.waitFor({ state: 'attached', timeout: 60_000 });
    const inNode = runUncertainty(parseProject(raw).project);
    expect(inNode.pf).toBeGreaterThan(0); // the span range reaches past the largest safe span (11.4 m)
    expect(await result.locator('[data-role=pf]').textContent()).toContain(`P_f = ${+inNode.pf.toPrecision(3)}`);
    expect(await result.locator('[data-role=beta]').textContent()).toContain('β =');
    expect(await result.locator('[data-role=pf-by-mode] tbody tr').count()).toBe(Object.keys(inNode.byMode).length);
    expect(await result.locator('[data-role=fs-histogram] svg').count()).toBe(1);
    expect(await result.locator('[data-role=sensitivity] svg').count()).toBe(1);
    expect(await result.locator('[data-role=pf-span] svg').count()).toBe(1);
    expect(await result.getAttribute('data-stale')).toBe('false');
    await page.evaluate(() => window.__lamina!.editNow('opening.span_m', 5));
    await expect.poll(() => result.getAttribute('data-stale')).toBe('true');
    expect(await result.textContent()).toContain('Stale');
    expect(errors).toEqual([]);
    await context.close();
  }, 90_000);

  it('cancel stops a run; an edit during a run cancels it', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const raw = presetRaw('drift-limestone');
    raw.uncertainty = { samples: 1_000_000, seed: 1, method: 'monteCarlo', acceptablePf: null, variables: [{ path: 'layers[0].thickness_m', distribution: 'lognormal', cov: 0.2 }] };
    await load(page, raw);
    const sec = section(page);
    await sec.locator('[data-role=start-run]').click();
    await expect.poll(async () => Number(await sec.locator('[data-role=run-progress]').getAttribute('value')), { timeout: 30_000 }).toBeGreaterThan(0);
    await sec.locator('[data-role=cancel-run]').click();
    await expect.poll(() => sec.locator('[data-role=run-note]').textContent()).toContain('cancelled');
    expect(await sec.locator('[data-role=run-progress]').count()).toBe(0);
    expect(await sec.locator('[data-role=uncertainty-result]').count()).toBe(0);

    await sec.locator('[data-role=start-run]').click();
    await expect.poll(async () => Number(await sec.locator('[data-role=run-progress]').getAttribute('value')), { timeout: 30_000 }).toBeGreaterThan(0);
    await page.evaluate(() => window.__lamina!.editNow('opening.span_m', 5));
    await expect.poll(() => sec.locator('[data-role=run-note]').textContent()).toContain('The project changed');
    expect(await sec.locator('[data-role=run-progress]').count()).toBe(0);
    expect(await sec.locator('[data-role=uncertainty-result]').count()).toBe(0);
    expect(errors).toEqual([]);
    await context.close();
  }, 90_000);
});
