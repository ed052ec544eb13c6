/**
 * Design-chart data: FS per mode of one layer on a grid of spans × thicknesses, everything else
 * as in the project (the strength chain, layering and loads are recomputed at every cell, since
 * the block size, cross-jointing and load sharing depend on both). For a slab the aspect ratio
 * is held fixed.
 */
import type { Mode, Project } from '../model/types';
import { layerFs, targetFor } from './checks';
import { chainFor, layerLoads, layerState, moduliFor } from './evaluate';
import { projectToSI, type ProjectSI } from './inputs';
import type { DesignChart } from './types';

const MODES: Mode[] = ['tension', 'crushing', 'sliding', 'snapThrough', 'deflection'];

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
  const spans = options.spans_m ?? defaultGrid(p.span, 40, 0.25, 2.5);
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
    for (const s of spans) {
      const chain = chainFor(layer, s, pt);
      const state = layerState(pt, layer, s, chain, moduli[layerIndex], loads.groupOf[layerIndex], loads.loads[layerIndex]);
      const f = layerFs(state, p.design);
      const snapped = state.voussoir?.snapThrough === true;
      for (const m of MODES) {
        const v = snapped && m !== 'tension' ? 0 : f[m];
        rows[m].push(v === null ? null : Math.min(v, 1e6));
      }
    }
    for (const m of MODES) fs[m].push(rows[m]);
  }
  const targets = Object.fromEntries(MODES.map((m) => [m, targetFor(m, p.design)])) as DesignChart['targets'];
  return { layer: layerIndex, spans_m: spans, thicknesses_m: thicknesses, fs, targets };
}
