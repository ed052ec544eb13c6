/**
 * `<span-finder-view>`: the largest span per mode and the governing one, the current span, the
 * FS-versus-span chart, the minimum thickness of a chosen layer, and a button that adopts the
 * governing largest span. Renders the store's results; computes nothing.
 *
 * @fires show-trace - detail `{ path }` when a traced number is clicked
 * @fires chart-layer-change - detail `{ layer: number }` when another layer is chosen
 * @fires project-edit - detail `{ path: 'opening.span_m', value: number }` from "Use this span"
 */
import { LitElement, html, nothing, type PropertyValues } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import type { Mode, Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import type { Analysis, SpanCurve } from '../../analysis/types';
import { fsSpanSvg } from '../../report/charts';
import { THICKNESS_MIN_M } from '../../analysis/thickness-limits';
import { numberText } from '../../report/number-text';
import { modeName } from '../../analysis/check-labels';
import { spanWordOf } from '../../analysis/verdict';
import { adoptableSpan } from './adoptable-span';
import { displayText, displayValue } from './display-value';
import { inputSignificant } from '../../model/number-format';
import { tracedNumber } from './traced-number';
import { resultsStyles } from './results-styles';
import { NearViewport, chartSlot } from './near-viewport';
import { DeferOffscreen } from '../app/defer-offscreen';

const SPAN_MODES: readonly Mode[] = ['tension', 'crushing', 'sliding', 'snapThrough', 'deflection'];

/** Why a mode has no largest span, in the opening's word ("span", "overhang", "entry width"). */
function whyNull(word: string): Record<Mode, string> {
  return {
    tension: `does not limit the ${word} (no layer without cross-joints carries net tension, or the mode does not apply)`,
    crushing: `does not limit the ${word} here`,
    sliding: `never limits the ${word}: the sliding FS rises with ${word}; a shortfall shows at the current ${word}`,
    snapThrough: `does not limit the ${word} here`,
    deflection: `does not limit the ${word} here`,
  };
}

@customElement('span-finder-view')
export class SpanFinderView extends DeferOffscreen(LitElement) {
  static override styles = [resultsStyles];

  @property({ attribute: false }) project: Project | null = null;
  @property({ attribute: false }) analysis: Analysis | null = null;
  @property({ attribute: false }) curve: SpanCurve | null = null;
  @property() units: UnitSystem = 'SI';
  @property({ attribute: false }) minThickness: number | null = null;
  /** True while the curve and the minimum thickness for the current project and layer are being computed: `minThickness` is then not theirs. */
  @property({ type: Boolean }) pending = false;
  /** Why the minimum thickness (with the curve) could not be computed; null when it was. */
  @property({ attribute: false }) chartError: string | null = null;
  @property({ type: Number }) chartLayer = 0;

  private spanChartSvg = '';
  /** The FS-versus-span chart is drawn when the view is near the screen (`chartDirty` until then). */
  private readonly view = new NearViewport(this);
  private chartDirty = true;

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('curve') || changed.has('analysis') || changed.has('units') || changed.has('project')) this.chartDirty = true;
    if (this.chartDirty && this.view.near) {
      this.chartDirty = false;
      this.spanChartSvg = '';
      if (this.curve) {
        try {
          this.spanChartSvg = fsSpanSvg(this.curve, this.analysis?.report.maxSpan_m ?? null, {
            units: this.units,
            spanWord: this.project ? spanWordOf(this.project) : 'span',
          });
        } catch {
          this.spanChartSvg = '';
        }
      }
    }
  }

  private useSpan(value: number): void {
    this.dispatchEvent(
      new CustomEvent('project-edit', { detail: { path: 'opening.span_m', value }, bubbles: true, composed: true }),
    );
  }

  private chooseLayer(event: Event): void {
    const layer = Number((event.target as HTMLSelectElement).value);
    this.dispatchEvent(new CustomEvent('chart-layer-change', { detail: { layer }, bubbles: true, composed: true }));
  }

  override render() {
    const p = this.project;
    const a = this.analysis;
    if (!p || !a) return html`<p class="empty">No results yet: the analysis has not run.</p>`;
    const u = this.units;
    const m = a.report.maxSpan_m;
    const adopt = adoptableSpan(m);
    const current = p.opening.span_m;
    // Which modes count, and the sliding shortfall, come from the analysis' check table.
    const rows = a.report.checks;
    const counted = (k: Mode) => rows.some((r) => r.mode === k && r.counts);
    const governingMode = m ? SPAN_MODES.find((k) => m[k] !== null && m[k] === m.governing) : undefined;
    const spanWord = p.opening.type === 'slab' ? 'short span' : spanWordOf(p);
    const layerIndex = Math.min(Math.max(0, this.chartLayer), p.layers.length - 1);
    // Sliding never limits the span from above (its FS rises with span): a shortfall at the
    // current span is stated here, as a shorter span would make it worse, not better.
    const slidingBelow = rows.filter((r) => r.mode === 'sliding' && r.status === 'below' && r.fs !== null);
    const leastSliding = slidingBelow.length ? Math.min(...slidingBelow.map((r) => r.fs as number)) : null;
    const slidingShort = leastSliding !== null;
    return html`
      <table>
        <caption>Largest ${spanWord} that meets each target (all else held fixed)</caption>
        <thead>
          <tr><th scope="col">Mode</th><th scope="col" class="num">Largest ${spanWord}</th><th scope="col">Note</th></tr>
        </thead>
        <tbody>
          ${SPAN_MODES.map((k) => {
            const v = m ? m[k] : null;
            const d = displayValue(v, 'length', u);
            return html`<tr data-mode=${k}>
              <th scope="row">${modeName(k, p.opening.type)}</th>
              <td class="num">${v === null ? '—' : tracedNumber(`maxSpan_m.${k}`, d.text, d.unit, v)}</td>
              <td class="note">
                ${v === null ? (k !== 'sliding' && !counted(k) ? `counts in no layer at the current ${spanWord}` : whyNull(spanWord)[k]) : v >= current ? `meets the target at the current ${spanWord}` : `below the current ${spanWord}: this mode fails now`}
                ${k === 'sliding' && slidingShort
                  ? html`<br /><strong>Sliding falls short at the current ${spanWord}</strong> (least FS ${numberText(leastSliding)} against
                      ${numberText(p.design.fsTarget.sliding)}); a shorter ${spanWord} makes it worse, so it must be resolved on its own.`
                  : nothing}
              </td>
            </tr>`;
          })}
        </tbody>
        <tfoot>
          <tr data-mode="governing">
            <th scope="row">Governing</th>
            <td class="num">
              ${m?.governing === null || m?.governing === undefined
                ? '—'
                : tracedNumber('maxSpan_m.governing', displayValue(m.governing, 'length', u).text, displayValue(m.governing, 'length', u).unit, m.governing)}
            </td>
            <td class="note">${governingMode ? `set by ${modeName(governingMode, p.opening.type)}` : m?.governing === null ? `no mode limits the ${spanWord}` : ''}</td>
          </tr>
          <tr data-mode="current">
            <th scope="row">Current ${spanWord}</th>
            <td class="num" data-role="current-span" data-si-value=${current}>${displayText(current, 'length', u, inputSignificant(u !== 'SI'))}</td>
            <td class="note">
              ${adopt === null ? '' : adopt >= current ? `within the governing largest ${spanWord}` : html`<strong>exceeds the governing largest ${spanWord}</strong>`}
            </td>
          </tr>
        </tfoot>
      </table>
      <div class="controls">
        <button
          type="button"
          class="action"
          data-role="use-span"
          ?disabled=${adopt === null}
          @click=${() => adopt !== null && this.useSpan(adopt)}
          title="Set the ${spanWord} to the governing largest ${spanWord} (rounded down to 1 mm)"
        >
          Use this ${spanWord}${adopt !== null ? ` (${displayText(adopt, 'length', u, inputSignificant(u !== 'SI'))})` : ''}
        </button>
        ${adopt !== null ? html`<span class="note">the governing largest ${spanWord}, rounded down to 1 mm</span>` : nothing}
      </div>
      ${chartSlot(this.chartDirty ? '' : this.spanChartSvg, 'fs-span-chart', 680, 420, this.chartDirty && this.curve !== null) ??
      html`<p class="empty">No FS-versus-span curve.</p>`}
      <h3>Minimum thickness</h3>
      <div class="controls">
        <label for="thk-layer">Layer</label>
        <select id="thk-layer" data-role="chart-layer" @change=${this.chooseLayer}>
          ${p.layers.map((l, i) => html`<option value=${i} ?selected=${i === layerIndex}>${i + 1}. ${l.name}</option>`)}
        </select>
      </div>
      <p data-role="min-thickness">${this.minThicknessText(p.layers[layerIndex], spanWord)}</p>
    `;
  }

  /** The minimum thickness of the chosen layer, in a sentence: pending, not known, none, not limiting, or the value. */
  private minThicknessText(layer: Project['layers'][number] | undefined, spanWord: string) {
    const u = this.units;
    const name = html`<strong>${layer?.name ?? ''}</strong>`;
    const now = displayText(layer?.thickness_m ?? null, 'length', u, 3);
    const thinnest = html`Thinnest ${name} that meets every target at the current ${spanWord}:`;
    const t = this.minThickness;
    if (this.pending) return html`${thinnest} <span class="updating">updating…</span>`;
    if (this.chartError !== null) return html`${thinnest} <span class="error">not known (${this.chartError})</span>.`;
    if (t === null) return html`No thickness of ${name} meets every target at the current ${spanWord} (or the thickness does not control it).`;
    if (t <= THICKNESS_MIN_M) {
      return html`Every thickness of ${name} down to <strong data-si-value=${t}>${displayText(THICKNESS_MIN_M, 'length', u, 3)}</strong>
        (the thinnest searched) meets every target at the current ${spanWord} (now ${now}): its thickness does not limit this design.`;
    }
    return html`${thinnest} <strong data-si-value=${t}>${displayText(t, 'length', u, 3)}</strong> (now ${now}).`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'span-finder-view': SpanFinderView;
  }
}
