/**
 * `<strata-editor>` — worksheet section 2: every field of every layer, one column per layer
 * (layers[0], the immediate roof, first), with add, remove and move controls, beside the
 * `<strata-column>` drawn to scale. Where the host is narrower than `CARD_WIDTH_PX` (a phone)
 * the layers are stacked cards instead, one under the other, with a line naming every layer
 * and linking to its card, so no layer hides in a sideways scroll.
 *
 * @fires project-edit - one layer field changed
 * @fires project-replace - a layer was added, removed or moved
 */
import { LitElement, html, css, nothing, type PropertyValues, type TemplateResult } from 'lit';
import type { Layer, Project, RockClass } from '../../model/types';
import type { Quantity, UnitSystem } from '../../model/units';
import type { Analysis } from '../../analysis/types';
import { defaultLayer, defaultLayerName, DEFAULT_MI } from '../../model/defaults';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { errorFor, selectField, textField } from './field-templates';
import { fireReplace } from './events';
import './quantity-input';
import { columnAnalysisKey } from './strata-column';
import { DeferOffscreen } from '../app/defer-offscreen';

interface NumberRow {
  kind: 'number';
  label: string;
  key: string;
  get: (l: Layer) => number | null;
  quantity?: Quantity;
  unitText?: string;
  nullable?: boolean;
  emptyText?: string;
}
interface SelectRow {
  kind: 'select';
  label: string;
  key: string;
  get: (l: Layer) => string;
  choices: ReadonlyArray<{ value: string; label: string }>;
}
type Row = NumberRow | SelectRow | { kind: 'band'; label: string; note?: string };

/** Below this host width the layers are shown as stacked cards. */
export const CARD_WIDTH_PX = 640;

/** What λ counts (METHODS §7): shown next to the field in every form. */
export const LAMBDA_HINT = 'fractures crossing the layer, along the opening (not bedding partings)';

const ROWS: Row[] = [
  { kind: 'band', label: 'Geometry and stiffness' },
  { kind: 'number', label: 'Thickness', key: 'thickness_m', get: (l) => l.thickness_m, quantity: 'length' },
  { kind: 'number', label: 'Unit weight', key: 'unitWeight_kNm3', get: (l) => l.unitWeight_kNm3, quantity: 'unitWeight' },
  { kind: 'number', label: 'Young’s modulus E', key: 'youngModulus_GPa', get: (l) => l.youngModulus_GPa, quantity: 'modulus' },
  {
    kind: 'select',
    label: 'Modulus basis',
    key: 'modulusBasis',
    get: (l) => l.modulusBasis,
    choices: [
      { value: 'mass', label: 'rock mass, as given' },
      { value: 'intact', label: 'intact, GSI-reduced' },
    ],
  },
  { kind: 'number', label: 'Poisson’s ratio ν', key: 'poisson', get: (l) => l.poisson, unitText: '—' },
  { kind: 'band', label: 'Strength' },
  { kind: 'number', label: 'UCS', key: 'ucs_MPa', get: (l) => l.ucs_MPa, quantity: 'stress' },
  {
    kind: 'select',
    label: 'Rock class',
    key: 'rockClass',
    get: (l) => l.rockClass,
    choices: [
      { value: 'sedimentary', label: 'sedimentary' },
      { value: 'igneous', label: 'igneous' },
      { value: 'metamorphic', label: 'metamorphic' },
    ],
  },
  { kind: 'number', label: 'Tensile strength, given', key: 'tensile.value_MPa', get: (l) => l.tensile.value_MPa, quantity: 'stress', nullable: true, emptyText: 'tests' },
  {
    kind: 'select',
    label: 'Tensile test method',
    key: 'tensile.method',
    get: (l) => l.tensile.method,
    choices: [
      { value: 'brazilian', label: 'Brazilian (indirect)' },
      { value: 'direct', label: 'direct pull' },
    ],
  },
  { kind: 'band', label: 'Jointing', note: 'leave empty when not observed or not logged' },
  { kind: 'number', label: 'Cross-joint spacing', key: 'jointing.crossJointSpacing_m', get: (l) => l.jointing.crossJointSpacing_m, quantity: 'length', nullable: true, emptyText: 'none' },
  {
    kind: 'number',
    label: `Fracture frequency λ: ${LAMBDA_HINT}`,
    key: 'jointing.fractureFrequency_per_m',
    get: (l) => l.jointing.fractureFrequency_per_m,
    unitText: 'per m',
    nullable: true,
    emptyText: '—',
  },
  { kind: 'number', label: 'RQD', key: 'jointing.rqd', get: (l) => l.jointing.rqd, unitText: '%', nullable: true, emptyText: 'from λ' },
  { kind: 'number', label: 'Joint condition JCond89', key: 'jointing.jointCondition', get: (l) => l.jointing.jointCondition, unitText: '0–30' },
  { kind: 'number', label: 'Joint friction angle φ', key: 'jointing.jointFriction_deg', get: (l) => l.jointing.jointFriction_deg, unitText: '°' },
  { kind: 'band', label: 'Hoek–Brown' },
  { kind: 'number', label: 'mi', key: 'hoekBrown.mi', get: (l) => l.hoekBrown.mi, unitText: '—' },
  { kind: 'number', label: 'Disturbance D', key: 'hoekBrown.disturbance', get: (l) => l.hoekBrown.disturbance, unitText: '0–1' },
];

