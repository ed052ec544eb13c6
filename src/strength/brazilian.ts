/**
 * Brazilian (indirect) tensile strength of a disc loaded across a diameter:
 * σt = 2P/(π·D·L). SI: N, m, m → Pa. Source: ISRM Suggested Methods (1978); ASTM D3967.
 *     brazilianTensileStrength(10e3, 0.054, 0.027) // 4.366e6 (4.366 MPa)
 */
export function brazilianTensileStrength(peakLoad: number, diameter: number, thickness: number): number {
  if (!(peakLoad > 0) || !Number.isFinite(peakLoad)) throw new RangeError(`peakLoad must be a finite number > 0 N, got ${peakLoad}`);
  if (!(diameter > 0) || !Number.isFinite(diameter)) throw new RangeError(`diameter must be a finite number > 0 m, got ${diameter}`);
  if (!(thickness > 0) || !Number.isFinite(thickness)) throw new RangeError(`thickness must be a finite number > 0 m, got ${thickness}`);
  return (2 * peakLoad) / (Math.PI * diameter * thickness);
}
