import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/expect-close';
import { largestPassingSpan, smallestPassingValue } from '../../src/mechanics/span-search';
import { solveVoussoir } from '../../src/mechanics/voussoir';

describe('largestPassingSpan', () => {
  it('largestPassingSpan((s0/s)²) is s0 to 1 mm, passing at the result and failing 1 mm above — analytic crossing', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.11, max: 99.9, noNaN: true }), (s0) => {
        const ratio = (s: number) => (s0 / s) ** 2;
        const s = largestPassingSpan(ratio);
        expect(s).toBeLessThanOrEqual(s0);
        expect(s0 - s).toBeLessThanOrEqual(1e-3);
        expect(ratio(s)).toBeGreaterThanOrEqual(1);
        expect(ratio(s + 1e-3)).toBeLessThan(1);
      }),
      { numRuns: 300 },
    );
  });

  it('returns the cap when the ratio is ≥ 1 everywhere (100 m default, METHODS §11) and honours a custom cap', () => {
    expect(largestPassingSpan(() => 1)).toBe(100);
    expect(largestPassingSpan(() => 3, { cap: 40 })).toBe(40);
  });

  it('returns 0 when it fails even at the 1 mm floor (METHODS §11 v2), and treats NaN as failing', () => {
    expect(largestPassingSpan(() => 0.999)).toBe(0);
    expect(largestPassingSpan(() => NaN)).toBe(0);
    // Passing only below the floor: 0.
    expect(largestPassingSpan((s) => (s < 0.0009 ? 2 : 0))).toBe(0);
    // Passing at exactly the floor: the floor.
    expect(largestPassingSpan((s) => (s <= 0.001 ? 2 : 0))).toBe(0.001);
  });

  it('continues the bracket below cap/1000 down to 1 mm: a crossing at 0.05 m or 2 mm is found to 0.1 mm (METHODS §11 v2)', () => {
    for (const edge of [0.05, 0.002]) {
      const s = largestPassingSpan((x) => (x <= edge ? 2 : 0), { tolerance: 1e-4 });
      expect(s).toBeLessThanOrEqual(edge);
      expect(edge - s).toBeLessThanOrEqual(1e-4);
    }
  });

  it('non-monotone ratio with a dip: passes below 3 m, fails 3–5 m, passes 5–8 m, fails above → 8 m (hand-built)', () => {
    const ratio = (s: number) => (s < 3 || (s >= 5 && s <= 8) ? 1.5 : 0.5);
    const s = largestPassingSpan(ratio);
    expect(s).toBeLessThanOrEqual(8);
    expect(8 - s).toBeLessThanOrEqual(1e-3);
    // A dip above the last crossing is irrelevant: passes to 20 m except 10–12 m → 20 m.
    const dipped = (s: number) => (s <= 20 && !(s > 10 && s < 12) ? 1.2 : 0);
    expect(20 - largestPassingSpan(dipped)).toBeLessThanOrEqual(1e-3);
  });

  it('tension span of the DESIGN.md beam: FS = 0.404 MPa/(γs²/(2t)) against target 4 → s = 1.9068 m, FS ≥ 4 at s and < 4 at s + 1 mm — Obert & Duvall 1967 clamped beam', () => {
    // Hand: σ(s) = γs²/(2t) (METHODS §1, clamped, self-weight only);
    // FS = 0.404e6/σ ≥ 4 ⇔ s² ≤ 2·0.45·0.404e6/(4·25e3) = 3.636 ⇔ s ≤ 1.90683 m.
    const fs = (s: number) => 0.404e6 / ((25e3 * s * s) / (2 * 0.45));
    const s = largestPassingSpan((x) => fs(x) / 4);
    expectClose(s, Math.sqrt(3.636), 1e-3 / 1.9);
    expect(fs(s)).toBeGreaterThanOrEqual(4);
    expectClose(fs(s), 4, 1e-3); // equals the target within the span tolerance (FS ∝ 1/s²)
    expect(fs(s + 1e-3)).toBeLessThan(4);
  });

  it('voussoir spans of the DESIGN.md beam: snap-through 15.46 m, crushing (target 2) 15.35 m, deflection (δ/t ≤ 0.1) 12.58 m — DESIGN.md report example', () => {
    const beam = { thickness: 0.45, unitWeight: 25e3, modulus: 8e9, ucs: 40e6, frictionDeg: 35 };
    const at = (span: number) => solveVoussoir({ ...beam, span });
    const snap = largestPassingSpan((s) => (at(s).snapThrough ? 0 : 1));
    const crush = largestPassingSpan((s) => {
      const r = at(s);
      return r.snapThrough ? 0 : r.fsCrushing! / 2;
    });
    const deflection = largestPassingSpan((s) => {
      const r = at(s);
      return r.snapThrough ? 0 : 0.1 / r.deflectionRatio!;
    });
    expect(Number(snap.toFixed(2))).toBe(15.46); // DESIGN.md
    expect(Number(crush.toFixed(2))).toBe(15.35); // DESIGN.md
    expect(Number(deflection.toFixed(2))).toBe(12.58); // DESIGN.md
    expect(at(snap).snapThrough).toBe(false);
    expect(at(snap + 1e-3).snapThrough).toBe(true);
  });

  it('refuses a bad cap, tolerance or sample count with a RangeError', () => {
    expect(() => largestPassingSpan(() => 1, { cap: 0 })).toThrow(RangeError);
    expect(() => largestPassingSpan(() => 1, { cap: NaN })).toThrow(RangeError);
    expect(() => largestPassingSpan(() => 1, { tolerance: 0 })).toThrow(RangeError);
    expect(() => largestPassingSpan(() => 1, { samples: 1 })).toThrow(RangeError);
    expect(() => largestPassingSpan(() => 1, { samples: 10.5 })).toThrow(RangeError);
  });

  it('calls the ratio a bounded number of times (≤ samples + 40)', () => {
    let calls = 0;
    largestPassingSpan((s) => {
      calls++;
      return (7 / s) ** 2;
    });
    expect(calls).toBeLessThanOrEqual(64 + 40);
  });
});

