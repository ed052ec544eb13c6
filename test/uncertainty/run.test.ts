import { describe, expect, it } from 'vitest';
import { analyse } from '../../src/analysis/analyse';
import { ProjectError } from '../../src/model/validate';
import { normalCdf } from '../../src/uncertainty/standard-normal';
import { runUncertainty } from '../../src/uncertainty/run';
import { presets } from '../analysis/fixtures';
import { rsProject } from './rs-project';

describe('the uncertainty run through the real analysis path (METHODS §16 check values)', () => {
  it('the arrangement gives FS = 2 at the means, tension the only counted check', () => {
    const p = rsProject('normal', 1000);
    const checks = analyse(p).report.checks;
    expect(checks.filter((r) => r.counts).map((r) => r.mode)).toEqual(['tension']);
    expect(checks[0].fs).toBeCloseTo(2, 12);
  });

  // Closed form of R − S (Ang & Tang 2007, Probability Concepts in Engineering, ch. 6; memory; METHODS §16):
  // normal: β = (μR − μS)/√(σR² + σS²) = 1/√(0.5² + 0.1²) = 1.961, P_f = Φ(−β) = 2.49e-2;
  // lognormal: β = ln(μR/μS · √((1+VS²)/(1+VR²))) / √(ln((1+VR²)(1+VS²))) = 2.514, P_f = 5.97e-3.
  const closed = {
    normal: 1 / Math.sqrt(0.5 ** 2 + 0.1 ** 2),
    lognormal: Math.log(2 * Math.sqrt((1 + 0.01) / (1 + 0.0625))) / Math.sqrt(Math.log((1 + 0.0625) * (1 + 0.01))),
  };
  it('the closed forms match the figures METHODS §16 states', () => {
    expect(closed.normal).toBeCloseTo(1.961, 3);
    expect(normalCdf(-closed.normal)).toBeCloseTo(2.49e-2, 4);
    expect(closed.lognormal).toBeCloseTo(2.514, 3);
    expect(normalCdf(-closed.lognormal)).toBeCloseTo(5.97e-3, 5);
  });

  it.each(['normal', 'lognormal'] as const)('%s R and S: Monte Carlo within its own 95-percent interval of the closed form, FORM within 1 percent of β', (d) => {
    const block = runUncertainty(rsProject(d, 20000), { spanPoints: 0 });
    const pf = normalCdf(-closed[d]);
    expect(block.pfInterval[0]).toBeLessThanOrEqual(pf);
    expect(block.pfInterval[1]).toBeGreaterThanOrEqual(pf);
    expect(block.byMode.tension).toBe(block.pf);
    expect(block.form?.converged).toBe(true);
    expect(Math.abs((block.form!.beta as number) - closed[d]) / closed[d]).toBeLessThan(0.01);
    // sensitivity: FS rises with the strength and falls with the weight
    expect(block.sensitivity[0].rankCorrelation!).toBeGreaterThan(0.5);
    expect(block.sensitivity[1].rankCorrelation!).toBeLessThan(0);
    expect(JSON.stringify(block)).not.toMatch(/NaN|Infinity/);
  }, 60_000);

  it('same file and seed: identical results; another seed: a different estimate', () => {
    const a = runUncertainty(rsProject('normal', 2000), { spanPoints: 0, form: false });
    const b = runUncertainty(rsProject('normal', 2000), { spanPoints: 0, form: false });
    const c = runUncertainty(rsProject('normal', 2000, 2), { spanPoints: 0, form: false });
    expect(b).toEqual(a);
    expect(c.histogram).not.toEqual(a.histogram);
  });

  it('P_f against span rises with the span and stays within [0, 1]', () => {
    const block = runUncertainty(rsProject('normal', 1000), { spanPoints: 6, samplesPerSpan: 500, form: false });
    expect(block.pfVersusSpan.length).toBe(6);
    const pfs = block.pfVersusSpan.map((p) => p.pf);
    for (const pf of pfs) expect(pf >= 0 && pf <= 1).toBe(true);
    for (let k = 1; k < pfs.length; k++) expect(pfs[k]).toBeGreaterThanOrEqual(pfs[k - 1]); // FS ∝ 1/s² with common random numbers
  });

  it.each(presets())('zero-variance variables reproduce the deterministic FS: $file', ({ project }) => {
    const p = structuredClone(project);
    p.uncertainty = { samples: 200, seed: 1, method: 'monteCarlo', acceptablePf: 0.02,
      variables: [{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0 }, { path: 'opening.span_m', distribution: 'lognormal', sd: 0 }] };
    const block = runUncertainty(p, { spanPoints: 0 });
    // every counted row but a standing arch's snap-through (FS 1, never governs: check-table.ts governingRow)
    const counted = analyse(project).report.checks.filter((r) => r.counts && r.fs !== null && !(r.mode === 'snapThrough' && r.fs > 0)).map((r) => r.fs as number);
    const fs = Math.min(...counted);
    expect(block.governingFs.min).toBe(fs);
    expect(block.governingFs.max).toBe(fs);
    expect(block.pf).toBe(fs < 1 ? 1 : 0);
    expect(block.form).toBe(null); // nothing varies
    // judged by the interval's upper end: no failure in 200 → P_f ≤ 3/200 = 0.015 ≤ 0.02
    expect(block.meetsAcceptablePf).toBe(fs >= 1);
  });

  it('a bad variable is refused with its field path', () => {
    const p = rsProject('normal', 1000);
    p.uncertainty!.variables.push({ path: 'layers[0].thickness_m', distribution: 'uniform', mean: 0.5, cov: 2 });
    let caught: unknown;
    try {
      runUncertainty(p);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(ProjectError);
    expect((caught as ProjectError).issues.map((i) => i.path)).toContain('uncertainty.variables[2].cov');
  });
});
