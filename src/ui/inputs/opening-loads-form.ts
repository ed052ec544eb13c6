/**
 * `<opening-loads-form>` — worksheet section 1: the opening (type, span or entry widths, slab
 * length and edges, ends), the loads, and the design targets and options (standing support and
 * bolts are in section 6, `<support-form>`).
 *
 * @fires project-edit - one field changed
 * @fires project-replace - the opening type, the slab edge option or the tensile basis changed
 * @fires app-notice - { notice } when switching the tensile basis also switched the tension target
 */
import { LitElement, html, nothing } from 'lit';
import type { Project, OpeningType, TensileBasis } from '../../model/types';
import { DEFAULT_TENSION_TARGET } from '../../model/defaults';
import type { UnitSystem } from '../../model/units';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { formGrid } from '../styles/form-grid';
import { checkboxField, choiceNote, errorFor, quantityField, selectField } from './field-templates';
import { fireReplace } from './events';
import './quantity-input';
import { isOverhang, openingWords } from '../../model/span-wording';
import { DeferOffscreen } from '../app/defer-offscreen';

const OPENING_CHOICES = [
  { value: 'beam', label: 'Long opening — roof beam (plane strain)' },
  { value: 'slab', label: 'Rectangular roof — slab on four edges' },
  { value: 'cantilever', label: 'Overhang — cantilever (bench, brow)' },
  { value: 'intersection', label: 'Intersection — beam on the diagonal of the entries' },
] as const;

const EDGE_CHOICES = [
  { value: 'clamped', label: 'Built in (clamped)' },
  { value: 'simple', label: 'Simply supported' },
  { value: 'free', label: 'Free (no support: fault, goaf edge)' },
] as const;

const TENSILE_BASIS_CHOICES = [
  {
    value: 'rockMass',
    label: 'Rock mass (default target 2)',
    note: 'The lab strength scaled down to the rock mass: the smaller of the block strength and the Hoek–Brown rock-mass strength.',
  },
  {
    value: 'lab',
    label: 'Lab (default target 4)',
    note: 'The characteristic lab strength with the size effect: the basis of Obert and Duvall’s tension factors of 4–8.',
  },
] as const;

const CRUSHING_CHOICES = [
  { value: 'rockMass', label: 'Rock-mass UCS σci·s^a (Hoek–Brown)' },
  { value: 'lab', label: 'UCS as given (lab)' },
] as const;

const END_CHOICES = [
  { value: 'clamped', label: 'Built in (clamped)' },
  { value: 'simple', label: 'Simply supported' },
] as const;

const CHARACTERISTIC_CHOICES = [
  { value: 'mean', label: 'Mean of the tests' },
  { value: 'lower5', label: 'Lower 5% fractile (EN 1990 Annex D)' },
  { value: 'cautiousMean', label: 'Cautious mean (EN 1997-1 §2.4.5.2)' },
  { value: 'lower5Log', label: 'Lognormal lower 5% fractile (EN 1990 D7.3)' },
] as const;

const BASIS_CHOICES = [
  { value: 'intact', label: 'Intact (tension counts)', note: 'An uncracked layer must not crack: its tension check counts.' },
  { value: 'jointed', label: 'Jointed (voussoir checks count)', note: 'The whole roof is taken as cracked: the voussoir checks count, tension does not.' },
] as const;

export class OpeningLoadsForm extends DeferOffscreen(LitElement) {
  static override properties = {
    project: { attribute: false },
    units: { type: String },
    fieldErrors: { attribute: false },
  };

  project!: Project;
  units: UnitSystem = 'SI';
  fieldErrors: ReadonlyArray<{ path: string; message: string }> = [];

  static override styles = [tokens, sheet, formGrid];

