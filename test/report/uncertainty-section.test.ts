import { describe, expect, it } from 'vitest';
import { analyse } from '../../src/analysis/analyse';
import { withUncertainty } from '../../src/analysis/probability-row';
import { spanCurve } from '../../src/analysis/span-curve';
import { fsHistogramSvg } from '../../src/report/charts/fs-histogram';
import { sensitivitySvg } from '../../src/report/charts/sensitivity';
import { renderMarkdown } from '../../src/report/render-markdown';
import { renderHtml } from '../../src/report/render-html';
import { buildReportDocument } from '../../src/report/report-document';
import { numberText } from '../../src/report/number-text';
import { NO_CURRENT_RUN } from '../../src/report/sections/uncertainty';
import { runUncertainty } from '../../src/uncertainty/run';
import { presets } from '../analysis/fixtures';

function withRun() {
  const project = structuredClone(presets().find((p) => p.file.includes('coal-room'))!.project);
  project.uncertainty = { samples: 400, seed: 3, method: 'latinHypercube', acceptablePf: 0.05,
    variables: [{ path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.15 }, { path: 'layers[0].unitWeight_kNm3', distribution: 'uniform', cov: 0 }] };
  const analysis = analyse(project);
  const block = runUncertainty(project, { spanPoints: 4, samplesPerSpan: 200 });
  return { project, analysis: withUncertainty(analysis, block), block };
}

describe('the report uncertainty section (METHODS §16)', () => {
  const { project, analysis, block } = withRun();
  const doc = buildReportDocument({ project, analysis, curve: spanCurve(project), projectText: JSON.stringify(project), units: 'SI', version: 'test' });
  it('is present with the method, seed, P_f and its interval, β, and the meaning of P_f', () => {
    const section = doc.sections.find((s) => s.id === 'uncertainty');
    expect(section).toBeDefined();
    const md = renderMarkdown(doc);
    expect(md).toContain('seed 3');
    expect(md).toContain('Latin hypercube');
    expect(md).toMatch(/95 % interval/);
    expect(md).toContain('Priest & Brown (1983)');
    expect(md).toContain('Context only');
    expect(md).toContain('thickness_m');
    expect(md).not.toMatch(/NaN|Infinity/);
    expect(renderHtml(doc)).toContain('fs-histogram');
  });
  it('is absent without a study; with a study but no current run it says so and prints no P_f', () => {
    const none = structuredClone(project);
    none.uncertainty = null;
    const plain = buildReportDocument({ project: none, analysis: analyse(none), curve: spanCurve(none), units: 'SI', version: 'test' });
    expect(plain.sections.some((s) => s.id === 'uncertainty')).toBe(false);
    const noRun = buildReportDocument({ project, analysis: analyse(project), curve: spanCurve(project), units: 'SI', version: 'test' });
    const section = noRun.sections.find((s) => s.id === 'uncertainty');
    expect(section).toBeDefined();
    const md = renderMarkdown(noRun);
    expect(md).toContain(NO_CURRENT_RUN);
    expect(md).not.toMatch(/P_f = |95 % interval|seed 3/);
    expect(md).not.toContain('whole roof');
  });
  it('the acceptable P_f is a row of the check table (whole roof, counted, never governing) and the section says how it stands', () => {
    const checks = doc.sections.find((s) => s.id === 'checks')!;
    const md = renderMarkdown({ ...doc, sections: [checks] });
    const line = md.split('\n').find((l) => l.includes('whole roof'))!;
    expect(line).toContain('probability of failure P_f');
    expect(line).toContain(`P_f ${numberText(block.pfInterval[1], 3)}`);
    expect(line).not.toContain('(governing)');
    const row = analysis.report.checks.find((r) => r.mode === 'probabilityOfFailure')!;
    expect(row.status).toBe(block.pfInterval[1] <= 0.05 ? 'meets' : 'below');
    expect(renderMarkdown(doc)).toContain('a counted row of the check table (whole roof), never the governing one');
  });
  it('the histogram counts every drawn sample and marks FS = 1; the tornado lists every input, a constant one as such', () => {
    const svg = fsHistogramSvg(block, { target: 2 });
    const drawn = block.histogram.bins.reduce((a, b) => a + b.count, 0);
    expect(drawn + block.histogram.above).toBe(block.histogram.total);
    expect(svg).toContain('FS = 1');
    expect(svg).toContain('target 2');
    const t = sensitivitySvg(block);
    expect(t).toContain('layers[0].thickness_m');
    expect(t).toContain('constant (no spread)');
    expect(sensitivitySvg({ sensitivity: [{ path: '<b>', rankCorrelation: 0.5 }] })).toContain('&lt;b&gt;');
  });
});
