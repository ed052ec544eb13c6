/**
 * Validation of a project (`*.lamina.json`, schema "lamina/2"; a "lamina/1" project is first
 * migrated by `migrate.ts` and gets a MIGRATED warning with the one-time notice) into the normalised in-memory
 * `Project` (every optional field filled; see `defaults.ts` for what is required and what
 * defaults). Every problem is collected, not just the first.
 *
 * Each issue's `message` starts with the field path, then says what was expected and what was
 * got: `layers[1].thickness_m: must be > 0 m, got -0.2`. Errors refuse the project; warnings
 * flag unknown keys (ignored), implausible but legal values, and judgement defaults.
 *
 * Limits (refused outside; the reasons are in the doc block of `NUMBERS` below): span
 * 0.01–1000 m; slab length and intersection entry width w2 0.01–100 000 m and ≥ span (a slab
 * longer than 20 spans is analysed as its plane-strain strip); slab edges not free on both pairs; thickness 0.001–1000 m; unit weight 5–60 kN/m³; E 0.001–10 000
 * GPa; Poisson 0 ≤ ν < 0.5; UCS 0.01–1000 MPa; tensile value 0–100 MPa (0 = no tensile
 * strength, e.g. a fractured mass: FS tension 0 wherever the layer is in net tension);
 * surcharge, standing support 0–100 000 kPa; horizontal stress −1000…1000 MPa (compression positive);
 * specimen diameter and thickness 1–1000 mm, peak load 0.001–10 000 kN; cross-joint spacing
 * 0.001–10 000 m or null; fracture frequency 0–1000 /m; JCond89 0–30; RQD 0–100; joint
 * friction 0 ≤ φ < 90°; mi 1–100; disturbance 0–1; FS targets 0.1–100; deflection limit ratio
 * 0.001–1; at most 100 layers and 1000 specimens per layer. The contract: every project
 * accepted here analyses without throwing and with finite numbers (`npm run fuzz` checks it).
 * Keys `__proto__`, `constructor` and `prototype` are refused anywhere in the input.
 * Numbers must be JSON numbers (no numeric strings) and finite.
 *
 *     validateProject(JSON.parse(text)) // { ok: true, project, warnings } | { ok: false, errors, warnings }
 */
import { numberText } from './number-format';
import {
  DEFAULT_DEFLECTION_LIMIT_RATIO,
  DEFAULT_DISTURBANCE,
  DEFAULT_FS_TARGET,
  DEFAULT_TENSION_TARGET,
  DEFAULT_JOINT_CONDITION,
  DEFAULT_JOINT_FRICTION_DEG,
  DEFAULT_MI,
  DEFAULT_POISSON,
  DEFAULT_TITLE,
  defaultLayerName,
  defaultSpecimenId,
} from './defaults';
import { migrateV1 } from './migrate';
import { ELIGIBLE_FIELDS, eligibleField } from './uncertain-fields';
import type {
  CharacteristicRule,
  CrushingStrength,
  DesignBasis,
  EdgeCondition,
  EndCondition,
  TensileBasis,
  Layer,
  ModulusBasis,
  OpeningType,
  Project,
  RockClass,
  Specimen,
  TensileMethod,
  SamplingMethodName,
  Uncertainty,
  UncertainVariable,
  VariableDistributionName,
} from './types';

export interface FieldIssue {
  /** Field path, e.g. `layers[1].thickness_m`; "" for the whole input. */
  path: string;
  /** Full text, starting with the path: `layers[1].thickness_m: must be > 0 m, got -0.2`. */
  message: string;
  code?: string;
}

export type ValidationResult =
  | { ok: true; project: Project; warnings: FieldIssue[]; migratedFrom?: 'lamina/1' }
  | { ok: false; errors: FieldIssue[]; warnings: FieldIssue[] };

/** Warning code of the one-time notice given when a lamina/1 project is migrated. */
export const MIGRATED_CODE = 'MIGRATED';

/** A refused project. `message` lists every issue, one per line. */
export class ProjectError extends Error {
  issues: FieldIssue[];
  constructor(issues: FieldIssue[]) {
    super(issues.map((issue) => issue.message).join('\n'));
    this.name = 'ProjectError';
    this.issues = issues;
  }
}

/** Validate and normalise; throws a `ProjectError` listing every error. */
export function parseProject(input: unknown): { project: Project; warnings: FieldIssue[]; migratedFrom?: 'lamina/1' } {
  const result = validateProject(input);
  if (!result.ok) throw new ProjectError(result.errors);
  return result.migratedFrom ? { project: result.project, warnings: result.warnings, migratedFrom: result.migratedFrom } : { project: result.project, warnings: result.warnings };
}

/** Keys the schema knows, per object (also the order the file is written in). */
export const SCHEMA_KEYS = {
  project: ['schema', 'title', 'description', 'opening', 'loads', 'support', 'layers', 'design', 'uncertainty'],
  opening: ['type', 'span_m', 'length_m', 'ends', 'edges'],
  edges: ['short', 'long'],
  loads: ['surcharge_kPa', 'horizontalStress_MPa'],
  support: ['standing_kPa'],
  layer: [
    'name', 'thickness_m', 'unitWeight_kNm3', 'youngModulus_GPa', 'modulusBasis', 'poisson',
    'ucs_MPa', 'rockClass', 'tensile', 'jointing', 'hoekBrown',
  ],
  tensile: ['value_MPa', 'method', 'specimens'],
  specimen: ['id', 'diameter_mm', 'thickness_mm', 'peakLoad_kN', 'valid'],
  jointing: ['crossJointSpacing_m', 'fractureFrequency_per_m', 'rqd', 'jointCondition', 'jointFriction_deg'],
  hoekBrown: ['mi', 'disturbance'],
  design: ['fsTarget', 'deflectionLimitRatio', 'characteristic', 'basis', 'tensileBasis', 'crushingStrength', 'planeStrainModulus'],
  fsTarget: ['tension', 'crushing', 'sliding'],
  uncertainty: ['samples', 'seed', 'method', 'acceptablePf', 'variables'],
  variable: ['path', 'distribution', 'mean', 'cov', 'sd', 'min', 'max', 'mode'],
} as const;

