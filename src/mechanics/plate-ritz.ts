/**
 * Ritz (energy) solution of a Kirchhoff plate under uniform load, at a fixed basis size.
 * Used by `plate.ts`, which picks the basis size, estimates the error and caches results.
 *
 * Dimensionless form: short side a = 1, flexural rigidity D = 1, load q = 1, so the deflection
 * is w·D/(q a⁴) and the moments M/(q a²). The plate occupies 0 ≤ x ≤ b/a (x along the long
 * side) and 0 ≤ y ≤ 1. Deflection w = Σ c_ij X_i(x) Y_j(y) with the end-constrained Legendre
 * bases of `plate-basis.ts`; the c_ij minimise the total potential energy
 *   Π = ½ ∫∫ [w_xx² + w_yy² + 2ν w_xx w_yy + 2(1−ν) w_xy²] dA − ∫∫ w dA
 * (Timoshenko & Woinowsky-Krieger 1959, §10 energy of bending), giving K c = f with
 *   K = A2x⊗A0y + A0x⊗A2y + ν(Bx⊗Byᵀ + Bxᵀ⊗By) + 2(1−ν) A1x⊗A1y,
 * where A_r = ∫ φ_i^(r) φ_k^(r), B = ∫ φ_i″ φ_k (Gauss–Legendre quadrature, exact for
 * polynomials). K is symmetric positive definite for a supported plate: dense Cholesky.
 * Moments (D = 1): Mx = −(w_xx + ν w_yy), My = −(w_yy + ν w_xx), Mxy = −(1−ν) w_xy; positive
 * Mx, My sag the plate (tension on the bottom face, w positive downward with the load).
 */
import { type Basis1D, type EndFixity, constrainedBasis, gaussLegendre, legendre } from './plate-basis';

export interface PlateSupports {
  /** Ends of the x span (the short edges x = 0 and x = b/a). */
  x: readonly [EndFixity, EndFixity];
  /** Ends of the y span (the long edges y = 0 and y = 1). */
  y: readonly [EndFixity, EndFixity];
}

export interface RitzPlate {
  aspect: number;
  poisson: number;
  bx: Basis1D;
  by: Basis1D;
  /** Coefficients, c[i·nY + j] for X_i Y_j. */
  c: Float64Array;
  unknowns: number;
}

/** Values and first and second physical derivatives of the basis at physical points. */
export interface BasisValues {
  n: number;
  points: number;
  v: Float64Array; // v[p·n + f]
  d1: Float64Array;
  d2: Float64Array;
}

/** Evaluate a basis at physical points s ∈ [0, length] (ξ = 2s/length − 1). */
export function basisAt(basis: Basis1D, length: number, points: ArrayLike<number>): BasisValues {
  const n = basis.index.length;
  const np = points.length;
  const deg = basis.degree;
  const p = new Float64Array(deg + 1);
  const q1 = new Float64Array(deg + 1);
  const q2 = new Float64Array(deg + 1);
  const v = new Float64Array(np * n);
  const d1 = new Float64Array(np * n);
  const d2 = new Float64Array(np * n);
  const j1 = 2 / length;
  const j2 = j1 * j1;
  for (let pt = 0; pt < np; pt++) {
    const xi = Math.min(1, Math.max(-1, (2 * points[pt]) / length - 1));
    legendre(deg, xi, p, q1, q2);
    for (let f = 0; f < n; f++) {
      const k = basis.index[f];
      const cf = basis.coef[f];
      let a0 = 0;
      let a1 = 0;
      let a2 = 0;
      for (let j = 0; j < cf.length; j++) {
        a0 += cf[j] * p[k + j];
        a1 += cf[j] * q1[k + j];
        a2 += cf[j] * q2[k + j];
      }
      v[pt * n + f] = a0;
      d1[pt * n + f] = a1 * j1;
      d2[pt * n + f] = a2 * j2;
    }
  }
  return { n, points: np, v, d1, d2 };
}

interface Integrals1D {
  n: number;
  A0: Float64Array;
  A1: Float64Array;
  A2: Float64Array;
  B: Float64Array; // B[i·n + k] = ∫ φ_i″ φ_k
  load: Float64Array; // ∫ φ_i
}

