/**
 * The one precision rule for every number Lamina shows (worksheet, report, CLI, charts).
 *
 *   result          3 significant figures: computed values, factors of safety, targets and
 *                   any number given in a sentence or a table (8.2021 ft → "8.2 ft",
 *                   165.513 lbf/ft³ → "166 lbf/ft³"). The inputs behind a result are rarely
 *                   known to better than a few per cent, so a fourth figure would be noise.
 *   convertedInput  4 significant figures: an input shown in a unit other than the one it is
 *                   stored in (the US display of an SI project file), so that a value the
 *                   user only looks at is not visibly rounded (8.202 ft, 165.5 lbf/ft³).
 *   storedInput     an input shown in the unit it is stored in is echoed as stored, up to 6
 *                   significant figures (0.35 m stays "0.35", 1234.5 stays "1234.5"); text the
 *                   user typed stays in the field as typed.
 *   trace           6 significant figures in the calculation trace, so each step can be
 *                   redone by hand to the figures the next step used.
 *
 * Whole-number digits are never rounded away (12 345 psi stays "12345", not "12300"), trailing
 * zeros are dropped, magnitudes outside 10⁻⁴…10⁶ are written with "×10ⁿ", display text uses the
 * true minus sign, and non-finite values print as "—" (never NaN or Infinity). Field text (what
 * an input box shows) uses the plain "-" and "e" so that it parses back.
 *
 * Source: reporting to 3 significant figures is common practice in geotechnical calculation
 * sheets; the figures above are Lamina's choice.
 *
 *     numberText(8.202099737)             // "8.2"
 *     numberText(165.5137, PRECISION.convertedInput) // "165.5"
 *     numberText(1.25e6)                  // "1.25×10⁶"
 *     fieldText(8.202099737, true)        // "8.202"
 */
export const PRECISION = Object.freeze({ result: 3, convertedInput: 4, storedInput: 6, trace: 6 });

const SUPERSCRIPT: Record<string, string> = {
  '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻',
};

/** Superscript form of an integer ("-3" → "⁻³"). */
export function superscript(text: string): string {
  return [...text].map((c) => SUPERSCRIPT[c] ?? c).join('');
}

/** What a missing or non-finite number prints as. */
export const MISSING = '—';

/**
 * `value` rounded to `significant` figures without rounding away whole-number digits
 * (roundSignificant(12345.6, 3) = 12346). Non-finite input is returned unchanged.
 */
export function roundSignificant(value: number, significant: number = PRECISION.result): number {
  if (!Number.isFinite(value) || value === 0) return value;
  checkDigits(significant);
  const wholeDigits = Math.floor(Math.log10(Math.abs(value))) + 1;
  const rounded = Number(value.toPrecision(Math.min(Math.max(significant, wholeDigits), 15)));
  return rounded === 0 ? 0 : rounded;
}

/** Plain decimal text of a rounded number ("8.2", "12346", "0.00052"; "2e-7" outside 10⁻⁴…10⁶). */
function plain(value: number, significant: number): string {
  const magnitude = Math.abs(value);
  if (magnitude >= 1e6 || magnitude < 1e-4) return trimExponent(value.toExponential(significant - 1));
  const digits = Math.min(12, Math.max(0, significant - 1 - Math.floor(Math.log10(magnitude))));
  // Round the decimal text, half away from zero (15.35 → "15.4", as by hand; toFixed alone
  // would round the binary value 15.3499… down).
  const rounded = Number(`${Math.round(Number(`${magnitude}e${digits}`))}e-${digits}`);
  const text = trimZeros(rounded.toFixed(digits));
  return text === '0' ? '0' : value < 0 ? `-${text}` : text;
}

/** Display text of a number by the rule: `significant` figures (default: a result). */
export function numberText(value: number | null | undefined, significant: number = PRECISION.result): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  checkDigits(significant);
  if (value === 0) return '0';
  const text = plain(value, significant);
  const exp = /^(-?[\d.]+)e(-?\d+)$/.exec(text);
  if (exp) return `${exp[1]}×10${superscript(String(Number(exp[2])))}`.replace('-', '−');
  return text.replace('-', '−');
}

/**
 * Text for an input box: a converted input to 4 significant figures, an input in its stored
 * unit as stored (up to 6). Plain ASCII ("-", "e") so the text parses back; "" when missing.
 */
export function fieldText(value: number | null | undefined, converted: boolean): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  if (value === 0) return '0';
  return plain(value, inputSignificant(converted));
}

/** Significant figures for an input: 4 when converted for display, 6 (as stored) otherwise. */
export const inputSignificant = (converted: boolean): number => (converted ? PRECISION.convertedInput : PRECISION.storedInput);

function checkDigits(significant: number): void {
  if (!(Number.isInteger(significant) && significant >= 1 && significant <= 15)) {
    throw new RangeError(`significant figures must be an integer from 1 to 15, got ${significant}`);
  }
}

function trimZeros(text: string): string {
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

function trimExponent(text: string): string {
  const [mantissa, exponent] = text.split('e');
  return `${trimZeros(mantissa ?? '0')}e${Number(exponent) < 0 ? '-' : ''}${Math.abs(Number(exponent))}`;
}
