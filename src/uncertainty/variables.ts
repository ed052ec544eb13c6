/**
 * Uncertain input variables chosen by field path (METHODS §16): validation of the variable
 * specs against the eligible paths, the project's own values as default means, applying one
 * sample to a project, and the one-click default for a layer's Brazilian specimens.
 *
 * This file knows project paths but not the analysis: the caller passes a getter (the project
 * value at a path) and, to apply samples, the project itself; `withValueAt` copies only the
 * objects on each path, so applying a sample costs a few shallow copies.
 *
 * Each eligible field has physical bounds; a normal or lognormal is truncated to them (a
 * thickness, strength or modulus stays > 0; Poisson's ratio within [0, 0.5); the joint
 * condition within [0, 30]), and a uniform or triangular must lie inside them.
 * Sampling `layers[i].tensile.value_MPa` of a layer with specimens replaces the specimens by
 * the sampled value (taken as a Brazilian strength): the distribution then stands for the
 * strength, and the characteristic-value reduction of the specimens does not apply on top.
 */
import { parsePath, withValueAt, type PathKey } from '../model/project-path';
import { ELIGIBLE_FIELDS, eligibleField } from '../model/uncertain-fields';
import type { FieldIssue } from '../model/validate';
import type { Project, Specimen, UncertainVariable } from '../model/types';
import { reduceSpecimens } from '../strength/specimens';
import { summarise } from '../strength/statistics';
import { DISTRIBUTION_NAMES, makeDistribution, type Distribution, type DistributionName, type DistributionParams } from './distributions';

/** One uncertain input as written in the project file's `uncertainty.variables` (the model's type). */
export type VariableSpec = UncertainVariable;

export { ELIGIBLE_FIELDS, eligibleField, type EligibleField } from '../model/uncertain-fields';

/** A variable ready to sample. */
export interface Variable {
  path: string;
  keys: PathKey[];
  spec: VariableSpec;
  distribution: Distribution;
  /** the project's value at `path` */
  projectValue: number;
}

export type VariablesResult = { ok: true; variables: Variable[] } | { ok: false; errors: FieldIssue[] };

/**
 * Checks `specs` (the file's `uncertainty.variables`, untrusted) and builds their distributions.
 * `valueAt(path)` gives the project's number at a path (undefined when the field does not
 * exist, null when it is empty); it supplies the default mean and proves the path exists.
 * Every problem is listed with its field path under `prefix`:
 *     uncertainty.variables[2].cov: must be ≥ 0, got -0.1
 */
