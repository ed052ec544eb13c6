/**
 * `<uncertainty-section>`: the worksheet's uncertainty study (METHODS §16). It edits the
 * project's `uncertainty` block — the variables by field path, with the project's own values
 * as their means, the one-click lognormal of a layer's Brazilian specimens, the sample count,
 * seed, method and acceptable P_f — as `project-edit` events that the store validates (a bad
 * variable is refused with its field path, shown here). "Run" hands the project to `runner`
 * (the worker of `ui/compute`, so typing stays responsive); a progress bar follows it and
 * "Cancel" aborts it. An edit of the project while a run is going cancels it; a result whose
 * project has since changed is kept on screen marked stale until the next run (and is left out
 * of the check table and the printed report: `current-run.ts`). Results: P_f
 * with its 95 % interval, β, P(below target), FORM, P_f per mode, the histogram of the
 * governing FS (FS = 1 and the target marked), the sensitivity (tornado) chart and P_f
 * against span — the report's charts. Computes nothing itself.
 *
 * @fires project-edit - { path, value } on `uncertainty`, `uncertainty.variables` or a field of one
 * @fires uncertainty-result - { result, key } when a run finishes (key: the project it was made for, `current-run.ts`)
 * @fires field-refused - { path, message: null } when the user dismisses a refused edit
 */
