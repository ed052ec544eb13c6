/**
 * The project file (`*.lamina.json`, schema "lamina/2"; "lamina/1" files are migrated on load,
 * see `migrate.ts`) and the analysis report ("lamina-report/2"): the public contract set out in
 * DESIGN.md. Units are in the key names
 * (practical SI: m, kPa, MPa, GPa, kN/m³, mm, kN). Kernels work in SI base units; conversion
 * happens in `src/model` and `src/analysis` only.
 */

export type OpeningType = 'beam' | 'slab' | 'cantilever' | 'intersection';
export type EndCondition = 'clamped' | 'simple';
/** Support of one pair of slab edges (METHODS §14). */
export type EdgeCondition = 'clamped' | 'simple' | 'free';
export type ModulusBasis = 'mass' | 'intact';
export type RockClass = 'sedimentary' | 'igneous' | 'metamorphic';
export type TensileMethod = 'brazilian' | 'direct';
export type CharacteristicRule = 'mean' | 'lower5' | 'cautiousMean' | 'lower5Log';
export type DesignBasis = 'intact' | 'jointed';
/** Tensile strength the tension check uses (METHODS §10): the rock mass, or the lab value with the size effect. */
export type TensileBasis = 'rockMass' | 'lab';
/** Compressive strength of the voussoir crushing check (METHODS §3a). */
export type CrushingStrength = 'rockMass' | 'lab';

/** Slab edge pairs: `short` = the two short edges, `long` = the two long edges. */
export interface SlabEdges {
  short: EdgeCondition;
  long: EdgeCondition;
}

export interface Opening {
  type: OpeningType;
  /**
   * Clear span; short side for a slab; overhang length for a cantilever; the narrower entry
   * width w1 for an intersection.
   */
  span_m: number;
  /** Slab: the long side (≥ span_m). Intersection: the wider entry width w2 (≥ span_m). `null` otherwise. */
  length_m: number | null;
  /** Beam ends / slab edges; ignored for a cantilever; default "simple" for an intersection. */
  ends: EndCondition;
  /** Slab only, optional: the support of each edge pair; `null` = every edge as `ends`. */
  edges: SlabEdges | null;
}

export interface Loads {
  surcharge_kPa: number;
  /** In-situ horizontal stress along the span, compression positive. */
  horizontalStress_MPa: number;
}

/** How a bolt pattern is credited (METHODS §12). */
export type BoltAction = 'suspension' | 'beamBuilding';

/** A square or rectangular pattern of rock bolts (METHODS §12). */
export interface BoltPattern {
  /** Bolt length above the roof line, m; the tip is at this height. */
  length_m: number;
  /** Tensile capacity of one bolt, kN. */
  capacity_kN: number;
  spacingAcross_m: number;
  spacingAlong_m: number;
  /** Anchorage length at the tip, m (default 0.3, common practice). */
  anchorage_m: number;
  action: BoltAction;
  /** Shear capacity of one bolt, kN (default 0.6 × capacity: steel shears at fy/√3). */
  shearCapacity_kN: number;
  /** Pretension of one bolt, kN (default 0). */
  pretension_kN: number;
}

/** Support installed in the opening (METHODS §12). */
export interface Support {
  /** Standing support (props, cribs) pushing up on the immediate roof; capped at the load it relieves. */
  standing_kPa: number;
  /** Rock bolts, or null for none. */
  bolts: BoltPattern | null;
}

/** The Q-system ratings of the empirical cross-check (Barton, Lien & Lunde 1974); RQD from the immediate roof. */
export interface QRatings {
  jn: number;
  jr: number;
  ja: number;
  jw: number;
  srf: number;
  /** Excavation support ratio. */
  esr: number;
}

/** Optional empirical cross-check (never counted; METHODS §12). */
export interface Empirical {
  q: QRatings | null;
}

export interface Specimen {
  id: string;
  diameter_mm: number;
  thickness_mm: number;
  peakLoad_kN: number;
  /** True when the specimen broke along a central diametral fracture. */
  valid: boolean;
}

export interface Tensile {
  /** A tensile strength given directly; `null` when only specimens are given. */
  value_MPa: number | null;
  method: TensileMethod;
  specimens: Specimen[];
}

export interface Jointing {
  /** Mean spacing of joints that cut the layer across the span; `null` = none seen. */
  crossJointSpacing_m: number | null;
  fractureFrequency_per_m: number | null;
  rqd: number | null;
  /** JCond89 rating, 0..30. */
  jointCondition: number;
  jointFriction_deg: number;
}

