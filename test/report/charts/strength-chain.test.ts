import { describe, expect, it } from 'vitest';
import { strengthChainSvg } from '../../../src/report/charts/strength-chain';
import { expectEscaped, expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { EVIL, steps } from './fixtures';

describe('strengthChainSvg', () => {
  it('strengthChainSvg(steps, SI) draws one bar per step with its value, label and reason', () => {
    const svg = strengthChainSvg(steps(), { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expect(svg.match(/<g class="step"/g)).toHaveLength(6);
    expectLabels(svg, ['Tensile strength (MPa)', '3 MPa', '2.1 MPa', '1.66 MPa', '0.404 MPa', 'lab', 'rock mass', 'design', 'Mean rule.']);
    // ratio of block to characteristic: 1.659 / 2.1 = 0.79 (hand calculation)
    expectLabels(svg, ['×0.79', '×0.7']);
  });

  it('strengthChainSvg(steps, US) labels psi: 3 MPa = 435 psi (1 MPa = 145.04 psi, METHODS §10)', () => {
    const svg = strengthChainSvg(steps(), { units: 'US' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['Tensile strength (psi)', '435 psi']);
  });

  it('strengthChainSvg keeps bar heights proportional to the values on its linear axis', () => {
    const svg = strengthChainSvg(steps(), { units: 'SI' });
    const h = [...svg.matchAll(/<g class="step"[^>]*><title>[^<]*<\/title><rect [^>]*height="([\d.]+)"/g)].map((m) => Number(m[1]));
    expect(h).toHaveLength(6);
    // 2.1 / 3 = 0.7 (hand); heights rounded to 0.01 px
    expect(h[1] / h[0]).toBeCloseTo(0.7, 3);
  });

  it('strengthChainSvg shows a zero design strength (cross-jointed layer) as a zero bar, not a gap', () => {
    const s = steps();
    s[5] = { ...s[5], value_MPa: 0, reason: 'Cross-jointed: no tensile strength across the joints (common practice).' };
    const svg = strengthChainSvg(s, { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['0 MPa']);
    expect(svg).toMatch(/data-key="design"><title>[^<]*<\/title><rect [^>]*height="0"/);
  });

  it('strengthChainSvg escapes a hostile reason', () => {
    expectEscaped(strengthChainSvg(steps(EVIL), { units: 'SI' }));
  });

  it('strengthChainSvg([]) says there is nothing to draw', () => {
    const svg = strengthChainSvg([], { units: 'SI' });
    expectWellFormed(svg);
    expectLabels(svg, ['No strength steps']);
  });
});
