/**
 * The contract between the worksheet and the code that runs its calculations off the main
 * thread. The app holds one `ComputeClient`; the analysis of each accepted edit and the
 * uncertainty runs both go through it, so neither blocks typing. Tests and node pass an
 * in-thread implementation of the same interface.
 */
import type { Project, UncertaintyReport } from '../../model/types';
import type { SamplingMethod } from '../../uncertainty/sampler';

export interface UncertaintyRunRequest {
  /** override the file's `uncertainty.samples` */
  samples?: number;
  /** override the file's `uncertainty.seed` */
  seed?: number;
  method?: SamplingMethod;
}

export interface RunHooks {
  /** samples done of all samples (the main run, then the span points) */
  onProgress?: (done: number, total: number) => void;
  /** aborting rejects the promise with an `AbortError` DOMException and frees the worker */
  signal?: AbortSignal;
}

/** Runs the project's uncertainty block; rejects with the run's error message when it fails. */
export type UncertaintyRunner = (
  project: Project,
  request: UncertaintyRunRequest,
  hooks?: RunHooks,
) => Promise<UncertaintyReport>;
