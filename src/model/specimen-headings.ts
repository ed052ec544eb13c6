/**
 * Column headings of a Brazilian-test table, recognised by meaning rather than by exact name:
 * "Sample", "Dia (mm)", "Thk [in]", "Load kN", "P (lbf)", "Valid", as well as the file's own
 * names (id, diameter_mm, thickness_mm, peakLoad_kN, valid). A unit in the heading — in
 * brackets, after an underscore or after a space — sets the factor to the file units (mm, kN).
 *
 * Conversion factors are exact by definition (NIST SP 811, Appendix B): 1 in = 25.4 mm,
 * 1 lbf = 4.4482216152605 N, 1 kip = 1000 lbf.
 *
 *     recogniseHeading('Dia (mm)')    // { field: 'diameter_mm', unit: 'mm', factor: 1, exact: false }
 *     recogniseHeading('Load (lbf)')  // { field: 'peakLoad_kN', unit: 'lbf', factor: 0.0044482216152605, … }
 *     recogniseHeading('notes')       // undefined (an extra column, ignored)
 */

export type SpecimenField = 'id' | 'diameter_mm' | 'thickness_mm' | 'peakLoad_kN' | 'valid';

export const SPECIMEN_FIELDS: readonly SpecimenField[] = ['id', 'diameter_mm', 'thickness_mm', 'peakLoad_kN', 'valid'];

/** What each field is called in messages and previews. */
export const FIELD_WORDS: Readonly<Record<SpecimenField, string>> = {
  id: 'id',
  diameter_mm: 'diameter',
  thickness_mm: 'thickness',
  peakLoad_kN: 'peak load',
  valid: 'valid break',
};

export type HeadingReading =
  | {
      field: SpecimenField;
      /** The unit as read from the heading, or the file unit when none was given ('' for id, valid). */
      unit: string;
      /** Multiplies a value in `unit` to the file unit (mm or kN). */
      factor: number;
      /** True when the heading is the file's own column name (no interpretation). */
      exact: boolean;
      /** True when the heading gave no unit and the file unit is assumed. */
      assumed: boolean;
    }
  | { field: SpecimenField; error: string };

const NAMES: ReadonlyArray<[SpecimenField, readonly string[]]> = [
  ['id', ['id', 'sample', 'sampleid', 'sampleno', 'samplenr', 'specimen', 'specimenid', 'specimenno', 'no', 'nr', 'number', '#', 'ref', 'disc', 'discid', 'name', 'label']],
  ['diameter_mm', ['diameter', 'dia', 'diam', 'd']],
  ['thickness_mm', ['thickness', 'thk', 'thick', 'length', 'len', 'l', 't']],
  ['peakLoad_kN', ['peakload', 'load', 'p', 'peak', 'pmax', 'maxload', 'failureload', 'force', 'peakforce']],
  ['valid', ['valid', 'validbreak', 'validyn', 'validy/n', 'ok', 'yn', 'y/n', 'accepted', 'use', 'used', 'centralbreak', 'centralfracture']],
];

const FIELD_OF_NAME = new Map<string, SpecimenField>(NAMES.flatMap(([field, names]) => names.map((n) => [n, field] as [string, SpecimenField])));

const LBF_KN = 4.4482216152605e-3;
const LENGTH_UNITS: Readonly<Record<string, number>> = { mm: 1, cm: 10, m: 1000, in: 25.4, inch: 25.4, inches: 25.4, '"': 25.4 };
const FORCE_UNITS: Readonly<Record<string, number>> = { kn: 1, n: 1e-3, lbf: LBF_KN, lb: LBF_KN, lbs: LBF_KN, kip: LBF_KN * 1000, kips: LBF_KN * 1000 };
const UNIT_WORD = /^(mm|cm|m|in|inch|inches|"|kn|n|lbf|lbs?|kips?)$/i;

const FILE_UNIT: Readonly<Record<SpecimenField, string>> = { id: '', diameter_mm: 'mm', thickness_mm: 'mm', peakLoad_kN: 'kN', valid: '' };

/** Split "Dia (mm)", "Dia [mm]", "diameter_mm", "Load kN" into a name and a unit. */
function splitHeading(text: string): { name: string; unit: string | null } {
  const s = text.trim();
  const bracket = /^(.*?)[\s_,]*[([]\s*([^)\]]*?)\s*[)\]]\s*$/.exec(s);
  if (bracket && bracket[1] !== '') return { name: bracket[1], unit: bracket[2] };
  const tail = /^(.+?)(?:_|\s+|,\s*)([A-Za-z"]+)$/.exec(s);
  if (tail && UNIT_WORD.test(tail[2])) return { name: tail[1], unit: tail[2] };
  return { name: s, unit: null };
}

const normaliseName = (name: string): string => name.toLowerCase().replace(/[^a-z0-9#/]/g, '');

/**
 * The field a heading means, with its unit factor; `undefined` for a heading that names no
 * field (an extra column); `{ field, error }` for a known field with a unit of the wrong kind.
 */
export function recogniseHeading(heading: string): HeadingReading | undefined {
  if (typeof heading !== 'string') return undefined;
  const { name, unit } = splitHeading(heading);
  const field = FIELD_OF_NAME.get(normaliseName(name));
  if (field === undefined) return undefined;
  const exact = heading.trim().toLowerCase() === field.toLowerCase();
  if (field === 'id' || field === 'valid') return { field, unit: '', factor: 1, exact, assumed: false };
  const table = field === 'peakLoad_kN' ? FORCE_UNITS : LENGTH_UNITS;
  if (unit === null || unit === '') return { field, unit: FILE_UNIT[field], factor: 1, exact, assumed: true };
  const factor = table[unit.toLowerCase()];
  if (factor === undefined) {
    const kinds = field === 'peakLoad_kN' ? 'a force: kN, N, lbf or kip' : 'a length: mm, cm, m or in';
    return { field, error: `unit ${JSON.stringify(unit)} is not ${kinds}` };
  }
  const shown = field === 'peakLoad_kN' ? ({ kn: 'kN', n: 'N', lb: 'lbf', lbs: 'lbf', kips: 'kip' }[unit.toLowerCase()] ?? unit.toLowerCase()) : unit === '"' ? 'in' : unit.toLowerCase().replace(/^inch(es)?$/, 'in');
  return { field, unit: shown, factor, exact, assumed: false };
}
