import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { distribution, type Distribution } from '../../src/uncertainty/distributions';
import { createMonteCarloRun, pfVersusSpan, runMonteCarlo, runMonteCarloAsync, type Evaluate } from '../../src/uncertainty/monte-carlo';
import { normalCdf } from '../../src/uncertainty/standard-normal';

// METHODS §16 check values (closed form, R − S): R μ 2 MPa V 0.25, S μ 1 MPa V 0.1.
const normalR = distribution({ distribution: 'normal', mean: 2, cov: 0.25 });
const normalS = distribution({ distribution: 'normal', mean: 1, cov: 0.1 });
const logR = distribution({ distribution: 'lognormal', mean: 2, cov: 0.25 });
const logS = distribution({ distribution: 'lognormal', mean: 1, cov: 0.1 });
/** FS = R/S: fails when R < S; target 1.5 */
const ratio: Evaluate = (x) => {
  const fs = x[0] / x[1];
  return { modeFs: [fs], governingFs: fs, targetRatio: fs / 1.5 };
};
// closed form: β = (μR − μS)/√(σR² + σS²) = 1/√(0.5² + 0.1²) = 1.961; lognormal: (λR − λS)/√(ζR² + ζS²) = 2.514
const betaNormal = 1 / Math.sqrt(0.5 ** 2 + 0.1 ** 2);
const zR = Math.sqrt(Math.log(1 + 0.25 ** 2));
const zS = Math.sqrt(Math.log(1 + 0.1 ** 2));
const betaLog = (Math.log(2) - zR * zR / 2 - (0 - zS * zS / 2)) / Math.sqrt(zR * zR + zS * zS);

describe('Monte Carlo: METHODS §16 check values', () => {
  it('closed-form β and P_f are the values METHODS §16 prints', () => {
    expect(betaNormal).toBeCloseTo(1.961, 3);
    expect(normalCdf(-betaNormal)).toBeCloseTo(2.49e-2, 4);
    expect(betaLog).toBeCloseTo(2.514, 3);
    expect(normalCdf(-betaLog)).toBeCloseTo(5.97e-3, 5);
  });
  for (const method of ['monteCarlo', 'latinHypercube'] as const) {
    it(`${method}: P_f lands within its own 95 % interval of the closed form (normal and lognormal)`, () => {
      for (const [dists, beta] of [[[normalR, normalS], betaNormal], [[logR, logS], betaLog]] as [Distribution[], number][]) {
        const r = runMonteCarlo({ distributions: dists, evaluate: ratio, modes: ['tension'], samples: 40000, seed: 1, method });
        const exact = normalCdf(-beta);
        expect(r.failure.interval[0] <= exact && exact <= r.failure.interval[1], `${r.failure.interval} vs ${exact}`).toBe(true);
        expect(r.byMode[0].pf).toBe(r.failure.pf);
        expect(Math.abs((r.failure.beta as number) - beta)).toBeLessThan(0.05);
        // R drives FS up, S down (Spearman)
        expect(r.sensitivity[0] as number).toBeGreaterThan(0.8);
        expect(r.sensitivity[1] as number).toBeLessThan(-0.2);
      }
    });
  }
});

