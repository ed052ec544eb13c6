/**
 * Monte Carlo (plain or Latin hypercube) over a caller's limit states: the probability that
 * the roof fails, per mode, below target, the reliability index, the interval and CoV of the
 * estimate, the rank-correlation sensitivity and the histogram of the governing FS.
 *
 * The caller supplies `evaluate(x)`, x holding one sampled value per variable (in the order of
 * `distributions`), returning the sample's smallest FS per mode over the counted checks, its
 * governing FS and its smallest FS/target ratio (`SampleOutcome`). A sample fails when its
 * governing FS < 1 (METHODS §16: P_f = P(some counted check has FS < 1)); it is below target
 * when its smallest FS/target < 1. Nothing here knows about projects or units.
 *
 * Three ways to run it, all giving identical numbers for the same seed:
 * - `runMonteCarlo(options)`: synchronous, with `onProgress` and `shouldStop()`/`signal`
 *   checked after every chunk (default 1000 samples);
 * - `runMonteCarloAsync(options)`: the same, yielding to the event loop between chunks, so a
 *   Web Worker can receive a cancel message and post progress;
 * - `createMonteCarloRun(options)`: a stepper (`step()` runs one chunk, `result()` at any time)
 *   for a caller that schedules the chunks itself;
 * - `monteCarloSteps(options)`: a generator of chunks, for composing runs (`uncertaintySteps`)
 *   that a worker drains with `drainAsync`.
 * A stopped run returns the statistics of the samples evaluated so far, `complete: false`.
 */
import type { Distribution } from './distributions';
import { failureProbability, type FailureProbability } from './failure-probability';
import { fsHistogram, type FsHistogram } from './histogram';
import { averageRanks, rankSetCorrelation } from './rank-correlation';
import { createSampler, type SamplingMethod } from './sampler';

/** What one sample's analysis reports. */
export interface SampleOutcome {
  /** per mode, in the order of `modes`: the smallest FS of that mode's counted checks, or null when none counts */
  modeFs: ArrayLike<number | null>;
  /** the smallest FS over all counted checks */
  governingFs: number;
  /** the smallest FS/target over all counted checks (< 1: some check is below its target) */
  targetRatio: number;
}

/** The limit states at one sample: `x[j]` is variable j's value. `x` is reused: copy it to keep it. */
export type Evaluate = (x: Float64Array) => SampleOutcome;

export interface MonteCarloOptions {
  distributions: readonly Distribution[];
  evaluate: Evaluate;
  /** the mode names, in the order of `SampleOutcome.modeFs` */
  modes: readonly string[];
  /** default 20 000 (METHODS §16) */
  samples?: number;
  /** default 1 */
  seed?: number;
  /** default 'latinHypercube' */
  method?: SamplingMethod;
  /** samples between progress reports and stop checks; default 1000 */
  chunkSize?: number;
  onProgress?: (done: number, total: number) => void;
  shouldStop?: () => boolean;
  signal?: AbortSignal;
  /** default 40 */
  histogramBins?: number;
}

export interface ModeProbability {
  mode: string;
  failures: number;
  pf: number;
  interval: [number, number];
}

export interface MonteCarloResult {
  method: SamplingMethod;
  seed: number;
  /** requested */
  samples: number;
  /** evaluated (< samples when stopped) */
  evaluated: number;
  complete: boolean;
  /** overall: P_f, its interval and CoV, β */
  failure: FailureProbability;
  byMode: ModeProbability[];
  belowTarget: number;
  pBelowTarget: number;
  /** Spearman ρ of each variable with the governing FS; null for a constant variable */
  sensitivity: (number | null)[];
  histogram: FsHistogram;
  /** the governing FS over the samples: smallest, mean of the finite ones, largest */
  governingFs: { min: number; mean: number | null; max: number };
}

export interface MonteCarloRun {
  readonly done: number;
  readonly total: number;
  /** true once every sample is evaluated or the run was stopped */
  readonly finished: boolean;
  /** Evaluates up to `count` more samples (default: one chunk); returns `finished`. */
  step(count?: number): boolean;
  /** Stops the run; `result()` then covers the samples evaluated. */
  stop(): void;
  result(): MonteCarloResult;
}

