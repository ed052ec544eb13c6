import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { expectClose } from '../helpers/expect-close';
import { beamArbitrary, designExample, printed } from './voussoir-fixtures';
import { leverArmAt, type VoussoirInput } from '../../src/mechanics/voussoir';
import { leverArmByIteration, solveVoussoirSweep } from '../../src/mechanics/voussoir-sweep';

const beam = beamArbitrary();

describe('solveVoussoirSweep (Diederichs & Kaiser 1999 scheme, n step 0.01)', () => {
  it('solveVoussoirSweep(DESIGN.md example) gives n 0.74, z 0.2256 m, fc 1.348 MPa, δ 2.36 mm, δ/t 0.0052, FS crushing 29.7, FS sliding 4.65 — DESIGN.md report example', () => {
    const r = solveVoussoirSweep(designExample);
    expect(r.snapThrough).toBe(false);
    expectClose(r.n!, 0.74, 1e-12); // DESIGN.md
    expect(printed(r.leverArm, 4)).toBe(0.2256); // DESIGN.md
    expect(printed(r.maxCompression! / 1e6, 3)).toBe(1.348); // DESIGN.md
    expect(printed(r.deflection! * 1e3, 2)).toBe(2.36); // DESIGN.md
    expect(printed(r.deflectionRatio, 4)).toBe(0.0052); // DESIGN.md
    expect(printed(r.fsCrushing, 1)).toBe(29.7); // DESIGN.md
    expect(printed(r.fsSliding, 2)).toBe(4.65); // DESIGN.md
  });

  it('solveVoussoirSweep with E → ∞ (1e18 Pa) gives n = 0.75 exactly, z = t/2, fc = γ′s²/(1.5t) — METHODS §3 rigid-limit algebra', () => {
    // max of n(1 − 2n/3) at n = 3/4 (a grid point); fc = 25e3·36/(1.5·0.45) = 1.3333e6 Pa.
    const r = solveVoussoirSweep({ ...designExample, modulus: 1e18 });
    expectClose(r.n!, 0.75, 1e-12);
    expectClose(r.leverArm!, 0.225, 1e-9);
    expectClose(r.maxCompression!, 1.3333333333e6, 1e-9);
  });

  it('leverArmByIteration(s 10 m, t 1 m, γ′ 25 kN/m³, E 10 GPa, n 0.75) settles at 0.4970020 m in 5 steps — hand iteration', () => {
    // Hand iteration (arithmetic in test/mechanics/voussoir.test.ts):
    // z = 0.5 → 0.4970201 → 0.4970021 → 0.49700203 → 0.4970020255 → 0.4970020255;
    // the steps are 3.0e-3, 1.8e-5, 1.1e-7, 6.6e-10, 4.0e-12 m: the 5th is the first < 1e-10·t.
    const input = { span: 10, thickness: 1, unitWeight: 25e3, modulus: 10e9, ucs: 0, frictionDeg: 0 };
    const r = leverArmByIteration(input, 0.75);
    expect(r.iterations).toBe(5);
    expectClose(r.leverArm!, 0.497002, 1e-6);
  });

  it('leverArmByIteration gives null when K/Kc = 1 − 1e-9 (double root: the iteration cannot settle in 500 steps)', () => {
    // K = A/E with A = (3s/8)·L·((2/3 + n)/3)·γ′s²/(4n); Kc = 2z0³/(3√3). At n = 0.5, s = 10,
    // t = 1: z0 = 2/3, L = 10 + 8·(4/9)/30. Choose E so that K = (1 − 1e-9)·Kc: a real
    // (near-double) root exists but the fixed-point contraction factor is ≈ 1.
    const s = 10;
    const t = 1;
    const g = 25e3;
    const n = 0.5;
    const z0 = t * (1 - (2 * n) / 3);
    const L = s + (8 * z0 * z0) / (3 * s);
    const A = ((3 * s) / 8) * L * ((2 / 3 + n) / 3) * ((g * s * s) / (4 * n));
    const Kc = (2 * z0 ** 3) / (3 * Math.sqrt(3));
    const input = { span: s, thickness: t, unitWeight: g, modulus: A / ((1 - 1e-9) * Kc), ucs: 0, frictionDeg: 0 };
    expect(leverArmAt(input, n)).not.toBeNull(); // the closed form finds the root
    expect(leverArmByIteration(input, n)).toEqual({ leverArm: null, iterations: 500 });
  });

  it('solveVoussoirSweep(s 20 m, t 0.2 m, E 0.5 GPa) snaps through; solveVoussoirSweep(s 4 m, t 1 m, E 20 GPa) stands', () => {
    // Hand bound K/Kc ≥ 135 for the first beam, ≈ 2e-4 for the second (voussoir.test.ts).
    const a = solveVoussoirSweep({ span: 20, thickness: 0.2, unitWeight: 25e3, modulus: 0.5e9, ucs: 40e6, frictionDeg: 35 });
    expect(a.snapThrough).toBe(true);
    expect(a.n).toBeNull();
    expect(a.maxCompression).toBeNull();
    const b = solveVoussoirSweep({ span: 4, thickness: 1, unitWeight: 25e3, modulus: 20e9, ucs: 40e6, frictionDeg: 35 });
    expect(b.snapThrough).toBe(false);
    expectClose(b.n!, 0.75, 1e-12);
  });

  it('the sweep n is a 0.01 step and fc there is no larger than at the neighbouring steps (property)', () => {
    fc.assert(
      fc.property(beam, (input) => {
        const r = solveVoussoirSweep(input);
        if (r.snapThrough) return;
        const i = Math.round(r.n! * 100);
        expectClose(r.n!, i / 100, 1e-12);
        for (const j of [i - 1, i + 1]) {
          if (j < 1 || j > 99) continue;
          const z = leverArmByIteration(input, j / 100).leverArm;
          if (z === null) continue;
          const fcNeighbour = (input.unitWeight * input.span ** 2) / (4 * (j / 100) * z);
          expect(r.maxCompression!).toBeLessThanOrEqual(fcNeighbour);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('solveVoussoirSweep refuses invalid input with a RangeError', () => {
    expect(() => solveVoussoirSweep({ ...designExample, thickness: 0 })).toThrow(RangeError);
    expect(() => solveVoussoirSweep({ ...designExample, modulus: NaN })).toThrow(RangeError);
  });
});
