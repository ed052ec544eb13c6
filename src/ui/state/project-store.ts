/**
 * The one place the analysis runs in the app. Components dispatch `project-edit`,
 * `project-replace`, `units-change`, `chart-layer-change`; the shell forwards them here. Every
 * edit is validated by the model before it lands (a rejected edit keeps the project and sets
 * `fieldErrors`); accepted edits push undo history, autosave, and post the analysis at once to
 * the compute client (a Web Worker in the browser: `src/ui/compute/`), so typing never waits
 * for it. Each request carries a sequence number; an answer for an older project is dropped.
 * `pending` is true from an accepted edit until its analysis has landed, `chartPending` until
 * its span curve and design chart have (they follow in a worker of their own): until then the
 * results shown are the previous project's and the app marks them as updating. `settled()` resolves once both have landed (tests, benchmark).
 *
 * Two kinds of refusal are kept apart:
 * - a refused FIELD (`fieldErrors`): the field still holds the refused text, so its error stays
 *   beside it until that field is accepted (or the project is replaced, undone or redone), and
 *   `stale` is true: the results are for the last accepted values;
 * - a refused PROJECT (a file, a link, a paste or a layer change: `fileErrors`): its errors
 *   are listed on their own (the app shows them in a dialog) and are never attached to the
 *   current, valid fields.
 */
import { MIGRATED_CODE } from '../../model/validate';
import type { Project, SupportNeededReport } from '../../model/types';
import type { Analysis, DesignChart, SpanCurve } from '../../analysis/types';
import type { AnalysisOutcome, ChartOutcome, ComputeClient } from '../compute/types';
import { setAtPath } from '../../model/project-path';
import { UndoHistory } from './undo-history';
import { saveAutosave, type KeyValueStorage } from './autosave';
import { errorText } from '../compute/errors';

export type UnitSystem = 'SI' | 'US';

/**
 * Autosave as the user must know it: `saved` (the last write succeeded, or there was nothing
 * to write), `failed` (the browser refused the last write; the message says why and what to
 * do), `paused` (an autosave that could not be backed up is kept untouched: `held` is its
 * text, offered for download; nothing is written until `resumeAutosave()`).
 */
export interface AutosaveState {
  status: 'saved' | 'failed' | 'paused';
  message: string | null;
  held: string | null;
}

export interface FieldError {
  path: string;
  message: string;
}

export interface AppState {
  project: Project;
  units: UnitSystem;
  analysis: Analysis | null;
  /**
   * The project `analysis` was computed for: the current project once it has landed, the
   * previous one while `pending`. Results views render against it, so what they show always
   * belongs together (and is marked updating while `pending`).
   */
  resultsProject: Project | null;
  /**
   * The FS-versus-span curve. It comes with the design chart, after the analysis: while
   * `chartPending` it may belong to the previous values (the span section says "updating…").
   */
  curve: SpanCurve | null;
  chart: DesignChart | null;
  chartLayer: number;
  minThickness_m: number | null;
  /** Why the curve, the design chart and the minimum thickness could not be computed (null: they were, or are pending). */
  chartError: string | null;
  error: string | null;
  /** Fields holding a refused value (unparsable text or a value the model refused). */
  fieldErrors: FieldError[];
  /** True while any field holds a refused value: the results are for the last accepted values. */
  stale: boolean;
  /** A refused file, link or paste: where it came from and every error in it. */
  fileErrors: { source: string; errors: FieldError[] } | null;
  canUndo: boolean;
  canRedo: boolean;
  /** True between an accepted edit and the analysis that follows it. */
  pending: boolean;
  /** True until the design chart and minimum thickness of the current project and chart layer have landed. */
  chartPending: boolean;
  /** Validation warnings of the current project (ASSUMED defaults and the like). */
  inputWarnings: FieldError[];
  /** A one-line message for the user (file opened, link copied, autosave ignored …). */
  notice: string | null;
  autosave: AutosaveState;
  /**
   * The support needed (METHODS §12 searches) for the current project, computed after the main
   * results in a task of its own (never in the way of typing); null until then or without a
   * `supportNeeded` dependency.
   */
  supportNeeded: { needed: SupportNeededReport | null; reason: string | null; project: Project } | null;
  /** True while the support-needed searches for the current project are still to run. */
  supportPending: boolean;
  /** Milliseconds spent in each step of the last analysis (for the benchmark). */
  timings: { analyse: number; curve: number; chart: number; minThickness: number };
}

export type ValidationOutcome =
  | { ok: true; project: Project; warnings: ReadonlyArray<{ path: string; message: string; code?: string }> }
  | {
      ok: false;
      errors: ReadonlyArray<{ path: string; message: string }>;
      warnings?: ReadonlyArray<{ path: string; message: string }>;
    };

