/**
 * Design-chart data: FS per mode of one layer on a grid of spans × thicknesses, everything else
 * as in the project (the strength chain, layering and loads are recomputed at every cell, since
 * the block size, cross-jointing and load sharing depend on both). For a slab the aspect ratio
 * is held fixed; for an intersection the spans are entry widths (the diagonal is analysed).
 * Every mode's FS is drawn; `counts` says which modes count for the layer at the project's
 * span and thickness (the check table's rule, METHODS §10). With support, `support` gives the
 * largest span meeting every counted check (whole check table) against this layer's thickness,
 * with the support as given and without it (6 thicknesses).
 */
import type { Design, Mode, Project } from '../model/types';
import { MODES } from './check-labels';
import { countedModesAt, deflectionFs, targetFor } from './check-table';
import { chainFor, evaluate, layerLoads, layerState, moduliFor, type LayerState } from './evaluate';
import { projectToSI, type ProjectSI } from './inputs';
import type { DesignChart, DesignSupportCurve } from './types';
import { supportSpanByThickness } from './support-needed';

/** Thicknesses at which the with/without-support curves are found (each a span search per case). */
const SUPPORT_THICKNESSES = 6;

/** FS per mode of one layer state; null where the mode does not apply (snap-through: 1 stands, 0 snaps). */
function layerFs(layer: LayerState, design: Design): Record<Mode, number | null> {
  const v = layer.voussoir;
  const fs: Record<Mode, number | null> = { tension: layer.fsTension, crushing: null, sliding: null, snapThrough: null, deflection: null };
  if (v) {
    if (v.snapThrough) {
      fs.snapThrough = 0;
      fs.crushing = fs.sliding = fs.deflection = 0;
    } else {
      fs.snapThrough = 1;
      fs.crushing = v.fsCrushing;
      fs.sliding = v.fsSliding;
      fs.deflection = deflectionFs(v.deflectionRatio, design.deflectionLimitRatio);
    }
  }
  return fs;
}

export function withThickness(p: ProjectSI, layerIndex: number, thickness: number): ProjectSI {
  return { ...p, layers: p.layers.map((l, i) => (i === layerIndex ? { ...l, thickness } : l)) };
}

export function defaultGrid(current: number, count: number, lowFactor: number, highFactor: number): number[] {
  const lo = current * lowFactor;
  const hi = current * highFactor;
  return Array.from({ length: count }, (_, k) => lo + ((hi - lo) * k) / (count - 1));
}

export function designChart(project: Project, layerIndex: number, options: { spans_m?: number[]; thicknesses_m?: number[] } = {}): DesignChart {
  const p = projectToSI(project);
  if (!(layerIndex >= 0 && layerIndex < p.layers.length)) throw new RangeError(`layer index ${layerIndex} is out of range (0..${p.layers.length - 1})`);
  const spans = options.spans_m ?? defaultGrid(p.entrySpan, 40, 0.25, 2.5);
  const thicknesses = options.thicknesses_m ?? defaultGrid(p.layers[layerIndex].thickness, 40, 0.25, 3);
  for (const s of spans) if (!(s > 0) || !Number.isFinite(s)) throw new RangeError(`spans_m: every span must be > 0 m, got ${s}`);
  for (const t of thicknesses) if (!(t > 0) || !Number.isFinite(t)) throw new RangeError(`thicknesses_m: every thickness must be > 0 m, got ${t}`);
  const fs = Object.fromEntries(MODES.map((m) => [m, [] as (number | null)[][]])) as DesignChart['fs'];
  // GSI, hence the moduli, depend on neither span nor thickness: compute them once. The groups
  // and loads depend on the thickness only (one row); the chosen layer's strength chain depends
  // on both (block size, cross-jointing), the other layers' loads on neither.
  const base = p.layers.map((layer) => chainFor(layer, p.span, p));
  const moduli = p.layers.map((layer, i) => moduliFor(layer, base[i], p));
  for (const t of thicknesses) {
    const pt = withThickness(p, layerIndex, t);
    const layer = pt.layers[layerIndex];
    const loads = layerLoads(pt, moduli);
    const rows = Object.fromEntries(MODES.map((m) => [m, [] as (number | null)[]])) as Record<Mode, (number | null)[]>;
    for (const w of spans) {
      const s = w * p.spanScale;
      const chain = chainFor(layer, s, pt);
      const state = layerState(pt, layer, s, chain, moduli[layerIndex], loads.groupOf[layerIndex], loads.loads[layerIndex]);
      const f = layerFs(state, p.design);
      for (const m of MODES) {
        const v = f[m];
        rows[m].push(v === null ? null : Math.min(v, 1e6));
      }
    }
    for (const m of MODES) fs[m].push(rows[m]);
  }
  const targets = Object.fromEntries(MODES.map((m) => [m, targetFor(m, p.design)])) as DesignChart['targets'];
  const counts = countedModesAt(p, evaluate(p))[layerIndex];
  let support: DesignSupportCurve | null = null;
  if (project.support.bolts || project.support.standing_kPa > 0) {
    const n = Math.min(SUPPORT_THICKNESSES, thicknesses.length);
    const at = Array.from({ length: n }, (_, k) => thicknesses[Math.round((k * (thicknesses.length - 1)) / Math.max(1, n - 1))]);
    support = { thicknesses_m: at, ...supportSpanByThickness(project, layerIndex, at, [Math.min(...spans), Math.max(...spans)]) };
  }
  return { layer: layerIndex, spans_m: spans, thicknesses_m: thicknesses, fs, targets, counts, support };
}
