import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import jStat from 'jstat';
import { distribution, makeDistribution } from '../../src/uncertainty/distributions';
import { expectClose } from '../helpers/expect-close';

/** ∫ f over [a, b] by composite Simpson (n even). */
function simpson(f: (x: number) => number, a: number, b: number, n = 4000): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

describe('distributions: moments and inverse against jstat 1.9.6', () => {
  it('normal (untruncated) is N(μ, σ)', () => {
    const d = distribution({ distribution: 'normal', mean: 2, cov: 0.25 });
    expect(d.mean).toBe(2);
    expectClose(d.variance, 0.25, 1e-15);
    for (const u of [1e-6, 0.01, 0.3, 0.5, 0.8, 0.999]) expectClose(d.quantile(u), jStat.normal.inv(u, 2, 0.5), 1e-11);
    expectClose(d.cdf(1.3), jStat.normal.cdf(1.3, 2, 0.5), 1e-13);
  });
  it('normal truncated to > 0 has the truncated moments (numerical integration of jstat\'s density)', () => {
    const d = distribution({ distribution: 'normal', mean: 1, sd: 0.8, min: 0 });
    const z = 1 - jStat.normal.cdf(0, 1, 0.8);
    const m1 = simpson((x) => x * jStat.normal.pdf(x, 1, 0.8), 0, 9) / z;
    const m2 = simpson((x) => x * x * jStat.normal.pdf(x, 1, 0.8), 0, 9) / z;
    expectClose(d.mean, m1, 1e-9);
    expectClose(d.variance, m2 - m1 * m1, 1e-8);
    expect(d.quantile(1e-9)).toBeGreaterThan(0);
    // F(x(u)) = u
    for (const u of [1e-8, 0.1, 0.5, 0.9, 1 - 1e-8]) expect(Math.abs(d.cdf(d.quantile(u)) - u)).toBeLessThan(1e-13);
  });
  it('a half-normal (truncated at its mean) has mean σ√(2/π) and keeps its upper tail (common practice)', () => {
    const d = distribution({ distribution: 'normal', mean: 0, sd: 1, min: 0 });
    expectClose(d.mean, Math.sqrt(2 / Math.PI), 1e-14);
    expectClose(d.variance, 1 - 2 / Math.PI, 1e-13);
    // P(X > x) = 2Φ(−x) = 1e-12 → x = −Φ⁻¹(5e-13)
    expectClose(d.quantile(1 - 1e-12), -jStat.normal.inv(5e-13, 0, 1), 1e-4);
    expectClose(d.fromStandardNormal(7), -jStat.normal.inv(jStat.normal.cdf(-7, 0, 1) / 2, 0, 1), 1e-6);
  });
  it('lognormal from mean and CoV has that mean and CoV; its quantile is jstat\'s with λ, ζ', () => {
    const d = distribution({ distribution: 'lognormal', mean: 2, cov: 0.25 });
    const zeta = Math.sqrt(Math.log(1 + 0.0625));
    const lambda = Math.log(2) - zeta * zeta / 2;
    expectClose(d.mean, jStat.lognormal.mean(lambda, zeta), 1e-13);
    expectClose(d.variance, jStat.lognormal.variance(lambda, zeta), 1e-12);
    for (const u of [1e-6, 0.2, 0.5, 0.97]) expectClose(d.quantile(u), jStat.lognormal.inv(u, lambda, zeta), 1e-11);
  });
  it('truncated lognormal moments match integration', () => {
    const d = distribution({ distribution: 'lognormal', mean: 2, cov: 0.5, max: 3 });
    const zeta = Math.sqrt(Math.log(1.25));
    const lambda = Math.log(2) - zeta * zeta / 2;
    const z = jStat.lognormal.cdf(3, lambda, zeta);
    const m1 = simpson((x) => x * jStat.lognormal.pdf(x, lambda, zeta), 1e-9, 3) / z;
    expectClose(d.mean, m1, 1e-7);
  });
  it('uniform and triangular moments and inverse equal jstat\'s', () => {
    const u = distribution({ distribution: 'uniform', min: 1, max: 4 });
    expectClose(u.mean, jStat.uniform.mean(1, 4), 1e-15);
    expectClose(u.variance, jStat.uniform.variance(1, 4), 1e-15);
    expectClose(u.quantile(0.3), jStat.uniform.inv(0.3, 1, 4), 1e-15);
    const t = distribution({ distribution: 'triangular', min: 1, max: 4, mode: 1.5 });
    expectClose(t.mean, jStat.triangular.mean(1, 4, 1.5), 1e-15);
    expectClose(t.variance, jStat.triangular.variance(1, 4, 1.5), 1e-14);
    for (const p of [0.01, 0.1, 0.5, 0.9]) expectClose(t.cdf(t.quantile(p)), p, 1e-12);
    expectClose(t.cdf(2), jStat.triangular.cdf(2, 1, 4, 1.5), 1e-14);
    // mode from the mean: c = 3m − a − b
    const tm = distribution({ distribution: 'triangular', min: 1, max: 4, mean: 2 });
    expectClose(tm.mean, 2, 1e-15);
    // from a mean and an sd: symmetric, with that sd
    const ts = distribution({ distribution: 'triangular', mean: 5, sd: 0.5 });
    expectClose(ts.sd, 0.5, 1e-14);
    const us = distribution({ distribution: 'uniform', mean: 5, cov: 0.1 });
    expectClose(us.sd, 0.5, 1e-14);
  });
  it('zero spread is a constant: every sample is the mean bit for bit (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 1e6, noNaN: true }), fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }),
      fc.constantFrom('normal', 'lognormal', 'uniform', 'triangular'), (m, u, name) => {
        const d = distribution({ distribution: name as 'normal', mean: m, cov: 0 });
        expect(d.constant).toBe(true);
        expect(d.quantile(u)).toBe(m);
        expect(d.fromStandardNormal(u * 10 - 5)).toBe(m);
      }));
  });
  it('samples stay inside the support and are never NaN (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0.01, max: 100, noNaN: true }), fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }), fc.double({ min: -40, max: 40, noNaN: true }), (m, v, u, z) => {
      for (const d of [
        distribution({ distribution: 'normal', mean: m, cov: v, min: 0 }),
        distribution({ distribution: 'lognormal', mean: m, cov: v }),
      ]) {
        for (const x of [d.quantile(u), d.fromStandardNormal(z)]) {
          expect(Number.isNaN(x)).toBe(false);
          expect(x >= 0).toBe(true);
        }
      }
    }));
  });
});

