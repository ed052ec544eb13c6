import { describe, expect, it } from 'vitest';
import { beamProfileSvg } from '../../../src/report/charts/beam-profile';
import { expectEscaped, expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { EVIL, profile } from './fixtures';

describe('beamProfileSvg', () => {
  it('beamProfileSvg(clamped profile, SI) shows top max 1 MPa = q·s²/(2t²) and deflection 0.625 mm = q·s⁴/(32Et³) — Obert & Duvall 1967', () => {
    // q = 11.25 kPa, s = 6 m, t = 0.45 m, E = 8 GPa: 11.25e3·36/(2·0.2025) = 1.0 MPa;
    // 11.25e3·1296/(32·8e9·0.091125) = 0.625 mm (hand calculation, DESIGN.md example)
    const svg = beamProfileSvg(profile(), { units: 'SI', designStrength_MPa: 0.404 });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['Distance along the span (m)', 'Net tension (MPa)', 'Deflection, down (mm)', 'top max 1 MPa', 'bottom max 0.5 MPa', 'max 0.625 mm', 'design 0.404 MPa', 'top fibre', 'bottom fibre', 'zero']);
  });

  it('beamProfileSvg(profile, US) labels ft, psi and in: 0.625 mm = 0.0246 in (1 in = 25.4 mm)', () => {
    const svg = beamProfileSvg(profile(), { units: 'US' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    // 1 MPa = 145.04 psi (METHODS §10); 0.625 / 25.4 = 0.02461 in (hand calculation)
    expectLabels(svg, ['Distance along the span (ft)', 'Net tension (psi)', 'Deflection, down (in)', 'top max 145 psi', 'max 0.0246 in']);
    expect(svg).not.toContain('design ');
  });

  it('beamProfileSvg draws deflection downward: the deepest point lies below the zero line', () => {
    const svg = beamProfileSvg(profile(), { units: 'SI' });
    const zeroY = [...svg.matchAll(/<line x1="80" y1="([\d.]+)" x2="510" y2="\1" stroke="#000000" stroke-width="1.2"\/>/g)].map((m) => Number(m[1]));
    const tri = /<path d="M[\d.]+,([\d.]+)L[^"]*Z" fill="#009E73"/.exec(svg);
    expect(zeroY.length).toBe(2);
    expect(tri).not.toBeNull();
    expect(Number(tri![1])).toBeGreaterThan(zeroY[1]);
  });

  it('beamProfileSvg escapes a hostile title', () => {
    expectEscaped(beamProfileSvg(profile(), { units: 'SI', title: EVIL }));
  });

  it('beamProfileSvg of an empty profile says so', () => {
    const svg = beamProfileSvg({ layer: 0, x_m: [], topTension_MPa: [], bottomTension_MPa: [], deflection_mm: [] }, { units: 'SI' });
    expectWellFormed(svg);
    expectLabels(svg, ['No profile to draw']);
  });
});
