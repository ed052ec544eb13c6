import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import { failureProbability } from '../../src/uncertainty/failure-probability';
import { averageRanks, rankCorrelation } from '../../src/uncertainty/rank-correlation';
import { fsHistogram } from '../../src/uncertainty/histogram';
import { seeded } from '../helpers/seeded';
import { expectClose } from '../helpers/expect-close';

describe('failureProbability', () => {
  it('gives Wilson intervals as tabulated by Newcombe (Statistics in Medicine 17 (1998) 857–872, from memory)', () => {
    const check = (k: number, n: number, lo: number, hi: number) => {
      const r = failureProbability(k, n);
      expect(r.interval[0]).toBeCloseTo(lo, 4);
      expect(r.interval[1]).toBeCloseTo(hi, 4);
    };
    check(81, 263, 0.2553, 0.3662);
    check(15, 148, 0.0624, 0.1605);
    check(1, 29, 0.0061, 0.1718);
  });
  it('with no failure: the rule of three 3/N, β null with the bound −Φ⁻¹(3/N)', () => {
    const r = failureProbability(0, 20000);
    expect(r.pf).toBe(0);
    expect(r.interval).toEqual([0, 1.5e-4]);
    expect(r.intervalMethod).toBe('ruleOfThree');
    expect(r.beta).toBeNull();
    expectClose(r.betaAtLeast as number, -jStat.normal.inv(1.5e-4, 0, 1), 1e-9);
    expect(r.betaNote).toMatch(/no failure in 20000 samples/);
    const all = failureProbability(100, 100);
    expect(all.beta).toBeNull();
    expect(all.interval).toEqual([0.97, 1]);
  });
  it('β = −Φ⁻¹(P_f) and CoV √((1 − P)/(NP))', () => {
    const r = failureProbability(249, 10000);
    expectClose(r.beta as number, -jStat.normal.inv(0.0249, 0, 1), 1e-10);
    expectClose(r.cov as number, Math.sqrt(0.9751 / 249), 1e-14);
  });
  it('P_f and its interval stay in [0, 1], β finite or null, never NaN (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 1e7 }), fc.double({ min: 0, max: 1, noNaN: true }), (n, f) => {
      const r = failureProbability(Math.floor(f * n), n);
      expect(r.pf >= 0 && r.pf <= 1).toBe(true);
      expect(r.interval[0] >= 0 && r.interval[0] <= r.pf && r.pf <= r.interval[1] && r.interval[1] <= 1).toBe(true);
      expect(r.beta === null || Number.isFinite(r.beta)).toBe(true);
    }));
    expect(() => failureProbability(5, 4)).toThrow(/failures must be/);
  });
});

describe('rankCorrelation (Spearman, ties averaged)', () => {
  it('equals jstat.spearmancoeff, with and without ties', () => {
    const rnd = seeded(5);
    const x = Array.from({ length: 300 }, () => Math.round(rnd() * 20));
    const y = x.map((v) => v * v + Math.round(rnd() * 60));
    expectClose(rankCorrelation(x, y) as number, jStat.spearmancoeff(x, y), 1e-12);
    const a = Array.from({ length: 200 }, () => rnd());
    const b = a.map((v) => Math.exp(v) + rnd() * 0.5);
    expectClose(rankCorrelation(a, b) as number, jStat.spearmancoeff(a, b), 1e-12);
    expect(rankCorrelation([1, 2, 3, 4], [10, 20, 30, 25])).toBeCloseTo(0.8, 14); // 1 − 6Σd²/(n(n²−1)), common practice
  });
  it('averages tied ranks and gives null for a constant', () => {
    expect(Array.from(averageRanks([3, 1, 3, 2]))).toEqual([3.5, 1, 3.5, 2]);
    expect(rankCorrelation([2, 2, 2], [1, 2, 3])).toBeNull();
  });
});

describe('fsHistogram', () => {
  it('counts every finite sample once, in bins ordered and contiguous', () => {
    const rnd = seeded(2);
    const xs = Float64Array.from({ length: 5000 }, () => 0.5 + rnd() * 3);
    xs[0] = 1e6;
    xs[1] = Infinity;
    const h = fsHistogram(xs, 30);
    expect(h.total).toBe(4999);
    expect(h.bins.reduce((s, b) => s + b.count, 0) + h.above).toBe(4999);
    expect(h.above).toBeGreaterThanOrEqual(1);
    for (let k = 1; k < h.bins.length; k++) expect(h.bins[k].x0).toBe(h.bins[k - 1].x1);
    for (const b of h.bins) expect(xs.filter((v) => v >= b.x0 && (v < b.x1 || b === h.bins[h.bins.length - 1])).length).toBeGreaterThanOrEqual(b.count);
  });
});
