import type { VoussoirInput, VoussoirResult } from './voussoir';
import { snapThroughResult, validateVoussoirInput, voussoirResultAt } from './voussoir';

const N_STEPS = 99; // n = 0.01, 0.02, …, 0.99 (Diederichs & Kaiser 1999 step 0.01)
const MAX_ITERATIONS = 500;
const RELATIVE_TOLERANCE = 1e-10; // |Δz| < 1e-10·t

/**
 * Voussoir (jointed) roof beam, baseline solver, done the way Diederichs & Kaiser (1999) set it
 * out (as in Brady & Brown, Rock Mechanics for Underground Mining, 3rd ed., §8.4):
 * for n = 0.01, 0.02, …, 0.99 iterate the lever arm from z = z0 with
 *     z ← √( (3s/8)(8z0²/(3s) − ΔL) ),  z0 = t(1 − 2n/3), L = s + 8z0²/(3s),
 *     fc = γ's²/(4nz), fav = fc(2/3 + n)/3, ΔL = fav·L/E,
 * until |Δz| < 1e-10·t (at most 500 steps). A negative radicand, or no convergence within
 * 500 steps, means no solution at that n. The equilibrium n is the one of least fc; if no n
 * has a solution the beam snaps through. SI: m, N/m³, Pa → m, Pa.
 * Kept as the reference for `solveVoussoir` (the fast, closed-form solver) and its benchmark.
 *     solveVoussoirSweep({ span: 6, thickness: 0.45, unitWeight: 25e3, modulus: 8e9,
 *                          ucs: 40e6, frictionDeg: 35 }).n // 0.74
 */
export function solveVoussoirSweep(input: VoussoirInput): VoussoirResult {
  validateVoussoirInput(input);
  const { span: s, unitWeight: g } = input;
  let iterations = 0;
  let bestN = 0;
  let bestZ = 0;
  let bestFc = Infinity;
  for (let i = 1; i <= N_STEPS; i++) {
    const n = i / 100;
    const trial = leverArmByIteration(input, n);
    iterations += trial.iterations;
    if (trial.leverArm === null) continue;
    const fc = (g * s * s) / (4 * n * trial.leverArm);
    if (fc < bestFc) {
      bestFc = fc;
      bestN = n;
      bestZ = trial.leverArm;
    }
  }
  if (!(bestFc < Infinity)) return snapThroughResult(iterations);
  return voussoirResultAt(input, bestN, bestZ, iterations);
}

/** One step of the lever-arm iteration: from z (with fc and ΔL at z) to the next z. */
export interface LeverArmStep {
  /** Step number, 1 … */
  k: number;
  /** z at the start of the step, m (z0 at k = 1). */
  z: number;
  /** fc = γ's²/(4nz), Pa. */
  maxCompression: number;
  /** ΔL = fav·L/E, m. */
  shortening: number;
  /** √((3s/8)(8z0²/(3s) − ΔL)), m; null where the radicand is negative (no lever arm). */
  next: number | null;
}

/**
 * Lever arm z at a given n by the published fixed-point iteration from z = z0 (see
 * `solveVoussoirSweep`); `leverArm` is null where the radicand turns negative or the iteration
 * does not settle within 500 steps. Inputs are not validated here (the caller does). `record`,
 * when given, receives each step (for the calculation trace).
 *     leverArmByIteration({ span: 6, thickness: 0.45, unitWeight: 25e3, modulus: 8e9,
 *                           ucs: 40e6, frictionDeg: 35 }, 0.74).leverArm // ≈ 0.2256 m
 */
export function leverArmByIteration(
  input: VoussoirInput,
  n: number,
  record?: (step: LeverArmStep) => void,
): { leverArm: number | null; iterations: number } {
  const { span: s, thickness: t, unitWeight: g, modulus: E } = input;
  const z0 = t * (1 - (2 * n) / 3);
  const rise2 = z0 * z0; // (3s/8)·8z0²/(3s)
  const L = s + (8 * z0 * z0) / (3 * s);
  let z = z0;
  for (let k = 1; k <= MAX_ITERATIONS; k++) {
    const fc = (g * s * s) / (4 * n * z);
    const fav = (fc * (2 / 3 + n)) / 3;
    const dL = (fav * L) / E;
    const radicand = rise2 - ((3 * s) / 8) * dL;
    if (!(radicand > 0)) {
      record?.({ k, z, maxCompression: fc, shortening: dL, next: null });
      return { leverArm: null, iterations: k };
    }
    const zNext = Math.sqrt(radicand);
    record?.({ k, z, maxCompression: fc, shortening: dL, next: zNext });
    const step = Math.abs(zNext - z);
    z = zNext;
    if (step < RELATIVE_TOLERANCE * t) return { leverArm: z, iterations: k };
  }
  return { leverArm: null, iterations: MAX_ITERATIONS };
}