function integrals(basis: Basis1D, length: number): Integrals1D {
  const { nodes, weights } = gaussLegendre(basis.degree + 2);
  const pts = Array.from(nodes, (x) => ((x + 1) * length) / 2);
  const e = basisAt(basis, length, pts);
  const n = e.n;
  const A0 = new Float64Array(n * n);
  const A1 = new Float64Array(n * n);
  const A2 = new Float64Array(n * n);
  const B = new Float64Array(n * n);
  const load = new Float64Array(n);
  for (let g = 0; g < pts.length; g++) {
    const wg = (weights[g] * length) / 2;
    const o = g * n;
    for (let i = 0; i < n; i++) {
      const vi = e.v[o + i] * wg;
      const d1i = e.d1[o + i] * wg;
      const d2i = e.d2[o + i] * wg;
      load[i] += vi;
      for (let k = 0; k < n; k++) {
        A0[i * n + k] += vi * e.v[o + k];
        A1[i * n + k] += d1i * e.d1[o + k];
        A2[i * n + k] += d2i * e.d2[o + k];
        B[i * n + k] += d2i * e.v[o + k];
      }
    }
  }
  return { n, A0, A1, A2, B, load };
}

/** In-place dense Cholesky solve of K x = f (K row-major, n × n); throws if not SPD. */
function choleskySolve(K: Float64Array, f: Float64Array, n: number): Float64Array {
  for (let j = 0; j < n; j++) {
    const rj = j * n;
    let d = K[rj + j];
    for (let k = 0; k < j; k++) d -= K[rj + k] * K[rj + k];
    if (!(d > 1e-14 * Math.abs(K[rj + j]))) throw new RangeError('plate stiffness is not positive definite: the plate is not supported against rigid motion');
    d = Math.sqrt(d);
    K[rj + j] = d;
    for (let i = j + 1; i < n; i++) {
      const ri = i * n;
      let s = K[ri + j];
      for (let k = 0; k < j; k++) s -= K[ri + k] * K[rj + k];
      K[ri + j] = s / d;
    }
  }
  const x = Float64Array.from(f);
  for (let i = 0; i < n; i++) {
    const ri = i * n;
    let s = x[i];
    for (let k = 0; k < i; k++) s -= K[ri + k] * x[k];
    x[i] = s / K[ri + i];
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    for (let k = i + 1; k < n; k++) s -= K[k * n + i] * x[k];
    x[i] = s / K[i * n + i];
  }
  return x;
}

/**
 * Ritz solution with `countX` functions along the long side and `countY` along the short side
 * (counted after the even/odd split where the two ends of a side are alike).
 *     solvePlateRitz(1, 0.3, { x: [2, 2], y: [2, 2] }, 8, 8) // clamped square, 64 unknowns
 */
export function solvePlateRitz(aspect: number, poisson: number, supports: PlateSupports, countX: number, countY: number): RitzPlate {
  const bx = constrainedBasis(supports.x, countX, supports.x[0] === supports.x[1]);
  const by = constrainedBasis(supports.y, countY, supports.y[0] === supports.y[1]);
  const ix = integrals(bx, aspect);
  const iy = integrals(by, 1);
  const nX = ix.n;
  const nY = iy.n;
  const n = nX * nY;
  const K = new Float64Array(n * n);
  const f = new Float64Array(n);
  const nu = poisson;
  const twist = 2 * (1 - nu);
  for (let i = 0; i < nX; i++) {
    for (let j = 0; j < nY; j++) {
      const I = i * nY + j;
      f[I] = ix.load[i] * iy.load[j];
      // lower triangle only (Cholesky reads j ≤ i)
      for (let k = 0; k <= i; k++) {
        const a2x = ix.A2[i * nX + k];
        const a0x = ix.A0[i * nX + k];
        const a1x = ix.A1[i * nX + k];
        const bxik = ix.B[i * nX + k];
        const bxki = ix.B[k * nX + i];
        const row = I * n + k * nY;
        const lmax = k === i ? j : nY - 1;
        for (let l = 0; l <= lmax; l++) {
          K[row + l] =
            a2x * iy.A0[j * nY + l] +
            a0x * iy.A2[j * nY + l] +
            nu * (bxik * iy.B[l * nY + j] + bxki * iy.B[j * nY + l]) +
            twist * a1x * iy.A1[j * nY + l];
        }
      }
    }
  }
  const c = choleskySolve(K, f, n);
  return { aspect, poisson, bx, by, c, unknowns: n };
}

export interface PlateFieldValues {
  /** Deflection w·D/(q a⁴). */
  w: Float64Array;
  /** Moments M/(q a²). */
  mx: Float64Array;
  my: Float64Array;
  mxy: Float64Array;
}

/**
 * Deflection and moments on the tensor grid xs × ys (row-major: index r·xs.length + s for
 * y = ys[r], x = xs[s]).
 */
