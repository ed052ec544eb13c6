import { describe, it, expect } from 'vitest';
import { create, all, type Unit } from 'mathjs';
import { analyse } from '../../src/analysis';
import type { Analysis } from '../../src/analysis/types';
import { designExample, presets, randomProject } from './fixtures';

// The trace must be checkable by hand: each entry's formula, evaluated by a general-purpose
// expression library (mathjs) with the substituted values as units, reproduces the result,
// and the result is the number the analysis reports at the entry's path.
const math = create(all);

function evaluateEntry(formula: string, values: Record<string, { value: number; unit: string }>, unit: string): number {
  const scope: Record<string, number | Unit> = {};
  for (const [k, v] of Object.entries(values)) scope[k] = v.unit === '' ? v.value : math.unit(v.value, v.unit);
  const out = math.evaluate(formula, scope) as number | Unit;
  if (typeof out === 'number') {
    if (unit !== '') throw new Error(`${formula}: dimensionless result but unit "${unit}" expected`);
    return out;
  }
  return unit === '' ? (out as Unit).toNumber('') : (out as Unit).toNumber(unit);
}

/** Reads `layers[0].strength.lab_MPa` from the report, or `detail.layers[0].hoekBrown.mb` from the details. */
function valueAt(analysis: Analysis, path: string): unknown {
  const detail = path.startsWith('detail.');
  let node: unknown = detail ? { layers: analysis.layers, groups: analysis.groups, grouping: analysis.grouping } : analysis.report;
  const keys = (detail ? path.slice(7) : path).match(/[^.[\]]+/g) ?? [];
  for (const k of keys) node = (node as Record<string, unknown>)?.[k];
  return node;
}

function checkTrace(analysis: Analysis): number {
  let n = 0;
  for (const e of analysis.report.trace) {
    const evaluated = evaluateEntry(e.formula, e.values, e.unit);
    const scale = Math.max(Math.abs(e.result), 1e-9);
    expect(Math.abs(evaluated - e.result) / scale, `${e.path}: ${e.formula} gives ${evaluated}, trace says ${e.result}`).toBeLessThan(1e-7);
    const reported = valueAt(analysis, e.path);
    expect(typeof reported, `${e.path} is not a reported number`).toBe('number');
    expect(Math.abs((reported as number) - e.result) / scale, `${e.path}: reported ${reported}, traced ${e.result}`).toBeLessThan(1e-12);
    expect(e.source.length).toBeGreaterThan(3);
    n++;
  }
  return n;
}

/** Numbers in the report that must be traced. */
function reportedNumbers(analysis: Analysis): string[] {
  const paths: string[] = [];
  analysis.report.layers.forEach((l, i) => {
    paths.push(`layers[${i}].load_kPa`);
    for (const [k, v] of Object.entries(l.strength)) if (typeof v === 'number') paths.push(`layers[${i}].strength.${k}`);
    for (const [k, v] of Object.entries(l.elastic)) if (typeof v === 'number') paths.push(`layers[${i}].elastic.${k}`);
    if (l.voussoir) for (const [k, v] of Object.entries(l.voussoir)) if (typeof v === 'number') paths.push(`layers[${i}].voussoir.${k}`);
    if (l.plate) for (const [k, v] of Object.entries(l.plate)) if (typeof v === 'number') paths.push(`layers[${i}].plate.${k}`);
  });
  if (analysis.report.governing) paths.push('governing.fs');
  const ms = analysis.report.maxSpan_m;
  if (ms) for (const [k, v] of Object.entries(ms)) if (typeof v === 'number') paths.push(`maxSpan_m.${k}`);
  return paths;
}

describe('calculation trace', () => {
  it('every traced value equals the analysis value, and its formula reproduces it (DESIGN example)', () => {
    expect(checkTrace(analyse(designExample()))).toBeGreaterThan(25);
  });
  it('every reported number has a trace entry (DESIGN example and presets)', () => {
    for (const project of [designExample(), ...presets().map((p) => p.project)]) {
      const a = analyse(project);
      const traced = new Set(a.report.trace.map((e) => e.path));
      for (const path of reportedNumbers(a)) expect(traced.has(path), `${project.title}: ${path} has no trace entry`).toBe(true);
    }
  });
  it('the presets trace checks out', () => {
    for (const { project } of presets()) checkTrace(analyse(project));
  });
  it('40 generated projects trace checks out (beams, slabs, cantilevers)', { timeout: 60_000 }, () => {
    for (let seed = 1; seed <= 40; seed++) {
      const a = analyse(randomProject(seed));
      checkTrace(a);
      const traced = new Set(a.report.trace.map((e) => e.path));
      for (const path of reportedNumbers(a)) expect(traced.has(path), `seed ${seed}: ${path}`).toBe(true);
    }
  });
});
