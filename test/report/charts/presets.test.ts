import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyse, beamProfile, designChart, slabField, spanCurve } from '../../../src/analysis/index';
import { readProjectText } from '../../../src/model/project-file';
import type { Mode, Project } from '../../../src/model/types';
import type { UnitSystem } from '../../../src/model/units';
import {
  beamProfileSvg,
  designChartSvg,
  fsSpanSvg,
  slabContourSvg,
  strataColumnSvg,
  strengthChainSvg,
  strengthStripSvg,
  voussoirArchSvg,
} from '../../../src/report/charts/index';
import { expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';

const dir = join(__dirname, '../../../presets');
const presets = readdirSync(dir).filter((f) => f.endsWith('.lamina.json'));
const load = (file: string): Project => readProjectText(readFileSync(join(dir, file), 'utf8')).project;
const MODES: Mode[] = ['tension', 'crushing', 'sliding', 'deflection', 'snapThrough'];

/** Every chart of a project, from a real analysis. */
function allCharts(project: Project, units: UnitSystem): string[] {
  const a = analyse(project);
  const out = [strataColumnSvg(project, a, { units })];
  a.layers.forEach((d, i) => {
    out.push(strengthChainSvg(d.steps, { units }), strengthStripSvg(d.lab, { units }));
    out.push(beamProfileSvg(beamProfile(project, a, i), { units, designStrength_MPa: a.report.layers[i].strength.design_MPa }));
    const v = a.report.layers[i].voussoir;
    if (v) out.push(voussoirArchSvg({ span_m: project.opening.span_m, thickness_m: project.layers[i].thickness_m, ...v }, { units }));
    const field = slabField(project, a, i);
    if (field) out.push(slabContourSvg(field, { units }));
  });
  out.push(fsSpanSvg(spanCurve(project, { samples: 40 }), a.report.maxSpan_m, { units }));
  const chart = designChart(project, 0);
  for (const m of MODES) out.push(designChartSvg(chart, m, { units, currentSpan_m: project.opening.span_m, currentThickness_m: project.layers[0].thickness_m }));
  return out;
}

describe('charts of the presets (real analyses)', () => {
  it('there are presets to draw', () => expect(presets.length).toBeGreaterThanOrEqual(3));

  for (const file of presets) {
    for (const units of ['SI', 'US'] as UnitSystem[]) {
      it(`every chart of ${file} in ${units} is well-formed, unit-labelled and free of NaN`, () => {
        const project = load(file);
        const svgs = allCharts(project, units);
        for (const svg of svgs) {
          expectWellFormed(svg);
          expectNoBadNumbers(svg);
        }
        const length = units === 'SI' ? 'm' : 'ft';
        expectLabels(svgs[0], [`Height above the roof line (${length})`, ...project.layers.map((l) => l.name)]);
        expectLabels(svgs.find((s) => s.includes('fs-span'))!, [`Span (${length})`]);
      });
    }
  }

  it('the coal-room preset column marks the predicted bed separation from its analysis', () => {
    const file = presets.find((f) => f.startsWith('coal-room'));
    expect(file).toBeDefined();
    const project = load(file!);
    const a = analyse(project);
    const svg = strataColumnSvg(project, a, { units: 'SI' });
    expect(svg.match(/class="separation"/g)?.length ?? 0).toBe(a.separations.length);
    if (a.separations.length > 0) expectLabels(svg, ['bed separation']);
  });

  it('a preset turned into a slab draws its stress contours', () => {
    const project = load(presets.find((f) => f.startsWith('coal-room'))!);
    project.opening = { type: 'slab', span_m: project.opening.span_m, length_m: project.opening.span_m * 1.5, ends: project.opening.ends, edges: null };
    const a = analyse(project);
    const field = slabField(project, a, 0);
    expect(field).not.toBeNull();
    const svg = slabContourSvg(field!, { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['Along the long side, x (m)', 'Tension (MPa)']);
    expect(svg).toMatch(/class="contour"/);
  });
});
