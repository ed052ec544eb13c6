import { describe, expect, it } from 'vitest';
import { appSession, openApp } from './app-page';

const session = appSession();

// The compute client in real chromium, under the page's CSP (worker-src 'self'): the worker
// script's answers equal the in-thread client's (the same library code, the reference for the
// worker path), an uncertainty run can be cancelled, and a long run does not hold up the
// analysis of an edit.

type ClientModule = typeof import('../../src/ui/compute/client');

/** Load the client module into the page (a string, so the test runner leaves the import alone). */
async function loadClient(page: import('playwright-core').Page): Promise<void> {
  await page.evaluate(`import('/src/ui/compute/client.ts').then((m) => { window.__computeClient = m; })`);
}
declare global {
  interface Window {
    __computeClient?: ClientModule;
  }
}

describe('compute client in chromium', () => {
  it('the worker answers analyse and chart with what the in-thread client computes, and reports its kind', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    await loadClient(page);
    const same = await page.evaluate(async () => {
      const m = window.__computeClient!;
      const project = window.__lamina!.state().project;
      const worker = m.createWorkerClient();
      const local = m.createInThreadClient();
      const [a, b] = [await worker.analyse(project), await local.analyse(project)];
      const layer = a?.analysis?.report.governing?.layerIndex ?? 0;
      const [c, d] = [await worker.chart(project, layer), await local.chart(project, layer)];
      worker.dispose();
      const strip = (x: unknown) => JSON.stringify(x, (k, v) => (k === 'timings' ? undefined : v));
      return { kind: worker.kind, analysis: strip(a) === strip(b), chart: strip(c) === strip(d), hasReport: Boolean(a?.analysis?.report.checks.length) };
    });
    expect(same).toEqual({ kind: 'worker', analysis: true, chart: true, hasReport: true });
    expect(errors).toEqual([]);
    await context.close();
  });

  it('the worker script stops a run on a cancel message within a chunk and says so', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    const out = await page.evaluate(async () => {
      const p = structuredClone(window.__lamina!.state().project);
      p.uncertainty = { samples: 1_000_000, seed: 1, method: 'monteCarlo', acceptablePf: null, variables: [{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.1 }] };
      const w = new Worker(new URL('/src/ui/compute/compute.worker.ts', location.href), { type: 'module' });
      const seen: string[] = [];
      let lastDone = 0;
      let cancelledAt = 0;
      const ended = await new Promise<string>((resolve) => {
        w.onmessage = (e: MessageEvent) => {
          const m = e.data as { kind: string; done?: number };
          seen.push(m.kind);
          if (m.kind === 'progress') {
            lastDone = m.done!;
            if (lastDone >= 2000 && !cancelledAt) {
              cancelledAt = lastDone;
              w.postMessage({ id: 7, kind: 'cancel' });
            }
          } else resolve(m.kind);
        };
        w.postMessage({ id: 7, kind: 'uncertainty', project: p, request: {} });
      });
      w.terminate();
      return { ended, cancelledAt, lastDone, progressAfterCancel: lastDone - cancelledAt };
    });
    expect(out.ended).toBe('cancelled');
    // the cancel is read between chunks (1000 samples each): at most one more chunk after it
    expect(out.progressAfterCancel).toBeLessThanOrEqual(1000);
    expect(out.lastDone).toBeLessThan(1_000_000);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('through the client: a cancelled run rejects with AbortError, a new run then completes, and an analysis is answered while a run is going', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    await loadClient(page);
    const out = await page.evaluate(async () => {
      const m = window.__computeClient!;
      const p = structuredClone(window.__lamina!.state().project);
      p.uncertainty = { samples: 1_000_000, seed: 1, method: 'latinHypercube', acceptablePf: null, variables: [{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.1 }] };
      const client = m.createWorkerClient();
      await client.analyse(p); // the edit worker is up
      const controller = new AbortController();
      let progress = 0;
      const long = client.runUncertainty(p, {}, { signal: controller.signal, onProgress: (d) => (progress = d) });
      while (progress < 3000) await new Promise((r) => setTimeout(r, 20));
      // an edit's analysis while the run goes on
      const t0 = performance.now();
      const q = structuredClone(p);
      q.opening.span_m *= 1.1;
      const a = await client.analyse(q);
      const analyseMs = performance.now() - t0;
      const progressDuring = progress;
      controller.abort();
      const rejected = await long.then(() => 'resolved', (e: DOMException) => e.name);
      const small = await client.runUncertainty(p, { samples: 2000 }, {});
      client.dispose();
      return { rejected, analyseMs, progressDuring, spanOk: a?.analysis?.report.opening.span_m === q.opening.span_m, smallSamples: small.evaluated };
    });
    expect(out.rejected).toBe('AbortError');
    expect(out.spanOk).toBe(true);
    // a million samples take minutes; the analysis came back long before the run could end
    expect(out.progressDuring).toBeLessThan(1_000_000);
    expect(out.analyseMs).toBeLessThan(5000);
    expect(out.smallSamples).toBe(2000);
    expect(errors).toEqual([]);
    await context.close();
  });
});

describe('the worksheet on the worker', () => {
  it('first results are computed in the page; fast typing ends on the results of the last value, and results are never shown as current for another project', async () => {
    const { page, context, errors } = await openApp(session.browser, session.url);
    // the first analysis ran in the page (no worker to boot before the first results)
    expect(await page.evaluate(() => window.__lamina!.analyseRoute())).toBe('local');
    await loadClient(page);
    // every state the store publishes: not pending ⇒ the results are the current project's
    await page.evaluate(() => {
      const w = window as unknown as { __violations: string[] };
      w.__violations = [];
      const hook = window.__lamina!;
      hook.store.subscribe((s) => {
        if (!s.pending && s.analysis && s.resultsProject !== s.project) w.__violations.push(`results of another project shown as current (thickness ${s.project.layers[0].thickness_m})`);
      });
    });
    const field = page.locator('quantity-input[path="layers[0].thickness_m"] input');
    await field.click();
    await page.keyboard.press('End');
    // six keys with no wait: each value is posted at once; older answers are dropped
    for (const key of ['1', '2', 'Backspace', '7', '5', 'Backspace']) await page.keyboard.press(key);
    const typed = Number(await field.inputValue());
    await page.waitForFunction((t) => {
      const s = window.__lamina!.state();
      return !s.pending && !s.chartPending && s.project.layers[0].thickness_m === t;
    }, typed, { timeout: 30_000 });
    const out = await page.evaluate(async () => {
      const s = window.__lamina!.state();
      const local = await window.__computeClient!.createInThreadClient().analyse(s.project);
      return {
        violations: (window as unknown as { __violations: string[] }).__violations,
        same: JSON.stringify(local?.analysis?.report) === JSON.stringify(s.analysis?.report),
        resultsCurrent: s.resultsProject === s.project,
      };
    });
    expect(out).toEqual({ violations: [], same: true, resultsCurrent: true });
    // the verdict shows the governing FS of the last value
    const fs = Number(await page.locator('verdict-line p').getAttribute('data-fs'));
    const want = await page.evaluate(() => window.__lamina!.state().analysis!.report.governing!.fs);
    expect(fs).toBe(want);
    expect(errors).toEqual([]);
    await context.close();
  });
});
