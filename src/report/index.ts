/** The calculation report: one report model, rendered to Markdown, HTML and CSV. */
export { buildReportDocument, type ReportInput } from './report-document';
export type * from './document-types';
export { renderMarkdown, escapeMarkdown } from './render-markdown';
export { renderHtml, renderHtmlBody, REPORT_CSS, escapeHtml, type Paper } from './render-html';
export { resultsCsv, spanCurveCsv } from './results-csv';
export { formulaText, substitutedText, formulaSymbols } from './formula-text';
export { traceBlock } from './trace-block';
export { numberText } from './number-text';
export { quantityText } from './format';
