import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { constrainedBasis, gaussLegendre, legendre, type EndFixity } from '../../src/mechanics/plate-basis';
import { basisAt } from '../../src/mechanics/plate-ritz';
import { expectClose } from '../helpers/expect-close';

describe('legendre', () => {
  it('legendre(3, 0.5) gives L2 = (3x²−1)/2 = −0.125, L3 = (5x³−3x)/2 = −0.4375 and their derivatives (closed forms, common practice)', () => {
    const p = new Float64Array(4), d1 = new Float64Array(4), d2 = new Float64Array(4);
    legendre(3, 0.5, p, d1, d2);
    expectClose(p[2], -0.125, 1e-15);
    expectClose(p[3], -0.4375, 1e-15);
    expectClose(d1[2], 3 * 0.5, 1e-15); // L2′ = 3x
    expectClose(d1[3], (15 * 0.25 - 3) / 2, 1e-15); // L3′ = (15x² − 3)/2
    expectClose(d2[3], 15 * 0.5, 1e-15); // L3″ = 15x
  });
  it('at ξ = 1: L_n = 1 and L′_n = n(n+1)/2 (common practice)', () => {
    const n = 12;
    const p = new Float64Array(n + 1), d1 = new Float64Array(n + 1), d2 = new Float64Array(n + 1);
    legendre(n, 1, p, d1, d2);
    for (let k = 0; k <= n; k++) {
      expectClose(p[k], 1, 1e-14);
      expectClose(d1[k], (k * (k + 1)) / 2, 1e-13);
    }
  });
});

describe('gaussLegendre', () => {
  it('gaussLegendre(n) integrates x^k exactly for k ≤ 2n−1: ∫x^k = 2/(k+1) for even k, 0 for odd (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 40 }), fc.nat(), (n, kk) => {
        const k = kk % (2 * n);
        const { nodes, weights } = gaussLegendre(n);
        let s = 0;
        for (let i = 0; i < n; i++) s += weights[i] * nodes[i] ** k;
        const exact = k % 2 === 0 ? 2 / (k + 1) : 0;
        return Math.abs(s - exact) < 1e-13;
      }),
    );
  });
  it('refuses a non-integer count', () => {
    expect(() => gaussLegendre(2.5)).toThrow(RangeError);
  });
});

describe('constrainedBasis', () => {
  const fix = fc.constantFrom<EndFixity>(0, 1, 2);
  it('every function meets the geometric end conditions: w = 0 at simple and clamped ends, w′ = 0 at clamped ends (property)', () => {
    fc.assert(
      fc.property(fix, fix, fc.integer({ min: 1, max: 30 }), (l, r, count) => {
        const even = l === r;
        const basis = constrainedBasis([l, r], count, even);
        const e = basisAt(basis, 2, [0, 2]); // ξ = −1, +1 (length 2: d/ds = d/dξ)
        const n = e.n;
        for (let f = 0; f < n; f++) {
          for (const [pt, fx] of [[0, l], [1, r]] as const) {
            const scale = 1 + Math.abs(e.d1[pt * n + f]) + Math.abs(e.v[pt * n + f]) + (basis.index[f] + 4) ** 2;
            if (fx >= 1 && Math.abs(e.v[pt * n + f]) > 1e-12 * scale) return false;
            if (fx >= 2 && Math.abs(e.d1[pt * n + f]) > 1e-12 * scale) return false;
          }
        }
        return true;
      }),
    );
  });
  it('an even basis for like ends uses even Legendre indices and gives even functions', () => {
    const basis = constrainedBasis([2, 2], 4, true);
    expect(basis.index).toEqual([0, 2, 4, 6]);
    const e = basisAt(basis, 2, [0.3, 1.7]); // ξ = −0.7 and +0.7
    for (let f = 0; f < e.n; f++) expectClose(e.v[f], e.v[e.n + f], 1e-12);
  });
  it('clamped–clamped: φ_0 = L0 − (10/7)·L2 + (3/7)·L4 (Shen 1994 biharmonic basis, k = 0, from memory)', () => {
    const basis = constrainedBasis([2, 2], 1, true);
    expectClose(basis.coef[0][2], -10 / 7, 1e-12);
    expectClose(basis.coef[0][4], 3 / 7, 1e-12);
  });
  it('refuses an even basis with unlike ends and a zero count', () => {
    expect(() => constrainedBasis([2, 1], 3, true)).toThrow(RangeError);
    expect(() => constrainedBasis([2, 2], 0, true)).toThrow(RangeError);
  });
});
