import { describe, expect, it } from 'vitest';
import { fsSpanSvg } from '../../../src/report/charts/fs-span';
import { expectEscaped, expectLabels, expectNoBadNumbers, expectWellFormed } from './contract';
import { EVIL, MAX_SPAN, curve } from './fixtures';
import { normalise } from './xml-check';

describe('fsSpanSvg', () => {
  it('fsSpanSvg(curve, maxSpan, SI) has Span (m), a log FS/target axis, the target line and labelled max spans', () => {
    const svg = fsSpanSvg(curve(), MAX_SPAN, { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, [
      'Span (m)',
      'FS / target (log scale)',
      'FS = target (tension 4, crushing 2, sliding 1.5; deflection: δ/t = limit)',
      'tension max 1.91 m (governs)',
      'crushing max 15.4 m',
      'snap-through max 15.5 m',
      'deflection max 12.6 m',
      'current span 6 m',
      'snaps',
      'tension (target 4)',
    ]);
    expect(svg).not.toContain('sliding max');
    expect(svg.match(/class="mode mode-/g)).toHaveLength(4);
  });

  it('fsSpanSvg(..., US) labels Span (ft): 1.908 m = 6.26 ft (1 ft = 0.3048 m, METHODS §13)', () => {
    const svg = fsSpanSvg(curve(), MAX_SPAN, { units: 'US' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    // 1.908 / 0.3048 = 6.260 ft; 6 / 0.3048 = 19.685 → 19.7 ft (hand; 3 significant figures)
    expectLabels(svg, ['Span (ft)', 'tension max 6.26 ft (governs)', 'current span 19.7 ft']);
  });

  it('fsSpanSvg shades the snap-through region beyond its span', () => {
    const svg = fsSpanSvg(curve(), MAX_SPAN, { units: 'SI' });
    const m = /<g class="snaps"><rect x="([\d.]+)"/.exec(svg);
    expect(m).not.toBeNull();
    const snapMarker = /class="max-span max-span-snapThrough"/.test(svg);
    expect(snapMarker).toBe(true);
    const x = Number(/<line x1="([\d.]+)"[^>]*class="max-span max-span-snapThrough"/.exec(svg)![1]);
    // the fixture stands up to 15 m and snaps from 15.5 m (samples every 0.5 m): the shading starts
    // half-way, 15.25 m, within one sample spacing of the 15.46 m marker. Plot 70..510 px for
    // 0.5..20 m → 22.56 px/m, so one spacing is 11.28 px (hand calculation)
    expect(Math.abs(Number(m![1]) - x)).toBeLessThan(11.28);
    expect(Number(m![1])).toBeLessThan(x);
  });

  it('fsSpanSvg marks a mode the check table does not count (curve.counts) as not counted', () => {
    const c = curve();
    c.counts = { tension: false, crushing: true, sliding: true, deflection: true, snapThrough: true };
    const svg = fsSpanSvg(c, { ...MAX_SPAN, governing: 12.58 }, { units: 'SI' });
    expectLabels(svg, ['tension (not counted)', 'deflection max 12.6 m (governs)']);
  });

  it('fsSpanSvg without a max-span report and with gaps (null FS) still renders', () => {
    const c = curve();
    c.fs.crushing = c.fs.crushing.map((v, i) => (i % 3 === 0 ? null : v));
    const svg = fsSpanSvg(c, null, { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expect(svg).not.toContain('max-span');
  });

  it('fsSpanSvg escapes a hostile title', () => {
    expectEscaped(fsSpanSvg(curve(), MAX_SPAN, { units: 'SI', title: EVIL }));
  });

  it('fsSpanSvg snapshot (fixture curve, SI)', () => {
    expect(normalise(fsSpanSvg(curve(), MAX_SPAN, { units: 'SI' }))).toMatchSnapshot();
  });
});

describe('fsSpanSvg with support', () => {
  it('draws the least FS/target with this support and unsupported, named in the legend; without support, neither', () => {
    const base = curve();
    const withSupport = { ...base, support: { spans_m: [base.spans_m[0], base.spans_m[base.spans_m.length - 1]], withSupport: [3, 0.8], unsupported: [1.2, 0.3] } };
    const svg = fsSpanSvg(withSupport, MAX_SPAN, { units: 'SI' });
    expectWellFormed(svg);
    expectNoBadNumbers(svg);
    expectLabels(svg, ['with this support', 'without support', 'FS/target of all counted checks']);
    expect(svg).toMatch(/<path class="support-curve with-support" d="M[\d.,]+L[\d.,]+"/);
    expect(svg).toMatch(/<path class="support-curve unsupported" d="M[\d.,]+L[\d.,]+" [^>]*stroke-dasharray/);
    expect(fsSpanSvg(base, MAX_SPAN, { units: 'SI' })).not.toContain('support-curve');
  });
});
