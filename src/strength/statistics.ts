export interface Summary {
  n: number;
  mean: number;
  /** sample standard deviation (n − 1); 0 for a single value */
  sd: number;
  /** coefficient of variation sd/mean; 0 for a single value */
  cov: number;
}

/**
 * Mean, sample standard deviation (divisor n − 1, two-pass) and coefficient of variation
 * V = sd/mean of a set of test results (any unit). sd = V = 0 for n = 1.
 * V needs mean > 0 unless all values are equal. Source: common practice.
 *     summarise([1, 2, 3]) // { n: 3, mean: 2, sd: 1, cov: 0.5 }
 */
export function summarise(values: readonly number[]): Summary {
  const n = values.length;
  if (n === 0) throw new RangeError('summarise needs at least one value, got none');
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const v = values[i];
    if (!Number.isFinite(v)) throw new RangeError(`values[${i}] must be a finite number, got ${v}`);
    sum += v;
  }
  const mean = sum / n;
  let squares = 0;
  for (let i = 0; i < n; i++) squares += (values[i] - mean) * (values[i] - mean);
  const sd = n > 1 ? Math.sqrt(squares / (n - 1)) : 0;
  if (!(sd === 0 || mean > 0)) throw new RangeError(`coefficient of variation needs a mean > 0, got ${mean}`);
  return { n, mean, sd, cov: sd === 0 ? 0 : sd / mean };
}

/** EN 1990 Annex D Table D1, 5 % fractile, V unknown (from memory). */
const KN_N = [3, 4, 5, 6, 8, 10, 20, 30];
const KN_VALUE = [3.37, 2.63, 2.33, 2.18, 2.0, 1.92, 1.76, 1.73];
const KN_INFINITE = 1.64;

/**
 * kn for the 5 % characteristic value with V unknown, EN 1990 Annex D Table D1 (from memory):
 * n = 3 3.37, 4 2.63, 5 2.33, 6 2.18, 8 2.00, 10 1.92, 20 1.76, 30 1.73, ∞ 1.64. Between
 * tabulated n the value of the next lower tabulated n is taken (the larger kn: conservative);
 * 1.73 for every finite n ≥ 30; null for n < 3 (no fractile).
 *     knLower5(7) // 2.18
 */
export function knLower5(n: number): number | null {
  if (n === Infinity) return KN_INFINITE;
  if (!(n >= 0) || !Number.isInteger(n)) throw new RangeError(`n must be a whole number ≥ 0, got ${n}`);
  let kn: number | null = null;
  for (let i = 0; i < KN_N.length && n >= KN_N[i]; i++) kn = KN_VALUE[i];
  return kn;
}

export type CharacteristicRuleName = 'mean' | 'lower5' | 'cautiousMean' | 'lower5Log';

export const CHARACTERISTIC_RULE_NAMES: readonly CharacteristicRuleName[] = ['mean', 'lower5', 'cautiousMean', 'lower5Log'];

export interface Characteristic extends Summary {
  value: number;
  /**
   * The multiplier used: kn of EN 1990 Table D1 for 'lower5' and 'lower5Log'; t(0.95, n − 1)/√n
   * for 'cautiousMean'; null for 'mean' or when too few values fall back to the mean.
   */
  kn: number | null;
  /** 'lower5Log' only: mean and sample standard deviation of ln x. */
  log?: { mean: number; sd: number };
  warning?: string;
}

/**
 * Characteristic value of a set of test results (any unit, values > 0 for 'lower5Log').
 * - 'mean': the mean.
 * - 'lower5': m·(1 − kn·V), kn from `knLower5` (EN 1990 Annex D, V unknown), clamped at ≥ 0;
 *   fewer than 3 values: the mean, with a warning.
 * - 'cautiousMean': m·(1 − t(0.95, n − 1)·V/√n), the cautious estimate of the mean for a failure
 *   involving a large volume of ground (EN 1997-1 §2.4.5.2; memory), clamped at ≥ 0; fewer than
 *   2 values: the mean, with a warning.
 * - 'lower5Log': the lognormal 5 % fractile exp(m_y − kn·s_y), y = ln x (EN 1990 Annex D, D7.3;
 *   memory), never negative; fewer than 3 values: the mean, with a warning.
 *     characteristicValue([2, 2.5, 3], 'lower5')   // value = 2.5·(1 − 3.37·0.2) = 0.815
 *     characteristicValue([5, 10, 15], 'lower5Log') // value ≈ 1.397
 */
