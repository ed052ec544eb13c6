/** Table-cell helpers: a number in the display unit (the column title carries the unit). */
import type { Quantity, UnitSystem } from '../../model/units';
import type { Cell } from '../document-types';
import { displayNumber } from '../format';
import { MISSING, numberText } from '../number-text';

export const textCell = (text: string): Cell => ({ text });

export function qCell(value: number | null | undefined, quantity: Quantity, units: UnitSystem, digits = 4): Cell {
  const v = value === undefined || value === null || !Number.isFinite(value) ? null : value;
  return { text: displayNumber(v, quantity, units, digits), value: v, numeric: true };
}

export function nCell(value: number | null | undefined, digits = 4): Cell {
  const v = value === undefined || value === null || !Number.isFinite(value) ? null : value;
  return { text: v === null ? MISSING : numberText(v, digits), value: v, numeric: true };
}