export const SAMPLING_METHOD_NAMES: readonly SamplingMethodName[] = ['monteCarlo', 'latinHypercube'];
export const VARIABLE_DISTRIBUTIONS: readonly VariableDistributionName[] = ['normal', 'lognormal', 'uniform', 'triangular'];
/** Bounds of `uncertainty.samples` (common practice: below 100 the interval is meaningless; 1e6 bounds the run time). */
export const MIN_SAMPLES = 100;
export const MAX_SAMPLES = 1_000_000;
export const MAX_VARIABLES = 100;

export const OPENING_TYPES: readonly OpeningType[] = ['beam', 'slab', 'cantilever', 'intersection'];
export const END_CONDITIONS: readonly EndCondition[] = ['clamped', 'simple'];
export const EDGE_CONDITIONS: readonly EdgeCondition[] = ['clamped', 'simple', 'free'];
export const TENSILE_BASES: readonly TensileBasis[] = ['rockMass', 'lab'];
export const CRUSHING_STRENGTHS: readonly CrushingStrength[] = ['rockMass', 'lab'];
export const MODULUS_BASES: readonly ModulusBasis[] = ['mass', 'intact'];
export const ROCK_CLASSES: readonly RockClass[] = ['sedimentary', 'igneous', 'metamorphic'];
export const TENSILE_METHODS: readonly TensileMethod[] = ['brazilian', 'direct'];
export const CHARACTERISTIC_RULES: readonly CharacteristicRule[] = ['mean', 'lower5', 'cautiousMean', 'lower5Log'];
export const DESIGN_BASES: readonly DesignBasis[] = ['intact', 'jointed'];

export const MAX_LAYERS = 100;
export const MAX_SPECIMENS = 1000;

const FORBIDDEN_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

type Raw = Record<string, unknown>;

export interface NumberRule {
  /** Unit suffix for messages, with its leading space where one is wanted (' m', '°', ''). */
  unit: string;
  min?: number;
  minOpen?: boolean;
  max?: number;
  maxOpen?: boolean;
}

type NumberOptions =
  | { required: true }
  | { default: number }
  | { nullable: true };

const isObject = (v: unknown): v is Raw => typeof v === 'object' && v !== null && !Array.isArray(v);

const own = (obj: Raw, key: string): unknown =>
  Object.prototype.hasOwnProperty.call(obj, key) ? obj[key] : undefined;

const child = (path: string, key: string): string => (path ? `${path}.${key}` : key);

/** How a received value is shown in a message. */
export function describeValue(v: unknown): string {
  if (v === undefined) return 'nothing';
  if (v === null) return 'null';
  if (typeof v === 'number') return Object.is(v, -0) ? '0' : String(v);
  if (typeof v === 'string') return JSON.stringify(v.length > 60 ? `${v.slice(0, 57)}...` : v);
  if (typeof v === 'boolean') return String(v);
  if (Array.isArray(v)) return 'an array';
  if (typeof v === 'object') return 'an object';
  return `a ${typeof v}`;
}

function describeRule(r: NumberRule): string {
  const lo = r.min !== undefined ? `${r.minOpen ? '>' : '≥'} ${r.min}${r.unit}` : '';
  const hi = r.max !== undefined ? `${r.maxOpen ? '<' : '≤'} ${r.max}${r.unit}` : '';
  if (r.min !== undefined && r.max !== undefined) {
    if (!r.minOpen && !r.maxOpen) return `from ${r.min} to ${r.max}${r.unit}`;
    return `${lo} and ${hi}`;
  }
  return lo || hi;
}

const inRange = (x: number, r: NumberRule): boolean =>
  (r.min === undefined || (r.minOpen ? x > r.min : x >= r.min)) &&
  (r.max === undefined || (r.maxOpen ? x < r.max : x <= r.max));

/** Collects issues while reading the raw input; reads own properties only. */
class Reader {
  readonly errors: FieldIssue[] = [];
  readonly warnings: FieldIssue[] = [];

  error(path: string, text: string, code: string): void {
    this.errors.push({ path, message: path ? `${path}: ${text}` : text, code });
  }

  warn(path: string, text: string, code: string): void {
    this.warnings.push({ path, message: path ? `${path}: ${text}` : text, code });
  }

  /** Warn about keys the schema does not know (forbidden keys are errors, found by `scanForbidden`). */
  unknownKeys(obj: Raw, allowed: readonly string[], path: string): void {
    for (const key of Object.keys(obj)) {
      if (!allowed.includes(key) && !FORBIDDEN_KEYS.has(key)) {
        this.warn(child(path, key), 'unknown key, ignored', 'UNKNOWN_KEY');
      }
    }
  }

  /**
   * An object-valued field. Missing: `{}` when optional (defaults then fill it), `undefined`
   * with an error when required. Wrong type: `undefined` with an error.
   */
  object(parent: Raw, key: string, path: string, required: string | false): Raw | undefined {
    const p = child(path, key);
    const v = own(parent, key);
    if (v === undefined) {
      if (required) {
        this.error(p, `required, ${required}`, 'REQUIRED');
        return undefined;
      }
      return {};
    }
    if (!isObject(v)) {
      this.error(p, `must be an object, got ${describeValue(v)}`, 'TYPE');
      return undefined;
    }
    return v;
  }

