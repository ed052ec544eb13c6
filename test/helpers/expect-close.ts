import { expect } from 'vitest';

/**
 * Asserts |actual − expected| ≤ rel·max(|expected|, tiny), so a check reads as a relative
 * tolerance; for expected = 0 the tolerance falls back to an absolute `rel`.
 * The failure message shows both values and the relative error.
 *     expectClose(1.2500000001e6, 1.25e6, 1e-9) // passes
 */
export function expectClose(actual: number, expected: number, rel = 1e-9): void {
  const scale = Math.abs(expected) > 0 ? Math.abs(expected) : 1;
  const error = Math.abs(actual - expected) / scale;
  const ok = Number.isFinite(actual) && Number.isFinite(expected) && error <= rel;
  expect(
    ok,
    `expected ${actual} to be within rel ${rel} of ${expected} (relative error ${error})`,
  ).toBe(true);
}
