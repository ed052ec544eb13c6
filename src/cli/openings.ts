/**
 * `lamina openings STRATA.lamina.json OPENINGS.csv`: the batch check. Every row of the
 * openings table is checked under the strata, loads and targets of the project file, and one
 * results row per opening is written: a table on stdout, CSV with `--csv OUT.csv`, JSON with
 * `--json` (an array) or `--jsonl` (one line per opening). Bad rows are refused on stderr
 * with their row and column and the good rows are still checked and written; the exit code
 * is the worst over the rows. A progress line is drawn on stderr only when it is a terminal.
 */
import { csvFormatRows } from 'd3-dsv';
import { checkOpening, type OpeningResult } from '../analysis/openings';
import { parseOpeningsCsv, type OpeningField, type OpeningsCsv } from '../model/openings-csv';
import { displayUnit, fileUnit, formatQuantity, toDisplay, unitLabel, type Quantity, type UnitSystem } from '../model/units';
import { modeName } from '../analysis/check-labels';
import { openingWords } from '../model/span-wording';
import { numberText } from '../report/number-text';
import { UsageError, type ParsedArgs } from './args';
import { neutraliseCsvText as safeCsvText } from '../report/csv-cell';
import { EXIT_BELOW, EXIT_MEETS, EXIT_REFUSED, worstExit, type ExitCode } from './exit-codes';
import { InputError, parseProjectText, printWarnings, unitsFlag } from './input';
import { expandInputs, readSource } from './inputs';
import type { Io } from './io';
import { writeOutput } from './output';
import { caution } from './text-report';

/** Where a validator path of an opening row comes from in the table. */
const FIELD_OF_PATH: Record<string, OpeningField> = {
  'opening.type': 'type',
  'opening.span_m': 'span_m',
  'opening.length_m': 'length_m',
  'opening.ends': 'ends',
  'loads.surcharge_kPa': 'surcharge_kPa',
  'support.standing_kPa': 'support_kPa',
  'loads.horizontalStress_MPa': 'horizontalStress_MPa',
};

function columnOf(path: string, table: OpeningsCsv): string {
  const field = FIELD_OF_PATH[path];
  return field ? (table.columns[field] ?? field) : '';
}

/** Draws "openings 1200/10000" on a terminal's stderr at most every 200 ms. */
function progress(io: Io, total: number): { tick: (done: number) => void; end: () => void } {
  if (!io.errIsTty || total < 2) return { tick: () => {}, end: () => {} };
  let last = 0;
  const draw = (done: number) => io.err(`\rlamina: openings checked ${done}/${total} (${Math.floor((100 * done) / total)} %)`);
  return {
    tick: (done) => {
      const now = Date.now();
      if (now - last >= 200) {
        last = now;
        draw(done);
      }
    },
    end: () => io.err('\r\x1b[K'),
  };
}

const q = (v: number | null, quantity: Quantity, units: UnitSystem): number | '' => (v === null ? '' : displayUnit(quantity, units) === fileUnit(quantity) ? v : toDisplay(v, quantity, units));
const key = (stem: string, quantity: Quantity, units: UnitSystem) => `${stem}_${unitLabel(quantity, units).replace(/[^A-Za-z0-9]/g, '')}`;

/** The results as CSV rows in the chosen units (units in the column names). */
export function openingsCsv(results: readonly OpeningResult[], units: UnitSystem): string {
  const header = [
    'row', 'name', 'type', key('span', 'length', units), key('length', 'length', units), 'ends',
    key('surcharge', 'pressure', units), key('support', 'pressure', units), key('horizontalStress', 'stress', units),
    'status', 'governing_layer', 'governing_mode', 'fs', 'target', key('maxSpan', 'length', units), 'warnings',
  ];
  const rows = results.map((r) => [
    r.row, safeCsvText(r.name), r.opening.type, q(r.opening.span_m, 'length', units), q(r.opening.length_m, 'length', units),
    r.opening.type === 'cantilever' ? '' : r.opening.ends,
    q(r.loads.surcharge_kPa, 'pressure', units), q(r.support.standing_kPa, 'pressure', units), q(r.loads.horizontalStress_MPa, 'stress', units),
    r.status, r.governing ? safeCsvText(r.governing.layer) : '', r.governing?.mode ?? '', r.governing?.fs ?? '', r.governing?.target ?? '',
    q(r.maxSpan_m, 'length', units), safeCsvText(r.warnings.join('; ')),
  ]);
  return csvFormatRows([header, ...rows.map((r) => r.map(String))]) + '\n';
}

