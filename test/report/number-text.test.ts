import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { numberText } from '../../src/report/number-text';
import { symbolText } from '../../src/report/symbol-text';
import { unitText, withUnit } from '../../src/report/unit-text';

describe('numberText', () => {
  it('numberText(0.40404, 3) is "0.404" and numberText(-2.5) is "−2.5" (true minus sign)', () => {
    expect(numberText(0.40404, 3)).toBe('0.404');
    expect(numberText(-2.5)).toBe('−2.5');
    expect(numberText(1234.5, 4)).toBe('1235');
    expect(numberText(6)).toBe('6');
    expect(numberText(0)).toBe('0');
  });
  it('numberText uses ×10ⁿ outside 1e-4..1e6: 1.25e6 → "1.25×10⁶", 2e-5 → "2×10⁻⁵"', () => {
    expect(numberText(1.25e6)).toBe('1.25×10⁶');
    expect(numberText(2e-5)).toBe('2×10⁻⁵');
  });
  it('numberText never prints NaN or Infinity ("—" instead)', () => {
    expect(numberText(Number.NaN)).toBe('—');
    expect(numberText(Number.POSITIVE_INFINITY)).toBe('—');
    expect(numberText(null)).toBe('—');
  });
  it('property: any finite number prints without NaN/Infinity/e-notation and round-trips to 4 significant digits', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }).filter((x) => Math.abs(x) > 1e-3), (x) => {
        const text = numberText(x, 4);
        if (/NaN|Infinity|e/.test(text)) return false;
        const back = Number(text.replace('−', '-'));
        return Math.abs(back - x) <= 5e-4 * Math.abs(x) + 1e-12;
      }),
    );
  });
});

describe('symbolText and unitText', () => {
  it('symbolText maps gamma → γ, sigma_h → σh, z0 → z₀, Delta_L → ΔL, and leaves others', () => {
    expect(symbolText('gamma')).toBe('γ');
    expect(symbolText('sigma_h')).toBe('σh');
    expect(symbolText('z0')).toBe('z₀');
    expect(symbolText('Delta_L')).toBe('ΔL');
    expect(symbolText('RQD')).toBe('RQD');
  });
  it('unitText renders kN/m^3 as kN/m³, deg as °, "1" as nothing', () => {
    expect(unitText('kN/m^3')).toBe('kN/m³');
    expect(unitText('deg')).toBe('°');
    expect(unitText('1')).toBe('');
    expect(withUnit('35', 'deg')).toBe('35°');
    expect(withUnit('6', 'm')).toBe('6 m');
  });
});
