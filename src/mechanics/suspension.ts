/**
 * Rock bolts acting by suspension (METHODS §12; Obert & Duvall's suspension principle, common
 * practice): the layers wholly below the anchorage zone hang from the anchor layer.
 *
 *   hanging pressure  w = Σ γᵢ tᵢ − p_standing   over the suspended layers, ≥ 0   (Pa)
 *   bolt load         P = w · Sx · Sy                                             (N)
 *   FS bolt           = capacity / P            (null when P = 0: nothing hangs)
 *
 * Standing support pushing on the lowest (suspended) layer relieves the bolts first; with
 * p_standing = 0 (the METHODS case) w is the suspended weight.
 * The hanging pressure then loads the anchor layer's group: the layers from the anchor upward
 * are regrouped by §2 (layering.ts) and w is added to the group holding the anchor (shared
 * within it by E t³), so the loads on the layers that still span the opening add up to the
 * whole strata weight plus surcharge minus standing support (statics: nothing is lost).
 * SI: γ in N/m³, t and S in m, pressures in Pa, forces in N.
 *
 *     boltSuspension({ suspended: [{ unitWeight: 25e3, thickness: 0.5 }],
 *                      spacingAcross: 1.2, spacingAlong: 1.2, capacity: 100e3 })
 *     // { pressure: 12_500, load: 18_000, fs: 5.556 }
 */
import { groupLayers, shareLoads, type BedStiffness } from './layering';

export interface SuspendedLayer {
  unitWeight: number;
  thickness: number;
}

export interface SuspensionInput {
  /** The layers that hang from the bolts (wholly below the anchorage zone); may be empty. */
  suspended: readonly SuspendedLayer[];
  /** Bolt spacing across the opening Sx and along it Sy, m. */
  spacingAcross: number;
  spacingAlong: number;
  /** Bolt capacity, N (> 0). */
  capacity: number;
  /** Standing support pressure pushing up on the lowest layer, Pa (≥ 0, default 0). */
  standingSupport?: number;
}

export interface SuspensionResult {
  /** Suspended weight Σγt, Pa. */
  weight: number;
  /** Pressure the bolts carry, max(Σγt − standing, 0), Pa. */
  pressure: number;
  /** Load per bolt P = pressure·Sx·Sy, N. */
  load: number;
  /** capacity/P; null when P = 0. */
  fs: number | null;
}

const finitePositive = (x: number) => x > 0 && x < Infinity;

/** Throws RangeError naming the parameter for a spacing that is not a finite positive length. */
export function checkSpacing(spacingAcross: number, spacingAlong: number): void {
  if (!finitePositive(spacingAcross))
    throw new RangeError(`spacingAcross must be > 0 m, got ${spacingAcross}`);
  if (!finitePositive(spacingAlong))
    throw new RangeError(`spacingAlong must be > 0 m, got ${spacingAlong}`);
}

/** Σγt over the layers, Pa; throws RangeError naming `${name}[i]` for bad entries. */
export function layerWeight(layers: readonly SuspendedLayer[], name: string): number {
  if (!Array.isArray(layers)) throw new RangeError(`${name} must be a list of layers`);
  let w = 0;
  layers.forEach((l, i) => {
    if (!finitePositive(l?.unitWeight))
      throw new RangeError(`${name}[${i}].unitWeight must be > 0 N/m³, got ${l?.unitWeight}`);
    if (!finitePositive(l.thickness))
      throw new RangeError(`${name}[${i}].thickness must be > 0 m, got ${l.thickness}`);
    w += l.unitWeight * l.thickness;
  });
  return w;
}

function checkStanding(standing: number): void {
  if (!(standing >= 0 && standing < Infinity))
    throw new RangeError(`standingSupport must be ≥ 0 Pa, got ${standing}`);
}

/** Bolt load and FS under suspension (formulas in the file header). */
export function boltSuspension(input: SuspensionInput): SuspensionResult {
  const { suspended, spacingAcross, spacingAlong, capacity, standingSupport = 0 } = input;
  checkSpacing(spacingAcross, spacingAlong);
  if (!finitePositive(capacity)) throw new RangeError(`capacity must be > 0 N, got ${capacity}`);
  checkStanding(standingSupport);
  const weight = layerWeight(suspended, 'suspended');
  const pressure = Math.max(weight - standingSupport, 0);
  const load = pressure * spacingAcross * spacingAlong;
  return { weight, pressure, load, fs: load > 0 ? capacity / load : null };
}

export interface SuspendedLoadsInput {
  /** Every layer, from the roof line upward. */
  beds: readonly BedStiffness[];
  /** Index of the anchor layer (the layers below it hang from the bolts). */
  anchorLayer: number;
  /** Surcharge on the top group, Pa (≥ 0, default 0). */
  surcharge?: number;
  /** Standing support pushing on the lowest layer, Pa (≥ 0, default 0). */
  standingSupport?: number;
}

export interface SuspendedLoads {
  /** Load on each layer as a beam over the opening, Pa; 0 for the suspended layers. */
  loads: number[];
  /** Group index of each layer from the anchor up (by §2, regrouped); null below the anchor. */
  groups: (number | null)[];
  /** The pressure moved onto the anchor layer's group: Σγt below the anchor − standing, Pa. */
  transferred: number;
}

/**
 * Loads on the layers that span the opening once the layers below `anchorLayer` hang from it:
 * layers anchorLayer… are grouped by §2 on self-weight, the transferred pressure
 * w = Σ_{i<k} γᵢtᵢ − p_standing is added to the anchor's group (it is the lowest of the
 * regrouped stack) and shared within it by E t³; surcharge goes on the top group. The net
 * load is not clipped at zero here (METHODS §12 leaves that to the analysis, which drops any
 * excess of standing support with SUPPORT_EXCEEDS_LOAD).
 *     suspendedLoads({ beds: [{ unitWeight: 25e3, thickness: 0.5, modulus: 10e9 },
 *                             { unitWeight: 25e3, thickness: 1, modulus: 10e9 }], anchorLayer: 1 })
 *     // { loads: [0, 37_500], groups: [null, 0], transferred: 12_500 }
 */
export function suspendedLoads(input: SuspendedLoadsInput): SuspendedLoads {
  const { beds, anchorLayer, surcharge = 0, standingSupport = 0 } = input;
  if (!Array.isArray(beds) || beds.length === 0) throw new RangeError('beds must list at least one layer');
  if (!(Number.isInteger(anchorLayer) && anchorLayer >= 0 && anchorLayer < beds.length))
    throw new RangeError(`anchorLayer must be an index 0…${beds.length - 1}, got ${anchorLayer}`);
  if (!(surcharge >= 0 && surcharge < Infinity)) throw new RangeError(`surcharge must be ≥ 0 Pa, got ${surcharge}`);
  checkStanding(standingSupport);
  beds.forEach((b, i) => {
    if (!finitePositive(b?.modulus)) throw new RangeError(`beds[${i}].modulus must be > 0 Pa, got ${b?.modulus}`);
  });
  layerWeight(beds, 'beds');
  const hanging = beds.slice(0, anchorLayer);
  const transferred = layerWeight(hanging, 'beds') - standingSupport;
  const spanning = beds.slice(anchorLayer);
  const groups = groupLayers(spanning);
  // shareLoads subtracts its `support` argument from group 0, the anchor's group.
  const shared = shareLoads(spanning, groups, surcharge, -transferred, { capSupport: false });
  return {
    loads: [...hanging.map(() => 0), ...shared.loads],
    groups: [...hanging.map(() => null), ...groups],
    transferred,
  };
}