function textTable(results: readonly OpeningResult[], units: UnitSystem): string[] {
  const L = (v: number | null) => formatQuantity(v, 'length', units);
  const rows = results.map((r) => [
    String(r.row), r.name, r.opening.type, `${L(r.opening.span_m)}${r.opening.length_m !== null ? ` × ${L(r.opening.length_m)}` : ''}`,
    r.governing ? `${modeName(r.governing.mode, r.opening.type)} in ${r.governing.layer}` : 'no check applies',
    r.governing ? numberText(r.governing.fs, 3) : '—', r.governing ? numberText(r.governing.target, 3) : '—',
    r.status === 'meets' ? 'meets ✓' : r.status === 'below' ? 'below ✗' : 'n/a –', L(r.maxSpan_m),
  ]);
  // The length column in the openings' own word: "overhang" when every row is a cantilever.
  const words = new Set(results.map((r) => openingWords(r.opening.type).span === 'overhang' ? 'overhang' : 'span'));
  const word = [...words].sort().reverse().join(' or ') || 'span';
  const header = ['row', 'name', 'type', word, 'governing', 'FS', 'target', 'status', `largest ${word}`];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
  const line = (cells: string[]) => '  ' + cells.map((c, i) => c.padEnd(widths[i])).join('  ').trimEnd();
  return [line(header), ...rows.map(line)];
}

export function runOpenings(args: ParsedArgs, io: Io): ExitCode {
  if (args.positional.length !== 2) throw new UsageError(`openings needs a project file and an openings table (CSV), got ${args.positional.length} file(s)`);
  const units = unitsFlag(args);
  const chosen = (['--json', '--jsonl', '--markdown'] as const).filter((f) => args.flags[f]);
  if (args.flags['--markdown']) throw new UsageError('openings writes a table: use --csv OUT.csv, --json or --jsonl, not --markdown');
  if (chosen.length > 1) throw new UsageError('choose one of --json and --jsonl');
  if (args.flags['--html'] !== undefined) throw new UsageError('openings has no HTML report: use --csv OUT.csv, --json or --jsonl');
  const [strataName, tableName] = args.positional;
  const [strataSource, tableSource] = expandInputs([strataName, tableName]);
  const strata = parseProjectText(strataName, readSource(strataSource, io));
  printWarnings(io.err, strataName, strata.warnings);
  const table = parseOpeningsCsv(readSource(tableSource, io));
  if (table.ignored.length) io.err(`lamina: note: ${tableName}: columns ignored: ${table.ignored.join(', ')}\n`);
  if (table.tableRefused) {
    throw new InputError(`${tableName}:\n` + table.errors.map((e) => `  row ${e.row}${e.column ? `, column ${e.column}` : ''}: ${e.message}`).join('\n'));
  }

  if (table.openings.length === 0 && table.errors.length === 0) throw new InputError(`${tableName}: no opening rows found (columns name, type, span_m, …)`);

  const refusals = table.errors.map((e) => ({ row: e.row, column: e.column, message: e.message }));
  const results: OpeningResult[] = [];
  const bar = progress(io, table.openings.length);
  table.openings.forEach((input, k) => {
    const checked = checkOpening(strata.project, input);
    if (checked.ok) results.push(checked.result);
    else for (const issue of checked.issues) refusals.push({ row: input.row, column: columnOf(issue.path, table), message: issue.path && !issue.message.startsWith(issue.path) ? `${issue.path}: ${issue.message}` : issue.message });
    bar.tick(k + 1);
  });
  bar.end();

  refusals.sort((a, b) => a.row - b.row);
  for (const r of refusals) io.err(`lamina: refused: ${tableName} row ${r.row}${r.column ? `, column ${r.column}` : ''}: ${r.message}\n`);

  if (typeof args.flags['--csv'] === 'string') writeOutput(io, '--csv', args.flags['--csv'], openingsCsv(results, units));
  if (args.flags['--jsonl']) io.out(results.map((r) => JSON.stringify(r) + '\n').join(''));
  else if (args.flags['--json']) io.out(results.length ? `[\n${results.map((r) => JSON.stringify(r)).join(',\n')}\n]\n` : '[]\n');
  else {
    io.out([`Lamina openings — ${strata.project.title}: ${tableName} under the strata of ${strataName}`, caution(), '', ...textTable(results, units), '', caution(), ''].join('\n'));
  }

  const refusedRows = new Set(refusals.map((r) => r.row)).size;
  const meets = results.filter((r) => r.status !== 'below').length;
  const below = results.length - meets;
  io.err(`lamina: ${results.length + refusedRows} openings: ${meets} meet${meets === 1 ? 's' : ''} the targets, ${below} below, ${refusedRows} refused\n`);
  let worst: ExitCode = below ? EXIT_BELOW : EXIT_MEETS;
  if (refusedRows) worst = worstExit(worst, EXIT_REFUSED);
  return worst;
}
