/**
 * Default values for the project file (`*.lamina.json`, schema "lamina/2") and a sensible
 * starting project. Together with `validate.ts` this is the one source of truth for the schema.
 *
 * REQUIRED (refused when missing — nothing important is guessed; every bound, with its reason,
 * is in `NUMBERS` in validate.ts):
 *   schema                         "lamina/2" ("lamina/1" is migrated first: `migrate.ts`)
 *   opening.type                   "beam" | "slab" | "cantilever" | "intersection"
 *   opening.span_m                 0.01–1000 m (intersection: the narrower entry width w1)
 *   opening.length_m               slab: long side ≥ span_m; intersection: the wider entry
 *                                  width w2 ≥ span_m; ≤ 100 000 m (ignored with a warning otherwise)
 *   opening.ends                   "clamped" | "simple" for a beam or a slab (for a cantilever it
 *                                  is ignored and defaults to "clamped"; for an intersection it
 *                                  defaults to "simple": pillar corners give little fixity)
 *   layers                         non-empty array, layers[0] = immediate roof
 *   layers[i].thickness_m          0.001–1000 m
 *   layers[i].unitWeight_kNm3      5..60 kN/m³
 *   layers[i].youngModulus_GPa     0.001–10 000 GPa
 *   layers[i].ucs_MPa              0.01–1000 MPa
 *   layers[i].tensile              a value_MPa (0–100; 0 = none) or at least one usable specimen
 *                                  (valid, thickness ≤ diameter)
 *
 * OPTIONAL (value used when the key is omitted):
 *   title                          "Untitled project"
 *   description                    omitted (stays absent)
 *   opening.edges                  slab only: null (every edge as `ends`), or
 *                                  { short, long }, each "clamped" | "simple" | "free"
 *   loads.surcharge_kPa            0
 *   loads.horizontalStress_MPa     0
 *   support.standing_kPa           0 (lamina/1: loads.support_kPa)
 *   layers[i].name                 "Layer 1", "Layer 2", … (1-based position)
 *   layers[i].modulusBasis         "mass"
 *   layers[i].poisson              0.25
 *   layers[i].rockClass            "sedimentary"
 *   layers[i].tensile.value_MPa    null (specimens then required)
 *   layers[i].tensile.method       "brazilian"
 *   layers[i].tensile.specimens    []
 *   specimen.id                    "S1", "S2", … (1-based position)
 *   specimen.valid                 true
 *   layers[i].jointing             crossJointSpacing_m null (no cross-joints seen),
 *                                  fractureFrequency_per_m null, rqd null,
 *                                  jointCondition 20 *, jointFriction_deg 30 *
 *   layers[i].hoekBrown.mi         by rock class *: sedimentary 7, igneous 25, metamorphic 12
 *   layers[i].hoekBrown.disturbance 0 (undisturbed, e.g. machine-cut or careful blasting)
 *   design.fsTarget                { tension: 2 on the "rockMass" basis, 4 on "lab";
 *                                    crushing: 2, sliding: 1.5 } (METHODS §10)
 *   design.deflectionLimitRatio    0.1 (Diederichs & Kaiser 1999)
 *   design.characteristic          "mean" ("lower5", "cautiousMean", "lower5Log": METHODS §6, §15)
 *   design.basis                   "intact"
 *   design.tensileBasis            "rockMass"
 *   design.crushingStrength        "rockMass" (Hoek–Brown σci·s^a; "lab": the UCS as given)
 *   design.planeStrainModulus      false
 *
 * * These defaults carry judgement, so the validator adds an "ASSUMED" warning whenever one is
 *   used: JCond89 = 20 is a mid-range joint condition (slightly rough, slightly weathered,
 *   tight joints; Bieniawski 1989 ratings, from memory); φ = 30° is a common conservative basic
 *   friction angle for planar sedimentary joints (common practice); the mi values are the
 *   lower middle of Hoek's tables (siltstone 7 ± 2, basalt 25 ± 5, schist 12 ± 3; Hoek 2007,
 *   from memory). Lamina scales the measured tensile strength by s·mi/mb, in which mi cancels,
 *   so mi matters only for the rock-mass compressive strength.
 */