describe('distributions: refused parameters name the field', () => {
  const errors = (p: Parameters<typeof makeDistribution>[0]) => {
    const r = makeDistribution(p, 'uncertainty.variables[2]');
    return r.ok ? [] : r.errors.map((e) => e.message);
  };
  it('lists each problem with its path', () => {
    expect(errors({ distribution: 'normal', mean: 1, cov: -0.1 })).toEqual(['uncertainty.variables[2].cov: must be ≥ 0, got -0.1']);
    expect(errors({ distribution: 'uniform', min: 2, max: 2 })).toEqual(['uncertainty.variables[2].max: must be > min (2), got 2']);
    expect(errors({ distribution: 'uniform', min: 3, max: 2 })[0]).toMatch(/^uncertainty\.variables\[2\]\.max: must be > min/);
    expect(errors({ distribution: 'lognormal', mean: -1, cov: 0.1 })[0]).toMatch(/mean: must be > 0 for a lognormal, got -1/);
    expect(errors({ distribution: 'normal', mean: 1 })[0]).toMatch(/cov: is needed/);
    expect(errors({ distribution: 'normal', mean: 1, cov: 0.1, sd: 0.1 })[0]).toMatch(/sd: give cov or sd, not both/);
    expect(errors({ distribution: 'normal', mean: 1, sd: Number.NaN })[0]).toMatch(/sd: must be a finite number/);
    expect(errors({ distribution: 'weibull' as 'normal', mean: 1 })[0]).toMatch(/distribution: must be one of "normal", "lognormal", "uniform", "triangular", got "weibull"/);
    expect(errors({ distribution: 'triangular', min: 0, max: 1, mean: 0.9 })[0]).toMatch(/mean: must lie within/);
    expect(errors({ distribution: 'normal', mean: 5, sd: 1, min: 6 })[0]).toMatch(/mean: must be ≥ min/);
  });
});
