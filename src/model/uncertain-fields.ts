/**
 * The fields an uncertainty variable may sample (METHODS §16), with their physical ranges: a
 * normal or lognormal is truncated to the range (a thickness, strength or modulus stays > 0;
 * Poisson's ratio within [0, 0.5); the joint condition within [0, 30]); a uniform or triangular
 * must lie inside it (common practice). The validator (model/validate.ts) refuses a variable
 * whose path matches none of these; the uncertainty layer (uncertainty/variables.ts) builds the
 * distributions.
 */
import { parsePath, type PathKey } from './project-path';

export interface EligibleField {
  /** as shown to people: `layers[i].thickness_m` */
  pattern: string;
  /** lower physical bound and whether it is excluded (> rather than ≥) */
  lower: number;
  lowerOpen: boolean;
  upper: number;
  upperOpen: boolean;
}

const field = (pattern: string, lower: number, lowerOpen: boolean, upper = Infinity, upperOpen = false): EligibleField => ({ pattern, lower, lowerOpen, upper, upperOpen });

/** METHODS §16: the fields a variable may name, with their physical ranges (common practice). */
export const ELIGIBLE_FIELDS: readonly EligibleField[] = [
  field('opening.span_m', 0, true),
  field('layers[i].thickness_m', 0, true),
  field('layers[i].unitWeight_kNm3', 0, true),
  field('layers[i].youngModulus_GPa', 0, true),
  field('layers[i].poisson', 0, false, 0.5, true),
  field('layers[i].ucs_MPa', 0, true),
  field('layers[i].tensile.value_MPa', 0, true),
  field('layers[i].jointing.fractureFrequency_per_m', 0, false),
  field('layers[i].jointing.jointCondition', 0, false, 30, false),
  field('layers[i].jointing.crossJointSpacing_m', 0, true),
  field('layers[i].jointing.jointFriction_deg', 0, false, 90, true),
  field('loads.horizontalStress_MPa', -Infinity, false),
  field('loads.surcharge_kPa', 0, false),
  field('support.standing_kPa', 0, false), // lamina/2
  field('loads.support_kPa', 0, false), // lamina/1
];

/** The eligible field a path names (`layers[3].poisson` → `layers[i].poisson`), or null. */
export function eligibleField(path: string): EligibleField | null {
  let keys: PathKey[];
  try {
    keys = parsePath(path);
  } catch {
    return null;
  }
  const pattern = keys.map((k) => (typeof k === 'number' ? '[i]' : `.${k}`)).join('').replace(/^\./, '');
  return ELIGIBLE_FIELDS.find((f) => f.pattern === pattern) ?? null;
}
