import { describe, expect, it } from 'vitest';
import { seededUniform } from '../../src/uncertainty/random';
import { createSampler } from '../../src/uncertainty/sampler';

describe('seededUniform (d3-random randomLcg)', () => {
  it('is the LCG x ← 1664525x + 1013904223 mod 2³² (Numerical Recipes §7.1), shifted half a step into (0, 1)', () => {
    const u = seededUniform(1);
    let x = 1;
    for (let i = 0; i < 1000; i++) {
      x = (1664525 * x + 1013904223) % 2 ** 32;
      expect(u()).toBe((x + 0.5) / 2 ** 32);
    }
  });
  it('same seed, same numbers; different seeds differ; bad seeds refused', () => {
    const a = seededUniform(7);
    const b = seededUniform(7);
    const c = seededUniform(8);
    const xs = Array.from({ length: 5 }, () => a());
    expect(Array.from({ length: 5 }, () => b())).toEqual(xs);
    expect(Array.from({ length: 5 }, () => c())).not.toEqual(xs);
    for (const bad of [-1, 1.5, 2 ** 31, Number.NaN]) expect(() => seededUniform(bad)).toThrow(/seed must be a whole number/);
  });
  it('has mean ½ and variance 1/12 over 1e5 draws (common practice: 5 standard errors)', () => {
    const u = seededUniform(3);
    let s = 0;
    let s2 = 0;
    const n = 1e5;
    for (let i = 0; i < n; i++) {
      const v = u();
      expect(v > 0 && v < 1).toBe(true);
      s += v;
      s2 += v * v;
    }
    expect(Math.abs(s / n - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(s2 / n - (s / n) ** 2 - 1 / 12)).toBeLessThan(1e-3);
  });
});

describe('createSampler', () => {
  const draw = (method: 'monteCarlo' | 'latinHypercube', samples: number, dimensions: number, seed: number) => {
    const s = createSampler({ method, samples, dimensions, seed });
    const out: number[][] = [];
    const u = new Float64Array(dimensions);
    while (s.next(u)) out.push(Array.from(u));
    return out;
  };
  it('Latin hypercube puts exactly one sample in each of the N strata of every variable (McKay et al. 1979)', () => {
    const n = 500;
    const points = draw('latinHypercube', n, 3, 1);
    expect(points.length).toBe(n);
    for (let j = 0; j < 3; j++) {
      const strata = points.map((p) => Math.floor(p[j] * n)).sort((a, b) => a - b);
      expect(strata).toEqual(Array.from({ length: n }, (_, k) => k));
    }
  });
  it('is deterministic by seed and differs between seeds and methods', () => {
    for (const m of ['monteCarlo', 'latinHypercube'] as const) {
      expect(draw(m, 50, 2, 4)).toEqual(draw(m, 50, 2, 4));
      expect(draw(m, 50, 2, 4)).not.toEqual(draw(m, 50, 2, 5));
    }
    expect(draw('monteCarlo', 50, 2, 4)).not.toEqual(draw('latinHypercube', 50, 2, 4));
  });
  it('every coordinate lies strictly inside (0, 1)', () => {
    for (const p of draw('latinHypercube', 2000, 4, 9)) for (const v of p) expect(v > 0 && v < 1).toBe(true);
  });
  it('refuses bad options', () => {
    expect(() => createSampler({ method: 'sobol' as 'monteCarlo', samples: 10, dimensions: 1, seed: 1 })).toThrow(/method must be/);
    expect(() => createSampler({ method: 'monteCarlo', samples: 0, dimensions: 1, seed: 1 })).toThrow(/samples must be/);
  });
});