export function plateFieldAt(sol: RitzPlate, xs: ArrayLike<number>, ys: ArrayLike<number>): PlateFieldValues {
  const ex = basisAt(sol.bx, sol.aspect, xs);
  const ey = basisAt(sol.by, 1, ys);
  const nX = ex.n;
  const nY = ey.n;
  const px = xs.length;
  const py = ys.length;
  // T_r[s, j] = Σ_i X_i^(r)(x_s) c_ij for r = 0, 1, 2
  const T0 = new Float64Array(px * nY);
  const T1 = new Float64Array(px * nY);
  const T2 = new Float64Array(px * nY);
  for (let s = 0; s < px; s++) {
    for (let i = 0; i < nX; i++) {
      const v = ex.v[s * nX + i];
      const d1 = ex.d1[s * nX + i];
      const d2 = ex.d2[s * nX + i];
      for (let j = 0; j < nY; j++) {
        const cij = sol.c[i * nY + j];
        T0[s * nY + j] += v * cij;
        T1[s * nY + j] += d1 * cij;
        T2[s * nY + j] += d2 * cij;
      }
    }
  }
  const m = px * py;
  const w = new Float64Array(m);
  const mx = new Float64Array(m);
  const my = new Float64Array(m);
  const mxy = new Float64Array(m);
  const nu = sol.poisson;
  for (let r = 0; r < py; r++) {
    for (let s = 0; s < px; s++) {
      let w0 = 0;
      let wxx = 0;
      let wyy = 0;
      let wxy = 0;
      for (let j = 0; j < nY; j++) {
        const yv = ey.v[r * nY + j];
        w0 += T0[s * nY + j] * yv;
        wxx += T2[s * nY + j] * yv;
        wyy += T0[s * nY + j] * ey.d2[r * nY + j];
        wxy += T1[s * nY + j] * ey.d1[r * nY + j];
      }
      const o = r * px + s;
      w[o] = w0;
      mx[o] = -(wxx + nu * wyy);
      my[o] = -(wyy + nu * wxx);
      mxy[o] = -(1 - nu) * wxy;
    }
  }
  return { w, mx, my, mxy };
}

interface PointWork {
  lx: Float64Array[]; // Legendre p, p′, p″ for x
  ly: Float64Array[];
  X: Float64Array[]; // basis value, d1, d2 at x
  Y: Float64Array[];
}
const work = new WeakMap<RitzPlate, PointWork>();

function combine(basis: Basis1D, xi: number, jac: number, l: Float64Array[], out: Float64Array[]): void {
  legendre(basis.degree, xi, l[0], l[1], l[2]);
  const n = basis.index.length;
  for (let f = 0; f < n; f++) {
    const k = basis.index[f];
    const cf = basis.coef[f];
    let a0 = 0;
    let a1 = 0;
    let a2 = 0;
    for (let j = 0; j < cf.length; j++) {
      a0 += cf[j] * l[0][k + j];
      a1 += cf[j] * l[1][k + j];
      a2 += cf[j] * l[2][k + j];
    }
    out[0][f] = a0;
    out[1][f] = a1 * jac;
    out[2][f] = a2 * jac * jac;
  }
}

/**
 * Deflection and moments at one point, allocation-free (for the maximum search):
 * writes [w, Mx, My, Mxy] (dimensionless as in `plateFieldAt`) into `out`.
 */
export function plateAtPoint(sol: RitzPlate, x: number, y: number, out: Float64Array): void {
  let wk = work.get(sol);
  if (!wk) {
    const mk = (n: number) => [new Float64Array(n), new Float64Array(n), new Float64Array(n)];
    wk = { lx: mk(sol.bx.degree + 1), ly: mk(sol.by.degree + 1), X: mk(sol.bx.index.length), Y: mk(sol.by.index.length) };
    work.set(sol, wk);
  }
  const xi = Math.min(1, Math.max(-1, (2 * x) / sol.aspect - 1));
  const eta = Math.min(1, Math.max(-1, 2 * y - 1));
  combine(sol.bx, xi, 2 / sol.aspect, wk.lx, wk.X);
  combine(sol.by, eta, 2, wk.ly, wk.Y);
  const nX = sol.bx.index.length;
  const nY = sol.by.index.length;
  const [X0, X1, X2] = wk.X;
  const [Y0, Y1, Y2] = wk.Y;
  let w = 0;
  let wxx = 0;
  let wyy = 0;
  let wxy = 0;
  for (let i = 0; i < nX; i++) {
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    const o = i * nY;
    for (let j = 0; j < nY; j++) {
      const c = sol.c[o + j];
      s0 += c * Y0[j];
      s1 += c * Y1[j];
      s2 += c * Y2[j];
    }
    w += X0[i] * s0;
    wxx += X2[i] * s0;
    wyy += X0[i] * s2;
    wxy += X1[i] * s1;
  }
  const nu = sol.poisson;
  out[0] = w;
  out[1] = -(wxx + nu * wyy);
  out[2] = -(wyy + nu * wxx);
  out[3] = -(1 - nu) * wxy;
}
