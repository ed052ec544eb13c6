/**
 * FORM, the first-order reliability method, for independent variables: the reliability index
 * β = min |u| over the limit state G(u) = 0 in standard normal space, and P_f ≈ Φ(−β).
 *
 * - Transformation (Hasofer & Lind, J. Eng. Mech. Div. ASCE 100 (1974) 111–121, with each
 *   marginal mapped by its own distribution function): x_j = F_j⁻¹(Φ(u_j)), G(u) = g(x(u)).
 * - Iteration (Rackwitz & Fiessler, Computers & Structures 9 (1978) 489–494):
 *   u' = [(∇G·u − G(u))/|∇G|²]·∇G, with ∇G by central differences (step h = 1e-4 in u).
 * - Step control (the improved HL–RF of Zhang & Der Kiureghian, Probabilistic Engineering
 *   Mechanics 12 (1997) 247–256): the step d = u' − u is halved until the merit
 *   m(u) = ½|u|² + c·|G(u)|, c = 2·max(|u|, |u'|)/|∇G| + 1, decreases (at most 30 halvings),
 *   and halved while G is not finite.
 * - Converged when |G(u)| ≤ tol·|G(0)| and u is parallel to ∇G (1 − |u·∇G|/(|u||∇G|) ≤ tol).
 * β is signed: negative when the mean point already fails (G(0) < 0). Never NaN: a limit state
 * that is not finite at the mean, or has no slope, gives β = null with the reason.
 * For R − S with R, S normal, or both lognormal (the surface ln R = ln S is a plane in u),
 * FORM is exact (METHODS §16: β = 1.961 and 2.514).
 *     form([normal(2, 0.5), normal(1, 0.1)], (x) => x[0] - x[1]).beta // 1.9612
 */
import type { Distribution } from './distributions';
import { normalCdf } from './standard-normal';

export interface FormOptions {
  /** default 100 */
  maxIterations?: number;
  /** default 1e-6 */
  tolerance?: number;
  /** finite-difference step in standard normal space; default 1e-4 */
  gradientStep?: number;
}

export interface FormResult {
  /** signed reliability index, or null (see `note`) */
  beta: number | null;
  /** Φ(−β), or null */
  pf: number | null;
  /** the most probable failure point, in the variables' own units */
  designPoint: number[];
  /** the same point in standard normal space */
  designPointU: number[];
  /** direction cosines α_j = −(∂G/∂u_j)/|∇G| at the design point (FORM's importance measure) */
  alpha: number[];
  iterations: number;
  evaluations: number;
  converged: boolean;
  note: string | null;
}

export function form(distributions: readonly Distribution[], g: (x: Float64Array) => number, options: FormOptions = {}): FormResult {
  const maxIterations = options.maxIterations ?? 100;
  const tol = options.tolerance ?? 1e-6;
  const h = options.gradientStep ?? 1e-4;
  if (!(Number.isInteger(maxIterations) && maxIterations >= 1)) throw new RangeError(`maxIterations must be a whole number ≥ 1, got ${maxIterations}`);
  if (!(tol > 0 && tol < 1)) throw new RangeError(`tolerance must be within (0, 1), got ${tol}`);
  if (!(h > 0 && h < 1)) throw new RangeError(`gradientStep must be within (0, 1), got ${h}`);
  const n = distributions.length;
  const x = new Float64Array(n);
  let evaluations = 0;
  const G = (u: ArrayLike<number>): number => {
    for (let j = 0; j < n; j++) x[j] = distributions[j].fromStandardNormal(u[j]);
    evaluations++;
    const value = g(x);
    return typeof value === 'number' ? value : NaN;
  };
  const toX = (u: ArrayLike<number>) => Array.from(u, (v, j) => distributions[j].fromStandardNormal(v));
  const norm = (v: ArrayLike<number>) => Math.sqrt(Array.from(v).reduce((s, a) => s + a * a, 0));

  let u = new Float64Array(n);
  const g0 = G(u);
  const finish = (beta: number | null, converged: boolean, iterations: number, grad: Float64Array | null, note: string | null): FormResult => {
    const gn = grad ? norm(grad) : 0;
    return {
      beta, pf: beta === null ? null : normalCdf(-beta),
      designPoint: toX(u), designPointU: Array.from(u),
      alpha: Array.from({ length: n }, (_, j) => (grad && gn > 0 ? -grad[j] / gn : 0)),
      iterations, evaluations, converged, note,
    };
  };
  if (!Number.isFinite(g0)) return finish(null, false, 0, null, `the limit state is not finite at the mean point (g = ${g0})`);
  if (g0 === 0) return finish(0, true, 0, null, 'the mean point lies on the limit state');
  const sign = g0 > 0 ? 1 : -1;
  const gScale = Math.abs(g0);

  const gradient = (at: Float64Array, gAt: number): Float64Array => {
    const grad = new Float64Array(n);
    const probe = Float64Array.from(at);
    for (let j = 0; j < n; j++) {
      probe[j] = at[j] + h;
      const up = G(probe);
      probe[j] = at[j] - h;
      const down = G(probe);
      probe[j] = at[j];
      if (Number.isFinite(up) && Number.isFinite(down)) grad[j] = (up - down) / (2 * h);
      else if (Number.isFinite(up)) grad[j] = (up - gAt) / h;
      else if (Number.isFinite(down)) grad[j] = (gAt - down) / h;
      else grad[j] = 0;
    }
    return grad;
  };

  let gu = g0;
  let grad = gradient(u, gu);
  for (let k = 1; k <= maxIterations; k++) {
    const gn2 = grad.reduce((s, a) => s + a * a, 0);
    if (!(gn2 > 0) || !Number.isFinite(gn2)) return finish(null, false, k - 1, grad, 'the limit state has no slope in any variable here (a flat or constant limit state)');
    const gn = Math.sqrt(gn2);
    const un = norm(u);
    const dot = u.reduce((s, a, j) => s + a * grad[j], 0);
    if (Math.abs(gu) <= tol * gScale && (un === 0 || 1 - Math.abs(dot) / (un * gn) <= tol)) {
      return finish(sign * un, true, k - 1, grad, null);
    }
    const factor = (dot - gu) / gn2;
    const target = grad.map((a) => factor * a);
    const c = (2 * Math.max(un, norm(target))) / gn + 1;
    const merit = (v: ArrayLike<number>, gv: number) => 0.5 * norm(v) ** 2 + c * Math.abs(gv);
    const m0 = merit(u, gu);
    let lambda = 1;
    let next = u;
    let gNext = NaN;
    for (let halving = 0; halving <= 30; halving++, lambda /= 2) {
      const trial = u.map((a, j) => a + lambda * (target[j] - a));
      const gt = G(trial);
      if (!Number.isFinite(gt)) continue;
      next = trial;
      gNext = gt;
      if (merit(trial, gt) < m0) break;
    }
    if (!Number.isFinite(gNext)) return finish(null, false, k, grad, 'the limit state is not finite along the search direction');
    u = next;
    gu = gNext;
    grad = gradient(u, gu);
  }
  return finish(sign * norm(u), false, maxIterations, grad, `not converged in ${maxIterations} iterations; β is the last iterate`);
}
