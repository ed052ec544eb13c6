/**
 * The compute client of the worksheet (`ComputeClient` in ./types.ts).
 *
 * `createWorkerClient()` runs the calculations in three instances of one worker script
 * (`compute.worker.ts`), each started on its first call: the EDIT worker answers `analyse`
 * for each accepted edit; the ASIDE worker answers `chart` (design chart, minimum thickness)
 * and `support` (the support needed), which take tens of milliseconds; the RUN worker runs the
 * uncertainty, chunk by chunk. Neither a chart nor a long run therefore sits in front of the
 * analysis of the next key. `analyse`, `chart` and `support` keep at most one call of each
 * waiting behind the one in its worker: a newer call replaces a waiting one, which resolves
 * `null`.
 *
 * `createInThreadClient()` is the same interface on the calling thread (unit tests, node,
 * a browser without Worker); `createComputeClient()` picks the worker when it can and falls
 * back to the in-thread client when the worker cannot start.
 */
import type { Project, UncertaintyReport } from '../../model/types';
import type { ComputeRequest, ComputeResponse } from './protocol';
import type { AnalysisOutcome, ChartOutcome, ComputeClient, RunHooks, SupportOutcome, UncertaintyRunRequest } from './types';
import { analysisJob, chartJob, supportJob, type AnalysisFunctions } from './jobs';
import { createQuickPath } from './quick-path';
import { whenSettledAfterPaint } from '../after-paint';

export const abortError = (): DOMException => new DOMException('The uncertainty run was cancelled.', 'AbortError');

type Waiting = {
  resolve(value: unknown): void;
  reject(err: Error): void;
  onProgress?: (done: number, total: number) => void;
};

// Distributive Omit keeps each member of the union.
type RequestBody = ComputeRequest extends infer R ? (R extends ComputeRequest ? Omit<R, 'id'> : never) : never;

/** One worker and the calls waiting on it, by id. */
class WorkerChannel {
  private nextId = 1;
  private readonly waiting = new Map<number, Waiting>();
  private failure: Error | null = null;

  constructor(
    private readonly worker: Worker,
    private readonly onFailure: (err: Error) => void = () => {},
  ) {
    worker.onmessage = (e: MessageEvent<ComputeResponse>) => this.receive(e.data);
    worker.onerror = (e: ErrorEvent) => {
      e.preventDefault();
      this.fail(new Error(`the compute worker failed: ${e.message || 'it could not start'}`));
    };
    worker.onmessageerror = () => this.fail(new Error('the compute worker sent a message that could not be read'));
  }

  call(body: RequestBody, onProgress?: Waiting['onProgress']): { id: number; promise: Promise<unknown> } {
    const id = this.nextId++;
    const promise = new Promise<unknown>((resolve, reject) => {
      if (this.failure) return reject(this.failure);
      this.waiting.set(id, { resolve, reject, onProgress });
      try {
        this.worker.postMessage({ ...body, id } as ComputeRequest);
      } catch (err) {
        this.waiting.delete(id);
        reject(err instanceof Error ? err : new Error(String(err)));
      }
    });
    return { id, promise };
  }

  /** Tell the worker to stop call `id`; its promise is settled by the caller. */
  cancel(id: number): void {
    this.waiting.delete(id);
    if (!this.failure) this.worker.postMessage({ kind: 'cancel', id } satisfies ComputeRequest);
  }

  private receive(m: ComputeResponse): void {
    const w = this.waiting.get(m.id);
    if (!w) return; // cancelled or dropped
    if (m.kind === 'progress') {
      w.onProgress?.(m.done, m.total);
      return;
    }
    this.waiting.delete(m.id);
    if (m.kind === 'result') w.resolve(m.value);
    else if (m.kind === 'error') w.reject(new Error(m.message));
    else w.reject(abortError());
  }

  fail(err: Error): void {
    if (this.failure) return;
    this.failure = err;
    for (const w of this.waiting.values()) w.reject(err);
    this.waiting.clear();
    this.worker.terminate();
    this.onFailure(err);
  }

  terminate(): void {
    this.fail(new Error('the compute client was closed'));
  }
}

/** Keeps one call in flight and at most one (the latest) waiting; a replaced call resolves null. */
class LatestOnly<A, R> {
  private busy = false;
  private queued: { args: A; resolve(v: R | null): void; reject(e: unknown): void } | null = null;

