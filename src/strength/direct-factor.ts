export type RockClassName = 'sedimentary' | 'igneous' | 'metamorphic';

const FACTORS: Record<RockClassName, number> = { sedimentary: 0.7, igneous: 0.8, metamorphic: 0.9 };

/**
 * Ratio of direct to Brazilian tensile strength by rock class: 0.7 sedimentary, 0.8 igneous,
 * 0.9 metamorphic. Dimensionless. Source: Perras & Diederichs (2014), Geotech Geol Eng 32:525–546.
 *     directFactor('sedimentary') // 0.7
 */
export function directFactor(rockClass: RockClassName): number {
  const factor = Object.prototype.hasOwnProperty.call(FACTORS, rockClass) ? FACTORS[rockClass] : undefined;
  if (factor === undefined) {
    throw new RangeError(`rockClass must be "sedimentary", "igneous" or "metamorphic", got ${JSON.stringify(rockClass)}`);
  }
  return factor;
}
