/**
 * `<strength-chain-view>`: per layer, the tensile strength chain lab → direct → characteristic
 * → block → rock mass → design with each step's value (traced), reason and source, the step
 * chart, and the jointing figures behind it (RQD, GSI, Hoek–Brown mb, s, a; cross-jointed or not
 * with the rule stated). Renders the analysis; computes nothing.
 *
 * @fires show-trace - detail `{ path }` when a traced number is clicked
 */
import { LitElement, html, nothing, type PropertyValues } from 'lit';
import { customElement, property } from 'lit/decorators.js';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import type { Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import type { Analysis } from '../../analysis/types';
import { PRECISION, numberText } from '../../report/number-text';
import { strengthChainSvg } from '../../report/charts';
import { NearViewport, chartSlot } from './near-viewport';
import { displayValue, displayText } from './display-value';
import { tracedNumber } from './traced-number';
import { resultsStyles } from './results-styles';
import { openingWords } from '../../model/span-wording';
import { DeferOffscreen } from '../app/defer-offscreen';

const STEP_FIELD: Record<string, string> = {
  lab: 'lab_MPa',
  direct: 'direct_MPa',
  characteristic: 'characteristic_MPa',
  block: 'block_MPa',
  mass: 'mass_MPa',
  design: 'design_MPa',
};

@customElement('strength-chain-view')
export class StrengthChainView extends DeferOffscreen(LitElement) {
  static override styles = [resultsStyles];

  @property({ attribute: false }) project: Project | null = null;
  @property({ attribute: false }) analysis: Analysis | null = null;
  @property() units: UnitSystem = 'SI';

  private charts: string[] = [];

  /** The charts are drawn when the view is near the screen (`chartsDirty` until then). */
  private readonly view = new NearViewport(this);
  private chartsDirty = true;

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('analysis') || changed.has('units')) this.chartsDirty = true;
    if (this.chartsDirty && this.view.near) {
      this.chartsDirty = false;
      this.charts = (this.analysis?.layers ?? []).map((d) => {
        try {
          return strengthChainSvg(d.steps, { units: this.units });
        } catch (err) {
          return '';
        }
      });
    }
  }

  private layer(i: number) {
    const p = this.project!;
    const a = this.analysis!;
    const lr = a.report.layers[i]!;
    const d = a.layers[i];
    const input = p.layers[i];
    const u = this.units;
    const w = openingWords(p.opening.type);
    const st = lr.strength;
    const spacing = input?.jointing.crossJointSpacing_m ?? null;
    const span = p.opening.span_m;
    return html`<section class="layer" data-layer=${i}>
      <h3>${lr.name}</h3>
      ${d
        ? html`<div class="pair"><div><table>
            <caption>Tensile strength chain</caption>
            <thead>
              <tr>
                <th scope="col">Step</th>
                <th scope="col" class="num">Value</th>
                <th scope="col">Why</th>
                <th scope="col">Source</th>
              </tr>
            </thead>
            <tbody>
              ${d.steps.map((s) => {
                const v = displayValue(s.value_MPa, 'stress', u);
                const field = STEP_FIELD[s.key];
                return html`<tr data-step=${s.key}>
                  <th scope="row">${s.label}</th>
                  <td class="num">
                    ${field ? tracedNumber(`layers[${i}].strength.${field}`, v.text, v.unit, s.value_MPa) : `${v.text} ${v.unit}`}
                  </td>
                  <td class="reason">${s.reason}</td>
                  <td class="source">${s.source}</td>
                </tr>`;
              })}
            </tbody>
          </table></div>
          ${chartSlot(this.chartsDirty ? '' : (this.charts[i] ?? ''), 'strength-chain-chart', 640, 340, this.chartsDirty) ?? nothing}</div>
          <p class="note">
            Lab results: ${d.lab.source === 'specimens'
              ? html`${d.lab.n} accepted specimen${d.lab.n === 1 ? '' : 's'} of ${d.lab.specimens.length}
                  (${d.lab.method} test${d.lab.method === 'brazilian' ? html`, direct = ${numberText(d.lab.directFactor)} × Brazilian` : ''}),
                  mean ${d.lab.mean_MPa === null ? '—' : tracedNumber(`detail.layers[${i}].lab.mean_MPa`, displayValue(d.lab.mean_MPa, 'stress', u).text, displayValue(d.lab.mean_MPa, 'stress', u).unit, d.lab.mean_MPa)},
                  CoV ${d.lab.cov === null ? '—' : tracedNumber(`detail.layers[${i}].lab.cov`, numberText(d.lab.cov), '', d.lab.cov)},
                  characteristic value by the ${d.lab.rule === 'mean' ? 'mean' : 'lower 5 % fractile'} rule${d.lab.kn !== null ? html` (kn = ${numberText(d.lab.kn)})` : ''}.`
              : html`a tensile strength given directly (${d.lab.method}).`}
          </p>`
        : html`<p class="empty">No strength details.</p>`}
      <table class="jointing">
        <caption>Jointing and rock mass</caption>
        <tbody>
          <tr>
            <th scope="row">RQD</th>
            <td class="num">${tracedNumber(`layers[${i}].strength.rqd`, numberText(st.rqd), '%', st.rqd)}</td>
            <td class="note">Priest &amp; Hudson (1976), from the fracture frequency or joint spacing; 100 if neither is given.</td>
          </tr>
          <tr>
            <th scope="row">GSI</th>
            <td class="num">${tracedNumber(`layers[${i}].strength.gsi`, numberText(st.gsi), '', st.gsi)}</td>
            <td class="note">1.5 × JCond89 (${input ? numberText(input.jointing.jointCondition, PRECISION.storedInput) : '—'}) + RQD/2, within 0–100 (Hoek, Carter &amp; Diederichs 2013).</td>
          </tr>
          ${d
            ? html`<tr>
                  <th scope="row">Hoek–Brown mb, s, a</th>
                  <td class="num">
                    ${tracedNumber(`detail.layers[${i}].hoekBrown.mb`, numberText(d.hoekBrown.mb), '', d.hoekBrown.mb)},
                    ${tracedNumber(`detail.layers[${i}].hoekBrown.s`, numberText(d.hoekBrown.s), '', d.hoekBrown.s)},
                    ${tracedNumber(`detail.layers[${i}].hoekBrown.a`, numberText(d.hoekBrown.a), '', d.hoekBrown.a)}
                  </td>
                  <td class="note">From GSI, mi = ${input ? numberText(input.hoekBrown.mi, PRECISION.storedInput) : '—'} and D = ${input ? numberText(input.hoekBrown.disturbance, PRECISION.storedInput) : '—'} (Hoek, Carranza-Torres &amp; Corkum 2002); rock-mass tension = characteristic × s·mi/mb; rock-mass UCS ${tracedNumber(`detail.layers[${i}].hoekBrown.massUcs_MPa`, displayValue(d.hoekBrown.massUcs_MPa, 'stress', u).text, displayValue(d.hoekBrown.massUcs_MPa, 'stress', u).unit, d.hoekBrown.massUcs_MPa)}.</td>
                </tr>
                <tr>
                  <th scope="row">Block size</th>
                  <td class="num">${displayText(d.blockSize.dEff_mm, 'smallLength', u)}</td>
                  <td class="note">
                    Effective size min(thickness, joint spacing, ${w.span}) = ${displayText(d.blockSize.dEffRaw_mm, 'smallLength', u)},
                    ${d.blockSize.clamped ? html`<strong>clamped</strong> to the ${displayText(d.blockSize.dLab_mm, 'smallLength', u)}–${displayText(200, 'smallLength', u)} range of the size law,` : 'inside the size-law range,'}
                    factor (d_lab/d_eff)^0.18 = ${numberText(d.blockSize.factor)} (Hoek &amp; Brown 1980).
                  </td>
                </tr>`
            : nothing}
          <tr data-role="cross-jointed">
            <th scope="row">Cross-jointed</th>
            <td class="num"><strong>${st.crossJointed ? 'yes' : 'no'}</strong></td>
            <td class="note">
              Rule: a layer is cross-jointed when its cross-joint spacing is less than the ${w.span}
              (${spacing === null ? 'no cross-joints recorded' : `${displayText(spacing, 'length', u)} vs ${displayText(span, 'length', u)}`}).
              ${st.crossJointed
                ? 'No tension is carried across open joints: the design tensile strength is 0 and the voussoir checks decide.'
                : `The layer is taken as continuous across the ${w.span}: the design strength is the smaller of block and rock-mass values.`}
            </td>
          </tr>
        </tbody>
      </table>
    </section>`;
  }

  override render() {
    if (!this.project || !this.analysis) return html`<p class="empty">No results yet: the analysis has not run.</p>`;
    return html`${this.analysis.report.layers.map((_, i) => this.layer(i))}`;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'strength-chain-view': StrengthChainView;
  }
}
