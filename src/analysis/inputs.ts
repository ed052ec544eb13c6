/**
 * The project in SI base units (m, Pa, N/m³, N), the form the kernels take. The file keeps
 * practical units in its key names; this is the one place they are converted for analysis.
 */
import type { Design, EndCondition, Layer, OpeningType, Project } from '../model/types';
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
  span: number;
  /** Slab long side, m; null unless a slab. */
  length: number | null;
  ends: EndCondition;
  surcharge: number;
  support: number;
  horizontalStress: number;
  layers: LayerSI[];
  design: Design;
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

export function projectToSI(project: Project): ProjectSI {
  return {
    type: project.opening.type,
    span: project.opening.span_m,
    length: project.opening.type === 'slab' ? project.opening.length_m : null,
    ends: project.opening.ends,
    surcharge: project.loads.surcharge_kPa * 1e3,
    support: project.loads.support_kPa * 1e3,
    horizontalStress: project.loads.horizontalStress_MPa * 1e6,
    layers: project.layers.map(layerToSI),
    design: project.design,
  };
}
