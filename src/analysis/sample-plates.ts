/**
 * Slab plate coefficients for a sampling run: β and α interpolated over a grid in aspect ratio
 * b/a and Poisson's ratio ν, so that sampling the span or ν of a slab does not solve one Ritz
 * plate per sample (each solve takes milliseconds; METHODS §4).
 *
 * The grid spans the ranges the run can reach (the caller's bounds); a varying dimension gets
 * `nodes` equally spaced nodes (17 when only one varies, 9 × 9 when both do), a fixed one a
 * single node. Between nodes β and α are interpolated (bi)linearly. The error is measured, not
 * assumed: at build time the exact coefficients are solved at the centres of up to 8 cells and
 * `maxRelativeError` is the largest relative difference in β or α found there (β and α are
 * smooth in b/a and ν, so the cell centres are where linear interpolation errs most). A value
 * outside the grid (beyond the caller's bounds) falls back to the exact solve.
 * Where the stress maximum sits (`at`, `location`, `face`, the field) is taken from the nearest
 * node: those describe, they do not enter an FS.
 *
 *     const plates = platesForSampling('clamped', [1.2, 1.8], [0.25, 0.25]);
 *     plates.coefficients(1.5, 0.25).beta // within plates.maxRelativeError of plateCoefficients({ aspect: 1.5, … }).beta
 */
import { plateCoefficients, type PlateCoefficients, type PlateInput } from '../mechanics/plate';

export interface SamplingPlates {
  coefficients(aspect: number, poisson: number): PlateCoefficients;
  /** Largest relative error of β or α at the checked cell centres (0 with a single node). */
  maxRelativeError: number;
  nodes: { aspect: number; poisson: number };
}

const linspace = (lo: number, hi: number, n: number): number[] =>
  n === 1 ? [lo] : Array.from({ length: n }, (_, k) => lo + ((hi - lo) * k) / (n - 1));

export function platesForSampling(
  edges: PlateInput['edges'],
  aspectRange: readonly [number, number],
  poissonRange: readonly [number, number],
  nodes?: number,
): SamplingPlates {
  const aspectVaries = aspectRange[1] > aspectRange[0];
  const poissonVaries = poissonRange[1] > poissonRange[0];
  const n = nodes ?? (aspectVaries && poissonVaries ? 9 : 17);
  const A = linspace(aspectRange[0], aspectRange[1], aspectVaries ? n : 1);
  const V = linspace(poissonRange[0], poissonRange[1], poissonVaries ? n : 1);
  const exact = (aspect: number, poisson: number) => plateCoefficients({ aspect, edges, poisson });
  const grid = A.map((a) => V.map((v) => exact(a, v)));

  const locate = (xs: readonly number[], x: number): [number, number] => {
    if (xs.length === 1) return [0, 0];
    const h = (xs[xs.length - 1] - xs[0]) / (xs.length - 1);
    const k = Math.min(xs.length - 2, Math.max(0, Math.floor((x - xs[0]) / h)));
    return [k, (x - xs[k]) / h];
  };
  const inside = (xs: readonly number[], x: number) => xs.length === 1 ? x === xs[0] : x >= xs[0] && x <= xs[xs.length - 1];

  const interpolate = (aspect: number, poisson: number): PlateCoefficients => {
    const [i, s] = locate(A, aspect);
    const [j, t] = locate(V, poisson);
    const i1 = Math.min(i + 1, A.length - 1);
    const j1 = Math.min(j + 1, V.length - 1);
    const c00 = grid[i][j], c10 = grid[i1][j], c01 = grid[i][j1], c11 = grid[i1][j1];
    const mix = (k: 'beta' | 'alpha') => (1 - s) * (1 - t) * c00[k] + s * (1 - t) * c10[k] + (1 - s) * t * c01[k] + s * t * c11[k];
    const nearest = grid[s < 0.5 ? i : i1][t < 0.5 ? j : j1];
    return { ...nearest, beta: mix('beta'), alpha: mix('alpha') };
  };

  // Error at cell centres: up to 8 cells spread over the grid.
  let maxRelativeError = 0;
  const cellsA = Math.max(1, A.length - 1);
  const cellsV = Math.max(1, V.length - 1);
  const checks = Math.min(8, cellsA * cellsV);
  if (A.length > 1 || V.length > 1) {
    for (let c = 0; c < checks; c++) {
      const ia = Math.floor(((c + 0.5) * cellsA) / checks);
      const iv = V.length > 1 ? (c * 3) % cellsV : 0;
      const a = A.length > 1 ? (A[ia] + A[ia + 1]) / 2 : A[0];
      const v = V.length > 1 ? (V[iv] + V[iv + 1]) / 2 : V[0];
      const e = exact(a, v);
      const g = interpolate(a, v);
      maxRelativeError = Math.max(maxRelativeError, Math.abs(g.beta - e.beta) / e.beta, Math.abs(g.alpha - e.alpha) / e.alpha);
    }
  }
  return {
    coefficients: (aspect, poisson) => (inside(A, aspect) && inside(V, poisson) ? interpolate(aspect, poisson) : exact(aspect, poisson)),
    maxRelativeError,
    nodes: { aspect: A.length, poisson: V.length },
  };
}
