/**
 * Number text for input fields: up to `digits` significant digits, no exponent for ordinary
 * engineering magnitudes, no trailing zeros, "−0" shown as "0".
 *     formatInputNumber(0.45000000001) // "0.45"
 *     formatInputNumber(19.685039370) // "19.685"
 */
export function formatInputNumber(value: number | null | undefined, digits = 6): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  const v = Number(value.toPrecision(digits));
  if (v === 0) return '0';
  const abs = Math.abs(v);
  if (abs >= 1e-4 && abs < 1e15) return String(v);
  return v.toExponential();
}

/** Display text for a result number: `digits` significant digits, "—" for none. */
export function formatResult(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const v = Number(value.toPrecision(digits));
  return v === 0 ? '0' : String(v);
}
