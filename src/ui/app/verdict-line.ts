/**
 * `<verdict-line>`: the one-line answer at the top of the worksheet — governing layer and
 * mode, its factor of safety against the target, the status (word + symbol, from the report's
 * status module), and the largest span meeting every target.
 *
 * @fires show-trace - the governing factor of safety was clicked
 */
import { LitElement, html, css, nothing } from 'lit';
import type { Mode, Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { formatQuantity } from '../../model/units';
import type { Analysis } from '../../analysis/types';
import { checkStatus } from '../../report/status';
import { checkRows } from '../../report/check-rows';
import { targetFor } from '../../analysis/checks';
import { numberText } from '../../report/number-text';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { tracedValue } from '../inputs/traced-value';

const MODE_TEXT: Record<Mode, string> = {
  tension: 'tension in the intact beam',
  crushing: 'crushing of the voussoir arch',
  sliding: 'sliding at the abutments',
  snapThrough: 'snap-through of the voussoir arch',
  deflection: 'voussoir deflection (limit / (δ/t))',
};

const MODE_PATH: Record<Mode, string> = {
  tension: 'elastic.fsTension',
  crushing: 'voussoir.fsCrushing',
  sliding: 'voussoir.fsSliding',
  snapThrough: 'voussoir.snapThrough',
  deflection: 'voussoir.deflectionRatio',
};

/** Target on the FS scale of each mode (deflection and snap-through: 1; METHODS §10). */
export const modeTarget = (mode: Mode, project: Project): number => targetFor(mode, project.design);

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
    const g = a.report.governing;
    const pending = this.pending ? html` <span class="pending" role="status">(updating…)</span>` : nothing;
    const span = a.report.maxSpan_m?.governing ?? null;
    const spanText = html`Largest span meeting every target:
      <strong>${span === null ? 'none found' : formatQuantity(span, 'length', this.units, 3)}</strong>
      (current ${formatQuantity(this.project.opening.span_m, 'length', this.units, 3)}).`;
    if (!g) return html`<p>No check applies to this project. ${spanText}${pending}</p>`;
    const i = Math.max(0, a.report.layers.findIndex((l) => l.name === g.layer));
    const target = modeTarget(g.mode, this.project);
    const status = checkStatus(g.fs, target);
    let below = 0;
    let counted = 0;
    try {
      for (const row of checkRows(this.project, a.report)) {
        if (row.status.kind === 'meets' || row.status.kind === 'below') counted++;
        if (row.status.kind === 'below') below++;
      }
    } catch {
      counted = 0;
    }
    const tally =
      counted === 0
        ? nothing
        : below === 0
          ? html` All ${counted} counted checks meet their targets.`
          : html` <span class="tally">${below} of ${counted} counted checks below target ✗</span> (see 5 Checks).`;
    const basis = this.project.design.basis === 'jointed' ? 'basis: jointed (taken as cracked)' : 'basis: intact (the beam must not crack)';
    const fsPart =
      g.mode === 'snapThrough'
        ? html`no arch can form (counts as FS 0)`
        : html`FS ${tracedValue(`layers[${i}].${MODE_PATH[g.mode]}`, numberText(g.fs, 3), g.fs)} against a target of ${numberText(target, 3)}`;
    return html`<p data-mode=${g.mode} data-fs=${String(g.fs)} data-layer=${i}>
      <span class="status ${status.kind}" title=${status.description}>${status.text}</span>
      Governing: ${MODE_TEXT[g.mode]} of <strong>${g.layer}</strong>, ${fsPart}; ${basis}.${tally} ${spanText}${pending}
    </p>`;
  }
}

if (!customElements.get('verdict-line')) customElements.define('verdict-line', VerdictLine);

declare global {
  interface HTMLElementTagNameMap {
    'verdict-line': VerdictLine;
  }
}
