/**
 * `<support-view>` — the results of the worksheet's support section: the bolts drawn in the
 * strata (the report's chart `supportBoltsSvg`), what the bolts do (the report's
 * `support.bolts`), the support rows of the one check table (modes bolt, skin, interlayer
 * shear; nothing re-derived), the support needed (the store runs the searches after the main
 * results; `needed` belongs to the project it was found for), and the empirical Q cross-check,
 * shown beside and marked "not counted".
 *
 * @fires project-replace - "use this pattern": the suggested square spacing, to the centimetre below
 */
import { LitElement, html, css, nothing } from 'lit';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import type { Project, SupportNeededReport } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import type { Analysis } from '../../analysis/types';
import { MODE_LABEL, STATUS_TEXT, SUPPORT_MODES, statusDescription } from '../../analysis/check-labels';
import { numberText } from '../../model/number-format';
import { supportBoltsSvg } from '../../report/charts/support-bolts';
import { fireReplace } from '../inputs/events';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { resultsStyles } from './results-styles';
import { displayText } from './display-value';
import { isOverhang, openingWords } from '../../model/span-wording';
import { DeferOffscreen } from '../app/defer-offscreen';

export interface SupportNeededState {
  needed: SupportNeededReport | null;
  reason: string | null;
  project: Project;
}

/** The suggested spacing set out to the centimetre, rounded down (closer bolts, never sparser). */
export const adoptableSpacing = (s: number): number => Math.floor(s * 100 + 1e-9) / 100;

export class SupportView extends DeferOffscreen(LitElement) {
  static override properties = {
    project: { attribute: false },
    analysis: { attribute: false },
    units: { type: String },
    needed: { attribute: false },
    pending: { type: Boolean },
  };

  project: Project | null = null;
  analysis: Analysis | null = null;
  units: UnitSystem = 'SI';
  needed: SupportNeededState | null = null;
  pending = false;

  static override styles = [
    tokens,
    sheet,
    resultsStyles,
    css`
      :host {
        display: block;
      }
      .chart {
        max-width: 44rem;
      }
      .chart svg {
        display: block;
        width: 100%;
        height: auto;
      }
      dl {
        display: grid;
        grid-template-columns: minmax(0, max-content) minmax(8rem, 1fr);
        gap: 0.15rem 1rem;
        margin: 0.3rem 0;
      }
      /* Narrow screens: each label above its value, so no value is pushed off the page. */
      @media (max-width: 34rem) {
        dl {
          grid-template-columns: minmax(0, 1fr);
          gap: 0 0;
        }
        dd {
          margin-bottom: 0.35rem;
        }
      }
      dt {
        font-weight: 600;
      }
      dd {
        margin: 0;
      }
      .not-counted {
        border-left: 3px solid var(--lam-rule);
        padding-left: 0.6rem;
      }
      .tag {
        font-size: 0.85em;
        font-weight: 600;
        border: 1px solid currentColor;
        border-radius: 3px;
        padding: 0 0.3em;
        margin-left: 0.4em;
      }
      .table-box {
        max-width: 100%;
        overflow-x: auto;
      }
    `,
  ];

  private len(v: number | null): string {
    return v === null ? 'none found' : displayText(v, 'length', this.units);
  }

  private adopt(spacing: number): void {
    const p = this.project;
    if (!p || !p.support.bolts) return;
    const next = structuredClone(p);
    const s = adoptableSpacing(spacing);
    next.support.bolts = { ...next.support.bolts!, spacingAcross_m: s, spacingAlong_m: s };
    fireReplace(this, next, `suggested bolt spacing ${s} m × ${s} m`);
  }

  private renderNeeded(p: Project) {
    const n = this.needed;
    const current = n !== null && n.project === p;
    if (!current) {
      return html`<p class="pending" role="status">${this.pending ? 'Searching for the support needed…' : 'The support needed is found after the results.'}</p>`;
    }
    if (n.reason) return html`<p class="needed-reason" role="status">Support needed: ${n.reason}.</p>`;
    const r = n.needed;
    if (!r) return nothing;
    const b = p.support.bolts;
    const s = r.boltSpacing_m;
    const canAdopt = b !== null && s !== null && adoptableSpacing(s) > 0 && (Math.abs(adoptableSpacing(s) - b.spacingAcross_m) > 1e-9 || Math.abs(adoptableSpacing(s) - b.spacingAlong_m) > 1e-9);
    return html`<dl class="needed">
        <dt>Smallest standing support (bolts as given)</dt><dd data-key="standing">${r.standing_kPa === null ? 'none found' : displayText(r.standing_kPa, 'pressure', this.units)}</dd>
        <dt>Largest square bolt spacing</dt><dd data-key="spacing">${b ? this.len(s) : '— (no bolt pattern)'}</dd>
        <dt>Shortest bolt length</dt><dd data-key="length">${b ? this.len(r.boltLength_m) : '— (no bolt pattern)'}</dd>
        <dt>Largest ${openingWords(p.opening.type).span} with this support</dt><dd data-key="span">${this.len(r.maxSpan_m)}</dd>
      </dl>
      <p class="hint">Each search holds every other input; “passes” means every counted check meets its target.</p>
      ${r.reasons.length ? html`<ul class="reasons">${r.reasons.map((x) => html`<li>${x}</li>`)}</ul>` : nothing}
      ${canAdopt
        ? html`<button type="button" id="use-pattern" @click=${() => this.adopt(s!)}>
            Use this pattern: ${displayText(adoptableSpacing(s!), 'length', this.units)} × ${displayText(adoptableSpacing(s!), 'length', this.units)}
          </button>`
        : nothing}`;
  }

