/**
 * The checks table's rows for the app: the report's own check rows (`src/report/check-rows`,
 * the single source of FS, target, status and notes shared with the report and the CSV), with
 * what the app adds — the trace path of each number and its display quantity — and a
 * one-sentence verdict. No mechanics here.
 */
import type { Mode, Project, Report } from '../../model/types';
import type { Quantity } from '../../model/units';
import { checkRows as reportCheckRows, MODES, MODE_NAME, MODE_LABEL, type CheckRow as ReportCheckRow } from '../../report/check-rows';
import { checkStatus } from '../../report/status';
import { numberText } from '../../report/number-text';

export { MODES, MODE_NAME, MODE_LABEL };

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
  row: ReportCheckRow;
  layer: number;
  mode: Mode;
  demand: CheckValue | null;
  capacity: CheckValue | null;
  /** Trace path of the FS, when the report holds it as a field. */
  fsPath: string | null;
  note: string;
}

const fix = (v: number) => numberText(v, 3);

function sameNumber(a: number | null | undefined, b: number | null | undefined): boolean {
  return a !== null && a !== undefined && b !== null && b !== undefined && a === b;
}

/** Every check row, in the report's order (layers, then modes). */
export function checkRowViews(project: Project, report: Report): CheckRowView[] {
  return reportCheckRows(project, report).map((row) => {
    const i = row.layerIndex;
    const lr = report.layers[i]!;
    const v = lr.voussoir;
    let demand: CheckValue | null = null;
    let capacity: CheckValue | null = null;
    let fsPath: string | null = null;
    let note = row.note;
    switch (row.mode) {
      case 'tension': {
        demand = lr.plate
          ? { value: lr.plate.maxTension_MPa, quantity: 'stress', path: `layers[${i}].plate.maxTension_MPa`, qualifier: `at ${lr.plate.at}` }
          : { value: lr.elastic.maxTension_MPa, quantity: 'stress', path: `layers[${i}].elastic.maxTension_MPa`, qualifier: `at ${lr.elastic.at}` };
        capacity = { value: lr.strength.design_MPa, quantity: 'stress', path: `layers[${i}].strength.design_MPa` };
        if (sameNumber(row.fs, lr.elastic.fsTension)) fsPath = `layers[${i}].elastic.fsTension`;
        if (lr.strength.crossJointed) {
          const spacing = project.layers[i]?.jointing.crossJointSpacing_m;
          const why =
            `cross-joints every ${spacing !== null && spacing !== undefined ? fix(spacing) + ' m' : '—'} cut the ` +
            `${fix(project.opening.span_m)} m span, and no tension is carried across open joints (design tensile strength 0)`;
          note = row.fs === null ? `FS not applicable: ${why}; the voussoir checks decide.` : `${note} — ${why}.`;
        } else if (row.fs === null) {
          note = `FS not applicable: ${note}.`;
        }
        break;
      }
      case 'crushing':
        if (v && v.maxCompression_MPa !== null) {
          demand = { value: v.maxCompression_MPa, quantity: 'stress', path: `layers[${i}].voussoir.maxCompression_MPa`, qualifier: 'arch fc' };
        }
        if (row.capacity !== null) capacity = { value: row.capacity, quantity: 'stress', path: null, qualifier: 'UCS as given' };
        if (v && sameNumber(row.fs, v.fsCrushing)) fsPath = `layers[${i}].voussoir.fsCrushing`;
        break;
      case 'sliding':
        if (v && sameNumber(row.fs, v.fsSliding)) fsPath = `layers[${i}].voussoir.fsSliding`;
        break;
      case 'deflection':
        if (v && v.deflectionRatio !== null) {
          demand = { value: v.deflectionRatio, quantity: null, path: `layers[${i}].voussoir.deflectionRatio`, qualifier: 'δ/t' };
        }
        if (row.capacity !== null) capacity = { value: row.capacity, quantity: null, path: null, qualifier: 'limit' };
        break;
      case 'snapThrough':
        break;
    }
    if (v && v.snapThrough && row.mode !== 'snapThrough' && row.mode !== 'tension') {
      note = 'No value: the voussoir snaps through at this span (no compression arch can form).';
    }
    return { row, layer: i, mode: row.mode, demand, capacity, fsPath, note };
  });
}

/**
 * One sentence on the governing check and what the design basis makes of it, e.g.
 * "Governing: tension in Shale roof, FS 0.404 against a target of 4 (below ✗) — the intact beam
 *  would crack; as a cracked voussoir it stands (least FS crushing 29.7, sliding 4.65)."
 */
export function verdictSentence(project: Project, report: Report, views = checkRowViews(project, report)): string {
  const g = report.governing;
  if (!g) return 'No check applies to this roof, so nothing governs.';
  const rows = views.map((v) => v.row);
  const gRow = rows.find((r) => r.layer === g.layer && r.mode === g.mode);
  const target = gRow?.target ?? 1;
  const status = checkStatus(g.fs, target);
  const head =
    g.mode === 'snapThrough'
      ? `Governing: snap-through in ${g.layer} (${status.text})`
      : `Governing: ${MODE_NAME[g.mode]} in ${g.layer}, FS ${fix(g.fs)} against a target of ${fix(target)} (${status.text})`;

  const cantilever = project.opening.type === 'cantilever';
  const tension = rows.filter((r) => r.mode === 'tension' && r.fs !== null);
  const tensionShort = tension.filter((r) => (r.fs as number) < r.target);
  const cracks = tension.some((r) => (r.fs as number) < 1);
  const arch = rows.filter((r) => r.mode !== 'tension');
  const snaps = arch.some((r) => r.mode === 'snapThrough' && r.fs === 0);
  const archShort = arch.filter((r) => r.mode !== 'snapThrough' && r.fs !== null && (r.fs as number) < r.target);
  const least = (mode: Mode) => {
    const values = arch.filter((r) => r.mode === mode && r.fs !== null).map((r) => r.fs as number);
    return values.length ? Math.min(...values) : null;
  };
  const c = least('crushing');
  const s = least('sliding');
  const margins = [c !== null ? `crushing ${fix(c)}` : null, s !== null ? `sliding ${fix(s)}` : null].filter(Boolean).join(', ');
  const archText = snaps
    ? 'as a cracked voussoir it would snap through'
    : archShort.length
      ? `as a cracked voussoir it falls short too (${archShort.map((r) => `${MODE_NAME[r.mode]} in ${r.layer} FS ${fix(r.fs as number)}`).join('; ')})`
      : `as a cracked voussoir it stands${margins ? ` (least FS ${margins})` : ''}`;

  let tail: string;
  if (cantilever) {
    tail = tensionShort.length
      ? 'the overhang would crack, and a cracked overhang has no arch to fall back on'
      : 'the intact overhang keeps its tension target; a cracked overhang would have no reserve';
  } else if (project.design.basis === 'jointed') {
    tail = `basis "jointed": the roof is taken as cracked and ${archText}; tension is shown for information only`;
  } else if (tension.length === 0) {
    tail = `no layer is checked in tension at this span (cross-jointed or no net tension), and ${archText}`;
  } else if (cracks) {
    tail = `the intact beam would crack; ${archText}`;
  } else if (tensionShort.length) {
    tail = `the intact beam does not crack but its tension margin is short; ${archText}`;
  } else {
    tail = `the intact beam keeps its tension target; if it cracked, ${archText.replace('as a cracked voussoir it', 'the voussoir')}`;
  }
  return `${head} — ${tail}.`;
}