export interface HoekBrownInput {
  mi: number;
  disturbance: number;
}

export interface Layer {
  name: string;
  thickness_m: number;
  unitWeight_kNm3: number;
  youngModulus_GPa: number;
  modulusBasis: ModulusBasis;
  poisson: number;
  ucs_MPa: number;
  rockClass: RockClass;
  tensile: Tensile;
  jointing: Jointing;
  hoekBrown: HoekBrownInput;
}

export interface FsTargets {
  tension: number;
  crushing: number;
  sliding: number;
  /** Bolts: FS per bolt and FS of the interlayer shear (default 1.5, common practice). */
  bolt: number;
}

export interface Design {
  fsTarget: FsTargets;
  /** Voussoir midspan deflection / thickness limit. */
  deflectionLimitRatio: number;
  characteristic: CharacteristicRule;
  basis: DesignBasis;
  tensileBasis: TensileBasis;
  crushingStrength: CrushingStrength;
  /**
   * Labelled option (Obert & Duvall): use the plane-strain modulus E/(1−ν²) in the beam
   * deflection and Euler stress. Off by default.
   */
  planeStrainModulus: boolean;
}

/** Sampling of the uncertainty run (METHODS §16). */
export type SamplingMethodName = 'monteCarlo' | 'latinHypercube';
export type VariableDistributionName = 'normal' | 'lognormal' | 'uniform' | 'triangular';

/** One uncertain input: a field path and its distribution; the mean defaults to the project's value. */
export interface UncertainVariable {
  path: string;
  distribution: VariableDistributionName;
  /** default: the project's value at `path` */
  mean?: number;
  /** coefficient of variation sd/|mean| (give this or `sd`) */
  cov?: number;
  sd?: number;
  /** lower end: the range of a uniform or triangular, a truncation bound of a normal or lognormal */
  min?: number;
  /** upper end, as `min` */
  max?: number;
  /** triangular only: the most likely value (default 3·mean − min − max) */
  mode?: number;
}

/** The file's `uncertainty` block (DESIGN "Contract changes in v2"). */
export interface Uncertainty {
  /** 100 … 1 000 000, default 20 000 */
  samples: number;
  /** whole number 0 … 2³¹ − 1, default 1 */
  seed: number;
  /** default "latinHypercube" */
  method: SamplingMethodName;
  /** null, or a probability in (0, 1): adds a counted `probability` row */
  acceptablePf: number | null;
  variables: UncertainVariable[];
}

export interface Project {
  schema: 'lamina/2';
  title: string;
  description?: string;
  opening: Opening;
  loads: Loads;
  support: Support;
  /** Empirical cross-check inputs (never counted). */
  empirical: Empirical;
  /** layers[0] is the immediate roof; then upward. */
  layers: Layer[];
  design: Design;
  /** Optional: null or absent = no uncertainty run. */
  uncertainty?: Uncertainty | null;
}

// ---------------------------------------------------------------- report

export interface Warning {
  code: string;
  /** Field path in the project (`layers[0].tensile.specimens[2]`) or report, or "" for global. */
  path: string;
  message: string;
  /** "error" for an error-level warning (e.g. σh ≥ Euler stress); default "warning". */
  level?: 'warning' | 'error';
}

export interface StrengthReport {
  lab_MPa: number;
  direct_MPa: number;
  characteristic_MPa: number;
  block_MPa: number;
  mass_MPa: number;
  design_MPa: number;
  rqd: number;
  gsi: number;
  crossJointed: boolean;
}

export interface ElasticReport {
  abutmentTension_MPa: number;
  /** null for a cantilever. */
  midspanTension_MPa: number | null;
  maxTension_MPa: number;
  at: 'abutment' | 'midspan' | 'root';
  deflection_mm: number;
  /** null where there is no net tension or the layer is cross-jointed. */
  fsTension: number | null;
  bucklingStress_MPa: number;
}

export interface VoussoirReport {
  n: number | null;
  leverArm_m: number | null;
  maxCompression_MPa: number | null;
  deflection_mm: number | null;
  deflectionRatio: number | null;
  fsCrushing: number | null;
  fsSliding: number | null;
  snapThrough: boolean;
}

export interface PlateReport {
  maxTension_MPa: number;
  at: string;
  deflection_mm: number;
  beta: number;
  alpha: number;
}

