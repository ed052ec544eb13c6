/**
 * CSV exports (d3-dsv `csvFormat`, RFC 4180 quoting): the per-layer check results, one row per
 * layer × mode (and the whole roof's P_f row, with an empty layer number, when an uncertainty
 * run with an acceptable P_f is in the report), and the FS-versus-span curve. Units are in the
 * column names (P_f and δ/t are plain numbers in the ratio columns); numbers are written at full precision in the chosen unit system; a value that does not apply is an empty
 * cell. Text cells that a spreadsheet would evaluate (`=…`, `+…`, `-…`, `@…`) get a leading
 * apostrophe (`csv-cell.ts`, OWASP "CSV Injection"); numbers are never touched. The caution is
 * not written into the CSV (a data table must parse as one); it is in every report that shows
 * these numbers.
 *
 *     resultsCsv(analysis, 'SI', project)  // "layer,layer_name,mode,demand_MPa,…"
 *     spanCurveCsv(curve, 'US')            // "span_ft,fs_tension,…"
 */
import { csvFormat } from 'd3-dsv';
import type { Analysis, SpanCurve } from '../analysis/types';
import type { Mode, Project } from '../model/types';
import { displayUnit, fileUnit, toDisplay, unitLabel, type UnitSystem } from '../model/units';
import { MODES, STATUS_SYMBOL, STATUS_WORD } from '../analysis/check-labels';
import { csvSafeRow } from './csv-cell';

/** In the display unit; when that is the file unit the value is written untouched (exact round trip). */
function display(value: number | null, quantity: 'stress' | 'length', units: UnitSystem): number | '' {
  if (value === null || !Number.isFinite(value)) return '';
  return displayUnit(quantity, units) === fileUnit(quantity) ? value : toDisplay(value, quantity, units);
}

const plain = (value: number | null): number | '' => (value === null || !Number.isFinite(value) ? '' : value);

/** Column-name form of a display unit: "MPa", "psi", "m", "ft". */
const unitKey = (quantity: 'stress' | 'length', units: UnitSystem): string => unitLabel(quantity, units).replace(/[^A-Za-z0-9]/g, '');

export function resultsCsv(analysis: Analysis, units: UnitSystem, _project?: Project): string {
  const stress = unitKey('stress', units);
  const columns = [
    'layer', 'layer_name', 'mode', `demand_${stress}`, `capacity_${stress}`, 'demand_ratio', 'limit_ratio',
    'fs', 'target', 'fs_over_target', 'counts', 'status', 'symbol', 'governing', 'reason', 'note',
  ];
  const g = analysis.report.governing;
  const rows = analysis.report.checks.map((r) => csvSafeRow({
    layer: r.layerIndex === null ? '' : r.layerIndex + 1,
    layer_name: r.layer,
    mode: r.mode,
    [`demand_${stress}`]: r.unit === 'MPa' ? display(r.demand, 'stress', units) : '',
    [`capacity_${stress}`]: r.unit === 'MPa' ? display(r.capacity, 'stress', units) : '',
    // Plain numbers: δ/t and its limit, or the P_f row's upper end and the acceptable P_f.
    demand_ratio: r.unit === 'ratio' || r.unit === 'probability' ? plain(r.demand) : '',
    limit_ratio: r.unit === 'ratio' || r.unit === 'probability' ? plain(r.capacity) : '',
    fs: plain(r.fs),
    target: r.target,
    fs_over_target: r.fs === null ? '' : r.fs / r.target,
    counts: r.counts ? 'yes' : 'no',
    status: STATUS_WORD[r.status],
    symbol: STATUS_SYMBOL[r.status],
    governing: g !== null && g.layerIndex === r.layerIndex && g.mode === r.mode ? 'yes' : 'no',
    reason: r.reason ?? '',
    note: r.note,
  }));
  return `${csvFormat(rows, columns)}\n`;
}

export function spanCurveCsv(curve: SpanCurve, units: UnitSystem): string {
  const span = `span_${unitKey('length', units)}`;
  const columns = [span, ...MODES.map((m) => `fs_${m}`), ...MODES.map((m) => `target_${m}`)];
  const rows = curve.spans_m.map((s, i) => {
    const row: Record<string, number | ''> = { [span]: display(s, 'length', units) };
    for (const m of MODES as Mode[]) row[`fs_${m}`] = plain(curve.fs[m]?.[i] ?? null);
    for (const m of MODES as Mode[]) row[`target_${m}`] = curve.targets[m];
    return csvSafeRow(row);
  });
  return `${csvFormat(rows, columns)}\n`;
}