export function createMonteCarloRun(options: MonteCarloOptions): MonteCarloRun {
  const { distributions, evaluate, modes } = options;
  const samples = options.samples ?? 20000;
  const seed = options.seed ?? 1;
  const method = options.method ?? 'latinHypercube';
  const chunkSize = options.chunkSize ?? 1000;
  if (!(Number.isInteger(chunkSize) && chunkSize >= 1)) throw new RangeError(`chunkSize must be a whole number ≥ 1, got ${chunkSize}`);
  if (typeof evaluate !== 'function') throw new RangeError('evaluate must be a function');
  const d = distributions.length;
  const sampler = createSampler({ method, samples, dimensions: d, seed });
  const u = new Float64Array(d);
  const x = new Float64Array(d);
  const xs = new Float64Array(samples * d); // column j at j·samples
  const fs = new Float64Array(samples);
  const modeFailures = new Array<number>(modes.length).fill(0);
  let failures = 0;
  let below = 0;
  let done = 0;
  let stopped = false;

  const evaluateOne = (i: number) => {
    let outcome: SampleOutcome;
    try {
      outcome = evaluate(x);
    } catch (error) {
      const values = Array.from(x, (v) => +v.toPrecision(6)).join(', ');
      throw new RangeError(`sample ${i} (${values}): ${(error as Error).message}`);
    }
    const g = outcome.governingFs;
    const ratio = outcome.targetRatio;
    if (typeof g !== 'number' || Number.isNaN(g)) throw new RangeError(`sample ${i}: evaluate returned governingFs ${g}`);
    if (typeof ratio !== 'number' || Number.isNaN(ratio)) throw new RangeError(`sample ${i}: evaluate returned targetRatio ${ratio}`);
    if (outcome.modeFs.length !== modes.length) throw new RangeError(`sample ${i}: evaluate returned ${outcome.modeFs.length} mode FS for ${modes.length} modes`);
    fs[i] = g;
    if (g < 1) failures++;
    if (ratio < 1) below++;
    for (let m = 0; m < modes.length; m++) {
      const f = outcome.modeFs[m];
      if (f !== null && f < 1) modeFailures[m]++;
    }
  };

  const run: MonteCarloRun = {
    get done() {
      return done;
    },
    total: samples,
    get finished() {
      return stopped || done >= samples;
    },
    step(count = chunkSize) {
      const end = Math.min(samples, done + count);
      while (done < end && !stopped) {
        sampler.next(u);
        for (let j = 0; j < d; j++) {
          const v = distributions[j].quantile(u[j]);
          x[j] = v;
          xs[j * samples + done] = v;
        }
        evaluateOne(done);
        done++;
      }
      return run.finished;
    },
    stop() {
      stopped = true;
    },
    result() {
      const n = done;
      if (n === 0) throw new RangeError('no sample was evaluated');
      const governing = fs.subarray(0, n);
      const sensitivity: (number | null)[] = [];
      const governingRanks = averageRanks(governing);
      for (let j = 0; j < d; j++) {
        sensitivity.push(distributions[j].constant ? null : rankSetCorrelation(averageRanks(xs.subarray(j * samples, j * samples + n)), governingRanks));
      }
      let min = Infinity;
      let max = -Infinity;
      let sum = 0;
      let finite = 0;
      for (let i = 0; i < n; i++) {
        const g = governing[i];
        if (g < min) min = g;
        if (g > max) max = g;
        if (Number.isFinite(g)) {
          sum += g;
          finite++;
        }
      }
      return {
        method, seed, samples, evaluated: n, complete: n === samples,
        failure: failureProbability(failures, n),
        byMode: modes.map((mode, m) => {
          const p = failureProbability(modeFailures[m], n);
          return { mode, failures: modeFailures[m], pf: p.pf, interval: p.interval };
        }),
        belowTarget: below,
        pBelowTarget: below / n,
        sensitivity,
        histogram: fsHistogram(governing, options.histogramBins ?? 40),
        governingFs: { min, mean: finite > 0 ? sum / finite : null, max },
      };
    },
  };
  return run;
}