export interface StoreDeps {
  validate(input: unknown): ValidationOutcome;
  /**
   * Runs the analysis (the worker client in the browser, the in-thread client in tests); with
   * `supportNeeded`, also the support-needed searches (`analysis/support-needed.ts`) after
   * each analysis.
   */
  compute: Pick<ComputeClient, 'analyse' | 'chart'> & Partial<Pick<ComputeClient, 'supportNeeded'>>;
  storage?: KeyValueStorage | null;
  /** Marks for the edit → results measure (performance.mark in the browser). */
  mark?: (name: string) => void;
  /**
   * Runs `task` later, out of the way of the edit's own frame (after the next paint in the
   * browser). Without it the autosave is written at once (tests, node).
   */
  later?: (task: () => void) => void;
}

export type Listener = (state: AppState) => void;

const plain = (e: { path: string; message: string }): FieldError => ({ path: e.path, message: e.message });

export { errorText };

export class ProjectStore {
  private state: AppState;
  private readonly history = new UndoHistory<Project>(100, 1000);
  private readonly listeners = new Set<Listener>();
  /** Sequence number of the latest analysis request; answers to older ones are dropped. */
  private seq = 0;
  private chartSeq = 0;
  private supportSeq = 0;
  private settledWaiters: Array<() => void> = [];
  /** Refused fields by the path that was edited (a refusal may name other paths too). */
  private refused = new Map<string, FieldError[]>();
  /** True once the user picked a layer for the chart; until then it follows the governing layer. */
  private chartLayerChosen = false;
  constructor(private readonly deps: StoreDeps, initial: Project, units: UnitSystem = 'SI') {
    const checked = deps.validate(initial);
    if (!checked.ok) {
      throw new RangeError(`initial project refused: ${checked.errors.map((e) => `${e.path}: ${e.message}`).join('; ')}`);
    }
    this.state = {
      project: checked.project,
      units,
      analysis: null,
      resultsProject: null,
      curve: null,
      chart: null,
      chartLayer: 0,
      minThickness_m: null,
      chartError: null,
      error: null,
      fieldErrors: [],
      stale: false,
      fileErrors: null,
      canUndo: false,
      canRedo: false,
      pending: true,
      chartPending: true,
      inputWarnings: checked.warnings.map(plain),
      notice: null,
      autosave: { status: 'saved', message: null, held: null },
      supportNeeded: null,
      supportPending: false,
      timings: { analyse: 0, curve: 0, chart: 0, minThickness: 0 },
    };
    this.requestAnalysis();
  }

  getState(): AppState {
    return this.state;
  }

  subscribe(listener: Listener): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /** Set one field by its project path. Returns true when the edit was accepted. */
  edit(path: string, value: unknown): boolean {
    this.deps.mark?.('lamina:edit');
    let candidate: Project;
    try {
      candidate = setAtPath(this.state.project, path, value);
    } catch (err) {
      this.refuseField(path, [{ path, message: errorText(err) }]);
      return false;
    }
    return this.accept(candidate, path);
  }

  /**
   * A field holds text that cannot be read (`message`), or no longer does (`null`). The project
   * is unchanged either way; the field is listed in `fieldErrors` and the results marked stale.
   */
  markRefused(path: string, message: string | null): void {
    if (message === null) {
      if (this.refused.delete(path)) this.set({});
      return;
    }
    this.refuseField(path, [{ path, message }]);
  }

  private refuseField(path: string, errors: FieldError[]): void {
    this.refused.set(path, errors.map(plain));
    this.set({});
  }

  private clearRefused(path: string | null): void {
    if (path === null) this.refused.clear();
    else this.refused.delete(path);
  }

  /** Replace the whole project (open file, preset, paste, layer add/remove/reorder). */
  replace(input: unknown, source: string): boolean {
    this.deps.mark?.('lamina:edit');
    return this.accept(input, null, source);
  }

