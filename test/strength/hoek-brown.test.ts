import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hoekBrownParameters, rockMassTensileStrength, rockMassUcs } from '../../src/strength/hoek-brown';
import { expectClose } from '../helpers/expect-close';

describe('hoekBrownParameters', () => {
  it('hoekBrownParameters(50, 10, 0) is mb 1.67677, s 0.0038659, a 0.505734 — Hoek, Carranza-Torres & Corkum 2002 (METHODS §8)', () => {
    const { mb, s, a } = hoekBrownParameters(50, 10, 0);
    expectClose(mb, 1.67677, 5e-6);
    expectClose(s, 0.0038659, 2e-5);
    expectClose(a, 0.505734, 2e-6);
  });

  it('hoekBrownParameters(50, 10, 0.5) is mb 0.92462, s 0.0012726 — Hoek, Carranza-Torres & Corkum 2002 (METHODS §8)', () => {
    const { mb, s } = hoekBrownParameters(50, 10, 0.5);
    expectClose(mb, 0.92462, 1e-5);
    expectClose(s, 0.0012726, 5e-5);
  });

  it('hoekBrownParameters(100, mi, 0) is mb = mi, s = 1, a = 0.5 + (e^(−20/3) − e^(−20/3))/6 = 0.5 — hand-derived (intact rock)', () => {
    const { mb, s, a } = hoekBrownParameters(100, 7, 0);
    expectClose(mb, 7, 1e-15);
    expect(s).toBe(1);
    expectClose(a, 0.5, 1e-15);
  });

  it('mb and s rise with GSI and fall with D — Hoek, Carranza-Torres & Corkum 2002 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 99, noNaN: true }), fc.double({ min: 0, max: 0.9, noNaN: true }), (gsi, d) => {
        const p = hoekBrownParameters(gsi, 10, d);
        const higherGsi = hoekBrownParameters(gsi + 1, 10, d);
        const moreDisturbed = hoekBrownParameters(gsi, 10, d + 0.1);
        expect(higherGsi.mb).toBeGreaterThan(p.mb);
        expect(higherGsi.s).toBeGreaterThan(p.s);
        expect(moreDisturbed.mb).toBeLessThan(p.mb);
        expect(moreDisturbed.s).toBeLessThan(p.s);
        expect(p.a).toBeGreaterThanOrEqual(0.5);
      }),
    );
  });

  it('hoekBrownParameters throws a RangeError for GSI, mi or D out of range or NaN', () => {
    expect(() => hoekBrownParameters(101, 10, 0)).toThrow(/gsi/);
    expect(() => hoekBrownParameters(50, 0, 0)).toThrow(/mi/);
    expect(() => hoekBrownParameters(50, 10, 1.1)).toThrow(/disturbance/);
    expect(() => hoekBrownParameters(Number.NaN, 10, 0)).toThrow(RangeError);
  });
});

describe('rockMassTensileStrength and rockMassUcs', () => {
  it('rockMassTensileStrength(100 MPa, GSI 50, mi 10, D 0) is 0.2306 MPa — Hoek, Carranza-Torres & Corkum 2002 (METHODS §8)', () => {
    const { mb, s } = hoekBrownParameters(50, 10, 0);
    expectClose(rockMassTensileStrength(100e6, mb, s), 0.2306e6, 2e-4);
  });

  it('rockMassTensileStrength(100 MPa, GSI 50, mi 10, D 0.5) is 0.1376 MPa — Hoek, Carranza-Torres & Corkum 2002 (METHODS §8)', () => {
    const { mb, s } = hoekBrownParameters(50, 10, 0.5);
    expectClose(rockMassTensileStrength(100e6, mb, s), 0.1376e6, 5e-4);
  });

  it('rockMassUcs(100 MPa, GSI 50, mi 10, D 0) is 6.023 MPa — Hoek, Carranza-Torres & Corkum 2002 (METHODS §8)', () => {
    const { s, a } = hoekBrownParameters(50, 10, 0);
    expectClose(rockMassUcs(100e6, s, a), 6.023e6, 2e-4);
  });

  it('intact rock (s = 1) keeps σci and has tension σci/mi — hand-derived from the formulas', () => {
    expect(rockMassUcs(40e6, 1, 0.5)).toBe(40e6);
    expectClose(rockMassTensileStrength(40e6, 8, 1), 5e6, 1e-15);
  });

  it('rockMassTensileStrength and rockMassUcs throw a RangeError for bad inputs', () => {
    expect(() => rockMassTensileStrength(0, 1, 0.1)).toThrow(/ucs/);
    expect(() => rockMassTensileStrength(1e6, 0, 0.1)).toThrow(/mb/);
    expect(() => rockMassTensileStrength(1e6, 1, 2)).toThrow(/s must/);
    expect(() => rockMassUcs(1e6, 0.1, 0.4)).toThrow(/a must/);
    expect(() => rockMassUcs(Number.NaN, 0.1, 0.5)).toThrow(RangeError);
  });
});
