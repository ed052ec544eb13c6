/**
 * `<strata-column>`: the stratigraphic column of a project drawn to scale (the shared chart
 * `strataColumnSvg`). Usable with just a `project`; with an `analysis` it also shows the
 * bending groups and any predicted bed separation.
 */
import { LitElement, html, css, nothing, type PropertyValues } from 'lit';
import { unsafeSVG } from 'lit/directives/unsafe-svg.js';
import type { Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import type { Analysis } from '../../analysis/types';
import type { strataColumnSvg } from '../../report/charts/strata-column';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { afterNextPaint, whenSettledAfterPaint } from '../after-paint';

/**
 * What the strata column draws of an analysis (`strataColumnSvg` reads only these): the bending
 * groups, the per-layer group numbers and the predicted bed separations. Equal keys, equal drawing.
 */
export function columnAnalysisKey(analysis: Analysis | null): string {
  if (!analysis) return '';
  return JSON.stringify([analysis.groups?.map((g) => [g.first, g.last]) ?? null, analysis.report.layers.map((l) => l.group), analysis.separations]);
}

type Draw = typeof strataColumnSvg;
/** The drawing code (the shared charts and their scales) is not in the first load: it loads on first use. */
let draw: Draw | null = null;
let loading: Promise<Draw> | null = null;
/** Loads after the next paint, so the first results are never behind it. */
const loadDraw = (): Promise<Draw> =>
  (loading ??= afterNextPaint()
    .then(() => import('../../report/charts/strata-column'))
    .then((m) => (draw = m.strataColumnSvg)));

export class StrataColumn extends LitElement {
  static override properties = {
    project: { attribute: false },
    analysis: { attribute: false },
    units: { type: String },
    svg: { state: true },
    drawReady: { state: true },
  };

  project: Project | null = null;
  analysis: Analysis | null = null;
  units: UnitSystem = 'SI';
  private svg = '';
  private failure = '';
  /** Whether the drawing code has loaded (`loadDraw`). */
  private drawReady = draw !== null;
  /** The inputs of the drawn SVG: it is redrawn only when one of them changes. */
  private drawn: { project: Project; units: UnitSystem; key: string } | null = null;

  static override styles = [
    tokens,
    sheet,
    css`
      :host {
        display: block;
      }
    `,
  ];

  /**
   * Once drawn, the column is redrawn after the next paint, when the page is idle: an edit's
   * results (the verdict, the checks) are painted first, the drawing of the inputs a frame or
   * two later (at most 250 ms).
   */
  protected override async scheduleUpdate(): Promise<unknown> {
    if (this.hasUpdated) await whenSettledAfterPaint(250);
    return super.scheduleUpdate();
  }

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('project') || changed.has('analysis') || changed.has('units') || (changed as Map<PropertyKey, unknown>).has('drawReady')) {
      if (!this.project) {
        this.svg = '';
        this.drawn = null;
        return;
      }
      // An analysis of another project (stale while the next one runs) would bracket the wrong layers.
      const analysis = this.analysis && this.analysis.report.layers.length === this.project.layers.length ? this.analysis : null;
      // A new analysis of the same project usually brackets the same groups and separations: the
      // drawing is then the same, and is not rebuilt.
      const key = columnAnalysisKey(analysis);
      const d = this.drawn;
      if (d && d.project === this.project && d.units === this.units && d.key === key) return;
      if (!draw) {
        loadDraw().then(
          () => (this.drawReady = true),
          (err: unknown) => {
            this.failure = err instanceof Error ? err.message : String(err);
            this.requestUpdate();
          },
        );
        return;
      }
      this.drawn = { project: this.project, units: this.units, key };
      try {
        this.svg = draw(this.project, analysis, { units: this.units });
        this.failure = '';
      } catch (err) {
        this.svg = '';
        this.failure = err instanceof Error ? err.message : String(err);
      }
    }
  }

  override render() {
    if (this.failure) return html`<p class="error">The strata column could not be drawn: ${this.failure}</p>`;
    return this.svg ? html`<div class="chart">${unsafeSVG(this.svg)}</div>` : nothing;
  }
}

if (!customElements.get('strata-column')) customElements.define('strata-column', StrataColumn);

declare global {
  interface HTMLElementTagNameMap {
    'strata-column': StrataColumn;
  }
}