describe('Monte Carlo: properties', () => {
  it('zero-variance variables reproduce the deterministic FS exactly', () => {
    const d = [distribution({ distribution: 'normal', mean: 2.2, cov: 0 }), distribution({ distribution: 'lognormal', mean: 1.1, cov: 0 })];
    const seen = new Set<number>();
    const r = runMonteCarlo({
      distributions: d, modes: ['tension'], samples: 500, seed: 3,
      evaluate: (x) => { seen.add(x[0] / x[1]); return ratio(x); },
    });
    expect([...seen]).toEqual([2.2 / 1.1]);
    expect(r.governingFs.min).toBe(2.2 / 1.1);
    expect(r.failure.pf).toBe(0);
    expect(r.sensitivity).toEqual([null, null]);
    expect(r.failure.beta).toBeNull();
  });
  it('same seed → identical results; different seeds differ; P_f in [0, 1], no NaN (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 1e6 }), fc.double({ min: 0.05, max: 1, noNaN: true }), (seed, v) => {
      const d = [distribution({ distribution: 'lognormal', mean: 1.5, cov: v }), logS];
      const a = runMonteCarlo({ distributions: d, evaluate: ratio, modes: ['tension'], samples: 300, seed });
      const b = runMonteCarlo({ distributions: d, evaluate: ratio, modes: ['tension'], samples: 300, seed });
      const c = runMonteCarlo({ distributions: d, evaluate: ratio, modes: ['tension'], samples: 300, seed: seed + 1 });
      expect(b).toEqual(a);
      expect(c.governingFs).not.toEqual(a.governingFs);
      expect(a.failure.pf >= 0 && a.failure.pf <= 1).toBe(true);
      expect(JSON.stringify(a)).not.toMatch(/NaN|Infinity/);
    }), { numRuns: 20 });
  });
  it('counts P(below target) and per-mode P_f separately', () => {
    const r = runMonteCarlo({
      distributions: [normalR, normalS], modes: ['tension', 'crushing'], samples: 5000, seed: 2,
      evaluate: (x) => {
        const t = x[0] / x[1];
        const c = 3 * t;
        return { modeFs: [t, c], governingFs: Math.min(t, c), targetRatio: Math.min(t / 2, c / 2) };
      },
    });
    expect(r.byMode[1].pf).toBeLessThan(r.byMode[0].pf);
    expect(r.pBelowTarget).toBeGreaterThan(r.failure.pf);
    expect(r.byMode.map((m) => m.mode)).toEqual(['tension', 'crushing']);
  });
  it('reports progress per chunk, stops on request, and chunking does not change the numbers', async () => {
    const progress: number[] = [];
    let calls = 0;
    const stopped = runMonteCarlo({
      distributions: [normalR, normalS], evaluate: ratio, modes: ['tension'], samples: 10000, chunkSize: 1000,
      onProgress: (done) => progress.push(done), shouldStop: () => ++calls > 3,
    });
    expect(progress).toEqual([1000, 2000, 3000]);
    expect(stopped.complete).toBe(false);
    expect(stopped.evaluated).toBe(3000);
    const controller = new AbortController();
    const asyncRun = runMonteCarloAsync({ distributions: [normalR, normalS], evaluate: ratio, modes: ['tension'], samples: 10000, chunkSize: 500, signal: controller.signal, onProgress: (done) => done >= 1500 && controller.abort() });
    expect((await asyncRun).evaluated).toBe(1500);
    const whole = runMonteCarlo({ distributions: [normalR, normalS], evaluate: ratio, modes: ['tension'], samples: 3000, seed: 5 });
    const run = createMonteCarloRun({ distributions: [normalR, normalS], evaluate: ratio, modes: ['tension'], samples: 3000, seed: 5 });
    while (!run.step(7));
    expect(run.result()).toEqual(whole);
    const full = await runMonteCarloAsync({ distributions: [normalR, normalS], evaluate: ratio, modes: ['tension'], samples: 3000, seed: 5 });
    expect(full).toEqual(whole);
  });
  it('names the sample when evaluate throws or returns NaN', () => {
    expect(() => runMonteCarlo({ distributions: [normalR], modes: [], samples: 10, evaluate: () => { throw new Error('layers[0].poisson: must be < 0.5'); } })).toThrow(/^sample 0 \(.*\): layers\[0\]\.poisson/);
    expect(() => runMonteCarlo({ distributions: [normalR], modes: [], samples: 10, evaluate: () => ({ modeFs: [], governingFs: NaN, targetRatio: 1 }) })).toThrow(/sample 0: evaluate returned governingFs NaN/);
  });
  it('P_f against span rises with span (FS ∝ 1/span²) and uses the same samples at every span', () => {
    const curve = pfVersusSpan([4, 5, 6], (span) => (x) => {
      const fs = (x[0] / x[1]) * (5 / span) ** 2;
      return { modeFs: [fs], governingFs: fs, targetRatio: fs / 2 };
    }, { distributions: [logR, logS], modes: ['tension'], samples: 4000, seed: 1 });
    expect(curve.map((c) => c.span)).toEqual([4, 5, 6]);
    expect(curve[0].failure.pf).toBeLessThan(curve[1].failure.pf);
    expect(curve[1].failure.pf).toBeLessThan(curve[2].failure.pf);
    const atFive = runMonteCarlo({ distributions: [logR, logS], evaluate: ratio, modes: ['tension'], samples: 4000, seed: 1 });
    expect(curve[1].failure).toEqual(atFive.failure);
  });
});
