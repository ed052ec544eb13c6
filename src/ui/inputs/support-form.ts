/**
 * `<support-form>` — the inputs of the worksheet's support section (METHODS §12): standing
 * support, the rock-bolt pattern (length, capacity, spacing across and along, anchorage length,
 * action, shear capacity, pretension), the bolt FS target, and the optional Q-system ratings of
 * the empirical cross-check. Every field has its unit; in US units bolt forces show in kips and
 * lengths in ft (`model/units.ts`, quantity `boltForce`). A refused value stays in its field
 * with the model's message beside it; nothing else changes.
 *
 * @fires project-edit - one field changed (quantity inputs and selects)
 * @fires project-replace - bolts or Q ratings switched on or off (one undo step)
 */
import { LitElement, html, nothing } from 'lit';
import type { BoltPattern, Project, QRatings } from '../../model/types';
import type { UnitSystem } from '../../model/units';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { formGrid } from '../styles/form-grid';
import { errorFor, quantityField, selectField } from './field-templates';
import { fireReplace } from './events';
import './quantity-input';
import { DeferOffscreen } from '../app/defer-offscreen';

/** The pattern a user starts from when switching bolts on: 1.8 m, 100 kN at 1.2 × 1.2 m (common practice in coal roofs). */
export const STARTING_BOLTS: BoltPattern = {
  length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2, anchorage_m: 0.3,
  action: 'suspension', shearCapacity_kN: 60, pretension_kN: 0,
};

/** Q ratings to start from (a moderately jointed, dry rock mass; Barton, Lien & Lunde 1974 tables). */
export const STARTING_Q: QRatings = { jn: 9, jr: 1.5, ja: 1, jw: 1, srf: 1, esr: 1.6 };

const ACTION_CHOICES = [
  { value: 'suspension', label: 'Suspension — hang the lower beds from the anchor bed' },
  { value: 'beamBuilding', label: 'Beam building — grouted bolts bond the beds they cross' },
] as const;

export class SupportForm extends DeferOffscreen(LitElement) {
  static override properties = {
    project: { attribute: false },
    units: { type: String },
    fieldErrors: { attribute: false },
  };

  project!: Project;
  units: UnitSystem = 'SI';
  fieldErrors: ReadonlyArray<{ path: string; message: string }> = [];

  static override styles = [tokens, sheet, formGrid];

  private q(label: string, path: string, value: number | null, quantity: string, extra: { unitText?: string; nullable?: boolean; hint?: string } = {}) {
    return quantityField({ label, path, value, quantity, units: this.units, errors: this.fieldErrors, ...extra });
  }

  private setBolts(on: boolean): void {
    const p = structuredClone(this.project);
    if (on) {
      // Start within the strata: a bolt no longer than the column (the validator refuses a longer one).
      const strata = p.layers.reduce((t, l) => t + l.thickness_m, 0);
      const length_m = Math.min(STARTING_BOLTS.length_m, Math.floor(strata * 10) / 10 || strata);
      const anchorage_m = Math.min(STARTING_BOLTS.anchorage_m, length_m / 2);
      p.support.bolts = { ...STARTING_BOLTS, length_m, anchorage_m };
    } else {
      p.support.bolts = null;
    }
    fireReplace(this, p, on ? 'rock bolts added' : 'rock bolts removed');
  }

  private setQ(on: boolean): void {
    const p = structuredClone(this.project);
    p.empirical = { q: on ? { ...STARTING_Q } : null };
    fireReplace(this, p, on ? 'Q ratings added' : 'Q ratings removed');
  }

  override render() {
    const p = this.project;
    if (!p) return nothing;
    const b = p.support.bolts;
    const q = p.empirical.q;
    return html`<div class="grid">
      <fieldset class="bolts">
        <legend>Rock bolts</legend>
        <span class="line"><label><input type="checkbox" id="bolts-on" data-path="support.bolts" .checked=${b !== null}
          @change=${(e: Event) => this.setBolts((e.target as HTMLInputElement).checked)} /> Roof bolted</label></span>
        ${b
          ? html`${this.q('Bolt length', 'support.bolts.length_m', b.length_m, 'length', { hint: 'from the roof line to the tip; no longer than the strata' })}
              ${this.q('Capacity per bolt', 'support.bolts.capacity_kN', b.capacity_kN, 'boltForce', { hint: 'tensile capacity of the bolt system' })}
              ${this.q('Spacing across', 'support.bolts.spacingAcross_m', b.spacingAcross_m, 'length', { hint: 'across the opening' })}
              ${this.q('Spacing along', 'support.bolts.spacingAlong_m', b.spacingAlong_m, 'length', { hint: 'along the opening (row spacing)' })}
              ${this.q('Anchorage length', 'support.bolts.anchorage_m', b.anchorage_m, 'length', { hint: 'bonded length at the tip; it must lie in one layer' })}
              <span class="line">${selectField(this, { label: 'Action', path: 'support.bolts.action', value: b.action, choices: ACTION_CHOICES, error: errorFor(this.fieldErrors, 'support.bolts.action') })}</span>
              ${this.q('Shear capacity per bolt', 'support.bolts.shearCapacity_kN', b.shearCapacity_kN, 'boltForce', { hint: 'across a bedding plane (beam building); typically 0.6 × capacity' })}
              ${this.q('Pretension', 'support.bolts.pretension_kN', b.pretension_kN, 'boltForce', { hint: 'installed tension; adds friction on the bedding' })}`
          : html`<p class="hint">No bolts: tick “Roof bolted” to enter a pattern.</p>`}
      </fieldset>
      <fieldset class="standing">
        <legend>Standing support and target</legend>
        ${this.q('Standing support', 'support.standing_kPa', p.support.standing_kPa, 'pressure', { hint: 'props, cribs: upward from the floor; never more than the load it relieves' })}
        ${this.q('FS target, bolts', 'design.fsTarget.bolt', p.design.fsTarget.bolt, '', { unitText: '—', hint: 'bolt load and interlayer shear' })}
      </fieldset>
      <fieldset class="q-ratings">
        <legend>Empirical cross-check (Q system, not counted)</legend>
        <span class="line"><label><input type="checkbox" id="q-on" data-path="empirical.q" .checked=${q !== null}
          @change=${(e: Event) => this.setQ((e.target as HTMLInputElement).checked)} /> Give Q ratings</label></span>
        ${q
          ? html`${this.q('Joint set number Jn', 'empirical.q.jn', q.jn, '', { unitText: '—' })}
              ${this.q('Joint roughness Jr', 'empirical.q.jr', q.jr, '', { unitText: '—' })}
              ${this.q('Joint alteration Ja', 'empirical.q.ja', q.ja, '', { unitText: '—' })}
              ${this.q('Joint water Jw', 'empirical.q.jw', q.jw, '', { unitText: '—' })}
              ${this.q('Stress reduction SRF', 'empirical.q.srf', q.srf, '', { unitText: '—' })}
              ${this.q('Excavation support ratio ESR', 'empirical.q.esr', q.esr, '', { unitText: '—' })}
              <p class="hint">RQD comes from the immediate roof (layer 1).</p>`
          : nothing}
      </fieldset>
    </div>`;
  }
}

if (!customElements.get('support-form')) customElements.define('support-form', SupportForm);

declare global {
  interface HTMLElementTagNameMap {
    'support-form': SupportForm;
  }
}
