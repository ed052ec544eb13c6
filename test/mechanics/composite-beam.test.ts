import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { compositeBeam, type CompositeLayer } from '../../src/mechanics/composite-beam';
import { elasticBeam, type BeamEnds } from '../../src/mechanics/beam';
import { expectClose } from '../helpers/expect-close';

const equal3: CompositeLayer[] = [0.3, 0.3, 0.3].map((thickness) => ({ thickness, modulus: 10e9, unitWeight: 25e3 }));

describe('compositeBeam — METHODS §12 check: three equal 0.3 m layers, γ = 25 kN/m³, s = 6 m, clamped', () => {
  const r = compositeBeam({ layers: equal3, span: 6, ends: 'clamped' });

  it('unbonded σ = γs²/(2t) = 1.500 MPa in every layer; bonded σ = γs²/(2T) = 0.500 MPa (METHODS §12, Obert & Duvall §1 formulas)', () => {
    for (const u of r.unbonded) {
      expectClose(u.load, 7.5e3);
      expectClose(u.maxTension, 1.5e6);
    }
    const bondedMax = Math.max(...r.bonded.map((b) => b.maxTension));
    expectClose(bondedMax, 0.5e6);
    // It is the top fibre of the top layer at the abutment; the bottom fibre at midspan has half.
    expectClose(r.bonded[2].abutment.top, 0.5e6);
    expectClose(r.bonded[0].abutment.bottom, -0.5e6);
    expectClose(r.bonded[0].midspan!.bottom, 0.25e6);
  });

  it('neutral axis at mid-depth 0.45 m, EI = E T³/12, deflection qs⁴/(384EI) = qs⁴/(32ET³) = 0.125 mm (§1 formula with T = 0.9 m)', () => {
    expectClose(r.neutralAxis, 0.45);
    expectClose(r.flexuralRigidity, (10e9 * 0.9 ** 3) / 12);
    expectClose(r.deflection, (22.5e3 * 6 ** 4) / (32 * 10e9 * 0.9 ** 3));
    expectClose(r.deflection, 1.25e-4);
  });

  it('τ = 100.0 kPa at both interfaces (beam shear formula τ = VQ/(Ib), Gere & Timoshenko)', () => {
    // By hand: q = 3·0.3·25 = 22.5 kPa, V = q s/2 = 67.5 kN/m; I = 0.9³/12 = 0.06075 m⁴ (b = 1 m);
    // interface at 0.3 m: Q = 0.3 m² × (0.45 − 0.15) m = 0.09 m³; τ = 67.5e3·0.09/0.06075 = 100 kPa.
    // Also the parabola τ = (3V/2A)(1 − (2y/h)²) = 112.5 kPa × (1 − (0.15/0.45)²) = 100 kPa.
    expectClose(r.shearForce, 67.5e3);
    expect(r.interfaces.map((f) => f.lowerLayer)).toEqual([0, 1]);
    expectClose(r.interfaces[0].height, 0.3);
    expectClose(r.interfaces[1].height, 0.6);
    for (const f of r.interfaces) expectClose(f.shearStress, 100e3);
  });
});