  number(parent: Raw, key: string, path: string, rule: NumberRule, opts: NumberOptions): number | null | undefined {
    const p = child(path, key);
    const v = own(parent, key);
    const desc = describeRule(rule);
    const wanted = desc ? `a number ${desc}` : `a number${rule.unit ? ` (${rule.unit.trim()})` : ''}`;
    const nullable = 'nullable' in opts;
    if (v === undefined) {
      if ('required' in opts) {
        this.error(p, `required, must be ${wanted}`, 'REQUIRED');
        return undefined;
      }
      return nullable ? null : opts.default;
    }
    if (v === null && nullable) return null;
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      this.error(p, `must be ${wanted}${nullable ? ' or null' : ''}, got ${describeValue(v)}`, 'TYPE');
      return undefined;
    }
    if (!inRange(v, rule)) {
      const closed = rule.min !== undefined && rule.max !== undefined && !rule.minOpen && !rule.maxOpen;
      this.error(p, `must be ${closed ? wanted : desc}, got ${describeValue(v)}`, 'RANGE');
      return undefined;
    }
    return v === 0 ? 0 : v; // normalise −0
  }

  enumeration<T extends string>(
    parent: Raw, key: string, path: string, values: readonly T[], fallback: T | undefined,
  ): T | undefined {
    const p = child(path, key);
    const v = own(parent, key);
    const list = values.map((x) => JSON.stringify(x)).join(', ');
    if (v === undefined) {
      if (fallback === undefined) this.error(p, `required, must be one of ${list}`, 'REQUIRED');
      return fallback;
    }
    if (typeof v !== 'string' || !(values as readonly string[]).includes(v)) {
      this.error(p, `must be one of ${list}, got ${describeValue(v)}`, 'ENUM');
      return undefined;
    }
    return v as T;
  }

  string(parent: Raw, key: string, path: string, fallback: string): string | undefined {
    const v = own(parent, key);
    if (v === undefined) return fallback;
    if (typeof v !== 'string') {
      this.error(child(path, key), `must be a string, got ${describeValue(v)}`, 'TYPE');
      return undefined;
    }
    return v;
  }

  boolean(parent: Raw, key: string, path: string, fallback: boolean): boolean | undefined {
    const v = own(parent, key);
    if (v === undefined) return fallback;
    if (typeof v !== 'boolean') {
      this.error(child(path, key), `must be true or false, got ${describeValue(v)}`, 'TYPE');
      return undefined;
    }
    return v;
  }

  /** An array-valued field; `undefined` with an error when it is not an array or too long. */
  array(parent: Raw, key: string, path: string, required: boolean, max: number): unknown[] | undefined {
    const p = child(path, key);
    const v = own(parent, key);
    if (v === undefined) {
      if (required) this.error(p, 'required, must be an array', 'REQUIRED');
      return required ? undefined : [];
    }
    if (!Array.isArray(v)) {
      this.error(p, `must be an array, got ${describeValue(v)}`, 'TYPE');
      return undefined;
    }
    if (v.length > max) {
      this.error(p, `must have at most ${max} entries, got ${v.length}`, 'RANGE');
      return undefined;
    }
    return v;
  }

  /** Warn when `value` (valid, in `unit`) lies outside the plausible [low, high]. */
  plausible(path: string, value: number | null | undefined, unit: string, low: number | null, high: number | null, why = ''): void {
    if (typeof value !== 'number') return;
    const tail = why ? `; ${why}` : '; check the value and its unit';
    if (low !== null && value < low) {
      this.warn(path, `${value}${unit} is implausibly low (below ${low}${unit})${tail}`, 'IMPLAUSIBLE');
    } else if (high !== null && value > high) {
      this.warn(path, `${value}${unit} is implausibly high (above ${high}${unit})${tail}`, 'IMPLAUSIBLE');
    }
  }

  assumed(parent: Raw, key: string, path: string, value: number, why: string): void {
    if (own(parent, key) === undefined) {
      this.warn(child(path, key), `not given; ${value} assumed (${why})`, 'ASSUMED');
    }
  }
}

/**
 * Refuse `__proto__`, `constructor`, `prototype` as own keys anywhere in the input. Iterative
 * (an explicit stack), so a 100,000-deep object is scanned like a flat one instead of
 * overflowing the call stack; a path is built only for a key that is refused.
 */
function scanForbidden(input: unknown, reader: Reader): void {
  interface Node { value: object; parent: Node | null; step: string }
  const pathOf = (node: Node | null, last: string): string => {
    const steps = [last];
    for (let n = node; n !== null && n.parent !== null; n = n.parent) steps.push(n.step);
    let path = '';
    for (let k = steps.length - 1; k >= 0; k--) path = steps[k].startsWith('[') ? `${path}${steps[k]}` : child(path, steps[k]);
    return path;
  };
  if (typeof input !== 'object' || input === null) return;
  const seen = new Set<object>([input]);
  const stack: Node[] = [{ value: input, parent: null, step: '' }];
  while (stack.length > 0) {
    const node = stack.pop()!;
    const isArray = Array.isArray(node.value);
    const children: Node[] = [];
    // own names only, so sparse arrays cost what they hold
    for (const key of Object.getOwnPropertyNames(node.value)) {
      if (isArray && key === 'length') continue;
      const step = isArray && /^\d+$/.test(key) ? `[${key}]` : key;
      if (FORBIDDEN_KEYS.has(key)) {
        reader.error(pathOf(node, step), `forbidden key ${JSON.stringify(key)}`, 'FORBIDDEN_KEY');
        continue;
      }
      const descriptor = Object.getOwnPropertyDescriptor(node.value, key);
      const v: unknown = descriptor && 'value' in descriptor ? descriptor.value : undefined;
      if (typeof v === 'object' && v !== null && !seen.has(v)) {
        seen.add(v);
        children.push({ value: v, parent: node, step });
      }
    }
    // reversed, so keys are visited (and errors listed) in document order
    for (let k = children.length - 1; k >= 0; k--) stack.push(children[k]);
  }
}

