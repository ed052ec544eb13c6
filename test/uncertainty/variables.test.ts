import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseProject } from '../../src/model/validate';
import type { Project } from '../../src/model/types';
import { summarise } from '../../src/strength/statistics';
import { applySample, brazilianVariable, eligibleField, projectValueAt, resolveVariables } from '../../src/uncertainty/variables';
import { expectClose } from '../helpers/expect-close';

const preset = (name: string): Project => parseProject(JSON.parse(readFileSync(new URL(`../../presets/${name}`, import.meta.url), 'utf8'))).project;
const project = preset('coal-room-shale.lamina.json');
const valueAt = projectValueAt(project);
const messages = (specs: unknown) => {
  const r = resolveVariables(specs, valueAt);
  return r.ok ? [] : r.errors.map((e) => e.message);
};

describe('variables by field path', () => {
  it('knows the METHODS §16 eligible fields, by pattern', () => {
    expect(eligibleField('layers[3].thickness_m')?.pattern).toBe('layers[i].thickness_m');
    expect(eligibleField('loads.support_kPa')?.pattern).toBe('loads.support_kPa');
    expect(eligibleField('support.standing_kPa')?.pattern).toBe('support.standing_kPa');
    expect(eligibleField('layers[0].name')).toBeNull();
    expect(eligibleField('layers[0].__proto__')).toBeNull();
  });
  it('takes the project value as the mean and truncates to the physical range', () => {
    const r = resolveVariables([{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.5 }, { path: 'opening.span_m', distribution: 'uniform', min: 5, max: 7 }], valueAt);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const [t, s] = r.variables;
    expect(t.projectValue).toBe(project.layers[0].thickness_m);
    expect(t.distribution.lower).toBe(0);
    expect(t.distribution.quantile(1e-9)).toBeGreaterThan(0);
    expect(s.distribution.mean).toBe(6);
  });
  it('refuses bad variables, naming the path', () => {
    expect(messages([{ path: 'layers[0].colour', distribution: 'normal', cov: 0.1 }])[0]).toMatch(/^uncertainty\.variables\[0\]\.path: "layers\[0\]\.colour" cannot be sampled; eligible: opening\.span_m, layers\[i\]\.thickness_m/);
    expect(messages([{ path: 'layers[9].thickness_m', distribution: 'normal', cov: 0.1 }])).toEqual(['uncertainty.variables[0].path: "layers[9].thickness_m" does not exist in this project']);
    expect(messages([{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.1 }, { path: 'layers[0].ucs_MPa', distribution: 'normal', cov: -0.1 }])).toEqual(['uncertainty.variables[1].cov: must be ≥ 0, got -0.1']);
    expect(messages([{ path: 'opening.span_m', distribution: 'uniform', min: 7, max: 5 }])[0]).toMatch(/^uncertainty\.variables\[0\]\.max: must be > min \(7\), got 5/);
    expect(messages([{ path: 'layers[0].thickness_m', distribution: 'uniform', min: -0.1, max: 1 }])[0]).toMatch(/min: must lie within \(0, Infinity\]/);
    expect(messages([{ path: 'layers[0].poisson', distribution: 'uniform', mean: 0.45, sd: 0.1 }])[0]).toMatch(/sd: spreads the uniform over .* outside \[0, 0\.5\)/);
    expect(messages([{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.1 }, { path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.2 }])[0]).toMatch(/variables\[1\]\.path: .* already sampled by uncertainty\.variables\[0\]/);
    expect(messages([{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.1, colour: 1 }])[0]).toMatch(/variables\[0\]\.colour: is not a variable field/);
    expect(messages('all')[0]).toMatch(/^uncertainty\.variables: must be a list/);
  });
  it('applies a sample to a copy, sharing what it does not change, never touching the original', () => {
    const r = resolveVariables([{ path: 'layers[1].thickness_m', distribution: 'normal', cov: 0.1 }, { path: 'loads.surcharge_kPa', distribution: 'uniform', min: 0, max: 50 }], valueAt);
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join());
    const before = JSON.stringify(project);
    const copy = applySample(project, r.variables, [0.123, 17]);
    expect(copy.layers[1].thickness_m).toBe(0.123);
    expect(copy.loads.surcharge_kPa).toBe(17);
    expect(JSON.stringify(project)).toBe(before);
    expect(copy.layers[0]).toBe(project.layers[0]);
    expect(copy.design).toBe(project.design);
    // zero variance: applying the mean gives back the same numbers
    expect(applySample(project, r.variables, [project.layers[1].thickness_m, project.loads.surcharge_kPa])).toEqual(project);
  });
  it('one-click Brazilian variable: lognormal with the accepted specimens\' mean and CoV (ISRM 1978 σt = 2P/(πDL))', () => {
    const layerIndex = project.layers.findIndex((l) => l.tensile.specimens.filter((s) => s.valid).length >= 3);
    expect(layerIndex).toBeGreaterThanOrEqual(0);
    const specimens = project.layers[layerIndex].tensile.specimens.filter((s) => s.valid && s.thickness_mm <= s.diameter_mm);
    const strengths = specimens.map((s) => (2 * s.peakLoad_kN * 1e3) / (Math.PI * s.diameter_mm * s.thickness_mm)); // N/mm² = MPa
    const expected = summarise(strengths);
    const v = brazilianVariable(project, layerIndex);
    expect(v.spec).not.toBeNull();
    if (v.spec === null) return;
    expect(v.spec.path).toBe(`layers[${layerIndex}].tensile.value_MPa`);
    expect(v.spec.distribution).toBe('lognormal');
    expectClose(v.spec.mean as number, expected.mean, 1e-12);
    expectClose(v.spec.cov as number, expected.cov, 1e-10);
    const r = resolveVariables([v.spec], valueAt);
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join());
    const sampled = applySample(project, r.variables, [3.3]);
    expect(sampled.layers[layerIndex].tensile).toMatchObject({ value_MPa: 3.3, specimens: [], method: 'brazilian' });
    expect(project.layers[layerIndex].tensile.specimens.length).toBeGreaterThan(0);
    const few = structuredClone(project);
    few.layers[layerIndex].tensile.specimens = few.layers[layerIndex].tensile.specimens.slice(0, 2);
    expect(brazilianVariable(few, layerIndex)).toMatchObject({ spec: null, reason: expect.stringMatching(/at least 3/) });
  });
});
