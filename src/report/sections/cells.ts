/** Table-cell helpers: a number in the display unit (the column title carries the unit). */
import type { Quantity, UnitSystem } from '../../model/units';
import type { Cell } from '../document-types';
import { displayNumber } from '../format';
import { MISSING, PRECISION, numberText } from '../number-text';
import { inputSignificant } from '../../model/number-format';

export const textCell = (text: string): Cell => ({ text });

export function qCell(value: number | null | undefined, quantity: Quantity, units: UnitSystem, digits: number = PRECISION.result): Cell {
  const v = value === undefined || value === null || !Number.isFinite(value) ? null : value;
  return { text: displayNumber(v, quantity, units, digits), value: v, numeric: true };
}

export function nCell(value: number | null | undefined, digits: number = PRECISION.result): Cell {
  const v = value === undefined || value === null || !Number.isFinite(value) ? null : value;
  return { text: v === null ? MISSING : numberText(v, digits), value: v, numeric: true };
}

/**
 * An input cell by the precision rule: as stored (quantity null, or SI display), or to 4
 * significant figures when converted to US units.
 */
export function inCell(value: number | null | undefined, quantity: Quantity | null, units: UnitSystem): Cell {
  const digits = inputSignificant(quantity !== null && units !== 'SI');
  return quantity === null ? nCell(value, digits) : qCell(value, quantity, units, digits);
}
