import { describe, expect, it } from 'vitest';
import { analyse } from '../../src/analysis';
import type { Analysis } from '../../src/analysis/types';
import { groupLayers, type GroupingStep } from '../../src/mechanics/layering';
import { solveVoussoir, type VoussoirSearchStep } from '../../src/mechanics/voussoir';
import type { TraceEntry } from '../../src/model/types';
import { presets, randomProject } from './fixtures';

// The recorded iterations of the trace must be re-derivable by hand: every row is recomputed
// here from the published formulas (Diederichs & Kaiser 1999, as set out in Brady & Brown §8.4;
// Obert & Duvall 1967 for the groups, METHODS §2–§3), independently of the kernels' code.

function entry(a: Analysis, path: string): TraceEntry {
  const e = a.report.trace.find((t) => t.path === path);
  if (!e) throw new Error(`no trace entry ${path}`);
  return e;
}

/** The beam of layer i as the trace states it (SI): s, t, γ', E from the traced values. */
function beamOf(a: Analysis, i: number) {
  const fc = entry(a, `layers[${i}].voussoir.maxCompression_MPa`).values;
  const z0 = entry(a, `detail.layers[${i}].voussoirSteps.initialLeverArm_m`).values;
  const dl = entry(a, `detail.layers[${i}].voussoirSteps.shortening_mm`).values;
  return { s: fc.s.value, t: z0.t.value, g: fc.gamma_e.value * 1e3, E: dl.Em.value * 1e9 };
}

/** The published fixed-point iteration for z at n, from z0 (Brady & Brown §8.4), written out here. */
function publishedLeverArm(b: { s: number; t: number; g: number; E: number }, n: number): number | null {
  const z0 = b.t * (1 - (2 * n) / 3);
  const L = b.s + (8 * z0 * z0) / (3 * b.s);
  let z = z0;
  for (let k = 0; k < 5000; k++) {
    const fc = (b.g * b.s * b.s) / (4 * n * z);
    const fav = (fc * (2 / 3 + n)) / 3;
    const dL = (fav * L) / b.E;
    const r = (3 * b.s / 8) * ((8 * z0 * z0) / (3 * b.s) - dL);
    if (r <= 0) return null;
    const next = Math.sqrt(r);
    if (Math.abs(next - z) < 1e-13 * b.t) return next;
    z = next;
  }
  return z;
}

function analyses(): Analysis[] {
  return [...presets().map((p) => analyse(p.project)), ...[3, 7, 11, 19].map((seed) => analyse(randomProject(seed, { type: 'beam' })))];
}

describe('voussoir n search in the trace', () => {
  it('records every trial n; the marked row is the reported n, fc at each row follows fc = γ\'s²/(4nz) with z from the published iteration', () => {
    let checked = 0;
    for (const a of analyses()) {
      a.report.layers.forEach((layer, i) => {
        if (!layer.voussoir || layer.voussoir.n === null) return;
        const e = entry(a, `layers[${i}].voussoir.n`);
        const st = e.steps!;
        expect(st, `layers[${i}].voussoir.n has its search`).toBeDefined();
        const b = beamOf(a, i);
        expect(st.marked).toBe(st.rows.length - 1);
        expect(st.rows[st.marked!][0]).toBe(layer.voussoir.n);
        expect(st.stage[st.marked!]).toBe('minimum');
        for (const [n, z, fc, lo, hi] of st.rows) {
          expect(lo! <= n! + 1e-12 && n! <= hi! + 1e-12, `n ${n} in its bracket [${lo}, ${hi}]`).toBe(true);
          const zPub = publishedLeverArm(b, n!);
          if (z === null) {
            expect(zPub).toBeNull();
            continue;
          }
          expect(Math.abs(z - zPub!) / b.t).toBeLessThan(1e-8);
          expect(Math.abs(fc! - (b.g * b.s * b.s) / (4 * n! * z) * 1e-6) / fc!).toBeLessThan(1e-12);
        }
        // The marked minimum is the least fc over the published 0.01 sweep (Diederichs & Kaiser step).
        const fcMin = st.rows[st.marked!][2]!;
        const curve = st.curve!;
        expect(curve).toHaveLength(99);
        for (const [n, fc] of curve) if (fc !== null) expect(fc, `fc(${n}) ≥ the minimum`).toBeGreaterThanOrEqual(fcMin * (1 - 1e-9));
        const sweepBest = curve.filter((p) => p[1] !== null).reduce((x, y) => (y[1]! < x[1]! ? y : x));
        expect(Math.abs(sweepBest[0] - layer.voussoir.n)).toBeLessThanOrEqual(0.01 + 1e-9);
        checked++;
      });
    }
    expect(checked).toBeGreaterThan(4);
  });

  it('the recorder does not change the search (same n, z with and without it)', () => {
    const input = { span: 6, thickness: 0.45, unitWeight: 25e3, modulus: 8e9, ucs: 40e6, frictionDeg: 35 };
    const steps: VoussoirSearchStep[] = [];
    const traced = solveVoussoir(input, (s) => steps.push(s));
    const plain = solveVoussoir(input);
    expect(traced).toEqual(plain);
    // Value from the kernel's doc example (n ≈ 0.740, Brady & Brown's n ≈ 0.75 for stable beams).
    expect(Math.abs(plain.n! - 0.74)).toBeLessThan(0.005);
    expect(steps.filter((s) => s.stage === 'scan')).toHaveLength(9);
    expect(steps.at(-1)!.n).toBe(plain.n);
  });
});

