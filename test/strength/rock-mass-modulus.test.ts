import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rockMassModulus } from '../../src/strength/rock-mass-modulus';
import { expectClose } from '../helpers/expect-close';

describe('rockMassModulus', () => {
  it('rockMassModulus(50 GPa, GSI 50, D 0) is 15.359 GPa — Hoek & Diederichs 2006 (METHODS §8)', () => {
    expectClose(rockMassModulus(50e9, 50, 0), 15.359e9, 5e-5);
  });

  it('rockMassModulus(Ei, 60, 0) is 0.52·Ei — hand-derived: 0.02 + 1/(1 + e⁰) = 0.52', () => {
    expectClose(rockMassModulus(10e9, 60, 0), 5.2e9, 1e-14);
  });

  it('rises with GSI, falls with D, stays within (0.02·Ei, 1.02·Ei) — Hoek & Diederichs 2006 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 99, noNaN: true }), fc.double({ min: 0, max: 0.9, noNaN: true }), (gsi, d) => {
        const e = rockMassModulus(1e9, gsi, d);
        expect(e).toBeGreaterThan(0.02e9);
        expect(e).toBeLessThan(1.02e9);
        expect(rockMassModulus(1e9, gsi + 1, d)).toBeGreaterThan(e);
        expect(rockMassModulus(1e9, gsi, d + 0.1)).toBeLessThan(e);
      }),
    );
  });

  it('rockMassModulus throws a RangeError for Ei ≤ 0, GSI or D out of range, NaN', () => {
    expect(() => rockMassModulus(0, 50, 0)).toThrow(/intact modulus/);
    expect(() => rockMassModulus(1e9, -1, 0)).toThrow(/gsi/);
    expect(() => rockMassModulus(1e9, 50, Number.NaN)).toThrow(/disturbance/);
  });
});
