/**
 * The structured report model. `buildReportDocument` fills it once; every output (Markdown,
 * HTML, the app) renders it, so wording and numbers are decided in one place. All text here
 * is plain (unescaped) text: renderers escape it for their format.
 */
import type { CheckStatusKind as StatusKind } from '../model/types';

/** A table cell: plain text, optionally carrying the number it shows (for tests and CSV). */
export interface Cell {
  text: string;
  /** The value in the report's practical SI unit (before display conversion), when numeric. */
  value?: number | null;
  status?: StatusKind;
  /** Right-align numbers. */
  numeric?: boolean;
}

export interface Column {
  /** Column title including its unit, e.g. "Thickness (m)". */
  title: string;
  numeric?: boolean;
}

export interface HeadingBlock {
  kind: 'heading';
  level: 3 | 4;
  text: string;
}

export interface ParagraphBlock {
  kind: 'paragraph';
  text: string;
  /** Shown with emphasis (the verdict sentences). */
  strong?: boolean;
}

export interface KeyValueBlock {
  kind: 'keyValue';
  items: Array<{ key: string; value: string }>;
}

export interface TableBlock {
  kind: 'table';
  caption: string;
  columns: Column[];
  rows: Cell[][];
}

export interface ListBlock {
  kind: 'list';
  items: string[];
}

/** One line of the calculation trace, ready to print. */
export interface FormulaBlock {
  kind: 'formula';
  /** Report field path, e.g. `layers[0].elastic.maxTension_MPa`. */
  path: string;
  label: string;
  /** The mathjs expression exactly as traced (shown in the HTML as a tooltip / code). */
  expression: string;
  /** Readable formula rendered from `expression`. */
  formula: string;
  /** `expression` with the values substituted, with their units. */
  substituted: string;
  /** Each symbol with its value and unit, e.g. "q = 11.25 kPa". */
  values: string[];
  /** Result text with its unit (and the display-unit equivalent in US units). */
  result: string;
  /** Raw traced result in `unit`. */
  resultValue: number;
  unit: string;
  source: string;
  note?: string;
}

export interface ChartBlock {
  kind: 'chart';
  title: string;
  /** SVG markup from src/report/charts (already escaped by the chart builder). */
  svg: string;
  caption?: string;
}

export type CalloutTone = 'caution' | 'warning' | 'error' | 'note';

export interface CalloutBlock {
  kind: 'callout';
  tone: CalloutTone;
  title: string;
  text: string;
}

export type Block =
  | HeadingBlock
  | ParagraphBlock
  | KeyValueBlock
  | TableBlock
  | ListBlock
  | FormulaBlock
  | ChartBlock
  | CalloutBlock;

export type SectionId =
  | 'header'
  | 'verdict'
  | 'inputs'
  | 'support'
  | 'strength'
  | 'checks'
  | 'trace'
  | 'assumptions'
  | 'warnings'
  | 'charts'
  | 'uncertainty'
  | 'closing';

export interface Section {
  id: SectionId;
  title: string;
  blocks: Block[];
  /** Part of the appendix (the full calculation), which a summary report leaves out. */
  appendix?: boolean;
}

export interface ReportDocument {
  schema: 'lamina-report-document/1';
  title: string;
  meta: {
    date: string;
    version: string;
    hash: string;
    units: 'SI' | 'US';
    /** Whether the appendix (strength chain in full, calculation trace, methods) is included. */
    appendix: boolean;
  };
  sections: Section[];
}
