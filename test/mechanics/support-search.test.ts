import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { smallestStandingPressure, largestSquareSpacing, shortestBoltLength, refineCrossing } from '../../src/mechanics/support-search';
import { boltSuspension } from '../../src/mechanics/suspension';
import { boltAnchorage } from '../../src/mechanics/bolt-anchorage';
import { elasticBeam } from '../../src/mechanics/beam';
import { expectClose } from '../helpers/expect-close';

describe('smallestStandingPressure — (a) of METHODS §12', () => {
  // Clamped 0.5 m bed, γ 25 kN/m³, s = 6 m, tensile strength 0.1 MPa, target 2: the §1 tension
  // (γt − p)s²/(2t²) ≤ 50 kPa ⇔ p ≥ 12.5 kPa − 50e3·2·0.25/36 = 11 805.56 Pa (Obert & Duvall §1, algebra).
  // The net load never goes below 0 (METHODS §12: excess standing support is dropped).
  const passes = (p: number) =>
    0.1e6 >= 2 * elasticBeam({ ends: 'clamped', span: 6, thickness: 0.5, load: Math.max(12.5e3 - p, 0), modulus: 10e9, horizontalStress: 0 }).maxTension;
  it('finds 11 805.6 Pa to 10 Pa, passing at the answer (closed form above)', () => {
    const p = smallestStandingPressure(passes)!;
    const exact = 12.5e3 - (50e3 * 2 * 0.25) / 36;
    expect(p).toBeGreaterThanOrEqual(exact - 1e-6);
    expect(p - exact).toBeLessThanOrEqual(10);
    expect(passes(p)).toBe(true);
  });
  it('0 when the roof already passes; null when no pressure up to max helps (a check support cannot fix)', () => {
    expect(smallestStandingPressure(() => true)).toBe(0);
    expect(smallestStandingPressure(() => false)).toBeNull();
    expect(smallestStandingPressure((p) => p >= 2e6, { max: 1e6 })).toBeNull();
  });
  it('threshold predicates p ≥ p0 give p0 to the tolerance (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 9.9e6, noNaN: true }), (p0) => {
        const p = smallestStandingPressure((x) => x >= p0)!;
        expect(p).toBeGreaterThanOrEqual(p0);
        expect(p - p0).toBeLessThanOrEqual(10);
      }),
    );
  });
  it('refuses bad options naming them', () => {
    expect(() => smallestStandingPressure(() => true, { start: 0 })).toThrow(/start/);
    expect(() => smallestStandingPressure(() => true, { max: NaN })).toThrow(/max/);
    expect(() => smallestStandingPressure(() => true, { tolerance: -1 })).toThrow(/tolerance/);
  });
});

describe('largestSquareSpacing — (b) of METHODS §12', () => {
  it('suspension FS 1.5 with a 100 kN bolt under 12.5 kPa: S = √(100/(1.5·12.5)) = 2.309 m (statics)', () => {
    const passes = (S: number) =>
      boltSuspension({ suspended: [{ unitWeight: 25e3, thickness: 0.5 }], spacingAcross: S, spacingAlong: S, capacity: 100e3 }).fs! >= 1.5;
    const S = largestSquareSpacing(passes)!;
    const exact = Math.sqrt(100 / (1.5 * 12.5));
    expectClose(exact, 2.3094, 1e-4);
    expect(S).toBeLessThanOrEqual(exact);
    expect(exact - S).toBeLessThanOrEqual(1e-3);
    expect(passes(S)).toBe(true);
  });
  it('3 m when the widest pattern passes; null when even 0.3 m fails', () => {
    expect(largestSquareSpacing(() => true)).toBe(3);
    expect(largestSquareSpacing(() => false)).toBeNull();
  });
  it('a predicate passing only on [0.8, 1.45] m (sliding of a cracked skin fails at close spacing) → 1.45 m, found by the downward scan', () => {
    const S = largestSquareSpacing((s) => s >= 0.8 && s <= 1.45)!;
    expect(S).toBeLessThanOrEqual(1.45);
    expect(1.45 - S).toBeLessThanOrEqual(1e-3);
  });
  it('FS = C/(w S²) ≥ target gives min(3, √(C/(target·w))), or null below 0.3 m (property, statics)', () => {
    fc.assert(
      fc.property(fc.double({ min: 20e3, max: 300e3, noNaN: true }), fc.double({ min: 2e3, max: 100e3, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }), (C, w, target) => {
        const S = largestSquareSpacing((s) => C / (w * s * s) >= target);
        const exact = Math.sqrt(C / (target * w));
        if (exact < 0.3) expect(S).toBeNull();
        else if (exact >= 3) expect(S).toBe(3);
        else {
          expect(S!).toBeLessThanOrEqual(exact);
          expect(exact - S!).toBeLessThanOrEqual(1e-3);
        }
      }),
    );
  });
  it('refuses bad options naming them', () => {
    expect(() => largestSquareSpacing(() => true, { min: 0 })).toThrow(/min/);
    expect(() => largestSquareSpacing(() => true, { max: 0.2 })).toThrow(/max/);
    expect(() => largestSquareSpacing(() => true, { step: NaN })).toThrow(/step/);
  });
});

