/**
 * A blank project to start from: one layer and Lamina's defaults (`defaults.ts`), with every
 * default stated, so that nothing is taken on trust. The values split in two:
 *
 *   placeholder  site data Lamina cannot know (span, thickness, unit weight, modulus, UCS,
 *                tensile strength, rock class): the user must replace each one;
 *   default      a published or common-practice value (loads of zero, Poisson's ratio, joint
 *                condition and friction, Hoek–Brown mi and D, the FS targets, the deflection
 *                limit): the user must check that it fits the site.
 *
 * The project's description says it is a new project with placeholder values, so the app (and
 * any report printed from it) shows this until the user replaces the description.
 * `pendingDefaults` lists the values that still hold their default.
 */
import type { Project } from './types';
import type { Quantity } from './units';
import {
  DEFAULT_DEFLECTION_LIMIT_RATIO,
  DEFAULT_DISTURBANCE,
  DEFAULT_FS_TARGET,
  DEFAULT_JOINT_CONDITION,
  DEFAULT_JOINT_FRICTION_DEG,
  DEFAULT_MI,
  DEFAULT_POISSON,
  defaultProject,
} from './defaults';

export const NEW_PROJECT_TITLE = 'New project';

/** The description a new project starts with; while it is there, the defaults are listed. */
export const NEW_PROJECT_DESCRIPTION =
  'New project: every value is a Lamina default or placeholder. Replace the placeholders with your own data and check each default before relying on any result.';

export interface StartingValue {
  /** Project path of the field, e.g. `layers[0].thickness_m`. */
  path: string;
  label: string;
  /** The value a new project starts with (in the file unit of `quantity`). */
  value: number | string | null;
  quantity: Quantity | null;
  /** Unit text when there is no quantity ("°", "" for a ratio). */
  unit: string;
  kind: 'placeholder' | 'default';
  /** Why this value: what it stands for, or its source. */
  why: string;
  get: (p: Project) => number | string | null | undefined;
}

const L0 = (p: Project) => p.layers[0];