export class StrataEditor extends DeferOffscreen(LitElement) {
  static override properties = {
    project: { attribute: false },
    analysis: { attribute: false },
    units: { type: String },
    fieldErrors: { attribute: false },
    cards: { type: Boolean, reflect: true },
  };

  /** True when the layers are shown as stacked cards (set from the host's width). */
  cards = false;
  private resizer: ResizeObserver | null = null;

  override connectedCallback(): void {
    super.connectedCallback();
    if (typeof ResizeObserver === 'undefined') return;
    this.resizer = new ResizeObserver((entries) => {
      const width = entries[0]?.contentRect.width ?? 0;
      const cards = width > 0 && width < CARD_WIDTH_PX;
      if (cards !== this.cards) this.cards = cards;
    });
    this.resizer.observe(this);
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this.resizer?.disconnect();
    this.resizer = null;
  }

  project!: Project;
  analysis: Analysis | null = null;
  units: UnitSystem = 'SI';
  fieldErrors: ReadonlyArray<{ path: string; message: string }> = [];

  static override styles = [
    tokens,
    sheet,
    css`
      :host {
        display: block;
      }
      .layout {
        display: flex;
        flex-wrap: wrap;
        gap: 1rem;
        align-items: flex-start;
      }
      .table-wrap {
        overflow-x: auto;
        flex: 1 1 40rem;
        max-width: 100%;
      }
      strata-column {
        flex: 1 1 18rem;
        min-width: 16rem;
        max-width: 32rem;
      }
      td select {
        max-width: 10.5rem;
      }
      thead input {
        width: 100%;
      }
      th.band {
        background: var(--lam-shade);
        font-weight: 600;
        padding-top: 0.4em;
      }
      th.band .hint {
        font-weight: 400;
      }
      thead th {
        vertical-align: bottom;
        min-width: 9.5rem;
      }
      /* Field names wrap in a column of their own width, so a long name (the fracture
         frequency's) does not push the layers' columns out of view on a desktop screen. */
      th[scope='row'] {
        width: 14rem;
        min-width: 10rem;
        white-space: normal;
      }
      .pos {
        font-weight: 400;
        color: var(--lam-muted);
        display: block;
      }
      .tools {
        display: flex;
        gap: 0.25rem;
        margin-top: 0.25rem;
        flex-wrap: wrap;
      }
      .tools button {
        font-size: 0.88em;
        padding: 0 0.4em;
      }
      .add {
        margin-top: 0.5rem;
      }
      .source {
        display: block;
        font-size: 0.88em;
        color: var(--lam-muted);
      }
      .cards {
        flex: 1 1 100%;
        min-width: 0;
      }
      .layer-index {
        margin: 0.2rem 0 0.5rem;
      }
      .layer-index a {
        display: inline-block;
        max-width: 100%;
        margin-right: 0.6em;
        overflow-wrap: anywhere;
      }
      .card {
        border: 1px solid var(--lam-ink);
        border-left-width: 6px;
        padding: 0.3rem 0.6rem 0.5rem;
        margin: 0 0 0.8rem;
        scroll-margin-top: 5.5rem;
      }
      .card h3 {
        margin: 0.1rem 0 0.3rem;
      }
      .card h4 {
        margin: 0.6rem 0 0.2rem;
        padding: 0.1rem 0.3rem;
        background: var(--lam-shade);
        font-size: 0.95em;
      }
      .card .name input {
        width: 100%;
      }
      .card .name {
        display: block;
      }
      .card-field {
        display: flex;
        flex-wrap: wrap;
        align-items: baseline;
        gap: 0.1rem 0.4rem;
        padding: 0.15rem 0;
        border-bottom: 1px solid var(--lam-rule);
      }
      .card-field > .label {
        flex: 1 1 9rem;
        min-width: 0;
      }
      .card-field select {
        max-width: 100%;
      }
      :host([cards]) strata-column {
        min-width: 0;
        flex-basis: 100%;
      }
    `,
  ];

