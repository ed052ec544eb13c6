/**
 * Searches for the support needed (METHODS §12, "the support needed"), generic over a
 * caller-supplied predicate `passes(x)` (true when every counted check meets its target with
 * the trial support x). Pure: no knowledge of checks; the analysis plugs in its check table.
 *
 * (a) smallestStandingPressure: least p in [0, max] with passes(p). The checks improve as the
 *     pressure rises until it lifts the roof (any excess is dropped, METHODS §12), so passes is
 *     taken as monotone: false … false true … true. Doubling from `start` brackets the
 *     crossing, bisection narrows it to `tolerance`; the passing end is returned.
 * (b) largestSquareSpacing: largest S in [min, max] (default 0.3–3 m) with passes(S). Not
 *     assumed monotone (a cracked skin's voussoir sliding FS falls as S closes): the grid
 *     max, max − step, … is scanned downward and the crossing above the first passing sample
 *     is bisected to `tolerance`.
 * (c) shortestBoltLength: least L = min + k·step (default step 0.1 m) in [min, max] with
 *     passes(L), by a plain upward scan — anchorage is not monotone in L (a zone that an
 *     interface cuts gives no credit) so no bisection.
 * (d) the largest span with the given support is largestPassingSpan (span-search.ts).
 * Each returns null when no value in its range passes. SI: Pa, m.
 *
 *     largestSquareSpacing((S) => 100e3 / (12.5e3 * S * S) >= 1.5) // ≈ 2.3094 m = √(100/18.75)
 */

const MAX_BISECTIONS = 200;

const finite = (x: number) => Number.isFinite(x);

function checkTolerance(tolerance: number): void {
  if (!(tolerance > 0 && tolerance < Infinity)) throw new RangeError(`tolerance must be > 0, got ${tolerance}`);
}

/** Bisects a passing/failing pair to `tolerance`; returns the passing end. */
function bisect(passes: (x: number) => boolean, pass: number, fail: number, tolerance: number): number {
  for (let k = 0; k < MAX_BISECTIONS && Math.abs(fail - pass) > tolerance; k++) {
    const mid = 0.5 * (pass + fail);
    if (mid === pass || mid === fail) break;
    if (passes(mid)) pass = mid;
    else fail = mid;
  }
  return pass;
}

export interface PressureSearchOptions {
  /** First trial pressure after 0, Pa (default 1 kPa); doubled until it passes or reaches max. */
  start?: number;
  /** Largest pressure considered, Pa (default 10 MPa). */
  max?: number;
  /** Bracket width at which bisection stops, Pa (default 10 Pa). */
  tolerance?: number;
}

/** (a) Least standing pressure in [0, max] that passes; 0 when none is needed; null if max fails. */
export function smallestStandingPressure(
  passes: (pressure: number) => boolean,
  options: PressureSearchOptions = {},
): number | null {
  const { start = 1e3, max = 10e6, tolerance = 10 } = options;
  if (!(start > 0 && finite(start))) throw new RangeError(`start must be > 0 Pa, got ${start}`);
  if (!(max >= start && finite(max))) throw new RangeError(`max must be ≥ start (${start} Pa), got ${max}`);
  checkTolerance(tolerance);
  if (passes(0)) return 0;
  let fail = 0;
  let p = start;
  for (;;) {
    if (passes(p)) return bisect(passes, p, fail, tolerance);
    if (p >= max) return null;
    fail = p;
    p = Math.min(2 * p, max);
  }
}

export interface SpacingSearchOptions {
  /** Range of square spacing, m (default 0.3–3, METHODS §12). */
  min?: number;
  max?: number;
  /** Grid step of the downward scan, m (default 0.1). */
  step?: number;
  /** Bracket width at which bisection stops, m (default 1e-3). */
  tolerance?: number;
}

/** (b) Largest square spacing in [min, max] that passes; null when none does. */
export function largestSquareSpacing(
  passes: (spacing: number) => boolean,
  options: SpacingSearchOptions = {},
): number | null {
  const { min = 0.3, max = 3, step = 0.1, tolerance = 1e-3 } = options;
  if (!(min > 0 && finite(min))) throw new RangeError(`min must be > 0 m, got ${min}`);
  if (!(max >= min && finite(max))) throw new RangeError(`max must be ≥ min (${min} m), got ${max}`);
  if (!(step > 0 && finite(step))) throw new RangeError(`step must be > 0 m, got ${step}`);
  checkTolerance(tolerance);
  if (passes(max)) return max;
  const count = Math.ceil((max - min) / step - 1e-9);
  let above = max; // failing sample
  for (let k = 1; k <= count; k++) {
    const s = Math.max(min, max - k * step);
    if (passes(s)) return bisect(passes, s, above, tolerance);
    above = s;
  }
  return null;
}

export interface LengthSearchOptions {
  /** Shortest and longest bolt considered, m (max: the strata thickness, typically). */
  min: number;
  max: number;
  /** Step, m (default 0.1). */
  step?: number;
}

