/**
 * The uncertainty run of a project (METHODS §16): the file's `uncertainty` block resolved into
 * distributions, Monte Carlo or Latin hypercube through analysis' fast per-sample path
 * (`sampleEvaluator`: evaluate + the check table's counting rules at the current span), FORM
 * on the governing check, and P_f at points of the span curve; the report's `uncertainty`
 * block (DESIGN "Contract changes in v2").
 *
 * Definitions: a sample fails when its smallest counted FS is below 1; it is below target when
 * its smallest FS/target is below 1. P_f per mode counts the samples whose smallest counted FS
 * of that mode is below 1. FORM takes g(x) = smallest counted FS − 1, which is the governing
 * check's FS − 1 wherever that check stays the smallest.
 *
 *     const block = runUncertainty(project); // project.uncertainty must be set
 *     block.pf, block.pfInterval, block.beta, block.form?.beta
 */
import { sampleEvaluator, type SampledField } from '../analysis/sample-evaluate';
import { analyse } from '../analysis/analyse';
import { acceptablePfMet } from '../analysis/probability-row';
import { spanCurve } from '../analysis/span-curve';
import type { Mode, Project, UncertaintyReport } from '../model/types';
import { ProjectError } from '../model/validate';
import type { Distribution } from './distributions';
import { form } from './form';
import { drain, monteCarloSteps, pfVersusSpanSteps, type SampleOutcome } from './monte-carlo';
import type { SamplingMethod } from './sampler';
import { projectValueAt, resolveVariables, type Variable } from './variables';

export interface UncertaintyRunOptions {
  /** override the file's `uncertainty.samples` */
  samples?: number;
  /** override the file's `uncertainty.seed` */
  seed?: number;
  method?: SamplingMethod;
  /** points of the span curve for P_f against span (default 12; 0: none) */
  spanPoints?: number;
  /** samples at each span point (default min(samples, 2000)) */
  samplesPerSpan?: number;
  /** skip FORM (default: run it) */
  form?: boolean;
  /** samples done of all samples (the main run, then the span points) */
  onProgress?: (done: number, total: number) => void;
  signal?: AbortSignal;
}

/** The range a sampled value can reach (u ∈ [1e-11, 1 − 1e-11] covers every sampler draw). */
function reach(d: Distribution): [number, number] {
  if (d.constant) return [d.mean, d.mean];
  return [Math.max(d.lower, d.quantile(1e-11)), Math.min(d.upper, d.quantile(1 - 1e-11))];
}

const finiteOrNull = (x: number | null) => (x !== null && Number.isFinite(x) ? x : null);

/** Resolves the file's variables; throws ProjectError with their field paths when one is bad. */
export function uncertaintyVariables(project: Project): Variable[] {
  const specs = project.uncertainty?.variables ?? [];
  const resolved = resolveVariables(specs, projectValueAt(project));
  if (!resolved.ok) throw new ProjectError(resolved.errors);
  return resolved.variables;
}

export function runUncertainty(project: Project, options: UncertaintyRunOptions = {}): UncertaintyReport {
  return drain(uncertaintySteps(project, options));
}

/**
 * `runUncertainty` as a generator that yields after every chunk of samples, so a Web Worker
 * can drain it with a pause between chunks (`drainAsync` in monte-carlo.ts) and a cancel
 * message gets through. The variables are resolved (and a bad one throws) on the first step.
 */
