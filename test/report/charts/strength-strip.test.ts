import { describe, expect, it } from 'vitest';
import { strengthStripSvg } from '../../../src/report/charts/strength-strip';
import { expectEscaped, expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { EVIL, lab } from './fixtures';

describe('strengthStripSvg', () => {
  it('strengthStripSvg(lab, SI) has a strength axis in MPa and labelled mean and characteristic lines', () => {
    const svg = strengthStripSvg(lab(), { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['Tensile strength (MPa)', 'mean 3 MPa (direct, n = 4)', 'characteristic 2.42 MPa (lower 5 % fractile, kn = 2.63)', 'Brazilian', 'direct = f × Brazilian']);
  });

  it('strengthStripSvg(lab, US) labels psi: 2.42 MPa = 351 psi (1 MPa = 145.04 psi, METHODS §10)', () => {
    const svg = strengthStripSvg(lab(), { units: 'US' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    // 2.42 × 145.04 = 351.0 psi; 2.996 × 145.04 = 434.5 → 435 psi (hand calculation)
    expectLabels(svg, ['Tensile strength (psi)', 'characteristic 351 psi', 'mean 435 psi']);
  });

  it('strengthStripSvg draws accepted specimens filled and rejected ones open with the reason in a <title>', () => {
    const svg = strengthStripSvg(lab(), { units: 'SI' });
    // 4 accepted × 2 rows, 1 rejected × 2 rows
    expect(svg.match(/class="specimen accepted"/g)).toHaveLength(8);
    expect(svg.match(/class="specimen rejected"/g)).toHaveLength(2);
    expect(svg).toMatch(/<g class="specimen rejected"><title>B3: 3.2 MPa, not used: not a central diametral fracture<\/title><circle [^>]*fill="#ffffff"/);
    expect(svg).toContain('Warnings: L/D 0.15 below 0.2 (ASTM D3967)');
  });

  it('strengthStripSvg escapes a hostile specimen id', () => {
    expectEscaped(strengthStripSvg(lab(EVIL), { units: 'SI' }));
  });

  it('strengthStripSvg for a given value (no specimens) shows the value and says so', () => {
    const svg = strengthStripSvg(
      { source: 'value', method: 'brazilian', directFactor: 0.7, specimens: [], n: 0, mean_MPa: 3, sd_MPa: null, cov: null, kn: null, characteristic_MPa: 2.1, rule: 'mean' },
      { units: 'SI' },
    );
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['value given (Brazilian), no specimens', 'characteristic 2.1 MPa (mean rule)']);
    expect(svg).toContain('class="given"');
  });
});
