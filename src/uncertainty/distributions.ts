/**
 * The input distributions of the uncertainty layer: normal (optionally truncated to a range,
 * e.g. > 0 for a thickness or a strength), lognormal (from its mean and CoV, optionally
 * truncated), uniform and triangular. Unit-agnostic: the numbers are in whatever unit the
 * caller's variable has.
 *
 * Every distribution maps a uniform u in (0, 1) to a value by its inverse distribution function
 * (so Latin hypercube strata in u are strata in the value) and a standard normal z to a value
 * (x = F⁻¹(Φ(z)), the transformation FORM needs), keeping both tails accurate: each inverse
 * works from whichever of p and 1 − p is the smaller.
 *
 * Formulas (common practice; e.g. Johnson, Kotz & Balakrishnan, Continuous Univariate
 * Distributions, 2nd ed., 1994):
 * - normal N(μ, σ) truncated to [a, b]: α = (a − μ)/σ, β = (b − μ)/σ, Z = Φ(β) − Φ(α);
 *   x(u) = μ + σ·Φ⁻¹(Φ(α) + u·Z); mean μ + σ(φ(α) − φ(β))/Z;
 *   variance σ²[1 + (αφ(α) − βφ(β))/Z − ((φ(α) − φ(β))/Z)²]. `mean`/`sd` are the parent's.
 * - lognormal from mean m and CoV V: ζ² = ln(1 + V²), λ = ln m − ζ²/2, x = e^(λ + ζz);
 *   truncated to [a, b] in ln space like the normal, with E[Xᵏ] = e^(kλ + k²ζ²/2)·
 *   (Φ(β − kζ) − Φ(α − kζ))/Z.
 * - uniform on [a, b]: x = a + (b − a)u; mean (a + b)/2, variance (b − a)²/12; from a mean and
 *   sd: a, b = m ∓ √3·sd.
 * - triangular (a, c, b): x = a + √(u(b − a)(c − a)) for u ≤ (c − a)/(b − a), else
 *   b − √((1 − u)(b − a)(b − c)); mean (a + b + c)/3, variance
 *   (a² + b² + c² − ab − ac − bc)/18; mode c = 3m − a − b when only the mean is given; from a
 *   mean and sd (symmetric): a, b = m ∓ √6·sd.
 * A zero sd (or CoV) gives a constant: every sample is the mean exactly, bit for bit.
 * test/uncertainty/distributions.test.ts checks the moments against jstat 1.9.6.
 */
import type { FieldIssue } from '../model/validate';
import type { UncertainVariable } from '../model/types';
import { normalCdf, normalDensity, normalQuantile } from './standard-normal';

export type DistributionName = 'normal' | 'lognormal' | 'uniform' | 'triangular';
export const DISTRIBUTION_NAMES: readonly DistributionName[] = ['normal', 'lognormal', 'uniform', 'triangular'];

/** What a variable states about its distribution (any unit; `mean` defaults upstream): the model's variable less its path. */
export type DistributionParams = Omit<UncertainVariable, 'path'>;

export interface Distribution {
  readonly name: DistributionName;
  /** the value at cumulative probability u, 0 < u < 1 */
  quantile(u: number): number;
  /** the value at standard normal z: F⁻¹(Φ(z)), accurate in both tails */
  fromStandardNormal(z: number): number;
  /** F(x) = P(X ≤ x) */
  cdf(x: number): number;
  readonly mean: number;
  readonly variance: number;
  readonly sd: number;
  /** ends of the support (±Infinity when open) */
  readonly lower: number;
  readonly upper: number;
  /** zero variance: every value is `mean` exactly */
  readonly constant: boolean;
}

export type DistributionResult = { ok: true; distribution: Distribution } | { ok: false; errors: FieldIssue[] };

/**
 * Builds a distribution from its parameters, or lists every problem with its field path
 * (`path` is the variable's own path, e.g. `uncertainty.variables[2]`):
 *     makeDistribution({ distribution: 'normal', mean: 1, cov: -0.1 }, 'uncertainty.variables[2]')
 *     // errors: ['uncertainty.variables[2].cov: must be ≥ 0, got -0.1']
 */
