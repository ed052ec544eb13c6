/**
 * The calculation report for `check --markdown` and `--html`. This module is imported only
 * when one of those options is given (src/cli/check.ts), because the report's trace formulas
 * are rendered with mathjs: plain `check`, `--json` and `--csv` never load it.
 */
import type { Analysis, SpanCurve } from '../analysis/types';
import type { Project } from '../model/types';
import type { UnitSystem } from '../model/units';
import { buildReportDocument, renderHtml, renderMarkdown } from '../report';
import type { ReportDocument } from '../report/document-types';

export interface ReportInputs {
  project: Project;
  analysis: Analysis;
  curve: SpanCurve;
  text: string;
  units: UnitSystem;
  version: string;
  /** Include the appendix (default true). */
  trace?: boolean;
}

export function reportDocument({ project, analysis, curve, text, units, version, trace }: ReportInputs): ReportDocument {
  return buildReportDocument({ project, analysis, curve, projectText: text, units, version, date: new Date().toISOString().slice(0, 10), trace: trace ?? true });
}

export { renderHtml, renderMarkdown };
