/**
 * Reads a table of openings (CSV, or tab-separated text from a spreadsheet) for the batch
 * check: one opening per row, each to be checked under the strata of one project file.
 *
 * Columns (headers case-insensitive, any order; the unit is part of the name, SI or US):
 *   name                                  text, required
 *   type                                  beam | slab | cantilever | intersection, required
 *   span_m | span_ft                      clear span (short side of a slab; overhang), required
 *   length_m | length_ft                  long side of a slab, or the wider entry width w2 of an intersection
 *   ends                                  clamped | simple (blank: the project's)
 *   surcharge_kPa | surcharge_psf         (blank: the project's)
 *   support_kPa | support_psf             standing support pressure (blank: the project's)
 *   horizontalStress_MPa | horizontalStress_psi   (blank: the project's)
 * Other columns (notes, areas…) are ignored and listed in `ignored`. Rows are numbered as a
 * spreadsheet shows them (the header is row 1); blank rows are skipped. A row with an error
 * is left out and every problem is reported with its row and column; the other rows are
 * kept. Values come back in the file units (m, kPa, MPa); ranges are checked later by the
 * project validator, so a row meets the same bounds as a project file. Never throws.
 *
 *     parseOpeningsCsv('name,type,span_m\nRoom 1,beam,6')
 *     // { openings: [{ row: 2, name: 'Room 1', type: 'beam', span_m: 6, length_m: null, … }], errors: [], … }
 */
import { csvParseRows, tsvParseRows } from 'd3-dsv';
import type { EndCondition, OpeningType } from './types';
import { fromDisplay, type Quantity } from './units';
import { END_CONDITIONS, OPENING_TYPES } from './validate';

export interface OpeningInput {
  /** 1-based row as a spreadsheet shows it. */
  row: number;
  name: string;
  type: OpeningType;
  span_m: number;
  length_m: number | null;
  ends: EndCondition | null;
  surcharge_kPa: number | null;
  support_kPa: number | null;
  horizontalStress_MPa: number | null;
}

export interface OpeningsCsvError {
  row: number;
  /** The column as written in the header, '' when the whole row or file is concerned. */
  column: string;
  message: string;
}

export interface OpeningsCsv {
  openings: OpeningInput[];
  errors: OpeningsCsvError[];
  /** Header names of the columns that were ignored. */
  ignored: string[];
  /** True when the table as a whole is refused (no header, a bad header, too many rows). */
  tableRefused: boolean;
  /** Header name of each field found, e.g. { span_m: 'span_ft' }: for messages. */
  columns: Partial<Record<OpeningField, string>>;
}

export type OpeningField = 'name' | 'type' | 'span_m' | 'length_m' | 'ends' | 'surcharge_kPa' | 'support_kPa' | 'horizontalStress_MPa';

interface NumericField {
  quantity: Quantity;
  /** Accepted header unit suffixes → display system. */
  units: Record<string, 'SI' | 'US'>;
}

const NUMERIC: Record<Exclude<OpeningField, 'name' | 'type' | 'ends'>, NumericField> = {
  span_m: { quantity: 'length', units: { m: 'SI', ft: 'US' } },
  length_m: { quantity: 'length', units: { m: 'SI', ft: 'US' } },
  surcharge_kPa: { quantity: 'pressure', units: { kpa: 'SI', psf: 'US' } },
  support_kPa: { quantity: 'pressure', units: { kpa: 'SI', psf: 'US' } },
  horizontalStress_MPa: { quantity: 'stress', units: { mpa: 'SI', psi: 'US' } },
};

/** The most rows one table may have (a panel plan has hundreds; this bounds memory and time). */
export const MAX_OPENING_ROWS = 100_000;

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

function fieldOfHeader(header: string): { field: OpeningField; system: 'SI' | 'US' } | null | 'noUnit' {
  const h = header.trim().toLowerCase();
  if (h === 'name' || h === 'type' || h === 'ends') return { field: h, system: 'SI' };
  for (const [field, spec] of Object.entries(NUMERIC) as [keyof typeof NUMERIC, NumericField][]) {
    const stem = field.slice(0, field.lastIndexOf('_')).toLowerCase();
    if (h === stem) return 'noUnit';
    if (!h.startsWith(`${stem}_`)) continue;
    const system = spec.units[h.slice(stem.length + 1)];
    if (system) return { field, system };
  }
  return null;
}

function unitChoices(field: keyof typeof NUMERIC): string {
  const stem = field.slice(0, field.lastIndexOf('_'));
  const units = Object.keys(NUMERIC[field].units).map((u) => (u === 'kpa' ? 'kPa' : u === 'mpa' ? 'MPa' : u));
  return units.map((u) => `${stem}_${u}`).join(' or ');
}

