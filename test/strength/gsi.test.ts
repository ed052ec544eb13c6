import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gsiFromJointing } from '../../src/strength/gsi';

describe('gsiFromJointing', () => {
  it('gsiFromJointing(20, 80) is 70 — Hoek, Carter & Diederichs 2013 (METHODS §7)', () => {
    expect(gsiFromJointing(20, 80)).toBe(70);
  });

  it('gsiFromJointing(0, 0) is 0 and gsiFromJointing(30, 100) is 95 — hand-derived: 1.5·30 + 100/2', () => {
    expect(gsiFromJointing(0, 0)).toBe(0);
    expect(gsiFromJointing(30, 100)).toBe(95);
  });

  it('rises with JCond89 and with RQD and stays within [0, 100] — Hoek, Carter & Diederichs 2013 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 29, noNaN: true }), fc.double({ min: 0, max: 99, noNaN: true }), (j, r) => {
        const g = gsiFromJointing(j, r);
        expect(g).toBeGreaterThanOrEqual(0);
        expect(g).toBeLessThanOrEqual(100);
        expect(gsiFromJointing(j + 1, r)).toBeGreaterThan(g);
        expect(gsiFromJointing(j, r + 1)).toBeGreaterThan(g);
      }),
    );
  });

  it('gsiFromJointing throws a RangeError outside JCond89 0–30 or RQD 0–100, or for NaN', () => {
    expect(() => gsiFromJointing(31, 50)).toThrow(/jointCondition/);
    expect(() => gsiFromJointing(-1, 50)).toThrow(RangeError);
    expect(() => gsiFromJointing(10, 101)).toThrow(/rqd/);
    expect(() => gsiFromJointing(Number.NaN, 50)).toThrow(RangeError);
    expect(() => gsiFromJointing(10, Number.NaN)).toThrow(RangeError);
  });
});
