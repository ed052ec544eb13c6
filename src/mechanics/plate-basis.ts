/**
 * One-dimensional polynomial basis for the roof-slab plate solver (see `plate.ts`).
 *
 * On the reference interval ξ ∈ [−1, 1] each function is a compact combination of Legendre
 * polynomials, φ_k = L_k + Σ_{j=1..m} c_j L_{k+j}, with the c_j chosen so that φ_k meets the
 * essential (geometric) conditions of the two ends: a simple end needs w = 0, a clamped end
 * w = 0 and w′ = 0, a free end nothing (its moment and shear conditions are natural in the
 * energy method). m is the number of essential conditions (0..4). This is the Legendre–Galerkin
 * construction of Shen (1994, SIAM J. Sci. Comput. 15:1489–1505) generalised to any pair of
 * ends; it keeps the stiffness matrix far better conditioned than powers of ξ.
 *
 * Legendre values and derivatives come from the three-term recurrence and
 * L′_{n+1} = L′_{n−1} + (2n+1) L_n, L″_{n+1} = L″_{n−1} + (2n+1) L′_n (valid at ξ = ±1 too).
 */

export type EndFixity = 0 | 1 | 2; // 0 free, 1 simple (w = 0), 2 clamped (w = 0, w′ = 0)

export interface Basis1D {
  /** Fixity of the ends ξ = −1 and ξ = +1. */
  ends: readonly [EndFixity, EndFixity];
  /** Legendre index k of each function (only even k when the basis is `even`). */
  index: number[];
  /** Combination coefficients: function f is Σ_j coef[f][j] L_{index[f] + j}. */
  coef: number[][];
  /** Highest Legendre degree used. */
  degree: number;
}

/**
 * Legendre polynomials L_0..L_n and their first and second derivatives at ξ.
 * Writes into the three arrays (length ≥ n + 1).
 *     legendre(3, 1, p, d1, d2) // p = [1,1,1,1], d1 = [0,1,3,6], d2 = [0,0,3,15]
 */
export function legendre(n: number, xi: number, p: Float64Array, d1: Float64Array, d2: Float64Array): void {
  p[0] = 1; d1[0] = 0; d2[0] = 0;
  if (n === 0) return;
  p[1] = xi; d1[1] = 1; d2[1] = 0;
  for (let k = 1; k < n; k++) {
    p[k + 1] = ((2 * k + 1) * xi * p[k] - k * p[k - 1]) / (k + 1);
    d1[k + 1] = d1[k - 1] + (2 * k + 1) * p[k];
    d2[k + 1] = d2[k - 1] + (2 * k + 1) * d1[k];
  }
}

/**
 * Gauss–Legendre nodes and weights on [−1, 1] (n points, exact for degree 2n − 1).
 *     gaussLegendre(2) // nodes ±1/√3, weights 1, 1
 */
export function gaussLegendre(n: number): { nodes: Float64Array; weights: Float64Array } {
  if (!(Number.isInteger(n) && n >= 1)) throw new RangeError(`gauss points must be an integer ≥ 1, got ${n}`);
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 1;
    for (let it = 0; it < 100; it++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 1; k < n; k++) {
        const p2 = ((2 * k + 1) * x * p1 - k * p0) / (k + 1);
        p0 = p1;
        p1 = p2;
      }
      // p1 = L_n(x), p0 = L_{n−1}(x)
      dp = n === 1 ? 1 : (n * (p0 - x * p1)) / (1 - x * x);
      const dx = (n === 1 ? x : p1) / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-16) break;
    }
    if (n > 1) {
      let p0 = 1;
      let p1 = x;
      for (let k = 1; k < n; k++) {
        const p2 = ((2 * k + 1) * x * p1 - k * p0) / (k + 1);
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (p0 - x * p1)) / (1 - x * x);
    }
    nodes[n - 1 - i] = x;
    weights[n - 1 - i] = 2 / ((1 - x * x) * dp * dp);
  }
  return { nodes, weights };
}

