/**
 * Readable form of a unit string as written in the calculation trace (mathjs syntax):
 * powers become superscripts, "*" becomes "·", "deg" becomes "°", and the dimensionless
 * markers "1" and "" become nothing.
 *
 *     unitText('kN/m^3')  // "kN/m³"
 *     unitText('deg')     // "°"
 *     unitText('1')       // ""
 */
import { superscript } from './number-text';

export function unitText(unit: string | null | undefined): string {
  if (unit === null || unit === undefined) return '';
  const trimmed = unit.trim();
  if (trimmed === '' || trimmed === '1' || trimmed === '-') return '';
  if (trimmed === 'deg') return '°';
  return trimmed
    .replace(/\^\(?(-?\d+)\)?/g, (_m, p: string) => superscript(p))
    .replace(/\s*\*\s*/g, '·')
    .replace(/\bdeg\b/g, '°')
    .replace(/\bpercent\b/g, '%');
}

/** A number followed by its unit ("11.25 kPa", "35°", "0.74"). */
export function withUnit(number: string, unit: string | null | undefined): string {
  const u = unitText(unit);
  if (u === '') return number;
  if (u === '°' || u === '%') return `${number}${u}`;
  return `${number} ${u}`;
}
