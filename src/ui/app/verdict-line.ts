/**
 * `<verdict-line>`: the answer at the top of the worksheet — governing layer and mode, its
 * factor of safety against the target, the status (word + symbol), the intact-beam and
 * cracked-voussoir sentences and the largest span (overhang, entry width) meeting every
 * counted target: all from the analysis' verdict (`analysis/verdict.ts`).
 *
 * @fires show-trace - the governing factor of safety was clicked
 */
import { LitElement, html, css, nothing } from 'lit';
import type { CheckMode, Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { formatQuantity } from '../../model/units';
import type { Analysis } from '../../analysis/types';
import { MODE_NAME, STATUS_TEXT } from '../../analysis/check-labels';
import { buildVerdict } from '../../analysis/verdict';
import { numberText } from '../../report/number-text';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { tracedValue } from '../inputs/traced-value';

const MODE_PATH: Partial<Record<CheckMode, string>> = {
  tension: 'elastic.fsTension',
  crushing: 'voussoir.fsCrushing',
  sliding: 'voussoir.fsSliding',
  snapThrough: 'voussoir.snapThrough',
  deflection: 'voussoir.deflectionRatio',
};

export class VerdictLine extends LitElement {
  static override properties = {
    project: { attribute: false },
    analysis: { attribute: false },
    units: { type: String },
    pending: { type: Boolean },
    error: { type: String },
  };

  project!: Project;
  analysis: Analysis | null = null;
  units: UnitSystem = 'SI';
  pending = false;
  error: string | null = null;

  static override styles = [
    tokens,
    sheet,
    css`
      :host {
        display: block;
      }
      p {
        margin: 0.4rem 0;
        font-size: 1.05em;
      }
      .status {
        font-weight: 700;
        padding: 0 0.3em;
        border: 1px solid currentColor;
        border-radius: 2px;
        white-space: nowrap;
      }
      .status.below {
        color: #a33a00;
      }
      .status.meets {
        color: #00664a;
      }
      .pending {
        color: var(--lam-muted);
        font-size: 0.9em;
      }
      button.traced {
        border: none;
        border-bottom: 1px dotted var(--lam-ink);
        padding: 0;
        min-height: 0;
        background: none;
        font-weight: 700;
      }
    `,
  ];

  override render() {
    if (this.error) return html`<p class="error" role="alert">${this.error}</p>`;
    const a = this.analysis;
    if (!a || !this.project) return html`<p class="pending">Analysing…</p>`;
    const pending = this.pending ? html` <span class="pending" role="status">(updating…)</span>` : nothing;
    // Everything said here comes from the analysis' verdict and check table.
    const v = buildVerdict(this.project, a.report, this.units);
    const text = (id: string) => v.sentences.find((s) => s.id === id)?.text ?? '';
    const span = v.largestSpan_m;
    const spanText = html`Largest ${v.spanWord} meeting every counted target:
      <strong>${span === null ? 'none found' : formatQuantity(span, 'length', this.units, 3)}</strong>
      (current ${formatQuantity(this.project.opening.span_m, 'length', this.units, 3)}).`;
    const g = v.governing;
    if (!g || !v.status) return html`<p>${text('governing')} ${spanText}${pending}</p>`;
    const tally =
      v.counted === 0
        ? nothing
        : v.below === 0
          ? html` All ${v.counted} counted checks meet their targets.`
          : html` <span class="tally">${v.below} of ${v.counted} counted checks below target ✗</span> (see 5 Checks).`;
    const fsPart =
      g.mode === 'snapThrough'
        ? html`no arch can form (counts as FS 0)`
        : MODE_PATH[g.mode] === undefined
          ? html`FS ${numberText(g.fs, 3)} against a target of ${numberText(g.target, 3)}`
          : html`FS ${tracedValue(`layers[${g.layerIndex}].${MODE_PATH[g.mode]}`, numberText(g.fs, 3), g.fs)} against a target of ${numberText(g.target, 3)}`;
    // The badge is the result of every counted check, as the chip's: a governing FS that meets
    // with an acceptable P_f that is not shown to be met reads "below".
    const badge = v.overall ?? v.status;
    return html`<p data-mode=${g.mode} data-fs=${String(g.fs)} data-layer=${g.layerIndex}>
      <span class="status ${badge}" title=${badge === v.status ? text('governing') : 'Every counted check together: one that never governs (the acceptable P_f) is below'}>${STATUS_TEXT[badge]}</span>
      Governing: ${MODE_NAME[g.mode]} of <strong>${g.layer}</strong> (layer ${g.layerIndex + 1}), ${fsPart}.${tally} ${spanText}${pending}
    </p>
    <div class="basis">${text('intact')} ${text('cracked')}</div>`;
  }
}

if (!customElements.get('verdict-line')) customElements.define('verdict-line', VerdictLine);

declare global {
  interface HTMLElementTagNameMap {
    'verdict-line': VerdictLine;
  }
}
