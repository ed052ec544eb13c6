import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { distribution } from '../../src/uncertainty/distributions';
import { form } from '../../src/uncertainty/form';
import { normalCdf } from '../../src/uncertainty/standard-normal';

// METHODS §16: R μ 2 V 0.25, S μ 1 V 0.1; β = 1.961 (normal), 2.514 (lognormal)
const nR = distribution({ distribution: 'normal', mean: 2, cov: 0.25 });
const nS = distribution({ distribution: 'normal', mean: 1, cov: 0.1 });
const lR = distribution({ distribution: 'lognormal', mean: 2, cov: 0.25 });
const lS = distribution({ distribution: 'lognormal', mean: 1, cov: 0.1 });
const betaNormal = 1 / Math.sqrt(0.26);
const zR = Math.sqrt(Math.log(1.0625));
const zS = Math.sqrt(Math.log(1.01));
const betaLog = (Math.log(2) - zR * zR / 2 + zS * zS / 2) / Math.sqrt(zR * zR + zS * zS);

describe('FORM (Hasofer–Lind, Rackwitz–Fiessler)', () => {
  it('reproduces the closed-form β within 1 % (METHODS §16), for g = R − S and g = R/S − 1', () => {
    for (const [d, beta] of [[[nR, nS], betaNormal], [[lR, lS], betaLog]] as const) {
      for (const g of [(x: Float64Array) => x[0] - x[1], (x: Float64Array) => x[0] / x[1] - 1]) {
        const r = form(d, g);
        expect(r.converged).toBe(true);
        expect(Math.abs((r.beta as number) / beta - 1)).toBeLessThan(1e-6); // exact in theory; 1 % is the requirement
        expect(r.pf as number).toBeCloseTo(normalCdf(-beta), 8);
        expect(Math.abs(r.designPoint[0] - r.designPoint[1])).toBeLessThan(1e-6 * r.designPoint[0]);
      }
    }
    // normal-normal: the design point of a linear limit state (common practice): x* = μ − β σ α
    const r = form([nR, nS], (x) => x[0] - x[1]);
    expect(r.designPoint[0]).toBeCloseTo(2 - betaNormal * 0.5 * (0.5 / Math.sqrt(0.26)), 8);
  });
  it('gives a negative β when the mean point fails, and a reason instead of NaN', () => {
    const r = form([nR, nS], (x) => x[1] - x[0]);
    expect(r.beta as number).toBeCloseTo(-betaNormal, 6);
    const flat = form([nR], () => 1);
    expect(flat.beta).toBeNull();
    expect(flat.note).toMatch(/no slope/);
    const bad = form([nR], () => Number.NaN);
    expect(bad.beta).toBeNull();
    expect(bad.note).toMatch(/not finite at the mean/);
  });
  it('converges on a nonlinear limit state with truncated and bounded inputs, never NaN (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0.05, max: 0.6, noNaN: true }), fc.double({ min: 1.2, max: 4, noNaN: true }), (v, m) => {
      const d = [
        distribution({ distribution: 'normal', mean: m, cov: v, min: 0 }),
        distribution({ distribution: 'triangular', min: 0.5, max: 1.5, mode: 1 }),
        distribution({ distribution: 'uniform', min: 0.8, max: 1.2 }),
      ];
      const r = form(d, (x) => x[0] * x[2] - x[1] ** 2);
      expect(JSON.stringify(r)).not.toMatch(/NaN/);
      if (r.beta !== null) expect(r.pf as number).toBeGreaterThanOrEqual(0);
    }), { numRuns: 40 });
  });
});