export interface LayerReport {
  name: string;
  thickness_m: number;
  group: number;
  load_kPa: number;
  strength: StrengthReport;
  elastic: ElasticReport;
  voussoir: VoussoirReport | null;
  plate: PlateReport | null;
}

export type Mode = 'tension' | 'crushing' | 'sliding' | 'snapThrough' | 'deflection';

/** Modes of the support rows (METHODS §12): FS per bolt, a hanging layer between bolts, an interface of a bonded set. */
export type SupportMode = 'bolt' | 'skin' | 'interlayerShear';

/**
 * The mode of the one row of the whole roof (METHODS §16): the probability of failure of an
 * uncertainty run against the file's `uncertainty.acceptablePf`. It counts but never governs.
 */
export type RoofMode = 'probabilityOfFailure';

/** Every mode a check-table row can have. */
export type CheckMode = Mode | SupportMode | RoofMode;

/** How a check stands: meets/below its target (counted), info (computed, not counted), n/a. */
export type CheckStatusKind = 'meets' | 'below' | 'info' | 'na';

/**
 * One row of the check table (METHODS §10, DESIGN "Contract changes in v2"): every check of
 * every layer. `counts` says whether it takes part in the verdict; `reason` says why not.
 */
export interface CheckRow {
  /** The layer's index; null for the row of the whole roof (the probability of failure). */
  layerIndex: number | null;
  /** The layer's name; "whole roof" for the probability-of-failure row. */
  layer: string;
  mode: CheckMode;
  /**
   * MPa for tension and crushing, δ/t for deflection, kN per bolt, kPa interlayer shear, a
   * probability for the P_f row (the 95 % interval's upper end against the acceptable P_f);
   * null where the check has no demand figure.
   */
  demand: number | null;
  capacity: number | null;
  unit: 'MPa' | 'ratio' | 'kN' | 'kPa' | 'probability' | null;
  /**
   * null where the check does not apply. Snap-through: 1 stands, 0 snaps. Deflection: limit/(δ/t).
   * P_f row: acceptable P_f / the interval's upper end (capped at 1e6), against a target of 1.
   */
  fs: number | null;
  target: number;
  counts: boolean;
  /** Why the row does not count (a short phrase); null when it counts. */
  reason: string | null;
  status: CheckStatusKind;
  /** How to read the numbers (what the demand and capacity are). */
  note: string;
}

export interface Governing {
  layerIndex: number;
  layer: string;
  mode: CheckMode;
  fs: number;
  target: number;
}

/** The opening as analysed (v2): for an intersection the design span is the diagonal (METHODS §14). */
export interface OpeningReport {
  type: OpeningType;
  span_m: number;
  designSpan_m: number;
  basis: 'span' | 'diagonal';
}

export interface MaxSpanReport {
  tension: number | null;
  crushing: number | null;
  sliding: number | null;
  snapThrough: number | null;
  deflection: number | null;
  governing: number | null;
}

/**
 * One step of the calculation trace. `formula` is a mathjs expression over the symbols in
 * `values`; evaluating it with those values (in the units given) reproduces `result`.
 */
export interface TraceEntry {
  /** Report field path the entry explains, e.g. `layers[0].elastic.maxTension_MPa`. */
  path: string;
  label: string;
  formula: string;
  values: Record<string, { value: number; unit: string }>;
  result: number;
  unit: string;
  source: string;
  note?: string;
  /** The steps of an iterative search or test behind the result (n search, lever arm, bending groups). */
  steps?: TraceSteps;
}

/**
 * The recorded steps of an iteration behind a trace entry, as the kernel did them: one row per
 * step, each value in the column's unit (null where it does not exist, e.g. no lever arm at a
 * trial n). `curve` is a function of the search variable for a chart (fc against n).
 */
export interface TraceSteps {
  caption: string;
  /** Column symbol (as in the formulas), heading and unit ('' for a pure number). */
  columns: Array<{ symbol: string; label: string; unit: string }>;
  rows: Array<Array<number | null>>;
  /** A word per row: the stage of the search or the decision ("scan", "refine", "joins"). */
  stage: string[];
  /** Row of the result (the minimum, the converged value). */
  marked: number | null;
  /** Points [x, y] of the searched function (y null where it does not exist), in the units of the first two numeric columns. */
  curve?: Array<[number, number | null]>;
}

