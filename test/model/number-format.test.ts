import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { PRECISION, fieldText, numberText, roundSignificant } from '../../src/model/number-format';
import { formatQuantity, toDisplay } from '../../src/model/units';

// Conversion factors from METHODS §13: 1 ft = 0.3048 m; 1 lbf/ft³ = 0.157087 kN/m³;
// 1 psi = 6894.757 Pa. The precision rule itself (3 significant figures for results, 4 for a
// converted input, inputs as stored) is common practice for calculation sheets.
describe('the precision rule (model/number-format.ts)', () => {
  it('a result has 3 significant figures: 2.5 m in ft is "8.2" (2.5/0.3048 = 8.2021), 26 kN/m³ is "166" lbf/ft³ (26/0.157087 = 165.51)', () => {
    expect(numberText(2.5 / 0.3048)).toBe('8.2');
    expect(numberText(26 / 0.157087)).toBe('166');
    expect(formatQuantity(2.5, 'length', 'US')).toBe('8.2 ft');
    expect(formatQuantity(26, 'unitWeight', 'US')).toBe('166 lbf/ft³');
    expect(PRECISION.result).toBe(3);
  });

  it('a converted input has 4 significant figures: "8.202" ft and "165.5" lbf/ft³, never "8.2021" or "165.513"', () => {
    expect(fieldText(toDisplay(2.5, 'length', 'US'), true)).toBe('8.202');
    expect(fieldText(toDisplay(26, 'unitWeight', 'US'), true)).toBe('165.5');
    // 3 MPa = 435.11 psi (3e6 / 6894.757)
    expect(fieldText(toDisplay(3, 'stress', 'US'), true)).toBe('435.1');
  });

  it('an input in its stored unit is echoed as stored (up to 6 figures): 0.35, 1234.5, 0.123456', () => {
    expect(fieldText(0.35, false)).toBe('0.35');
    expect(fieldText(1234.5, false)).toBe('1234.5');
    expect(fieldText(0.123456, false)).toBe('0.123456');
    expect(fieldText(0.45000000001, false)).toBe('0.45');
  });

  it('whole-number digits are never rounded away, and halves round away from zero as by hand', () => {
    expect(numberText(12345.6)).toBe('12346');
    expect(roundSignificant(12345.6, 3)).toBe(12346);
    expect(roundSignificant(0.0012345, 3)).toBe(0.00123);
    expect(numberText(15.35)).toBe('15.4');
    expect(numberText(-15.35)).toBe('−15.4');
    expect(numberText(0.369)).toBe('0.369');
  });

  it('display text uses the true minus and ×10ⁿ outside 10⁻⁴…10⁶; field text stays parseable ("-", "e")', () => {
    expect(numberText(-2.5)).toBe('−2.5');
    expect(numberText(1.25e6)).toBe('1.25×10⁶');
    expect(numberText(-2e-5)).toBe('−2×10⁻⁵');
    expect(fieldText(-2e-5, false)).toBe('-2e-5');
    expect(Number(fieldText(-2e-5, false))).toBe(-2e-5);
  });

  it('missing and non-finite values print as "—" (display) or "" (field), never NaN or Infinity', () => {
    expect(numberText(Number.NaN)).toBe('—');
    expect(numberText(null)).toBe('—');
    expect(numberText(Number.NEGATIVE_INFINITY)).toBe('—');
    expect(fieldText(Number.NaN, true)).toBe('');
    expect(fieldText(null, false)).toBe('');
    expect(() => numberText(1, 0)).toThrow(RangeError);
  });

  it('property: field text parses back within half a unit of its last figure', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }).filter((x) => Math.abs(x) > 1e-3), fc.boolean(), (x, converted) => {
        const text = fieldText(x, converted);
        const back = Number(text);
        const digits = converted ? 4 : 6;
        return Number.isFinite(back) && Math.abs(back - x) <= 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(x))) - digits + 1) * (1 + 1e-9);
      }),
    );
  });

  it('property: a result never shows more than 3 significant figures unless they are whole-number digits', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e5, noNaN: true }), (x) => {
        const text = numberText(x);
        const digits = text.replace(/^0\.0*/, '').replace('.', '').replace(/^0+/, '');
        return digits.length <= Math.max(3, Math.floor(Math.log10(Number(text))) + 1);
      }),
    );
  });
});
