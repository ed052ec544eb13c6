import { describe, expect, it } from 'vitest';
import { voussoirSearchSteps } from '../../../src/analysis/iteration-trace';
import { searchCurveSvg } from '../../../src/report/charts/search-curve';
import { expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { textContent } from './xml-check';

describe('searchCurveSvg', () => {
  it('marks the minimum of fc(n): rigid limit n = 0.75, fc = γ\'s²/(1.5t) (METHODS §3 algebra check)', () => {
    // E → ∞: z = z0, fc least at n = 0.75 with z0 = t/2: 25 kN/m³ · 36 m² / (1.5 · 0.45 m) = 1.33333 MPa.
    const search = voussoirSearchSteps({ span: 6, thickness: 0.45, unitWeight: 25e3, modulus: 1e18, ucs: 40e6, frictionDeg: 35 })!;
    expect(search.n).toBeCloseTo(0.75, 5);
    const svg = searchCurveSvg(search.steps);
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['Compression-zone depth ratio n', 'fc (MPa)', 'minimum: n = 0.75, fc = 1.33 MPa']);
    expect(svg).toContain('<path d="M'); // the curve
  });

  it('an ordinary beam: every trial inside the plot drawn, the minimum named in the description', () => {
    const search = voussoirSearchSteps({ span: 6, thickness: 0.45, unitWeight: 25e3, modulus: 8e9, ucs: 40e6, frictionDeg: 35 })!;
    const svg = searchCurveSvg(search.steps);
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expect(textContent(svg)).toMatch(/The least fc, [\d.]+ MPa, is at n = 0\.74/);
    expect((svg.match(/<circle /g) ?? []).length).toBeGreaterThan(3);
  });

  it('snap-through (no n has a lever arm) draws a note, no curve', () => {
    const svg = searchCurveSvg({ caption: '', columns: [], rows: [], stage: [], marked: null, curve: [[0.5, null]] });
    expectWellFormed(svg);
    expectLabels(svg, ['No lever arm at any n']);
  });
});
