/**
 * The checks of every layer and mode as rows (demand, capacity, FS, target, status): the one
 * table behind the report's checks section, the results CSV and the app's check list.
 * Values are in the report's practical SI units (MPa, or a ratio for deflection).
 *
 * FS conventions (METHODS §10): tension = design strength / net max tension; crushing = UCS /
 * fc; sliding = fc·n·tanφ/(γ′s); deflection = limit/(δ/t) against a target of 1;
 * snap-through = 1 (an arch forms) or 0 (it snaps) against a target of 1.
 */
import type { Mode, Project, Report } from '../model/types';
import { deflectionFs, targetFor } from '../analysis/checks';
import { checkStatus, type CheckStatus } from './status';

export const MODES: readonly Mode[] = ['tension', 'crushing', 'sliding', 'deflection', 'snapThrough'];

export const MODE_LABEL: Record<Mode, string> = {
  tension: 'tension (intact beam)',
  crushing: 'crushing (voussoir arch)',
  sliding: 'abutment sliding (voussoir arch)',
  deflection: 'midspan deflection δ/t (voussoir arch)',
  snapThrough: 'snap-through (voussoir arch)',
};

/** Short names for the verdict sentence ("tension", "crushing", …). */
export const MODE_NAME: Record<Mode, string> = {
  tension: 'tension',
  crushing: 'crushing of the arch',
  sliding: 'sliding at the abutments',
  deflection: 'midspan deflection',
  snapThrough: 'snap-through',
};

export type DemandKind = 'stress' | 'ratio' | 'none';

export interface CheckRow {
  layerIndex: number;
  layer: string;
  mode: Mode;
  label: string;
  /** What `demand` and `capacity` measure: a stress in MPa, a δ/t ratio, or nothing. */
  kind: DemandKind;
  demand: number | null;
  capacity: number | null;
  fs: number | null;
  target: number;
  status: CheckStatus;
  /** True for the row named in `report.governing`. */
  governing: boolean;
  /** Why the row is n/a, or how to read it. */
  note: string;
}

export function checkRows(project: Project, report: Report): CheckRow[] {
  const rows: CheckRow[] = [];
  // A cantilever has no post-cracking reserve, so its tension counts on either basis.
  const jointedBasis = project.design.basis === 'jointed' && project.opening.type !== 'cantilever';
  const limit = project.design.deflectionLimitRatio;
  report.layers.forEach((layer, i) => {
    const input = project.layers[i];
    const v = layer.voussoir;
    const noArch = v === null ? 'no voussoir check for a cantilever: a jointed overhang has no capacity' : '';
    const snapped = v !== null && v.snapThrough ? 'no arch forms (snap-through), so this check has no value' : '';
    const push = (mode: Mode, kind: DemandKind, demand: number | null, capacity: number | null, fs: number | null, note: string, excluded = false) => {
      const target = targetFor(mode, project.design);
      const governing = report.governing !== null && report.governing.layer === layer.name && report.governing.mode === mode;
      rows.push({
        layerIndex: i, layer: layer.name, mode, label: MODE_LABEL[mode], kind,
        demand: finite(demand), capacity: finite(capacity), fs: finite(fs), target,
        status: checkStatus(finite(fs), target, { excluded }), governing, note,
      });
    };

    // Tension: the intact beam (or slab plate) against the design tensile strength.
    const tensionDemand = layer.plate ? layer.plate.maxTension_MPa : layer.elastic.maxTension_MPa;
    let tensionNote = layer.plate ? `plate maximum at ${layer.plate.at}` : `net maximum at the ${layer.elastic.at}`;
    if (project.opening.type === 'cantilever' && layer.strength.crossJointed) {
      tensionNote = 'cross-jointed overhang: no tensile strength and no arch, FS 0';
    } else if (layer.elastic.fsTension === null) {
      tensionNote = layer.strength.crossJointed
        ? 'cross-jointed at this span: no tensile strength across the joints, the voussoir checks govern'
        : 'no net tension (the horizontal stress exceeds the bending tension)';
    } else if (jointedBasis) {
      tensionNote += '; not counted: the design basis takes the roof as cracked';
    }
    push('tension', 'stress', tensionDemand, layer.strength.design_MPa, layer.elastic.fsTension, tensionNote, jointedBasis);

    const ucs = input ? input.ucs_MPa : null;
    push('crushing', 'stress', v?.maxCompression_MPa ?? null, v ? ucs : null, v?.fsCrushing ?? null,
      noArch || snapped || 'arch thrust fc against the UCS as given');
    push('sliding', 'none', null, null, v?.fsSliding ?? null,
      noArch || snapped || 'FS = fc·n·tanφ/(γ′·s), friction on the cross-joints at the abutment');
    const ratio = v?.deflectionRatio ?? null;
    push('deflection', 'ratio', ratio, v ? limit : null, v && !v.snapThrough ? deflectionFs(ratio, limit) : null,
      noArch || snapped || 'FS = limit/(δ/t), target 1');
    push('snapThrough', 'none', null, null, v === null ? null : v.snapThrough ? 0 : 1,
      noArch || (v?.snapThrough ? 'the beam snaps through: no compression arch can carry it' : 'an arch forms: FS shown as 1 (stands), target 1'));
  });
  return rows;
}

function finite(x: number | null | undefined): number | null {
  return x !== null && x !== undefined && Number.isFinite(x) ? x : null;
}
