/**
 * Where an edit's analysis runs: in the page's own thread when it is known to be quick, else in
 * the edit worker.
 *
 * A worker answers an edit in a few milliseconds, but its answer arrives after the frame that
 * paints the typed key, so the results are painted one frame later (about 17 ms at 60 Hz): on
 * this kind of machine, key → results painted could not get below about 35 ms that way. An
 * analysis known to take at most `budgetMs` (1–3 ms for a beam of a few layers; the span curve
 * and the design chart follow in the worker) is run in the key's own task instead, and its results are painted in
 * the key's frame. Typing never waits longer than the budget: a project whose analysis has
 * not been timed yet, or took longer, goes to the worker, and so do the design chart, the
 * support needed and the uncertainty runs (tens of milliseconds to seconds).
 *
 * The time is kept per project *shape* (opening type and ends, number of layers, whether
 * support is given): the cost of an analysis depends on these, not on the values typed.
 * Both paths report the time they measured, so the choice follows the machine.
 */
import type { Project } from '../../model/types';
import type { AnalysisFunctions } from './jobs';
import { analysisJob } from './jobs';
import type { AnalysisOutcome } from './types';

/** An analysis known to take at most this long (ms) runs in the page's thread (about a third of a 60 Hz frame). */
export const QUICK_BUDGET_MS = 6;

/** What the cost of an analysis depends on: the opening's type and ends, the layers, the support. */
export function projectShape(project: Project): string {
  const o = project.opening;
  const bolts = project.support.bolts;
  return `${o.type}|${o.ends}|${o.edges ? 'edges' : ''}|${project.layers.length}|${bolts ? bolts.action : 'no bolts'}`;
}

export interface QuickPathOptions {
  /** The worker's analyse (a replaced call resolves null). */
  slow(project: Project): Promise<AnalysisOutcome | null>;
  /** The analysis functions in this thread, or null while they are not loaded. */
  local(): AnalysisFunctions | null;
  budgetMs?: number;
  /**
   * Run the very first call in this thread (start-up: the page's first results, before any
   * worker has booted). Later calls follow the budget.
   */
  firstLocal?: boolean;
}

export interface QuickPath {
  analyse(project: Project): Promise<AnalysisOutcome | null>;
  /** Where the last call ran (tests, benchmark). */
  readonly lastRoute: 'local' | 'worker' | null;
  /** The time known for a project's shape, ms (tests). */
  knownMs(project: Project): number | undefined;
}

export function createQuickPath(options: QuickPathOptions): QuickPath {
  const budget = options.budgetMs ?? QUICK_BUDGET_MS;
  const known = new Map<string, number>();
  let lastRoute: QuickPath['lastRoute'] = null;
  let first = options.firstLocal ?? false;
  const remember = (shape: string, out: AnalysisOutcome | null) => {
    if (!out) return;
    const ms = out.timings.analyse;
    if (Number.isFinite(ms)) known.set(shape, ms);
  };
  return {
    analyse(project) {
      const shape = projectShape(project);
      const fns = options.local();
      const ms = known.get(shape);
      const firstCall = first;
      first = false;
      if (fns !== null && (firstCall || (ms !== undefined && ms <= budget))) {
        lastRoute = 'local';
        const out = analysisJob(project, fns);
        remember(shape, out);
        return Promise.resolve(out);
      }
      lastRoute = 'worker';
      return options.slow(project).then((out) => {
        remember(shape, out);
        return out;
      });
    },
    get lastRoute() {
      return lastRoute;
    },
    knownMs: (project) => known.get(projectShape(project)),
  };
}
