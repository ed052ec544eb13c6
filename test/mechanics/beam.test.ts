import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { elasticBeam, beamStateAt, type BeamEnds } from '../../src/mechanics/beam';
import { expectClose } from '../helpers/expect-close';

// Check values: METHODS §1 (arithmetic from Obert & Duvall 1967 roof-beam formulas):
// γ = 25 kN/m³, t = 1 m, s = 10 m, E = 10 GPa, self-weight only (q = γt = 25 kPa).
const base = { span: 10, thickness: 1, load: 25e3, modulus: 10e9, horizontalStress: 0 };

describe('elasticBeam — Obert & Duvall 1967', () => {
  it('clamped: abutment 1.250 MPa, midspan 0.625 MPa, deflection 0.78125 mm, Euler 328.99 MPa', () => {
    const r = elasticBeam({ ...base, ends: 'clamped' });
    expectClose(r.abutmentTension, 1.25e6);
    expectClose(r.midspanTension!, 0.625e6);
    expectClose(r.maxTension, 1.25e6);
    expect(r.at).toBe('abutment');
    expectClose(r.deflection, 0.78125e-3);
    expectClose(r.bucklingStress, 328.99e6, 1e-5);
  });
  it('simple: 1.875 MPa at midspan, 3.90625 mm, no abutment moment', () => {
    const r = elasticBeam({ ...base, ends: 'simple' });
    expectClose(r.maxTension, 1.875e6);
    expect(r.at).toBe('midspan');
    expectClose(r.deflection, 3.90625e-3);
    expect(r.abutmentTension).toBe(0);
    // π²Et²/(12s²) = 9.8696·10e9/1200 = 82.247 MPa (hand arithmetic)
    expectClose(r.bucklingStress, 82.247e6, 1e-4);
  });
  it('cantilever s = 3 m: 0.675 MPa at the root, 0.30375 mm', () => {
    const r = elasticBeam({ ...base, span: 3, ends: 'cantilever' });
    expectClose(r.maxTension, 0.675e6);
    expect(r.at).toBe('root');
    expect(r.midspanTension).toBeNull();
    expectClose(r.deflection, 0.30375e-3);
  });
  it('clamped with 50 kPa surcharge (q = 75 kPa): 3.75 MPa', () => {
    expectClose(elasticBeam({ ...base, load: 75e3, ends: 'clamped' }).maxTension, 3.75e6);
  });
  it('horizontal stress is superposed as uniform compression (METHODS §1)', () => {
    const r = elasticBeam({ ...base, ends: 'clamped', horizontalStress: 2e6 });
    expectClose(r.abutmentTension, 1.25e6 - 2e6);
    expectClose(r.midspanTension!, 0.625e6 - 2e6);
    const s = elasticBeam({ ...base, ends: 'simple', horizontalStress: 2e6 });
    expect(s.abutmentTension).toBe(-2e6);
  });
  it('tension ∝ s², deflection ∝ s⁴ (scaling law of the formulas)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom<BeamEnds>('clamped', 'simple', 'cantilever'),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        fc.double({ min: 0.05, max: 5, noNaN: true }),
        fc.double({ min: 1.1, max: 3, noNaN: true }),
        (ends, span, thickness, k) => {
          const a = elasticBeam({ ends, span, thickness, load: 20e3, modulus: 5e9, horizontalStress: 0 });
          const b = elasticBeam({ ends, span: span * k, thickness, load: 20e3, modulus: 5e9, horizontalStress: 0 });
          expectClose(b.maxTension / a.maxTension, k * k, 1e-9);
          expectClose(b.deflection / a.deflection, k ** 4, 1e-9);
        },
      ),
    );
  });
  it('refuses zero span, negative thickness and NaN load with the field named', () => {
    expect(() => elasticBeam({ ...base, ends: 'clamped', span: 0 })).toThrow(/span/);
    expect(() => elasticBeam({ ...base, ends: 'clamped', thickness: -1 })).toThrow(/thickness/);
    expect(() => elasticBeam({ ...base, ends: 'clamped', load: NaN })).toThrow(/load/);
  });
});

describe('beamStateAt — moment and deflection along the span (standard beam tables)', () => {
  it('matches the end-of-table values at the abutment, midspan and tip', () => {
    const c = { ...base, ends: 'clamped' as const };
    expectClose(beamStateAt(c, 0).top, 1.25e6);
    expectClose(beamStateAt(c, 5).bottom, 0.625e6);
    expectClose(beamStateAt(c, 5).deflection, 0.78125e-3);
    const s = { ...base, ends: 'simple' as const };
    expectClose(beamStateAt(s, 5).bottom, 1.875e6);
    expectClose(beamStateAt(s, 5).deflection, 3.90625e-3);
    const k = { ...base, span: 3, ends: 'cantilever' as const };
    expectClose(beamStateAt(k, 0).top, 0.675e6);
    expectClose(beamStateAt(k, 3).deflection, 0.30375e-3);
  });
  it('clamped moment changes sign at x = s(3 − √3)/6 (inflection point of a built-in beam)', () => {
    const x0 = (10 * (3 - Math.sqrt(3))) / 6;
    expect(Math.abs(beamStateAt({ ...base, ends: 'clamped' }, x0).bottom)).toBeLessThan(1e-6);
  });
});
