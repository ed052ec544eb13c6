/**
 * `<checks-table>`: every check of every layer (tension, crushing, sliding, snap-through,
 * deflection, the support rows) and, with a current uncertainty run and an acceptable P_f, the
 * whole roof's P_f row, with demand, capacity, FS, target and status (word + symbol), the governing check
 * in one sentence, and all warnings with their paths. Renders the report; computes nothing.
 *
 * @fires show-trace - detail `{ path }` when a traced number is clicked
 */
import { LitElement, html, nothing, type PropertyValues, type TemplateResult } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import type { Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import type { Analysis } from '../../analysis/types';
import { numberText } from '../../report/number-text';
import { modeLabel, STATUS_TEXT, statusDescription } from '../../analysis/check-labels';
import { buildVerdict } from '../../analysis/verdict';
import { checkRowViews, type CheckRowView, type CheckValue } from './check-rows';
import { displayValue } from './display-value';
import { tracedNumber } from './traced-number';
import { resultsStyles } from './results-styles';
import { DeferOffscreen } from '../app/defer-offscreen';

@customElement('checks-table')
export class ChecksTable extends DeferOffscreen(LitElement) {
  static override styles = [resultsStyles];

  @property({ attribute: false }) project: Project | null = null;
  @property({ attribute: false }) analysis: Analysis | null = null;
  @property() units: UnitSystem = 'SI';

  private rows: CheckRowView[] = [];
  private verdict: string[] = [];

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('project') || changed.has('analysis') || changed.has('units')) {
      if (this.project && this.analysis) {
        this.rows = checkRowViews(this.analysis.report);
        // The analysis' verdict: the governing check, the intact beam and the cracked voussoir.
        this.verdict = buildVerdict(this.project, this.analysis.report, this.units).sentences
          .filter((s) => s.id === 'governing' || s.id === 'intact' || s.id === 'cracked')
          .map((s) => s.text);
      } else {
        this.rows = [];
        this.verdict = [];
      }
    }
  }

  private value(v: CheckValue | null): TemplateResult | string {
    if (!v) return '—';
    const d = displayValue(v.value, v.quantity, this.units);
    const number = v.path ? tracedNumber(v.path, d.text, d.unit, v.value) : html`${d.text}${d.unit ? html`<span class="unit">&nbsp;${d.unit}</span>` : nothing}`;
    return v.qualifier ? html`${number} <span class="note">${v.qualifier}</span>` : number;
  }

  private fs(view: CheckRowView): TemplateResult | string {
    const fs = view.row.fs;
    if (fs === null) return '—';
    if (view.mode === 'snapThrough') return fs === 0 ? 'snaps' : 'stands';
    const text = numberText(fs, 3);
    return view.fsPath ? tracedNumber(view.fsPath, text, '', fs) : text;
  }

  private row(view: CheckRowView, first: boolean, span: number): TemplateResult {
    const r = view.row;
    return html`<tr
      data-layer=${view.layer === null ? 'roof' : view.layer}
      data-mode=${view.mode}
      data-status=${r.status}
      data-counts=${String(r.counts)}
      class=${view.governing ? 'governing' : ''}
    >
      ${first ? html`<th scope="rowgroup" rowspan=${span}>${r.layer}</th>` : nothing}
      <td>${modeLabel(view.mode, this.project?.opening.type ?? '')}${view.governing ? html` <strong>(governing)</strong>` : nothing}</td>
      <td class="num">${this.value(view.demand)}</td>
      <td class="num">${this.value(view.capacity)}</td>
      <td class="num">${this.fs(view)}</td>
      <td class="num">${view.mode === 'snapThrough' ? (r.status === 'na' ? '—' : 'stands') : numberText(r.target, 3)}</td>
      <td><span class="status ${r.status}" title=${statusDescription(r)}>${STATUS_TEXT[r.status]}</span></td>
      <td class="note">${view.note}</td>
    </tr>`;
  }

  override render() {
    const a = this.analysis;
    const p = this.project;
    if (!a || !p) return html`<p class="empty">No results yet: the analysis has not run.</p>`;
    const report = a.report;
    const byLayer = report.layers.map((_, i) => this.rows.filter((r) => r.layer === i));
    // The whole roof's row (the P_f of an uncertainty run against the acceptable P_f) comes last.
    const roof = this.rows.filter((r) => r.layer === null);
    if (roof.length) byLayer.push(roof);
    return html`
      <p class="verdict" data-role="verdict">
        ${this.verdict.join(' ')}
        ${report.governing ? html`<span class="note">(governing FS ${tracedNumber('governing.fs', numberText(report.governing.fs, 3), '', report.governing.fs)})</span>` : nothing}
      </p>
      <p class="note">
        Design basis: <strong>${p.design.basis}</strong>; tensile basis <strong>${p.design.tensileBasis}</strong>; crushing strength
        <strong>${p.design.crushingStrength}</strong>. Rows marked “${STATUS_TEXT.info}” are shown but do not count; the note says why.
        Click any dotted number to see its calculation.
      </p>
      <table>
        <caption>Checks per layer and mode (${this.units === 'SI' ? 'SI units' : 'US customary units'})</caption>
        <thead>
          <tr>
            <th scope="col">Layer</th>
            <th scope="col">Mode</th>
            <th scope="col" class="num">Demand</th>
            <th scope="col" class="num">Capacity</th>
            <th scope="col" class="num">FS</th>
            <th scope="col" class="num">Target</th>
            <th scope="col">Status</th>
            <th scope="col">Note</th>
          </tr>
        </thead>
        ${byLayer.map(
          (rows) => html`<tbody>
            ${rows.map((r, k) => this.row(r, k === 0, rows.length))}
          </tbody>`,
        )}
      </table>
      <h3>Warnings (${report.warnings.length})</h3>
      ${report.warnings.length === 0
        ? html`<p class="empty">No warnings.</p>`
        : html`<ul class="warnings">
            ${report.warnings.map(
              (w) => html`<li data-code=${w.code} data-level=${w.level ?? 'warning'}>
                <strong>${w.level === 'error' ? 'Error ✗' : 'Warning !'}</strong>
                <code>${w.path || '(whole project)'}</code>: ${w.message}
                <span class="note">[${w.code}]</span>
              </li>`,
            )}
          </ul>`}
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'checks-table': ChecksTable;
  }
}
