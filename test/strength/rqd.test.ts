import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rqdFromFrequency } from '../../src/strength/rqd';
import { expectClose } from '../helpers/expect-close';

describe('rqdFromFrequency', () => {
  it('rqdFromFrequency(5, 10, 20) is 90.98, 73.58, 40.60 — Priest & Hudson 1976 (METHODS §7)', () => {
    expectClose(rqdFromFrequency(5), 90.98, 1e-4);
    expectClose(rqdFromFrequency(10), 73.58, 1e-4);
    expectClose(rqdFromFrequency(20), 40.6, 1e-4);
  });

  it('rqdFromFrequency(0) is 100 — hand-derived: 100·e⁰·(0 + 1); tiny λ never rounds above 100', () => {
    expect(rqdFromFrequency(0)).toBe(100);
    // found by the property below: 1.887e-14 per m used to give 100.00000000000001
    expect(rqdFromFrequency(1.8873791418627664e-14)).toBeLessThanOrEqual(100);
  });

  it('rqdFromFrequency(3) is 96.306 — hand-derived: 100·e^(−0.3)·1.3 = 100·0.740818·1.3', () => {
    expectClose(rqdFromFrequency(3), 96.3064, 1e-5);
  });

  it('falls as the fracture frequency rises and stays in (0, 100] — Priest & Hudson 1976 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 500, noNaN: true }), fc.double({ min: 1e-3, max: 50, noNaN: true }), (lambda, step) => {
        const r = rqdFromFrequency(lambda);
        expect(r).toBeGreaterThan(0);
        expect(r).toBeLessThanOrEqual(100);
        expect(rqdFromFrequency(lambda + step)).toBeLessThan(r);
      }),
    );
  });

  it('rqdFromFrequency throws a RangeError for negative, NaN or infinite λ', () => {
    for (const bad of [-1, Number.NaN, Infinity]) expect(() => rqdFromFrequency(bad)).toThrow(RangeError);
  });
});
