/**
 * The work behind the compute client, the same in the Web Worker and in the in-thread
 * client: the real analysis functions for the jobs of ./jobs.ts (analyse + the FS-versus-span
 * curve; the design chart and minimum thickness of one layer) and the uncertainty run drained
 * chunk by chunk. No DOM here; everything returned is plain data (structured-clone safe: the
 * analysis types hold numbers, strings, arrays and plain objects only).
 */
import { analyse, designChart, minimumThickness, spanCurve } from '../../analysis/index';
import { supportNeeded } from '../../analysis/support-needed';
import type { Project, UncertaintyReport } from '../../model/types';
import { errorText } from './errors';
import { analysisJob, chartJob, supportJob, type AnalysisFunctions } from './jobs';
import type { UncertaintyRunRequest } from './types';


export const ANALYSIS_FUNCTIONS: AnalysisFunctions = {
  analyse,
  spanCurve: (project) => spanCurve(project),
  designChart: (project, layer) => designChart(project, layer),
  minimumThickness,
  supportNeeded: (project) => supportNeeded(project),
};

export { errorText, analysisJob, chartJob, supportJob, type AnalysisFunctions };

/**
 * The project's uncertainty run, one chunk of samples per step with `pause()` between steps
 * so the caller's event loop turns (a cancel message, progress posts). Resolves `undefined`
 * when `stopped()` turned true; rejects with the run's error (e.g. a bad variable's path).
 */
export async function uncertaintyJob(
  project: Project,
  request: UncertaintyRunRequest,
  hooks: { onProgress?: (done: number, total: number) => void; stopped: () => boolean; pause?: () => Promise<void> },
): Promise<UncertaintyReport | undefined> {
  // The uncertainty code is a chunk of its own: only a worker that runs a study loads it.
  const [{ uncertaintySteps }, { drainAsync }] = await Promise.all([import('../../uncertainty/run'), import('../../uncertainty/monte-carlo')]);
  const steps = uncertaintySteps(project, {
    samples: request.samples,
    seed: request.seed,
    method: request.method,
    onProgress: hooks.onProgress,
  });
  return drainAsync(steps, { pause: hooks.pause, stopped: hooks.stopped });
}