/**
 * Hard bounds of every number in a project file: the contract between the validator and the
 * kernels. Every value inside them analyses without throwing and gives finite results (the fuzz
 * harness, `npm run fuzz`, checks this on random projects over the whole of these ranges);
 * "implausible" warnings flag values inside them that are legal but unusual. The bounds are
 * physically meaningful and generous (common practice unless a source is named):
 * - span 0.01–1000 m: from a hand-sized gap to far beyond any roof; the span search stops at 100 m.
 * - slab length 0.01–100 000 m (and ≥ span): a slab longer than 20 spans is analysed as its
 *   plane-strain strip limit (METHODS §4, b/a → ∞).
 * - thickness 0.001–1000 m: a 1 mm lamina to a 1 km massive unit; a floor keeps q s²/t² finite.
 * - unit weight 5–60 kN/m³: light coal/evaporite ≈ 12 to dense ores ≈ 45, with margin.
 * - Young's modulus 0.001–10 000 GPa: 1 MPa (a soil) to ten times diamond's ≈ 1 000 GPa.
 * - Poisson's ratio 0 ≤ ν < 0.5: the thermodynamic range of an isotropic solid in bending.
 * - UCS 0.01–1000 MPa: 10 kPa (a stiff soil) to about three times the strongest rock (≈ 350 MPa).
 * - tensile value 0–100 MPa: 0 = no tensile strength (e.g. a fractured mass or an uncemented
 *   sand, METHODS §10); rock Brazilian strengths stay below ≈ 40 MPa.
 * - surcharge, support 0–100 000 kPa: 100 MPa is the vertical stress about 4 km down.
 * - horizontal stress −1000…1000 MPa (compression positive): a kilometre-scale margin over any
 *   measured in-situ stress (≲ 100 MPa).
 * - specimen diameter, thickness 1–1000 mm: from a mini-disc to a 1 m block; peak load
 *   0.001–10 000 kN: 1 N to far beyond any Brazilian test frame (≈ 500 kN).
 * - cross-joint spacing 0.001–10 000 m; fracture frequency 0–1000 /m (one per mm).
 * - RQD 0–100 %; JCond89 0–30 (Bieniawski 1989); joint friction 0 ≤ φ < 90°.
 * - Hoek–Brown mi 1–100 (Hoek's tables span ≈ 4–35); disturbance D 0–1 (Hoek et al. 2002).
 * - FS targets 0.1–100; deflection limit δ/t 0.001–1 (δ/t ≈ 0.25 is already ultimate).
 */
export const NUMBERS = {
  span: { unit: ' m', min: 0.01, max: 1000 },
  length: { unit: ' m', min: 0.01, max: 100_000 },
  pressure: { unit: ' kPa', min: 0, max: 100_000 },
  horizontalStress: { unit: ' MPa', min: -1000, max: 1000 },
  thickness: { unit: ' m', min: 0.001, max: 1000 },
  unitWeight: { unit: ' kN/m³', min: 5, max: 60 },
  modulus: { unit: ' GPa', min: 0.001, max: 10_000 },
  poisson: { unit: '', min: 0, max: 0.5, maxOpen: true },
  ucs: { unit: ' MPa', min: 0.01, max: 1000 },
  tensile: { unit: ' MPa', min: 0, max: 100 },
  specimenSize: { unit: ' mm', min: 1, max: 1000 },
  peakLoad: { unit: ' kN', min: 0.001, max: 10_000 },
  spacing: { unit: ' m', min: 0.001, max: 10_000 },
  frequency: { unit: ' /m', min: 0, max: 1000 },
  rqd: { unit: '', min: 0, max: 100 },
  jointCondition: { unit: '', min: 0, max: 30 },
  friction: { unit: '°', min: 0, max: 90, maxOpen: true },
  mi: { unit: '', min: 1, max: 100 },
  disturbance: { unit: '', min: 0, max: 1 },
  factor: { unit: '', min: 0.1, max: 100 },
  ratio: { unit: '', min: 0.001, max: 1 },
} as const satisfies Record<string, NumberRule>;

/**
 * Check a raw parsed project and build the normalised `Project`, collecting every error and
 * warning (see the module doc block for the limits).
 */
export function validateProject(input: unknown): ValidationResult {
  const r = new Reader();
  if (!isObject(input)) {
    r.error('', `a project must be a JSON object, got ${describeValue(input)}`, 'TYPE');
    return { ok: false, errors: r.errors, warnings: r.warnings };
  }
  scanForbidden(input, r);
  let migratedFrom: 'lamina/1' | undefined;
  if (own(input, 'schema') === 'lamina/1') {
    const migration = migrateV1(input);
    input = migration.project;
    migratedFrom = 'lamina/1';
    r.warn('schema', migration.notice, MIGRATED_CODE);
  }
  const raw = input as Raw;
  return finish(r, raw, migratedFrom);
}

function finish(r: Reader, input: Raw, migratedFrom: 'lamina/1' | undefined): ValidationResult {
  r.unknownKeys(input, SCHEMA_KEYS.project, '');

  const schema = own(input, 'schema');
  if (schema === undefined) r.error('schema', 'required, must be "lamina/2" (or "lamina/1", migrated on load)', 'REQUIRED');
  else if (schema !== 'lamina/2') r.error('schema', `must be "lamina/2" (or "lamina/1", migrated on load), got ${describeValue(schema)}`, 'SCHEMA');

  const title = r.string(input, 'title', '', DEFAULT_TITLE);
  const description = r.string(input, 'description', '', '');
  const opening = readOpening(r, input);
  const loads = readLoads(r, input);
  const support = readSupport(r, input);
  const layers = readLayers(r, input);
  const design = readDesign(r, input);
  const uncertainty = readUncertainty(r, input, layers);

  if (r.errors.length > 0 || uncertainty === undefined || !opening || !loads || !support || !layers || !design || title === undefined || description === undefined) {
    return { ok: false, errors: r.errors, warnings: r.warnings };
  }
  const project: Project = { schema: 'lamina/2', title, opening, loads, support, layers, design };
  if (own(input, 'uncertainty') !== undefined) project.uncertainty = uncertainty;
  const extra = migratedFrom ? { migratedFrom } : {};
  if (own(input, 'description') !== undefined) {
    // keep key order: description follows title
    const { schema: s, title: t, ...rest } = project;
    return { ok: true, project: { schema: s, title: t, description, ...rest }, warnings: r.warnings, ...extra };
  }
  return { ok: true, project, warnings: r.warnings, ...extra };
}

