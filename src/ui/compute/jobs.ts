/**
 * The analysis jobs of the compute client over a given set of analysis functions (the real
 * ones in compute-core.ts; tests pass fixtures). A failure becomes text for the user.
 */
import type { Analysis, DesignChart, SpanCurve } from '../../analysis/types';
import type { Project } from '../../model/types';
import { errorText } from './errors';
import type { AnalysisOutcome, ChartOutcome, SupportOutcome } from './types';

/** The analysis functions the jobs call (tests pass fixtures). */
export interface AnalysisFunctions {
  analyse(project: Project): Analysis;
  spanCurve(project: Project): SpanCurve;
  designChart(project: Project, layerIndex: number): DesignChart;
  minimumThickness(project: Project, layerIndex: number): number | null;
  supportNeeded(project: Project): SupportOutcome;
}

const now = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now());

export function analysisJob(project: Project, fns: AnalysisFunctions): AnalysisOutcome {
  let analysis: Analysis | null = null;
  let error: string | null = null;
  const t0 = now();
  try {
    analysis = fns.analyse(project);
  } catch (err) {
    error = `The analysis failed: ${errorText(err)}`;
  }
  return { analysis, error, timings: { analyse: now() - t0 } };
}

/** The span curve, then the design chart and minimum thickness of `layer` (each failure alone gives null). */
export function chartJob(project: Project, layer: number, fns: AnalysisFunctions): ChartOutcome {
  let curve: SpanCurve | null = null;
  let chart: DesignChart | null = null;
  let minThickness_m: number | null = null;
  const tc = now();
  try {
    curve = fns.spanCurve(project);
  } catch {
    curve = null;
  }
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
  return { layer, curve, chart, minThickness_m, timings: { curve: t0 - tc, chart: t1 - t0, minThickness: now() - t1 } };
}


export function supportJob(project: Project, fns: AnalysisFunctions): SupportOutcome {
  try {
    const r = fns.supportNeeded(project);
    return { needed: r.needed, reason: r.reason };
  } catch (err) {
    return { needed: null, reason: `the search failed: ${errorText(err)}` };
  }
}
