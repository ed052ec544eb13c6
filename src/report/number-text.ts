/**
 * Plain-text number formatting for the report: a fixed count of significant digits, trailing
 * zeros trimmed, the true minus sign, and "×10ⁿ" instead of JavaScript's "e" notation for very
 * small or large magnitudes. Never prints NaN or Infinity (returns "—" for non-finite input).
 *
 *     numberText(1.25e6)        // "1.25×10⁶"
 *     numberText(0.40404, 3)    // "0.404"
 *     numberText(-2.5)          // "−2.5"
 */
const SUPERSCRIPT: Record<string, string> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻',
};

/** Superscript form of an integer ("-3" → "⁻³"). */
export function superscript(text: string): string {
  return [...text].map((c) => SUPERSCRIPT[c] ?? c).join('');
}

export const MISSING = '—';

export function numberText(value: number | null | undefined, significant = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e6 || magnitude < 1e-4) {
    const [mantissa, exponent] = value.toExponential(Math.max(0, significant - 1)).split('e');
    const m = trimZeros(mantissa ?? '0');
    return `${m}×10${superscript(String(Number(exponent)))}`.replace('-', '−');
  }
  // Keep integers' digits (e.g. 1234.5 with 4 significant → 1235, not 1.235e3).
  const digits = Math.max(0, significant - 1 - Math.floor(Math.log10(magnitude)));
  const text = trimZeros(value.toFixed(Math.min(digits, 12)));
  return text === '-0' ? '0' : text.replace('-', '−');
}

function trimZeros(text: string): string {
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}