describe('lever-arm iteration in the trace', () => {
  it('each step is z → √((3s/8)(8z0²/(3s) − ΔL)) and the last one reaches the reported z', () => {
    let checked = 0;
    for (const a of analyses()) {
      a.report.layers.forEach((layer, i) => {
        if (!layer.voussoir || layer.voussoir.n === null) return;
        const st = entry(a, `layers[${i}].voussoir.leverArm_m`).steps!;
        expect(st).toBeDefined();
        const b = beamOf(a, i);
        const n = layer.voussoir.n;
        const z0 = b.t * (1 - (2 * n) / 3);
        const L = b.s + (8 * z0 * z0) / (3 * b.s);
        expect(st.rows[0][1]).toBeCloseTo(z0, 12); // starts at z0
        for (const [k, z, fc, dL, next] of st.rows) {
          const fcPub = (b.g * b.s * b.s) / (4 * n * z!);
          const dLPub = ((fcPub * (2 / 3 + n)) / 3) * L / b.E;
          expect(Math.abs(fc! * 1e6 - fcPub) / fcPub, `step ${k} fc`).toBeLessThan(1e-12);
          expect(Math.abs(dL! / 1e3 - dLPub) / dLPub, `step ${k} ΔL`).toBeLessThan(1e-12);
          expect(Math.abs(next! - Math.sqrt((3 * b.s / 8) * ((8 * z0 * z0) / (3 * b.s) - dLPub))), `step ${k} next z`).toBeLessThan(1e-12 * b.t);
        }
        const last = st.rows[st.marked!];
        expect(st.stage[st.marked!]).toBe('converged');
        expect(Math.abs(last[4]! - layer.voussoir.leverArm_m!) / b.t).toBeLessThan(1e-8);
        checked++;
      });
    }
    expect(checked).toBeGreaterThan(4);
  });
});

describe('bending-group formation in the trace', () => {
  it('METHODS §2 check values: a stiff bed above separates (2.206 < 12.5 kPa), a soft one joins (18.05 > 12.5 kPa)', () => {
    const bed1 = { unitWeight: 25e3, thickness: 0.5, modulus: 10e9 };
    const steps: GroupingStep[] = [];
    expect(groupLayers([bed1, { unitWeight: 25e3, thickness: 1.0, modulus: 20e9 }], (s) => steps.push(s))).toEqual([0, 1]);
    expect(steps).toHaveLength(1);
    expect(steps[0].without).toBeCloseTo(12.5e3, 6);
    expect(steps[0].with / 1e3).toBeCloseTo(2.206, 3);
    expect(steps[0].joins).toBe(false);
    steps.length = 0;
    expect(groupLayers([bed1, { unitWeight: 25e3, thickness: 0.3, modulus: 5e9 }], (s) => steps.push(s))).toEqual([0, 0]);
    expect(steps[0].with / 1e3).toBeCloseTo(18.05, 2);
    expect(steps[0].joins).toBe(true);
  });

  it('one trace entry per test; the decisions give the reported groups', () => {
    for (const a of analyses()) {
      const n = a.report.layers.length;
      const tests = a.report.trace.filter((e) => e.path.startsWith('detail.grouping['));
      expect(tests).toHaveLength(a.grouping.length);
      if (n > 1 && a.grouping.length > 0) {
        expect(tests[0].steps!.rows).toHaveLength(a.grouping.length);
        // A layer joins exactly when it is in the same group as the layer below it.
        for (const g of a.grouping) {
          const sameGroup = a.groups.some((grp) => grp.first <= g.layer - 1 && g.layer <= grp.last);
          expect(g.joins, `layer ${g.layer}`).toBe(sameGroup);
          expect(g.joins).toBe(g.with_kPa >= g.without_kPa);
        }
      }
    }
  });
});
