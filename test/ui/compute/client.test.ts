import { describe, expect, it } from 'vitest';
import { analyse, designChart, minimumThickness, spanCurve } from '../../../src/analysis/index';
import { runUncertainty } from '../../../src/uncertainty/run';
import { createInThreadClient, createWorkerClient } from '../../../src/ui/compute/client';
import { ANALYSIS_FUNCTIONS, analysisJob, chartJob, supportJob, uncertaintyJob } from '../../../src/ui/compute/compute-core';
import { supportNeeded } from '../../../src/analysis/support-needed';
import type { ComputeRequest, ComputeResponse } from '../../../src/ui/compute/protocol';
import type { Project } from '../../../src/model/types';
import { presets } from '../../analysis/fixtures';

// The client must hand the UI exactly what the analysis library computes (the library's own
// results are checked against METHODS.md and the published sources elsewhere); here the
// reference is the library called directly, and a structured clone (what a worker's
// postMessage does) must not change a thing.

/** The coal-room preset with a small uncertainty block (invented spreads). */
function withUncertainty(samples = 3000): Project {
  const p = structuredClone(presets()[0].project);
  p.uncertainty = {
    samples, seed: 3, method: 'latinHypercube', acceptablePf: null,
    variables: [
      { path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.1 },
      { path: 'opening.span_m', distribution: 'lognormal', cov: 0.05 },
    ],
  };
  return p;
}

describe('compute client, in the calling thread', () => {
  it.each(presets())('analyse and chart give the library results, unchanged by a structured clone: $file', async ({ project }) => {
    const client = createInThreadClient();
    const out = await client.analyse(project);
    expect(out?.error).toBeNull();
    expect(out?.analysis).toEqual(analyse(project));
    expect(structuredClone(out)).toEqual(out);
    const layer = out!.analysis!.report.governing?.layerIndex ?? 0;
    const chart = await client.chart(project, layer);
    expect(chart?.curve).toEqual(spanCurve(project));
    expect(chart?.chart).toEqual(designChart(project, layer));
    expect(chart?.minThickness_m).toEqual(minimumThickness(project, layer));
    expect(structuredClone(chart)).toEqual(chart);
    const support = await client.supportNeeded(project);
    const direct = supportNeeded(project);
    expect(support).toEqual({ needed: direct.needed, reason: direct.reason });
    expect(structuredClone(support)).toEqual(support);
  });

  it('an analysis that throws gives the message for the user, not a throw', () => {
    const out = analysisJob(presets()[0].project, {
      analyse: () => { throw new Error('no convergence'); }, spanCurve, designChart, minimumThickness, supportNeeded: () => ({ needed: null, reason: null }),
    });
    expect(out.analysis).toBeNull();
    expect(out.error).toBe('The analysis failed: no convergence');
    expect(chartJob(presets()[0].project, 99, ANALYSIS_FUNCTIONS).chart).toBeNull(); // out-of-range layer: no chart, no throw
  });

  it('the uncertainty run in chunks gives the same numbers as the synchronous run, with progress to the total', async () => {
    const p = withUncertainty();
    const progress: Array<[number, number]> = [];
    const report = await createInThreadClient().runUncertainty(p, {}, { onProgress: (d, t) => progress.push([d, t]) });
    expect(report).toEqual(runUncertainty(p));
    expect(structuredClone(report)).toEqual(report);
    expect(progress.length).toBeGreaterThan(3);
    for (let k = 1; k < progress.length; k++) expect(progress[k][0]).toBeGreaterThan(progress[k - 1][0]);
    expect(progress.at(-1)![0]).toBe(progress.at(-1)![1]);
  }, 60_000);

  it('a cancelled run rejects with an AbortError at once and runs no further chunk', async () => {
    const p = withUncertainty(200_000);
    const controller = new AbortController();
    let last = 0;
    const run = createInThreadClient().runUncertainty(p, { samples: 200_000 }, {
      signal: controller.signal,
      onProgress: (done) => {
        last = done;
        if (done >= 2000) controller.abort();
      },
    });
    await expect(run).rejects.toMatchObject({ name: 'AbortError' });
    const at = last;
    await new Promise((r) => setTimeout(r, 200));
    expect(last).toBe(at);
    expect(at).toBeLessThan(200_000);
    // an already aborted signal never starts the run
    await expect(createInThreadClient().runUncertainty(p, {}, { signal: controller.signal })).rejects.toMatchObject({ name: 'AbortError' });
  });

  it('a bad variable rejects with its field path', async () => {
    const p = withUncertainty();
    p.uncertainty!.variables.push({ path: 'layers[0].thickness_m', distribution: 'uniform', cov: 2 });
    await expect(createInThreadClient().runUncertainty(p, {})).rejects.toThrow(/uncertainty\.variables\[2\]/);
  });
});

