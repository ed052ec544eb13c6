/**
 * Rock-mass modulus from the intact modulus (simplified Hoek–Diederichs):
 * Erm = Ei·(0.02 + (1 − D/2)/(1 + e^((60 + 15D − GSI)/11))). SI: Pa → Pa; GSI 0–100, D 0–1.
 * Source: Hoek & Diederichs (2006), IJRMMS 43:203–215.
 *     rockMassModulus(50e9, 50, 0) // 15.359e9
 */
export function rockMassModulus(intactModulus: number, gsi: number, disturbance: number): number {
  if (!(intactModulus > 0) || !Number.isFinite(intactModulus)) {
    throw new RangeError(`intact modulus must be a finite number > 0 Pa, got ${intactModulus}`);
  }
  if (!(gsi >= 0 && gsi <= 100)) throw new RangeError(`gsi must be within 0–100, got ${gsi}`);
  if (!(disturbance >= 0 && disturbance <= 1)) throw new RangeError(`disturbance D must be within 0–1, got ${disturbance}`);
  return intactModulus * (0.02 + (1 - disturbance / 2) / (1 + Math.exp((60 + 15 * disturbance - gsi) / 11)));
}
