import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { strataColumnSvg } from '../../../src/report/charts/strata-column';
import { expectEscaped, expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { EVIL, analysis, project } from './fixtures';
import { normalise } from './xml-check';

/** Heights of the layer rectangles, by data-layer index. */
function layerHeights(svg: string): number[] {
  const out: number[] = [];
  for (const m of svg.matchAll(/<rect class="layer" data-layer="(\d+)"[^>]*?height="([\d.]+)"/g)) out[Number(m[1])] = Number(m[2]);
  return out;
}

describe('strataColumnSvg', () => {
  it('strataColumnSvg(project, analysis, SI) is well-formed SVG with a height axis in m and the span in m', () => {
    const svg = strataColumnSvg(project(), analysis(), { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['Height above the roof line (m)', 'span 6 m, clamped ends', 't = 0.45 m', 'Shale', 'Sandstone', 'Mudstone']);
  });

  it('strataColumnSvg(..., US) labels the axis in ft and the span as 19.7 ft (6 / 0.3048 = 19.685 to 3 significant figures, METHODS §13)', () => {
    const svg = strataColumnSvg(project(), analysis(), { units: 'US' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    // 6 m / 0.3048 m/ft = 19.685 ft; 0.45 m / 0.3048 = 1.476 ft; 10 kPa / 47.880 Pa/psf
    // (1 ksf = 47.880 kPa, METHODS §13) = 208.86 psf, shown whole above 100 (hand calculation)
    expectLabels(svg, ['Height above the roof line (ft)', 'span 19.7 ft', 't = 1.48 ft', 'surcharge 209 psf']);
  });

  it('strataColumnSvg escapes a hostile layer name and title as text', () => {
    const p = project(EVIL);
    p.title = EVIL;
    const svg = strataColumnSvg(p, analysis(p), { units: 'SI' });
    expectEscaped(svg);
  });

  it('strataColumnSvg draws layer heights proportional to the thicknesses (one vertical scale)', () => {
    const p = project();
    const h = layerHeights(strataColumnSvg(p, null, { units: 'SI' }));
    expect(h).toHaveLength(3);
    // 0.45 : 1.8 : 0.9 = 1 : 4 : 2 (hand ratio)
    expect(h[1] / h[0]).toBeCloseTo(4, 2);
    expect(h[2] / h[0]).toBeCloseTo(2, 2);
  });

  it('strataColumnSvg keeps layer heights to scale for any thicknesses (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0.05, max: 5, noNaN: true }), { minLength: 1, maxLength: 6 }), (ts) => {
        const p = project();
        p.layers = ts.map((t, i) => ({ ...project().layers[i % 3], name: `L${i}`, thickness_m: t }));
        const svg = strataColumnSvg(p, null, { units: 'SI' });
        const h = layerHeights(svg);
        const total = h.reduce((a, b) => a + b, 0);
        const k = total / ts.reduce((a, b) => a + b, 0);
        // each height is rounded to 0.01 px, so it differs from t·k by at most 0.005 (+ the sum's error)
        ts.forEach((t, i) => expect(Math.abs(h[i] - t * k)).toBeLessThan(0.005 * (ts.length + 1)));
        expect(total).toBeGreaterThan(100);
      }),
      { numRuns: 60 },
    );
  });

  it('strataColumnSvg with an analysis brackets "group 1", "group 2" and labels the bed separation', () => {
    const svg = strataColumnSvg(project(), analysis(), { units: 'SI' });
    expectLabels(svg, ['group 1', 'group 2', 'bed separation (Shale / Sandstone)']);
    expect(svg.match(/class="group"/g)).toHaveLength(2);
    const plain = strataColumnSvg(project(), null, { units: 'SI' });
    expect(plain).not.toContain('bed separation');
    expect(plain).not.toContain('group 1');
  });

  it('strataColumnSvg draws a cantilever as an overhang beside a rock face', () => {
    const p = project();
    p.opening = { type: 'cantilever', span_m: 2, length_m: null, ends: 'clamped', edges: null };
    const svg = strataColumnSvg(p, null, { units: 'SI' });
    expectWellFormed(svg);
    expectLabels(svg, ['overhang 2 m', 'rock face', 'open below the overhang']);
    expect(svg).not.toContain('clamped ends');
  });

  it('strataColumnSvg states both sides of a slab opening', () => {
    const p = project();
    p.opening = { type: 'slab', span_m: 6, length_m: 9, ends: 'simple', edges: null };
    expectLabels(strataColumnSvg(p, null, { units: 'SI' }), ['span (short side) 6 m × length 9 m, simple ends', 'opening (slab roof)']);
  });

  it('strataColumnSvg defines one hatch pattern per rock class with ids unique to the chart', () => {
    const a = strataColumnSvg(project(), null, { units: 'SI' });
    const ids = [...a.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]);
    expect(new Set(ids).size).toBe(ids.length);
    for (const c of ['sedimentary', 'igneous', 'metamorphic']) expect(ids.some((id) => id.endsWith(`rock-${c}`))).toBe(true);
    const p = project();
    p.layers[0].thickness_m = 0.5;
    const b = strataColumnSvg(p, null, { units: 'SI' });
    const prefix = (s: string) => /id="(lm[0-9a-f]{8})-/.exec(s)?.[1];
    expect(prefix(a)).toBeDefined();
    expect(prefix(a)).not.toBe(prefix(b));
    // every url(#…) reference points at a defined id
    for (const ref of a.matchAll(/url\(#([^)]+)\)/g)) expect(ids).toContain(ref[1]);
  });

  it('strataColumnSvg with no layers says so instead of drawing', () => {
    const p = project();
    p.layers = [];
    const svg = strataColumnSvg(p, null, { units: 'SI' });
    expectWellFormed(svg);
    expectLabels(svg, ['No layers']);
  });

  it('strataColumnSvg snapshot (fixture room, SI, with analysis)', () => {
    expect(normalise(strataColumnSvg(project(), analysis(), { units: 'SI' }))).toMatchSnapshot();
  });
});
