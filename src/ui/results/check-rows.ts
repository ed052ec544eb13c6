/**
 * The checks table's rows for the app: the analysis' check table (`report.checks`, the single
 * source of FS, target, counting, reason and status shared with the report, the CSV and the
 * CLI), with what the app adds — the trace path of each number and its display quantity.
 * No mechanics and no counting rules here.
 */
import type { CheckMode, CheckRow, Report } from '../../model/types';
import type { Quantity } from '../../model/units';

export interface CheckValue {
  /** In file units (MPa, m, …) or a plain ratio. */
  value: number;
  quantity: Quantity | null;
  /** Report field path with a trace entry, or null for a project input. */
  path: string | null;
  /** Short qualifier after the value, e.g. "at abutment". */
  qualifier?: string;
}

export interface CheckRowView {
  row: CheckRow;
  /** The layer's index; null for the whole roof's P_f row. */
  layer: number | null;
  mode: CheckMode;
  /** True for the row `report.governing` names (by layer index and mode). */
  governing: boolean;
  demand: CheckValue | null;
  capacity: CheckValue | null;
  /** Trace path of the FS, when the report holds it as a field. */
  fsPath: string | null;
  /** The row's reason (when it does not count) and how to read it. */
  note: string;
}

function sameNumber(a: number | null | undefined, b: number | null | undefined): boolean {
  return a !== null && a !== undefined && b !== null && b !== undefined && a === b;
}

/** The whole roof's P_f row (METHODS §16): the interval's upper end against the acceptable P_f. */
function probabilityView(row: CheckRow): CheckRowView {
  const note = row.note;
  return {
    row, layer: null, mode: row.mode, governing: false,
    demand: row.demand === null ? null : { value: row.demand, quantity: null, path: null, qualifier: 'P_f, 95 % upper end' },
    capacity: row.capacity === null ? null : { value: row.capacity, quantity: null, path: null, qualifier: 'acceptable P_f' },
    fsPath: null, note,
  };
}

/** Every check row, in the report's order (layers, then modes; the whole roof's P_f row last). */
export function checkRowViews(report: Report): CheckRowView[] {
  const g = report.governing;
  return report.checks.map((row) => {
    const i = row.layerIndex;
    if (i === null) return probabilityView(row);
    const lr = report.layers[i]!;
    const v = lr.voussoir;
    let demand: CheckValue | null = null;
    let capacity: CheckValue | null = null;
    let fsPath: string | null = null;
    switch (row.mode) {
      case 'tension': {
        demand = lr.plate
          ? { value: lr.plate.maxTension_MPa, quantity: 'stress', path: `layers[${i}].plate.maxTension_MPa`, qualifier: `at ${lr.plate.at}` }
          : { value: lr.elastic.maxTension_MPa, quantity: 'stress', path: `layers[${i}].elastic.maxTension_MPa`, qualifier: `at ${lr.elastic.at}` };
        capacity = { value: lr.strength.design_MPa, quantity: 'stress', path: `layers[${i}].strength.design_MPa` };
        if (sameNumber(row.fs, lr.elastic.fsTension)) fsPath = `layers[${i}].elastic.fsTension`;
        break;
      }
      case 'crushing':
        if (row.demand !== null) demand = { value: row.demand, quantity: 'stress', path: null, qualifier: 'fc + σh' };
        if (row.capacity !== null) capacity = { value: row.capacity, quantity: 'stress', path: null, qualifier: 'crushing strength' };
        if (v && sameNumber(row.fs, v.fsCrushing)) fsPath = `layers[${i}].voussoir.fsCrushing`;
        break;
      case 'sliding':
        if (v && sameNumber(row.fs, v.fsSliding)) fsPath = `layers[${i}].voussoir.fsSliding`;
        break;
      case 'deflection':
        if (v && v.deflectionRatio !== null && row.demand !== null) {
          demand = { value: row.demand, quantity: null, path: `layers[${i}].voussoir.deflectionRatio`, qualifier: 'δ/t' };
        }
        if (row.capacity !== null) capacity = { value: row.capacity, quantity: null, path: null, qualifier: 'limit' };
        break;
      case 'snapThrough':
        break;
      case 'skin':
        if (row.demand !== null) demand = { value: row.demand, quantity: 'stress', path: null, qualifier: 'between bolts' };
        if (row.capacity !== null) capacity = { value: row.capacity, quantity: 'stress', path: null, qualifier: 'strength' };
        break;
      case 'bolt':
        if (row.demand !== null) demand = { value: row.demand, quantity: 'boltForce', path: sameNumber(row.demand, report.support?.bolts?.load_kN) ? 'support.bolts.load_kN' : null, qualifier: 'per bolt' };
        if (row.capacity !== null) capacity = { value: row.capacity, quantity: 'boltForce', path: null, qualifier: 'capacity' };
        if (sameNumber(row.fs, report.support?.bolts?.fsBolt)) fsPath = 'support.bolts.fsBolt';
        break;
      case 'interlayerShear':
        if (row.demand !== null) demand = { value: row.demand, quantity: 'pressure', path: null, qualifier: 'τ at the interface' };
        if (row.capacity !== null) capacity = { value: row.capacity, quantity: 'pressure', path: null, qualifier: 'bolt resistance' };
        break;
    }
    const note = row.reason ? `Not counted: ${row.reason}. ${row.note}` : row.note;
    return { row, layer: i, mode: row.mode, governing: g !== null && g.layerIndex === i && g.mode === row.mode, demand, capacity, fsPath, note };
  });
}
