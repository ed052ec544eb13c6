import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { brazilianTensileStrength } from '../../src/strength/brazilian';
import { expectClose } from '../helpers/expect-close';

describe('brazilianTensileStrength', () => {
  it('brazilianTensileStrength(10 kN, 54 mm, 27 mm) is 4.366 MPa — METHODS §5 (ISRM 1978)', () => {
    expectClose(brazilianTensileStrength(10e3, 0.054, 0.027), 4.366e6, 1e-3);
  });

  it('brazilianTensileStrength(20 kN, 54 mm, 27 mm) is 8.733 MPa — METHODS §5 (ISRM 1978)', () => {
    expectClose(brazilianTensileStrength(20e3, 0.054, 0.027), 8.733e6, 1e-3);
  });

  it('brazilianTensileStrength(π N, 2 m, 1 m) is exactly 1 Pa — hand-derived: 2π/(π·2·1) = 1', () => {
    expectClose(brazilianTensileStrength(Math.PI, 2, 1), 1, 1e-15);
  });

  it('is 2P/(πDL): proportional to P, inversely to D and to L — ISRM 1978 (scaling property)', () => {
    const size = fc.double({ min: 1e-3, max: 1, noNaN: true });
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1e6, noNaN: true }), size, size, fc.double({ min: 0.1, max: 10, noNaN: true }), (p, d, l, k) => {
        const base = brazilianTensileStrength(p, d, l);
        expectClose(brazilianTensileStrength(k * p, d, l), k * base, 1e-12);
        expectClose(brazilianTensileStrength(p, k * d, l), base / k, 1e-12);
        expectClose(brazilianTensileStrength(p, d, k * l), base / k, 1e-12);
      }),
    );
  });

  it('brazilianTensileStrength throws a RangeError naming the field for 0, negative, NaN or Infinity', () => {
    for (const bad of [0, -1, Number.NaN, Infinity]) {
      expect(() => brazilianTensileStrength(bad, 0.054, 0.027)).toThrow(/peakLoad/);
      expect(() => brazilianTensileStrength(1e4, bad, 0.027)).toThrow(/diameter/);
      expect(() => brazilianTensileStrength(1e4, 0.054, bad)).toThrow(/thickness/);
    }
    expect(() => brazilianTensileStrength(0, 0.054, 0.027)).toThrow(RangeError);
  });
});
