import { csvParseRows, tsvParseRows } from 'd3-dsv';
import type { Specimen } from './types';

export interface SpecimensCsvError {
  /** 1-based row as a spreadsheet shows it (header = row 1 when it is the first line). */
  row: number;
  /** Column name(s) concerned, '' when the whole text is affected. */
  column: string;
  message: string;
}

export interface SpecimensCsv {
  /** Specimens from the rows without errors, in file units (mm, kN). */
  specimens: Specimen[];
  errors: SpecimensCsvError[];
}

const REQUIRED = ['id', 'diameter_mm', 'thickness_mm', 'peakLoad_kN'] as const;
const COLUMNS = [...REQUIRED, 'valid'] as const;
type Column = (typeof COLUMNS)[number];

const NUMERIC: Record<'diameter_mm' | 'thickness_mm' | 'peakLoad_kN', string> = {
  diameter_mm: 'mm',
  thickness_mm: 'mm',
  peakLoad_kN: 'kN',
};

const TRUE_WORDS = new Set(['true', 'yes', '1', 'y']);
const FALSE_WORDS = new Set(['false', 'no', '0', 'n']);
const DECIMAL = /^[+]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

const EXPECTED = 'expected columns id, diameter_mm, thickness_mm, peakLoad_kN and optionally valid';

/**
 * Reads Brazilian-test specimens from CSV text, or tab-separated text pasted from a
 * spreadsheet (a tab in the header line selects tabs). Columns (headers case-insensitive,
 * trimmed, any order, extra columns ignored): id, diameter_mm, thickness_mm, peakLoad_kN,
 * and optionally valid (true/false/yes/no/1/0/y/n, default true). Blank lines are skipped;
 * rows are numbered as a spreadsheet shows them. Rows with errors are left out and every
 * problem is reported with its row and column. Never throws.
 *     parseSpecimensCsv('id,diameter_mm,thickness_mm,peakLoad_kN\nB1,54,27,10')
 *     // { specimens: [{ id: 'B1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 10, valid: true }], errors: [] }
 */
export function parseSpecimensCsv(text: string): SpecimensCsv {
  try {
    return parse(text);
  } catch (error) {
    return { specimens: [], errors: [{ row: 1, column: '', message: `the text could not be read: ${String(error)}` }] };
  }
}

function parse(input: string): SpecimensCsv {
  const errors: SpecimensCsvError[] = [];
  const specimens: Specimen[] = [];
  if (typeof input !== 'string') {
    return { specimens, errors: [{ row: 1, column: '', message: `expected text, got ${typeof input}` }] };
  }
  const text = input.replace(/^\uFEFF/, '');
  const headerLine = text.split(/\r\n|\r|\n/).find((line) => line.trim() !== '') ?? '';
  const rows = headerLine.includes('\t') ? tsvParseRows(text) : csvParseRows(text);
  const blank = (cells: string[]): boolean => cells.every((cell) => cell.trim() === '');

  const headerIndex = rows.findIndex((cells) => !blank(cells));
  if (headerIndex < 0) {
    return { specimens, errors: [{ row: 1, column: '', message: `row 1: no header line; ${EXPECTED}` }] };
  }
  const headerRow = headerIndex + 1;
  const position = new Map<Column, number>();
  rows[headerIndex].forEach((cell, index) => {
    const name = COLUMNS.find((column) => column.toLowerCase() === cell.trim().toLowerCase());
    if (name === undefined) return;
    if (position.has(name)) {
      errors.push({ row: headerRow, column: name, message: `row ${headerRow}, ${name}: the column appears more than once; the first one is used` });
    } else {
      position.set(name, index);
    }
  });
  const missing = REQUIRED.filter((column) => !position.has(column));
  if (missing.length > 0) {
    errors.push({
      row: headerRow,
      column: missing.join(', '),
      message: `row ${headerRow}: missing column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}; ${EXPECTED}`,
    });
    return { specimens, errors };
  }

  const firstRowOfId = new Map<string, number>();
  for (let i = headerIndex + 1; i < rows.length; i++) {
    const cells = rows[i];
    if (blank(cells)) continue;
    const row = i + 1;
    const cell = (column: Column): string | undefined => {
      const index = position.get(column);
      return index === undefined ? undefined : (cells[index] ?? '').trim();
    };
    const rowErrors: SpecimensCsvError[] = [];
    const fail = (column: Column, message: string): void => {
      rowErrors.push({ row, column, message: `row ${row}, ${column}: ${message}` });
    };

    const id = cell('id') ?? '';
    if (id === '') fail('id', 'must not be empty');
    else if (firstRowOfId.has(id)) fail('id', `"${id}" is already used on row ${firstRowOfId.get(id)}`);

    const numbers = {} as Record<keyof typeof NUMERIC, number>;
    for (const column of Object.keys(NUMERIC) as (keyof typeof NUMERIC)[]) {
      const raw = cell(column) ?? '';
      const value = DECIMAL.test(raw) ? Number(raw) : Number.NaN;
      if (value > 0 && Number.isFinite(value)) {
        numbers[column] = value;
      } else {
        const hint = /^[+]?\d+,\d+$/.test(raw) ? ' (use a point as the decimal separator)' : '';
        fail(column, `must be a number > 0 (${NUMERIC[column]}), got ${JSON.stringify(raw)}${hint}`);
      }
    }

    const validText = (cell('valid') ?? '').toLowerCase();
    let valid = true;
    if (validText === '' || TRUE_WORDS.has(validText)) valid = true;
    else if (FALSE_WORDS.has(validText)) valid = false;
    else fail('valid', `must be true/false, yes/no, y/n or 1/0, got ${JSON.stringify(cell('valid'))}`);

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
  return { specimens, errors };
}
