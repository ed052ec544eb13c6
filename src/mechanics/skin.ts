/**
 * Skin check of a suspended layer between bolts (METHODS §12). A layer hanging from bolts no
 * longer spans the opening but the bolt spacing: it is checked as one interior span of a beam
 * continuous over the bolt rows, i.e. a clamped beam (by symmetry an interior span of equal
 * spans has zero slope at its supports) of span s = max(Sx, Sy) under its own weight
 * (Obert & Duvall 1967, §1 formulas with q = γt):
 *     σ abutment = q s²/(2t²) = γ s²/(2t),  σ midspan = γ s²/(4t),  δ = q s⁴/(32 E t³).
 * A cracked skin (joint spacing < s: the layer between two bolts is not one intact block)
 * is checked instead as a voussoir beam on the same span (Diederichs & Kaiser 1999, via
 * solveVoussoir), with γ' = γ.
 * Limits (say so when reporting): bolt plates are point supports, not line supports; the
 * hogging moment concentrates round each plate (flat-slab analogy), so the line-support beam
 * understates the stress next to the plate. The voussoir's abutment sliding FS s·tanφ/(4z)
 * falls as the spacing closes (a short deep skin block slides more easily in this model), so
 * it is the one skin FS that more bolts can lower.
 * SI: m, N/m³, Pa; tension positive, before any horizontal stress (the caller superposes σh).
 *
 *     skinCheck({ thickness: 0.2, unitWeight: 25e3, modulus: 10e9, spacingAcross: 1.2,
 *                 spacingAlong: 1.5, ucs: 30e6, frictionDeg: 30, jointSpacing: null })
 *     // span 1.5 m, elastic.maxTension = 25e3·1.5²/(2·0.2) = 140_625 Pa, voussoir null
 */
import { elasticBeam, type BeamResult } from './beam';
import { solveVoussoir, type VoussoirResult } from './voussoir';
import { checkSpacing } from './suspension';

export interface SkinInput {
  thickness: number;
  unitWeight: number;
  /** Modulus, Pa (the rock-mass modulus, as for the layer's own beam checks). */
  modulus: number;
  spacingAcross: number;
  spacingAlong: number;
  /** Crushing strength for the voussoir FS, Pa (≥ 0). */
  ucs: number;
  /** Cross-joint friction angle, degrees (0…90). */
  frictionDeg: number;
  /** Spacing of the cross-joints, m; null when the layer is not jointed. */
  jointSpacing: number | null;
}

export interface SkinResult {
  /** The span between bolts, max(Sx, Sy), m. */
  span: number;
  /** Joint spacing < span: the voussoir decides. */
  cracked: boolean;
  /** Clamped beam of the span under its own weight (always computed). */
  elastic: BeamResult;
  /** Voussoir on the span when cracked, else null. */
  voussoir: VoussoirResult | null;
}

/** Skin check (formulas in the file header). */
export function skinCheck(input: SkinInput): SkinResult {
  const { thickness, unitWeight, modulus, spacingAcross, spacingAlong, ucs, frictionDeg, jointSpacing } = input;
  checkSpacing(spacingAcross, spacingAlong);
  if (!(unitWeight > 0 && unitWeight < Infinity))
    throw new RangeError(`unitWeight must be > 0 N/m³, got ${unitWeight}`);
  if (!(ucs >= 0 && ucs < Infinity)) throw new RangeError(`ucs must be ≥ 0 Pa, got ${ucs}`);
  if (!(frictionDeg >= 0 && frictionDeg <= 90))
    throw new RangeError(`frictionDeg must be in [0, 90] degrees, got ${frictionDeg}`);
  if (jointSpacing !== null && !(jointSpacing > 0 && jointSpacing < Infinity))
    throw new RangeError(`jointSpacing must be > 0 m or null, got ${jointSpacing}`);
  const span = Math.max(spacingAcross, spacingAlong);
  const elastic = elasticBeam({ ends: 'clamped', span, thickness, load: unitWeight * thickness, modulus, horizontalStress: 0 });
  const cracked = jointSpacing !== null && jointSpacing < span;
  const voussoir = cracked ? solveVoussoir({ span, thickness, unitWeight, modulus, ucs, frictionDeg }) : null;
  return { span, cracked, elastic, voussoir };
}
