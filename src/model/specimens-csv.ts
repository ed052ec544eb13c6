import { dsvFormat } from 'd3-dsv';
import type { Specimen } from './types';
import { normaliseDecimalComma } from './decimal-comma';
import { FIELD_WORDS, SPECIMEN_FIELDS, recogniseHeading, type SpecimenField } from './specimen-headings';

export interface SpecimensCsvError {
  /** 1-based row as a spreadsheet shows it (header = row 1 when it is the first line). */
  row: number;
  /** The column concerned as the text names it ('' when the whole text is affected). */
  column: string;
  message: string;
}

export type Separator = ',' | ';' | '\t';

/** How one column of the text was read. */
export interface ColumnReading {
  /** 0-based position in the row. */
  index: number;
  /** The heading as written, or "column 2" when the text has no header. */
  heading: string;
  field: SpecimenField;
  /** Unit of the values as written ('' for id and valid). */
  unit: string;
  /** Multiplies a written value to the file unit (mm, kN). */
  factor: number;
  /** True when no unit was given and the file unit (mm, kN) was assumed. */
  assumed: boolean;
}

/** How the text was read: shown to the user before a paste is applied. */
export interface SpecimensCsvReading {
  separator: Separator;
  /** False when the first row held data and the columns were taken by their order. */
  header: boolean;
  columns: ColumnReading[];
  /** Headings of columns that name no specimen field (left out). */
  ignored: string[];
  /** True when at least one number was written with a decimal comma. */
  decimalComma: boolean;
  /** True when the text used the file's own column names with no conversion: nothing to confirm. */
  exact: boolean;
}

export interface SpecimensCsv {
  /** Specimens from the rows without errors, in file units (mm, kN). */
  specimens: Specimen[];
  errors: SpecimensCsvError[];
  reading: SpecimensCsvReading;
}

/** Most data rows read at once (a lab campaign has tens to hundreds of discs; common practice). */
export const MAX_SPECIMEN_ROWS = 10_000;

const REQUIRED: readonly SpecimenField[] = ['id', 'diameter_mm', 'thickness_mm', 'peakLoad_kN'];
const NUMERIC: readonly SpecimenField[] = ['diameter_mm', 'thickness_mm', 'peakLoad_kN'];

const TRUE_WORDS = new Set(['true', 'yes', '1', 'y', 'ok']);
const FALSE_WORDS = new Set(['false', 'no', '0', 'n']);
const DECIMAL = /^[+]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const DIGITS = /^\d+$/;

const EXPECTED =
  'expected columns id, diameter_mm, thickness_mm, peakLoad_kN and optionally valid ' +
  '(or headings such as Sample, Dia (mm), Thk (mm), Load (kN), Valid)';
const HEADERLESS =
  'without a header the columns must be id, diameter (mm), thickness (mm), peak load (kN) and optionally valid, in that order';

/**
 * Reads Brazilian-test specimens from CSV text, or text pasted from a spreadsheet.
 *
 * - Separator: a tab in the first non-blank line selects tabs, else a semicolon outside quotes
 *   selects semicolons, else commas. Quotes and line breaks are d3-dsv's (RFC 4180).
 * - Header: headings are recognised by meaning (`specimen-headings.ts`: "Sample", "Dia (mm)",
 *   "Load (lbf)", …; the file names id, diameter_mm, thickness_mm, peakLoad_kN, valid), in any
 *   order, extra columns ignored; a unit in the heading is converted to mm or kN. When the
 *   first row holds three or more numbers it is data, and the columns are taken in the order
 *   id, diameter (mm), thickness (mm), peak load (kN) [, valid].
 * - Decimal commas ("54,1") are read where the separator is a semicolon or a tab. In
 *   comma-separated text a decimal comma cannot be told from a separator, so a row with more
 *   cells than the header is refused, naming the column where it starts to run over.
 * - valid: true/false, yes/no, y/n, ok, 1/0 (default true). Blank lines are skipped; rows are
 *   numbered as a spreadsheet shows them; at most MAX_SPECIMEN_ROWS data rows.
 *
 * Rows with errors are left out and every problem is reported with its row and column. Never
 * throws.
 *     parseSpecimensCsv('id,diameter_mm,thickness_mm,peakLoad_kN\nB1,54,27,10').specimens
 *     // [{ id: 'B1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 10, valid: true }]
 *     parseSpecimensCsv('B1;54,1;27;10').specimens[0].diameter_mm // 54.1 (no header, decimal comma)
 */
