/**
 * The fast per-sample path of an uncertainty run (METHODS §16): the analysis' `evaluate` at one
 * span and the check table's counting rules, with no trace, span search or report.
 *
 * The project is validated and turned into SI once. A working copy of the SI project (its
 * layers copied once) receives each sample's values directly, in SI, at the fields the file
 * paths name (`layers[0].thickness_m` → `layers[0].thickness`, kN/m³ → N/m³, …), so no sample
 * copies, validates or converts the whole project. Each sample then runs `evaluate` and
 * `checkTable` — the same functions `analyse` uses, so a sample at the project's own values
 * gives the deterministic FS bit for bit — and reduces the counted rows to:
 * - `modeFs[m]`: the smallest FS of mode `MODES[m]` over the counted checks (null: none counts);
 * - `governingFs`: the smallest FS over the counted checks that can govern (`canGovern`: not a
 *   standing arch's snap-through row, FS 1, which would pin every standing sample at 1); the
 *   sample fails when it is < 1; Infinity when nothing counts, e.g. no net load;
 * - `targetRatio`: the smallest FS/target over the same checks (< 1: below target).
 *
 * Sampling `layers[i].tensile.value_MPa` on a layer with specimens empties the specimens of
 * the working copy and takes the value as a Brazilian strength: the distribution stands for the
 * strength the specimens estimate, and their characteristic reduction (METHODS §15) does not
 * apply on top (it would count the same scatter twice). `uncertainty/variables.ts`
 * `applySample` does the same on a file-unit project.
 *
 * Without bolts, the per-sample path builds no rows: it runs `evaluate`'s parts (`chainFor`,
 * `moduliFor`, `layerLoads`, `layerState`) and, per layer, the check table's own rules
 * (`layerCondition`, `countedModes`, `layerRowFs`, `rowCounts`, `targetFor`), decided at each
 * sample's values (cracked or not, block, …) exactly as `checkTable` decides them. Two things
 * are skipped because they cannot change a counted number: a layer's strength chain is reused
 * while none of its chain inputs is sampled and the span is the same (unit weight, modulus,
 * ν and joint friction do not enter the chain), and the voussoir is not solved for a layer
 * whose voussoir rows do not count at this sample. With bolts, `evaluate` and `checkTable`
 * run in full (the support rows change which rows count).
 *
 * A slab whose span or Poisson's ratio is sampled takes its plate coefficients from an
 * interpolation over aspect ratio and ν (sample-plates.ts) built once, over the `bounds` the
 * caller gives; its measured error is `plateInterpolation.maxRelativeError`.
 */
import type { Mode, Project } from '../model/types';
import type { StrengthChain } from '../strength/chain';
import { MODES, VOUSSOIR_MODES } from './check-labels';
import { canGovern, checkTable, countedModes, layerCondition, layerRowFs, rowCounts, targetFor } from './check-table';
import { beamEnds, chainFor, evaluate, layerLoads, layerState, moduliFor, STRIP_ASPECT } from './evaluate';
import { intersectionDiagonal, projectToSI, type LayerSI, type ProjectSI } from './inputs';
import { platesForSampling, type SamplingPlates } from './sample-plates';

export interface SampleFs {
  /** per mode in `MODES` order; reused between calls: read it before the next call */
  modeFs: (number | null)[];
  governingFs: number;
  targetRatio: number;
}

/** A sampled field: its file path and the range its values can take (for the plate grid). */
export interface SampledField {
  path: string;
  lower: number;
  upper: number;
}

export interface SampleEvaluator {
  modes: readonly Mode[];
  /** The checks at sample `values` (file units, one per field), at `span` (m, default: the project's). */
  evaluate(values: ArrayLike<number>, span?: number): SampleFs;
  /** null unless a slab's plate coefficients are interpolated. */
  plateInterpolation: { maxRelativeError: number; nodes: { aspect: number; poisson: number } } | null;
}

type Writer = (p: ProjectSI, value: number) => void;

const LAYER_FIELD = /^layers\[(\d+)\]\.(.+)$/;

/** Layer fields that do not enter the layer's strength chain (`chainFor`): sampling them keeps the chain. */
const NOT_IN_CHAIN = new Set(['unitWeight_kNm3', 'youngModulus_GPa', 'poisson', 'jointing.jointFriction_deg']);