/**
 * A stand-in Worker for node: answers each message in a later task with the same jobs the
 * worker script runs (compute.worker.ts is checked in chromium, test/browser/app-compute.test.ts).
 */
class FakeWorker {
  onmessage: ((e: MessageEvent<ComputeResponse>) => void) | null = null;
  onerror: ((e: ErrorEvent) => void) | null = null;
  onmessageerror: (() => void) | null = null;
  received: ComputeRequest[] = [];
  private stopped = new Set<number>();
  postMessage(m: ComputeRequest) {
    this.received.push(structuredClone(m));
    const reply = (r: ComputeResponse) => this.onmessage?.({ data: structuredClone(r) } as MessageEvent<ComputeResponse>);
    setTimeout(() => {
      if (m.kind === 'analyse') reply({ id: m.id, kind: 'result', value: analysisJob(m.project, ANALYSIS_FUNCTIONS) });
      else if (m.kind === 'chart') reply({ id: m.id, kind: 'result', value: chartJob(m.project, m.layer, ANALYSIS_FUNCTIONS) });
      else if (m.kind === 'cancel') this.stopped.add(m.id);
      else if (m.kind === 'support') reply({ id: m.id, kind: 'result', value: supportJob(m.project, ANALYSIS_FUNCTIONS) });
      else
        void uncertaintyJob(m.project, m.request, {
          onProgress: (done, total) => reply({ id: m.id, kind: 'progress', done, total }),
          stopped: () => this.stopped.has(m.id),
        }).then((v) => reply(v ? { id: m.id, kind: 'result', value: v } : { id: m.id, kind: 'cancelled' }));
    }, 0);
  }
  terminate() {}
}

describe('compute client over workers (protocol, with a stand-in worker)', () => {
  it('keeps one analysis in the worker and only the latest waiting: the ones replaced resolve null', async () => {
    const workers: FakeWorker[] = [];
    const client = createWorkerClient(() => {
      const w = new FakeWorker();
      workers.push(w);
      return w as unknown as Worker;
    });
    const base = presets()[0].project;
    const at = (span: number) => ({ ...base, opening: { ...base.opening, span_m: span } });
    const results = await Promise.all([5, 5.5, 6, 6.5].map((s) => client.analyse(at(s))));
    expect(results[1]).toBeNull();
    expect(results[2]).toBeNull();
    expect(results[0]?.analysis).toEqual(analyse(at(5)));
    expect(results[3]?.analysis).toEqual(analyse(at(6.5)));
    expect(workers).toHaveLength(1); // the run worker starts with the first uncertainty run
    expect(workers[0].received.map((m) => m.kind)).toEqual(['analyse', 'analyse']);
  });

  it('answers charts and the support needed in a worker of their own, so the next analysis never waits behind them', async () => {
    const workers: FakeWorker[] = [];
    const client = createWorkerClient(() => {
      const w = new FakeWorker();
      workers.push(w);
      return w as unknown as Worker;
    });
    const project = presets()[0].project;
    await client.analyse(project);
    await Promise.all([client.chart(project, 0), client.supportNeeded(project)]);
    await client.analyse(project);
    expect(workers).toHaveLength(2);
    expect(workers[0].received.map((m) => m.kind)).toEqual(['analyse', 'analyse']);
    expect(workers[1].received.map((m) => m.kind)).toEqual(['chart', 'support']);
    client.dispose();
  });

  it('runs the uncertainty in a second worker; cancel reaches the worker and the promise rejects at once', async () => {
    const workers: FakeWorker[] = [];
    const client = createWorkerClient(() => {
      const w = new FakeWorker();
      workers.push(w);
      return w as unknown as Worker;
    });
    const controller = new AbortController();
    const run = client.runUncertainty(withUncertainty(100_000), {}, { signal: controller.signal, onProgress: (d) => d >= 1000 && controller.abort() });
    await expect(run).rejects.toMatchObject({ name: 'AbortError' });
    expect(workers).toHaveLength(1); // the edit worker starts with the first analysis
    expect(workers[0].received.map((m) => m.kind)).toEqual(['uncertainty', 'cancel']);
    await client.analyse(presets()[0].project);
    expect(workers).toHaveLength(2);
    expect(workers[1].received.map((m) => m.kind)).toEqual(['analyse']);
    client.dispose();
    await expect(client.analyse(presets()[0].project)).rejects.toThrow(/closed/);
  });
});