function readOpening(r: Reader, input: Raw): Project['opening'] | undefined {
  const path = 'opening';
  const o = r.object(input, 'opening', '', 'must be an object with type, span_m and ends');
  if (!o) return undefined;
  r.unknownKeys(o, SCHEMA_KEYS.opening, path);
  const type = r.enumeration(o, 'type', path, OPENING_TYPES, undefined);
  const span = r.number(o, 'span_m', path, NUMBERS.span, { required: true });
  const endsDefault = type === 'cantilever' ? 'clamped' : type === 'intersection' ? 'simple' : undefined;
  const ends = r.enumeration(o, 'ends', path, END_CONDITIONS, endsDefault);
  r.plausible(child(path, 'span_m'), span, ' m', null, 60);
  let length: number | null | undefined = null;
  if (type === 'slab' || type === 'intersection') {
    length = r.number(o, 'length_m', path, NUMBERS.length, { required: true });
    const what = type === 'slab' ? 'a slab' : 'an intersection (entry widths w1 ≤ w2)';
    if (typeof length === 'number' && typeof span === 'number' && length < span) {
      r.error(child(path, 'length_m'), `must be ≥ span_m (${span} m) for ${what}, got ${length}`, 'RANGE');
      length = undefined;
    }
  } else {
    const given = own(o, 'length_m');
    if (given !== undefined && given !== null) {
      const checked = r.number(o, 'length_m', path, NUMBERS.length, { nullable: true });
      if (checked !== undefined && type !== undefined) {
        r.warn(child(path, 'length_m'), `ignored for opening type "${type}" (used for a slab or an intersection only)`, 'IGNORED');
      }
    }
  }
  const edges = readEdges(r, o, path, type);
  if (type === undefined || typeof span !== 'number' || ends === undefined || length === undefined || edges === undefined) return undefined;
  return { type, span_m: span, length_m: type === 'slab' || type === 'intersection' ? length : null, ends, edges };
}

/** `opening.edges` (slab only): { short, long }, each clamped | simple | free; not free on both. */
function readEdges(r: Reader, opening: Raw, path: string, type: OpeningType | undefined): Project['opening']['edges'] | undefined {
  const given = own(opening, 'edges');
  if (given === undefined || given === null) return null;
  const p = child(path, 'edges');
  if (type !== 'slab') {
    if (type !== undefined) r.warn(p, `ignored for opening type "${type}" (used for a slab only)`, 'IGNORED');
    return null;
  }
  const o = r.object(opening, 'edges', path, false);
  if (!o) return undefined;
  r.unknownKeys(o, SCHEMA_KEYS.edges, p);
  const short = r.enumeration(o, 'short', p, EDGE_CONDITIONS, undefined);
  const long = r.enumeration(o, 'long', p, EDGE_CONDITIONS, undefined);
  if (short === undefined || long === undefined) return undefined;
  if (short === 'free' && long === 'free') {
    r.error(p, 'must support at least one edge pair (a slab free on all four edges has nothing to rest on), got short "free", long "free"', 'RANGE');
    return undefined;
  }
  return { short, long };
}

function readLoads(r: Reader, input: Raw): Project['loads'] | undefined {
  const path = 'loads';
  const o = r.object(input, 'loads', '', false);
  if (!o) return undefined;
  r.unknownKeys(o, SCHEMA_KEYS.loads, path);
  if (own(o, 'support_kPa') !== undefined) {
    r.warn(child(path, 'support_kPa'), 'not part of lamina/2, ignored: standing support is support.standing_kPa', 'MOVED');
  }
  const surcharge = r.number(o, 'surcharge_kPa', path, NUMBERS.pressure, { default: 0 });
  const sh = r.number(o, 'horizontalStress_MPa', path, NUMBERS.horizontalStress, { default: 0 });
  r.plausible(child(path, 'surcharge_kPa'), surcharge, ' kPa', null, 5000);
  if (typeof sh === 'number' && sh < 0) {
    r.warn(child(path, 'horizontalStress_MPa'),
      `${sh} MPa is a tensile in-situ horizontal stress (compression is positive); check the sign`, 'IMPLAUSIBLE');
  }
  r.plausible(child(path, 'horizontalStress_MPa'), sh, ' MPa', null, 100);
  if (typeof surcharge !== 'number' || typeof sh !== 'number') return undefined;
  return { surcharge_kPa: surcharge, horizontalStress_MPa: sh };
}

function readSupport(r: Reader, input: Raw): Project['support'] | undefined {
  const path = 'support';
  const o = r.object(input, 'support', '', false);
  if (!o) return undefined;
  r.unknownKeys(o, SCHEMA_KEYS.support, path);
  const standing = r.number(o, 'standing_kPa', path, NUMBERS.pressure, { default: 0 });
  r.plausible(child(path, 'standing_kPa'), standing, ' kPa', null, 500);
  if (typeof standing !== 'number') return undefined;
  return { standing_kPa: standing };
}