describe('shortestBoltLength — (c) of METHODS §12', () => {
  const strata = [0.5, 0.3, 1.2]; // interfaces at 0.5 and 0.8 m
  const anchoredAbove = (k: number) => (L: number) => {
    const r = boltAnchorage(strata, L, 0.3);
    return r.kind === 'anchored' && r.anchorLayer >= k;
  };
  it('the two weak lower beds must hang from layer 2: 0.8 m + 0.3 m anchorage = 1.1 m exactly (geometry)', () => {
    expect(shortestBoltLength(anchoredAbove(2), { min: 0.3, max: 2 })).toBe(1.1);
  });
  it('anchored anywhere: 0.3 m (the zone fills the first bed), and 0.6–1.0 m are skipped when layer 0 is not allowed: 0.8 m (layer 1 exactly)', () => {
    expect(shortestBoltLength(anchoredAbove(0), { min: 0.3, max: 2 })).toBe(0.3);
    expect(shortestBoltLength(anchoredAbove(1), { min: 0.3, max: 2 })).toBe(0.8);
  });
  it('null when no length in range passes; the answer is the first passing grid length (property)', () => {
    expect(shortestBoltLength(() => false, { min: 0.3, max: 2 })).toBeNull();
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 30 }), fc.integer({ min: 0, max: 40 }), (minSteps, firstPass) => {
        const min = minSteps / 10;
        const threshold = min + firstPass / 10;
        const L = shortestBoltLength((x) => x >= threshold - 1e-9, { min, max: 5 });
        if (threshold > 5 + 1e-9) expect(L).toBeNull();
        else expectClose(L!, threshold, 1e-12);
      }),
    );
  });
  it('refuses bad options naming them', () => {
    expect(() => shortestBoltLength(() => true, { min: 0, max: 2 })).toThrow(/min/);
    expect(() => shortestBoltLength(() => true, { min: 1, max: 0.5 })).toThrow(/max/);
    expect(() => shortestBoltLength(() => true, { min: 1, max: 2, step: 0 })).toThrow(/step/);
  });
});

describe('refineCrossing — margin-guided narrowing of a pass/fail bracket', () => {
  // Bolt FS = 100 kN / (12.5 kPa · S²) against 1.5: crosses at S = √(100/18.75) = 2.3094 m (statics, METHODS §12).
  const bolt = (S: number) => {
    const margin = 100 / (12.5 * S * S) / 1.5;
    return { passes: margin >= 1, margin };
  };
  it('lands on a power-law crossing in a few trials, passing end within the tolerance', () => {
    let calls = 0;
    const counted = (S: number) => { calls++; return bolt(S); };
    const S = refineCrossing(counted, 2.25, bolt(2.25), 3, bolt(3), 1e-2, true);
    const exact = Math.sqrt(100 / 18.75);
    expect(S).toBeLessThanOrEqual(exact);
    expect(exact - S).toBeLessThanOrEqual(1e-2);
    expect(calls).toBeLessThanOrEqual(3); // bisection of 0.75 m to 1 cm takes 7
  });

  it('a margin that jumps (or tells nothing) still gives the crossing to the tolerance (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0.31, max: 2.99, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), fc.boolean(), (x0, jump, useless) => {
      // passes below x0; the margin is a step (jump) or infinite (no slope at all)
      const probe = (x: number) => ({ passes: x <= x0, margin: useless ? Infinity : x <= x0 ? 1 + jump : 1 / (1 + jump) });
      const x = refineCrossing(probe, 0.3, probe(0.3), 3, probe(3), 1e-3, true);
      expect(x).toBeLessThanOrEqual(x0);
      expect(x0 - x).toBeLessThanOrEqual(1e-3);
    }), { numRuns: 200 });
  });

  it('works with the pass end above the fail end (smallest pressure) on a linear axis', () => {
    // passes for p ≥ 11 805.56 Pa, margin linear in p (closed form of the first test above)
    const p0 = 12.5e3 - (50e3 * 2 * 0.25) / 36;
    const probe = (p: number) => ({ passes: p >= p0, margin: Math.max(1e-9, 1 + (p - p0) / 1e4) });
    const p = refineCrossing(probe, 12.5e3, probe(12.5e3), 0, probe(0), 10);
    expect(p).toBeGreaterThanOrEqual(p0);
    expect(p - p0).toBeLessThanOrEqual(10);
  });
});