describe('compositeBeam — transformed section with two moduli (hand-worked)', () => {
  // Layer 0: 0.4 m, E 20 GPa; layer 1: 0.4 m, E 10 GPa; γ 25 kN/m³; simple span 4 m.
  // Transformed to E_ref = 10 GPa: layer 0 is 2 m wide. ȳ = (0.8·0.2 + 0.4·0.6)/1.2 = 1/3 m.
  // I* = 2·0.4³/12 + 0.8·(1/3 − 0.2)² + 0.4³/12 + 0.4·(0.6 − 1/3)² = 0.058667 m⁴ (EI = 5.8667e8).
  // q = 20 kPa, M = qs²/8 = 40 kN·m/m. Bottom of layer 0: σ = (E/E_ref)·M·ȳ/I* = 2·40e3·(1/3)/0.058667
  // = 454.545 kPa; top of layer 1: −40e3·(0.8 − 1/3)/0.058667 = −318.182 kPa;
  // interface (y = 0.4): layer 0 −2·40e3·(0.4 − 1/3)/I* = −90.909 kPa, layer 1 −45.455 kPa.
  // Shear: V = 40 kN/m, Q* = 0.8·(1/3 − 0.2) = 0.106667 m³, τ = 40e3·0.106667/0.058667 = 72.727 kPa.
  const r = compositeBeam({
    layers: [
      { thickness: 0.4, modulus: 20e9, unitWeight: 25e3 },
      { thickness: 0.4, modulus: 10e9, unitWeight: 25e3 },
    ],
    span: 4,
    ends: 'simple',
  });
  it('neutral axis 1/3 m, EI 5.8667e8 N·m²/m', () => {
    expectClose(r.neutralAxis, 1 / 3);
    expectClose(r.flexuralRigidity, 1.76e9 / 3);
  });
  it('fibre stresses 454.545, −90.909 | −45.455, −318.182 kPa at midspan; none at a simple abutment', () => {
    expectClose(r.moments.midspan!, 40e3);
    expectClose(r.bonded[0].midspan!.bottom, 454_545.4545, 1e-8);
    expectClose(r.bonded[0].midspan!.top, -90_909.0909, 1e-8);
    expectClose(r.bonded[1].midspan!.bottom, -45_454.5454, 1e-8);
    expectClose(r.bonded[1].midspan!.top, -318_181.8182, 1e-8);
    expect(r.bonded[0].abutment).toEqual({ top: 0, bottom: 0 });
    expectClose(r.bonded[0].maxTension, 454_545.4545, 1e-8);
  });
  it('interlayer shear 72.727 kPa from the transformed Q* and I*', () => {
    expectClose(r.interfaces[0].shearStress, 72_727.2727, 1e-8);
  });
  it('unbonded: the layers bend together (§2: 13.33 kPa ≥ 10 kPa) and share by E t³: 13.33 and 6.67 kPa → 1.0 and 0.5 MPa (3qs²/(4t²))', () => {
    expectClose(r.unbonded[0].load, 40e3 / 3);
    expectClose(r.unbonded[1].load, 20e3 / 3);
    expectClose(r.unbonded[0].maxTension, 1.0e6);
    expectClose(r.unbonded[1].maxTension, 0.5e6);
  });
});

describe('compositeBeam — end conditions and loads', () => {
  it('cantilever: V = q s at the root; two equal 0.25 m layers, s = 2 m: τ at the interface (the neutral axis) = 1.5 V/A = 75 kPa (beam shear formula)', () => {
    const r = compositeBeam({
      layers: [0.25, 0.25].map((thickness) => ({ thickness, modulus: 10e9, unitWeight: 25e3 })),
      span: 2,
      ends: 'cantilever',
    });
    expectClose(r.shearForce, 25e3);
    expectClose(r.interfaces[0].shearStress, 75e3);
    expect(r.moments.midspan).toBeNull();
    // Root: M = −qs²/2 = −25 kN·m/m, top fibre σ = 6M/T² = 600 kPa (= 3qs²/T², §1 cantilever).
    expectClose(r.bonded[1].abutment.top, 600e3);
    expect(r.bonded[0].midspan).toBeNull();
    expect(r.unbonded[0].midspanTension).toBeNull();
  });

  it('surcharge adds to and standing support subtracts from the load: 10 kPa surcharge, 4 kPa support → q = 28.5 kPa', () => {
    const r = compositeBeam({ layers: equal3, span: 6, ends: 'clamped', surcharge: 10e3, standingSupport: 4e3 });
    expectClose(r.load, 28.5e3);
    expectClose(Math.max(...r.bonded.map((b) => b.maxTension)), (28.5e3 * 36) / (2 * 0.81));
  });

  it('one layer reduces to the §1 elastic beam (Obert & Duvall 1967) for every end condition', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<BeamEnds>('clamped', 'simple', 'cantilever'),
        fc.double({ min: 0.05, max: 5, noNaN: true }),
        fc.double({ min: 0.5, max: 30, noNaN: true }),
        fc.double({ min: 1e9, max: 80e9, noNaN: true }),
        (ends, t, s, E) => {
          const layer = { thickness: t, modulus: E, unitWeight: 25e3 };
          const r = compositeBeam({ layers: [layer], span: s, ends });
          const b = elasticBeam({ ends, span: s, thickness: t, load: 25e3 * t, modulus: E, horizontalStress: 0 });
          expectClose(r.bonded[0].maxTension, b.maxTension, 1e-9);
          expectClose(r.unbonded[0].maxTension, b.maxTension, 1e-9);
          expectClose(r.deflection, b.deflection, 1e-9);
          expect(r.interfaces).toEqual([]);
        },
      ),
    );
  });
});

