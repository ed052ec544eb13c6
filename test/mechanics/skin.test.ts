import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { skinCheck, type SkinInput } from '../../src/mechanics/skin';
import { expectClose } from '../helpers/expect-close';

const base: SkinInput = {
  thickness: 0.2,
  unitWeight: 25e3,
  modulus: 10e9,
  spacingAcross: 1.2,
  spacingAlong: 1.5,
  ucs: 30e6,
  frictionDeg: 30,
  jointSpacing: null,
};

describe('skinCheck — a suspended layer between bolts (METHODS §12)', () => {
  it('0.2 m skin, 1.2 × 1.5 m pattern: clamped span 1.5 m, σ = γs²/(2t) = 140.625 kPa, midspan 70.3125 kPa, δ = qs⁴/(32Et³) = 9.8877 µm (Obert & Duvall 1967, §1 formulas)', () => {
    const r = skinCheck(base);
    expect(r.span).toBe(1.5);
    expect(r.cracked).toBe(false);
    expect(r.voussoir).toBeNull();
    expectClose(r.elastic.maxTension, 140_625);
    expect(r.elastic.at).toBe('abutment');
    expectClose(r.elastic.midspanTension!, 70_312.5);
    // q s⁴/(32 E t³) = 5000 · 5.0625 / (32 · 10e9 · 0.008) = 25312.5 / 2.56e9
    expectClose(r.elastic.deflection, 25_312.5 / 2.56e9);
  });

  it('the span is the larger spacing, either way round', () => {
    expect(skinCheck({ ...base, spacingAcross: 1.5, spacingAlong: 1.2 }).span).toBe(1.5);
  });

  it('cracked skin (joints 1.0 m < span 1.5 m) uses the voussoir on the span: rigid limit fc = γs²/(1.5t) = 187.5 kPa at n = 0.75 (METHODS §3 algebra, Diederichs & Kaiser 1999)', () => {
    const r = skinCheck({ ...base, modulus: 1e15, jointSpacing: 1.0 });
    expect(r.cracked).toBe(true);
    expect(r.voussoir!.snapThrough).toBe(false);
    expectClose(r.voussoir!.maxCompression!, (25e3 * 1.5 ** 2) / (1.5 * 0.2), 1e-4);
    expectClose(r.voussoir!.n!, 0.75, 1e-3);
  });

  it('joints at or beyond the span leave the skin intact (cracked only when joint spacing < span)', () => {
    expect(skinCheck({ ...base, jointSpacing: 1.5 }).cracked).toBe(false);
    expect(skinCheck({ ...base, jointSpacing: 3 }).voussoir).toBeNull();
  });

  it('refuses bad input naming the parameter', () => {
    expect(() => skinCheck({ ...base, spacingAcross: -1 })).toThrow(/spacingAcross/);
    expect(() => skinCheck({ ...base, thickness: NaN })).toThrow(/thickness/);
    expect(() => skinCheck({ ...base, unitWeight: 0 })).toThrow(/unitWeight/);
    expect(() => skinCheck({ ...base, jointSpacing: 0 })).toThrow(/jointSpacing/);
    expect(() => skinCheck({ ...base, ucs: NaN })).toThrow(/ucs/);
    expect(() => skinCheck({ ...base, frictionDeg: 95 })).toThrow(/frictionDeg/);
  });
});

const skinArb = fc.record({
  thickness: fc.double({ min: 0.05, max: 0.6, noNaN: true }),
  unitWeight: fc.double({ min: 18e3, max: 28e3, noNaN: true }),
  modulus: fc.double({ min: 1e9, max: 50e9, noNaN: true }),
  ucs: fc.double({ min: 5e6, max: 100e6, noNaN: true }),
  frictionDeg: fc.double({ min: 20, max: 45, noNaN: true }),
  jointSpacing: fc.option(fc.double({ min: 0.1, max: 2, noNaN: true }), { nil: null }),
});

describe('skinCheck — more bolts', () => {
  it('a closer pattern never raises the skin tension, deflection or voussoir compression, and never turns a stable skin to snap-through (§1: σ ∝ s², δ ∝ s⁴; voussoir fc falls with s)', () => {
    fc.assert(
      fc.property(
        skinArb,
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 0.2, max: 1, noNaN: true }),
        (skin, sx, sy, k) => {
          const wide = skinCheck({ ...skin, spacingAcross: sx, spacingAlong: sy });
          const dense = skinCheck({ ...skin, spacingAcross: sx * k, spacingAlong: sy * k });
          expect(dense.elastic.maxTension).toBeLessThanOrEqual(wide.elastic.maxTension);
          expect(dense.elastic.deflection).toBeLessThanOrEqual(wide.elastic.deflection);
          if (dense.voussoir && wide.voussoir && !wide.voussoir.snapThrough) {
            expect(dense.voussoir.snapThrough).toBe(false);
            expect(dense.voussoir.fsCrushing!).toBeGreaterThanOrEqual(wide.voussoir.fsCrushing! * (1 - 1e-9));
          }
        },
      ),
    );
  });

  it('but the voussoir sliding FS s·tanφ/(4z) falls as the spacing closes: 0.2 m cracked skin, φ 30°, 1.5 m → 1.0 m drops it below 1.5 (Diederichs & Kaiser 1999 sliding formula)', () => {
    // Rigid limit z ≈ t/2: FS ≈ s·tan30°/(2t) = 1.5·0.577/0.4 = 2.17 at 1.5 m, 1.44 at 1.0 m.
    const at = (s: number) => skinCheck({ ...base, modulus: 5e9, jointSpacing: 0.5, spacingAcross: s, spacingAlong: s }).voussoir!.fsSliding!;
    expectClose(at(1.5), (1.5 * Math.tan(Math.PI / 6)) / 0.4, 0.01);
    expectClose(at(1.0), (1.0 * Math.tan(Math.PI / 6)) / 0.4, 0.01);
    expect(at(1.0)).toBeLessThan(1.5);
    expect(at(1.5)).toBeGreaterThan(1.5);
  });
});
