/**
 * The contract between the worksheet and the code that runs its calculations off the main
 * thread. The app holds one `ComputeClient`; the analysis of each accepted edit and the
 * uncertainty runs both go through it, so neither blocks typing. Tests and node pass an
 * in-thread implementation of the same interface.
 */
import type { Project, SupportNeededReport, UncertaintyReport } from '../../model/types';
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

// ------------------------------------------------------------- the analysis of each edit
// (added beside the uncertainty contract; the runner above is unchanged)

import type { Analysis, DesignChart, SpanCurve } from '../../analysis/types';

/** The analysis of one project: the report and details (what each edit waits for). */
export interface AnalysisOutcome {
  analysis: Analysis | null;
  /** the analysis failed: the message for the user (never a stack trace) */
  error: string | null;
  /** milliseconds spent, measured where it ran */
  timings: { analyse: number };
}

/**
 * What follows the analysis, off the edit's path: the FS-versus-span curve, and the design
 * chart and the minimum thickness of one layer.
 */
export interface ChartOutcome {
  layer: number;
  curve: SpanCurve | null;
  chart: DesignChart | null;
  minThickness_m: number | null;
  timings: { curve: number; chart: number; minThickness: number };
}

/** The support needed, or why there is none (`analysis/support-needed.ts`). */
export interface SupportOutcome {
  needed: SupportNeededReport | null;
  reason: string | null;
}

/**
 * What the worksheet computes off the main thread. `analyse` and `chart` keep only the
 * latest call of each waiting: a call that a later one replaced before it started resolves
 * to `null` (the store drops it, as it drops any answer for an older project).
 */
export interface ComputeClient {
  analyse(project: Project): Promise<AnalysisOutcome | null>;
  chart(project: Project, layer: number): Promise<ChartOutcome | null>;
  /** The support-needed searches (METHODS §12) of the project; latest-only like `analyse`. */
  supportNeeded(project: Project): Promise<SupportOutcome | null>;
  runUncertainty: UncertaintyRunner;
  /** 'worker' or 'in-thread' (for tests and the status of the page) */
  readonly kind: 'worker' | 'in-thread';
  /** Where the last `analyse` ran when the client chooses per call (./quick-path.ts); tests and the benchmark read it. */
  readonly analyseRoute?: 'local' | 'worker' | null;
  /** Ends the workers; later calls reject. */
  dispose(): void;
}
