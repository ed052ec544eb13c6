import { describe, expect, it } from 'vitest';
import { AmbiguousNumberError, normaliseDecimalComma } from '../../src/model/decimal-comma';
import { UnitError, parseQuantity } from '../../src/model/units';

// The decimal sign may be a comma or a point (ISO 80000-1, §7.3.2); "1,250" is also how an
// English-locale spreadsheet writes 1250 (common practice), so that form is refused.
describe('normaliseDecimalComma', () => {
  it('reads one comma between digits as the decimal sign, keeping sign, exponent and unit', () => {
    expect(normaliseDecimalComma('2,5 m')).toBe('2.5 m');
    expect(normaliseDecimalComma('-0,125')).toBe('-0.125');
    expect(normaliseDecimalComma(' +12,75 MPa ')).toBe(' +12.75 MPa ');
    expect(normaliseDecimalComma(',5')).toBe('0.5');
    expect(normaliseDecimalComma('2,5e3 kPa')).toBe('2.5e3 kPa');
    expect(normaliseDecimalComma('1234,567')).toBe('1234.567');
    expect(normaliseDecimalComma('0,250')).toBe('0.250');
  });

  it('leaves text without a decimal comma unchanged (the caller refuses what it cannot read)', () => {
    for (const t of ['2.5 m', '20 ft', '', 'abc', '1,2,3', '1.234,5', '2, 5', '2 ,5']) expect(normaliseDecimalComma(t)).toBe(t);
  });

  it('refuses a comma that could be a thousands separator, saying both readings', () => {
    expect(() => normaliseDecimalComma('1,250')).toThrow(AmbiguousNumberError);
    expect(() => normaliseDecimalComma('12,500 lbf')).toThrow('"12,500 lbf" is ambiguous: the comma could separate thousands (12500) or decimals (12.500); write 12500 or 12.500');
  });
});

describe('decimal commas in quantity fields (issue 13)', () => {
  it('parseQuantity("2,5 m", "m") is 2.5 and "2,5 ft" is 0.762 m (1 ft = 0.3048 m, METHODS §13)', () => {
    expect(parseQuantity('2,5 m', 'm')).toBe(2.5);
    expect(parseQuantity('2,5', 'm')).toBe(2.5);
    expect(parseQuantity('2,5 ft', 'm')).toBeCloseTo(2.5 * 0.3048, 12);
  });

  it('ambiguous and malformed commas are still refused', () => {
    expect(() => parseQuantity('1,250 m', 'm')).toThrow(/ambiguous/);
    expect(() => parseQuantity('1,2,3 m', 'm')).toThrow(UnitError);
  });
});