export function resolveVariables(
  specs: unknown,
  valueAt: (path: string) => number | null | undefined,
  prefix = 'uncertainty.variables',
): VariablesResult {
  const errors: FieldIssue[] = [];
  const fail = (path: string, message: string) => errors.push({ path, message: `${path}: ${message}` });
  if (!Array.isArray(specs)) {
    fail(prefix, `must be a list of variables, got ${JSON.stringify(specs)}`);
    return { ok: false, errors };
  }
  const variables: Variable[] = [];
  const seen = new Map<string, number>();
  specs.forEach((raw: unknown, index) => {
    const at = `${prefix}[${index}]`;
    if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
      fail(at, `must be an object { path, distribution, … }, got ${JSON.stringify(raw)}`);
      return;
    }
    const spec = raw as Record<string, unknown>;
    const known = new Set(['path', 'distribution', 'mean', 'cov', 'sd', 'min', 'max', 'mode']);
    for (const key of Object.keys(spec)) if (!known.has(key)) fail(`${at}.${key}`, `is not a variable field (expected ${[...known].join(', ')})`);
    const path = spec.path;
    if (typeof path !== 'string') {
      fail(`${at}.path`, `must be a field path such as "layers[0].thickness_m", got ${JSON.stringify(path)}`);
      return;
    }
    const eligible = eligibleField(path);
    if (eligible === null) {
      fail(`${at}.path`, `"${path}" cannot be sampled; eligible: ${ELIGIBLE_FIELDS.map((f) => f.pattern).join(', ')}`);
      return;
    }
    const normalised = parsePath(path).map((k) => (typeof k === 'number' ? `[${k}]` : `.${k}`)).join('').replace(/^\./, '');
    if (seen.has(normalised)) {
      fail(`${at}.path`, `"${path}" is already sampled by ${prefix}[${seen.get(normalised)}]`);
      return;
    }
    seen.set(normalised, index);
    const value = valueAt(normalised);
    if (value === undefined) {
      fail(`${at}.path`, `"${path}" does not exist in this project`);
      return;
    }
    if (!DISTRIBUTION_NAMES.includes(spec.distribution as DistributionName)) {
      fail(`${at}.distribution`, `must be one of ${DISTRIBUTION_NAMES.map((n) => `"${n}"`).join(', ')}, got ${JSON.stringify(spec.distribution)}`);
      return;
    }
    const name = spec.distribution as DistributionName;
    const numbers: Partial<Record<'mean' | 'cov' | 'sd' | 'min' | 'max' | 'mode', number>> = {};
    let bad = false;
    for (const key of ['mean', 'cov', 'sd', 'min', 'max', 'mode'] as const) {
      const v = spec[key];
      if (v === undefined || v === null) continue;
      if (typeof v !== 'number' || !Number.isFinite(v)) {
        fail(`${at}.${key}`, `must be a finite number, got ${JSON.stringify(v)}`);
        bad = true;
      } else numbers[key] = v;
    }
    if (bad) return;
    const explicitMean = numbers.mean !== undefined;
    const ranged = numbers.min !== undefined || numbers.max !== undefined;
    const needsMean = name === 'normal' || name === 'lognormal' || !ranged || (name === 'triangular' && numbers.mode === undefined);
    if (!explicitMean && needsMean && value === null) {
      fail(`${at}.mean`, `is needed: the project has no value at ${normalised}`);
      return;
    }
    const mean = numbers.mean ?? (value === null ? undefined : value);
    // physical range: truncation for normal/lognormal, containment for uniform/triangular
    const { lower, lowerOpen, upper, upperOpen } = eligible;
    const range = `${lowerOpen ? '(' : '['}${lower}, ${upper}${upperOpen ? ')' : ']'}`;
    const inside = (v: number) => (lowerOpen ? v > lower : v >= lower) && (upperOpen ? v < upper : v <= upper);
    if (mean !== undefined && !inside(mean)) {
      fail(`${at}.mean`, `must lie within ${range} for ${eligible.pattern}, got ${mean}`);
      return;
    }
    for (const key of ['min', 'max', 'mode'] as const) {
      const v = numbers[key];
      if (v === undefined) continue;
      const ok = name === 'normal' || name === 'lognormal' ? v >= lower && v <= upper : inside(v);
      if (!ok) fail(`${at}.${key}`, `must lie within ${range} for ${eligible.pattern}, got ${v}`);
    }
    if (errors.length) return;
    const params: DistributionParams = { distribution: name, mean, cov: numbers.cov, sd: numbers.sd, min: numbers.min, max: numbers.max, mode: numbers.mode };
    if (name === 'normal' || name === 'lognormal') {
      params.min = Math.max(numbers.min ?? -Infinity, lower);
      params.max = Math.min(numbers.max ?? Infinity, upper);
      if (!Number.isFinite(params.min)) delete params.min;
      if (!Number.isFinite(params.max)) delete params.max;
      if (name === 'lognormal' && params.min === 0) delete params.min;
    }
    const built = makeDistribution(params, at);
    if (!built.ok) {
      errors.push(...built.errors);
      return;
    }
    // a uniform or triangular built from a mean and a spread must still fit the physical range
    const dist = built.distribution;
    if ((name === 'uniform' || name === 'triangular') && !dist.constant && !(inside(dist.lower) && inside(dist.upper))) {
      fail(`${at}.${numbers.cov !== undefined ? 'cov' : 'sd'}`, `spreads the ${name} over [${dist.lower}, ${dist.upper}], outside ${range} for ${eligible.pattern}`);
      return;
    }
    variables.push({
      path: normalised, keys: parsePath(normalised),
      spec: { path: normalised, distribution: name, ...numbers }, distribution: dist,
      projectValue: value ?? (mean as number),
    });
  });
  return errors.length ? { ok: false, errors } : { ok: true, variables };
}