export function* uncertaintySteps(project: Project, options: UncertaintyRunOptions = {}): Generator<void, UncertaintyReport, void> {
  const u = project.uncertainty;
  if (!u) throw new RangeError('the project has no uncertainty block');
  const variables = uncertaintyVariables(project);
  const samples = options.samples ?? u.samples;
  const seed = options.seed ?? u.seed;
  const method = options.method ?? u.method;
  const distributions = variables.map((v) => v.distribution);
  const fields: SampledField[] = variables.map((v) => {
    const [lower, upper] = reach(v.distribution);
    return { path: v.path, lower, upper };
  });
  const evaluator = sampleEvaluator(project, fields);
  const modes = evaluator.modes;
  const outcomeAt = (span?: number) => (x: Float64Array): SampleOutcome => evaluator.evaluate(x, span);

  const spanPoints = options.spanPoints ?? 12;
  const samplesPerSpan = Math.min(samples, options.samplesPerSpan ?? 2000);
  const curve = spanPoints > 0 ? spanCurve(project, { samples: spanPoints }) : null;
  const spans = curve ? curve.spans_m : [];
  const total = samples + spans.length * samplesPerSpan;

  const mc = yield* monteCarloSteps({
    distributions, evaluate: outcomeAt(), modes, samples, seed, method,
    onProgress: options.onProgress && ((done) => options.onProgress?.(done, total)),
    signal: options.signal,
  });
  // P_f against span: the span curve's points are entry spans; the design span scales with them.
  const scale = project.opening.type === 'intersection' ? Math.hypot(1, (project.opening.length_m ?? project.opening.span_m) / project.opening.span_m) : 1;
  const bySpan = mc.complete && spans.length
    ? yield* pfVersusSpanSteps(spans, (s) => outcomeAt(s * scale), {
        distributions, modes, samples: samplesPerSpan, seed, method, signal: options.signal,
        onProgress: options.onProgress && ((done) => options.onProgress?.(samples + done, total)),
      })
    : [];

  const governing = analyse(project).report.governing;
  let formBlock: UncertaintyReport['form'] = null;
  if (options.form !== false && mc.complete && variables.length > 0 && !distributions.every((d) => d.constant)) {
    const f = form(distributions, (x) => {
      const g = evaluator.evaluate(x).governingFs;
      return Number.isFinite(g) ? g - 1 : Number.MAX_VALUE;
    });
    formBlock = {
      beta: finiteOrNull(f.beta), pf: finiteOrNull(f.pf), converged: f.converged, iterations: f.iterations, note: f.note,
      designPoint: variables.map((v, j) => ({ path: v.path, value: f.designPoint[j] })),
    };
  }

  const byMode: Partial<Record<Mode, number>> = {};
  const byModeInterval: Partial<Record<Mode, [number, number]>> = {};
  for (const m of mc.byMode) {
    byMode[m.mode as Mode] = m.pf;
    byModeInterval[m.mode as Mode] = m.interval;
  }
  const acceptablePf = u.acceptablePf;
  return {
    method: mc.method, seed: mc.seed, samples: mc.samples, evaluated: mc.evaluated,
    inputs: variables.map((v) => ({
      path: v.path, distribution: v.distribution.name, mean: v.distribution.mean, sd: v.distribution.sd,
      lower: finiteOrNull(v.distribution.lower), upper: finiteOrNull(v.distribution.upper),
    })),
    pf: mc.failure.pf, pfInterval: mc.failure.interval, intervalMethod: mc.failure.intervalMethod,
    pfCov: mc.failure.cov, beta: finiteOrNull(mc.failure.beta), betaNote: mc.failure.betaNote,
    byMode, byModeInterval,
    pBelowTarget: mc.pBelowTarget,
    sensitivity: variables.map((v, j) => ({ path: v.path, rankCorrelation: mc.sensitivity[j] })),
    histogram: mc.histogram,
    governingFs: { min: finiteOrNull(mc.governingFs.min), mean: mc.governingFs.mean, max: finiteOrNull(mc.governingFs.max) },
    governing,
    form: formBlock,
    pfVersusSpan: bySpan.map((p) => ({ span_m: p.span, pf: p.failure.pf, pfInterval: p.failure.interval, beta: finiteOrNull(p.failure.beta) })),
    samplesPerSpan: bySpan.length ? samplesPerSpan : 0,
    plateInterpolation: evaluator.plateInterpolation,
    acceptablePf,
    // The check table's rule (its P_f row, `probability-row.ts`), restated in the block.
    meetsAcceptablePf: acceptablePf === null ? null : acceptablePfMet(mc.failure.interval, acceptablePf),
  };
}