export function makeDistribution(params: DistributionParams, path = ''): DistributionResult {
  const errors: FieldIssue[] = [];
  const at = (field: string) => (path ? `${path}.${field}` : field);
  const fail = (field: string, expected: string, got: unknown) =>
    errors.push({ path: at(field), message: `${at(field)}: ${expected}, got ${typeof got === 'number' ? got : JSON.stringify(got)}` });
  const finite = (field: keyof DistributionParams) => {
    const v = params[field];
    if (v !== undefined && !(typeof v === 'number' && Number.isFinite(v))) fail(field, 'must be a finite number', v);
  };
  const name = params.distribution;
  if (!DISTRIBUTION_NAMES.includes(name)) {
    fail('distribution', `must be one of ${DISTRIBUTION_NAMES.map((n) => `"${n}"`).join(', ')}`, name);
    return { ok: false, errors };
  }
  (['mean', 'cov', 'sd', 'min', 'max', 'mode'] as const).forEach(finite);
  if (errors.length) return { ok: false, errors };
  const { mean, cov, sd, min, max, mode } = params;
  if (cov !== undefined && !(cov >= 0)) fail('cov', 'must be ≥ 0', cov);
  if (sd !== undefined && !(sd >= 0)) fail('sd', 'must be ≥ 0', sd);
  if (cov !== undefined && sd !== undefined) fail('sd', 'give cov or sd, not both', sd);
  if (min !== undefined && max !== undefined && !(min < max)) fail('max', `must be > min (${min})`, max);
  if (mode !== undefined && name !== 'triangular') fail('mode', 'is only for a triangular distribution', mode);
  if (errors.length) return { ok: false, errors };
  const spread = cov !== undefined || sd !== undefined;
  const sdOf = (m: number): number | null => {
    if (sd !== undefined) return sd;
    if (cov === undefined) return null;
    if (cov > 0 && m === 0) {
      fail('cov', 'needs a mean ≠ 0 (give sd instead)', cov);
      return null;
    }
    return cov * Math.abs(m);
  };

  if (name === 'normal' || name === 'lognormal') {
    if (mean === undefined) fail('mean', 'is needed', mean);
    else if (name === 'lognormal' && !(mean > 0)) fail('mean', 'must be > 0 for a lognormal', mean);
    if (!spread) fail('cov', `is needed (or sd) for a ${name}`, undefined);
    if (name === 'lognormal' && min !== undefined && !(min >= 0)) fail('min', 'must be ≥ 0 for a lognormal', min);
    if (errors.length || mean === undefined) return { ok: false, errors };
    if (min !== undefined && mean < min) fail('mean', `must be ≥ min (${min})`, mean);
    if (max !== undefined && mean > max) fail('mean', `must be ≤ max (${max})`, mean);
    const s = sdOf(mean);
    if (errors.length || s === null) return { ok: false, errors };
    if (s === 0) return { ok: true, distribution: constant(name, mean) };
    if (name === 'normal') {
      if (!Number.isFinite(mean + 40 * s)) {
        fail('sd', 'is too large', s);
        return { ok: false, errors };
      }
      return { ok: true, distribution: truncatedNormal(mean, s, min ?? -Infinity, max ?? Infinity) };
    }
    return { ok: true, distribution: lognormal(mean, s / mean, min ?? 0, max ?? Infinity) };
  }

  // uniform and triangular: a range [a, b], from min/max or from a mean and a spread
  const ranged = min !== undefined || max !== undefined;
  if (ranged && spread) fail(cov !== undefined ? 'cov' : 'sd', 'give min and max, or a mean with cov or sd, not both', cov ?? sd);
  if (ranged && (min === undefined || max === undefined)) fail(min === undefined ? 'min' : 'max', `is needed with ${min === undefined ? 'max' : 'min'}`, undefined);
  if (!ranged && !spread) fail('min', `and max are needed (or a mean with cov or sd) for a ${name}`, undefined);
  if (!ranged && mean === undefined) fail('mean', 'is needed', mean);
  if (errors.length) return { ok: false, errors };
  if (!ranged) {
    const m = mean as number;
    const s = sdOf(m);
    if (errors.length || s === null) return { ok: false, errors };
    if (s === 0) return { ok: true, distribution: constant(name, m) };
    const half = (name === 'uniform' ? Math.sqrt(3) : Math.sqrt(6)) * s;
    return { ok: true, distribution: name === 'uniform' ? uniform(m - half, m + half) : triangular(m - half, m, m + half) };
  }
  const a = min as number;
  const b = max as number;
  if (name === 'uniform') return { ok: true, distribution: uniform(a, b) };
  let c = mode;
  if (c === undefined) {
    if (mean === undefined) {
      fail('mode', 'is needed (or a mean) for a triangular', undefined);
      return { ok: false, errors };
    }
    c = 3 * mean - a - b;
    if (!(c >= a && c <= b)) {
      fail('mean', `must lie within [${(2 * a + b) / 3}, ${(a + 2 * b) / 3}] for a triangular on [${a}, ${b}] (its mode 3·mean − min − max would leave the range)`, mean);
      return { ok: false, errors };
    }
  } else if (!(c >= a && c <= b)) {
    fail('mode', `must lie within [${a}, ${b}]`, c);
    return { ok: false, errors };
  }
  return { ok: true, distribution: triangular(a, c, b) };
}

