/**
 * Decimal commas as people type them: "2,5 m" is 2.5 m in most of Europe, South America and
 * elsewhere (ISO 80000-1 allows either the comma or the point as the decimal sign). Fields and
 * semicolon- or tab-separated lab tables accept them; this module turns one such number into
 * the point form the rest of the model reads.
 *
 * One comma between digits is read as the decimal sign, except where it could just as well be
 * a thousands separator: 1 to 3 digits (not a lone 0), a comma, then exactly 3 digits
 * ("1,250", "12,500 lbf"). Those are refused with a message rather than guessed, because
 * spreadsheets in English locales copy 1250 as "1,250" (common practice).
 *
 *     normaliseDecimalComma('2,5 m')   // "2.5 m"
 *     normaliseDecimalComma('-0,125')  // "-0.125"
 *     normaliseDecimalComma('2.5 m')   // "2.5 m" (unchanged)
 *     normaliseDecimalComma('1,250')   // throws AmbiguousNumberError
 */

/** A number whose comma could be a decimal sign or a thousands separator. */
export class AmbiguousNumberError extends RangeError {
  constructor(readonly text: string, integer: string, fraction: string) {
    super(
      `${JSON.stringify(text)} is ambiguous: the comma could separate thousands (${integer}${fraction}) or decimals (${integer}.${fraction}); ` +
        `write ${integer}${fraction} or ${integer}.${fraction}`,
    );
    this.name = 'AmbiguousNumberError';
  }
}

/** sign, integer digits, comma, fraction digits, optional exponent, optional unit text (no comma). */
const COMMA_NUMBER = /^(\s*[-+]?)(\d*),(\d+)([eE][-+]?\d+)?(\s*(?:[^\s\d,.][^,]*)?)$/;

/** True when `text` holds a number written with a decimal comma (ambiguous ones included). */
export function hasDecimalComma(text: string): boolean {
  return typeof text === 'string' && COMMA_NUMBER.test(text);
}

/**
 * Return `text` with a decimal comma replaced by a point; text without one is returned
 * unchanged (the caller's own parser then accepts or refuses it). Throws
 * `AmbiguousNumberError` for "1,250"-like text.
 */
export function normaliseDecimalComma(text: string): string {
  if (typeof text !== 'string' || !text.includes(',')) return text;
  const m = COMMA_NUMBER.exec(text);
  if (!m) return text;
  const [, sign, integer, fraction, exponent = '', rest = ''] = m;
  if (/^[1-9]\d{0,2}$/.test(integer) && fraction.length === 3 && exponent === '') {
    throw new AmbiguousNumberError(text.trim(), integer, fraction);
  }
  return `${sign}${integer === '' ? '0' : integer}.${fraction}${exponent}${rest}`;
}
