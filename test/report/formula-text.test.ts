import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { create, all } from 'mathjs';
import { formulaSymbols, formulaText, substitutedText } from '../../src/report/formula-text';

const math = create(all, {});

describe('formulaText', () => {
  it('formulaText("q * s^2 / (2 * t^2)") is "q · s²/(2 · t²)" — clamped abutment tension, Obert & Duvall 1967', () => {
    expect(formulaText('q * s^2 / (2 * t^2)')).toBe('q · s²/(2 · t²)');
  });
  it('formulaText renders Greek names, subscript digits, √ and minus signs (common practice notation)', () => {
    expect(formulaText('sqrt((3*s/8)*(8*z0^2/(3*s) - Delta_L))')).toBe('√((3 · s/8) · (8 · z₀²/(3 · s) − ΔL))');
    expect(formulaText('gamma * t - sigma_h')).toBe('γ · t − σh');
    expect(formulaText('pi^2 * E * t^2 / (3 * s^2)')).toBe('π² · E · t²/(3 · s²)');
    expect(formulaText('x^-2')).toBe('x⁻²');
    expect(formulaText('(50/d)^0.18')).toBe('(50/d)^0.18');
    expect(formulaText('abs(a)')).toBe('|a|');
    expect(formulaText('log(x)')).toBe('ln(x)');
  });
  it('formulaText throws on an expression mathjs cannot parse', () => {
    expect(() => formulaText('q * (s')).toThrow();
  });
});

describe('substitutedText', () => {
  it('substitutes values with units and brackets powers of united values (hand-checked layout)', () => {
    const text = substitutedText('q * s^2 / (2 * t^2) - sigma_h', {
      q: { value: 11.25, unit: 'kPa' }, s: { value: 6, unit: 'm' }, t: { value: 0.45, unit: 'm' },
      sigma_h: { value: -0.5, unit: 'MPa' },
    });
    expect(text).toBe('11.25 kPa · (6 m)²/(2 · (0.45 m)²) − (−0.5 MPa)');
  });
  it('substitutes dimensionless values and degrees (common practice notation)', () => {
    expect(substitutedText('fc * n * tan(phi)', { fc: { value: 1.3, unit: 'MPa' }, n: { value: 0.74, unit: '1' }, phi: { value: 35, unit: 'deg' } }))
      .toBe('1.3 MPa · 0.74 · tan(35°)');
  });
  it('a symbol without a value stays a symbol', () => {
    expect(substitutedText('2 * P / (pi * D * L)', { P: { value: 10, unit: 'kN' }, D: { value: 54, unit: 'mm' }, L: { value: 27, unit: 'mm' } }))
      .toBe('2 · 10 kN/(π · 54 mm · 27 mm)');
  });
  it('property: the substituted text, with · → * and units dropped, evaluates like the expression (dimensionless values)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1000, noNaN: true }),
        fc.double({ min: 0.01, max: 1000, noNaN: true }),
        fc.double({ min: 0.01, max: 10, noNaN: true }),
        (q, s, t) => {
          const expr = 'q * s^2 / (2 * t^2) + sqrt(q) - s / (t + 1)';
          const values = { q: { value: q, unit: '' }, s: { value: s, unit: '' }, t: { value: t, unit: '' } };
          const ascii = substitutedText(expr, values)
            .replace(/·/g, '*').replace(/−/g, '-').replace(/²/g, '^2').replace(/√/g, 'sqrt').replace(/×10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)/g, (_m, e: string) => `e${[...e].map((c) => '⁻⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c) === 0 ? '-' : String('⁻⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c) - 1)).join('')}`);
          const expected = Number(math.evaluate(expr, { q, s, t }));
          const got = Number(math.evaluate(ascii));
          // values are printed to 6 significant digits, so agreement to ~1e-4 relative is expected
          return Math.abs(got - expected) <= 1e-4 * Math.max(1, Math.abs(expected));
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('formulaSymbols', () => {
  it('lists symbols in order of first use, without function names', () => {
    expect(formulaSymbols('fc * n * tan(phi) / (gamma_eff * s) + fc')).toEqual(['fc', 'n', 'phi', 'gamma_eff', 's']);
  });
});
