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
import { strataColumnSvg } from '../../report/charts/strata-column';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';

export class StrataColumn extends LitElement {
  static override properties = {
    project: { attribute: false },
    analysis: { attribute: false },
    units: { type: String },
    svg: { state: true },
  };

  project: Project | null = null;
  analysis: Analysis | null = null;
  units: UnitSystem = 'SI';
  private svg = '';
  private failure = '';

  static override styles = [
    tokens,
    sheet,
    css`
      :host {
        display: block;
      }
    `,
  ];

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('project') || changed.has('analysis') || changed.has('units')) {
      if (!this.project) {
        this.svg = '';
        return;
      }
      try {
        // An analysis of another project (stale while the next one runs) would bracket the wrong layers.
        const analysis = this.analysis && this.analysis.report.layers.length === this.project.layers.length ? this.analysis : null;
        this.svg = strataColumnSvg(this.project, analysis, { units: this.units });
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
