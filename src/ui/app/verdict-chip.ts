/**
 * `<verdict-chip>`: the verdict in one short line for the pinned bar of narrow screens — the
 * status of all counted checks (word and symbol, from the check table's vocabulary in
 * `analysis/check-labels.ts`; with an uncertainty run's P_f row below, "below" though the
 * governing FS meets, and it says so), the governing factor of safety
 * against the target, and the governing mode and layer. While a field holds a refused value it
 * says "stale" in words. The full sentence stays in `<verdict-line>`.
 */
import { LitElement, html, css, nothing } from 'lit';
import type { Project } from '../../model/types';
import type { Analysis } from '../../analysis/types';
import { MODE_NAME, STATUS_TEXT } from '../../analysis/check-labels';
import { buildVerdict } from '../../analysis/verdict';
import { numberText } from '../../model/number-format';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';

export class VerdictChip extends LitElement {
  static override properties = {
    project: { attribute: false },
    analysis: { attribute: false },
    stale: { type: Boolean, reflect: true },
    pending: { type: Boolean },
  };

  project!: Project;
  analysis: Analysis | null = null;
  stale = false;
  pending = false;

  static override styles = [
    tokens,
    sheet,
    css`
      :host {
        display: block;
        font-size: 0.92em;
        line-height: 1.3;
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
      .stale {
        font-weight: 700;
        border: 1px dashed var(--lam-ink);
        padding: 0 0.3em;
        margin-right: 0.3em;
        white-space: nowrap;
      }
      :host([stale]) .verdict {
        color: var(--lam-muted);
      }
    `,
  ];

  override render() {
    const a = this.analysis;
    const staleMark = this.stale ? html`<span class="stale">Stale</span>` : nothing;
    if (!a || !this.project) return html`<p>${staleMark}<span class="verdict">Analysing…</span></p>`;
    const g = a.report.governing;
    if (!g) return html`<p>${staleMark}<span class="verdict">No check applies.</span></p>`;
    const target = g.target;
    // The status of every counted row together (the P_f row counts without governing).
    const v = buildVerdict(this.project, a.report);
    const kind = v.overall ?? v.status ?? 'na';
    const status = { kind, text: STATUS_TEXT[kind] };
    const also = v.status === 'meets' && v.overall === 'below' ? ` · ${v.below} other counted check${v.below === 1 ? '' : 's'} below` : '';
    const fs = g.mode === 'snapThrough' ? 'snaps through' : `FS ${numberText(g.fs)} / target ${numberText(target)}`;
    return html`<p>
      ${staleMark}<span class="verdict"
        ><span class="status ${status.kind}">${status.text}</span> ${fs} · ${MODE_NAME[g.mode]}, layer ${g.layerIndex + 1} ${g.layer}${also}${this.pending ? ' (updating…)' : ''}</span
      >
    </p>`;
  }
}

if (!customElements.get('verdict-chip')) customElements.define('verdict-chip', VerdictChip);

declare global {
  interface HTMLElementTagNameMap {
    'verdict-chip': VerdictChip;
  }
}