import { openingWords } from '../../model/span-wording';
import { LitElement, html, css, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import type { Mode, Project, UncertainVariable, Uncertainty, UncertaintyReport } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { VARIABLE_DISTRIBUTIONS } from '../../model/validate';
import { MODE_NAME } from '../../analysis/check-labels';
import { brazilianVariable, projectValueAt } from '../../uncertainty/variables';
import { fsHistogramSvg } from '../../report/charts/fs-histogram';
import { sensitivitySvg } from '../../report/charts/sensitivity';
import { pfSpanSvg } from '../../report/charts/pf-span';
import { PF_MEANING } from '../../report/sections/uncertainty';
import { numberText } from '../../model/number-format';
import type { UncertaintyRunner } from '../compute/types';
import { fire, fireEdit } from '../inputs/events';
import { selectField } from '../inputs/field-templates';
import '../inputs/quantity-input';
import { displayValue } from '../results/display-value';
import { resultsStyles } from '../results/results-styles';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { fieldName, quantityOf, samplablePaths } from './variable-fields';
import { DeferOffscreen } from '../app/defer-offscreen';
import { projectKey, type UncertaintyRun } from './current-run';
import { afterNextPaint } from '../after-paint';

/** The block a first variable creates (the model's defaults: 20 000 samples, seed 1, Latin hypercube). */
const NEW_BLOCK: Omit<Uncertainty, 'variables'> = { samples: 20000, seed: 1, method: 'latinHypercube', acceptablePf: null };

const prob = (p: number): string => (p === 0 ? '0' : numberText(p, 3));

type RunState =
  | { kind: 'idle' }
  | { kind: 'running'; done: number; total: number }
  | { kind: 'done'; result: UncertaintyReport; key: string }
  | { kind: 'failed'; message: string }
  | { kind: 'cancelled'; why: string };

@customElement('uncertainty-section')
export class UncertaintySection extends DeferOffscreen(LitElement) {
  @property({ attribute: false }) project: Project | null = null;
  @property({ attribute: false }) runner: UncertaintyRunner | null = null;
  @property() units: UnitSystem = 'SI';
  @property({ attribute: false }) fieldErrors: ReadonlyArray<{ path: string; message: string }> = [];

  @state() private run: RunState = { kind: 'idle' };
  /** The last finished result (kept while a new run goes, shown stale when the project moved on). */
  @state() private last: { result: UncertaintyReport; key: string } | null = null;
  @state() private newPath = '';
  private abort: AbortController | null = null;
  private runningKey = '';

  static override styles = [
    tokens,
    sheet,
    resultsStyles,
    css`
      :host { display: block; }
      .bar { display: flex; flex-wrap: wrap; gap: 0.5rem 1rem; align-items: center; margin: 0.5rem 0; }
      table.vars { border-collapse: collapse; width: 100%; }
      table.vars th, table.vars td { padding: 0.2rem 0.35rem; border-bottom: 1px solid var(--lam-rule, #ccc); text-align: left; vertical-align: top; }
      table.vars td.path code { font-size: 0.85em; }
      .field-name { display: block; font-size: 0.85em; color: var(--lam-muted, #555); }
      .errors { border-left: 4px solid var(--lam-bad, #b00020); padding: 0.3rem 0.6rem; margin: 0.5rem 0; }
      .errors code { font-weight: 600; }
      progress { width: min(14rem, 60%); }
      /* The bar changes while a run goes: keep its layout and paint inside its own box. */
      label.progress { contain: strict; display: inline-block; width: min(34rem, 100%); height: 1.6em; overflow: hidden; white-space: nowrap; }
      .pf { font-size: 1.15rem; font-weight: 600; }
      .stale { border: 2px dashed var(--lam-bad, #b00020); padding: 0.2rem 0.5rem; display: inline-block; }
      .charts { display: grid; grid-template-columns: repeat(auto-fit, minmax(min(100%, 30rem), 1fr)); gap: 1rem; }
      .charts svg { width: 100%; height: auto; }
      .scroll { overflow-x: auto; }
      .hint { color: var(--lam-muted, #555); font-size: 0.9em; }
      @media (max-width: 40rem) { table.vars th.opt, table.vars td.opt { display: none; } }
    `,
  ];

  private get block(): Uncertainty | null {
    return this.project?.uncertainty ?? null;
  }

  /** The project as text (a result is stale when it differs); recomputed only when the project changes. */
  private key = '';
  /** Chart strings of the shown result, rebuilt only when the result, the units or the span change. */
  private charts: { for: unknown; units: UnitSystem; span: number; histogram: string; sensitivity: string; pfSpan: string | null } | null = null;
  /** The charts asked for and not drawn yet: drawn in a task after the numbers are painted. */
  private chartsWanted: { for: unknown; units: UnitSystem; span: number } | null = null;
  /** Progress reported by the worker, shown at most once per animation frame. */
  private pendingProgress: { done: number; total: number } | null = null;
  private progressFrame = 0;
  /** Per project: the samplable paths and the layers offering a one-click Brazilian lognormal. */
  private paths: string[] = [];
  private brazilian: { i: number; n: number }[] = [];

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('project')) {
      const p = this.project;
      this.key = p ? projectKey(p) : '';
      this.paths = p ? samplablePaths(p) : [];
      this.brazilian = p
        ? p.layers.flatMap((_, i) => {
            const b = brazilianVariable(p, i);
            return b.spec === null ? [] : [{ i, n: b.n }];
          })
        : [];
    }
    // An edit while a run is going makes that run stale: cancel it.
    if (changed.has('project') && this.run.kind === 'running' && this.key !== this.runningKey) {
      this.abort?.abort();
      this.abort = null;
      this.run = { kind: 'cancelled', why: 'The project changed during the run, so the run was cancelled. Run again for the current project.' };
    }
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this.abort?.abort();
  }

  private setVariables(variables: UncertainVariable[]): void {
    if (this.block) fireEdit(this, 'uncertainty.variables', variables);
    else fireEdit(this, 'uncertainty', { ...NEW_BLOCK, variables });
  }

  private addPath(path: string): void {
    const p = path.trim();
    if (!p) return;
    const vars = this.block?.variables ?? [];
    const v: UncertainVariable = /poisson|jointCondition|horizontalStress|surcharge|standing/.test(p)
      ? { path: p, distribution: 'normal', cov: 0.1 }
      : { path: p, distribution: 'lognormal', cov: 0.1 };
    this.setVariables([...vars, v]);
    this.newPath = '';
  }

  private addBrazilian(layer: number): void {
    if (!this.project) return;
    const b = brazilianVariable(this.project, layer);
    if (b.spec === null) return;
    const vars = (this.block?.variables ?? []).filter((v) => v.path !== b.spec.path);
    this.setVariables([...vars, b.spec as UncertainVariable]);
  }

  private async start(): Promise<void> {
    if (!this.project || !this.runner || this.run.kind === 'running') return;
    const project = this.project;
    // the key of the project run now (not `this.key`, which an update still to come may hold for older values)
    const key = projectKey(project);
    const abort = new AbortController();
    this.abort = abort;
    this.runningKey = key;
    this.run = { kind: 'running', done: 0, total: 0 };
    try {
      const result = await this.runner(project, {}, {
        signal: abort.signal,
        onProgress: (done, total) => {
          if (this.abort !== abort) return;
          this.pendingProgress = { done, total };
          // A run reports every chunk: redraw the bar at most 4 times a second (each redraw is a
          // style and layout pass on the main thread, which typing elsewhere must not wait for).
          this.progressFrame ||= window.setTimeout(() => {
            this.progressFrame = 0;
            if (this.abort === abort && this.pendingProgress && this.run.kind === 'running') this.run = { kind: 'running', ...this.pendingProgress };
          }, 250);
        },
      });
      if (this.abort !== abort) return;
      performance.mark('lamina:uncertainty-result'); // the result is here; rendering it follows
      this.last = { result, key };
      this.run = { kind: 'done', result, key };
      // The worksheet takes the run into the check table and the report while it is current.
      fire<UncertaintyRun>(this, 'uncertainty-result', { result, key });
    } catch (err) {
      if (this.abort !== abort && !(err instanceof DOMException && err.name === 'AbortError')) return;
      if (err instanceof DOMException && err.name === 'AbortError') {
        if (this.run.kind === 'running') this.run = { kind: 'cancelled', why: 'Run cancelled.' };
      } else {
        this.run = { kind: 'failed', message: err instanceof Error ? err.message : String(err) };
      }
    } finally {
      if (this.abort === abort) this.abort = null;
    }
  }

  private cancel(): void {
    this.abort?.abort();
    this.abort = null;
    this.run = { kind: 'cancelled', why: 'Run cancelled.' };
  }

  private renderErrors() {
    const errs = this.fieldErrors.filter((e) => e.path === 'uncertainty' || e.path.startsWith('uncertainty.') || e.path.startsWith('uncertainty['));
    if (errs.length === 0) return nothing;
    return html`<div class="errors" role="alert" data-role="uncertainty-errors">
      <strong>Not applied — the project keeps its previous uncertainty settings:</strong>
      <ul>${errs.map((e) => html`<li><code>${e.path}</code>: ${e.message}</li>`)}</ul>
      <button type="button" @click=${() => this.dismiss()}>Dismiss</button>
    </div>`;
  }

  private dismiss(): void {
    const keys = new Set(this.fieldErrors.filter((e) => e.path.startsWith('uncertainty')).map((e) => e.path));
    // The store keys a refusal by the edited path (uncertainty, uncertainty.variables, or a field of one).
    for (const k of ['uncertainty', 'uncertainty.variables', ...keys]) fire(this, 'field-refused', { path: k, message: null });
  }

  private errorAt(path: string): string {
    return this.fieldErrors.find((e) => e.path === path)?.message ?? '';
  }

  private renderVariables(project: Project) {
    const vars = this.block?.variables ?? [];
    const at = projectValueAt(project);
    const choices = VARIABLE_DISTRIBUTIONS.map((d) => ({ value: d, label: d }));
    const rows = vars.map((v, j) => {
      const base = `uncertainty.variables[${j}]`;
      const q = quantityOf(v.path);
      const own = at(v.path);
      const ownText = typeof own === 'number' ? displayValue(own, q, this.units).text : '—';
      const num = (key: 'mean' | 'sd' | 'min' | 'max', label: string, quantity = q) => html`<quantity-input
        compact nullable label=${label} path=${`${base}.${key}`} .value=${v[key] ?? null} quantity=${quantity ?? ''} units=${this.units}
        empty-text=${key === 'mean' ? ownText : '—'} hint=${key === 'mean' && v.mean === undefined ? 'project value' : ''} error=${this.errorAt(`${base}.${key}`)}></quantity-input>`;
      return html`<tr data-path=${v.path}>
        <td class="path"><code>${v.path}</code><span class="field-name">${fieldName(v.path, project)}</span>
          ${this.errorAt(`${base}.path`) ? html`<span class="error" role="alert">${this.errorAt(`${base}.path`)}</span>` : nothing}</td>
        <td>${selectField(this, { label: `Distribution of ${v.path}`, path: `${base}.distribution`, value: v.distribution, choices, compact: true })}</td>
        <td>${num('mean', `Mean of ${v.path}`)}</td>
        <td><quantity-input compact nullable label=${`CoV of ${v.path}`} path=${`${base}.cov`} .value=${v.cov ?? null} units=${this.units}
          empty-text="—" error=${this.errorAt(`${base}.cov`)}></quantity-input></td>
        <td class="opt">${num('sd', `SD of ${v.path}`)}</td>
        <td class="opt">${num('min', `Lower end of ${v.path}`)}</td>
        <td class="opt">${num('max', `Upper end of ${v.path}`)}</td>
        <td><button type="button" aria-label=${`Remove ${v.path}`} @click=${() => this.setVariables(vars.filter((_, k) => k !== j))}>Remove</button></td>
      </tr>`;
    });
    const suggestions = this.paths.filter((p) => !vars.some((v) => v.path === p));
    const brazilian = this.brazilian;
    return html`
      <div class="scroll">
        <table class="vars" data-role="uncertainty-variables">
          <caption class="sr-only">Sampled inputs</caption>
          <thead><tr><th>Field path</th><th>Distribution</th><th>Mean</th><th>CoV</th><th class="opt">SD</th><th class="opt">Lower end</th><th class="opt">Upper end</th><th></th></tr></thead>
          <tbody>${rows.length ? rows : html`<tr><td colspan="8" class="hint">No variables: every input is held at the project’s value. Add a field below.</td></tr>`}</tbody>
        </table>
      </div>
      <form class="bar" @submit=${(e: Event) => { e.preventDefault(); this.addPath(this.newPath); }}>
        <label for="new-path">Field path</label>
        <input id="new-path" name="new-path" list="samplable" size="34" placeholder="e.g. layers[0].thickness_m" .value=${this.newPath}
          @input=${(e: Event) => { this.newPath = (e.target as HTMLInputElement).value; }} />
        <datalist id="samplable">${suggestions.map((p) => html`<option value=${p}>${fieldName(p, project)}</option>`)}</datalist>
        <button type="submit" data-role="add-variable">Add variable</button>
      </form>
      ${brazilian.length
        ? html`<div class="bar">${brazilian.map(({ i, n }) => html`<button type="button" data-role="brazilian" data-layer=${i} @click=${() => this.addBrazilian(i)}>
            Tensile strength of layer ${i + 1} from its ${n} valid Brazilian specimens (lognormal)</button>`)}</div>`
        : html`<p class="hint">A layer with at least 3 valid Brazilian specimens offers a one-click lognormal of its tensile strength (their mean and CoV).</p>`}
    `;
  }

  private renderSettings() {
    const b = this.block;
    if (!b) return nothing;
    return html`<div class="bar" data-role="uncertainty-settings">
      <quantity-input label="Samples" path="uncertainty.samples" .value=${b.samples} units=${this.units} error=${this.errorAt('uncertainty.samples')}></quantity-input>
      <quantity-input label="Seed" path="uncertainty.seed" .value=${b.seed} units=${this.units} error=${this.errorAt('uncertainty.seed')}></quantity-input>
      ${selectField(this, { label: 'Sampling', path: 'uncertainty.method', value: b.method, choices: [{ value: 'latinHypercube', label: 'Latin hypercube' }, { value: 'monteCarlo', label: 'plain Monte Carlo' }] })}
      <quantity-input label="Acceptable P_f" nullable empty-text="none" path="uncertainty.acceptablePf" .value=${b.acceptablePf} units=${this.units} error=${this.errorAt('uncertainty.acceptablePf')}></quantity-input>
      <button type="button" @click=${() => fireEdit(this, 'uncertainty', null)}>Remove the study</button>
    </div>`;
  }

  private renderRun() {
    const r = this.run;
    const canRun = !!this.block && this.block.variables.length > 0 && !!this.runner;
    return html`<div class="bar" data-role="uncertainty-run">
      ${r.kind === 'running'
        ? html`<button type="button" data-role="cancel-run" @click=${() => this.cancel()}>Cancel</button>
            <label class="progress">Running <progress data-role="run-progress" max=${r.total || 1} value=${r.done}></progress>
            ${r.total ? `${r.done} of ${r.total} samples` : 'starting…'}</label>`
        : html`<button type="button" data-role="start-run" ?disabled=${!canRun} @click=${() => void this.start()}>Run ${this.block ? `${this.block.samples} samples` : ''}</button>`}
      ${!this.runner ? html`<span class="hint">No runner: the uncertainty run is not available here.</span>` : nothing}
      ${r.kind === 'cancelled' ? html`<span role="status" data-role="run-note">${r.why}</span>` : nothing}
      ${r.kind === 'failed' ? html`<span class="error" role="alert" data-role="run-error">The run failed: ${r.message}</span>` : nothing}
    </div>`;
  }

  private renderResult(project: Project) {
    const last = this.last;
    if (!last) return nothing;
    const u = last.result;
    const stale = last.key !== this.key;
    const modes = Object.keys(u.byMode) as Mode[];
    const span = project.opening.span_m;
    const current = (c: { for: unknown; units: UnitSystem; span: number } | null) => c !== null && c.for === u && c.units === this.units && c.span === span;
    if (!current(this.charts) && !current(this.chartsWanted)) {
      // The numbers first; the three charts (tens of milliseconds of SVG) in a task of their own
      // after the numbers are painted, so drawing a result never holds typing up for long.
      const want = { for: u, units: this.units, span };
      this.chartsWanted = want;
      const spanWord = openingWords(project.opening.type).span;
      void afterNextPaint().then(() => {
        if (this.chartsWanted !== want) return;
        this.chartsWanted = null;
        this.charts = {
          ...want,
          histogram: fsHistogramSvg(u, { target: u.governing?.target ?? null }),
          sensitivity: sensitivitySvg(u),
          pfSpan: u.pfVersusSpan.length > 1 ? pfSpanSvg(u, { units: want.units, currentSpan_m: span, spanWord }) : null,
        };
        this.requestUpdate();
      });
    }
    const charts = current(this.charts) ? this.charts : null;
    return html`<div data-role="uncertainty-result" data-stale=${stale ? 'true' : 'false'}>
      ${stale ? html`<p class="stale" role="status">Stale: the project changed after this run — these numbers are for the earlier project. Run again.</p>` : nothing}
      <p><span class="pf" data-role="pf">P_f = ${prob(u.pf)}</span>
        (95 % interval ${prob(u.pfInterval[0])} – ${prob(u.pfInterval[1])}, ${u.intervalMethod === 'wilson' ? 'Wilson' : 'rule of three 3/N'}),
        <span data-role="beta">β = ${u.beta === null ? `— (${u.betaNote ?? 'not defined'})` : numberText(u.beta, 3)}</span>;
        ${u.evaluated} samples, ${u.method === 'latinHypercube' ? 'Latin hypercube' : 'plain Monte Carlo'}, seed ${u.seed}.</p>
      <ul>
        <li>P(some counted check below its target) = ${prob(u.pBelowTarget)}</li>
        <li>FORM on the governing check: ${u.form ? html`β ${u.form.beta === null ? '—' : numberText(u.form.beta, 3)}, P_f ${u.form.pf === null ? '—' : prob(u.form.pf)}${u.form.converged ? '' : ' (did not converge)'}` : 'not run'}</li>
        ${u.acceptablePf !== null ? html`<li>Acceptable P_f ${prob(u.acceptablePf)}: ${u.meetsAcceptablePf ? 'met ✓ (the interval’s upper end is at or below it)' : 'not shown to be met ✗ (the interval’s upper end is above it)'}; a counted row of the check table (5 Checks) while this run is current</li>` : nothing}
        ${u.plateInterpolation ? html`<li>Slab plate coefficients interpolated (largest relative error measured ${numberText(100 * u.plateInterpolation.maxRelativeError, 2)} %)</li>` : nothing}
      </ul>
      <table class="vars" data-role="pf-by-mode">
        <caption>P_f by mode (samples whose smallest counted FS of that mode is below 1)</caption>
        <thead><tr><th>Mode</th><th>P_f</th><th>95 % interval</th></tr></thead>
        <tbody>${modes.map((m) => html`<tr><td>${MODE_NAME[m]}</td><td>${prob(u.byMode[m] as number)}</td>
          <td>${u.byModeInterval[m] ? `${prob(u.byModeInterval[m]![0])} – ${prob(u.byModeInterval[m]![1])}` : '—'}</td></tr>`)}</tbody>
      </table>
      <div class="charts">
        ${charts
          ? html`<div data-role="fs-histogram">${unsafeSVG(charts.histogram)}</div>
              <div data-role="sensitivity">${unsafeSVG(charts.sensitivity)}</div>
              ${charts.pfSpan ? html`<div data-role="pf-span">${unsafeSVG(charts.pfSpan)}</div>` : nothing}`
          : html`<p class="muted" data-role="charts-pending" aria-busy="true">Drawing the charts…</p>`}
      </div>
      <details><summary>What P_f means</summary><p>${PF_MEANING}</p></details>
    </div>`;
  }

  override render() {
    const project = this.project;
    if (!project) return nothing;
    return html`
      <p class="hint">Sample chosen inputs from distributions around the project’s values and count how often some counted check falls below FS 1.
        The deterministic checks above are unchanged by this study.</p>
      ${this.renderErrors()}
      ${this.renderVariables(project)}
      ${this.renderSettings()}
      ${this.renderRun()}
      ${this.renderResult(project)}
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'uncertainty-section': UncertaintySection;
  }
}
