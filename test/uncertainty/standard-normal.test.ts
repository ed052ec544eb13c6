import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import * as ss from 'simple-statistics';
import { erfc } from '../../src/uncertainty/erfc';
import { normalCdf, normalQuantile } from '../../src/uncertainty/standard-normal';
import { expectClose } from '../helpers/expect-close';

describe('erfc (W. J. Cody 1969)', () => {
  it('matches published values', () => {
    // Abramowitz & Stegun (1964) Table 7.1 (from memory): erfc(0.5) = 0.4795001222, erfc(1) = 0.1572992071,
    // erfc(2) = 0.004677734981; erfc(3) = 2.209049700e-5 and erfc(5) = 1.537459794e-12 (common practice).
    expect(erfc(0)).toBe(1);
    expectClose(erfc(0.5), 0.4795001221869535, 1e-13);
    expectClose(erfc(1), 0.15729920705028513, 1e-13);
    expectClose(erfc(2), 0.004677734981047266, 1e-13);
    expectClose(erfc(3), 2.209049699858544e-5, 1e-12);
    expectClose(erfc(5), 1.5374597944280349e-12, 1e-12);
    expectClose(erfc(-1), 2 - 0.15729920705028513, 1e-15);
    expect(erfc(30)).toBe(0);
    expect(erfc(-30)).toBe(2);
  });
  it('is decreasing and within [0, 2] (property)', () => {
    fc.assert(fc.property(fc.double({ min: -27, max: 27, noNaN: true }), fc.double({ min: 1e-6, max: 1, noNaN: true }), (x, dx) => {
      const a = erfc(x);
      expect(a >= 0 && a <= 2).toBe(true);
      expect(erfc(x + dx) <= a).toBe(true);
    }));
  });
});

describe('standard normal Φ and Φ⁻¹ against jstat 1.9.6', () => {
  it('Φ matches jstat to 1e-13 relative for |z| ≤ 3 and 1e-8 (jstat\'s own accuracy there) to z = −6 (β up to 6)', () => {
    for (let z = -6; z <= 6; z += 0.125) {
      const tol = z >= -3 ? 1e-13 : 1e-8;
      expectClose(normalCdf(z), jStat.normal.cdf(z, 0, 1), tol);
    }
  });
  it('keeps its relative accuracy further out, where jstat drifts (Φ(−5) = 2.866515718791939e-7, Φ(−7) = 1.279812543885835e-12, Φ(−8) = 6.220960574271784e-16: common practice, e.g. R pnorm)', () => {
    expectClose(normalCdf(-5), 2.866515718791939e-7, 1e-13);
    expectClose(normalCdf(-7), 1.279812543885835e-12, 1e-12);
    expectClose(normalCdf(-8), 6.220960574271784e-16, 1e-12);
    // jstat 1.9.6 is 1.9 % off at −8, which is why the far tail is checked against published values
    expect(Math.abs(jStat.normal.cdf(-8, 0, 1) / 6.220960574271784e-16 - 1)).toBeGreaterThan(0.01);
  });
  it('Φ⁻¹ matches jstat and inverts Φ to 1e-13 for β up to 8', () => {
    for (const p of [1e-9, 1e-6, 1e-3, 0.0249, 0.1, 0.3, 0.7, 0.9, 0.999]) {
      expectClose(normalQuantile(p), jStat.normal.inv(p, 0, 1), p < 1e-4 ? 1e-9 : 1e-12);
    }
    // beyond jstat's accuracy: Φ⁻¹(1e-15) = −7.941345326170997 (common practice, R qnorm)
    expectClose(normalQuantile(1e-15), -7.941345326170997, 1e-13);
    for (let z = -8; z <= 0; z += 0.25) expectClose(normalQuantile(normalCdf(z)), z, 1e-13);
    expect(normalQuantile(0.025)).toBeCloseTo(-1.959963984540054, 14); // common practice
    expect(normalQuantile(0.5)).toBe(0);
    expect(normalQuantile(0)).toBe(-Infinity);
    expect(normalQuantile(1)).toBe(Infinity);
    expect(() => normalQuantile(1.5)).toThrow(/within \[0, 1\]/);
    expect(() => normalQuantile(Number.NaN)).toThrow(/within \[0, 1\]/);
  });
  it('simple-statistics 7.8.8 is too coarse in the tails (why this file exists)', () => {
    // its Φ is a 4-digit table that never goes below 0.001, its Φ⁻¹ is off by 0.3 % at β = 3
    expect(ss.cumulativeStdNormalProbability(-4)).toBeGreaterThan(10 * jStat.normal.cdf(-4, 0, 1));
    expect(Math.abs(ss.probit(jStat.normal.cdf(-3, 0, 1)) + 3)).toBeGreaterThan(5e-3);
    expect(Math.abs(normalQuantile(jStat.normal.cdf(-3, 0, 1)) + 3)).toBeLessThan(1e-12);
  });
});
