/**
 * The seeded uniform generator of the uncertainty layer: the same seed gives the same numbers
 * in node and in every browser.
 *
 * Choice: d3-random's `randomLcg` (d3 7.9.0 is already a pinned dependency, so nothing new is
 * added). It is the linear congruential generator x ← (1664525·x + 1013904223) mod 2³² (the
 * constants of Numerical Recipes, 2nd ed., §7.1), computed with exact integer arithmetic in
 * doubles (the product stays below 2⁵³), so no engine or platform can round it differently.
 * Its period, 2³² ≈ 4.3e9 numbers, covers 1e5 samples × 20 variables × 2 draws thousands of
 * times over. pure-rand (xoroshiro128+, better equidistribution in many dimensions) would be the
 * choice for longer runs; it is only a transitive dependency here.
 *
 * d3's generator returns k/2³² in [0, 1), which includes 0; `seededUniform` returns
 * (k + ½)/2³², strictly inside (0, 1), so an inverse distribution function never meets 0 or 1
 * (the smallest value, 1.16e-10, is Φ(−6.35)).
 *     const u = seededUniform(1); u(); u(); // the same two numbers on every run
 */
import { randomLcg } from 'd3-random';

const HALF_STEP = 2 ** -33;

/** A generator of uniform numbers in (0, 1); `seed` is a whole number 0 ≤ seed < 2³¹. */
export function seededUniform(seed: number): () => number {
  if (!(Number.isInteger(seed) && seed >= 0 && seed < 2 ** 31)) {
    throw new RangeError(`seed must be a whole number from 0 to 2147483647, got ${seed}`);
  }
  // d3 reads a seed in [0, 1) as a fraction of 2³²: 0 is the only whole number it takes so.
  const lcg = randomLcg(seed);
  return () => lcg() + HALF_STEP;
}

/** A whole number 0 ≤ k < n from a uniform draw (n ≤ 2³²). */
export function randomIndex(uniform: () => number, n: number): number {
  const k = Math.floor(uniform() * n);
  return k < n ? k : n - 1;
}
