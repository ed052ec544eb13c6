/// <reference lib="webworker" />
/**
 * The worksheet's compute worker. The client starts three instances of this one script: one
 * answers the analysis of each edit (`analyse`), one the slower follow-ups (`chart`,
 * `support`), the third runs the uncertainty (`uncertainty`, `cancel`), so neither a chart nor
 * a long run delays the analysis of the next key.
 *
 * Analysis requests are answered one at a time, in order. An uncertainty run is drained one
 * chunk of samples at a time with a pause through a MessageChannel between chunks (no timer
 * clamping), so a `cancel` message is handled within one chunk, and progress is posted after
 * every chunk. Several runs interleave chunk by chunk.
 */
import type { Project } from '../../model/types';
import { ANALYSIS_FUNCTIONS, analysisJob, chartJob, errorText, supportJob, uncertaintyJob } from './compute-core';
import type { ComputeRequest, ComputeResponse } from './protocol';

const scope = self as unknown as DedicatedWorkerGlobalScope;

function post(message: ComputeResponse): void {
  try {
    scope.postMessage(message);
  } catch (err) {
    // a value that does not clone must not leave the client waiting
    scope.postMessage({ id: message.id, kind: 'error', message: `could not send the result: ${errorText(err)}` } satisfies ComputeResponse);
  }
}

const waiters: Array<() => void> = [];
const ticker = new MessageChannel();
ticker.port1.onmessage = () => waiters.shift()?.();
const pause = (): Promise<void> =>
  new Promise((resolve) => {
    waiters.push(resolve);
    ticker.port2.postMessage(null);
  });

const active = new Set<number>();
const stopped = new Set<number>();

async function runUncertainty(id: number, project: Project, request: Extract<ComputeRequest, { kind: 'uncertainty' }>['request']) {
  active.add(id);
  try {
    const report = await uncertaintyJob(project, request, {
      onProgress: (done, total) => post({ id, kind: 'progress', done, total }),
      stopped: () => stopped.has(id),
      pause,
    });
    post(report === undefined ? { id, kind: 'cancelled' } : { id, kind: 'result', value: report });
  } catch (err) {
    post({ id, kind: 'error', message: errorText(err) });
  } finally {
    active.delete(id);
    stopped.delete(id);
  }
}

scope.onmessage = (event: MessageEvent<ComputeRequest>) => {
  const m = event.data;
  switch (m.kind) {
    case 'analyse':
      post({ id: m.id, kind: 'result', value: analysisJob(m.project, ANALYSIS_FUNCTIONS) });
      return;
    case 'chart':
      post({ id: m.id, kind: 'result', value: chartJob(m.project, m.layer, ANALYSIS_FUNCTIONS) });
      return;
    case 'support':
      post({ id: m.id, kind: 'result', value: supportJob(m.project, ANALYSIS_FUNCTIONS) });
      return;
    case 'uncertainty':
      void runUncertainty(m.id, m.project, m.request);
      return;
    case 'cancel':
      if (active.has(m.id)) stopped.add(m.id);
      return;
  }
};