  private changeType(type: OpeningType): void {
    const p = structuredClone(this.project);
    p.opening.type = type;
    if (type === 'slab' || type === 'intersection') {
      // A slab needs its long side, an intersection its wider entry; start from a square the user then edits.
      if (!(p.opening.length_m !== null && p.opening.length_m >= p.opening.span_m)) p.opening.length_m = p.opening.span_m;
    } else {
      p.opening.length_m = null;
    }
    // Pillar corners give an intersection little fixity (METHODS §14).
    if (type === 'intersection') p.opening.ends = 'simple';
    if (type !== 'slab') p.opening.edges = null;
    fireReplace(this, p, 'opening type');
  }

  private setEdges(on: boolean): void {
    const p = structuredClone(this.project);
    p.opening.edges = on ? { short: p.opening.ends, long: p.opening.ends } : null;
    fireReplace(this, p, 'slab edges');
  }

  /**
   * Switch the tensile basis; when the tension target still equals the old basis' default,
   * switch it to the new basis' default too and say so (METHODS §10).
   */
  private changeTensileBasis(basis: TensileBasis): void {
    const p = structuredClone(this.project);
    const old = p.design.tensileBasis;
    if (basis === old) return;
    p.design.tensileBasis = basis;
    const switched = p.design.fsTarget.tension === DEFAULT_TENSION_TARGET[old];
    if (switched) p.design.fsTarget.tension = DEFAULT_TENSION_TARGET[basis];
    fireReplace(this, p, 'tensile basis');
    if (switched) {
      const notice = `Tensile basis “${basis}”: the tension target went from ${DEFAULT_TENSION_TARGET[old]} to ${DEFAULT_TENSION_TARGET[basis]}, the default of the new basis (it was at the old basis’ default).`;
      this.dispatchEvent(new CustomEvent('app-notice', { detail: { notice }, bubbles: true, composed: true }));
    }
  }

  private q(label: string, path: string, value: number | null, quantity: string, extra: { unitText?: string; nullable?: boolean; hint?: string } = {}) {
    return quantityField({ label, path, value, quantity, units: this.units, errors: this.fieldErrors, ...extra });
  }

