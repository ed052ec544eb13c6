import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { boltAnchorage, layerTops, DEFAULT_ANCHORAGE_M } from '../../src/mechanics/bolt-anchorage';
import { expectClose } from '../helpers/expect-close';

// Geometry of METHODS §12: anchorage zone [L − a, L]; the anchor layer holds the whole zone;
// layers wholly below the zone hang; layers wholly within L form the beam-building set.
// Strata for the hand checks: 0.5 m, 0.3 m, 1.2 m → interfaces at 0.5, 0.8 m, top at 2.0 m.
const strata = [0.5, 0.3, 1.2];

describe('boltAnchorage — geometry of METHODS §12', () => {
  it('1.8 m bolt, 0.3 m anchorage: zone [1.5, 1.8] in layer 2; layers 0 and 1 hang and lie within the bolt (hand geometry)', () => {
    const r = boltAnchorage(strata, 1.8, 0.3);
    expect(r.kind).toBe('anchored');
    if (r.kind !== 'anchored') return;
    expect(r.anchorLayer).toBe(2);
    expectClose(r.zone[0], 1.5);
    expectClose(r.zone[1], 1.8);
    expect(r.suspended).toEqual([0, 1]);
    expect(r.withinBolt).toEqual([0, 1]);
    expectClose(r.strataThickness, 2.0);
  });

  it('0.9 m bolt: zone [0.6, 0.9] is cut by the 0.8 m interface → at interface between layers 1 and 2, no anchorage (ANCHOR_AT_INTERFACE)', () => {
    const r = boltAnchorage(strata, 0.9, 0.3);
    expect(r.kind).toBe('atInterface');
    if (r.kind !== 'atInterface') return;
    expect([r.lowerLayer, r.upperLayer]).toEqual([1, 2]);
    expectClose(r.interfaceHeight, 0.8);
    expect(r.suspended).toEqual([0]);
    expect(r.withinBolt).toEqual([0, 1]);
  });

  it('a zone that reaches exactly to an interface or starts exactly at one is anchored (0.1 m steps from the roof: 0.8 and 1.1 m)', () => {
    // 0.8 m: zone [0.5, 0.8] fills layer 1 exactly. Built as 8 × 0.1 to test the tolerance.
    let L = 0;
    for (let i = 0; i < 8; i++) L += 0.1;
    const a = boltAnchorage(strata, L, 0.3);
    expect(a.kind === 'anchored' && a.anchorLayer).toBe(1);
    expect(a.kind === 'anchored' && a.suspended).toEqual([0]);
    expect(a.kind === 'anchored' && a.withinBolt).toEqual([0, 1]);
    // 1.1 m: zone [0.8, 1.1] starts on the interface → layer 2; layers 0, 1 hang.
    const b = boltAnchorage(strata, 1.1, 0.3);
    expect(b.kind === 'anchored' && b.anchorLayer).toBe(2);
    expect(b.kind === 'anchored' && b.suspended).toEqual([0, 1]);
  });

  it('a zone wider than the layer it starts in is cut by the interface: 0.3 m layer, 0.4 m anchorage never anchors there', () => {
    const r = boltAnchorage(strata, 0.9, 0.4); // zone [0.5, 0.9] across 0.8
    expect(r.kind).toBe('atInterface');
  });

  it('anchored in the first layer: nothing hangs (0.4 m bolt, zone [0.1, 0.4] in layer 0)', () => {
    const r = boltAnchorage(strata, 0.4);
    expect(r.kind === 'anchored' && r.anchorLayer).toBe(0);
    expect(r.kind === 'anchored' && r.suspended).toEqual([]);
    expect(r.kind === 'anchored' && r.withinBolt).toEqual([]);
  });

  it('the tip at the top of the strata is anchored; a longer bolt is "beyondStrata" for the validator to refuse', () => {
    expect(boltAnchorage(strata, 2.0).kind).toBe('anchored');
    const r = boltAnchorage(strata, 2.1);
    expect(r.kind).toBe('beyondStrata');
    if (r.kind === 'beyondStrata') expectClose(r.strataThickness, 2.0);
  });

  it('default anchorage is 0.3 m (common practice, METHODS §12)', () => {
    expect(DEFAULT_ANCHORAGE_M).toBe(0.3);
    expect(boltAnchorage(strata, 1.8)).toEqual(boltAnchorage(strata, 1.8, 0.3));
  });

  it('refuses bad input with a RangeError naming the parameter', () => {
    expect(() => boltAnchorage([], 1, 0.3)).toThrow(/thicknesses/);
    expect(() => boltAnchorage([0.5, NaN], 1, 0.3)).toThrow(/thicknesses\[1\]/);
    expect(() => boltAnchorage([0.5, -1], 1, 0.3)).toThrow(/thicknesses\[1\]/);
    expect(() => boltAnchorage(strata, NaN, 0.3)).toThrow(/length/);
    expect(() => boltAnchorage(strata, -1, 0.3)).toThrow(/length/);
    expect(() => boltAnchorage(strata, 1, NaN)).toThrow(/anchorage/);
    expect(() => boltAnchorage(strata, 1, 0)).toThrow(/anchorage/);
    expect(() => boltAnchorage(strata, 1, 1.5)).toThrow(/anchorage must not exceed/);
  });
});