export function parseOpeningsCsv(text: string): OpeningsCsv {
  const result: OpeningsCsv = { openings: [], errors: [], ignored: [], columns: {}, tableRefused: true };
  if (typeof text !== 'string') {
    result.errors.push({ row: 1, column: '', message: 'the openings table must be text' });
    return result;
  }
  const source = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const firstLine = source.slice(0, source.search(/\r?\n|$/));
  const rows = (firstLine.includes('\t') ? tsvParseRows : csvParseRows)(source);
  const headerIndex = rows.findIndex((r) => r.some((c) => c.trim() !== ''));
  if (headerIndex < 0) {
    result.errors.push({ row: 1, column: '', message: 'the table is empty: expected a header row with name, type and span_m' });
    return result;
  }
  // Header: which field each column holds, and in which unit system.
  const header = rows[headerIndex];
  const at: Partial<Record<OpeningField, { index: number; system: 'SI' | 'US' }>> = {};
  header.forEach((name, index) => {
    const found = fieldOfHeader(name);
    const column = name.trim();
    if (found === 'noUnit') {
      const field = (Object.keys(NUMERIC) as (keyof typeof NUMERIC)[]).find((f) => f.toLowerCase().startsWith(`${column.toLowerCase()}_`))!;
      result.errors.push({ row: headerIndex + 1, column, message: `${column}: the unit belongs in the column name: ${unitChoices(field)}` });
    } else if (found === null) {
      if (column !== '') result.ignored.push(column);
    } else if (at[found.field]) {
      result.errors.push({ row: headerIndex + 1, column, message: `${column}: a second column for ${found.field} (already in "${result.columns[found.field]}")` });
    } else {
      at[found.field] = { index, system: found.system };
      result.columns[found.field] = column;
    }
  });
  for (const required of ['name', 'type', 'span_m'] as const) {
    if (!at[required]) {
      const expected = required === 'span_m' ? unitChoices('span_m') : required;
      result.errors.push({ row: headerIndex + 1, column: '', message: `missing column ${expected} (header found: ${header.map((h) => h.trim()).join(', ')})` });
    }
  }
  if (result.errors.length) return result;
  const dataRows = rows.length - headerIndex - 1;
  if (dataRows > MAX_OPENING_ROWS) {
    result.errors.push({ row: headerIndex + 1 + MAX_OPENING_ROWS + 1, column: '', message: `the table has ${dataRows} rows; at most ${MAX_OPENING_ROWS} are read at once (split it into several tables)` });
    return result;
  }
  result.tableRefused = false;

  for (let r = headerIndex + 1; r < rows.length; r++) {
    const cells = rows[r];
    if (cells.every((c) => c.trim() === '')) continue;
    const row = r + 1;
    const problems: OpeningsCsvError[] = [];
    const cell = (field: OpeningField) => (at[field] ? (cells[at[field]!.index] ?? '').trim() : '');
    const fail = (field: OpeningField, message: string) => problems.push({ row, column: result.columns[field] ?? field, message: `${result.columns[field] ?? field}: ${message}` });

    const name = cell('name');
    if (name === '') fail('name', 'every opening needs a name');
    const typeText = cell('type').toLowerCase();
    const type = (OPENING_TYPES as readonly string[]).includes(typeText) ? (typeText as OpeningType) : null;
    if (!type) fail('type', `expected one of ${OPENING_TYPES.join(', ')}, got ${JSON.stringify(cell('type'))}`);
    const endsText = cell('ends').toLowerCase();
    const ends = endsText === '' ? null : (END_CONDITIONS as readonly string[]).includes(endsText) ? (endsText as EndCondition) : undefined;
    if (ends === undefined) fail('ends', `expected one of ${END_CONDITIONS.join(', ')} or blank (the project's), got ${JSON.stringify(cell('ends'))}`);
    const numbers: Partial<Record<keyof typeof NUMERIC, number | null>> = {};
    for (const field of Object.keys(NUMERIC) as (keyof typeof NUMERIC)[]) {
      const text = cell(field);
      if (text === '') {
        numbers[field] = null;
        continue;
      }
      const value = NUMBER.test(text) ? Number(text) : NaN;
      if (!Number.isFinite(value)) {
        const hint = /^[-+]?\d+,\d+$/.test(text) ? ' (use a decimal point, not a comma)' : '';
        fail(field, `expected a number, got ${JSON.stringify(text)}${hint}`);
        continue;
      }
      numbers[field] = at[field]!.system === 'SI' ? value : fromDisplay(value, NUMERIC[field].quantity, 'US');
    }
    if (numbers.span_m === null) fail('span_m', 'every opening needs a span');
    if (problems.length) {
      result.errors.push(...problems);
      continue;
    }
    result.openings.push({
      row,
      name,
      type: type!,
      span_m: numbers.span_m!,
      length_m: numbers.length_m ?? null,
      ends: ends ?? null,
      surcharge_kPa: numbers.surcharge_kPa ?? null,
      support_kPa: numbers.support_kPa ?? null,
      horizontalStress_MPa: numbers.horizontalStress_MPa ?? null,
    });
  }
  return result;
}
