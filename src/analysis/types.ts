/**
 * What the analysis layer hands to the report, the CLI and the app besides the public
 * `Report` (DESIGN.md): per-layer details for charts and tables, the FS-versus-span curve,
 * beam profiles and design-chart grids. Values are in practical units with the unit in the
 * key name, like the report.
 */
import type { Mode, Report } from '../model/types';

export interface SpecimenDetail {
  index: number;
  id: string;
  diameter_mm: number;
  thickness_mm: number;
  peakLoad_kN: number;
  /** Brazilian tensile strength 2P/(πDL). */
  brazilian_MPa: number;
  /** Direct tensile strength = factor × Brazilian. */
  direct_MPa: number;
  accepted: boolean;
  /** Why the specimen was not used, when `accepted` is false. */
  reason: string | null;
  /** Warning messages for this specimen (L/D, diameter). */
  warnings: string[];
}

export interface LabDetail {
  source: 'specimens' | 'value';
  method: 'brazilian' | 'direct';
  directFactor: number;
  specimens: SpecimenDetail[];
  n: number;
  mean_MPa: number | null;
  sd_MPa: number | null;
  cov: number | null;
  kn: number | null;
  characteristic_MPa: number;
  rule: 'mean' | 'lower5' | 'cautiousMean' | 'lower5Log';
}

/** One step of the strength chain, for the step chart and the report. */
export interface StrengthStep {
  key: 'lab' | 'direct' | 'characteristic' | 'block' | 'mass' | 'design';
  label: string;
  value_MPa: number;
  /** Why this step reduces (or keeps) the value, in one sentence. */
  reason: string;
  source: string;
}

export interface LayerDetail {
  lab: LabDetail;
  steps: StrengthStep[];
  /** Modulus in the elastic beam and layering (after modulusBasis and the plane-strain option). */
  modulusUsed_GPa: number;
  /** Rock-mass modulus (after modulusBasis), used by the voussoir and the plate. */
  modulusMass_GPa: number;
  /** Effective unit weight γ' = q/t used by the voussoir. */
  effectiveUnitWeight_kNm3: number;
  hoekBrown: { mb: number; s: number; a: number; massUcs_MPa: number };
  blockSize: { dLab_mm: number; dEffRaw_mm: number; dEff_mm: number; clamped: boolean; factor: number };
  /** Intermediate voussoir quantities at equilibrium; null for a cantilever, an unloaded layer or after snap-through. */
  voussoirSteps: { initialLeverArm_m: number; arcLength_m: number; averageStress_MPa: number; shortening_mm: number } | null;
  /** The fracture frequency actually used for RQD (given, or 1/cross-joint spacing); null when RQD was given or none. */
  fractureFrequency_per_m: number | null;
}

export interface GroupDetail {
  first: number;
  last: number;
  /** Σ γ t of the group's layers. */
  weight_kPa: number;
  /** Σ E t³ of the group's layers. */
  stiffness_GPam3: number;
  /** Surcharge (top group) minus the standing support applied (group 0, capped at the load it relieves). */
  extra_kPa: number;
}

/** One test of the bending-group formation (METHODS §2): does `layer` join the group whose lowest layer is `first`? */
export interface GroupingDetail {
  layer: number;
  first: number;
  /** Load on the lowest layer without it, kPa (self-weights only). */
  without_kPa: number;
  /** Load on the lowest layer with it, kPa. */
  with_kPa: number;
  joins: boolean;
}

export interface Analysis {
  report: Report;
  layers: LayerDetail[];
  groups: GroupDetail[];
  /** The group-formation tests, in order (empty for one layer). */
  grouping: GroupingDetail[];
  /** Index pairs [below, above] of adjacent layers predicted to separate (different groups). */
  separations: Array<[number, number]>;
}

/** Governing FS per mode (least over the layers) at a series of spans. */
export interface SpanCurve {
  spans_m: number[];
  /** null where the mode does not apply at that span (or at all). snapThrough: 1 stands, 0 snaps. */
  fs: Record<Mode, (number | null)[]>;
  /** Targets on the same scale as `fs` (deflection and snapThrough: 1). */
  targets: Record<Mode, number>;
  /** Whether the mode counts (in some layer) at the current span, from the check table. */
  counts: Record<Mode, boolean>;
  /** The entered span (entry width w1 for an intersection; `spans_m` are on the same scale). */
  currentSpan_m: number;
  /**
   * Where the project has support (bolts or standing support): the governing FS/target (least
   * over every counted check of the one check table, support rows included) at `spans_m`, with
   * the support as given and without it (no bolts, no standing support); null where nothing
   * counts. Absent or null without support.
   */
  support?: SupportCurve | null;
}

/** The governing FS/target against span with and without the project's support (METHODS §12 with §11). */
export interface SupportCurve {
  spans_m: number[];
  withSupport: (number | null)[];
  unsupported: (number | null)[];
}

/** Stress and deflection along the span of one layer (elastic beam). */
export interface BeamProfile {
  layer: number;
  x_m: number[];
  /** Net tension (tension positive) on the top and bottom fibres. */
  topTension_MPa: number[];
  bottomTension_MPa: number[];
  /** Downward deflection. */
  deflection_mm: number[];
}

/** FS per mode of one layer on a grid of spans × thicknesses. */
export interface DesignChart {
  layer: number;
  spans_m: number[];
  thicknesses_m: number[];
  /** fs[mode][thicknessIndex][spanIndex]; null where the mode does not apply. */
  fs: Record<Mode, (number | null)[][]>;
  targets: Record<Mode, number>;
  /** Whether the mode counts for this layer at the project's span and thickness (check table). */
  counts: Record<Mode, boolean>;
  /**
   * Where the project has support: at some thicknesses of this layer, the largest span in the
   * chart's range at which every counted check of the whole check table meets its target, with
   * the support as given and without it (null: none in the range passes; the top of the range
   * where all of it passes). Absent or null without support.
   */
  support?: DesignSupportCurve | null;
}

/** Largest passing span against the layer's thickness, with and without the project's support. */
export interface DesignSupportCurve {
  thicknesses_m: number[];
  withSupport_m: (number | null)[];
  unsupported_m: (number | null)[];
}

/** Bending-stress field over a slab (for contour plots). */
export interface SlabField {
  layer: number;
  /** Coordinates along the long side (x, 0..length) and the short side (y, 0..span). */
  x_m: number[];
  y_m: number[];
  /** Row-major, y outer: stress_MPa[j * x_m.length + i]. Largest principal bending tension. */
  stress_MPa: number[];
  maxTension_MPa: number;
  at: string;
}