  override render() {
    const p = this.project;
    const a = this.analysis;
    if (!p || !a) return html`<p class="empty">No results yet: the analysis has not run.</p>`;
    const report = a.report;
    const rows = report.checks.filter((c) => SUPPORT_MODES.includes(c.mode));
    const s = report.support?.bolts ?? null;
    const b = p.support.bolts;
    const name = (i: number) => `${i + 1} ${p.layers[i]?.name ?? ''}`;
    const e = report.empirical;
    const svg = b && report.layers.length === p.layers.length ? supportBoltsSvg(p, report, { units: this.units }) : '';
    return html`
      ${svg ? html`<div class="chart" data-chart="support-bolts">${unsafeSVG(svg)}</div>` : nothing}
      ${b && s
        ? html`<dl class="bolt-results">
            <dt>Anchor layer</dt><dd>${s.anchorLayer === null ? 'none credited: the anchorage zone crosses an interface' : name(s.anchorLayer)}</dd>
            ${s.suspended.length
              ? html`<dt>Suspended</dt><dd>${s.suspended.map(name).join(', ')}</dd>
                  <dt>Load per bolt</dt><dd>${displayText(s.load_kN, 'boltForce', this.units)}, FS ${numberText(s.fsBolt, 3)} against ${numberText(p.design.fsTarget.bolt, 3)}</dd>`
              : nothing}
            ${s.composite
              ? html`<dt>Composite beam</dt><dd>${s.composite.credited ? 'credited: the bonded tension counts' : 'not credited: the unbonded tension counts'}; least interlayer shear FS ${numberText(s.composite.fsShear, 3)}</dd>`
              : nothing}
          </dl>`
        : nothing}
      ${rows.length
        ? html`<div class="table-box"><table class="support-rows">
            <caption>Support rows of the check table</caption>
            <thead><tr><th scope="col">Layer</th><th scope="col">Check</th><th scope="col">FS</th><th scope="col">Target</th><th scope="col">Status</th></tr></thead>
            <tbody>
              ${rows.map((r) => html`<tr data-mode=${r.mode} data-layer=${r.layerIndex} data-status=${r.status}>
                <td>${r.layerIndex === null ? r.layer : name(r.layerIndex)}</td><td>${MODE_LABEL[r.mode]}</td>
                <td class="num">${numberText(r.fs, 3)}</td><td class="num">${numberText(r.target, 3)}</td>
                <td><span class="status ${r.status}" title=${statusDescription(r)}>${STATUS_TEXT[r.status]}</span>${r.reason ? html` <span class="note">${r.reason}</span>` : nothing}</td>
              </tr>`)}
            </tbody>
          </table></div>`
        : html`<p class="hint">${b ? 'The bolts add no check here.' : 'No bolts: the checks above are for the unbolted roof (and any standing support).'}</p>`}
      <h3>Support needed</h3>
      ${this.renderNeeded(p)}
      ${e
        ? html`<div class="not-counted empirical">
            <h3>Empirical cross-check <span class="tag">not counted</span></h3>
            <dl>
              <dt>Q</dt><dd>${numberText(e.q, 3)}</dd>
              ${isOverhang(p.opening.type)
                ? html`<dt>Largest unsupported roof width</dt><dd>${displayText(e.unsupportedSpan_m, 'length', this.units)} (no limit on an overhang)</dd>`
                : html`<dt>Largest unsupported span</dt><dd>${displayText(e.unsupportedSpan_m, 'length', this.units)} (this opening: ${displayText(report.opening.designSpan_m ?? p.opening.span_m, 'length', this.units)})</dd>`}
              <dt>Bolt length (rule)</dt><dd>${displayText(e.boltLength_m, 'length', this.units)}${b ? ` (this pattern: ${displayText(b.length_m, 'length', this.units)})` : ''}</dd>
            </dl>
            <p class="hint">${e.note}</p>
          </div>`
        : nothing}
    `;
  }
}

if (!customElements.get('support-view')) customElements.define('support-view', SupportView);

declare global {
  interface HTMLElementTagNameMap {
    'support-view': SupportView;
  }
}
