/** Tension and deflection along the span of one layer, for the beam chart. */
import type { Project } from '../model/types';
import { beamStateAt } from '../mechanics/beam';
import { beamEnds } from './evaluate';
import { projectToSI } from './inputs';
import type { Analysis, BeamProfile } from './types';

export function beamProfile(project: Project, analysis: Analysis, layerIndex: number, samples = 61): BeamProfile {
  const p = projectToSI(project);
  const layer = p.layers[layerIndex];
  const lr = analysis.report.layers[layerIndex];
  if (!layer || !lr) throw new RangeError(`layer index ${layerIndex} is out of range (0..${p.layers.length - 1})`);
  const input = {
    ends: beamEnds(p),
    span: p.span,
    thickness: layer.thickness,
    load: lr.load_kPa * 1e3,
    modulus: analysis.layers[layerIndex].modulusUsed_GPa * 1e9,
    horizontalStress: p.horizontalStress,
  };
  const n = Math.max(3, Math.min(1001, Math.round(samples)));
  const out: BeamProfile = { layer: layerIndex, x_m: [], topTension_MPa: [], bottomTension_MPa: [], deflection_mm: [] };
  for (let k = 0; k < n; k++) {
    const x = (p.span * k) / (n - 1);
    const st = beamStateAt(input, x);
    out.x_m.push(x);
    out.topTension_MPa.push(st.top * 1e-6);
    out.bottomTension_MPa.push(st.bottom * 1e-6);
    out.deflection_mm.push(st.deflection * 1e3);
  }
  return out;
}