/** (c) Shortest bolt length min + k·step ≤ max that passes; null when none does. */
export function shortestBoltLength(passes: (length: number) => boolean, options: LengthSearchOptions): number | null {
  const { min, max, step = 0.1 } = options;
  if (!(min > 0 && finite(min))) throw new RangeError(`min must be > 0 m, got ${min}`);
  if (!(max >= min && finite(max))) throw new RangeError(`max must be ≥ min (${min} m), got ${max}`);
  if (!(step > 0 && finite(step))) throw new RangeError(`step must be > 0 m, got ${step}`);
  const count = Math.floor((max - min) / step + 1e-9);
  for (let k = 0; k <= count; k++) {
    // Rounded to 1e-9 m so that 0.1 m steps land on the decimal lengths a user would type.
    const length = Math.round((min + k * step) * 1e9) / 1e9;
    if (passes(length)) return length;
  }
  return null;
}

/** One trial of a search: whether every counted check passes, and the least FS/target (the margin, > 0). */
export interface Probe {
  passes: boolean;
  /** min FS/target over the counted checks (≥ 1 where it passes; Infinity when nothing counts). */
  margin: number;
}

/**
 * Narrows a passing/failing pair (`pass`, `fail`, either order on the axis) to `tolerance` and
 * returns the passing end, like bisection, but guided by the margin: the Illinois variant of
 * regula falsi (Dowell & Jarratt 1971) on f = ln(margin), with x on a log axis when `logAxis`
 * (power laws such as FS ∝ s⁻² or S⁻² are then straight lines and one step lands on the
 * crossing). Each trial is kept at least tolerance/2 inside the bracket, so the bracket always
 * shrinks and the passing end is a point that was tried and passed. Falls back to bisection
 * where the margin gives no usable slope (infinite margins) and after a trial that neither
 * halved the bracket nor landed near the crossing (a jump in the margin). `passing`, `failing` are
 * the probes already made at the two ends.
 *
 *     // FS = 100/(12.5 S²)/1.5 crosses 1 at S = 2.3094: found in 3–4 trials instead of ~8
 *     refineCrossing((S) => { const m = 100 / (12.5 * S * S) / 1.5; return { passes: m >= 1, margin: m }; },
 *       2, { passes: true, margin: 1.67 }, 3, { passes: false, margin: 0.74 }, 1e-2, true)
 */
export function refineCrossing(
  probe: (x: number) => Probe,
  pass: number, passing: Probe, fail: number, failing: Probe,
  tolerance: number, logAxis = false,
): number {
  checkTolerance(tolerance);
  const t = (x: number) => (logAxis ? Math.log(x) : x);
  const f = (p: Probe) => (p.margin > 0 && Number.isFinite(p.margin) ? Math.log(p.margin) : NaN);
  let fa = f(passing);
  let fb = f(failing);
  let side = 0; // which end was kept last time: +1 pass end kept twice → halve it
  let bisectNext = false;
  for (let k = 0; k < MAX_BISECTIONS && Math.abs(fail - pass) > tolerance; k++) {
    const width = Math.abs(fail - pass);
    let x = 0.5 * (pass + fail);
    if (!bisectNext && Number.isFinite(fa) && Number.isFinite(fb) && fa >= 0 && fb < 0 && fa !== fb) {
      const ta = t(pass);
      const tb = t(fail);
      const tx = ta + ((tb - ta) * fa) / (fa - fb);
      const guess = logAxis ? Math.exp(tx) : tx;
      if (Number.isFinite(guess)) x = guess;
    }
    // Keep the trial at least tolerance/2 inside the bracket.
    const lo = Math.min(pass, fail) + tolerance / 2;
    const hi = Math.max(pass, fail) - tolerance / 2;
    x = lo <= hi ? Math.min(hi, Math.max(lo, x)) : 0.5 * (pass + fail);
    if (x === pass || x === fail) break;
    const r = probe(x);
    const fx = f(r);
    const kept = r.passes ? fb : fa; // the end that stays
    if (r.passes) {
      pass = x;
      fa = fx;
      if (side === -1) fb /= 2; // the failing end was kept twice: Illinois step
      side = -1;
    } else {
      fail = x;
      fb = fx;
      if (side === 1) fa /= 2;
      side = 1;
    }
    // Safeguard (as in Brent's method): a trial that did not halve the bracket and did not land
    // near the crossing either (|ln margin| not small: the margin jumped) is followed by a
    // bisection, so jumps cost about what plain bisection costs. A trial that landed on the
    // crossing is closed from the other side by the next step.
    const landed = Number.isFinite(fx) && Number.isFinite(kept) && Math.abs(fx) <= 0.1 * Math.abs(kept);
    bisectNext = !bisectNext && Math.abs(fail - pass) > 0.5 * width && !landed;
  }
  return pass;
}