  private replaceLayers(layers: Layer[], source: string): void {
    const p = structuredClone(this.project);
    p.layers = layers;
    fireReplace(this, p, source);
  }

  private addLayer(): void {
    const layers = structuredClone(this.project.layers);
    const layer = defaultLayer();
    layer.name = defaultLayerName(layers.length);
    layers.push(layer);
    this.replaceLayers(layers, `layer added (${layer.name})`);
  }

  private removeLayer(i: number): void {
    const layers = structuredClone(this.project.layers);
    const [gone] = layers.splice(i, 1);
    this.replaceLayers(layers, `layer removed (${gone.name})`);
  }

  private moveLayer(i: number, by: -1 | 1): void {
    const j = i + by;
    const layers = structuredClone(this.project.layers);
    if (j < 0 || j >= layers.length) return;
    [layers[i], layers[j]] = [layers[j], layers[i]];
    this.replaceLayers(layers, `layer moved (${layers[j].name})`);
  }

  private cell(row: NumberRow | SelectRow, layer: Layer, i: number): TemplateResult {
    const path = `layers[${i}].${row.key}`;
    const label = `${row.label}, layer ${i + 1} (${layer.name})`;
    if (row.kind === 'select') {
      const value = row.get(layer);
      const select = selectField(this, { label, path, value, choices: row.choices, compact: true, error: errorFor(this.fieldErrors, path) });
      if (row.key === 'rockClass') {
        return html`${select}<span class="source">mi default ${DEFAULT_MI[value as RockClass]}</span>`;
      }
      return select;
    }
    const note =
      row.key === 'tensile.value_MPa' && layer.tensile.specimens.length > 0
        ? html`<span class="source">${layer.tensile.specimens.length} specimens given: the tests are used</span>`
        : nothing;
    return html`<quantity-input
        compact
        label=${label}
        path=${path}
        .value=${row.get(layer)}
        quantity=${row.quantity ?? ''}
        unit-text=${row.unitText ?? ''}
        ?nullable=${row.nullable ?? false}
        empty-text=${row.emptyText ?? ''}
        units=${this.units}
        error=${errorFor(this.fieldErrors, path)}
      ></quantity-input
      >${note}`;
  }

  /** The name field and the move/remove buttons of layer `i` (a table head cell or a card head). */
  private layerTools(l: Layer, i: number, n: number): TemplateResult {
    return html`<span class="tools">
      <button type="button" title="Move one bed down, toward the opening" aria-label="Move ${l.name} down (toward the opening)" ?disabled=${i === 0} @click=${() => this.moveLayer(i, -1)}>▼ down</button>
      <button type="button" title="Move one bed up, away from the opening" aria-label="Move ${l.name} up (away from the opening)" ?disabled=${i === n - 1} @click=${() => this.moveLayer(i, 1)}>▲ up</button>
      <button type="button" aria-label="Remove layer ${i + 1} (${l.name})" ?disabled=${n === 1} @click=${() => this.removeLayer(i)}>Remove</button>
    </span>`;
  }

  private position(i: number): string {
    if (i !== 0) return '';
    return this.project.opening.type === 'cantilever' ? ' — underside of the overhang' : ' — immediate roof';
  }