const stopRequested = (options: Pick<MonteCarloOptions, 'signal' | 'shouldStop'>) => options.signal?.aborted === true || options.shouldStop?.() === true;

/**
 * The run as a generator: each `next()` checks the stop request, evaluates one chunk and
 * reports progress; it returns the result. `runMonteCarlo` drains it at once, a worker drains
 * it with a yield to its event loop between chunks (`drainAsync`), so a cancel gets through.
 */
export function* monteCarloSteps(options: MonteCarloOptions): Generator<void, MonteCarloResult, void> {
  const run = createMonteCarloRun(options);
  while (!run.finished) {
    if (stopRequested(options)) {
      run.stop();
      break;
    }
    run.step();
    options.onProgress?.(run.done, run.total);
    if (!run.finished) yield;
  }
  return run.result();
}

/** Runs a step generator to its end synchronously. */
export function drain<T>(steps: Generator<void, T, void>): T {
  for (;;) {
    const r = steps.next();
    if (r.done) return r.value;
  }
}

/**
 * Runs a step generator, yielding to the event loop (`pause`, default a 0 ms timeout) before
 * every step. When `stopped()` turns true between steps the generator is closed and the
 * promise resolves to `undefined`.
 */
export async function drainAsync<T>(
  steps: Generator<void, T, void>,
  options: { pause?: () => Promise<void>; stopped?: () => boolean } = {},
): Promise<T | undefined> {
  const pause = options.pause ?? (() => new Promise<void>((resolve) => setTimeout(resolve, 0)));
  for (;;) {
    await pause();
    if (options.stopped?.()) {
      steps.return(undefined as T);
      return undefined;
    }
    const r = steps.next();
    if (r.done) return r.value;
  }
}

/** Runs every sample (or until stopped) synchronously. */
export function runMonteCarlo(options: MonteCarloOptions): MonteCarloResult {
  return drain(monteCarloSteps(options));
}

/** As `runMonteCarlo`, yielding to the event loop before every chunk. */
export async function runMonteCarloAsync(options: MonteCarloOptions): Promise<MonteCarloResult> {
  return (await drainAsync(monteCarloSteps(options))) as MonteCarloResult;
}

export interface SpanProbability {
  span: number;
  failure: FailureProbability;
  byMode: ModeProbability[];
  pBelowTarget: number;
}

/**
 * P_f against span: the same sampled inputs (the same seed: common random numbers, so the
 * curve is smooth) through `evaluateAt(span)` at each span. The caller's evaluate holds the
 * span fixed; `options.onProgress` counts samples over all spans.
 */
export function pfVersusSpan(
  spans: readonly number[],
  evaluateAt: (span: number) => Evaluate,
  options: Omit<MonteCarloOptions, 'evaluate'>,
): SpanProbability[] {
  return drain(pfVersusSpanSteps(spans, evaluateAt, options));
}

/** `pfVersusSpan` as a step generator (one chunk per step; see `monteCarloSteps`). */
export function* pfVersusSpanSteps(
  spans: readonly number[],
  evaluateAt: (span: number) => Evaluate,
  options: Omit<MonteCarloOptions, 'evaluate'>,
): Generator<void, SpanProbability[], void> {
  const total = spans.length * (options.samples ?? 20000);
  let before = 0;
  const out: SpanProbability[] = [];
  for (const span of spans) {
    if (!Number.isFinite(span)) throw new RangeError(`span must be a finite number, got ${span}`);
    if (stopRequested(options)) break;
    const result: MonteCarloResult = yield* monteCarloSteps({
      ...(options as MonteCarloOptions),
      evaluate: evaluateAt(span),
      onProgress: options.onProgress && ((done) => options.onProgress?.(before + done, total)),
    });
    before += result.evaluated;
    if (!result.complete) break;
    out.push({ span, failure: result.failure, byMode: result.byMode, pBelowTarget: result.pBelowTarget });
  }
  return out;
}
