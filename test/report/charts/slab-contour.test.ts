import { describe, expect, it } from 'vitest';
import { slabContourSvg } from '../../../src/report/charts/slab-contour';
import { expectEscaped, expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { EVIL, slab } from './fixtures';

describe('slabContourSvg', () => {
  it('slabContourSvg(field, SI) draws labelled contour levels on an equal-scale plan in m and marks the max', () => {
    const svg = slabContourSvg(slab(), { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    // fixture field 1.2 sin(πx/9) sin(πy/6): max 1.2 MPa at the centre; d3 ticks at 0.2 MPa steps
    expectLabels(svg, ['Along the long side, x (m)', 'Across the span, y (m)', 'Tension (MPa)', 'max 1.2 MPa', 'largest tension 1.2 MPa at centre']);
    const levels = [...svg.matchAll(/class="contour" data-level="([\d.]+)"/g)].map((m) => Number(m[1]));
    expect(levels).toEqual([0.2, 0.4, 0.6, 0.8, 1]);
    expect(svg.match(/class="level-label"/g)?.length).toBeGreaterThanOrEqual(3);
    // the max marker sits at the plan centre: x = 4.5 m, y = 3 m
    const plan = /<rect x="([\d.]+)" y="([\d.]+)" width="([\d.]+)" height="([\d.]+)" fill="none" stroke="#000000" stroke-width="2"\/>/.exec(svg)!.slice(1).map(Number);
    const c = /<g class="max-point"><circle cx="([\d.]+)" cy="([\d.]+)"/.exec(svg)!.slice(1).map(Number);
    expect(c[0]).toBeCloseTo(plan[0] + plan[2] / 2, 1);
    expect(c[1]).toBeCloseTo(plan[1] + plan[3] / 2, 1);
    // equal scale: 9 m × 6 m plan → width/height = 1.5
    expect(plan[2] / plan[3]).toBeCloseTo(1.5, 2);
  });

  it('slabContourSvg(field, US) labels ft and psi: 1.2 MPa = 174 psi (1 MPa = 145.04 psi, METHODS §10)', () => {
    const svg = slabContourSvg(slab(), { units: 'US' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['Along the long side, x (ft)', 'Tension (psi)', 'max 174 psi']);
  });

  it('slabContourSvg escapes hostile location text and title', () => {
    const f = slab();
    f.at = EVIL;
    expectEscaped(slabContourSvg(f, { units: 'SI' }));
    expectEscaped(slabContourSvg(slab(), { units: 'SI', title: EVIL }));
  });

  it('slabContourSvg of a field with NaN samples or a bad grid renders without NaN', () => {
    const f = slab();
    f.stress_MPa[5] = NaN;
    const svg = slabContourSvg(f, { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    const bad = slabContourSvg({ ...slab(), stress_MPa: [1, 2] }, { units: 'SI' });
    expectWellFormed(bad);
    expectLabels(bad, ['No slab stress field to draw']);
  });
});
