/**
 * The results views of the worksheet (sections 4–8): importing this module registers
 * `<strength-chain-view>`, `<checks-table>`, `<support-view>`, `<span-finder-view>`, `<beam-charts-view>`,
 * `<trace-dialog>` and `<report-view>`.
 */
export { StrengthChainView } from './strength-chain-view';
export { ChecksTable } from './checks-table';
export { SupportView, adoptableSpacing } from './support-view';
export { SpanFinderView } from './span-finder-view';
export { adoptableSpan } from './adoptable-span';
export { BeamChartsView } from './beam-charts-view';
export { TraceDialog } from './trace-dialog';
export { relatedEntries, tracePrefix, valueText } from './trace-entries';
export { ReportView, PRINT_CONTAINER_ID } from './report-view';
export { reportFileName } from './report-file-name';
export { tracedNumber, type ShowTraceDetail } from './traced-number';
export { checkRowViews, type CheckRowView } from './check-rows';
