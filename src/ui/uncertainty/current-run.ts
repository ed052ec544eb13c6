/**
 * Which uncertainty run belongs to the results on screen. A run is made for the project as it
 * was when "Run" was pressed (its key: the project as text); it is current while the project
 * the results are for has the same key, and stale after any edit (an undo back to the same
 * inputs makes it current again). Only a current run reaches the check table (its P_f row,
 * `analysis/probability-row.ts`), the verdict and the printed report; a stale one is never
 * printed — the report then says there is no current run.
 *
 *     const withRun = analysisWithRun();
 *     withRun(state.analysis, resultsProject, run) // the same object back while nothing changed
 */
import { withUncertainty } from '../../analysis/probability-row';
import type { Analysis } from '../../analysis/types';
import type { Project, UncertaintyReport } from '../../model/types';

/** A finished run and the key of the project it was made for. */
export interface UncertaintyRun {
  result: UncertaintyReport;
  key: string;
}

const keys = new WeakMap<Project, string>();

/** The project as text: two projects with the same key have the same inputs. Cached per project object. */
export function projectKey(project: Project): string {
  let k = keys.get(project);
  if (k === undefined) {
    k = JSON.stringify(project);
    keys.set(project, k);
  }
  return k;
}

/** The run when it was made for this project's inputs; null when there is none or it is stale. */
export function currentRun(project: Project | null, run: UncertaintyRun | null): UncertaintyReport | null {
  if (!project || !run || !project.uncertainty) return null;
  return projectKey(project) === run.key ? run.result : null;
}

/**
 * A one-slot memo of `withUncertainty(analysis, currentRun(project, run))`: the analysis itself
 * when no current run applies, and the same object between calls while its inputs are the
 * same (so the elements given it re-render only when something changed).
 */
export function analysisWithRun(): (analysis: Analysis | null, project: Project | null, run: UncertaintyRun | null) => Analysis | null {
  let last: { analysis: Analysis; result: UncertaintyReport; out: Analysis } | null = null;
  return (analysis, project, run) => {
    if (!analysis) return analysis;
    const result = currentRun(project, run);
    if (!result) return analysis;
    if (last && last.analysis === analysis && last.result === result) return last.out;
    last = { analysis, result, out: withUncertainty(analysis, result) };
    return last.out;
  };
}