export function characteristicValue(values: readonly number[], rule: CharacteristicRuleName): Characteristic {
  if (!CHARACTERISTIC_RULE_NAMES.includes(rule)) {
    throw new RangeError(`rule must be one of ${CHARACTERISTIC_RULE_NAMES.map((r) => `"${r}"`).join(', ')}, got ${JSON.stringify(rule)}`);
  }
  const { n, mean, sd, cov } = summarise(values);
  if (rule === 'mean') return { n, mean, sd, cov, value: mean, kn: null };
  if (rule === 'cautiousMean') {
    if (n < 2) {
      return { n, mean, sd, cov, value: mean, kn: null, warning: `only ${n} result: a cautious mean needs at least 2 (EN 1997-1 §2.4.5.2); the mean is used` };
    }
    const factor = studentTQuantile(0.95, n - 1) / Math.sqrt(n);
    const cautious = mean * (1 - factor * cov);
    if (cautious < 0) {
      return { n, mean, sd, cov, value: 0, kn: factor, warning: `the cautious mean m(1 − t·V/√n) is negative (V = ${cov.toFixed(3)}); taken as 0` };
    }
    return { n, mean, sd, cov, value: cautious, kn: factor };
  }
  const kn = knLower5(n);
  if (kn === null) {
    return {
      n, mean, sd, cov, value: mean, kn: null,
      warning: `only ${n} result(s): a 5 % fractile needs at least 3 (EN 1990 Annex D); the mean is used`,
    };
  }
  if (rule === 'lower5Log') {
    values.forEach((v, i) => {
      if (!(v > 0)) throw new RangeError(`values[${i}] must be > 0 for a lognormal fractile, got ${v}`);
    });
    const logs = summariseLogs(values);
    return { n, mean, sd, cov, value: Math.exp(logs.mean - kn * logs.sd), kn, log: logs };
  }
  const fractile = mean * (1 - kn * cov);
  if (fractile < 0) {
    return {
      n, mean, sd, cov, value: 0, kn,
      warning: `the 5 % fractile m(1 − kn·V) is negative (V = ${cov.toFixed(3)}, kn = ${kn}); taken as 0`,
    };
  }
  return { n, mean, sd, cov, value: fractile, kn };
}

/** Mean and sample standard deviation of ln x. */
function summariseLogs(values: readonly number[]): { mean: number; sd: number } {
  const y = values.map((v) => Math.log(v));
  const m = y.reduce((a, b) => a + b, 0) / y.length;
  const ss = y.reduce((a, b) => a + (b - m) * (b - m), 0);
  return { mean: m, sd: y.length > 1 ? Math.sqrt(ss / (y.length - 1)) : 0 };
}

// ---------------------------------------------------------------- Student t

/** ln Γ(x) for x > 0: Lanczos approximation (g = 7, 9 terms), about 15 significant digits. */
function logGamma(x: number): number {
  const c = [
    0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313,
    -176.61502916214059, 12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6,
    1.5056327351493116e-7,
  ];
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  const z = x - 1;
  let sum = c[0];
  for (let i = 1; i < 9; i++) sum += c[i] / (z + i);
  const t = z + 7.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

/** Continued fraction of the incomplete beta function (modified Lentz). */
function betaContinuedFraction(x: number, a: number, b: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 1000; m++) {
    const m2 = 2 * m;
    let term = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + term * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + term / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    term = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + term * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + term / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return h;
}

/**
 * Regularised incomplete beta I_x(a, b), with x and 1 − x both passed in so that neither
 * loses digits to cancellation.
 */
function incompleteBeta(x: number, complement: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (complement <= 0) return 1;
  const logFront = a * Math.log(x) + b * Math.log(complement) + logGamma(a + b) - logGamma(a) - logGamma(b);
  if (x < (a + 1) / (a + b + 2)) return (Math.exp(logFront) * betaContinuedFraction(x, a, b)) / a;
  return 1 - (Math.exp(logFront) * betaContinuedFraction(complement, b, a)) / b;
}

/** Upper tail P(T > t) of Student's t for t ≥ 0: ½·I_{ν/(ν+t²)}(ν/2, 1/2). */
function studentUpperTail(t: number, dof: number): number {
  const denominator = dof + t * t;
  return 0.5 * incompleteBeta(dof / denominator, (t * t) / denominator, dof / 2, 0.5);
}

/**
 * One-sided quantile of Student's t distribution: the t with P(T ≤ t) = p for ν degrees of
 * freedom (ν > 0, need not be whole). Solved numerically by bisection on the upper tail
 * ½·I_{ν/(ν+t²)}(ν/2, 1/2) (regularised incomplete beta, continued fraction), to about 1e-12
 * relative. Source: the t–incomplete-beta relation, Abramowitz & Stegun (1964) ch. 26 (from memory).
 *     studentTQuantile(0.95, 2) // 2.9200
 */
export function studentTQuantile(p: number, dof: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`p must be within (0, 1), got ${p}`);
  if (!(dof > 0) || !Number.isFinite(dof)) throw new RangeError(`dof must be a finite number > 0, got ${dof}`);
  if (p === 0.5) return 0;
  if (p < 0.5) return -studentTQuantile(1 - p, dof);
  const tail = 1 - p;
  let low = 0;
  let high = 1;
  while (studentUpperTail(high, dof) > tail) {
    low = high;
    high *= 2;
    if (!(high < 1e300)) throw new RangeError(`studentTQuantile(${p}, ${dof}) is out of range`);
  }
  for (let i = 0; i < 2000 && high - low > 1e-13 * high; i++) {
    const mid = 0.5 * (low + high);
    if (studentUpperTail(mid, dof) > tail) low = mid;
    else high = mid;
  }
  return 0.5 * (low + high);
}
