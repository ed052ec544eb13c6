import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { effectiveBlockSize, sizeEffectFactor } from '../../src/strength/size-effect';
import { expectClose } from '../helpers/expect-close';

describe('sizeEffectFactor', () => {
  it('sizeEffectFactor(50, 100) is 0.8827 and (50, 150) is 0.8206 — Hoek & Brown 1980 (METHODS §9)', () => {
    expectClose(sizeEffectFactor(50, 100), 0.8827, 5e-5);
    expectClose(sizeEffectFactor(50, 150), 0.8206, 5e-5);
  });

  it('sizeEffectFactor(54, 200) is 0.7900 — hand check in DESIGN.md report example: (54/200)^0.18', () => {
    expectClose(sizeEffectFactor(54, 200), 0.79, 1e-4);
  });

  it('is 1 at equal sizes and obeys f(a, b)·f(b, c) = f(a, c) — Hoek & Brown 1980 power law (property)', () => {
    const d = fc.double({ min: 1, max: 1000, noNaN: true });
    fc.assert(
      fc.property(d, d, d, (a, b, c) => {
        expect(sizeEffectFactor(a, a)).toBe(1);
        expectClose(sizeEffectFactor(a, b) * sizeEffectFactor(b, c), sizeEffectFactor(a, c), 1e-12);
      }),
    );
  });

  it('sizeEffectFactor throws a RangeError for a size ≤ 0 or NaN', () => {
    expect(() => sizeEffectFactor(0, 100)).toThrow(/dLab_mm/);
    expect(() => sizeEffectFactor(54, Number.NaN)).toThrow(/dEff_mm/);
  });
});

describe('effectiveBlockSize', () => {
  it('t 0.45 m, joints 8 m, span 6 m → raw 450 mm, clamped to 200 mm by thickness — METHODS §9 (DESIGN.md example)', () => {
    expect(effectiveBlockSize({ thickness: 0.45, crossJointSpacing: 8, span: 6, labDiameter: 0.054 })).toEqual({
      dLab_mm: 54, dEffRaw_mm: 450, dEff_mm: 200, clamped: true, limitedBy: 'thickness',
    });
  });

  it('takes the cross-joint spacing, or the span, when it is the smallest; null joints are ignored — METHODS §9', () => {
    const joints = effectiveBlockSize({ thickness: 0.45, crossJointSpacing: 0.15, span: 6, labDiameter: 0.054 });
    expect(joints).toMatchObject({ dEff_mm: 150, clamped: false, limitedBy: 'crossJointSpacing' });
    expectClose(joints.dEffRaw_mm, 150, 1e-12);
    const span = effectiveBlockSize({ thickness: 2, crossJointSpacing: null, span: 0.1, labDiameter: 0.054 });
    expect(span).toMatchObject({ dEffRaw_mm: 100, dEff_mm: 100, clamped: false, limitedBy: 'span' });
  });

  it('clamps up to d_lab when the block is smaller than the specimen (never raises strength) — METHODS §9', () => {
    const r = effectiveBlockSize({ thickness: 0.03, crossJointSpacing: null, span: 5, labDiameter: 0.054 });
    expectClose(r.dEffRaw_mm, 30, 1e-12);
    expect(r.dEff_mm).toBe(r.dLab_mm);
    expect(r.clamped).toBe(true);
    expect(sizeEffectFactor(r.dLab_mm, r.dEff_mm)).toBe(1);
  });

  it('d_eff stays in [d_lab, max(d_lab, 200 mm)] so the factor never exceeds 1 — METHODS §9 (property)', () => {
    const len = fc.double({ min: 1e-3, max: 100, noNaN: true });
    fc.assert(
      fc.property(len, fc.option(len, { nil: null }), len, fc.double({ min: 0.02, max: 0.3, noNaN: true }), (t, j, s, dl) => {
        const r = effectiveBlockSize({ thickness: t, crossJointSpacing: j, span: s, labDiameter: dl });
        expect(r.dEff_mm).toBeGreaterThanOrEqual(r.dLab_mm);
        expect(r.dEff_mm).toBeLessThanOrEqual(Math.max(r.dLab_mm, 200));
        expect(r.clamped).toBe(r.dEff_mm !== r.dEffRaw_mm);
        expect(sizeEffectFactor(r.dLab_mm, r.dEff_mm)).toBeLessThanOrEqual(1);
      }),
    );
  });

  it('effectiveBlockSize throws a RangeError for non-positive or NaN lengths', () => {
    const ok = { thickness: 0.5, crossJointSpacing: 1, span: 5, labDiameter: 0.054 };
    expect(() => effectiveBlockSize({ ...ok, thickness: 0 })).toThrow(/thickness/);
    expect(() => effectiveBlockSize({ ...ok, span: Number.NaN })).toThrow(/span/);
    expect(() => effectiveBlockSize({ ...ok, crossJointSpacing: -1 })).toThrow(/crossJointSpacing/);
    expect(() => effectiveBlockSize({ ...ok, labDiameter: Infinity })).toThrow(/labDiameter/);
  });
});
