/**
 * The project in SI base units (m, Pa, N/m³, N), the form the kernels take. The file keeps
 * practical units in its key names; this is the one place they are converted for analysis.
 */
import type { Design, EndCondition, Layer, OpeningType, Project } from '../model/types';
import type { PlateCoefficients, PlateInput } from '../mechanics/plate';
import type { SpecimenSI } from '../strength/specimens';

export interface LayerSI {
  name: string;
  thickness: number;
  unitWeight: number;
  modulus: number;
  modulusBasis: Layer['modulusBasis'];
  poisson: number;
  ucs: number;
  rockClass: Layer['rockClass'];
  specimens: SpecimenSI[];
  tensileValue: number | null;
  tensileMethod: Layer['tensile']['method'];
  crossJointSpacing: number | null;
  fractureFrequency: number | null;
  rqd: number | null;
  jointCondition: number;
  jointFriction: number;
  mi: number;
  disturbance: number;
}

export interface ProjectSI {
  type: OpeningType;
  /** Design span, m: the clear span; for an intersection the diagonal √(w1² + w2²) (METHODS §14). */
  span: number;
  /** The span as entered (opening.span_m): the entry width w1 for an intersection. */
  entrySpan: number;
  /** span / entrySpan: 1, or √(1 + (w2/w1)²) for an intersection (held fixed in the span search). */
  spanScale: number;
  /** Slab long side, m; null unless a slab. */
  length: number | null;
  ends: EndCondition;
  /** Plate edge supports (slab): `opening.edges` as short/long pairs, or `ends` on every edge. */
  plateEdges: PlateInput['edges'];
  surcharge: number;
  /** Standing support, Pa (capped at the load it relieves in the layering). */
  support: number;
  horizontalStress: number;
  layers: LayerSI[];
  design: Design;
  /**
   * Optional source of slab plate coefficients in place of the exact (cached) solve: the
   * uncertainty run's interpolation over aspect ratio and Poisson's ratio (sample-plates.ts).
   */
  plateSource?: (aspect: number, poisson: number) => PlateCoefficients;
}

export function layerToSI(layer: Layer): LayerSI {
  return {
    name: layer.name,
    thickness: layer.thickness_m,
    unitWeight: layer.unitWeight_kNm3 * 1e3,
    modulus: layer.youngModulus_GPa * 1e9,
    modulusBasis: layer.modulusBasis,
    poisson: layer.poisson,
    ucs: layer.ucs_MPa * 1e6,
    rockClass: layer.rockClass,
    specimens: layer.tensile.specimens.map((sp) => ({
      id: sp.id,
      diameter: sp.diameter_mm / 1e3,
      thickness: sp.thickness_mm / 1e3,
      peakLoad: sp.peakLoad_kN * 1e3,
      valid: sp.valid,
    })),
    tensileValue: layer.tensile.value_MPa === null ? null : layer.tensile.value_MPa * 1e6,
    tensileMethod: layer.tensile.method,
    crossJointSpacing: layer.jointing.crossJointSpacing_m,
    fractureFrequency: layer.jointing.fractureFrequency_per_m,
    rqd: layer.jointing.rqd,
    jointCondition: layer.jointing.jointCondition,
    jointFriction: layer.jointing.jointFriction_deg,
    mi: layer.hoekBrown.mi,
    disturbance: layer.hoekBrown.disturbance,
  };
}

/**
 * Design span of an intersection: the diagonal √(w1² + w2²) of the entry widths (METHODS §14;
 * memory). 6 × 6 m → 8.485 m; 8 × 10 m → 12.806 m.
 */
export function intersectionDiagonal(w1: number, w2: number): number {
  return Math.hypot(w1, w2);
}

export function projectToSI(project: Project): ProjectSI {
  const o = project.opening;
  const entrySpan = o.span_m;
  const span = o.type === 'intersection' ? intersectionDiagonal(o.span_m, o.length_m ?? o.span_m) : o.span_m;
  return {
    type: o.type,
    span,
    entrySpan,
    spanScale: span / entrySpan,
    length: o.type === 'slab' ? o.length_m : null,
    ends: o.ends,
    plateEdges: o.type === 'slab' && o.edges ? { shortEdges: o.edges.short, longEdges: o.edges.long } : o.ends,
    surcharge: project.loads.surcharge_kPa * 1e3,
    support: project.support.standing_kPa * 1e3,
    horizontalStress: project.loads.horizontalStress_MPa * 1e6,
    layers: project.layers.map(layerToSI),
    design: project.design,
  };
}