const layerArb = fc.record({
  thickness: fc.double({ min: 0.05, max: 2, noNaN: true }),
  modulus: fc.double({ min: 1e9, max: 60e9, noNaN: true }),
  unitWeight: fc.double({ min: 15e3, max: 30e3, noNaN: true }),
});

describe('compositeBeam — equilibrium and compatibility (properties)', () => {
  it('the bonded fibre stresses carry no net axial force and resist the moment: Σ∫σ dA = 0, Σ∫σ(y − ȳ) dA = −M (statics); strain σ/E is continuous across interfaces', () => {
    fc.assert(
      fc.property(fc.array(layerArb, { minLength: 1, maxLength: 6 }), fc.double({ min: 1, max: 20, noNaN: true }), (layers, s) => {
        const r = compositeBeam({ layers, span: s, ends: 'clamped' });
        const M = r.moments.abutment;
        let force = 0;
        let moment = 0;
        let scale = 0;
        r.bonded.forEach((b, i) => {
          const { top, bottom } = b.abutment;
          const t = layers[i].thickness;
          // σ is linear in y within a layer: ∫σ dA = t·mean, ∫σ(y − ȳ) dA by Simpson (exact for quadratics).
          const yb = b.bottomHeight - r.neutralAxis;
          const yt = b.topHeight - r.neutralAxis;
          const mid = (top + bottom) / 2;
          force += t * mid;
          moment += (t / 6) * (bottom * yb + 4 * mid * ((yb + yt) / 2) + top * yt);
          scale += t * (Math.abs(top) + Math.abs(bottom));
          if (i > 0) {
            const below = r.bonded[i - 1].abutment.top / layers[i - 1].modulus;
            expectClose(bottom / layers[i].modulus, below, 1e-9);
          }
        });
        expect(Math.abs(force)).toBeLessThanOrEqual(1e-9 * scale);
        expectClose(moment, -M, 1e-9);
      }),
    );
  });

  it('full bond never leaves the roof worse than equal-modulus unbonded layers: max bonded tension ≤ max unbonded tension (Σt³ ≤ t_max·T²)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0.05, max: 2, noNaN: true }), { minLength: 1, maxLength: 6 }), fc.constantFrom<BeamEnds>('clamped', 'simple', 'cantilever'), (ts, ends) => {
        const layers = ts.map((thickness) => ({ thickness, modulus: 10e9, unitWeight: 25e3 }));
        const r = compositeBeam({ layers, span: 5, ends });
        const bonded = Math.max(...r.bonded.map((b) => b.maxTension));
        const unbonded = Math.max(...r.unbonded.map((u) => u.maxTension));
        expect(bonded).toBeLessThanOrEqual(unbonded * (1 + 1e-12));
      }),
    );
  });

  it('refuses bad input naming the parameter', () => {
    expect(() => compositeBeam({ layers: [], span: 6, ends: 'clamped' })).toThrow(/layers/);
    expect(() => compositeBeam({ layers: [{ ...equal3[0], thickness: NaN }], span: 6, ends: 'clamped' })).toThrow(/layers\[0\]\.thickness/);
    expect(() => compositeBeam({ layers: [equal3[0], { ...equal3[0], modulus: 0 }], span: 6, ends: 'clamped' })).toThrow(/layers\[1\]\.modulus/);
    expect(() => compositeBeam({ layers: [{ ...equal3[0], unitWeight: -1 }], span: 6, ends: 'clamped' })).toThrow(/unitWeight/);
    expect(() => compositeBeam({ layers: equal3, span: NaN, ends: 'clamped' })).toThrow(/span/);
    expect(() => compositeBeam({ layers: equal3, span: 6, ends: 'fixed' as BeamEnds })).toThrow(/ends/);
    expect(() => compositeBeam({ layers: equal3, span: 6, ends: 'clamped', surcharge: -1 })).toThrow(/surcharge/);
    expect(() => compositeBeam({ layers: equal3, span: 6, ends: 'clamped', standingSupport: NaN })).toThrow(/standingSupport/);
  });
});