/** `makeDistribution` for callers that already validated: throws a RangeError listing the problems. */
export function distribution(params: DistributionParams, path = ''): Distribution {
  const result = makeDistribution(params, path);
  if (!result.ok) throw new RangeError(result.errors.map((e) => e.message).join('\n'));
  return result.distribution;
}

// ---------------------------------------------------------------- the families

const clamp = (x: number, lo: number, hi: number) => (x < lo ? lo : x > hi ? hi : x);

function constant(name: DistributionName, m: number): Distribution {
  return {
    name, mean: m, variance: 0, sd: 0, lower: m, upper: m, constant: true,
    quantile: () => m,
    fromStandardNormal: () => m,
    cdf: (x) => (x < m ? 0 : 1),
  };
}

/**
 * A standard normal truncated to [α, β]: the inverse from (p, q = 1 − p) using the smaller
 * tail, and the mass Z computed without cancellation.
 */
function truncatedStandard(alpha: number, beta: number) {
  const pLow = normalCdf(alpha); // mass below α
  const qHigh = normalCdf(-beta); // mass above β
  const mass = alpha >= 0 ? normalCdf(-alpha) - qHigh : beta <= 0 ? normalCdf(beta) - pLow : 1 - pLow - qHigh;
  if (!(mass > 0)) throw new RangeError(`the truncation range [${alpha}σ, ${beta}σ] holds no probability`);
  return {
    mass,
    inverse(p: number, q: number): number {
      const pp = pLow + p * mass;
      const qq = qHigh + q * mass;
      const z = pp < 0.5 ? normalQuantile(pp) : -normalQuantile(qq);
      return clamp(z, alpha, beta);
    },
    cdf(z: number): number {
      if (z <= alpha) return 0;
      if (z >= beta) return 1;
      return z <= 0 ? (normalCdf(z) - pLow) / mass : 1 - (normalCdf(-z) - qHigh) / mass;
    },
    /** E[e^(k·s·Z)]·… helper: (Φ(β − t) − Φ(α − t))/Z */
    shiftedMass(t: number): number {
      const lo = alpha - t;
      const hi = beta - t;
      const m = lo >= 0 ? normalCdf(-lo) - normalCdf(-hi) : normalCdf(hi) - normalCdf(lo);
      return m / mass;
    },
  };
}

const phiTimes = (z: number) => (Number.isFinite(z) ? z * normalDensity(z) : 0);
const phiAt = (z: number) => (Number.isFinite(z) ? normalDensity(z) : 0);