function readLayers(r: Reader, input: Raw): Layer[] | undefined {
  const list = r.array(input, 'layers', '', true, MAX_LAYERS);
  if (!list) return undefined;
  if (list.length === 0) {
    r.error('layers', 'must have at least one layer (layers[0] is the immediate roof), got an empty array', 'RANGE');
    return undefined;
  }
  const layers: Layer[] = [];
  let failed = false;
  for (let i = 0; i < list.length; i++) {
    const layer = readLayer(r, list[i], i);
    if (layer) layers.push(layer);
    else failed = true;
  }
  const seen = new Map<string, number>();
  layers.forEach((layer, i) => {
    const first = seen.get(layer.name);
    if (first !== undefined) {
      r.warn(`layers[${i}].name`, `same name as layers[${first}] (${JSON.stringify(layer.name)}); results are hard to tell apart`, 'DUPLICATE_NAME');
    } else seen.set(layer.name, i);
  });
  return failed ? undefined : layers;
}

function readLayer(r: Reader, raw: unknown, i: number): Layer | undefined {
  const path = `layers[${i}]`;
  if (!isObject(raw)) {
    r.error(path, `must be an object (a layer), got ${describeValue(raw)}`, 'TYPE');
    return undefined;
  }
  r.unknownKeys(raw, SCHEMA_KEYS.layer, path);
  const name = r.string(raw, 'name', path, defaultLayerName(i));
  if (name === '') r.warn(child(path, 'name'), 'empty name', 'EMPTY_NAME');
  const thickness = r.number(raw, 'thickness_m', path, NUMBERS.thickness, { required: true });
  const unitWeight = r.number(raw, 'unitWeight_kNm3', path, NUMBERS.unitWeight, { required: true });
  const modulus = r.number(raw, 'youngModulus_GPa', path, NUMBERS.modulus, { required: true });
  const modulusBasis = r.enumeration(raw, 'modulusBasis', path, MODULUS_BASES, 'mass');
  const poisson = r.number(raw, 'poisson', path, NUMBERS.poisson, { default: DEFAULT_POISSON });
  const ucs = r.number(raw, 'ucs_MPa', path, NUMBERS.ucs, { required: true });
  const rockClass = r.enumeration(raw, 'rockClass', path, ROCK_CLASSES, 'sedimentary');

  r.plausible(child(path, 'thickness_m'), thickness, ' m', 0.02, 20);
  r.plausible(child(path, 'youngModulus_GPa'), modulus, ' GPa', 0.1, 150);
  r.plausible(child(path, 'ucs_MPa'), ucs, ' MPa', 1, 400);

  const tensile = readTensile(r, raw, path, typeof ucs === 'number' ? ucs : undefined);
  const jointing = readJointing(r, raw, path);
  const hoekBrown = readHoekBrown(r, raw, path, rockClass ?? 'sedimentary');

  if (
    name === undefined || typeof thickness !== 'number' || typeof unitWeight !== 'number' ||
    typeof modulus !== 'number' || modulusBasis === undefined || typeof poisson !== 'number' ||
    typeof ucs !== 'number' || rockClass === undefined || !tensile || !jointing || !hoekBrown
  ) return undefined;
  return {
    name, thickness_m: thickness, unitWeight_kNm3: unitWeight, youngModulus_GPa: modulus, modulusBasis,
    poisson, ucs_MPa: ucs, rockClass, tensile, jointing, hoekBrown,
  };
}

function readTensile(r: Reader, layer: Raw, layerPath: string, ucs: number | undefined): Layer['tensile'] | undefined {
  const path = child(layerPath, 'tensile');
  const o = r.object(layer, 'tensile', layerPath, 'give value_MPa or specimens');
  if (!o) return undefined;
  const before = r.errors.length;
  r.unknownKeys(o, SCHEMA_KEYS.tensile, path);
  const value = r.number(o, 'value_MPa', path, NUMBERS.tensile, { nullable: true });
  const method = r.enumeration(o, 'method', path, TENSILE_METHODS, 'brazilian');
  const list = r.array(o, 'specimens', path, false, MAX_SPECIMENS);
  const specimens: Specimen[] = [];
  let failed = list === undefined;
  const ids = new Map<string, number>();
  (list ?? []).forEach((raw, k) => {
    const s = readSpecimen(r, raw, `${path}.specimens[${k}]`, k);
    if (!s) { failed = true; return; }
    const first = ids.get(s.id);
    if (first !== undefined) r.warn(`${path}.specimens[${k}].id`, `same id as specimens[${first}] (${JSON.stringify(s.id)})`, 'DUPLICATE_ID');
    else ids.set(s.id, k);
    specimens.push(s);
  });

  if (typeof value === 'number' && value > 0) {
    if (value > 50) r.plausible(child(path, 'value_MPa'), value, ' MPa', null, 50);
    else if (ucs !== undefined && value > ucs / 3) {
      r.warn(child(path, 'value_MPa'),
        `${value} MPa is implausibly high against ucs_MPa ${ucs} (above ucs/3 = ${numberText(ucs / 3)} MPa); check the value and its unit`,
        'IMPLAUSIBLE');
    }
  }
  const usable = specimens.filter((s) => s.valid && s.thickness_mm <= s.diameter_mm);
  if (r.errors.length === before) {
    if (value === null && usable.length === 0) {
      r.error(path,
        specimens.length === 0
          ? 'needs value_MPa or at least one specimen, got neither'
          : `needs value_MPa or at least one specimen marked valid with thickness_mm ≤ diameter_mm, got none of ${specimens.length}`,
        'NO_TENSILE');
    } else if (typeof value === 'number' && usable.length > 0) {
      r.warn(child(path, 'value_MPa'),
        `ignored: the ${usable.length} usable specimen${usable.length > 1 ? 's' : ''} give the tensile strength`, 'SPECIMENS_WIN');
    }
  }
  if (failed || value === undefined || method === undefined) return undefined;
  return { value_MPa: value, method, specimens };
}

