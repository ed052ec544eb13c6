/**
 * The work behind the compute client, the same in the Web Worker and in the in-thread
 * client: the analysis of a project (analyse + the FS-versus-span curve), the design chart and
 * minimum thickness of one layer, and the uncertainty run drained chunk by chunk. No DOM here;
 * everything returned is plain data (structured-clone safe: the analysis types hold numbers,
 * strings, arrays and plain objects only).
 */
import { analyse, designChart, minimumThickness, spanCurve } from '../../analysis/index';
import type { Analysis, DesignChart, SpanCurve } from '../../analysis/types';
import type { Project, UncertaintyReport } from '../../model/types';
import { drainAsync } from '../../uncertainty/monte-carlo';
import { uncertaintySteps } from '../../uncertainty/run';
import type { AnalysisOutcome, ChartOutcome, UncertaintyRunRequest } from './types';

/** The analysis functions the jobs call (tests pass fixtures). */
export interface AnalysisFunctions {
  analyse(project: Project): Analysis;
  spanCurve(project: Project): SpanCurve;
  designChart(project: Project, layerIndex: number): DesignChart;
  minimumThickness(project: Project, layerIndex: number): number | null;
}

export const ANALYSIS_FUNCTIONS: AnalysisFunctions = {
  analyse,
  spanCurve: (project) => spanCurve(project),
  designChart: (project, layer) => designChart(project, layer),
  minimumThickness,
};

/** Error text for the user: the message only, never a stack trace. */
export function errorText(err: unknown): string {
  if (err instanceof Error) return err.message || err.name;
  return String(err);
}

const now = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now());

export function analysisJob(project: Project, fns: AnalysisFunctions = ANALYSIS_FUNCTIONS): AnalysisOutcome {
  let analysis: Analysis | null = null;
  let curve: SpanCurve | null = null;
  let error: string | null = null;
  const t0 = now();
  try {
    analysis = fns.analyse(project);
  } catch (err) {
    error = `The analysis failed: ${errorText(err)}`;
  }
  const t1 = now();
  if (analysis) {
    try {
      curve = fns.spanCurve(project);
    } catch {
      curve = null;
    }
  }
  return { analysis, curve, error, timings: { analyse: t1 - t0, curve: now() - t1 } };
}

export function chartJob(project: Project, layer: number, fns: AnalysisFunctions = ANALYSIS_FUNCTIONS): ChartOutcome {
  let chart: DesignChart | null = null;
  let minThickness_m: number | null = null;
  const t0 = now();
  try {
    chart = fns.designChart(project, layer);
  } catch {
    chart = null;
  }
  const t1 = now();
  try {
    const t = fns.minimumThickness(project, layer);
    minThickness_m = typeof t === 'number' && Number.isFinite(t) ? t : null;
  } catch {
    minThickness_m = null;
  }
  return { layer, chart, minThickness_m, timings: { chart: t1 - t0, minThickness: now() - t1 } };
}

/**
 * The project's uncertainty run, one chunk of samples per step with `pause()` between steps
 * so the caller's event loop turns (a cancel message, progress posts). Resolves `undefined`
 * when `stopped()` turned true; rejects with the run's error (e.g. a bad variable's path).
 */
export function uncertaintyJob(
  project: Project,
  request: UncertaintyRunRequest,
  hooks: { onProgress?: (done: number, total: number) => void; stopped: () => boolean; pause?: () => Promise<void> },
): Promise<UncertaintyReport | undefined> {
  const steps = uncertaintySteps(project, {
    samples: request.samples,
    seed: request.seed,
    method: request.method,
    onProgress: hooks.onProgress,
  });
  return drainAsync(steps, { pause: hooks.pause, stopped: hooks.stopped });
}