/** How one file path is written into the SI working copy. Throws on a path it does not know. */
function writerFor(path: string, base: ProjectSI, project: Project): Writer {
  const m = LAYER_FIELD.exec(path);
  if (m) {
    const i = Number(m[1]);
    if (!(i < base.layers.length)) throw new RangeError(`${path}: the project has ${base.layers.length} layer(s)`);
    const layer = (p: ProjectSI): LayerSI => p.layers[i];
    switch (m[2]) {
      case 'thickness_m': return (p, v) => { layer(p).thickness = v; };
      case 'unitWeight_kNm3': return (p, v) => { layer(p).unitWeight = v * 1e3; };
      case 'youngModulus_GPa': return (p, v) => { layer(p).modulus = v * 1e9; };
      case 'poisson': return (p, v) => { layer(p).poisson = v; };
      case 'ucs_MPa': return (p, v) => { layer(p).ucs = v * 1e6; };
      case 'tensile.value_MPa': {
        const hadSpecimens = base.layers[i].specimens.length > 0;
        return (p, v) => {
          const l = layer(p);
          l.tensileValue = v * 1e6;
          if (hadSpecimens) {
            l.specimens = [];
            l.tensileMethod = 'brazilian';
          }
        };
      }
      case 'jointing.fractureFrequency_per_m': return (p, v) => { layer(p).fractureFrequency = v; };
      case 'jointing.jointCondition': return (p, v) => { layer(p).jointCondition = v; };
      case 'jointing.crossJointSpacing_m': return (p, v) => { layer(p).crossJointSpacing = v; };
      case 'jointing.jointFriction_deg': return (p, v) => { layer(p).jointFriction = v; };
    }
  }
  switch (path) {
    case 'opening.span_m': {
      // Intersection: the design span is the diagonal with the other entry width held (METHODS
      // §14), or √2 × the sampled width when the file gives no second width (as projectToSI).
      if (project.opening.type === 'intersection') {
        const w2 = project.opening.length_m;
        return (p, v) => {
          p.entrySpan = v;
          p.span = intersectionDiagonal(v, w2 ?? v);
          p.spanScale = p.span / v;
        };
      }
      return (p, v) => {
        p.entrySpan = v;
        p.span = v;
        p.spanScale = 1;
      };
    }
    case 'loads.surcharge_kPa': return (p, v) => { p.surcharge = v * 1e3; };
    case 'loads.horizontalStress_MPa': return (p, v) => { p.horizontalStress = v * 1e6; };
    case 'support.standing_kPa': return (p, v) => { p.support = v * 1e3; };
  }
  throw new RangeError(`${path} cannot be sampled by the analysis`);
}

/** The plate interpolation a slab needs when its span or a layer's ν is sampled with a spread. */
function samplingPlates(base: ProjectSI, fields: readonly SampledField[]): SamplingPlates | null {
  if (base.type !== 'slab' || base.length === null) return null;
  const varies = (f: SampledField) => f.upper > f.lower;
  const span = fields.find((f) => f.path === 'opening.span_m' && varies(f));
  const poissons = fields.filter((f) => /^layers\[\d+\]\.poisson$/.test(f.path) && varies(f));
  if (!span && poissons.length === 0) return null;
  const cap = (a: number) => Math.min(a, STRIP_ASPECT); // as plateAspect: a longer slab is its strip
  const aspect: [number, number] = span ? [cap(base.length / span.upper), cap(base.length / span.lower)] : [cap(base.length / base.span), cap(base.length / base.span)];
  let lo = Math.min(...base.layers.map((l) => l.poisson), ...poissons.map((f) => f.lower));
  let hi = Math.max(...base.layers.map((l) => l.poisson), ...poissons.map((f) => f.upper));
  if (!(hi > lo)) hi = lo;
  lo = Math.max(0, lo);
  return platesForSampling(base.plateEdges, aspect, [lo, Math.min(hi, 0.4999)]);
}

/**
 * The fast evaluator of `project` (validated) with `fields` sampled.
 *     const ev = sampleEvaluator(project, [{ path: 'layers[0].thickness_m', lower: 0.3, upper: 0.7 }]);
 *     ev.evaluate([0.5]).governingFs // the deterministic governing FS at t = 0.5 m
 */