  constructor(private readonly send: (args: A) => Promise<R>) {}

  call(args: A): Promise<R | null> {
    if (!this.busy) return this.start(args);
    this.queued?.resolve(null);
    return new Promise<R | null>((resolve, reject) => {
      this.queued = { args, resolve, reject };
    });
  }

  private start(args: A): Promise<R> {
    this.busy = true;
    const p = this.send(args);
    const next = () => {
      this.busy = false;
      const q = this.queued;
      this.queued = null;
      if (q) this.start(q.args).then(q.resolve, q.reject);
    };
    p.then(next, next);
    return p;
  }
}

function uncertaintyCall(
  start: (onProgress: RunHooks['onProgress']) => { promise: Promise<unknown>; cancel(): void },
  hooks: RunHooks = {},
): Promise<UncertaintyReport> {
  const { signal, onProgress } = hooks;
  if (signal?.aborted) return Promise.reject(abortError());
  return new Promise<UncertaintyReport>((resolve, reject) => {
    const run = start(onProgress);
    const onAbort = () => {
      run.cancel();
      reject(abortError());
    };
    signal?.addEventListener('abort', onAbort, { once: true });
    run.promise.then(
      (value) => {
        signal?.removeEventListener('abort', onAbort);
        resolve(value as UncertaintyReport);
      },
      (err: unknown) => {
        signal?.removeEventListener('abort', onAbort);
        reject(err);
      },
    );
  });
}

export type WorkerFactory = () => Worker;

/** The worker script, bundled by Vite as its own file (allowed by the page's `worker-src 'self'`). */
export const defaultWorkerFactory: WorkerFactory = () =>
  new Worker(new URL('./compute.worker.ts', import.meta.url), { type: 'module', name: 'lamina-compute' });

/**
 * The client over three workers. `onFailure` is called if the edit or the aside worker fails (e.g. it
 * could not start); every waiting call is rejected with the reason.
 */
export function createWorkerClient(makeWorker: WorkerFactory = defaultWorkerFactory, onFailure?: (err: Error) => void): ComputeClient {
  // The edit worker starts on the first analysis (a client used only for runs starts none).
  let editChannel: WorkerChannel | null = null;
  const edits = {
    call: (...args: Parameters<WorkerChannel['call']>) => {
      if (closed) return { id: 0, promise: Promise.reject(new Error('the compute client was closed')) };
      editChannel ??= new WorkerChannel(makeWorker(), onFailure);
      return editChannel.call(...args);
    },
  };
  // Charts and the support needed go to a third instance (started on the first such call):
  // a design chart takes tens of milliseconds, and in the edit worker it would sit in front
  // of the next key's analysis.
  // It starts once the page has painted and settled (the first results never share the
  // machine with a worker booting for a chart that is off screen), and each request is posted
  // after the next paint, in an idle moment (at most ASIDE_IDLE_MS later): copying the project
  // to it is in the way of neither the edit's frame nor the next key.
  let asideChannel: WorkerChannel | null = null;
  let asideGate: Promise<void> | null = null;
  const aside = {
    send: (body: RequestBody): Promise<unknown> => {
      if (closed) return Promise.reject(new Error('the compute client was closed'));
      const ready = asideChannel ? whenSettledAfterPaint(ASIDE_IDLE_MS) : (asideGate ??= whenSettledAfterPaint());
      return ready.then(() => {
        if (closed) throw new Error('the compute client was closed');
        asideChannel ??= new WorkerChannel(makeWorker(), onFailure);
        return asideChannel.call(body).promise;
      });
    },
  };
  let runs: WorkerChannel | null = null;
  let closed = false;
  const runChannel = (): WorkerChannel => {
    if (closed) throw new Error('the compute client was closed');
    // A failed run worker is replaced on the next run.
    runs ??= new WorkerChannel(makeWorker(), () => {
      runs = null;
    });
    return runs;
  };
  const analyse = new LatestOnly<Project, AnalysisOutcome>((project) => edits.call({ kind: 'analyse', project }).promise as Promise<AnalysisOutcome>);
  const chart = new LatestOnly<[Project, number], ChartOutcome>(
    ([project, layer]) => aside.send({ kind: 'chart', project, layer }) as Promise<ChartOutcome>,
  );
  const support = new LatestOnly<Project, SupportOutcome>((project) => aside.send({ kind: 'support', project }) as Promise<SupportOutcome>);
  return {
    kind: 'worker',
    analyse: (project) => analyse.call(project),
    chart: (project, layer) => chart.call([project, layer]),
    supportNeeded: (project) => support.call(project),
    runUncertainty: (project: Project, request: UncertaintyRunRequest, hooks?: RunHooks) =>
      uncertaintyCall((onProgress) => {
        let channel: WorkerChannel;
        try {
          channel = runChannel();
        } catch (err) {
          return { promise: Promise.reject(err), cancel: () => {} };
        }
        const { id, promise } = channel.call({ kind: 'uncertainty', project, request }, onProgress);
        return { promise, cancel: () => channel.cancel(id) };
      }, hooks),
    dispose: () => {
      closed = true;
      editChannel?.terminate();
      asideChannel?.terminate();
      runs?.terminate();
      runs = null;
    },
  };
}