import type { Design, Jointing, Layer, Loads, Project, RockClass, Support, Tensile, TensileBasis } from './types';

export const DEFAULT_TITLE = 'Untitled project';

export const DEFAULT_LOADS: Readonly<Loads> = Object.freeze({
  surcharge_kPa: 0,
  horizontalStress_MPa: 0,
});

/**
 * Tension target matched to the tensile basis (METHODS §10): 2 on a rock-mass strength (common
 * practice for rock-mass strengths in mine openings is 1.5–2; memory), 4 on the lab basis
 * (Obert & Duvall 1967, memory). FS 4 on a strength already scaled by Hoek–Brown would count
 * the lab-to-field gap twice.
 */
export const DEFAULT_TENSION_TARGET: Readonly<Record<TensileBasis, number>> = Object.freeze({ rockMass: 2, lab: 4 });

/** Targets other than tension (METHODS §10). */
export const DEFAULT_FS_TARGET = Object.freeze({ tension: DEFAULT_TENSION_TARGET.rockMass, crushing: 2, sliding: 1.5 });
export const DEFAULT_DEFLECTION_LIMIT_RATIO = 0.1;
export const DEFAULT_POISSON = 0.25;
export const DEFAULT_JOINT_CONDITION = 20;
export const DEFAULT_JOINT_FRICTION_DEG = 30;
export const DEFAULT_DISTURBANCE = 0;

/** Default Hoek–Brown mi per rock class (Hoek 2007 tables, from memory; see the block above). */
export const DEFAULT_MI: Readonly<Record<RockClass, number>> = Object.freeze({
  sedimentary: 7,
  igneous: 25,
  metamorphic: 12,
});

/** Name given to layer `index` (0-based) when the file gives none. */
export const defaultLayerName = (index: number): string => `Layer ${index + 1}`;

/** Id given to specimen `index` (0-based) when the file gives none. */
export const defaultSpecimenId = (index: number): string => `S${index + 1}`;

export function defaultDesign(): Design {
  return {
    fsTarget: { ...DEFAULT_FS_TARGET },
    deflectionLimitRatio: DEFAULT_DEFLECTION_LIMIT_RATIO,
    characteristic: 'mean',
    basis: 'intact',
    tensileBasis: 'rockMass',
    crushingStrength: 'rockMass',
    planeStrainModulus: false,
  };
}

export function defaultLoads(): Loads {
  return { ...DEFAULT_LOADS };
}

export function defaultSupport(): Support {
  return { standing_kPa: 0 };
}

export function defaultJointing(): Jointing {
  return {
    crossJointSpacing_m: null,
    fractureFrequency_per_m: null,
    rqd: null,
    jointCondition: DEFAULT_JOINT_CONDITION,
    jointFriction_deg: DEFAULT_JOINT_FRICTION_DEG,
  };
}

export function defaultTensile(): Tensile {
  return { value_MPa: null, method: 'brazilian', specimens: [] };
}

/**
 * A complete, valid layer: a 0.5 m sedimentary bed (shale-like) with a Brazilian tensile
 * strength of 3 MPa given as a value. Every field is filled.
 */
export function defaultLayer(): Layer {
  return {
    name: defaultLayerName(0),
    thickness_m: 0.5,
    unitWeight_kNm3: 25,
    youngModulus_GPa: 8,
    modulusBasis: 'mass',
    poisson: DEFAULT_POISSON,
    ucs_MPa: 40,
    rockClass: 'sedimentary',
    tensile: { value_MPa: 3, method: 'brazilian', specimens: [] },
    jointing: defaultJointing(),
    hoekBrown: { mi: DEFAULT_MI.sedimentary, disturbance: DEFAULT_DISTURBANCE },
  };
}

/** A complete, valid one-layer project: a long opening (beam) of 6 m span with clamped ends. */
export function defaultProject(): Project {
  return {
    schema: 'lamina/2',
    title: DEFAULT_TITLE,
    opening: { type: 'beam', span_m: 6, length_m: null, ends: 'clamped', edges: null },
    loads: defaultLoads(),
    support: defaultSupport(),
    layers: [defaultLayer()],
    design: defaultDesign(),
  };
}
