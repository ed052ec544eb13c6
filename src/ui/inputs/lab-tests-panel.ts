/**
 * `<lab-tests-panel>` — worksheet section 3: for the chosen layer, the Brazilian specimens
 * (id, diameter, thickness, peak load, valid) with each row's computed strength, L/D, status and
 * warnings; add and remove rows; paste rows from a spreadsheet (CSV or tab-separated); the test
 * statistics and the strip plot.
 *
 * Paste rule: if ANY pasted row has an error, nothing is applied and every bad row is listed
 * with its row and column (a half-applied paste is easy to miss and hard to undo by eye).
 * Headings are recognised by meaning with their units, and a table without a header is read
 * by column order (`model/specimens-csv.ts`); unless the text used the file's own column names
 * unchanged, a preview shows how each column was read and the first rows, and nothing is
 * applied until Apply (Cancel keeps the text to correct).
 *
 * @fires project-edit - a specimen field changed
 * @fires project-replace - rows added, removed or pasted
 * @fires show-trace - a traced strength was clicked
 */
import { LitElement, html, css, nothing, type PropertyValues } from 'lit';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import type { Project, Specimen } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import type { Analysis, LabDetail } from '../../analysis/types';
import { formatQuantity } from '../../model/units';
import { defaultSpecimenId } from '../../model/defaults';
import { parseSpecimensCsv, type SpecimensCsv } from '../../model/specimens-csv';
import { FIELD_WORDS } from '../../model/specimen-headings';
import { numberText } from '../../report/number-text';
import { strengthStripSvg } from '../../report/charts/strength-strip';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { checkboxField, textField } from './field-templates';
import { fireReplace } from './events';
import { tracedValue } from './traced-value';
import './quantity-input';
import { NearViewport, chartSlot } from '../results/near-viewport';
import { DeferOffscreen } from '../app/defer-offscreen';

export interface PasteProblem {
  row: number;
  column: string | number;
  message: string;
}

export class LabTestsPanel extends DeferOffscreen(LitElement) {
  static override properties = {
    project: { attribute: false },
    analysis: { attribute: false },
    units: { type: String },
    fieldErrors: { attribute: false },
    layer: { type: Number },
    pasteText: { state: true },
    pasteProblems: { state: true },
    pasteNote: { state: true },
    preview: { state: true },
  };

  project!: Project;
  analysis: Analysis | null = null;
  units: UnitSystem = 'SI';
  fieldErrors: ReadonlyArray<{ path: string; message: string }> = [];
  /** Index of the layer shown. */
  layer = 0;
  pasteText = '';
  pasteProblems: PasteProblem[] = [];
  pasteNote = '';
  /** A parsed paste waiting for Apply or Cancel. */
  preview: { mode: 'append' | 'replace'; result: SpecimensCsv } | null = null;
  private strip = '';

  static override styles = [
    tokens,
    sheet,
    css`
      :host {
        display: block;
      }
      .top {
        display: flex;
        gap: 1rem;
        align-items: baseline;
        flex-wrap: wrap;
      }
      .table-wrap {
        overflow-x: auto;
      }
      td quantity-input {
        display: block;
      }
      .status-used {
        white-space: nowrap;
      }
      .status-unused {
        color: #8a2a00;
      }
      .warns {
        max-width: 18rem;
        font-size: 0.9em;
      }
      .cols {
        display: flex;
        flex-wrap: wrap;
        gap: 1rem 2rem;
        align-items: flex-start;
      }
      .stats {
        flex: 0 1 24rem;
      }
      .stats td {
        min-width: 8rem;
      }
      .plot {
        flex: 1 1 28rem;
        max-width: 44rem;
      }
      textarea {
        width: 100%;
        max-width: 44rem;
        min-height: 6em;
        font-family: var(--lam-mono);
        font-size: 0.9em;
      }
      .paste-actions {
        display: flex;
        gap: 0.5rem;
        margin: 0.3rem 0;
        flex-wrap: wrap;
      }
      button.traced {
        border: none;
        border-bottom: 1px dotted var(--lam-ink);
        padding: 0;
        min-height: 0;
        background: none;
        font-variant-numeric: tabular-nums;
      }
      .problems li {
        color: #8a2a00;
      }
      .preview {
        border: 1px solid var(--lam-ink);
        padding: 0.3rem 0.8rem;
        margin: 0.4rem 0;
        max-width: 44rem;
      }
      .preview table {
        margin: 0.3rem 0;
      }
    `,
  ];

