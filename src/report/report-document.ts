/**
 * Builds the one structured report model from a project and its analysis; Markdown, HTML and
 * the app all render this model. Two parts: the summary — header (with the caution), verdict,
 * inputs, checks, support (where given), key charts, uncertainty (where run), warnings — and,
 * unless `trace: false`, the appendix — A strength chain, B calculation trace (every entry
 * once), C methods, assumptions and limits — then the caution again at the end.
 *
 *     const doc = buildReportDocument({ project, analysis, curve, units: 'SI', version: '0.1.0' });
 *     renderMarkdown(doc); renderHtml(doc);
 */
import type { Analysis, SpanCurve } from '../analysis/types';
import { buildVerdict } from '../analysis/verdict';
import { projectHash, writeProjectText } from '../model/project-file';
import type { Project } from '../model/types';
import type { UnitSystem } from '../model/units';
import type { ReportDocument, Section } from './document-types';
import { assumptionsSection, warningsSection } from './sections/assumptions';
import { chartsSection } from './sections/charts';
import { checksSection } from './sections/checks';
import type { SectionContext } from './sections/context';
import { closingSection, headerSection } from './sections/header';
import { inputsSection } from './sections/inputs';
import { strengthSection } from './sections/strength';
import { supportSection } from './sections/support';
import { traceSection } from './sections/trace';
import { verdictSection } from './sections/verdict';
import { uncertaintySection } from './sections/uncertainty';

export interface ReportInput {
  project: Project;
  analysis: Analysis;
  curve?: SpanCurve | null;
  /** The project file's text as read (hashed for the header); defaults to writeProjectText(project). */
  projectText?: string;
  units: UnitSystem;
  /** Report date; defaults to today (ISO date, UTC). */
  date?: string;
  /** Lamina version (the CLI/app read it from package.json). */
  version?: string;
  /** Include the appendix (strength chain, calculation trace, methods); default true. */
  trace?: boolean;
}

export function buildReportDocument(input: ReportInput): ReportDocument {
  const { project, analysis, units } = input;
  if (units !== 'SI' && units !== 'US') throw new RangeError(`units must be "SI" or "US", got ${JSON.stringify(units)}`);
  const ctx: SectionContext = {
    project,
    analysis,
    curve: input.curve ?? null,
    units,
    rows: analysis.report.checks,
    verdict: buildVerdict(project, analysis.report, units),
  };
  const meta = {
    date: input.date ?? new Date().toISOString().slice(0, 10),
    version: input.version ?? 'unknown',
    hash: projectHash(input.projectText ?? writeProjectText(project)),
    units,
    appendix: input.trace ?? true,
  };
  return {
    schema: 'lamina-report-document/1',
    title: `Lamina roof check — ${project.title}`,
    meta,
    sections: [
      headerSection(ctx, meta),
      verdictSection(ctx),
      inputsSection(ctx),
      checksSection(ctx),
      // Only where the project gives support or Q ratings.
      ...([supportSection(ctx)].filter((x): x is Section => x !== null)),
      chartsSection(ctx),
      ...[uncertaintySection(ctx)].filter((s) => s !== null),
      warningsSection(ctx),
      ...(meta.appendix ? [strengthSection(ctx), traceSection(ctx), assumptionsSection(project.opening.type)] : []),
      closingSection(),
    ],
  };
}
