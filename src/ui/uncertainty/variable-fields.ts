/**
 * What the uncertainty section needs to know about a sampled field path: the quantity its file
 * unit belongs to (so that means, SDs and bounds show in the app's unit system), a short name,
 * and the eligible paths present in a project (the suggestions of the path box). The paths
 * and their physical ranges are the model's (`model/uncertain-fields.ts`).
 */
import type { Project } from '../../model/types';
import type { Quantity } from '../../model/units';
import { eligibleField, ELIGIBLE_FIELDS } from '../../model/uncertain-fields';
import { projectValueAt } from '../../uncertainty/variables';

const QUANTITY: Record<string, Quantity | null> = {
  'opening.span_m': 'length',
  'layers[i].thickness_m': 'length',
  'layers[i].unitWeight_kNm3': 'unitWeight',
  'layers[i].youngModulus_GPa': 'modulus',
  'layers[i].poisson': null,
  'layers[i].ucs_MPa': 'stress',
  'layers[i].tensile.value_MPa': 'stress',
  'layers[i].jointing.fractureFrequency_per_m': null,
  'layers[i].jointing.jointCondition': null,
  'layers[i].jointing.crossJointSpacing_m': 'length',
  'layers[i].jointing.jointFriction_deg': null,
  'loads.horizontalStress_MPa': 'stress',
  'loads.surcharge_kPa': 'pressure',
  'support.standing_kPa': 'pressure',
};

const NAME: Record<string, string> = {
  'opening.span_m': 'span',
  'layers[i].thickness_m': 'thickness',
  'layers[i].unitWeight_kNm3': 'unit weight',
  'layers[i].youngModulus_GPa': 'Young’s modulus',
  'layers[i].poisson': 'Poisson’s ratio',
  'layers[i].ucs_MPa': 'UCS',
  'layers[i].tensile.value_MPa': 'tensile strength',
  'layers[i].jointing.fractureFrequency_per_m': 'fracture frequency (per m)',
  'layers[i].jointing.jointCondition': 'joint condition',
  'layers[i].jointing.crossJointSpacing_m': 'cross-joint spacing',
  'layers[i].jointing.jointFriction_deg': 'joint friction (°)',
  'loads.horizontalStress_MPa': 'horizontal stress',
  'loads.surcharge_kPa': 'surcharge',
  'support.standing_kPa': 'standing support',
};

/** The quantity of a path's file unit (null: a plain number, the same in SI and US). */
export function quantityOf(path: string): Quantity | null {
  const f = eligibleField(path);
  return f ? (QUANTITY[f.pattern] ?? null) : null;
}

/** "thickness, layer 1 “Shale”", "span", or the path itself when it is not eligible. */
export function fieldName(path: string, project: Pick<Project, 'layers'>): string {
  const f = eligibleField(path);
  if (!f) return path;
  const name = NAME[f.pattern] ?? f.pattern;
  const m = /^layers\[(\d+)\]/.exec(path);
  if (!m) return name;
  const layer = project.layers[Number(m[1])];
  return `${name}, layer ${Number(m[1]) + 1}${layer ? ` “${layer.name}”` : ''}`;
}

/** Every eligible path that holds a number in `project` (the path box's suggestions). */
export function samplablePaths(project: Project): string[] {
  const at = projectValueAt(project);
  const out: string[] = [];
  for (const f of ELIGIBLE_FIELDS) {
    if (f.pattern === 'loads.support_kPa') continue; // lamina/1 name
    const paths = f.pattern.includes('[i]') ? project.layers.map((_, i) => f.pattern.replace('[i]', `[${i}]`)) : [f.pattern];
    for (const p of paths) if (typeof at(p) === 'number') out.push(p);
  }
  return out;
}
