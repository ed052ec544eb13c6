import { describe, expect, it } from 'vitest';
import { analyse } from '../../src/analysis/analyse';
import { MODES } from '../../src/analysis/check-labels';
import { sampleEvaluator, type SampledField } from '../../src/analysis/sample-evaluate';
import { platesForSampling } from '../../src/analysis/sample-plates';
import { plateCoefficients } from '../../src/mechanics/plate';
import { projectValueAt, applySample, type Variable } from '../../src/uncertainty/variables';
import { parsePath } from '../../src/model/project-path';
import type { CheckRow, Project } from '../../src/model/types';
import { randomLcg } from 'd3';
import { presets, randomProject } from './fixtures';

/** The reduction the sample path must give, taken from the full analysis' check table. */
function reduce(rows: readonly CheckRow[]) {
  const modeFs = MODES.map((m) => {
    const fs = rows.filter((r) => r.mode === m && r.counts && r.fs !== null).map((r) => r.fs as number);
    return fs.length ? Math.min(...fs) : null;
  });
  // A standing arch's snap-through row (FS 1) never governs (check-table.ts governingRow).
  const counted = rows.filter((r) => r.counts && r.fs !== null && !(r.mode === 'snapThrough' && r.fs > 0));
  return {
    modeFs,
    governingFs: Math.min(Infinity, ...counted.map((r) => r.fs as number)),
    targetRatio: Math.min(Infinity, ...counted.map((r) => (r.fs as number) / r.target)),
  };
}

/** Every eligible numeric field present in the project. */
function presentFields(project: Project): string[] {
  const at = projectValueAt(project);
  const out = ['opening.span_m', 'loads.surcharge_kPa', 'loads.horizontalStress_MPa', 'support.standing_kPa'];
  project.layers.forEach((_, i) => {
    for (const f of ['thickness_m', 'unitWeight_kNm3', 'youngModulus_GPa', 'poisson', 'ucs_MPa', 'tensile.value_MPa',
      'jointing.fractureFrequency_per_m', 'jointing.jointCondition', 'jointing.crossJointSpacing_m', 'jointing.jointFriction_deg']) {
      out.push(`layers[${i}].${f}`);
    }
  });
  return out.filter((p) => typeof at(p) === 'number');
}