  private get layerIndex(): number {
    const n = this.project?.layers.length ?? 1;
    return Math.min(Math.max(0, this.layer | 0), n - 1);
  }

  private get lab(): LabDetail | null {
    const a = this.analysis;
    const i = this.layerIndex;
    if (!a || a.layers.length !== this.project.layers.length) return null;
    return a.layers[i]?.lab ?? null;
  }

  /** The strip plot is drawn when the panel is near the screen (`stripDirty` until then). */
  private readonly view = new NearViewport(this);
  private stripDirty = true;

  /** The lab statistics and strength of layer `i` in `a` (all this panel reads of an analysis). */
  private analysisKey(a: Analysis | null, i: number): string {
    if (!a) return '';
    return JSON.stringify([a.layers.length, a.layers[i]?.lab ?? null, a.report.layers[i]?.strength ?? null]);
  }

  /**
   * A new analysis alone (after an edit elsewhere, e.g. a thickness) leaves the panel as it was
   * unless the shown layer's lab statistics or strength changed: it is then not re-rendered.
   */
  protected override shouldUpdate(changed: PropertyValues<this>): boolean {
    if (changed.size === 1 && changed.has('analysis') && this.project) {
      const before = changed.get('analysis') as Analysis | null | undefined;
      const i = this.layerIndex;
      if (before && this.analysis && this.analysisKey(before, i) === this.analysisKey(this.analysis, i)) return false;
    }
    return true;
  }

