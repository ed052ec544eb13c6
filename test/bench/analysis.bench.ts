/**
 * Benchmark: a full analyseProject of a 5-layer beam project (all span searches and the trace)
 * and a 100 × 100 design-chart grid, each against a baseline measured in the same run — the
 * plain independent implementation of METHODS.md in test/analysis/reference.ts (0.01 voussoir
 * sweep, linear span scan). Targets (issue): analyse ≤ 5 ms median; 100 × 100 grid ≤ 150 ms.
 */
import { pathToFileURL } from 'node:url';
import { analyseProject, designChart } from '../../src/analysis';
import { parseProject } from '../../src/model/validate';
import type { Project } from '../../src/model/types';
import { reference, refVoussoir } from '../analysis/reference';
import type { BenchResult } from './types';
import { timeMedian as timeMedianOf } from './timing';

/** Five invented beds over a 7 m clamped room (demo data for the benchmark). */
export function fiveLayerProject(): Project {
  const bed = (name: string, t: number, E: number, value: number, spacing: number | null) => ({
    name, thickness_m: t, unitWeight_kNm3: 25, youngModulus_GPa: E, modulusBasis: 'mass', poisson: 0.25, ucs_MPa: 50, rockClass: 'sedimentary',
    tensile: { value_MPa: value, method: 'brazilian', specimens: [] },
    jointing: { crossJointSpacing_m: spacing, fractureFrequency_per_m: 4, rqd: null, jointCondition: 18, jointFriction_deg: 32 },
    hoekBrown: { mi: 8, disturbance: 0 },
  });
  return parseProject({
    schema: 'lamina/2', title: 'Benchmark: five beds (invented)',
    opening: { type: 'beam', span_m: 7, ends: 'clamped' },
    loads: { surcharge_kPa: 20, horizontalStress_MPa: 1 },
    support: { standing_kPa: 10 },
    layers: [bed('B1', 0.4, 6, 3, null), bed('B2', 0.3, 4, 2.5, 5), bed('B3', 1.2, 18, 5, null), bed('B4', 0.6, 10, 4, null), bed('B5', 2.0, 25, 6, 12)],
    design: { fsTarget: { tension: 4, crushing: 2, sliding: 1.5 }, deflectionLimitRatio: 0.1, characteristic: 'mean', basis: 'intact' },
  }).project;
}

const timeMedian = (fn: () => void, runs: number): number => timeMedianOf(fn, runs, 3);

export async function benchAnalysis(): Promise<BenchResult[]> {
  const project = fiveLayerProject();
  const analyseMs = timeMedian(() => analyseProject(project), 60);
  const referenceMs = timeMedian(() => reference(project), 5);
  const grid = Array.from({ length: 100 }, (_, k) => 0.5 + (14 * k) / 99);
  const thick = Array.from({ length: 100 }, (_, k) => 0.1 + (2.4 * k) / 99);
  const chartMs = timeMedian(() => designChart(project, 0, { spans_m: grid, thicknesses_m: thick }), 7);
  // Baseline for the grid: the same 10 000 cells' voussoir solved by the plain 0.01 sweep.
  const l = project.layers[0];
  const sweepMs = timeMedian(() => {
    for (const t of thick) for (const s of grid) refVoussoir(s, t, 25e3, l.youngModulus_GPa * 1e9, l.ucs_MPa * 1e6, 32);
  }, 3);
  return [
    { name: 'analyseProject, 5-layer beam, all span searches + trace', median_us: analyseMs * 1e3, baseline: `plain implementation ${referenceMs.toFixed(1)} ms`, ratio: referenceMs / analyseMs, target: '≤ 5 ms', pass: analyseMs <= 5 },
    { name: 'design chart 100 × 100 (layer 1 of 5)', median_us: chartMs * 1e3, baseline: `0.01-sweep voussoir alone on the grid ${sweepMs.toFixed(0)} ms`, ratio: sweepMs / chartMs, target: '≤ 150 ms', pass: chartMs <= 150 },
  ];
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  for (const r of await benchAnalysis()) console.log(r);
}
