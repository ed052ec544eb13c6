import { describe, expect, it } from 'vitest';
import { readProjectText, writeProjectText } from '../../src/model/project-file';
import { validateProject, type FieldIssue } from '../../src/model/validate';

/** A minimal valid raw project (DESIGN.md required keys) with an uncertainty block. */
function withUncertainty(uncertainty: unknown): Record<string, unknown> {
  return {
    schema: 'lamina/2',
    opening: { type: 'beam', span_m: 6, ends: 'clamped' },
    layers: [{ thickness_m: 0.5, unitWeight_kNm3: 25, youngModulus_GPa: 8, ucs_MPa: 40, tensile: { value_MPa: 3 } }],
    uncertainty,
  };
}

function errors(uncertainty: unknown): FieldIssue[] {
  const r = validateProject(withUncertainty(uncertainty));
  return r.ok ? [] : r.errors;
}

describe('the uncertainty block of the project file (DESIGN "Contract changes in v2", METHODS §16)', () => {
  it('fills the defaults: 20 000 samples, seed 1, Latin hypercube, no acceptable P_f', () => {
    const r = validateProject(withUncertainty({ variables: [{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.1 }] }));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.project.uncertainty).toEqual({
      samples: 20000, seed: 1, method: 'latinHypercube', acceptablePf: null,
      variables: [{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.1 }],
    });
  });
  it('null and absent both mean no run; absent stays absent when written', () => {
    const a = validateProject(withUncertainty(null));
    expect(a.ok && a.project.uncertainty).toBe(null);
    const raw = withUncertainty(undefined);
    delete raw.uncertainty;
    const b = validateProject(raw);
    expect(b.ok && 'uncertainty' in b.project).toBe(false);
  });
  it('round-trips through the file text', () => {
    const r = validateProject(withUncertainty({ samples: 500, seed: 7, method: 'monteCarlo', acceptablePf: 0.01,
      variables: [{ path: 'layers[0].tensile.value_MPa', distribution: 'lognormal', cov: 0.3 }, { path: 'opening.span_m', distribution: 'uniform', min: 5, max: 7 }] }));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const back = readProjectText(writeProjectText(r.project)).project;
    expect(back.uncertainty).toEqual(r.project.uncertainty);
  });
  it('refuses an unknown path, a missing layer, a negative CoV and min ≥ max, each with its field path', () => {
    const e = errors({ variables: [
      { path: 'layers[0].colour', distribution: 'normal', cov: 0.1 },
      { path: 'layers[3].thickness_m', distribution: 'normal', cov: 0.1 },
      { path: 'layers[0].ucs_MPa', distribution: 'normal', cov: -0.1 },
      { path: 'layers[0].poisson', distribution: 'uniform', min: 0.3, max: 0.2 },
      { path: 'layers[0].poisson', distribution: 'weibull', cov: 0.1 },
    ] });
    const paths = e.map((x) => x.path);
    expect(paths).toContain('uncertainty.variables[0].path');
    expect(paths).toContain('uncertainty.variables[1].path');
    expect(paths).toContain('uncertainty.variables[2].cov');
    expect(paths).toContain('uncertainty.variables[3].max');
    expect(paths).toContain('uncertainty.variables[4].distribution');
    expect(e.find((x) => x.path === 'uncertainty.variables[2].cov')?.message).toMatch(/-0\.1/);
  });
  it('refuses samples outside 100 … 1e6, a fractional seed, an acceptable P_f outside (0, 1), an unknown method; warns of an unknown key', () => {
    expect(errors({ samples: 10 }).map((x) => x.path)).toEqual(['uncertainty.samples']);
    expect(errors({ samples: 2e6 }).map((x) => x.path)).toEqual(['uncertainty.samples']);
    expect(errors({ seed: 1.5 }).map((x) => x.path)).toEqual(['uncertainty.seed']);
    expect(errors({ acceptablePf: 1 }).map((x) => x.path)).toEqual(['uncertainty.acceptablePf']);
    expect(errors({ acceptablePf: 0 }).map((x) => x.path)).toEqual(['uncertainty.acceptablePf']);
    expect(errors({ method: 'importance' }).map((x) => x.path)).toEqual(['uncertainty.method']);
    const unknown = validateProject(withUncertainty({ sample: 100 }));
    expect(unknown.warnings.map((x) => x.path)).toContain('uncertainty.sample'); // unknown keys warn, as elsewhere in the file
    expect(errors(5).map((x) => x.path)).toEqual(['uncertainty']);
  });
});