// Property tests. Definitions:
//  (P1) A longer bolt's sets only grow: suspended(L) ⊆ suspended(L'), withinBolt(L) ⊆
//       withinBolt(L') for L < L', and its anchor layer (when anchored) is never lower.
//  (P2) "A longer bolt never loses anchorage it had in a thicker layer": if a bolt of length L is
//       anchored in layer k, every longer bolt whose tip is still in layer k (L < L' ≤ top_k) is
//       anchored in k; equivalently the lengths anchored in k are exactly [bottom_k + a, top_k],
//       non-empty iff t_k ≥ a. And thickening layer k (or any layer above it) keeps it anchored.
const thicknessesArb = fc.array(fc.double({ min: 0.05, max: 2, noNaN: true }), { minLength: 1, maxLength: 6 });
const anchorageArb = fc.double({ min: 0.05, max: 1, noNaN: true });

describe('boltAnchorage — properties', () => {
  it('(P1) suspended and within-bolt sets grow with the bolt length, and the anchor layer never drops', () => {
    fc.assert(
      fc.property(thicknessesArb, anchorageArb, fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (ts, a, u, v) => {
        const total = ts.reduce((x, y) => x + y, 0);
        if (a > total) return;
        const [L1, L2] = [a + (total - a) * Math.min(u, v), a + (total - a) * Math.max(u, v)];
        const r1 = boltAnchorage(ts, L1, a);
        const r2 = boltAnchorage(ts, L2, a);
        if (r1.kind === 'beyondStrata' || r2.kind === 'beyondStrata') throw new Error('within the strata');
        for (const i of r1.suspended) expect(r2.suspended).toContain(i);
        for (const i of r1.withinBolt) expect(r2.withinBolt).toContain(i);
        if (r1.kind === 'anchored' && r2.kind === 'anchored') expect(r2.anchorLayer).toBeGreaterThanOrEqual(r1.anchorLayer);
      }),
    );
  });

  it('(P2) anchored in layer k ⇒ anchored in k for every longer tip still in k, and after thickening layer k or a layer above', () => {
    fc.assert(
      fc.property(thicknessesArb, anchorageArb, fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0.01, max: 2, noNaN: true }), fc.nat(), (ts, a, u, v, extra, pick) => {
        const tops = layerTops(ts);
        const total = tops[tops.length - 1];
        if (a > total) return;
        const L = a + (total - a) * u;
        const r = boltAnchorage(ts, L, a);
        if (r.kind !== 'anchored') return;
        const k = r.anchorLayer;
        expect(ts[k]).toBeGreaterThanOrEqual(a - 1e-9);
        // a tip up to the top of layer k (L can sit a rounding error above that top, within the
        // kernel's tolerance: never make the "longer" tip shorter than L)
        const longer = L + Math.max(0, tops[k] - L) * v;
        const r2 = boltAnchorage(ts, longer, a);
        expect(r2.kind === 'anchored' && r2.anchorLayer).toBe(k);
        const j = k + (pick % (ts.length - k));
        const thicker = ts.map((t, i) => (i === j ? t + extra : t));
        const r3 = boltAnchorage(thicker, L, a);
        expect(r3.kind === 'anchored' && r3.anchorLayer).toBe(k);
      }),
    );
  });

  it('the lengths anchored in layer k are [bottom_k + a, top_k] (scan in 1 mm steps)', () => {
    const ts = [0.5, 0.3, 1.2];
    const a = 0.3;
    const anchoredIn: number[][] = [[], [], []];
    for (let mm = 300; mm <= 2000; mm++) {
      const r = boltAnchorage(ts, mm / 1000, a);
      if (r.kind === 'anchored') anchoredIn[r.anchorLayer].push(mm);
    }
    expect([anchoredIn[0][0], anchoredIn[0].at(-1)]).toEqual([300, 500]);
    expect([anchoredIn[1][0], anchoredIn[1].at(-1), anchoredIn[1].length]).toEqual([800, 800, 1]);
    expect([anchoredIn[2][0], anchoredIn[2].at(-1), anchoredIn[2].length]).toEqual([1100, 2000, 901]);
  });
});
