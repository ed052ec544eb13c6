/**
 * A result value in the chosen display unit system: the number as text (report's number
 * formatting, so the app and the report agree: the one precision rule of
 * model/number-format.ts) and the unit label. Display only: the
 * analysis always runs in file units.
 *     displayValue(6, 'length', 'US') // { text: "19.7", unit: "ft" }
 */
import { toDisplay, unitLabel, type Quantity, type UnitSystem } from '../../model/units';
import { numberText, PRECISION } from '../../model/number-format';

export interface DisplayedValue {
  text: string;
  unit: string;
}

export function displayValue(
  value: number | null | undefined,
  quantity: Quantity | null,
  units: UnitSystem,
  significant: number = PRECISION.result,
): DisplayedValue {
  if (value === null || value === undefined || !Number.isFinite(value)) {
    return { text: numberText(null), unit: quantity ? unitLabel(quantity, units) : '' };
  }
  if (!quantity) return { text: numberText(value, significant), unit: '' };
  return { text: numberText(toDisplay(value, quantity, units), significant), unit: unitLabel(quantity, units) };
}

/** Text with its unit, e.g. "19.7 ft"; a bare number when there is no unit. */
export function displayText(
  value: number | null | undefined,
  quantity: Quantity | null,
  units: UnitSystem,
  significant: number = PRECISION.result,
): string {
  const d = displayValue(value, quantity, units, significant);
  return d.unit ? `${d.text} ${d.unit}` : d.text;
}
