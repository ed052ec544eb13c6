/**
 * Minimum thickness of one layer for the current span and targets (METHODS §11, extended):
 * the smallest t at which every counted check OF THAT LAYER meets its target (the check table's
 * rule at each trial thickness: a thick bed that no longer cracks, or becomes a block, counts
 * tension rather than its voussoir), all else fixed
 * (the strength chain, layering and loads recomputed for each trial thickness, so a thicker,
 * stiffer bed that picks up load from the beds above is accounted for), scanned upward from
 * 1 cm then bisected to 1 mm. null when no thickness up to the search limit works, e.g. when
 * the tension check needs a thick bed but the voussoir sliding check (FS = s·tanφ/(4z), which
 * falls as the bed thickens) needs a thin one.
 */
import type { Project } from '../model/types';
import { smallestPassingValue } from '../mechanics/span-search';
import { checkTable, governingRow } from './check-table';
import { withThickness } from './design-chart';
import { evaluate } from './evaluate';
import { projectToSI } from './inputs';

import { THICKNESS_MIN_M, THICKNESS_TOLERANCE_M } from './thickness-limits';

export { THICKNESS_MIN_M, THICKNESS_TOLERANCE_M };

export function minimumThickness(project: Project, layerIndex: number): number | null {
  const p = projectToSI(project);
  if (!(layerIndex >= 0 && layerIndex < p.layers.length)) throw new RangeError(`layer index ${layerIndex} is out of range (0..${p.layers.length - 1})`);
  const hi = Math.max(20, 3 * p.layers[layerIndex].thickness);
  const ratio = (t: number): number => {
    const pt = withThickness(p, layerIndex, t);
    const state = evaluate(pt);
    const g = governingRow(checkTable(pt, state).filter((c) => c.layerIndex === layerIndex));
    return g === null ? 1e12 : (g.fs as number) / g.target;
  };
  return smallestPassingValue(ratio, THICKNESS_MIN_M, hi, { tolerance: THICKNESS_TOLERANCE_M });
}
