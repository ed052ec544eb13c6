/**
 * The bending-stress field over a slab, scaled from the plate solution's coefficient field. A
 * slab longer than the solved ratio (`STRIP_ASPECT`) is drawn at its true length: the solved
 * plate's two end halves are placed at the true short edges, and the middle between them is
 * the uniform strip, the value the solved plate has along its middle.
 */
import type { Project } from '../model/types';
import { plateAspect, plateFor } from './evaluate';
import { projectToSI } from './inputs';
import type { Analysis, SlabField } from './types';

export function slabField(project: Project, analysis: Analysis, layerIndex: number): SlabField | null {
  const p = projectToSI(project);
  if (p.type !== 'slab' || p.length === null) return null;
  const layer = p.layers[layerIndex];
  const lr = analysis.report.layers[layerIndex];
  if (!layer || !lr) throw new RangeError(`layer index ${layerIndex} is out of range (0..${p.layers.length - 1})`);
  const c = plateFor(p, layer.poisson);
  if (!c) return null;
  const scale = (lr.load_kPa * 1e3 * p.span * p.span) / (layer.thickness * layer.thickness);
  const f = c.field;
  const solved = plateAspect(p);
  const extra = p.length / p.span - solved; // > 0 only beyond the solved ratio
  return {
    layer: layerIndex,
    x_m: f.x.map((x) => (extra > 0 && x > solved / 2 ? x + extra : x) * p.span),
    y_m: f.y.map((y) => y * p.span),
    stress_MPa: f.values.map((v) => (v * scale - p.horizontalStress) * 1e-6),
    maxTension_MPa: lr.plate ? lr.plate.maxTension_MPa : (c.beta * scale - p.horizontalStress) * 1e-6,
    at: c.at,
  };
}
