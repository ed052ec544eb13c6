/**
 * The worksheet's uncertainty section in chromium (issue: "an uncertainty section in the
 * worksheet"): variables added by field path, a bad variable refused with its path, the
 * one-click Brazilian lognormal, a run in the compute worker showing P_f, β and the charts,
 * cancel, and an edit that cancels a running study or marks a shown result stale.
 * References: the one-click lognormal against the ISRM Brazilian formula σt = 2P/(πDt)
 * (ISRM 1978) over the preset's valid discs, computed here; the run's P_f against
 * `runUncertainty` in node on the same project (the library path; test/browser/uncertainty-repro
 * shows the two engines count the same failures). A current run adds the acceptable P_f's row to
 * the checks (status as node's check table gives it) and its section to the report; after an
 * edit neither the row nor the old numbers are printed.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { appSession, openApp, showReport, waitForResults } from './app-page';
import { analyse } from '../../src/analysis/analyse';
import { withUncertainty } from '../../src/analysis/probability-row';
import { parseProject } from '../../src/model/validate';
import { NO_CURRENT_RUN } from '../../src/report/sections/uncertainty';
import { numberText } from '../../src/report/number-text';
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
    // the charts are drawn in a task after the numbers are painted
    await expect.poll(() => result.locator('[data-role=fs-histogram] svg').count()).toBe(1);
    expect(await result.locator('[data-role=charts-pending]').count()).toBe(0);
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

  it('Run pressed while another field still holds an edit: the edit lands first and the run is for the edited project, never cancelled by it', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const raw = presetRaw('drift-limestone');
    raw.uncertainty = { samples: 2000, seed: 3, method: 'latinHypercube', acceptablePf: null, variables: [{ path: 'layers[0].thickness_m', distribution: 'lognormal', cov: 0.2 }] };
    await load(page, raw);
    const sec = section(page);
    for (let k = 0; k < 3; k++) {
      // the title holds typed text (committed when it loses focus: at the press on Run); the
      // section is out of view until Run is scrolled to and pressed
      await page.evaluate(() => window.scrollTo(0, 0));
      const title = page.locator('lamina-app input[data-path="title"]');
      await title.click();
      await page.keyboard.press('End');
      await page.keyboard.type(` ${k}`);
      await sec.locator('[data-role=start-run]').click();
      await expect.poll(() => project(page).then((p) => p.title.endsWith(` ${k}`))).toBe(true);
      const result = sec.locator('[data-role=uncertainty-result][data-stale=false]');
      await expect.poll(() => result.count(), { timeout: 60_000 }).toBe(1);
      expect(await sec.locator('[data-role=run-note]').count()).toBe(0); // not cancelled
    }
    expect(errors).toEqual([]);
    await context.close();
  }, 120_000);

  it('a current run is in the checks (the acceptable P_f row) and in the report with its method and seed; after an edit the report prints no old numbers', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const raw = presetRaw('drift-limestone');
    raw.uncertainty = {
      samples: 2000, seed: 11, method: 'latinHypercube', acceptablePf: 1e-3,
      variables: [
        { path: 'layers[0].thickness_m', distribution: 'lognormal', cov: 0.3 },
        { path: 'opening.span_m', distribution: 'uniform', min: 8, max: 16 },
      ],
    };
    await load(page, raw);
    const checks = page.locator('checks-table');
    expect(await checks.locator('tr[data-mode=probabilityOfFailure]').count()).toBe(0); // no run yet
    await section(page).locator('[data-role=start-run]').click();
    await section(page).locator('[data-role=uncertainty-result]').waitFor({ state: 'attached', timeout: 60_000 });

    // node's check table with node's run of the same file: the row and its status
    const p = parseProject(raw).project;
    const inNode = runUncertainty(p);
    const nodeRow = withUncertainty(analyse(p), inNode).report.checks.find((r) => r.mode === 'probabilityOfFailure')!;
    const row = checks.locator('tr[data-mode=probabilityOfFailure]');
    await expect.poll(() => row.count()).toBe(1);
    expect(await row.getAttribute('data-status')).toBe(nodeRow.status);
    expect(await row.getAttribute('data-counts')).toBe('true');
    expect(await row.textContent()).toContain('whole roof');
    expect(await row.getAttribute('class')).not.toContain('governing');
    // the verdict line counts it: with the P_f row below, the tally says so (the deterministic checks of this preset meet)
    expect(nodeRow.status).toBe('below'); // P_f ≈ 0.4 here, far above 1e-3
    await expect.poll(() => page.locator('verdict-line p').first().textContent()).toMatch(/1 of \d+ counted checks below target/);
    // and its badge gives the result of every counted check (the governing FS meets, the P_f row does not)
    expect(await page.locator('verdict-line p .status').first().getAttribute('class')).toContain('below');
    // the pinned chip gives the status of every counted check, not only the governing one
    expect(await page.locator('verdict-chip p').first().textContent()).toMatch(/below ✗.*1 other counted check below/s);

    await showReport(page);
    const report = page.locator('report-view [data-role="report"]');
    const u = report.locator('section.lr-section-uncertainty');
    await expect.poll(() => u.count(), { timeout: 30_000 }).toBe(1);
    const text = (await u.textContent()) ?? '';
    expect(text).toContain(`P_f${numberText(inNode.pf, 3)} (95 % interval ${numberText(inNode.pfInterval[0], 3)} – ${numberText(inNode.pfInterval[1], 3)}`);
    expect(text).toContain('Latin hypercube sampling, 2000 samples, seed 11');
    expect(await u.locator('svg').count()).toBeGreaterThanOrEqual(2); // histogram, sensitivity (and P_f against span)
    expect(await report.locator('section.lr-section-checks').textContent()).toContain('whole roof');
    // the print copy is the same report
    expect(await page.evaluate(() => document.getElementById('lamina-print-report')?.textContent ?? '')).toContain('seed 11');

    // an edit: the run is stale; the report says there is no current run and prints none of its numbers
    await page.evaluate(() => window.__lamina!.editNow('layers[0].unitWeight_kNm3', 27)); // the preset has 26
    await expect.poll(() => u.textContent(), { timeout: 30_000 }).toContain(NO_CURRENT_RUN);
    expect(await u.textContent()).not.toContain('seed 11');
    expect(await u.locator('svg').count()).toBe(0);
    expect(await report.locator('section.lr-section-checks').textContent()).not.toContain('whole roof');
    await expect.poll(() => checks.locator('tr[data-mode=probabilityOfFailure]').count()).toBe(0);
    expect(await page.evaluate(() => document.getElementById('lamina-print-report')?.textContent ?? '')).not.toContain('seed 11');
    // back to the inputs of the run (as an undo would): the run is current again
    await page.evaluate(() => window.__lamina!.editNow('layers[0].unitWeight_kNm3', 26));
    await expect.poll(() => u.textContent(), { timeout: 30_000 }).toContain('seed 11');
    await expect.poll(() => checks.locator('tr[data-mode=probabilityOfFailure]').count()).toBe(1);
    expect(errors).toEqual([]);
    await context.close();
  }, 120_000);
});