function readSpecimen(r: Reader, raw: unknown, path: string, k: number): Specimen | undefined {
  if (!isObject(raw)) {
    r.error(path, `must be an object (a specimen), got ${describeValue(raw)}`, 'TYPE');
    return undefined;
  }
  r.unknownKeys(raw, SCHEMA_KEYS.specimen, path);
  const id = r.string(raw, 'id', path, defaultSpecimenId(k));
  const diameter = r.number(raw, 'diameter_mm', path, NUMBERS.specimenSize, { required: true });
  const thickness = r.number(raw, 'thickness_mm', path, NUMBERS.specimenSize, { required: true });
  const load = r.number(raw, 'peakLoad_kN', path, NUMBERS.peakLoad, { required: true });
  const valid = r.boolean(raw, 'valid', path, true);
  r.plausible(child(path, 'diameter_mm'), diameter, ' mm', 10, 300);
  if (typeof diameter === 'number' && typeof thickness === 'number' && typeof load === 'number') {
    // Brazilian σt = 2P/(πDL) (ISRM 1978); kN and mm give 2000·P/(π·D·L) in MPa.
    const sigma = (2000 * load) / (Math.PI * diameter * thickness);
    if (sigma > 50) {
      r.warn(child(path, 'peakLoad_kN'),
        `gives a Brazilian strength of ${numberText(sigma)} MPa, implausibly high (above 50 MPa); check the load is in kN and the sizes in mm`,
        'IMPLAUSIBLE');
    }
  }
  if (id === undefined || typeof diameter !== 'number' || typeof thickness !== 'number' || typeof load !== 'number' || valid === undefined) {
    return undefined;
  }
  return { id, diameter_mm: diameter, thickness_mm: thickness, peakLoad_kN: load, valid };
}

function readJointing(r: Reader, layer: Raw, layerPath: string): Layer['jointing'] | undefined {
  const path = child(layerPath, 'jointing');
  const o = r.object(layer, 'jointing', layerPath, false);
  if (!o) return undefined;
  r.unknownKeys(o, SCHEMA_KEYS.jointing, path);
  const spacing = r.number(o, 'crossJointSpacing_m', path, NUMBERS.spacing, { nullable: true });
  const frequency = r.number(o, 'fractureFrequency_per_m', path, NUMBERS.frequency, { nullable: true });
  const rqd = r.number(o, 'rqd', path, NUMBERS.rqd, { nullable: true });
  const jc = r.number(o, 'jointCondition', path, NUMBERS.jointCondition, { default: DEFAULT_JOINT_CONDITION });
  const friction = r.number(o, 'jointFriction_deg', path, NUMBERS.friction, { default: DEFAULT_JOINT_FRICTION_DEG });
  r.assumed(o, 'jointCondition', path, DEFAULT_JOINT_CONDITION, 'JCond89 mid-range default; give the logged rating');
  r.assumed(o, 'jointFriction_deg', path, DEFAULT_JOINT_FRICTION_DEG, 'degrees, a conservative default for planar joints');
  r.plausible(child(path, 'fractureFrequency_per_m'), frequency, ' /m', null, 50);
  r.plausible(child(path, 'crossJointSpacing_m'), spacing, ' m', 0.01, null);
  r.plausible(child(path, 'jointFriction_deg'), friction, '°', 10, 60);
  if (spacing === undefined || frequency === undefined || rqd === undefined || typeof jc !== 'number' || typeof friction !== 'number') {
    return undefined;
  }
  return { crossJointSpacing_m: spacing, fractureFrequency_per_m: frequency, rqd, jointCondition: jc, jointFriction_deg: friction };
}

function readHoekBrown(r: Reader, layer: Raw, layerPath: string, rockClass: RockClass): Layer['hoekBrown'] | undefined {
  const path = child(layerPath, 'hoekBrown');
  const o = r.object(layer, 'hoekBrown', layerPath, false);
  if (!o) return undefined;
  r.unknownKeys(o, SCHEMA_KEYS.hoekBrown, path);
  const miDefault = DEFAULT_MI[rockClass];
  const mi = r.number(o, 'mi', path, NUMBERS.mi, { default: miDefault });
  const d = r.number(o, 'disturbance', path, NUMBERS.disturbance, { default: DEFAULT_DISTURBANCE });
  r.assumed(o, 'mi', path, miDefault, `default for ${rockClass} rock`);
  r.plausible(child(path, 'mi'), mi, '', 2, 40, 'Hoek–Brown mi of intact rock usually lies between 4 and 35');
  if (typeof mi !== 'number' || typeof d !== 'number') return undefined;
  return { mi, disturbance: d };
}

