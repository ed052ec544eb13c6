/**
 * `<trace-dialog>`: a modal dialog showing how one reported number was calculated — label,
 * formula (rendered by the report's formula renderer from the same mathjs expression the
 * analysis evaluated), the substituted values with units (and their US equivalents when US
 * units are chosen), the result, the source and any note — plus the related entries of the
 * same layer to step through. Esc or "Close" closes it and focus returns to where it was.
 *
 * @fires trace-close - when the dialog closes
 */
import { LitElement, css, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, query, state } from 'lit/decorators.js';
import type { Report, TraceEntry } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { symbolText } from '../../report/symbol-text';
import { relatedEntries, safeText, valueText } from './trace-entries';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import type { TraceSteps } from '../../model/types';
import { stepsChart, stepsTable } from '../../report/trace-steps';
import { resultsStyles } from './results-styles';

function deepActiveElement(): HTMLElement | null {
  let el: Element | null = document.activeElement;
  while (el && el.shadowRoot && el.shadowRoot.activeElement) el = el.shadowRoot.activeElement;
  return el instanceof HTMLElement ? el : null;
}

type FormulaModule = typeof import('../../report/formula-text');
let formulaModule: Promise<FormulaModule> | null = null;
const loadFormulas = (): Promise<FormulaModule> => (formulaModule ??= import('../../report/formula-text'));

@customElement('trace-dialog')
export class TraceDialog extends LitElement {
  static override styles = [
    resultsStyles,
    css`
      dialog {
        max-width: min(46rem, 94vw);
        width: 100%;
        border: 1px solid #000;
        padding: 1em 1.2em;
        color: #000;
        background: #fff;
      }
      dialog::backdrop {
        background: rgba(0, 0, 0, 0.35);
      }
      .head {
        display: flex;
        justify-content: space-between;
        align-items: baseline;
        gap: 1em;
      }
      h2 {
        font-size: 1.15em;
        margin: 0 0 0.3em;
      }
      .formula {
        font-size: 1.1em;
        font-variant-numeric: tabular-nums;
        font-family: 'Cambria Math', 'STIX Two Math', 'Times New Roman', serif;
        margin: 0.3em 0;
        overflow-wrap: anywhere;
      }
      .result {
        font-weight: 600;
      }
      dl {
        display: grid;
        grid-template-columns: max-content 1fr;
        gap: 0.25em 1em;
        margin: 0.6em 0;
      }
      dt {
        font-weight: 600;
      }
      dl.steps dt {
        align-self: baseline;
      }
      tbody th {
        border-bottom-color: var(--rule);
      }
      dd {
        margin: 0;
      }
      ol.related {
        max-height: 14em;
        overflow: auto;
        padding-left: 2.6em;
        margin: 0.3em 0;
      }
      ol.related button {
        font: inherit;
        background: none;
        border: none;
        padding: 0.1em 0;
        text-align: left;
        cursor: pointer;
        color: inherit;
        text-decoration: underline dotted;
      }
      ol.related li[aria-current='true'] button {
        font-weight: 700;
        text-decoration: none;
      }
      .steps-box {
        max-height: 18em;
        overflow: auto;
        border: 1px solid var(--rule, #ccc);
        margin: 0.4em 0;
      }
      figure[data-role='steps-chart'] {
        margin: 0.4em 0;
      }
      .steps-box td,
      .steps-box th {
        padding: 0.1em 0.5em;
        white-space: nowrap;
      }
      .steps-box tr[aria-current='true'] td {
        font-weight: 700;
      }
      .nav {
        display: flex;
        gap: 0.6em;
        margin-top: 0.8em;
      }
    `,
  ];

  @property({ attribute: false }) report: Report | null = null;
  @property() path = '';
  @property() units: UnitSystem = 'SI';
  @property({ type: Boolean, reflect: true }) open = false;

  /** The entry being shown (starts at `path`, changes when stepping through related entries). */
  @state() private current = '';

  @query('dialog') private dialog!: HTMLDialogElement;

  private returnFocus: HTMLElement | null = null;

  /** The formula renderer (it brings mathjs), loaded when the dialog first opens. */
  @state() private formulas: FormulaModule | null = null;

  protected override willUpdate(changed: PropertyValues): void {
    if (changed.has('path') || (changed.has('open') && this.open)) this.current = this.path;
    if (this.open && !this.formulas) void loadFormulas().then((m) => (this.formulas = m));
  }

  protected override updated(changed: PropertyValues): void {
    const d = this.dialog;
    if (!d) return;
    if (this.open && !d.open) {
      this.returnFocus = deepActiveElement();
      d.showModal();
      (this.renderRoot.querySelector('[data-role="close"]') as HTMLElement | null)?.focus();
    } else if (!this.open && d.open) {
      d.close();
    }
    if (changed.has('current') && this.open) {
      const li = this.renderRoot.querySelector('ol.related li[aria-current="true"]');
      li?.scrollIntoView?.({ block: 'nearest' });
    }
  }

  /** Close the dialog (as Esc and the Close button do). */
  close(): void {
    this.dialog?.close();
  }

  private onClose = (): void => {
    if (!this.open) return; // closed by the owner (open set to false): nothing to report
    this.open = false;
    this.dispatchEvent(new CustomEvent('trace-close', { bubbles: true, composed: true }));
    const target = this.returnFocus;
    this.returnFocus = null;
    if (target && target.isConnected) target.focus();
  };