export function sampleEvaluator(project: Project, fields: readonly SampledField[]): SampleEvaluator {
  const base = projectToSI(project);
  const work: ProjectSI = { ...base, layers: base.layers.map((l) => ({ ...l })) };
  const writers = fields.map((f) => writerFor(f.path, base, project));
  const plates = samplingPlates(base, fields);
  if (plates) work.plateSource = plates.coefficients;
  // Per-mode figures cover the span modes; support rows (bolt, skin, interlayer shear) count in the governing FS.
  const modeIndex = new Map<string, number>(MODES.map((m, k) => [m, k]));
  const modeFs: (number | null)[] = MODES.map(() => null);
  const out: SampleFs = { modeFs, governingFs: Infinity, targetRatio: Infinity };
  const spanSampled = fields.some((f) => f.path === 'opening.span_m');
  // Layers whose strength chain may change from sample to sample (a sampled input of the chain).
  const chainVaries = base.layers.map((_, i) => spanSampled || fields.some((f) => {
    const m = LAYER_FIELD.exec(f.path);
    return m !== null && Number(m[1]) === i && !NOT_IN_CHAIN.has(m[2]);
  }));
  const n = base.layers.length;
  const chains: StrengthChain[] = new Array(n);
  const moduli: { mass: number; beam: number }[] = new Array(n);
  let chainSpan = NaN;
  const targets = MODES.map((m) => targetFor(m, base.design));
  const limit = base.design.deflectionLimitRatio;
  const cantilever = beamEnds(base) === 'cantilever';

  /** The counted rows reduced, without building them (no bolts). */
  function fast(span: number): void {
    const p = work;
    for (let i = 0; i < n; i++) {
      if (chainVaries[i] || span !== chainSpan) chains[i] = chainFor(p.layers[i], span, p);
      moduli[i] = moduliFor(p.layers[i], chains[i], p);
    }
    chainSpan = span;
    const shared = layerLoads(p, moduli);
    modeFs.fill(null);
    let governing = Infinity;
    let ratio = Infinity;
    for (let i = 0; i < n; i++) {
      const layer = p.layers[i];
      const chain = chains[i];
      const counted = countedModes(layerCondition(p, { chain }, span, layer.thickness, cantilever));
      const wantVoussoir = VOUSSOIR_MODES.some((m) => counted[m]);
      const ls = layerState(p, layer, span, chain, moduli[i], shared.groupOf[i], shared.loads[i], wantVoussoir);
      for (let k = 0; k < MODES.length; k++) {
        const mode = MODES[k];
        if (!counted[mode]) continue;
        const fs = layerRowFs(ls, mode, limit);
        if (fs === null || !rowCounts(counted, mode, fs)) continue;
        const cur = modeFs[k];
        if (cur === null || fs < cur) modeFs[k] = fs;
        if (!canGovern(mode, fs)) continue;
        if (fs < governing) governing = fs;
        const q = fs / targets[k];
        if (q < ratio) ratio = q;
      }
    }
    out.governingFs = governing;
    out.targetRatio = ratio;
  }

  /** `evaluate` and the full check table (bolts: the support rows decide what counts). */
  function full(span: number | undefined): void {
    const state = evaluate(work, span === undefined ? {} : { span });
    const rows = checkTable(work, state);
    modeFs.fill(null);
    let governing = Infinity;
    let ratio = Infinity;
    for (const r of rows) {
      if (!r.counts || r.fs === null) continue;
      const k = modeIndex.get(r.mode);
      if (k !== undefined) {
        const cur = modeFs[k];
        if (cur === null || r.fs < cur) modeFs[k] = r.fs;
      }
      if (!canGovern(r.mode, r.fs)) continue;
      if (r.fs < governing) governing = r.fs;
      const q = r.fs / r.target;
      if (q < ratio) ratio = q;
    }
    out.governingFs = governing;
    out.targetRatio = ratio;
  }

  return {
    modes: MODES,
    plateInterpolation: plates ? { maxRelativeError: plates.maxRelativeError, nodes: plates.nodes } : null,
    evaluate(values, span) {
      if (values.length !== writers.length) throw new RangeError(`the sample has ${values.length} values for ${writers.length} fields`);
      for (let j = 0; j < writers.length; j++) writers[j](work, values[j]);
      if (base.bolts) full(span);
      else fast(span ?? work.span);
      return out;
    },
  };
}