/** The longest a chart or support request waits for an idle moment after the paint (ms). */
const ASIDE_IDLE_MS = 100;
const macrotask = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

/**
 * The same interface on the calling thread: each call runs in a later task (so callers see
 * the same asynchrony as with the worker). `fns` replaces the analysis (tests pass fixtures);
 * without it the real analysis is loaded on first use, so importing this module costs nothing.
 */
export function createInThreadClient(fns?: AnalysisFunctions): ComputeClient {
  let core: Promise<typeof import('./compute-core')> | null = null;
  const loadCore = () => (core ??= import('./compute-core'));
  const functions = async () => fns ?? (await loadCore()).ANALYSIS_FUNCTIONS;
  let closed = false;
  const guard = () => {
    if (closed) throw new Error('the compute client was closed');
  };
  return {
    kind: 'in-thread',
    analyse: async (project) => {
      await macrotask();
      guard();
      return analysisJob(project, await functions());
    },
    chart: async (project, layer) => {
      await macrotask();
      guard();
      return chartJob(project, layer, await functions());
    },
    supportNeeded: async (project) => {
      await macrotask();
      guard();
      return supportJob(project, await functions());
    },
    runUncertainty: (project, request, hooks) =>
      uncertaintyCall((onProgress) => {
        let stop = false;
        const promise = loadCore().then((c) => {
          guard();
          return c.uncertaintyJob(project, request, { onProgress, stopped: () => stop || closed, pause: macrotask });
        });
        return { promise, cancel: () => void (stop = true) };
      }, hooks),
    dispose: () => {
      closed = true;
    },
  };
}

/**
 * The worker client where `Worker` exists, else the in-thread client. With `local` (the
 * analysis functions loaded in this thread), the first analysis and every edit whose analysis
 * is known to be quick run in this thread (./quick-path.ts). If the edit worker
 * fails (it could not start), the analysis moves to an in-thread client; calls that were
 * waiting are answered by it.
 */
export function createComputeClient(makeWorker: WorkerFactory = defaultWorkerFactory, local: AnalysisFunctions | null = null): ComputeClient {
  if (typeof Worker === 'undefined') return createInThreadClient(local ?? undefined);
  let fallback: ComputeClient | null = null;
  let current: ComputeClient;
  try {
    current = createWorkerClient(makeWorker, () => {
      fallback ??= createInThreadClient();
      current = fallback;
    });
  } catch {
    return createInThreadClient();
  }
  const retry = <T>(call: (c: ComputeClient) => Promise<T>): Promise<T> =>
    call(current).catch((err: unknown) => {
      if (fallback && current === fallback && !(err instanceof DOMException && err.name === 'AbortError')) return call(fallback);
      throw err;
    });
  // An edit whose analysis is known to be quick runs in this thread (./quick-path.ts); so does
  // the first one, at start-up, while no worker has started (the page's first results never
  // wait for a worker to boot).
  const quick = createQuickPath({ slow: (project) => retry((c) => c.analyse(project)), local: () => local, firstLocal: local !== null });
  return {
    get kind() {
      return current.kind;
    },
    get analyseRoute() {
      return quick.lastRoute;
    },
    analyse: (project) => quick.analyse(project),
    chart: (project, layer) => retry((c) => c.chart(project, layer)),
    supportNeeded: (project) => retry((c) => c.supportNeeded(project)),
    runUncertainty: (project, request, hooks) => current.runUncertainty(project, request, hooks),
    dispose: () => {
      current.dispose();
      fallback?.dispose();
    },
  };
}
