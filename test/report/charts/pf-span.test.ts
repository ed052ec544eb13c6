import { describe, expect, it } from 'vitest';
import { pfSpanSvg } from '../../../src/report/charts/pf-span';
import { expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { textContent } from './xml-check';

// A P_f-against-span block as the run gives it (values invented; the intervals are Wilson 95 %
// intervals for 0, 3 and 120 failures in 2000 samples, Wilson 1927; the first is the rule of
// three 3/2000 = 0.0015, Hanley & Lippman-Hand 1983).
const block = {
  samplesPerSpan: 2000,
  acceptablePf: 0.01,
  pfVersusSpan: [
    { span_m: 4, pf: 0, pfInterval: [0, 0.0015] as [number, number], beta: null },
    { span_m: 6, pf: 0.0015, pfInterval: [0.00051, 0.0044] as [number, number], beta: 2.97 },
    { span_m: 8, pf: 0.06, pfInterval: [0.0504, 0.0713] as [number, number], beta: 1.55 },
  ],
};

describe('pfSpanSvg', () => {
  it('is well-formed, labels the span in m (SI) or ft (US: 6 m / 0.3048 = 19.7 ft) and marks the acceptable P_f', () => {
    const si = pfSpanSvg(block, { units: 'SI', currentSpan_m: 6 });
    expectWellFormed(si);
    expectNoBadNumbers(si);
    expectLabels(si, ['span (m)', 'P_f', 'acceptable P_f 0.01', 'current 6 m', '2000 samples at each span']);
    const us = pfSpanSvg(block, { units: 'US', currentSpan_m: 6 });
    expectWellFormed(us);
    expectLabels(us, ['span (ft)', 'current 19.7 ft']);
  });

  it('draws a span with no failure (P_f 0) as an open marker at the axis floor, the others filled', () => {
    const svg = pfSpanSvg(block, { units: 'SI' });
    const markers = [...svg.matchAll(/<circle[^>]*fill="([^"]+)"/g)].map((m) => m[1]);
    expect(markers.filter((f) => f === '#ffffff')).toHaveLength(1);
    expect(markers).toHaveLength(3);
    expect(textContent(svg)).toContain('open marker: no failure');
  });

  it('says so when no span points were run', () => {
    const svg = pfSpanSvg({ ...block, pfVersusSpan: [] }, { units: 'SI' });
    expectWellFormed(svg);
    expect(textContent(svg)).toContain('No span points were run');
  });
});