  private accept(candidate: unknown, key: string | null, source?: string): boolean {
    let checked: ValidationOutcome;
    try {
      checked = this.deps.validate(candidate);
    } catch (err) {
      checked = { ok: false, errors: [{ path: '', message: errorText(err) }] };
    }
    if (!checked.ok) {
      const errors = checked.errors.length > 0 ? checked.errors.map(plain) : [{ path: '', message: 'refused' }];
      if (key !== null) {
        this.refuseField(key, errors);
      } else {
        this.set({
          fileErrors: { source: source ?? 'project', errors },
          notice: `${source ?? 'The project'}: not loaded — ${errors.length} error${errors.length === 1 ? '' : 's'}; the current project is unchanged.`,
        });
      }
      return false;
    }
    if (key !== null && JSON.stringify(checked.project) === JSON.stringify(this.state.project)) {
      // The same value again (e.g. retyped after a refused edit): nothing to undo or re-analyse.
      if (this.refused.has(key)) {
        this.clearRefused(key);
        this.set({});
      }
      return true;
    }
    this.history.record(this.state.project, key);
    if (source) this.chartLayerChosen = false;
    // A new whole project resets every field, so no field holds a refused value any more.
    this.clearRefused(key);
    this.set({
      project: checked.project,
      inputWarnings: checked.warnings.map(plain),
      ...(key === null ? { fileErrors: null } : {}),
      pending: true,
      chartPending: true,
      notice: migrationNotice(checked.warnings) ?? (source ? `${/^(File|Demo|Project link)\b/.test(source) ? 'Loaded' : 'Applied'}: ${source}.` : this.state.notice),
    });
    // The analysis first; the autosave (a synchronous storage write) after the edit's frame in
    // the browser (`deps.later`), at once elsewhere.
    this.requestAnalysis();
    this.autosave(checked.project);
    return true;
  }

  undo(): boolean {
    const previous = this.history.undo(this.state.project);
    return previous ? this.restore(previous) : false;
  }

  redo(): boolean {
    const next = this.history.redo(this.state.project);
    return next ? this.restore(next) : false;
  }

  private restore(project: Project): boolean {
    this.deps.mark?.('lamina:edit');
    this.clearRefused(null);
    this.set({ project, pending: true, chartPending: true });
    this.requestAnalysis();
    this.autosave(project);
    return true;
  }

  /** The project waiting to be autosaved after the next paint (several quick edits: one write). */
  private toSave: Project | null = null;

  /** Autosave the project: at once, or with `deps.later` after the edit's frame. */
  private autosave(project: Project): void {
    const later = this.deps.later;
    if (!later) return this.writeAutosave(project);
    const waiting = this.toSave !== null;
    this.toSave = project;
    if (waiting) return;
    later(() => this.flushAutosave());
  }

  /** Write an autosave that is still waiting (the page is being hidden or closed). */
  flushAutosave(): void {
    const p = this.toSave;
    this.toSave = null;
    if (p) this.writeAutosave(p);
  }

  /** Write the project to the autosave unless paused; a refusal is shown, never swallowed. */
  private writeAutosave(project: Project): void {
    const storage = this.deps.storage ?? null;
    if (!storage || this.state.autosave.status === 'paused') return;
    const r = saveAutosave(storage, project);
    if (r.ok) {
      if (this.state.autosave.status !== 'saved') this.set({ autosave: { status: 'saved', message: null, held: null } });
      return;
    }
    this.set({
      autosave: {
        status: 'failed',
        message: `Autosave failed: ${r.reason}. Your latest changes are not kept in this browser — use Save to keep them as a file.`,
        held: null,
      },
    });
  }

  /** Keep an autosave that could not be backed up: pause autosave and hold its text for download. */
  holdAutosave(text: string, message: string): void {
    this.set({ autosave: { status: 'paused', message, held: text } });
  }

  /** The user kept (or gave up) the held autosave: autosave the current project again. */
  resumeAutosave(): void {
    this.set({ autosave: { status: 'saved', message: null, held: null } });
    this.autosave(this.state.project);
  }

  setUnits(units: UnitSystem): void {
    if (units !== 'SI' && units !== 'US') return;
    if (units !== this.state.units) this.set({ units });
  }

  setChartLayer(layer: number): void {
    const n = this.state.project.layers.length;
    if (!Number.isInteger(layer) || layer < 0 || layer >= n) return;
    this.chartLayerChosen = true;
    if (layer === this.state.chartLayer && (this.state.chart || this.state.chartPending)) return;
    this.set({ chartLayer: layer, chartPending: true });
    // while an analysis is on its way, its answer requests the chart of the chosen layer
    if (!this.state.pending && this.state.analysis) this.requestChart(this.state.project, layer);
  }

  setNotice(notice: string | null): void {
    this.set({ notice });
  }

  /** A file that could not be read or parsed: list its errors on their own (never on the fields). */
  setFileErrors(source: string, errors: FieldError[], notice: string | null = null): void {
    this.set({ fileErrors: errors.length ? { source, errors: errors.map(plain) } : null, notice });
  }

  /** The user closed the list of a refused file's errors. */
  dismissFileErrors(): void {
    if (this.state.fileErrors) this.set({ fileErrors: null });
  }