/** Value (order 0) or slope (order 1) of L_n at ξ = side (±1). */
function legendreEnd(n: number, side: -1 | 1, order: 0 | 1): number {
  const parity = n % 2 === 0 ? 1 : -1;
  if (order === 0) return side === 1 ? 1 : parity; // L_n(1) = 1, L_n(−1) = (−1)^n
  const slope = (n * (n + 1)) / 2; // L′_n(1) = n(n+1)/2, L′_n(−1) = (−1)^(n+1) n(n+1)/2
  return side === 1 ? slope : -parity * slope;
}

/** Small dense solve with partial pivoting (m ≤ 4); throws if singular. */
function solveSmall(A: number[][], rhs: number[]): number[] {
  const m = rhs.length;
  const M = A.map((row, i) => [...row, rhs[i]]);
  for (let c = 0; c < m; c++) {
    let piv = c;
    for (let r = c + 1; r < m; r++) if (Math.abs(M[r][c]) > Math.abs(M[piv][c])) piv = r;
    if (!(Math.abs(M[piv][c]) > 1e-12)) throw new RangeError('plate basis: singular end-condition system');
    [M[c], M[piv]] = [M[piv], M[c]];
    for (let r = c + 1; r < m; r++) {
      const f = M[r][c] / M[c][c];
      for (let k = c; k <= m; k++) M[r][k] -= f * M[c][k];
    }
  }
  const x = new Array<number>(m).fill(0);
  for (let r = m - 1; r >= 0; r--) {
    let s = M[r][m];
    for (let k = r + 1; k < m; k++) s -= M[r][k] * x[k];
    x[r] = s / M[r][r];
  }
  return x;
}

/**
 * Basis of `count` functions meeting the essential conditions of the two ends. When both ends
 * are alike and `even` is set, only the even functions (k = 0, 2, 4, …) are kept: a symmetric
 * load on a symmetric span has an even deflection, so this halves the unknowns exactly.
 *     constrainedBasis([2, 2], 3, true).index // [0, 2, 4]
 */
export function constrainedBasis(ends: readonly [EndFixity, EndFixity], count: number, even: boolean): Basis1D {
  if (!(Number.isInteger(count) && count >= 1)) throw new RangeError(`basis size must be an integer ≥ 1, got ${count}`);
  const key = `${ends[0]},${ends[1]}|${count}|${even}`;
  const hit = basisCache.get(key);
  if (hit) return hit;
  const basis = buildBasis(ends, count, even);
  if (basisCache.size >= 512) basisCache.delete(basisCache.keys().next().value as string);
  basisCache.set(key, basis);
  return basis;
}

/** Bases already built (they depend only on the ends, the size and the parity); frozen. */
const basisCache = new Map<string, Basis1D>();

function buildBasis(ends: readonly [EndFixity, EndFixity], count: number, even: boolean): Basis1D {
  if (even && ends[0] !== ends[1]) throw new RangeError('an even basis needs like ends');
  const rows: Array<{ side: -1 | 1; order: 0 | 1 }> = [];
  for (const [side, fix] of [[-1, ends[0]], [1, ends[1]]] as const) {
    if (fix >= 1) rows.push({ side, order: 0 });
    if (fix >= 2) rows.push({ side, order: 1 });
  }
  const m = rows.length;
  const index: number[] = [];
  const coef: number[][] = [];
  for (let f = 0; f < count; f++) {
    const k = even ? 2 * f : f;
    index.push(k);
    if (m === 0) {
      coef.push([1]);
      continue;
    }
    const A = rows.map((r) => Array.from({ length: m }, (_, j) => legendreEnd(k + j + 1, r.side, r.order)));
    const rhs = rows.map((r) => -legendreEnd(k, r.side, r.order));
    const c = solveSmall(A, rhs);
    coef.push([1, ...c]);
  }
  const degree = index[index.length - 1] + m;
  return Object.freeze({ ends, index, coef, degree });
}