export const STARTING_VALUES: readonly StartingValue[] = [
  { path: 'opening.type', label: 'Opening', value: 'beam', quantity: null, unit: '', kind: 'placeholder', why: 'a long opening (plane-strain beam); choose slab or overhang if that is the case', get: (p) => p.opening.type },
  { path: 'opening.span_m', label: 'Span', value: 6, quantity: 'length', unit: '', kind: 'placeholder', why: 'a typical room width, not yours', get: (p) => p.opening.span_m },
  { path: 'opening.ends', label: 'Ends', value: 'clamped', quantity: null, unit: '', kind: 'placeholder', why: 'built-in ends; use simple supports where the abutments may rotate', get: (p) => p.opening.ends },
  { path: 'layers[0].thickness_m', label: 'Layer 1 thickness', value: 0.5, quantity: 'length', unit: '', kind: 'placeholder', why: 'a generic bed; take it from the core log', get: (p) => L0(p)?.thickness_m },
  { path: 'layers[0].unitWeight_kNm3', label: 'Layer 1 unit weight', value: 25, quantity: 'unitWeight', unit: '', kind: 'placeholder', why: 'a typical rock; measure or take from the log', get: (p) => L0(p)?.unitWeight_kNm3 },
  { path: 'layers[0].youngModulus_GPa', label: 'Layer 1 Young’s modulus', value: 8, quantity: 'modulus', unit: '', kind: 'placeholder', why: 'a shale-like rock mass value', get: (p) => L0(p)?.youngModulus_GPa },
  { path: 'layers[0].ucs_MPa', label: 'Layer 1 UCS', value: 40, quantity: 'stress', unit: '', kind: 'placeholder', why: 'a medium-strong sedimentary rock', get: (p) => L0(p)?.ucs_MPa },
  { path: 'layers[0].tensile.value_MPa', label: 'Layer 1 tensile strength (Brazilian)', value: 3, quantity: 'stress', unit: '', kind: 'placeholder', why: 'a generic value; enter your Brazilian tests in 3 Lab tests', get: (p) => L0(p)?.tensile.value_MPa },
  { path: 'layers[0].rockClass', label: 'Layer 1 rock class', value: 'sedimentary', quantity: null, unit: '', kind: 'placeholder', why: 'sets the Brazilian-to-direct factor and the default mi', get: (p) => L0(p)?.rockClass },
  { path: 'loads.surcharge_kPa', label: 'Surcharge', value: 0, quantity: 'pressure', unit: '', kind: 'default', why: 'no load above the layers entered', get: (p) => p.loads.surcharge_kPa },
  { path: 'support.standing_kPa', label: 'Standing support pressure', value: 0, quantity: 'pressure', unit: '', kind: 'default', why: 'no props, cribs or other standing support', get: (p) => p.support.standing_kPa },
  { path: 'loads.horizontalStress_MPa', label: 'Horizontal stress', value: 0, quantity: 'stress', unit: '', kind: 'default', why: 'none assumed (conservative for the voussoir, not for buckling)', get: (p) => p.loads.horizontalStress_MPa },
  { path: 'layers[0].poisson', label: 'Layer 1 Poisson’s ratio', value: DEFAULT_POISSON, quantity: null, unit: '', kind: 'default', why: 'common practice for sedimentary rock', get: (p) => L0(p)?.poisson },
  { path: 'layers[0].jointing.jointCondition', label: 'Layer 1 joint condition JCond89', value: DEFAULT_JOINT_CONDITION, quantity: null, unit: '', kind: 'default', why: 'mid-range rating (Bieniawski 1989, from memory)', get: (p) => L0(p)?.jointing.jointCondition },
  { path: 'layers[0].jointing.jointFriction_deg', label: 'Layer 1 joint friction angle', value: DEFAULT_JOINT_FRICTION_DEG, quantity: null, unit: '°', kind: 'default', why: 'common conservative basic friction angle', get: (p) => L0(p)?.jointing.jointFriction_deg },
  { path: 'layers[0].hoekBrown.mi', label: 'Layer 1 Hoek–Brown mi', value: DEFAULT_MI.sedimentary, quantity: null, unit: '', kind: 'default', why: 'lower middle of Hoek’s table for sedimentary rock (from memory)', get: (p) => L0(p)?.hoekBrown.mi },
  { path: 'layers[0].hoekBrown.disturbance', label: 'Layer 1 disturbance D', value: DEFAULT_DISTURBANCE, quantity: null, unit: '', kind: 'default', why: 'undisturbed (machine-cut or careful blasting)', get: (p) => L0(p)?.hoekBrown.disturbance },
  { path: 'design.fsTarget.tension', label: 'FS target, tension', value: DEFAULT_FS_TARGET.tension, quantity: null, unit: '', kind: 'default', why: 'METHODS §10: 2 on the rock-mass tensile basis (4 on the lab basis); your ground-control plan may set another', get: (p) => p.design.fsTarget.tension },
  { path: 'design.fsTarget.crushing', label: 'FS target, crushing', value: DEFAULT_FS_TARGET.crushing, quantity: null, unit: '', kind: 'default', why: 'METHODS §10', get: (p) => p.design.fsTarget.crushing },
  { path: 'design.fsTarget.sliding', label: 'FS target, sliding', value: DEFAULT_FS_TARGET.sliding, quantity: null, unit: '', kind: 'default', why: 'METHODS §10', get: (p) => p.design.fsTarget.sliding },
  { path: 'design.deflectionLimitRatio', label: 'Deflection limit δ/t', value: DEFAULT_DEFLECTION_LIMIT_RATIO, quantity: null, unit: '', kind: 'default', why: 'Diederichs & Kaiser (1999)', get: (p) => p.design.deflectionLimitRatio },
];

/** A blank one-layer project with the defaults, titled and described as a new project. */
export function newProject(): Project {
  const p = defaultProject();
  return { ...p, title: NEW_PROJECT_TITLE, description: NEW_PROJECT_DESCRIPTION };
}

/** True while the project still carries the new-project description. */
export const isNewProject = (project: Project): boolean => project.description === NEW_PROJECT_DESCRIPTION;

/** The starting values the project still holds (all of them at first; none once replaced). */
export function pendingDefaults(project: Project): StartingValue[] {
  return STARTING_VALUES.filter((v) => v.get(project) === v.value);
}
