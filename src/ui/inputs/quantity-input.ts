/**
 * `<quantity-input>`: a labelled text field with a unit suffix. Accepts a number (in the
 * displayed unit) or a number with a unit (`20 ft`, `2500 psi`, `160 lbf/ft^3`) through the
 * model's strict `parseDisplayQuantity` — user text is never evaluated. The value property is
 * in the file unit of `quantity`; the field shows it in the current unit system.
 *
 * Without a `quantity` the field takes a plain number (`unitText` is then shown as the suffix);
 * with `nullable`, an empty field means "not given" (null).
 *
 * @fires project-edit - { path, value } with the value in the file unit, on every parsable input
 * @fires field-refused - { path, message } the text cannot be read (message null: it can again),
 *   so the app can mark its results stale while the field holds refused text
 */
import { LitElement, html, css, nothing, type PropertyValues } from 'lit';
import { parseDisplayQuantity, unitLabel, toDisplay, type Quantity, type UnitSystem } from '../../model/units';
import { tokens } from '../styles/tokens';
import { sheet } from '../styles/sheet';
import { fire, fireEdit } from './events';
import { formatInputNumber } from './format-number';
import { normaliseDecimalComma } from '../../model/decimal-comma';

const PLAIN_NUMBER = /^\s*[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?\s*$/;

let counter = 0;

export class QuantityInput extends LitElement {
  static override properties = {
    label: { type: String },
    path: { type: String },
    value: { attribute: false },
    quantity: { type: String },
    units: { type: String },
    unitText: { type: String, attribute: 'unit-text' },
    nullable: { type: Boolean },
    emptyText: { type: String, attribute: 'empty-text' },
    compact: { type: Boolean, reflect: true },
    error: { type: String },
    hint: { type: String },
    disabled: { type: Boolean },
    text: { state: true },
    localError: { state: true },
  };

  label = '';
  path = '';
  value: number | null = null;
  quantity: Quantity | '' = '';
  units: UnitSystem = 'SI';
  unitText = '';
  nullable = false;
  emptyText = '';
  /** Label visually hidden (still read by screen readers), e.g. inside a table row. */
  compact = false;
  /** Error from the model's validation for this path (shown under the field). */
  error = '';
  hint = '';
  disabled = false;
  text = '';
  localError = '';
  private readonly uid = `q${++counter}`;
  private hasRendered = false;

  static override styles = [
    tokens,
    sheet,
    css`
      :host {
        display: inline-block;
      }
      .row {
        display: flex;
        align-items: baseline;
        gap: 0.35em;
        flex-wrap: wrap;
      }
      label {
        min-width: 11em;
      }
      :host([compact]) .row {
        flex-wrap: nowrap;
      }
      :host([compact]) input {
        width: 6.2em;
      }
      :host([compact]) .unit {
        min-width: 0;
        white-space: nowrap;
      }
      input {
        width: 7.5em;
        text-align: right;
      }
      .unit {
        color: var(--lam-muted);
        min-width: 3em;
      }
      .error,
      .hint {
        display: block;
        max-width: 28em;
      }
    `,
  ];

  /**
   * The text the field should show for `value` in the current unit system, by the precision
   * rule: as stored in the file unit (SI), to 4 significant figures when converted (US).
   */
  private displayText(): string {
    if (this.value === null || this.value === undefined) return '';
    if (!Number.isFinite(this.value)) return '';
    const converted = this.quantity !== '' && this.units !== 'SI';
    const shown = this.quantity ? toDisplay(this.value, this.quantity, this.units) : this.value;
    return formatInputNumber(shown, converted);
  }

  /** Parse the field text to a file-unit value; throws with a message naming what was expected. */
  parse(text: string): number | null {
    if (text.trim() === '') {
      if (this.nullable) return null;
      throw new RangeError(`${this.label}: a value is required`);
    }
    if (this.quantity) {
      try {
        return parseDisplayQuantity(text, this.quantity, this.units);
      } catch (err) {
        throw new RangeError(`${this.label}: ${err instanceof Error ? err.message : String(err)}`);
      }
    }
    let plain: string;
    try {
      plain = normaliseDecimalComma(text); // "0,25" → "0.25"
    } catch (err) {
      throw new RangeError(`${this.label}: ${err instanceof Error ? err.message : String(err)}`);
    }
    if (!PLAIN_NUMBER.test(plain)) {
      throw new RangeError(`${this.label}: expected a number${this.unitText ? ` (${this.unitText})` : ''}, got ${JSON.stringify(text)}`);
    }
    return Number(plain);
  }

  protected override willUpdate(changed: PropertyValues<this>): void {
    if (!this.hasRendered || changed.has('units') || changed.has('quantity')) {
      this.showValue();
      return;
    }
    // Keep what the user is typing ("0." while the value is 0) unless the value really changed
    // from outside (undo, preset) or the app dropped this field's refusal: then show the value.
    const refusalDropped = changed.has('error') && Boolean(changed.get('error')) && !this.error;
    if ((changed.has('value') || refusalDropped) && !this.textHoldsValue()) this.showValue();
  }

  /** True when the field's text reads as the value it holds. */
  private textHoldsValue(): boolean {
    try {
      return sameValue(this.parse(this.text), this.value);
    } catch {
      return false;
    }
  }

  /** Show the held value; a refusal the field had is over, so tell the app. */
  private showValue(): void {
    const wasRefused = this.localError !== '' || this.error !== '';
    this.text = this.displayText();
    this.localError = '';
    if (wasRefused && this.hasRendered) fire(this, 'field-refused', { path: this.path, message: null });
  }

  protected override firstUpdated(): void {
    this.hasRendered = true;
  }

  private onInput(e: Event): void {
    this.text = (e.target as HTMLInputElement).value;
    let v: number | null;
    try {
      v = this.parse(this.text);
    } catch (err) {
      this.localError = err instanceof Error ? err.message : String(err);
      fire(this, 'field-refused', { path: this.path, message: this.localError });
      return;
    }
    if (this.localError) fire(this, 'field-refused', { path: this.path, message: null });
    this.localError = '';
    // Re-send an unchanged value when the model refused the last one, so its error clears.
    if (!sameValue(v, this.value) || this.error) fireEdit(this, this.path, v);
  }

  /** A plain number stays as typed ("2.50"); a number typed with a unit ("20 ft") shows converted. */
  private onBlur(): void {
    if (!this.localError && !this.error && !PLAIN_NUMBER.test(this.text)) this.text = this.displayText();
  }

  override render() {
    const id = `${this.uid}-in`;
    const unit = this.quantity ? unitLabel(this.quantity, this.units) : this.unitText;
    const message = this.localError || (this.error ? (this.error.startsWith(this.path) ? `${this.label} — ${this.error}` : `${this.label}: ${this.error}`) : '');
    return html`<form class="row" novalidate @submit=${preventSubmit}>
        <label for=${id} class=${this.compact ? 'sr-only' : ''}>${this.label}</label>
        <input
          id=${id}
          type="text"
          inputmode="decimal"
          autocomplete="off"
          spellcheck="false"
          .value=${this.text}
          placeholder=${this.nullable ? this.emptyText || 'none' : ''}
          ?disabled=${this.disabled}
          aria-invalid=${message ? 'true' : 'false'}
          aria-describedby="${this.uid}-msg"
          data-path=${this.path}
          @input=${this.onInput}
          @blur=${this.onBlur}
        /><span class="unit">${unit}</span>
      </form>
      <span id="${this.uid}-msg" role=${message ? 'alert' : nothing} class=${message ? 'error' : this.hint ? 'hint' : ''}
        >${message || this.hint}</span
      >`;
  }
}

/**
 * Each field sits in a form of its own, so the browser's form-filling helpers that scan a
 * field's form on every change see one field, not every unowned field of the page (in chromium
 * that scan took about 12 ms a key with the worksheet's ~60 fields). Enter never submits it.
 */
function preventSubmit(e: Event): void {
  e.preventDefault();
}

function sameValue(a: number | null | undefined, b: number | null | undefined): boolean {
  if (a === undefined || b === undefined) return false;
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b), 1e-300);
}

if (!customElements.get('quantity-input')) customElements.define('quantity-input', QuantityInput);

declare global {
  interface HTMLElementTagNameMap {
    'quantity-input': QuantityInput;
  }
}
