/**
 * `<beam-charts-view>`: for the chosen layer, net tension on the top and bottom fibres and the
 * deflection along the span, the voussoir arch, the slab stress contours when the opening is a
 * slab, and the span × thickness design chart of one mode. The profile and slab field are cheap
 * pure functions of the analysis, computed in `willUpdate`, never in `render`, and only once
 * the view is near the screen (`NearViewport`); their code (`analysis/profile.ts`,
 * `analysis/slab-field.ts`) is loaded then, not with the page. Until drawn, each chart's
 * place is held at its size.
 *
 * @fires show-trace - detail `{ path }` when a traced number is clicked
 * @fires chart-layer-change - detail `{ layer }` when the design-chart layer is changed
 */
import { LitElement, html, nothing, type PropertyValues } from 'lit';
import { customElement, property, state } from 'lit/decorators.js';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import type { Mode, Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import type { Analysis, DesignChart } from '../../analysis/types';
import { beamProfileSvg, voussoirArchSvg, slabContourSvg, designChartSvg } from '../../report/charts';
import { modeName } from '../../analysis/check-labels';
import { displayValue } from './display-value';
import { tracedNumber } from './traced-number';
import { resultsStyles } from './results-styles';
import { NearViewport, chartSlot } from './near-viewport';
import { DeferOffscreen } from '../app/defer-offscreen';

type ProfileCode = { beamProfile: typeof import('../../analysis/profile').beamProfile; slabField: typeof import('../../analysis/slab-field').slabField };
let profileCode: Promise<ProfileCode> | null = null;
const loadProfileCode = (): Promise<ProfileCode> =>
  (profileCode ??= Promise.all([import('../../analysis/profile'), import('../../analysis/slab-field')]).then(([a, b]) => ({ beamProfile: a.beamProfile, slabField: b.slabField })));

const CHART_MODES: readonly Mode[] = ['tension', 'crushing', 'sliding', 'snapThrough', 'deflection'];

/** Render a chart, turning a chart error into an empty string (the view says so). */
function safe(draw: () => string): string {
  try {
    return draw();
  } catch {
    return '';
  }
}

@customElement('beam-charts-view')
export class BeamChartsView extends DeferOffscreen(LitElement) {
  static override styles = [resultsStyles];

  @property({ attribute: false }) project: Project | null = null;
  @property({ attribute: false }) analysis: Analysis | null = null;
  @property() units: UnitSystem = 'SI';
  @property({ attribute: false }) chart: DesignChart | null = null;
  @property({ type: Number }) chartLayer = 0;

  /** Layer shown in the profile, arch and slab panels; null = the governing layer. */
  @state() private layerChoice: number | null = null;
  @state() private mode: Mode = 'tension';

  private profileSvg = '';
  private archSvg = '';
  private slabSvg = '';
  private designSvg = '';
  private shownLayer = 0;
  private readonly view = new NearViewport(this);
  /** The profile code, once loaded. */
  private code: ProfileCode | null = null;
  /** Charts out of date (drawn when near the screen). */
  private beamDirty = true;
  private designDirty = true;

  private governingIndex(): number {
    const a = this.analysis;
    const g = a?.report.governing;
    return a && g ? g.layerIndex : 0;
  }

  protected override willUpdate(changed: PropertyValues): void {
    const p = this.project;
    const a = this.analysis;
    if (!p || !a) {
      this.profileSvg = this.archSvg = this.slabSvg = this.designSvg = '';
      return;
    }
    const n = a.report.layers.length;
    if (this.layerChoice !== null && this.layerChoice >= n) this.layerChoice = null;
    const i = this.layerChoice ?? this.governingIndex();
    const u = this.units;
    this.shownLayer = i;
    if (changed.has('project') || changed.has('analysis') || changed.has('units') || changed.has('layerChoice')) this.beamDirty = true;
    if (changed.has('chart') || changed.has('units') || changed.has('project') || changed.has('mode')) this.designDirty = true;
    if (!this.view.near) return;
    const code = this.code;
    if (!code) {
      void loadProfileCode().then((c) => {
        this.code = c;
        this.requestUpdate();
      });
    }
    if (this.beamDirty && code) {
      this.beamDirty = false;
      const { beamProfile, slabField } = code;
      const lr = a.report.layers[i]!;
      this.profileSvg = safe(() =>
        beamProfileSvg(beamProfile(p, a, i), {
          spanWord: p.opening.type === 'cantilever' ? 'overhang' : 'span',
          units: u,
          designStrength_MPa: lr.strength.crossJointed ? undefined : lr.strength.design_MPa,
          title: `${lr.name}: net fibre tension and deflection along the ${p.opening.type === 'cantilever' ? 'overhang' : 'span'}`,
        }),
      );
      const v = lr.voussoir;
      this.archSvg = v
        ? safe(() =>
            voussoirArchSvg(
              {
                span_m: p.opening.span_m,
                thickness_m: lr.thickness_m,
                n: v.n,
                leverArm_m: v.leverArm_m,
                deflection_mm: v.deflection_mm,
                snapThrough: v.snapThrough,
                maxCompression_MPa: v.maxCompression_MPa,
              },
              { units: u },
            ),
          )
        : '';
      this.slabSvg =
        p.opening.type === 'slab'
          ? safe(() => {
              const field = slabField(p, a, i);
              return field ? slabContourSvg(field, { units: u }) : '';
            })
          : '';
    }
    if (this.designDirty) {
      this.designDirty = false;
      const c = this.chart;
      const layer = c ? p.layers[c.layer] : undefined;
      this.designSvg = c
        ? safe(() =>
            designChartSvg(c, this.mode, {
              units: u,
              currentSpan_m: p.opening.span_m,
              currentThickness_m: layer?.thickness_m,
              spanWord: p.opening.type === 'cantilever' ? 'overhang' : 'span',
            }),
          )
        : '';
    }
  }

  private chooseLayer(event: Event): void {
    this.layerChoice = Number((event.target as HTMLSelectElement).value);
  }

  private chooseMode(event: Event): void {
    this.mode = (event.target as HTMLSelectElement).value as Mode;
  }

  private chooseChartLayer(event: Event): void {
    const layer = Number((event.target as HTMLSelectElement).value);
    this.dispatchEvent(new CustomEvent('chart-layer-change', { detail: { layer }, bubbles: true, composed: true }));
  }

  override render() {
    const p = this.project;
    const a = this.analysis;
    if (!p || !a) return html`<p class="empty">No results yet: the analysis has not run.</p>`;
    const i = this.shownLayer;
    const lr = a.report.layers[i];
    const u = this.units;
    const chartLayer = this.chart?.layer ?? this.chartLayer;
    const v = lr?.voussoir ?? null;
    return html`
      <div class="controls">
        <label for="beam-layer">Layer</label>
        <select id="beam-layer" data-role="beam-layer" @change=${this.chooseLayer}>
          ${a.report.layers.map((l, k) => html`<option value=${k} ?selected=${k === i}>${k + 1}. ${l.name}${k === this.governingIndex() ? ' (governing)' : ''}</option>`)}
        </select>
      </div>
      <div class="pair"><div>
      <h3>Elastic beam: tension and deflection</h3>
      ${lr
        ? html`<p class="note">
            Largest net tension ${tracedNumber(`layers[${i}].elastic.maxTension_MPa`, displayValue(lr.elastic.maxTension_MPa, 'stress', u).text, displayValue(lr.elastic.maxTension_MPa, 'stress', u).unit, lr.elastic.maxTension_MPa)}
            at the ${lr.elastic.at}; deflection ${tracedNumber(`layers[${i}].elastic.deflection_mm`, displayValue(lr.elastic.deflection_mm, 'deflection', u).text, displayValue(lr.elastic.deflection_mm, 'deflection', u).unit, lr.elastic.deflection_mm)};
            load carried ${tracedNumber(`layers[${i}].load_kPa`, displayValue(lr.load_kPa, 'pressure', u).text, displayValue(lr.load_kPa, 'pressure', u).unit, lr.load_kPa)}
            (bending group ${lr.group + 1}).
          </p>`
        : nothing}
      ${chartSlot(this.beamDirty ? '' : this.profileSvg, 'beam-profile', 640, 440, this.beamDirty) ?? html`<p class="empty">No beam profile for this layer.</p>`}
      </div><div>
      <h3>Voussoir (cracked beam)</h3>
      ${v === null
        ? html`<p class="empty">No voussoir: a jointed overhang (cantilever) cannot form an arch.</p>`
        : v.snapThrough
          ? html`<p><strong>Snap-through ✗:</strong> no compression arch can form in ${lr!.name} at this span; once cracked it would fall.</p>`
          : html`<p class="note">
              Compression zone n = ${tracedNumber(`layers[${i}].voussoir.n`, displayValue(v.n, null, u).text, '', v.n)},
              lever arm z = ${tracedNumber(`layers[${i}].voussoir.leverArm_m`, displayValue(v.leverArm_m, 'length', u).text, displayValue(v.leverArm_m, 'length', u).unit, v.leverArm_m)},
              arch stress fc = ${tracedNumber(`layers[${i}].voussoir.maxCompression_MPa`, displayValue(v.maxCompression_MPa, 'stress', u).text, displayValue(v.maxCompression_MPa, 'stress', u).unit, v.maxCompression_MPa)},
              midspan deflection ${tracedNumber(`layers[${i}].voussoir.deflection_mm`, displayValue(v.deflection_mm, 'deflection', u).text, displayValue(v.deflection_mm, 'deflection', u).unit, v.deflection_mm)}.
              ${p.opening.type === 'slab' ? 'For a slab the voussoir uses the short span in plane strain (conservative).' : ''}
            </p>`}
      ${chartSlot(this.beamDirty ? '' : this.archSvg, 'voussoir-arch', 640, v?.snapThrough ? 340 : 270, this.beamDirty && v !== null) ?? nothing}
      </div></div>
      ${p.opening.type === 'slab'
        ? html`<h3>Roof slab: bending stress</h3>
            ${lr?.plate
              ? html`<p class="note">
                  Plate (slab) largest tension
                  ${tracedNumber(`layers[${i}].plate.maxTension_MPa`, displayValue(lr.plate.maxTension_MPa, 'stress', u).text, displayValue(lr.plate.maxTension_MPa, 'stress', u).unit, lr.plate.maxTension_MPa)}
                  at the ${lr.plate.at}; deflection
                  ${tracedNumber(`layers[${i}].plate.deflection_mm`, displayValue(lr.plate.deflection_mm, 'deflection', u).text, displayValue(lr.plate.deflection_mm, 'deflection', u).unit, lr.plate.deflection_mm)}
                  (β = ${tracedNumber(`layers[${i}].plate.beta`, displayValue(lr.plate.beta, null, u).text, '', lr.plate.beta)},
                  α = ${tracedNumber(`layers[${i}].plate.alpha`, displayValue(lr.plate.alpha, null, u).text, '', lr.plate.alpha)}).
                  The beam panel above shows the plane-strain strip across the short span for comparison.
                </p>`
              : nothing}
            ${chartSlot(this.beamDirty ? '' : this.slabSvg, 'slab-contour', 680, 400, this.beamDirty) ?? html`<p class="empty">No slab stress field.</p>`}`
        : nothing}
      <h3>Design chart: ${this.project?.opening.type === 'cantilever' ? 'overhang' : 'span'} × thickness</h3>
      <div class="controls">
        <label for="chart-layer">Layer</label>
        <select id="chart-layer" data-role="chart-layer" @change=${this.chooseChartLayer}>
          ${p.layers.map((l, k) => html`<option value=${k} ?selected=${k === chartLayer}>${k + 1}. ${l.name}</option>`)}
        </select>
        <label for="chart-mode">Mode</label>
        <select id="chart-mode" data-role="chart-mode" @change=${this.chooseMode}>
          ${CHART_MODES.map((m) => html`<option value=${m} ?selected=${m === this.mode}>${modeName(m, this.project?.opening.type ?? '')}</option>`)}
        </select>
      </div>
      ${chartSlot(this.designDirty ? '' : this.designSvg, 'design-chart', 640, 420, this.designDirty && this.chart !== null) ?? html`<p class="empty">No design chart for this layer and mode.</p>`}
    `;
  }
}

declare global {
  interface HTMLElementTagNameMap {
    'beam-charts-view': BeamChartsView;
  }
}