  /** Units and the shown layer's lab statistics the strip plot was drawn for (redrawn only when they change). */
  private stripKey: string | null = null;

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('analysis') || changed.has('units') || changed.has('layer') || changed.has('project')) {
      const key = `${this.units} ${JSON.stringify(this.lab)}`;
      if (key !== this.stripKey) {
        this.stripDirty = true;
        this.stripKey = key;
      }
    }
    if (this.stripDirty && this.view.near) {
      this.stripDirty = false;
      const lab = this.lab;
      try {
        this.strip = lab && lab.specimens.length > 0 ? strengthStripSvg(lab, { units: this.units }) : '';
      } catch {
        this.strip = '';
      }
    }
  }

  private setSpecimens(specimens: Specimen[], source: string): void {
    const p = structuredClone(this.project);
    p.layers[this.layerIndex].tensile.specimens = specimens;
    fireReplace(this, p, source);
  }

  private addRow(): void {
    const list = this.project.layers[this.layerIndex].tensile.specimens;
    const last = list[list.length - 1];
    const ids = new Set(list.map((s) => s.id));
    let k = list.length;
    while (ids.has(defaultSpecimenId(k))) k++;
    // Starts NOT valid so it counts only once the user has entered the test and ticked it.
    const row: Specimen = {
      id: defaultSpecimenId(k),
      diameter_mm: last?.diameter_mm ?? 54,
      thickness_mm: last?.thickness_mm ?? 27,
      peakLoad_kN: last?.peakLoad_kN ?? 10,
      valid: false,
    };
    this.setSpecimens([...structuredClone(list), row], `specimen ${row.id} added`);
  }

  private removeRow(k: number): void {
    const list = structuredClone(this.project.layers[this.layerIndex].tensile.specimens);
    const [gone] = list.splice(k, 1);
    this.setSpecimens(list, `specimen ${gone.id} removed`);
  }

  private applyPaste(mode: 'append' | 'replace'): void {
    const text = this.pasteText;
    this.pasteNote = '';
    this.preview = null;
    if (text.trim() === '') {
      this.pasteProblems = [{ row: 0, column: '', message: 'nothing to paste: the box is empty' }];
      return;
    }
    let result: ReturnType<typeof parseSpecimensCsv>;
    try {
      result = parseSpecimensCsv(text);
    } catch (err) {
      this.pasteProblems = [{ row: 0, column: '', message: err instanceof Error ? err.message : String(err) }];
      return;
    }
    const problems = result.errors.map((e) => ({ row: e.row, column: e.column, message: e.message }));
    if (problems.length > 0) {
      this.pasteProblems = problems;
      this.pasteNote = 'Nothing was applied: correct the rows listed and paste again.';
      return;
    }
    if (result.specimens.length === 0) {
      this.pasteProblems = [{ row: 0, column: '', message: 'no specimen rows found' }];
      return;
    }
    if (!result.reading.exact) {
      this.pasteProblems = [];
      this.preview = { mode, result };
      return;
    }
    this.apply(mode, result);
  }

  private apply(mode: 'append' | 'replace', result: SpecimensCsv): void {
    const existing = mode === 'append' ? structuredClone(this.project.layers[this.layerIndex].tensile.specimens) : [];
    this.preview = null;
    this.pasteProblems = [];
    this.pasteNote = `${result.specimens.length} specimen${result.specimens.length === 1 ? '' : 's'} ${mode === 'append' ? 'added' : 'put in place of the previous rows'}.`;
    this.pasteText = '';
    this.setSpecimens([...existing, ...result.specimens], `pasted specimens (${result.specimens.length})`);
  }

  private cancelPreview(): void {
    this.preview = null;
    this.pasteNote = 'Nothing was applied; the pasted text is kept so you can correct it.';
  }

  /** How the pasted columns were read, and the first rows in file units, before anything is applied. */
  private renderPreview() {
    const p = this.preview;
    if (!p) return nothing;
    const { reading, specimens } = p.result;
    const sep = reading.separator === '\t' ? 'tabs' : reading.separator === ';' ? 'semicolons' : 'commas';
    const shown = specimens.slice(0, 5);
    const num = (v: number) => numberText(v, 4);
    return html`<div class="preview" role="region" aria-label="How the pasted columns were read">
      <p>
        <strong>Check how the paste was read</strong> — ${specimens.length} row${specimens.length === 1 ? '' : 's'}, columns separated by ${sep}${reading.decimalComma ? ', decimal commas read as decimal points' : ''}.
        ${reading.header ? 'Columns recognised from the header:' : 'No header: the columns were taken in order.'}
      </p>
      <ul class="columns-read">
        ${reading.columns.map(
          (c) => html`<li data-field=${c.field}>${c.heading} → ${FIELD_WORDS[c.field]}${c.unit ? html`, in ${c.unit}${c.factor !== 1 ? ` (converted to ${c.field === 'peakLoad_kN' ? 'kN' : 'mm'})` : c.assumed ? ' (assumed: no unit given)' : ''}` : nothing}</li>`,
        )}
        ${reading.ignored.length ? html`<li>Not used: ${reading.ignored.join(', ')}</li>` : nothing}
      </ul>
      <table aria-label="First pasted rows as read">
        <thead><tr><th scope="col">Id</th><th scope="col" class="num">D (mm)</th><th scope="col" class="num">L (mm)</th><th scope="col" class="num">P (kN)</th><th scope="col">Valid</th></tr></thead>
        <tbody>
          ${shown.map((s) => html`<tr><td>${s.id}</td><td class="num">${num(s.diameter_mm)}</td><td class="num">${num(s.thickness_mm)}</td><td class="num">${num(s.peakLoad_kN)}</td><td>${s.valid ? 'yes' : 'no'}</td></tr>`)}
        </tbody>
      </table>
      ${specimens.length > shown.length ? html`<p class="hint">… and ${specimens.length - shown.length} more.</p>` : nothing}
      <div class="paste-actions">
        <button type="button" id="paste-apply" @click=${() => this.apply(p.mode, p.result)}>Apply (${p.mode === 'append' ? 'add' : 'replace'} ${specimens.length} row${specimens.length === 1 ? '' : 's'})</button>
        <button type="button" id="paste-cancel" @click=${this.cancelPreview}>Cancel</button>
      </div>
    </div>`;
  }

  private stress(v: number | null | undefined): string {
    return v === null || v === undefined || !Number.isFinite(v) ? '—' : formatQuantity(v, 'stress', this.units);
  }

  private renderTable(i: number) {
    const layer = this.project.layers[i];
    const lab = this.lab;
    const specs = layer.tensile.specimens;
    const byIndex = new Map((lab?.specimens ?? []).map((s) => [s.index, s]));
    const detail = (k: number) => byIndex.get(k) ?? null;
    const base = `layers[${i}].tensile.specimens`;
    const errs = this.fieldErrors.filter((e) => e.path.startsWith(`layers[${i}].tensile`));
    return html`<div class="table-wrap">
        <table aria-label="Tensile test specimens of ${layer.name}">
          <thead>
            <tr>
              <th scope="col">#</th>
              <th scope="col">Id</th>
              <th scope="col">Diameter D</th>
              <th scope="col">Thickness L</th>
              <th scope="col">Peak load P</th>
              <th scope="col">Valid break</th>
              <th scope="col" class="num">${layer.tensile.method === 'direct' ? 'Strength' : 'Brazilian σt = 2P/(πDL)'}</th>
              <th scope="col" class="num">L/D</th>
              <th scope="col">Used?</th>
              <th scope="col">Warnings</th>
              <th scope="col"><span class="sr-only">Remove</span></th>
            </tr>
          </thead>
          <tbody>
            ${specs.length === 0
              ? html`<tr>
                  <td colspan="11" class="hint">No specimens: the given tensile strength is used. Add rows or paste them below.</td>
                </tr>`
              : specs.map((s, k) => {
                  const d = detail(k);
                  const path = `${base}[${k}]`;
                  const ld = s.diameter_mm > 0 ? s.thickness_mm / s.diameter_mm : null;
                  return html`<tr data-specimen=${k}>
                    <td>${k + 1}</td>
                    <td>${textField(this, { label: `Id of specimen ${k + 1}`, path: `${path}.id`, value: s.id, compact: true, size: 7 })}</td>
                    <td><quantity-input compact label="Diameter of ${s.id}" path="${path}.diameter_mm" .value=${s.diameter_mm} quantity="smallLength" units=${this.units} .error=${errFor(errs, `${path}.diameter_mm`)}></quantity-input></td>
                    <td><quantity-input compact label="Thickness of ${s.id}" path="${path}.thickness_mm" .value=${s.thickness_mm} quantity="smallLength" units=${this.units} .error=${errFor(errs, `${path}.thickness_mm`)}></quantity-input></td>
                    <td><quantity-input compact label="Peak load of ${s.id}" path="${path}.peakLoad_kN" .value=${s.peakLoad_kN} quantity="force" units=${this.units} .error=${errFor(errs, `${path}.peakLoad_kN`)}></quantity-input></td>
                    <td>${checkboxField(this, { label: `Specimen ${s.id} broke along a central diametral fracture`, path: `${path}.valid`, value: s.valid, compact: true })}</td>
                    <td class="num">${d ? tracedValue(`detail.layers[${i}].lab.specimens[${k}].brazilian_MPa`, this.stress(d.brazilian_MPa), d.brazilian_MPa) : '—'}</td>
                    <td class="num">${ld === null ? '—' : numberText(ld)}</td>
                    <td>${d
                      ? d.accepted
                        ? html`<span class="status-used">used ✓</span>`
                        : html`<span class="status-unused">not used ✗${d.reason ? html` — ${d.reason}` : nothing}</span>`
                      : '—'}</td>
                    <td class="warns">${d && d.warnings.length ? d.warnings.map((w) => html`<div class="warning">${w}</div>`) : nothing}</td>
                    <td><button type="button" aria-label="Remove specimen ${s.id}" @click=${() => this.removeRow(k)}>Remove</button></td>
                  </tr>`;
                })}
          </tbody>
        </table>
      </div>
      ${errs.filter((e) => !/\.(diameter_mm|thickness_mm|peakLoad_kN)$/.test(e.path)).map((e) => html`<p class="error" role="alert">${e.message}</p>`)}
      <button type="button" @click=${this.addRow}>+ Add a specimen row</button>
      <span class="hint">A new row copies the previous one and starts unticked (not counted) until you enter its test and tick “Valid break”.</span>`;
  }

  private renderStats(i: number) {
    const lab = this.lab;
    const layer = this.project.layers[i];
    if (!lab) return html`<p class="hint">Statistics appear when the analysis has run.</p>`;
    const rule = lab.rule === 'lower5' ? 'lower 5% fractile m(1 − kn·V), EN 1990 Annex D' : 'mean of the accepted tests';
    const rep = this.analysis?.report.layers[i]?.strength;
    const d = `detail.layers[${i}].lab`;
    const methodText = lab.method === 'brazilian' ? `Brazilian; direct = ${numberText(lab.directFactor)} × Brazilian (${layer.rockClass})` : 'direct pull (no factor)';
    return html`<table class="stats" aria-label="Test statistics of ${layer.name}">
      <tbody>
        <tr><th scope="row">Source</th><td>${lab.source === 'specimens' ? `${lab.n} accepted specimen${lab.n === 1 ? '' : 's'}` : 'value given (no specimens)'}</td></tr>
        <tr><th scope="row">Method</th><td>${methodText}</td></tr>
        <tr><th scope="row">n</th><td class="num">${lab.n}</td></tr>
        <tr>
          <th scope="row">Lab strength (${lab.method === 'brazilian' ? 'Brazilian mean' : 'direct mean'})</th>
          <td class="num">${tracedValue(`layers[${i}].strength.lab_MPa`, this.stress(rep?.lab_MPa), rep?.lab_MPa)}</td>
        </tr>
        <tr><th scope="row">Mean, direct</th><td class="num">${lab.mean_MPa === null ? '—' : tracedValue(`${d}.mean_MPa`, this.stress(lab.mean_MPa), lab.mean_MPa)}</td></tr>
        <tr><th scope="row">Standard deviation</th><td class="num">${lab.sd_MPa === null ? '—' : tracedValue(`${d}.sd_MPa`, this.stress(lab.sd_MPa), lab.sd_MPa)}</td></tr>
        <tr><th scope="row">CoV V</th><td class="num">${lab.cov === null ? '—' : tracedValue(`${d}.cov`, numberText(lab.cov), lab.cov)}</td></tr>
        <tr><th scope="row">kn</th><td class="num">${lab.kn === null ? html`— <span class="hint">(mean rule)</span>` : numberText(lab.kn)}</td></tr>
        <tr>
          <th scope="row">Characteristic, direct</th>
          <td class="num characteristic">${tracedValue(`layers[${i}].strength.characteristic_MPa`, this.stress(lab.characteristic_MPa), lab.characteristic_MPa)}</td>
        </tr>
        <tr><th scope="row">Rule</th><td>${rule}</td></tr>
      </tbody>
    </table>`;
  }

  override render() {
    const p = this.project;
    if (!p) return nothing;
    const i = this.layerIndex;
    return html`<div class="top">
        <label for="lab-layer">Layer</label>
        <select
          id="lab-layer"
          @change=${(e: Event) => {
            this.layer = Number((e.target as HTMLSelectElement).value);
            this.pasteProblems = [];
            this.pasteNote = '';
            this.preview = null;
          }}
        >
          ${p.layers.map((l, k) => html`<option value=${k} ?selected=${k === i}>${k + 1} — ${l.name} (${l.tensile.specimens.length} specimens)</option>`)}
        </select>
      </div>
      <h3>Specimens of ${p.layers[i].name}</h3>
      ${this.renderTable(i)}
      <h3>Paste specimens</h3>
      <label for="paste">Rows copied from a spreadsheet, separated by tabs, commas or semicolons. A header such as “Sample, Dia (mm), Thk (mm), Load (kN), Valid” is recognised, units included (mm, cm, in; kN, N, lbf); without a header the columns are id, diameter (mm), thickness (mm), peak load (kN) and optionally valid. Decimal commas are read with tab or semicolon separators.</label>
      <textarea id="paste" .value=${this.pasteText} @input=${(e: Event) => (this.pasteText = (e.target as HTMLTextAreaElement).value)} spellcheck="false"></textarea>
      <div class="paste-actions">
        <button type="button" id="paste-append" @click=${() => this.applyPaste('append')}>Add pasted rows</button>
        <button type="button" id="paste-replace" @click=${() => this.applyPaste('replace')}>Replace all rows with pasted rows</button>
      </div>
      <p class="hint">If any pasted row has an error, nothing is applied and the bad rows are listed. Unless the header uses the file's own column names, you see how the columns were read before anything is applied.</p>
      ${this.renderPreview()}
      ${this.pasteNote ? html`<p role="status">${this.pasteNote}</p>` : nothing}
      ${this.pasteProblems.length
        ? html`<ul class="problems" role="alert">
            ${this.pasteProblems.map((e) => html`<li>${e.row ? `row ${e.row}` : 'paste'}${e.column !== '' && e.column !== undefined ? `, column ${e.column}` : ''}: ${e.message}</li>`)}
          </ul>`
        : nothing}
      <h3>Statistics and strip plot</h3>
      <div class="cols">
        ${this.renderStats(i)}
        <div class="plot">${this.stripDirty
          ? (chartSlot('', 'strip-plot', 640, 250, (this.lab?.specimens.length ?? 0) > 0) ?? html`<p class="hint">No specimens to plot.</p>`)
          : this.strip
            ? html`<div class="chart">${unsafeSVG(this.strip)}</div>`
            : html`<p class="hint">No specimens to plot.</p>`}</div>
      </div>`;
  }
}

function errFor(errors: ReadonlyArray<{ path: string; message: string }>, path: string): string {
  return errors.find((e) => e.path === path)?.message ?? '';
}

if (!customElements.get('lab-tests-panel')) customElements.define('lab-tests-panel', LabTestsPanel);

declare global {
  interface HTMLElementTagNameMap {
    'lab-tests-panel': LabTestsPanel;
  }
}