describe('the fast per-sample path (analysis/sample-evaluate.ts)', () => {
  const cases = [...presets().map((p) => ({ name: p.file, project: p.project })),
    ...[1, 2, 3].map((s) => ({ name: `random slab ${s}`, project: randomProject(s, { type: 'slab' }) })),
    ...[4, 5].map((s) => ({ name: `random beam ${s}`, project: randomProject(s, { type: 'beam' }) }))];

  it.each(cases)('at the project values (zero variance) reproduces the analysis exactly: $name', ({ project }) => {
    const paths = presentFields(project);
    const at = projectValueAt(project);
    const values = paths.map((p) => at(p) as number);
    const fields: SampledField[] = paths.map((path, j) => ({ path, lower: values[j], upper: values[j] }));
    const ev = sampleEvaluator(project, fields);
    expect(ev.plateInterpolation).toBe(null);
    const got = ev.evaluate(values);
    const want = reduce(analyse(project).report.checks);
    expect(got.governingFs).toBe(want.governingFs); // bit for bit
    expect(got.targetRatio).toBe(want.targetRatio);
    expect([...got.modeFs]).toEqual(want.modeFs);
  });

  it.each(cases.filter((c) => c.project.opening.type !== 'slab'))('writes each field in SI as the file would carry it (against the full analysis of the changed file): $name', ({ project }) => {
    const at = projectValueAt(project);
    for (const path of presentFields(project)) {
      const v0 = at(path) as number;
      // a 7 % change (or +0.3 where the value is 0), kept inside the field's range
      const v = path.endsWith('poisson') ? Math.min(0.45, v0 * 1.07) : path.endsWith('jointCondition') ? Math.min(30, v0 * 0.93) : v0 === 0 ? 0.3 : v0 * 1.07;
      const ev = sampleEvaluator(project, [{ path, lower: v, upper: v }]);
      const changed = applySample(project, [{ keys: parsePath(path) } as Variable], [v]);
      const want = reduce(analyse(changed).report.checks);
      const got = ev.evaluate([v]);
      expect(got.governingFs, path).toBe(want.governingFs);
      expect([...got.modeFs], path).toEqual(want.modeFs);
    }
  }, 60_000);

  // One evaluator, many samples in a row over wide ranges: the conditions that decide which rows
  // count (cracked by a cross-joint spacing below the span, block at s/t < 2, deep at s/t ≤ 4,
  // no net tension, suspended layers) change from sample to sample, and reused strength chains
  // must never leak from one sample into the next. Reference: the full analysis of the file with
  // the sample written in (`applySample` + `analyse`), the same check table every output renders.
  // The field bounds are the project's values, so a slab solves its plates exactly (no interpolation).
  it.each(cases.concat([6, 7, 8, 9].map((s) => ({ name: `random ${s}`, project: randomProject(s) }))))('agrees with the full analysis sample after sample while the counting conditions change: $name', ({ project }) => {
    const at = projectValueAt(project);
    const paths = presentFields(project);
    const base = paths.map((p) => at(p) as number);
    const ev = sampleEvaluator(project, paths.map((path, j) => ({ path, lower: base[j], upper: base[j] })));
    const variables = paths.map((path) => ({ keys: parsePath(path) }) as Variable);
    const random = randomLcg(0.25);
    const span = project.opening.span_m;
    const seen = new Set<string>();
    for (let k = 0; k < 12; k++) {
      const values = paths.map((path, j) => {
        const v0 = base[j];
        const f = 0.5 + random();
        if (path.endsWith('poisson')) return Math.min(0.45, v0 * f);
        if (path.endsWith('jointCondition')) return Math.min(30, v0 * f);
        if (path.endsWith('crossJointSpacing_m')) return span * (0.5 + random()); // either side of the span
        if (path.endsWith('thickness_m')) return span * (k % 3 === 0 ? 0.3 + 0.3 * random() : 0.05 + 0.3 * random()); // s/t from 1.7 to 20
        if (path.endsWith('horizontalStress_MPa') || path.endsWith('surcharge_kPa') || path.endsWith('standing_kPa')) return v0 * f;
        return v0 * f;
      });
      const want = analyse(applySample(project, variables, values)).report.checks;
      for (const r of want) if (r.counts) seen.add(r.mode);
      const got = ev.evaluate(values);
      const ref = reduce(want);
      expect(got.governingFs, `sample ${k}`).toBe(ref.governingFs);
      expect(got.targetRatio, `sample ${k}`).toBe(ref.targetRatio);
      expect([...got.modeFs], `sample ${k}`).toEqual(ref.modeFs);
    }
    expect(seen.size).toBeGreaterThan(0);
  }, 60_000);

  it('one evaluator switches a layer between its intact and its cracked rows as the sampled cross-joint spacing crosses the span', () => {
    // METHODS §10: a layer cross-jointed at a spacing below the span is cracked (voussoir rows
    // count, tension does not); above the span the tension row counts.
    const project = presets().find((p) => p.file.includes('coal-room'))!.project; // a beam on the intact basis
    const at = projectValueAt(project);
    const path = 'layers[0].jointing.crossJointSpacing_m';
    const paths = ['layers[0].thickness_m', path];
    const span = project.opening.span_m;
    const ev = sampleEvaluator(project, paths.map((p) => ({ path: p, lower: 0, upper: 0 })));
    const variables = paths.map((p) => ({ keys: parsePath(p) }) as Variable);
    const t = (at('layers[0].thickness_m') as number);
    const modes = new Set<string>();
    for (const spacing of [2 * span, 0.5 * span, 3 * span, 0.25 * span]) {
      const rows = analyse(applySample(project, variables, [t, spacing])).report.checks.filter((r) => r.layerIndex === 0 && r.counts);
      rows.forEach((r) => modes.add(r.mode));
      const got = ev.evaluate([t, spacing]);
      expect(got.governingFs).toBe(reduce(analyse(applySample(project, variables, [t, spacing])).report.checks).governingFs);
    }
    expect(modes.has('tension')).toBe(true);
    expect(modes.has('crushing')).toBe(true);
  });

  it('refuses a path it cannot write, naming it', () => {
    const { project } = presets()[0];
    expect(() => sampleEvaluator(project, [{ path: 'layers[0].name', lower: 0, upper: 0 }])).toThrow(/layers\[0\]\.name/);
    expect(() => sampleEvaluator(project, [{ path: 'layers[9].thickness_m', lower: 1, upper: 1 }])).toThrow(/layers\[9\]/);
  });

  it('a slab with its span sampled uses the plate interpolation, whose error is measured and holds between nodes', () => {
    const project = randomProject(2, { type: 'slab' });
    const s = project.opening.span_m;
    const ev = sampleEvaluator(project, [{ path: 'opening.span_m', lower: 0.9 * s, upper: 1.1 * s }]);
    expect(ev.plateInterpolation).not.toBe(null);
    const err = ev.plateInterpolation!.maxRelativeError;
    expect(err).toBeLessThan(0.01);
    for (const f of [0.93, 0.97, 1.01, 1.06]) {
      const got = ev.evaluate([f * s]).governingFs;
      const exact = sampleEvaluator(project, [{ path: 'opening.span_m', lower: f * s, upper: f * s }]).evaluate([f * s]).governingFs;
      // FS ∝ 1/β (tension) or independent of the plate: the relative error of β carries over (3× margin)
      expect(Math.abs(got - exact) / exact).toBeLessThanOrEqual(3 * err + 1e-12);
    }
  });

  it('plate interpolation: nodes are exact, the stated error bounds the error at other points (against the Ritz solve)', () => {
    const plates = platesForSampling('clamped', [1.1, 2.0], [0.2, 0.3]);
    expect(plates.nodes).toEqual({ aspect: 9, poisson: 9 });
    const node = plates.coefficients(1.1, 0.2);
    expect(node.beta).toBe(plateCoefficients({ aspect: 1.1, edges: 'clamped', poisson: 0.2 }).beta);
    for (const [a, v] of [[1.33, 0.27], [1.71, 0.21], [1.95, 0.295]]) {
      const e = plateCoefficients({ aspect: a, edges: 'clamped', poisson: v });
      const g = plates.coefficients(a, v);
      expect(Math.abs(g.beta - e.beta) / e.beta).toBeLessThanOrEqual(3 * plates.maxRelativeError + 1e-12);
    }
    // outside the grid: the exact solve
    expect(plates.coefficients(2.5, 0.25).beta).toBe(plateCoefficients({ aspect: 2.5, edges: 'clamped', poisson: 0.25 }).beta);
  }, 60_000);
});
