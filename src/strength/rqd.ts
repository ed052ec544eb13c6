/**
 * Rock quality designation from the fracture frequency of a scanline or core:
 * RQD = 100·e^(−0.1λ)·(0.1λ + 1), λ in fractures per metre, RQD in percent (0–100].
 * Source: Priest & Hudson (1976).
 *     rqdFromFrequency(5) // 90.98
 */
export function rqdFromFrequency(frequency: number): number {
  if (!(frequency >= 0) || !Number.isFinite(frequency)) {
    throw new RangeError(`fracture frequency must be a finite number ≥ 0 per m, got ${frequency}`);
  }
  const x = 0.1 * frequency;
  // e^(−x)(1 + x) ≤ 1 exactly; the min keeps round-off at tiny λ from exceeding 100.
  return Math.min(100, 100 * Math.exp(-x) * (x + 1));
}