  override render() {
    const p = this.project;
    if (!p) return nothing;
    const o = p.opening;
    const w = openingWords(o.type);
    const spanLabel = o.type === 'cantilever' ? 'Overhang length' : o.type === 'slab' ? 'Span (short side)' : o.type === 'intersection' ? 'Entry width w1 (narrower)' : 'Span';
    return html`<div class="grid">
      <fieldset>
        <legend>Opening</legend>
        <span class="line">
          <label class="field-label" for="opening-type">Opening type</label>
          <select id="opening-type" data-path="opening.type" @change=${(e: Event) => this.changeType((e.target as HTMLSelectElement).value as OpeningType)}>
            ${OPENING_CHOICES.map((c) => html`<option value=${c.value} ?selected=${c.value === o.type}>${c.label}</option>`)}
          </select>
        </span>
        ${this.q(spanLabel, 'opening.span_m', o.span_m, 'length')}
        ${o.type === 'slab' ? this.q('Length (long side)', 'opening.length_m', o.length_m, 'length', { hint: 'at least the span' }) : nothing}
        ${o.type === 'intersection'
          ? html`${this.q('Entry width w2 (wider)', 'opening.length_m', o.length_m, 'length', { hint: 'at least w1' })}
              <p class="hint">Checked as a beam spanning the diagonal √(w1² + w2²): an intersection rests on pillar corners.</p>`
          : nothing}
        <span class="line">
          ${o.type === 'cantilever'
            ? html`<span class="hint">Ends: a cantilever is built in at its root.</span>`
            : selectField(this, {
                label: o.type === 'slab' ? 'Edges' : 'Ends',
                path: 'opening.ends',
                value: o.ends,
                choices: END_CHOICES,
                error: errorFor(this.fieldErrors, 'opening.ends'),
              })}
        </span>
        ${o.type === 'slab'
          ? html`<span class="line">
                <label><input type="checkbox" data-path="opening.edges" .checked=${o.edges !== null}
                  @change=${(e: Event) => this.setEdges((e.target as HTMLInputElement).checked)} />
                  Set each edge pair (a side that is not solid rock)</label>
              </span>
              ${o.edges
                ? html`<span class="line">${selectField(this, { label: 'Short edges', path: 'opening.edges.short', value: o.edges.short, choices: EDGE_CHOICES })}</span>
                    <span class="line">${selectField(this, { label: 'Long edges', path: 'opening.edges.long', value: o.edges.long, choices: EDGE_CHOICES, error: errorFor(this.fieldErrors, 'opening.edges') })}</span>`
                : nothing}`
          : nothing}
      </fieldset>
      <fieldset>
        <legend>Loads</legend>
        ${this.q('Surcharge on top', 'loads.surcharge_kPa', p.loads.surcharge_kPa, 'pressure', { hint: 'extra pressure on the top of the analysed strata' })}
        ${this.q('Horizontal stress', 'loads.horizontalStress_MPa', p.loads.horizontalStress_MPa, 'stress', { hint: `along the ${w.span}, compression positive` })}
        <p class="hint">Standing support and rock bolts: section 6, Support.</p>
      </fieldset>
      <fieldset>
        <legend>Design targets</legend>
        ${this.q('FS target, tension', 'design.fsTarget.tension', p.design.fsTarget.tension, '', { unitText: '—' })}
        ${this.q('FS target, crushing', 'design.fsTarget.crushing', p.design.fsTarget.crushing, '', { unitText: '—' })}
        ${this.q('FS target, sliding', 'design.fsTarget.sliding', p.design.fsTarget.sliding, '', { unitText: '—' })}
        ${this.q('Deflection limit δ/t', 'design.deflectionLimitRatio', p.design.deflectionLimitRatio, '', { unitText: '—', hint: isOverhang(o.type) ? 'voussoir deflection / thickness (an overhang forms no arch)' : 'voussoir midspan deflection / thickness' })}
        ${o.type === 'cantilever'
          ? html`<p class="hint">An overhang has no voussoir arch: only the tension target applies to it.</p>`
          : nothing}
      </fieldset>
      <fieldset>
        <legend>Design options</legend>
        <span class="line">${selectField(this, { label: 'Characteristic strength', path: 'design.characteristic', value: p.design.characteristic, choices: CHARACTERISTIC_CHOICES })}</span>
        <span class="line">${selectField(this, { label: 'Design basis', path: 'design.basis', value: p.design.basis, choices: BASIS_CHOICES })}</span>
        <span class="line">
          <label class="field-label" for="tensile-basis">Tensile basis</label>
          <select id="tensile-basis" data-path="design.tensileBasis" @change=${(e: Event) => this.changeTensileBasis((e.target as HTMLSelectElement).value as TensileBasis)}>
            ${TENSILE_BASIS_CHOICES.map((c) => html`<option value=${c.value} ?selected=${c.value === p.design.tensileBasis}>${c.label}</option>`)}
          </select>
          ${choiceNote(TENSILE_BASIS_CHOICES, p.design.tensileBasis)}
        </span>
        <span class="line">${selectField(this, { label: 'Crushing strength (voussoir)', path: 'design.crushingStrength', value: p.design.crushingStrength, choices: CRUSHING_CHOICES })}</span>
        <span class="line">${checkboxField(this, {
          label: 'Plane-strain modulus E/(1−ν²) in deflection and Euler stress',
          path: 'design.planeStrainModulus',
          value: p.design.planeStrainModulus,
        })}</span>
      </fieldset>
    </div>`;
  }
}

if (!customElements.get('opening-loads-form')) customElements.define('opening-loads-form', OpeningLoadsForm);

declare global {
  interface HTMLElementTagNameMap {
    'opening-loads-form': OpeningLoadsForm;
  }
}