  /**
   * Resolves once the analysis and the chart of the current project have landed (at once when
   * nothing is pending). Tests and the benchmark wait on it.
   */
  settled(): Promise<void> {
    if (!this.state.pending && !this.state.chartPending) return Promise.resolve();
    return new Promise((resolve) => this.settledWaiters.push(resolve));
  }

  /** Post the current project's analysis; its answer is dropped if another edit came since. */
  private requestAnalysis(): void {
    const seq = ++this.seq;
    const project = this.state.project;
    this.chartSeq++; // a chart on its way belongs to an older project
    this.supportSeq++; // so does a support search
    this.deps.compute.analyse(project).then(
      (out) => {
        if (out !== null && seq === this.seq) this.landAnalysis(project, out);
      },
      (err: unknown) => {
        if (seq === this.seq) this.landAnalysis(project, { analysis: null, error: `The analysis failed: ${errorText(err)}`, timings: { analyse: 0 } });
      },
    );
  }

  private landAnalysis(project: Project, out: AnalysisOutcome): void {
    const n = project.layers.length;
    let chartLayer = Math.min(this.state.chartLayer, n - 1);
    if (!this.chartLayerChosen && out.analysis) chartLayer = governingLayerIndex(out.analysis);
    const timings = { ...this.state.timings, ...out.timings };
    if (out.analysis) {
      const supportPending = Boolean(this.deps.compute.supportNeeded);
      this.set({ analysis: out.analysis, resultsProject: project, error: out.error, chartLayer, pending: false, chartPending: true, supportPending, timings });
      this.requestChart(project, chartLayer);
      // after the results and the chart, in the same worker: never in their way
      if (supportPending) this.requestSupport(project);
    } else {
      this.set({ analysis: null, resultsProject: project, curve: null, error: out.error, chartLayer, pending: false, chart: null, minThickness_m: null, chartError: null, chartPending: false, supportPending: false, timings });
    }
  }

  /** Run the support-needed searches for the current project unless its answer is already there. */
  requestSupportNeeded(): void {
    if (this.state.supportNeeded?.project === this.state.project || !this.state.analysis || this.state.pending) return;
    this.set({ supportPending: true });
    this.requestSupport(this.state.project);
  }

  private requestSupport(project: Project): void {
    const find = this.deps.compute.supportNeeded;
    if (!find) return;
    const seq = ++this.supportSeq;
    const landed = (r: { needed: SupportNeededReport | null; reason: string | null } | null) => {
      if (r === null || seq !== this.supportSeq || project !== this.state.project) return;
      this.set({ supportNeeded: { needed: r.needed, reason: r.reason, project }, supportPending: false });
    };
    find(project).then(landed, (err: unknown) => landed({ needed: null, reason: `the search failed: ${errorText(err)}` }));
  }

  private requestChart(project: Project, layer: number): void {
    const seq = ++this.chartSeq;
    const landed = (out: ChartOutcome | null, chartError: string | null = null) => {
      if (out === null || seq !== this.chartSeq || project !== this.state.project || layer !== this.state.chartLayer) return;
      this.set({ curve: out.curve, chart: out.chart, minThickness_m: out.minThickness_m, chartError, chartPending: false, timings: { ...this.state.timings, ...out.timings } });
    };
    this.deps.compute.chart(project, layer).then(
      (out) => landed(out),
      (err: unknown) => landed({ layer, curve: null, chart: null, minThickness_m: null, timings: { curve: 0, chart: 0, minThickness: 0 } }, `the computation failed: ${errorText(err)}`),
    );
  }

  private set(patch: Partial<AppState>): void {
    // The same array while the refusals are the same, so views given it do not re-render.
    const flat = [...this.refused.values()].flat();
    const prev = this.state.fieldErrors;
    const fieldErrors = flat.length === prev.length && flat.every((e, i) => e === prev[i]) ? prev : flat;
    this.state = {
      ...this.state,
      ...patch,
      fieldErrors,
      stale: fieldErrors.length > 0,
      canUndo: this.history.canUndo,
      canRedo: this.history.canRedo,
    };
    for (const l of this.listeners) l(this.state);
    if (!this.state.pending && !this.state.chartPending && this.settledWaiters.length) {
      const waiters = this.settledWaiters;
      this.settledWaiters = [];
      for (const w of waiters) w();
    }
  }
}

/** The one-time notice of a lamina/1 project migrated on load, if this validation migrated one. */
function migrationNotice(warnings: ReadonlyArray<{ message: string; code?: string }>): string | null {
  const w = warnings.find((x) => x.code === MIGRATED_CODE);
  return w ? w.message : null;
}

/** Index of the governing layer (the report gives it), 0 when there is none. */
export function governingLayerIndex(analysis: Analysis): number {
  return analysis.report.governing?.layerIndex ?? 0;
}
