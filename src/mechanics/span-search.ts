/**
 * Generic searches for the largest passing span and the smallest passing thickness
 * (METHODS §11). The ratio is FS/target, already the minimum over layers; a failed or
 * infeasible state (snap-through, no solution) returns 0, and NaN counts as failing.
 *
 * Grid: geometric. The checks are power laws in span (σ ∝ s², δ ∝ s⁴, voussoir fc ∝ s² and
 * faster), so equal ratios between samples give the same relative resolution at 0.2 m as at
 * 50 m; 64 samples over three decades (cap/1000 … cap) step by 11.6 %. The ratio need not be
 * monotone: the grid is scanned from the passing side inward and the crossing next to the
 * extreme passing sample is bisected, so a dip narrower than one step can be missed (the
 * price of a bounded number of calls: samples + ~log2(step/tolerance) ≈ 64 + 14).
 */

export interface SpanSearchOptions {
  /** Largest span considered, m (default 100, METHODS §11). */
  cap?: number;
  /** Bisection stops when the bracket is narrower than this, m (default 1e-3). */
  tolerance?: number;
  /** Number of grid samples over cap/1000 … cap (default 64, at least 2). */
  samples?: number;
  /** Smallest span tried, m (default 1e-3): below cap/1000 the grid goes on down to it. */
  floor?: number;
}

export interface ValueSearchOptions {
  /** Bisection stops when the bracket is narrower than this (default 1e-3). */
  tolerance?: number;
  /** Number of grid samples (default 64, at least 2). */
  samples?: number;
}

/** Decades covered by the span grid: cap/1000 … cap. */
const SPAN_DECADES = 3;
const MAX_BISECTIONS = 200;

const passes = (r: number): boolean => r >= 1;

function checkOptions(tolerance: number, samples: number): void {
  if (!(tolerance > 0 && tolerance < Infinity))
    throw new RangeError(`tolerance must be > 0, got ${tolerance}`);
  if (!(Number.isInteger(samples) && samples >= 2))
    throw new RangeError(`samples must be an integer ≥ 2, got ${samples}`);
}

/** Bisects a passing/failing pair to `tolerance`; returns the passing end. */
function bisect(
  ratio: (x: number) => number,
  pass: number,
  fail: number,
  tolerance: number,
): number {
  for (let k = 0; k < MAX_BISECTIONS && Math.abs(fail - pass) > tolerance; k++) {
    const mid = 0.5 * (pass + fail);
    if (mid === pass || mid === fail) break;
    if (passes(ratio(mid))) pass = mid;
    else fail = mid;
  }
  return pass;
}

/**
 * Largest s in [floor, cap] with ratio(s) ≥ 1 (ratio = FS/target, already min over layers; a
 * failed or infeasible state returns 0). Brackets on a geometric grid cap/1000 … cap, scanned
 * from the top down and continued with the same step below cap/1000 down to `floor` (default
 * 1 mm), then bisects between the largest passing sample and the failing sample above it to
 * `tolerance` (default 1e-3 m), returning the passing end. Returns cap when ratio(cap) ≥ 1, 0
 * when it fails even at the floor (METHODS §11 v2: "0 only when it fails even at 1 mm").
 * SI: m. Source: METHODS §11 (bracketing and bisection).
 *     largestPassingSpan((s) => (5 / s) ** 2) // ≈ 5 (within 1 mm, and ratio ≥ 1 there)
 */
export function largestPassingSpan(
  ratio: (span: number) => number,
  options: SpanSearchOptions = {},
): number {
  const { cap = 100, tolerance = 1e-3, samples = 64, floor = 1e-3 } = options;
  if (!(cap > 0 && cap < Infinity)) throw new RangeError(`cap must be > 0 m, got ${cap}`);
  if (!(floor > 0 && floor <= cap)) throw new RangeError(`floor must be > 0 m and ≤ cap, got ${floor}`);
  checkOptions(tolerance, samples);
  if (passes(ratio(cap))) return cap;
  const lowest = cap / 10 ** SPAN_DECADES;
  const step = 10 ** (SPAN_DECADES / (samples - 1));
  let above = cap; // failing sample
  for (let i = samples - 2; i >= 0; i--) {
    const s = i === 0 ? lowest : lowest * step ** i;
    if (s < floor) break;
    if (passes(ratio(s))) return bisect(ratio, s, above, tolerance);
    above = s;
  }
  // Below the grid: the same geometric step down to the floor.
  for (let s = Math.min(above, lowest) / step; above > floor; s /= step) {
    const x = Math.max(s, floor);
    if (passes(ratio(x))) return bisect(ratio, x, above, Math.min(tolerance, x / 10));
    above = x;
  }
  return 0;
}

/**
 * Smallest x in [lo, hi] with ratio(x) ≥ 1, scanning upward (for the minimum thickness); null if
 * no sample passes. The grid is geometric when lo > 0 (thickness checks are power laws too),
 * linear otherwise; the crossing below the first passing sample is bisected to `tolerance`
 * (default 1e-3) and the passing end returned; lo itself is returned when ratio(lo) ≥ 1.
 * Source: METHODS §11.
 *     smallestPassingValue((t) => t / 0.3, 0.05, 3) // ≈ 0.3 (within 1e-3, ratio ≥ 1 there)
 */
export function smallestPassingValue(
  ratio: (x: number) => number,
  lo: number,
  hi: number,
  options: ValueSearchOptions = {},
): number | null {
  const { tolerance = 1e-3, samples = 64 } = options;
  if (!(Number.isFinite(lo) && Number.isFinite(hi) && hi > lo))
    throw new RangeError(`need finite lo < hi, got lo ${lo}, hi ${hi}`);
  checkOptions(tolerance, samples);
  if (passes(ratio(lo))) return lo;
  const geometric = lo > 0;
  const factor = geometric ? (hi / lo) ** (1 / (samples - 1)) : 0;
  const width = (hi - lo) / (samples - 1);
  let below = lo; // failing sample
  for (let i = 1; i < samples; i++) {
    const x = i === samples - 1 ? hi : geometric ? lo * factor ** i : lo + width * i;
    if (passes(ratio(x))) return bisect(ratio, x, below, tolerance);
    below = x;
  }
  return null;
}
