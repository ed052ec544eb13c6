import { describe, expect, it } from 'vitest';
import { designChartSvg } from '../../../src/report/charts/design-chart';
import type { Mode } from '../../../src/model/types';
import { expectEscaped, expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { EVIL, design } from './fixtures';

describe('designChartSvg', () => {
  it('designChartSvg(chart, tension, SI) has Span (m) × Thickness (m), a bold labelled target contour and the current point', () => {
    const svg = designChartSvg(design(), 'tension', { units: 'SI', currentSpan_m: 6, currentThickness_m: 0.45 });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['Span (m)', 'Thickness (m)', 'FS = target (4)', 'current design (6 m, 0.45 m)', 'below target', 'Contours of FS / target, target FS 4']);
    expect(svg.match(/class="contour target"/g)).toHaveLength(1);
    expect(svg).toMatch(/class="contour target"[^>]*stroke-width="2.8"/);
    expect(svg).toContain('class="current-point"');
  });

  it('designChartSvg(chart, crushing, US) labels Span (ft) and Thickness (ft)', () => {
    const svg = designChartSvg(design(), 'crushing', { units: 'US', currentSpan_m: 6, currentThickness_m: 0.45 });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    // 6 / 0.3048 = 19.685 → 19.7 ft; 0.45 / 0.3048 = 1.476 → 1.48 ft (hand; 3 significant figures)
    expectLabels(svg, ['Span (ft)', 'Thickness (ft)', 'current design (19.7 ft, 1.48 ft)', 'FS = target (2)']);
  });

  it('designChartSvg renders every mode; a mode that does not apply says so', () => {
    for (const mode of ['tension', 'crushing', 'deflection', 'snapThrough'] as Mode[]) {
      const svg = designChartSvg(design(), mode, { units: 'SI' });
      expectWellFormed(svg);
      expectNoBadNumbers(svg);
      expect(svg).toContain('class="contour target"');
    }
    const none = designChartSvg(design(), 'sliding', { units: 'SI' });
    expectWellFormed(none);
    expectLabels(none, ['sliding: does not apply']);
  });

  it('designChartSvg notes a current design outside the chart instead of drawing it', () => {
    const svg = designChartSvg(design(), 'tension', { units: 'SI', currentSpan_m: 40, currentThickness_m: 0.45 });
    expectLabels(svg, ['The current design lies outside this chart.']);
    expect(svg).not.toContain('class="current-point"');
  });

  it('designChartSvg escapes a hostile title', () => {
    expectEscaped(designChartSvg(design(), 'tension', { units: 'SI', title: EVIL }));
  });
});

describe('designChartSvg with support', () => {
  it('draws the largest span with and without the support against thickness, named in the key', () => {
    const c = design();
    const t = c.thicknesses_m;
    const s = c.spans_m;
    const withCurve = { ...c, support: { thicknesses_m: [t[0], t[t.length - 1]], withSupport_m: [s[s.length - 1], s[1]], unsupported_m: [null, s[0]] } };
    const svg = designChartSvg(withCurve, 'tension', { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['with support', 'without support', 'every counted check']);
    expect(svg).toMatch(/<path class="support-curve with-support" d="M[\d.,]+L[\d.,]+"/);
    expect(svg).not.toMatch(/<path class="support-curve unsupported" d="M[\d.,]+L/); // one point only: no line
    expect(designChartSvg(c, 'tension', { units: 'SI' })).not.toContain('support-curve');
    expectLabels(svg, ['largest span meeting']);
  });

  it('for an overhang the axis, the key and the description say overhang, never span (an overhang is not a span: common practice)', () => {
    const c = design();
    const t = c.thicknesses_m;
    const s = c.spans_m;
    const withCurve = { ...c, support: { thicknesses_m: [t[0], t[t.length - 1]], withSupport_m: [s[s.length - 1], s[1]], unsupported_m: [s[0], s[0]] } };
    const svg = designChartSvg(withCurve, 'tension', { units: 'SI', spanWord: 'overhang' });
    expectLabels(svg, ['Overhang (m)', 'largest overhang meeting']);
    expect(svg).toContain('Also the largest overhang meeting every counted check');
    expect(svg.replace(/<[^>]+>/g, ' ')).not.toMatch(/\bspans?\b/i);
  });
});