  /** Narrow screens: one card per layer, stacked, with an index of the layers at the top. */
  private renderCards(group: (i: number) => string): TemplateResult {
    const p = this.project;
    const n = p.layers.length;
    return html`<div class="cards">
      <p class="layer-index">
        ${n} layer${n === 1 ? '' : 's'}, listed upward from the opening:
        ${p.layers.map((l, i) => html`<a href="#layer-card-${i}" @click=${(e: Event) => this.goToCard(e, i)}>${i + 1} ${l.name}</a>`)}
      </p>
      ${p.layers.map(
        (l, i) => html`<section class="card" id="layer-card-${i}" data-layer=${i} aria-labelledby="layer-card-${i}-h">
          <h3 id="layer-card-${i}-h">Layer ${i + 1} of ${n}${this.position(i)}${group(i)}</h3>
          <span class="name">${textField(this, { label: `Name of layer ${i + 1}`, path: `layers[${i}].name`, value: l.name, compact: true, size: 20, error: errorFor(this.fieldErrors, `layers[${i}].name`) })}</span>
          ${this.layerTools(l, i, n)}
          ${ROWS.map((row) =>
            row.kind === 'band'
              ? html`<h4>${row.label}${row.note ? html` <span class="hint">(${row.note})</span>` : nothing}</h4>`
              : html`<div class="card-field"><span class="label" aria-hidden="true">${row.label}</span>${this.cell(row, l, i)}</div>`,
          )}
        </section>`,
      )}
      <button type="button" class="add" @click=${this.addLayer}>+ Add a layer above</button>
      <p class="hint">Layer 1 is the immediate roof; layers are listed upward. A new layer starts from a generic 0.5 m sedimentary bed with 3 MPa Brazilian strength — replace every value.</p>
    </div>`;
  }

  /**
   * A new analysis alone (the usual case after an edit: the inputs rendered at the edit) changes
   * nothing here unless it changes the layers' bending groups or bed separations (the group
   * labels and the strata column): the editor and its column are then not re-rendered.
   */
  protected override shouldUpdate(changed: PropertyValues<this>): boolean {
    if (changed.size === 1 && changed.has('analysis')) {
      const before = changed.get('analysis') as Analysis | null | undefined;
      if (before && this.analysis && columnAnalysisKey(before) === columnAnalysisKey(this.analysis)) return false;
    }
    return true;
  }

  private goToCard(e: Event, i: number): void {
    e.preventDefault();
    const card = this.renderRoot.querySelector<HTMLElement>(`#layer-card-${i}`);
    card?.scrollIntoView({ block: 'start' });
    card?.querySelector<HTMLElement>('input')?.focus({ preventScroll: true });
  }

  override render() {
    const p = this.project;
    if (!p) return nothing;
    const n = p.layers.length;
    const group = (i: number): string => {
      const g = this.analysis?.report.layers[i]?.group;
      return this.analysis && this.analysis.report.layers.length === n && g !== undefined ? ` · group ${g + 1}` : '';
    };
    if (this.cards) {
      return html`<div class="layout">
        ${this.renderCards(group)}
        <strata-column .project=${p} .analysis=${this.analysis} units=${this.units}></strata-column>
      </div>`;
    }
    return html`<div class="layout">
      <div class="table-wrap">
        <table aria-label="Roof strata, one column per layer, immediate roof first">
          <thead>
            <tr>
              <th scope="col">Field</th>
              ${p.layers.map(
                (l, i) => html`<th scope="col" data-layer=${i}>
                  <span class="pos">Layer ${i + 1}${this.position(i)}${group(i)}</span>
                  ${textField(this, { label: `Name of layer ${i + 1}`, path: `layers[${i}].name`, value: l.name, compact: true, size: 20, error: errorFor(this.fieldErrors, `layers[${i}].name`) })}
                  ${this.layerTools(l, i, n)}
                </th>`,
              )}
            </tr>
          </thead>
          <tbody>
            ${ROWS.map((row) =>
              row.kind === 'band'
                ? html`<tr>
                    <th class="band" colspan=${n + 1} scope="colgroup">${row.label}${row.note ? html` <span class="hint">(${row.note})</span>` : nothing}</th>
                  </tr>`
                : html`<tr>
                    <th scope="row">${row.label}</th>
                    ${p.layers.map((l, i) => html`<td>${this.cell(row, l, i)}</td>`)}
                  </tr>`,
            )}
          </tbody>
        </table>
        <button type="button" class="add" @click=${this.addLayer}>+ Add a layer above</button>
        <p class="hint">Layer 1 is the immediate roof; layers are listed upward. A new layer starts from a generic 0.5 m sedimentary bed with 3 MPa Brazilian strength — replace every value.</p>
      </div>
      <strata-column .project=${p} .analysis=${this.analysis} units=${this.units}></strata-column>
    </div>`;
  }
}

if (!customElements.get('strata-editor')) customElements.define('strata-editor', StrataEditor);

declare global {
  interface HTMLElementTagNameMap {
    'strata-editor': StrataEditor;
  }
}
