/**
 * Layered roof: load sharing and bed separation (Obert & Duvall 1967). Layers that bend
 * together share curvature, so layer i of a group carries
 *     qᵢ = Eᵢ tᵢ³ · Σ(γⱼ tⱼ) / Σ(Eⱼ tⱼ³)      (sums over the group).
 * Groups are built upward from the immediate roof: the next layer joins while the load it puts
 * on the group's lowest layer does not fall, (q_{n+1})₁ ≥ (q_n)₁; the first layer whose addition
 * lowers it is stiffer, separates, and starts the next group. The test uses self-weights only;
 * surcharge (top group) and support pressure (group 0) are shared afterwards in the same
 * stiffness proportion. SI: γ in N/m³, t in m, E in Pa, pressures in Pa.
 *
 *     groupLayers([{ unitWeight: 25e3, thickness: 0.5, modulus: 10e9 },
 *                  { unitWeight: 25e3, thickness: 1.0, modulus: 20e9 }]) // [0, 1]
 */
export interface BedStiffness {
  unitWeight: number;
  thickness: number;
  modulus: number;
}

/** Load on the lowest layer of `beds` when they all bend together: E₁t₁³ Σγt / ΣEt³. */
export function loadOnLowest(beds: readonly BedStiffness[]): number {
  if (beds.length === 0) throw new RangeError('loadOnLowest needs at least one bed');
  return loadOnLowestOf(beds, 0, beds.length);
}

/** `loadOnLowest` of beds[start … end − 1] (no copy: the grouping runs once per sample of an uncertainty run). */
function loadOnLowestOf(beds: readonly BedStiffness[], start: number, end: number): number {
  let weight = 0;
  let stiffness = 0;
  for (let i = start; i < end; i++) {
    const b = beds[i];
    weight += b.unitWeight * b.thickness;
    stiffness += b.modulus * b.thickness ** 3;
  }
  const lowest = beds[start];
  return (lowest.modulus * lowest.thickness ** 3 * weight) / stiffness;
}

/** One test of the group formation: does bed `layer` join the group that starts at `first`? */
export interface GroupingStep {
  /** The bed tested (index into `beds`). */
  layer: number;
  /** The lowest bed of the group it may join. */
  first: number;
  /** (q_n)₁: load on the group's lowest bed without it, Pa. */
  without: number;
  /** (q_{n+1})₁: load on the group's lowest bed with it, Pa. */
  with: number;
  /** with ≥ without: it bends with the group; otherwise it separates and starts the next group. */
  joins: boolean;
}

/** Group index of every bed, layers[0] upward. `record`, when given, receives each test. */
export function groupLayers(beds: readonly BedStiffness[], record?: (step: GroupingStep) => void): number[] {
  const groups: number[] = [];
  let group = 0;
  let start = 0;
  for (let i = 0; i < beds.length; i++) {
    if (i > start) {
      const before = loadOnLowestOf(beds, start, i);
      const after = loadOnLowestOf(beds, start, i + 1);
      record?.({ layer: i, first: start, without: before, with: after, joins: !(after < before) });
      if (after < before) {
        group += 1;
        start = i;
      }
    }
    groups.push(group);
  }
  return groups;
}

export interface SharedLoads {
  /** Load carried by each bed, Pa. */
  loads: number[];
  /** Per group: Σγt (self-weight), ΣEt³, and the extra pressure (surcharge − support) applied. */
  groups: { first: number; last: number; weight: number; stiffness: number; extra: number }[];
  /** Standing support actually applied, Pa: min(support, load on group 0) (METHODS §12). */
  supportApplied: number;
  /** Support beyond the load it can relieve, dropped, Pa (≥ 0). */
  supportExcess: number;
}

/**
 * Loads per bed after sharing within groups; surcharge on the top group, standing support on
 * group 0. Support can only relieve load that is there (METHODS §12): it is capped at group 0's
 * weight (plus the surcharge when group 0 is also the top group), so no bed carries a negative
 * load; the excess is returned in `supportExcess`.
 * Check: one 0.6 m bed, 25 kN/m³ (15 kPa), 400 kPa support → load 0, excess 385 kPa.
 * `capSupport: false` applies `support` as given (a caller that nets loads itself, e.g. bolt
 * suspension passing a transferred weight, and clips later).
 */
export function shareLoads(
  beds: readonly BedStiffness[],
  groups: readonly number[],
  surcharge: number,
  support: number,
  options: { capSupport?: boolean } = {},
): SharedLoads {
  const cap = options.capSupport ?? true;
  if (groups.length !== beds.length) throw new RangeError('groups must give one index per bed');
  const count = beds.length === 0 ? 0 : groups[groups.length - 1] + 1;
  const summary: SharedLoads['groups'] = [];
  let supportApplied = 0;
  for (let g = 0; g < count; g++) {
    const first = groups.indexOf(g);
    const last = groups.lastIndexOf(g);
    let weight = 0;
    let stiffness = 0;
    for (let i = first; i <= last; i++) {
      weight += beds[i].unitWeight * beds[i].thickness;
      stiffness += beds[i].modulus * beds[i].thickness ** 3;
    }
    const top = g === count - 1 ? surcharge : 0;
    // A negative `support` is an extra downward load on group 0 (bolt suspension passes one): never capped.
    if (g === 0) supportApplied = cap && support > 0 ? Math.max(0, Math.min(support, weight + top)) : support;
    const extra = top - (g === 0 ? supportApplied : 0);
    summary.push({ first, last, weight, stiffness, extra });
  }
  const loads = beds.map((b, i) => {
    const g = summary[groups[i]];
    const q = (b.modulus * b.thickness ** 3 * (g.weight + g.extra)) / g.stiffness;
    return cap ? Math.max(0, q) : q;
  });
  return { loads, groups: summary, supportApplied, supportExcess: Math.max(0, support - supportApplied) };
}