export function parseSpecimensCsv(text: string): SpecimensCsv {
  try {
    return parse(text);
  } catch (error) {
    return { specimens: [], errors: [{ row: 1, column: '', message: `the text could not be read: ${String(error)}` }], reading: emptyReading(',') };
  }
}

const emptyReading = (separator: Separator): SpecimensCsvReading => ({ separator, header: true, columns: [], ignored: [], decimalComma: false, exact: false });

/** The separator of a table, from its first non-blank line. */
export function detectSeparator(text: string): Separator {
  const line = /[^\r\n]*\S[^\r\n]*/.exec(text)?.[0] ?? '';
  if (line.includes('\t')) return '\t';
  return line.replace(/"[^"]*"/g, '').includes(';') ? ';' : ',';
}

const blank = (cells: string[]): boolean => cells.every((cell) => cell.trim() === '');

/** 1 + the position of the last non-empty cell. */
function width(cells: string[]): number {
  for (let k = cells.length - 1; k >= 0; k--) if (cells[k].trim() !== '') return k + 1;
  return 0;
}

/** Drop floating-point noise from a unit conversion (15 significant digits). */
const tidy = (x: number): number => Number(x.toPrecision(15));

function parse(input: string): SpecimensCsv {
  const errors: SpecimensCsvError[] = [];
  const specimens: Specimen[] = [];
  if (typeof input !== 'string') {
    return { specimens, errors: [{ row: 1, column: '', message: `expected text, got ${typeof input}` }], reading: emptyReading(',') };
  }
  const text = input.replace(/^\uFEFF/, '');
  const separator = detectSeparator(text);
  const reading = emptyReading(separator);
  const result = (): SpecimensCsv => ({ specimens, errors, reading });
  const rows = dsvFormat(separator).parseRows(text);
  const isNumber = (cell: string): boolean => {
    const t = cell.trim();
    if (DECIMAL.test(t)) return true;
    try {
      return separator !== ',' && DECIMAL.test(normaliseDecimalComma(t));
    } catch {
      return true; // "1,250": a number, if an ambiguous one
    }
  };

  const firstIndex = rows.findIndex((cells) => !blank(cells));
  if (firstIndex < 0) {
    errors.push({ row: 1, column: '', message: `row 1: no header line; ${EXPECTED}` });
    return result();
  }
  const firstRow = firstIndex + 1;
  reading.header = rows[firstIndex].filter(isNumber).length < 3;
  let dataStart = firstIndex;
  let headerWidth = width(rows[firstIndex]);

  if (reading.header) {
    dataStart = firstIndex + 1;
    const seen = new Set<SpecimenField>();
    rows[firstIndex].forEach((cell, index) => {
      const heading = cell.trim();
      const r = recogniseHeading(heading);
      if (r === undefined) {
        if (heading !== '') reading.ignored.push(heading);
        return;
      }
      if ('error' in r) {
        seen.add(r.field); // present, if unreadable: not also "missing"
        errors.push({ row: firstRow, column: heading, message: `row ${firstRow}, ${heading}: ${r.error}` });
        return;
      }
      if (seen.has(r.field)) {
        errors.push({ row: firstRow, column: heading, message: `row ${firstRow}, ${heading}: a second ${FIELD_WORDS[r.field]} column; remove one` });
        return;
      }
      seen.add(r.field);
      reading.columns.push({ index, heading, field: r.field, unit: r.unit, factor: r.factor, assumed: r.assumed });
    });
    const exactNames = rows[firstIndex].every((cell) => {
      const r = recogniseHeading(cell.trim());
      return r === undefined || ('exact' in r && r.exact);
    });
    const missing = REQUIRED.filter((field) => !seen.has(field));
    if (missing.length > 0) {
      errors.push({
        row: firstRow,
        column: missing.join(', '),
        message: `row ${firstRow}: missing column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}; ${EXPECTED}`,
      });
    }
    if (errors.length > 0) return result();
    reading.exact = exactNames;
  } else {
    if (headerWidth !== 4 && headerWidth !== 5) {
      errors.push({ row: firstRow, column: '', message: `row ${firstRow}: no header line and ${headerWidth} columns; ${HEADERLESS}` });
      return result();
    }
    reading.columns = SPECIMEN_FIELDS.slice(0, headerWidth).map((field, index) => ({
      index,
      heading: `column ${index + 1}`,
      field,
      unit: field === 'diameter_mm' || field === 'thickness_mm' ? 'mm' : field === 'peakLoad_kN' ? 'kN' : '',
      factor: 1,
      assumed: field !== 'id' && field !== 'valid',
    }));
  }

  let dataRows = 0;
  for (let i = dataStart; i < rows.length; i++) if (!blank(rows[i])) dataRows++;
  if (dataRows > MAX_SPECIMEN_ROWS) {
    errors.push({
      row: firstRow,
      column: '',
      message: `${dataRows.toLocaleString('en-US')} specimen rows; at most ${MAX_SPECIMEN_ROWS.toLocaleString('en-US')} are read at once — split the table`,
    });
    return result();
  }

  const column = new Map<SpecimenField, ColumnReading>(reading.columns.map((c) => [c.field, c]));
  const label = (c: ColumnReading): string => (reading.header ? c.heading : `${c.heading} (${c.field})`);
  const numericColumns = reading.columns.filter((c) => NUMERIC.includes(c.field)).sort((a, b) => a.index - b.index);
  const firstRowOfId = new Map<string, number>();

  for (let i = dataStart; i < rows.length; i++) {
    const cells = rows[i];
    if (blank(cells)) continue;
    const row = i + 1;
    const rowErrors: SpecimensCsvError[] = [];
    const fail = (c: ColumnReading | string, message: string): void => {
      const name = typeof c === 'string' ? c : label(c);
      rowErrors.push({ row, column: name, message: `row ${row}, ${name}: ${message}` });
    };

    const cellCount = width(cells);
    if (cellCount > headerWidth) {
      // A decimal comma in comma-separated text splits a number in two and shifts every cell
      // after it: name the first number that is followed by a bare run of digits.
      const split = numericColumns.find((c) => DIGITS.test((cells[c.index] ?? '').trim()) && DIGITS.test((cells[c.index + 1] ?? '').trim()));
      const where = split ? label(split) : `column ${headerWidth + 1}`;
      const why =
        separator === ','
          ? 'a decimal comma cannot be told from the separator in comma-separated text — write decimals with a point, or separate the columns with semicolons or tabs'
          : 'check for a stray separator';
      fail(where, `the row has ${cellCount} cells where the ${reading.header ? 'header has' : 'first row has'} ${headerWidth}; ${why}`);
      errors.push(...rowErrors);
      continue;
    }

    const cell = (field: SpecimenField): string | undefined => {
      const c = column.get(field);
      return c === undefined ? undefined : (cells[c.index] ?? '').trim();
    };

    const idColumn = column.get('id')!;
    const id = cell('id') ?? '';
    if (id === '') fail(idColumn, 'must not be empty');
    else if (firstRowOfId.has(id)) fail(idColumn, `"${id}" is already used on row ${firstRowOfId.get(id)}`);

    const numbers = {} as Record<'diameter_mm' | 'thickness_mm' | 'peakLoad_kN', number>;
    for (const c of numericColumns) {
      const raw = cell(c.field) ?? '';
      let written = raw;
      if (separator !== ',') {
        try {
          written = normaliseDecimalComma(raw);
        } catch (err) {
          fail(c, err instanceof Error ? err.message : String(err));
          continue;
        }
        if (written !== raw) reading.decimalComma = true;
      }
      const value = DECIMAL.test(written) ? (c.factor === 1 ? Number(written) : tidy(Number(written) * c.factor)) : Number.NaN;
      if (value > 0 && Number.isFinite(value)) {
        numbers[c.field as keyof typeof numbers] = value;
      } else {
        const hint = separator === ',' && /^[+]?\d+,\d+$/.test(raw) ? ' (use a point as the decimal separator)' : '';
        fail(c, `must be a number > 0 (${c.unit}), got ${JSON.stringify(raw)}${hint}`);
      }
    }

    const validText = (cell('valid') ?? '').toLowerCase();
    let valid = true;
    if (validText === '' || TRUE_WORDS.has(validText)) valid = true;
    else if (FALSE_WORDS.has(validText)) valid = false;
    else fail(column.get('valid')!, `must be true/false, yes/no, y/n, ok or 1/0, got ${JSON.stringify(cell('valid'))}`);

    if (id !== '' && !firstRowOfId.has(id)) firstRowOfId.set(id, row);
    if (rowErrors.length > 0) {
      errors.push(...rowErrors);
      continue;
    }
    specimens.push({
      id,
      diameter_mm: numbers.diameter_mm,
      thickness_mm: numbers.thickness_mm,
      peakLoad_kN: numbers.peakLoad_kN,
      valid,
    });
  }
  if (reading.decimalComma) reading.exact = false;
  return result();
}
