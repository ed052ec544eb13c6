/**
 * Web app benchmark: the page stays responsive while an uncertainty study runs (issue: "it
 * runs in a Web Worker: typing elsewhere stays responsive while 1e5 samples run").
 *
 * In headless chromium on the production build (`vite build`, served by `vite preview`), the drift-limestone preset with a 1e5-sample
 * study (3 variables, P_f at 12 span points, FORM) is run from the uncertainty section's Run
 * button while the test types into the project title (text that is not committed, so the
 * project does not change and the run is not cancelled) until the result has rendered. The
 * figure is the longest task of the page's main thread over the run, read from chromium's own
 * trace of that thread (category `toplevel`: each `ThreadControllerImpl::RunTask`, from the
 * click on Run to the rendered result). Baseline in the same session: the same typing for the
 * same time with no run, traced the same way. A second figure splits off the tasks that
 * started before the result arrived (the section's `lamina:uncertainty-result` mark): the run
 * itself, as opposed to drawing its result. 5 timed runs after one warm-up; each run is ≥ 1 s.
 * Target: the longest task during a run ≤ 50 ms (median of the runs).
 *
 * For information, a third figure is the longest pause between the ticks of a MessageChannel
 * loop in the page over the same run (how this benchmark measured until December 2026). It is
 * not a task's length: chromium runs input and frames ahead of posted messages, so one pause
 * can span several tasks in a row, and on a 2-core machine whose other core the worker keeps
 * busy it also counts time the OS gives other processes. In the runs that prompted the change
 * it read 28–82 ms while the Long Tasks API reported no task of 50 ms or more; traced, the
 * longest tasks of such runs were 16–38 ms.
 *
 * Run with `npm run bench` (or `npx tsx test/bench/uncertainty-ui.bench.ts`).
 */
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import type { Browser, Page } from 'playwright-core';
import { launchChromium } from '../browser/chromium';
import { startBuiltApp } from '../browser/app-server';
import { median } from './timing';
import type { BenchResult } from './types';

const TARGET_MS = 50;
const RUNS = 5;

declare global {
  interface Window {
    __probe?: { gap: number; stop: boolean };
  }
}

interface TraceEvent { name: string; ph: string; pid: number; tid: number; ts: number; dur?: number }

/**
 * Start tracing the page's threads (chromium's `toplevel` tasks and the page's performance
 * marks) and the MessageChannel tick loop; marks `bench:probe-start` in the page.
 */
async function startProbe(browser: Browser, page: Page): Promise<void> {
  await browser.startTracing(page, { categories: ['toplevel', 'blink.user_timing'] });
  await page.evaluate(() => {
    const probe = { gap: 0, stop: false };
    window.__probe = probe;
    performance.clearMarks('lamina:uncertainty-result');
    const ch = new MessageChannel();
    let last = performance.now();
    ch.port1.onmessage = () => {
      const now = performance.now();
      probe.gap = Math.max(probe.gap, now - last);
      last = now;
      if (!probe.stop) ch.port2.postMessage(null);
    };
    ch.port2.postMessage(null);
    performance.mark('bench:probe-start');
  });
}

/**
 * Stop: the longest main-thread task between the probe's start and stop marks (ms), the longest
 * of those that started before the result arrived, and the longest tick pause (for information).
 */
async function stopProbe(browser: Browser, page: Page): Promise<{ longest: number; beforeResult: number; gap: number }> {
  const gap = await page.evaluate(async () => {
    const p = window.__probe!;
    p.stop = true;
    await new Promise((r) => setTimeout(r, 20));
    performance.mark('bench:probe-stop');
    return p.gap;
  });
  const trace = JSON.parse((await browser.stopTracing()).toString()) as { traceEvents: TraceEvent[] } | TraceEvent[];
  const events = Array.isArray(trace) ? trace : trace.traceEvents;
  const at = (name: string) => events.find((e) => e.name === name);
  const start = at('bench:probe-start');
  const stop = at('bench:probe-stop');
  if (!start || !stop) throw new Error('the trace holds no probe marks');
  const result = at('lamina:uncertainty-result');
  // the page's main thread is the one its marks were made on
  const tasks = events.filter((e) => e.pid === start.pid && e.tid === start.tid && e.ph === 'X' && e.name === 'ThreadControllerImpl::RunTask' && e.ts >= start.ts && e.ts <= stop.ts);
  if (tasks.length === 0) throw new Error('the trace holds no main-thread tasks');
  const longestOf = (list: TraceEvent[]) => list.reduce((m, e) => Math.max(m, (e.dur ?? 0) / 1000), 0);
  return {
    longest: longestOf(tasks),
    beforeResult: longestOf(result ? tasks.filter((e) => e.ts < result.ts) : tasks),
    gap,
  };
}