/** The bolt pattern's results (METHODS §12; DESIGN "Contract changes in v2"). */
export interface BoltsReport {
  /** Load per bolt, kN (suspension; 0 when nothing hangs or no anchorage is credited). */
  load_kN: number;
  /** Capacity / load; null when no load hangs from the bolts. */
  fsBolt: number | null;
  /** The layer holding the anchorage zone; null when the zone straddles an interface. */
  anchorLayer: number | null;
  /** The layers hanging from the bolts (suspension). */
  suspended: number[];
  /** Beam building: whether the bonded bound is credited and the least interface FS; null otherwise. */
  composite: { credited: boolean; fsShear: number | null } | null;
}

/** The support that would make every counted check meet its target (METHODS §12). */
export interface SupportNeededReport {
  /** Smallest standing support pressure, kPa; null when none suffices. */
  standing_kPa: number | null;
  /** Largest square bolt spacing (given length, capacity and action), m; null when none suffices. */
  boltSpacing_m: number | null;
  /** Shortest bolt length (given spacing, capacity and action), m; null when none suffices. */
  boltLength_m: number | null;
  /** Largest span with the support as given, m (entered span units). */
  maxSpan_m: number | null;
  /** Why a search found nothing (one sentence), or why none is needed. */
  reasons: string[];
}

export interface SupportReport {
  bolts: BoltsReport | null;
  /** null with `neededReason` "no support needed" where the roof already meets every target. */
  needed: SupportNeededReport | null;
  neededReason: string | null;
}

/** The Q-system cross-check (never counted). */
export interface EmpiricalReport {
  q: number;
  unsupportedSpan_m: number;
  boltLength_m: number;
  note: string;
}

export interface Report {
  schema: 'lamina-report/2';
  opening: OpeningReport;
  layers: LayerReport[];
  /** The one check table: every check of every layer. */
  checks: CheckRow[];
  governing: Governing | null;
  maxSpan_m: MaxSpanReport | null;
  /** Support results; null where the project has no bolts and no standing support. */
  support: SupportReport | null;
  /** Empirical cross-check; null without `empirical.q`. */
  empirical: EmpiricalReport | null;
  warnings: Warning[];
  trace: TraceEntry[];
  /** The uncertainty run (METHODS §16), when the file asks for one and the caller ran it. */
  uncertainty?: UncertaintyReport | null;
}

/** One sampled input as the report shows it. */
export interface UncertaintyInput {
  path: string;
  distribution: VariableDistributionName;
  mean: number;
  sd: number;
  /** ends of the support (null when open) */
  lower: number | null;
  upper: number | null;
}

/** The report's `uncertainty` block (DESIGN "Contract changes in v2"). */
export interface UncertaintyReport {
  method: SamplingMethodName;
  seed: number;
  samples: number;
  evaluated: number;
  inputs: UncertaintyInput[];
  /** P(some counted check has FS < 1) */
  pf: number;
  /** 95 %: Wilson, or the rule of three with no failure */
  pfInterval: [number, number];
  intervalMethod: 'wilson' | 'ruleOfThree';
  /** √((1 − P_f)/(N P_f)); null with no failure */
  pfCov: number | null;
  /** −Φ⁻¹(P_f); null at P_f 0 or 1 (see betaNote) */
  beta: number | null;
  betaNote: string | null;
  byMode: Partial<Record<Mode, number>>;
  byModeInterval: Partial<Record<Mode, [number, number]>>;
  pBelowTarget: number;
  sensitivity: { path: string; rankCorrelation: number | null }[];
  histogram: { bins: { x0: number; x1: number; count: number }[]; above: number; total: number };
  governingFs: { min: number | null; mean: number | null; max: number | null };
  /** the deterministic governing check, on which FORM runs */
  governing: Governing | null;
  form: { beta: number | null; pf: number | null; converged: boolean; iterations: number; note: string | null; designPoint: { path: string; value: number }[] } | null;
  /** P_f at points of the span curve (entry span, m), each with `samplesPerSpan` samples and the same seed */
  pfVersusSpan: { span_m: number; pf: number; pfInterval: [number, number]; beta: number | null }[];
  samplesPerSpan: number;
  /** slab: the measured error of the plate interpolation, null when none is used */
  plateInterpolation: { maxRelativeError: number; nodes: { aspect: number; poisson: number } } | null;
  acceptablePf: number | null;
  /** P_f ≤ acceptablePf judged by the interval's upper end; null without acceptablePf */
  meetsAcceptablePf: boolean | null;
}