function truncatedNormal(mu: number, sigma: number, a: number, b: number): Distribution {
  const alpha = (a - mu) / sigma;
  const beta = (b - mu) / sigma;
  const t = truncatedStandard(alpha, beta);
  const truncated = Number.isFinite(a) || Number.isFinite(b);
  const shift = (phiAt(alpha) - phiAt(beta)) / t.mass;
  const mean = truncated ? mu + sigma * shift : mu;
  const variance = truncated ? sigma * sigma * Math.max(0, 1 + (phiTimes(alpha) - phiTimes(beta)) / t.mass - shift * shift) : sigma * sigma;
  const at = (z: number) => clamp(mu + sigma * z, a, b);
  return {
    name: 'normal', mean, variance, sd: Math.sqrt(variance), lower: a, upper: b, constant: false,
    quantile: (u) => at(truncated ? t.inverse(u, 1 - u) : u < 0.5 ? normalQuantile(u) : -normalQuantile(1 - u)),
    fromStandardNormal: (z) => (truncated ? at(t.inverse(normalCdf(z), normalCdf(-z))) : at(z)),
    cdf: (x) => t.cdf((x - mu) / sigma),
  };
}

function lognormal(m: number, v: number, a: number, b: number): Distribution {
  const zeta = Math.sqrt(Math.log1p(v * v));
  const lambda = Math.log(m) - (zeta * zeta) / 2;
  const alpha = a > 0 ? (Math.log(a) - lambda) / zeta : -Infinity;
  const beta = Number.isFinite(b) ? (Math.log(b) - lambda) / zeta : Infinity;
  const t = truncatedStandard(alpha, beta);
  const truncated = Number.isFinite(alpha) || Number.isFinite(beta);
  const moment = (k: number) => Math.exp(k * lambda + (k * k * zeta * zeta) / 2) * (truncated ? t.shiftedMass(k * zeta) : 1);
  const mean = truncated ? moment(1) : m;
  const variance = truncated ? Math.max(0, moment(2) - mean * mean) : (m * v) ** 2;
  const at = (z: number) => clamp(Math.exp(lambda + zeta * z), a, b);
  return {
    name: 'lognormal', mean, variance, sd: Math.sqrt(variance), lower: a, upper: b, constant: false,
    quantile: (u) => at(truncated ? t.inverse(u, 1 - u) : u < 0.5 ? normalQuantile(u) : -normalQuantile(1 - u)),
    fromStandardNormal: (z) => (truncated ? at(t.inverse(normalCdf(z), normalCdf(-z))) : at(z)),
    cdf: (x) => (x <= 0 ? 0 : t.cdf((Math.log(x) - lambda) / zeta)),
  };
}

function uniform(a: number, b: number): Distribution {
  const w = b - a;
  const inverse = (p: number, q: number) => clamp(p < 0.5 ? a + w * p : b - w * q, a, b);
  return {
    name: 'uniform', mean: (a + b) / 2, variance: (w * w) / 12, sd: w / Math.sqrt(12), lower: a, upper: b, constant: false,
    quantile: (u) => inverse(u, 1 - u),
    fromStandardNormal: (z) => inverse(normalCdf(z), normalCdf(-z)),
    cdf: (x) => clamp((x - a) / w, 0, 1),
  };
}

function triangular(a: number, c: number, b: number): Distribution {
  const w = b - a;
  const fc = (c - a) / w;
  const inverse = (p: number, q: number) =>
    clamp(p <= fc ? a + Math.sqrt(p * w * (c - a)) : b - Math.sqrt(q * w * (b - c)), a, b);
  const variance = (a * a + b * b + c * c - a * b - a * c - b * c) / 18;
  return {
    name: 'triangular', mean: (a + b + c) / 3, variance, sd: Math.sqrt(variance), lower: a, upper: b, constant: false,
    quantile: (u) => inverse(u, 1 - u),
    fromStandardNormal: (z) => inverse(normalCdf(z), normalCdf(-z)),
    cdf: (x) => (x <= a ? 0 : x >= b ? 1 : x <= c ? ((x - a) ** 2) / (w * (c - a)) : 1 - ((b - x) ** 2) / (w * (b - c))),
  };
}
