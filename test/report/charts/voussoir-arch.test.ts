import { describe, expect, it } from 'vitest';
import { voussoirArchSvg, type VoussoirArchInput } from '../../../src/report/charts/voussoir-arch';
import { expectEscaped, expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { EVIL } from './fixtures';
import { normalise } from './xml-check';

// DESIGN.md report example (one shale layer, 6 m clamped span).
const stable: VoussoirArchInput = { span_m: 6, thickness_m: 0.45, n: 0.74, leverArm_m: 0.2256, deflection_mm: 2.36, snapThrough: false, maxCompression_MPa: 1.348 };
const snapped: VoussoirArchInput = { span_m: 16, thickness_m: 0.45, n: null, leverArm_m: null, deflection_mm: null, snapThrough: true, maxCompression_MPa: null };

describe('voussoirArchSvg', () => {
  it('voussoirArchSvg(stable, SI) annotates z, n·t = 0.333 m and the exaggerated vertical scale', () => {
    const svg = voussoirArchSvg(stable, { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    // n·t = 0.74 × 0.45 = 0.333 m (hand calculation)
    expectLabels(svg, ['lever arm z = 0.226 m', 'compression zone, n·t = 0.333 m', 'span 6 m', 't = 0.45 m', 'n = 0.74', 'max compression fc = 1.35 MPa', 'midspan deflection δ = 2.36 mm', 'compression arch (thrust line)']);
    expect(svg).toMatch(/Vertical scale exaggerated ×\d+(\.\d+)? relative to the horizontal\./);
    expect(svg.match(/class="compression-zone"/g)).toHaveLength(3);
  });

  it('voussoirArchSvg(stable, US) labels ft, psi and in (1 ft = 0.3048 m, METHODS §13)', () => {
    const svg = voussoirArchSvg(stable, { units: 'US' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    // 6/0.3048 = 19.685 → 19.7 ft (3 significant figures); 0.2256/0.3048 = 0.740 ft; 1.348 × 145.04 = 195.5 psi → 196 (hand)
    expectLabels(svg, ['span 19.7 ft', 'lever arm z = 0.74 ft', 'max compression fc = 196 psi', 'midspan deflection δ = 0.0929 in']);
  });

  it('voussoirArchSvg thrust line rises by z from the abutment zone to midspan (parabola apex = z·scale above the ends)', () => {
    const svg = voussoirArchSvg(stable, { units: 'SI' });
    const m = /class="thrust-line" d="M([\d.]+),([\d.]+)Q([\d.]+),([\d.-]+) ([\d.]+),([\d.]+)"/.exec(svg);
    expect(m).not.toBeNull();
    const [, , yA, , yCtrl, , yB] = m!.map(Number);
    expect(yA).toBeCloseTo(yB, 5);
    // apex of a quadratic Bézier with equal ends: (yA + yCtrl)/2; it is above the ends (smaller y)
    const apex = (yA + yCtrl) / 2;
    expect(apex).toBeLessThan(yA);
    // rise/ thickness on screen = z / t = 0.2256 / 0.45 (hand ratio), beam height from the rect
    const beamH = Number(/class="beam"[^>]*height="([\d.]+)"/.exec(svg)![1]);
    expect((yA - apex) / beamH).toBeCloseTo(0.2256 / 0.45, 2);
  });

  it('voussoirArchSvg(snapThrough) says "snap-through: no arch can form" and draws no thrust line', () => {
    const svg = voussoirArchSvg(snapped, { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['snap-through: no arch can form', 'span 16 m']);
    expect(svg).not.toContain('thrust-line');
    expect(svg).toContain('snap-through"');
  });

  it('voussoirArchSvg escapes a hostile title', () => {
    expectEscaped(voussoirArchSvg(stable, { units: 'SI', title: EVIL }));
  });

  it('voussoirArchSvg snapshot (DESIGN.md example, SI)', () => {
    expect(normalise(voussoirArchSvg(stable, { units: 'SI' }))).toMatchSnapshot();
  });
});