describe('smallestPassingValue', () => {
  it('smallestPassingValue(t/t0, 0.05, 3) is t0 to 1e-3, passing at the result and failing just below — analytic crossing', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.051, max: 2.99, noNaN: true }), (t0) => {
        const ratio = (t: number) => t / t0;
        const t = smallestPassingValue(ratio, 0.05, 3)!;
        expect(t).toBeGreaterThanOrEqual(t0);
        expect(t - t0).toBeLessThanOrEqual(1e-3);
        expect(ratio(t - 1e-3)).toBeLessThan(1);
      }),
      { numRuns: 300 },
    );
  });

  it('returns lo when lo already passes, null when nothing passes, and uses a linear grid from lo = 0', () => {
    expect(smallestPassingValue(() => 1, 0.1, 2)).toBe(0.1);
    expect(smallestPassingValue(() => 0.5, 0.1, 2)).toBeNull();
    const t = smallestPassingValue((x) => (x >= 0.7 ? 1 : 0), 0, 2)!;
    expect(t).toBeGreaterThanOrEqual(0.7);
    expect(t - 0.7).toBeLessThanOrEqual(1e-3);
    // Passing only at hi still counts.
    expect(smallestPassingValue((x) => (x >= 2 ? 1 : 0), 0.1, 2)).toBe(2);
  });

  it('non-monotone ratio: passes 0.4–0.5 and above 1.2 → the first crossing, 0.4 (hand-built)', () => {
    const ratio = (x: number) => ((x >= 0.4 && x <= 0.5) || x >= 1.2 ? 1 : 0);
    const t = smallestPassingValue(ratio, 0.1, 3)!;
    expect(t).toBeGreaterThanOrEqual(0.4);
    expect(t - 0.4).toBeLessThanOrEqual(1e-3);
  });

  it('refuses lo ≥ hi or non-finite bounds with a RangeError', () => {
    expect(() => smallestPassingValue(() => 1, 2, 1)).toThrow(RangeError);
    expect(() => smallestPassingValue(() => 1, NaN, 1)).toThrow(RangeError);
    expect(() => smallestPassingValue(() => 1, 0, Infinity)).toThrow(RangeError);
  });
});
