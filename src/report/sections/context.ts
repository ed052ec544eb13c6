/** What every section builder receives: the inputs, the check table, the verdict and the unit system. */
import type { Analysis, SpanCurve } from '../../analysis/types';
import type { Verdict } from '../../analysis/verdict';
import type { CheckRow, Project } from '../../model/types';
import type { UnitSystem } from '../../model/units';

export interface SectionContext {
  project: Project;
  analysis: Analysis;
  curve: SpanCurve | null;
  units: UnitSystem;
  /** The analysis' check table (report.checks). */
  rows: CheckRow[];
  verdict: Verdict;
}

/** "layer 2 “Sandstone”" — how the report names a layer in a sentence. */
export function layerName(ctx: SectionContext, index: number): string {
  const name = ctx.analysis.report.layers[index]?.name ?? ctx.project.layers[index]?.name ?? '';
  return `layer ${index + 1} “${name}”`;
}