function readDesign(r: Reader, input: Raw): Project['design'] | undefined {
  const path = 'design';
  const o = r.object(input, 'design', '', false);
  if (!o) return undefined;
  r.unknownKeys(o, SCHEMA_KEYS.design, path);
  const tensileBasis = r.enumeration(o, 'tensileBasis', path, TENSILE_BASES, 'rockMass');
  const crushingStrength = r.enumeration(o, 'crushingStrength', path, CRUSHING_STRENGTHS, 'rockMass');
  const fsPath = child(path, 'fsTarget');
  const fs = r.object(o, 'fsTarget', path, false);
  let fsTarget: Project['design']['fsTarget'] | undefined;
  if (fs) {
    r.unknownKeys(fs, SCHEMA_KEYS.fsTarget, fsPath);
    // A file that omits the tension target gets the default of its tensile basis (METHODS §10).
    const tension = r.number(fs, 'tension', fsPath, NUMBERS.factor, { default: DEFAULT_TENSION_TARGET[tensileBasis ?? 'rockMass'] });
    const crushing = r.number(fs, 'crushing', fsPath, NUMBERS.factor, { default: DEFAULT_FS_TARGET.crushing });
    const sliding = r.number(fs, 'sliding', fsPath, NUMBERS.factor, { default: DEFAULT_FS_TARGET.sliding });
    for (const [key, value] of [['tension', tension], ['crushing', crushing], ['sliding', sliding]] as const) {
      if (typeof value === 'number' && value < 1) {
        r.warn(child(fsPath, key), `${value} is below 1: the target accepts failure`, 'IMPLAUSIBLE');
      }
    }
    if (typeof tension === 'number' && typeof crushing === 'number' && typeof sliding === 'number') {
      fsTarget = { tension, crushing, sliding };
    }
  }
  const ratio = r.number(o, 'deflectionLimitRatio', path, NUMBERS.ratio, { default: DEFAULT_DEFLECTION_LIMIT_RATIO });
  r.plausible(child(path, 'deflectionLimitRatio'), ratio, '', null, 0.25,
    'δ/t ≈ 0.25 is already the ultimate deflection (Diederichs & Kaiser 1999)');
  const characteristic = r.enumeration(o, 'characteristic', path, CHARACTERISTIC_RULES, 'mean');
  const basis = r.enumeration(o, 'basis', path, DESIGN_BASES, 'intact');
  const planeStrain = r.boolean(o, 'planeStrainModulus', path, false);
  if (
    !fsTarget || typeof ratio !== 'number' || characteristic === undefined || basis === undefined || planeStrain === undefined ||
    tensileBasis === undefined || crushingStrength === undefined
  ) {
    return undefined;
  }
  return { fsTarget, deflectionLimitRatio: ratio, characteristic, basis, tensileBasis, crushingStrength, planeStrainModulus: planeStrain };
}

/**
 * The `uncertainty` block (METHODS §16): null, or sampling settings and variables. Each
 * variable names an eligible field (model/uncertain-fields.ts) that exists in this project;
 * cov and sd ≥ 0, min < max. The distributions themselves are built, with the remaining
 * checks (a spread that fits the physical range), by uncertainty/variables.ts.
 */
function readUncertainty(r: Reader, input: Raw, layers: Layer[] | undefined): Uncertainty | null | undefined {
  const path = 'uncertainty';
  const v = own(input, 'uncertainty');
  if (v === undefined || v === null) return null;
  const o = r.object(input, 'uncertainty', '', 'must be null or an object { samples, seed, method, acceptablePf, variables }');
  if (!o) return undefined;
  r.unknownKeys(o, SCHEMA_KEYS.uncertainty, path);
  const samples = r.number(o, 'samples', path, { unit: '', min: MIN_SAMPLES, max: MAX_SAMPLES }, { default: 20000 });
  if (typeof samples === 'number' && !Number.isInteger(samples)) r.error(child(path, 'samples'), `must be a whole number, got ${samples}`, 'TYPE');
  const seed = r.number(o, 'seed', path, { unit: '', min: 0, max: 2 ** 31 - 1 }, { default: 1 });
  if (typeof seed === 'number' && !Number.isInteger(seed)) r.error(child(path, 'seed'), `must be a whole number, got ${seed}`, 'TYPE');
  const method = r.enumeration(o, 'method', path, SAMPLING_METHOD_NAMES, 'latinHypercube');
  const acceptablePf = r.number(o, 'acceptablePf', path, { unit: '', min: 0, minOpen: true, max: 1, maxOpen: true }, { nullable: true });
  const list = r.array(o, 'variables', path, false, MAX_VARIABLES) ?? [];
  const variables: UncertainVariable[] = [];
  list.forEach((raw, j) => {
    const at = `${path}.variables[${j}]`;
    if (!isObject(raw)) {
      r.error(at, `must be an object { path, distribution, mean, cov | sd, min, max }, got ${describeValue(raw)}`, 'TYPE');
      return;
    }
    r.unknownKeys(raw, SCHEMA_KEYS.variable, at);
    const fieldPath = own(raw, 'path');
    const eligible = typeof fieldPath === 'string' ? eligibleField(fieldPath) : null;
    if (typeof fieldPath !== 'string') r.error(child(at, 'path'), `required, must be a field path such as "layers[0].thickness_m", got ${describeValue(fieldPath)}`, 'TYPE');
    else if (eligible === null) r.error(child(at, 'path'), `"${fieldPath}" cannot be sampled; eligible: ${ELIGIBLE_FIELDS.map((f) => f.pattern).join(', ')}`, 'PATH');
    else {
      const index = /^layers\[(\d+)\]/.exec(fieldPath);
      if (index && layers && Number(index[1]) >= layers.length) r.error(child(at, 'path'), `"${fieldPath}" does not exist: the project has ${layers.length} layer(s)`, 'PATH');
      if (eligible.pattern === 'loads.support_kPa') r.error(child(at, 'path'), `"${fieldPath}" is the lamina/1 name: use "support.standing_kPa"`, 'PATH');
    }
    const distribution = r.enumeration(raw, 'distribution', at, VARIABLE_DISTRIBUTIONS, undefined);
    const numbers: Partial<Record<'mean' | 'cov' | 'sd' | 'min' | 'max' | 'mode', number>> = {};
    for (const key of ['mean', 'cov', 'sd', 'min', 'max', 'mode'] as const) {
      const rule: NumberRule = key === 'cov' || key === 'sd' ? { unit: '', min: 0 } : { unit: '' };
      const n = r.number(raw, key, at, rule, { nullable: true });
      if (typeof n === 'number') numbers[key] = n;
    }
    if (numbers.min !== undefined && numbers.max !== undefined && !(numbers.min < numbers.max)) {
      r.error(child(at, 'max'), `must be greater than min (${numbers.min}), got ${numbers.max}`, 'RANGE');
    }
    if (typeof fieldPath === 'string' && distribution !== undefined) variables.push({ path: fieldPath, distribution, ...numbers });
  });
  if (typeof samples !== 'number' || typeof seed !== 'number' || method === undefined || acceptablePf === undefined) return undefined;
  return { samples, seed, method, acceptablePf, variables };
}
