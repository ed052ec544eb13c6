import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { interlayerShearCheck, DEFAULT_SHEAR_FRACTION, type InterlayerShearInput } from '../../src/mechanics/interlayer-shear';
import { compositeBeam } from '../../src/mechanics/composite-beam';
import { expectClose } from '../helpers/expect-close';

const base: InterlayerShearInput = {
  shearStress: 100e3,
  capacity: 100e3,
  shearCapacity: null,
  pretension: 0,
  frictionDeg: 30,
  spacingAcross: 1,
  spacingAlong: 1,
};

describe('interlayerShearCheck — bolt resistance (V_b + T₀ tanφ)/(Sx Sy), METHODS §12', () => {
  it('default shear capacity 0.6 × axial (von Mises fy/√3 = 0.577 fy, rounded up to the usual 0.6 fy design value; from memory)', () => {
    expect(DEFAULT_SHEAR_FRACTION).toBe(0.6);
    expect(Math.abs(DEFAULT_SHEAR_FRACTION - 1 / Math.sqrt(3))).toBeLessThan(0.025);
    const r = interlayerShearCheck(base);
    expectClose(r.shearCapacity, 60e3);
  });

  it('the METHODS §12 beam (τ = 100 kPa) with 100 kN bolts at 1 × 1 m, no pretension: 60 kPa resistance, FS 0.60 (statics)', () => {
    const beam = compositeBeam({
      layers: [0.3, 0.3, 0.3].map((thickness) => ({ thickness, modulus: 10e9, unitWeight: 25e3 })),
      span: 6,
      ends: 'clamped',
    });
    const r = interlayerShearCheck({ ...base, shearStress: beam.interfaces[0].shearStress });
    expectClose(r.resistance, 60e3);
    expectClose(r.fs!, 0.6);
  });

  it('pretension 50 kN at φ 30° on a 1.2 × 1.2 m pattern: (60 + 50·tan30°) kN / 1.44 m² = 88.8675 kN / 1.44 m² = 61.7136 kPa (statics, friction)', () => {
    const r = interlayerShearCheck({ ...base, pretension: 50e3, spacingAcross: 1.2, spacingAlong: 1.2 });
    expectClose(r.resistance, (60e3 + 50e3 * Math.tan(Math.PI / 6)) / 1.44);
    expectClose(r.resistance, 61_713.6, 1e-5);
  });

  it('a given shear capacity replaces the default; zero demand gives FS null, never Infinity', () => {
    expectClose(interlayerShearCheck({ ...base, shearCapacity: 80e3 }).resistance, 80e3);
    expect(interlayerShearCheck({ ...base, shearStress: 0 }).fs).toBeNull();
  });

  it('more bolts never lower the shear FS: FS ∝ 1/(Sx Sy) (statics)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 200e3, noNaN: true }),
        (sx, sy, k, pretension) => {
          const wide = interlayerShearCheck({ ...base, pretension, spacingAcross: sx, spacingAlong: sy });
          const dense = interlayerShearCheck({ ...base, pretension, spacingAcross: sx * k, spacingAlong: sy });
          expect(dense.fs!).toBeGreaterThanOrEqual(wide.fs!);
          expectClose(dense.fs! / wide.fs!, 1 / k, 1e-9);
        },
      ),
    );
  });

  it('refuses bad input naming the parameter', () => {
    expect(() => interlayerShearCheck({ ...base, spacingAcross: -1 })).toThrow(/spacingAcross/);
    expect(() => interlayerShearCheck({ ...base, capacity: 0 })).toThrow(/capacity/);
    expect(() => interlayerShearCheck({ ...base, shearCapacity: NaN })).toThrow(/shearCapacity/);
    expect(() => interlayerShearCheck({ ...base, pretension: -1 })).toThrow(/pretension/);
    expect(() => interlayerShearCheck({ ...base, frictionDeg: 90 })).toThrow(/frictionDeg/);
    expect(() => interlayerShearCheck({ ...base, shearStress: NaN })).toThrow(/shearStress/);
  });
});
