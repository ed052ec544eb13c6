/**
 * Where a rock bolt anchors in a layered roof (METHODS §12). Layers are listed from the roof
 * line upward; layer i spans heights [bᵢ, bᵢ + tᵢ] with b₀ = 0 and bᵢ = Σ_{j<i} tⱼ (m).
 * A bolt of length L has its tip at height L and its anchorage zone at [L − a, L]
 * (a = anchorage length, default 0.3 m, common practice). Then
 *   - anchor layer: the one layer holding the whole zone, bₖ ≤ L − a and L ≤ bₖ + tₖ;
 *   - a zone that an interface cuts (L − a < bₖ < L): "atInterface", naming the two layers;
 *     no anchorage is credited (ANCHOR_AT_INTERFACE);
 *   - a tip above the top of the strata (L > Σt): "beyondStrata", for the caller to refuse;
 *   - suspended layers: those wholly below the zone, bᵢ + tᵢ ≤ L − a;
 *   - the beam-building set: the layers wholly within the bolt length, bᵢ + tᵢ ≤ L.
 * Heights are compared with a tolerance of 1e-9 m so that lengths built from 0.1 m steps fall
 * on the interface they were meant to reach. SI: m. Source: geometry of METHODS §12.
 *
 *     boltAnchorage([0.5, 0.3, 1.2], 1.8, 0.3)
 *     // { kind: 'anchored', anchorLayer: 2, zone: [1.5, 1.8], suspended: [0, 1], withinBolt: [0, 1] }
 *     boltAnchorage([0.5, 0.3, 1.2], 0.9, 0.3)
 *     // { kind: 'atInterface', lowerLayer: 1, upperLayer: 2, zone: [0.6, 0.9], suspended: [0], ... }
 */

/** Anchorage length used when none is given, m (common practice). */
export const DEFAULT_ANCHORAGE_M = 0.3;

/** Heights within this distance, m, count as equal. */
const EPS = 1e-9;
/** Shortest anchorage accepted, m (well above EPS, so a zone always has a layer). */
const MIN_ANCHORAGE_M = 1e-6;

interface AnchorageCommon {
  /** The anchorage zone [L − a, L], m above the roof line. */
  zone: [number, number];
  /** Layers wholly below the zone (they hang from the anchor when the bolt suspends). */
  suspended: number[];
  /** Layers wholly within the bolt length (the set a grouted bolt may bond). */
  withinBolt: number[];
  /** Total thickness of the strata, m. */
  strataThickness: number;
}

export interface Anchored extends AnchorageCommon {
  kind: 'anchored';
  anchorLayer: number;
}

export interface AnchorAtInterface extends AnchorageCommon {
  kind: 'atInterface';
  /** The layers below and above the interface that cuts the zone (the lowest such one). */
  lowerLayer: number;
  upperLayer: number;
  /** Height of that interface, m. */
  interfaceHeight: number;
}

export interface BeyondStrata {
  kind: 'beyondStrata';
  /** Total thickness of the strata, m (less than the bolt length). */
  strataThickness: number;
  length: number;
}

export type BoltAnchorage = Anchored | AnchorAtInterface | BeyondStrata;

function checkInput(thicknesses: readonly number[], length: number, anchorage: number): void {
  if (!Array.isArray(thicknesses) || thicknesses.length === 0)
    throw new RangeError('thicknesses must list at least one layer (m, from the roof line upward)');
  thicknesses.forEach((t, i) => {
    if (!(t > 0 && t < Infinity)) throw new RangeError(`thicknesses[${i}] must be > 0 m, got ${t}`);
  });
  if (!(length > 0 && length < Infinity)) throw new RangeError(`length must be > 0 m, got ${length}`);
  if (!(anchorage >= MIN_ANCHORAGE_M && anchorage < Infinity))
    throw new RangeError(`anchorage must be ≥ ${MIN_ANCHORAGE_M} m, got ${anchorage}`);
  if (!(anchorage <= length))
    throw new RangeError(`anchorage must not exceed the bolt length ${length} m, got ${anchorage}`);
}

/** Heights of the layer tops, m: tops[i] = t₀ + … + tᵢ. */
export function layerTops(thicknesses: readonly number[]): number[] {
  let h = 0;
  return thicknesses.map((t) => (h += t));
}

/**
 * Anchorage of a bolt of length L (m) with anchorage length a (m) in layers of the given
 * thicknesses (m, from the roof line upward). See the file header for the rules.
 */
export function boltAnchorage(
  thicknesses: readonly number[],
  length: number,
  anchorage: number = DEFAULT_ANCHORAGE_M,
): BoltAnchorage {
  checkInput(thicknesses, length, anchorage);
  const tops = layerTops(thicknesses);
  const strataThickness = tops[tops.length - 1];
  if (length > strataThickness + EPS) return { kind: 'beyondStrata', strataThickness, length };
  const zoneBottom = length - anchorage;
  const suspended: number[] = [];
  const withinBolt: number[] = [];
  tops.forEach((top, i) => {
    if (top <= zoneBottom + EPS) suspended.push(i);
    if (top <= length + EPS) withinBolt.push(i);
  });
  const common: AnchorageCommon = { zone: [zoneBottom, length], suspended, withinBolt, strataThickness };
  // The zone's bottom lies in the first layer not wholly below it.
  const lowest = suspended.length;
  const cut = tops.findIndex((top) => top > zoneBottom + EPS && top < length - EPS);
  if (cut >= 0)
    return { kind: 'atInterface', lowerLayer: cut, upperLayer: cut + 1, interfaceHeight: tops[cut], ...common };
  return { kind: 'anchored', anchorLayer: lowest, ...common };
}