/** The number at `path` in a project-like object: undefined when absent, null when empty. */
export function projectValueAt(project: unknown): (path: string) => number | null | undefined {
  return (path) => {
    let node: unknown = project;
    for (const key of parsePath(path)) {
      if (node === null || typeof node !== 'object' || !Object.prototype.hasOwnProperty.call(node, key)) return undefined;
      node = (node as Record<PathKey, unknown>)[key];
    }
    return node === null ? null : typeof node === 'number' ? node : undefined;
  };
}

/**
 * A copy of `project` with sample `x` (x[j] for variables[j]) written at the variables' paths;
 * `project` is never changed. A sampled `layers[i].tensile.value_MPa` also empties that layer's
 * specimens and, when they were there, sets the method to "brazilian" (see the file doc).
 */
export function applySample<T>(project: T, variables: readonly Variable[], x: ArrayLike<number>): T {
  if (x.length !== variables.length) throw new RangeError(`the sample has ${x.length} values for ${variables.length} variables`);
  let out = project;
  for (let j = 0; j < variables.length; j++) {
    const { keys } = variables[j];
    out = withValueAt(out, keys, x[j]);
    if (keys.length === 4 && keys[0] === 'layers' && keys[2] === 'tensile' && keys[3] === 'value_MPa') {
      const list = (out as unknown as { layers: { tensile: { specimens?: unknown[] } }[] }).layers[keys[1] as number]?.tensile?.specimens;
      if (Array.isArray(list) && list.length > 0) {
        out = withValueAt(out, keys.slice(0, 3).concat('specimens'), []);
        out = withValueAt(out, keys.slice(0, 3).concat('method'), 'brazilian');
      }
    }
  }
  return out;
}

/** The minimum number of valid specimens for the one-click Brazilian variable (METHODS §16). */
export const MIN_SPECIMENS_FOR_VARIABLE = 3;

/**
 * The one-click variable for a layer's Brazilian tests: a lognormal on
 * `layers[i].tensile.value_MPa` with the mean and CoV of the accepted specimens' Brazilian
 * strengths 2P/(πDL) (src/strength: `reduceSpecimens`, `summarise`), when at least 3 are
 * accepted; otherwise null with the reason.
 *     brazilianVariable(project, 0) // { spec: { path: 'layers[0].tensile.value_MPa', distribution: 'lognormal', mean: 4.2, cov: 0.18 } }
 */
export function brazilianVariable(project: Pick<Project, 'layers'>, layerIndex: number): { spec: VariableSpec; n: number } | { spec: null; reason: string } {
  const layer = project.layers[layerIndex];
  if (!layer) return { spec: null, reason: `layers[${layerIndex}] does not exist` };
  const specimens: Specimen[] = layer.tensile.specimens ?? [];
  const reduction = reduceSpecimens(
    specimens.map((s) => ({ id: s.id, diameter: s.diameter_mm / 1000, thickness: s.thickness_mm / 1000, peakLoad: s.peakLoad_kN * 1000, valid: s.valid })),
  );
  const n = reduction.accepted.length;
  if (n < MIN_SPECIMENS_FOR_VARIABLE) {
    return { spec: null, reason: `layers[${layerIndex}] has ${n} accepted Brazilian specimen(s); a distribution needs at least ${MIN_SPECIMENS_FOR_VARIABLE}` };
  }
  const stats = summarise(reduction.accepted.map((a) => a.brazilian / 1e6));
  return { spec: { path: `layers[${layerIndex}].tensile.value_MPa`, distribution: 'lognormal', mean: stats.mean, cov: stats.cov }, n };
}