  private step(delta: number, related: TraceEntry[]): void {
    const k = related.findIndex((t) => t.path === this.current);
    const next = related[Math.min(related.length - 1, Math.max(0, (k < 0 ? 0 : k) + delta))];
    if (next) this.current = next.path;
  }

  private entryView(entry: TraceEntry) {
    const u = this.units;
    const f = this.formulas;
    const symbols = Object.entries(entry.values);
    return html`
      <h2 id="trace-title">${entry.label}</h2>
      <p class="note"><code data-role="trace-path">${entry.path}</code></p>
      <dl class="steps">
        <dt>Formula</dt>
        <dd class="formula" data-role="formula">${f ? safeText(() => f.formulaText(entry.formula), entry.formula) : entry.formula}</dd>
        <dt>With values</dt>
        <dd class="formula" data-role="substituted" aria-busy=${f ? 'false' : 'true'}>${f ? safeText(() => f.substitutedText(entry.formula, entry.values), entry.formula) : '…'}</dd>
        <dt>Result</dt>
        <dd class="formula result" data-role="result">${valueText(entry.result, entry.unit, u, entry.path)}</dd>
      </dl>
      ${symbols.length
        ? html`<table data-role="values">
            <caption>Values used</caption>
            <thead><tr><th scope="col">Symbol</th><th scope="col" class="num">Value</th></tr></thead>
            <tbody>
              ${symbols.map(
                ([name, v]) => html`<tr>
                  <th scope="row">${safeText(() => symbolText(name), name)} <span class="note">(${name})</span></th>
                  <td class="num">${valueText(v.value, v.unit, u, entry.path)}</td>
                </tr>`,
              )}
            </tbody>
          </table>`
        : nothing}
      <dl>
        <dt>Source</dt>
        <dd class="source" data-role="source">${entry.source}</dd>
        ${entry.note ? html`<dt>Note</dt><dd data-role="note">${entry.note}</dd>` : nothing}
      </dl>
      ${entry.steps ? this.stepsView(entry.steps) : nothing}
    `;
  }

  /** The recorded iteration: its chart (the n search) and the table of its steps. */
  private stepsView(steps: TraceSteps) {
    const table = stepsTable(steps);
    const chart = stepsChart(steps);
    return html`<h3>Steps (${steps.rows.length})</h3>
      ${chart ? html`<figure data-role="steps-chart">${unsafeSVG(chart.svg)}<figcaption class="note">${chart.caption}</figcaption></figure>` : nothing}
      <p class="note" data-role="steps-caption">${table.caption}</p>
      <div class="steps-box" tabindex="0" role="region" aria-label="Steps">
        <table data-role="steps">
          <thead><tr>${table.columns.map((c) => html`<th scope="col" class=${c.numeric ? 'num' : ''}>${c.title}</th>`)}</tr></thead>
          <tbody>
            ${table.rows.map(
              (row, r) => html`<tr aria-current=${r === steps.marked ? 'true' : 'false'}>${row.map((c) => html`<td class=${c.numeric ? 'num' : ''}>${c.text}</td>`)}</tr>`,
            )}
          </tbody>
        </table>
      </div>`;
  }

  /** Closed, a new report or units change nothing on screen: the dialog is not re-rendered. */
  protected override shouldUpdate(changed: PropertyValues): boolean {
    if (this.open || changed.has('open')) return true;
    for (const k of changed.keys()) if (k !== 'report' && k !== 'units') return true;
    return false;
  }

  override render() {
    if (!this.open) return html`<dialog aria-labelledby="trace-title" @close=${this.onClose}></dialog>`;
    const trace = this.report?.trace ?? [];
    const entry = trace.find((t) => t.path === this.current);
    // The steps the opened number uses (stays the same list while stepping through it).
    const related = relatedEntries(trace, this.path || this.current);
    const k = related.findIndex((t) => t.path === this.current);
    return html`<dialog aria-labelledby="trace-title" @close=${this.onClose}>
      ${this.open
        ? html`
            <div class="head">
              <span class="note">Calculation trace</span>
              <button type="button" class="action" data-role="close" @click=${() => this.close()}>Close</button>
            </div>
            ${entry
              ? this.entryView(entry)
              : html`<h2 id="trace-title">No calculation recorded</h2>
                  <p data-role="missing">
                    No trace entry exists for <code>${this.current || '(no path)'}</code>: this value is an input or is not
                    traced by the analysis.
                  </p>`}
            ${related.length
              ? html`<h3>Steps this number uses (${related.length})</h3>
                  <ol class="related" data-role="related">
                    ${related.map(
                      (t) => html`<li aria-current=${t.path === this.current ? 'true' : 'false'}>
                        <button type="button" data-path=${t.path} @click=${() => (this.current = t.path)}>${t.label}</button>
                      </li>`,
                    )}
                  </ol>
                  <div class="nav">
                    <button type="button" class="action" data-role="prev" ?disabled=${k <= 0} @click=${() => this.step(-1, related)}>← Previous</button>
                    <button type="button" class="action" data-role="next" ?disabled=${k < 0 || k >= related.length - 1} @click=${() => this.step(1, related)}>Next →</button>
                  </div>`
              : nothing}
          `
        : nothing}
    </dialog>`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'trace-dialog': TraceDialog;
  }
}