/** Type into the title box (uncommitted) until `done` resolves; returns the keys typed. */
async function typeUntil(page: Page, done: Promise<unknown>): Promise<number> {
  const box = page.locator('lamina-app input[data-path="title"]');
  await box.click();
  let finished = false;
  void done.then(() => { finished = true; }, () => { finished = true; });
  let keys = 0;
  while (!finished) {
    await page.keyboard.press(keys % 2 ? 'Backspace' : 'x');
    keys++;
    await page.waitForTimeout(15);
  }
  return keys;
}

export async function benchUncertaintyUi(): Promise<BenchResult[]> {
  const raw = JSON.parse(readFileSync(new URL('../../presets/drift-limestone.lamina.json', import.meta.url), 'utf8'));
  raw.uncertainty = {
    samples: 100_000, seed: 1, method: 'latinHypercube', acceptablePf: 0.001,
    variables: [
      { path: 'layers[0].thickness_m', distribution: 'lognormal', cov: 0.2 },
      { path: 'layers[0].ucs_MPa', distribution: 'lognormal', cov: 0.3 },
      { path: 'opening.span_m', distribution: 'normal', cov: 0.1 },
    ],
  };
  const server = await startBuiltApp();
  const browser = await launchChromium();
  try {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
    await page.goto(server.url);
    // the whole sheet: sections 2–9 are rendered once their elements have loaded
    await page.waitForFunction(() => window.__lamina?.state().analysis != null && performance.getEntriesByName('lamina:sheet-complete').length > 0);
    await page.evaluate((p) => window.__lamina!.store.replace(p, 'Benchmark'), raw);
    await page.waitForFunction(() => !window.__lamina!.state().pending);
    const section = page.locator('uncertainty-section');
    const during: number[] = [];
    const running: number[] = [];
    const idle: number[] = [];
    const gaps: number[] = [];
    const runMs: number[] = [];
    for (let k = 0; k <= RUNS; k++) {
      // one run: click Run, type until the result has rendered
      await startProbe(browser, page);
      const t0 = Date.now();
      await section.locator('[data-role=start-run]').click();
      // done: this run's result has arrived (the probe cleared the mark) and the section shows
      // it again with its Run button (a result on screen from the previous run does not count)
      const done = page.waitForFunction(() => {
        if (performance.getEntriesByName('lamina:uncertainty-result').length === 0) return false;
        const s = document.querySelector('lamina-app')?.shadowRoot?.querySelector('uncertainty-section')?.shadowRoot;
        return s !== null && s !== undefined && s.querySelector('[data-role=start-run]') !== null && s.querySelector('[data-role=uncertainty-result]') !== null;
      }, null, { timeout: 120_000, polling: 100 });
      await typeUntil(page, done);
      const ms = Date.now() - t0;
      const longestRun = await stopProbe(browser, page);
      // the same typing for as long with no run
      await startProbe(browser, page);
      await typeUntil(page, new Promise((r) => setTimeout(r, ms)));
      const longestIdle = await stopProbe(browser, page);
      await page.keyboard.press('Escape');
      if (process.env.LAMINA_BENCH_VERBOSE) console.error(`run ${k}: ${ms} ms, longest task ${longestRun.longest} (before the result ${longestRun.beforeResult}), typing alone ${longestIdle.longest}; longest tick pause ${longestRun.gap} (typing alone ${longestIdle.gap})`);
      if (k === 0) continue; // warm-up
      during.push(longestRun.longest);
      running.push(longestRun.beforeResult);
      idle.push(longestIdle.longest);
      gaps.push(longestRun.gap);
      runMs.push(ms);
    }
    const m = median(during);
    const b = median(idle);
    return [{
      name: `longest main-thread task during a 1e5-sample uncertainty run while typing (chromium; runs of ${Math.min(...runMs)}–${Math.max(...runMs)} ms incl. 12 span points and FORM)`,
      median_us: m * 1e3,
      min_us: Math.min(...during) * 1e3,
      baseline: `the same typing with no run: longest task ${b.toFixed(1)} ms`,
      ratio: m / b,
      target: `≤ ${TARGET_MS} ms`,
      pass: m <= TARGET_MS,
    }, {
      name: 'of which the longest task that started before the result arrived (the run itself; after it: drawing the result)',
      median_us: median(running) * 1e3,
      min_us: Math.min(...running) * 1e3,
    }, {
      name: 'for information: the longest pause between MessageChannel ticks over the same runs (not a task length: it spans tasks chromium runs ahead of posted messages, and time the OS gives other processes)',
      median_us: median(gaps) * 1e3,
      min_us: Math.min(...gaps) * 1e3,
    }];
  } finally {
    await browser.close();
    await server.close();
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  for (const r of await benchUncertaintyUi()) console.log(r);
}
