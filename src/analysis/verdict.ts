/**
 * The one verdict, as data: plain sentences written from the check table (never re-deriving
 * which checks count or which layer governs), covering the intact beam and the cracked
 * voussoir, which of them counts, the overall result and the largest span (an "overhang" for
 * a cantilever, an "entry width" for an intersection). The report, the app's verdict line and
 * the CLI render these sentences.
 *
 *     buildVerdict(project, report, 'SI').sentences.map((s) => s.text)
 */
import type { CheckRow, CheckStatusKind, Governing, Project, Report } from '../model/types';
import { formatQuantity, type UnitSystem } from '../model/units';
import { inOpeningWords, openingWords } from '../model/span-wording';
import { MODE_NAME, STATUS_SYMBOL, VOUSSOIR_MODES } from './check-labels';
import { allCountedMeet } from './check-table';

export type VerdictSentenceId = 'governing' | 'intact' | 'cracked' | 'basis' | 'result' | 'span';

export interface VerdictSentence {
  id: VerdictSentenceId;
  text: string;
  /** Shown in bold: the governing check and the result. */
  strong: boolean;
}

export interface Verdict {
  governing: Governing | null;
  /** Status of the governing row ("meets" / "below"), null when nothing counts. */
  status: CheckStatusKind | null;
  /**
   * Every counted row together: "below" when any is below its target, "meets" when none is,
   * null when nothing counts. It differs from `status` only through the P_f row, which counts
   * but never governs (a governing FS that meets, an acceptable P_f not shown to be met).
   */
  overall: CheckStatusKind | null;
  /** Counted rows with a value, and how many of them are below target. */
  counted: number;
  below: number;
  /** What the opening's length is called: "span", "overhang" or "entry width". */
  spanWord: 'span' | 'overhang' | 'entry width';
  /** Largest span meeting every counted target (entered units, m), null when none found. */
  largestSpan_m: number | null;
  sentences: VerdictSentence[];
}

const fix = (x: number): string => String(+x.toPrecision(3));

/** "layer 2 “Sandstone”" — how a sentence names a layer. */
export function layerPhrase(index: number, name: string): string {
  return `layer ${index + 1} “${name}”`;
}

function least(rows: readonly CheckRow[]): CheckRow | null {
  let best: CheckRow | null = null;
  for (const r of rows) {
    if (r.fs === null || (r.mode === 'snapThrough' && r.fs > 0)) continue;
    if (best === null || r.fs / r.target < (best.fs as number) / best.target) best = r;
  }
  return best;
}

const fsAgainst = (row: CheckRow): string => `FS ${fix(row.fs as number)} against a target of ${fix(row.target)}`;
const who = (row: CheckRow): string => (row.layerIndex === null ? `the ${row.layer}` : layerPhrase(row.layerIndex, row.layer));

export function spanWordOf(project: Project): Verdict['spanWord'] {
  return openingWords(project.opening.type).span as Verdict['spanWord'];
}

function governingSentence(report: Report): string {
  const g = report.governing;
  if (g === null) return 'No check counts for this roof at this span, so nothing governs.';
  const name = layerPhrase(g.layerIndex, g.layer);
  if (g.mode === 'snapThrough') return `Governing check: snap-through of ${name} — no compression arch can form at this span (counted as FS 0) ${STATUS_SYMBOL.below}.`;
  const how = g.mode === 'deflection' ? ' (FS = deflection limit / (δ/t))' : '';
  const verdict = g.fs >= g.target * (1 - 1e-9) ? `meets the target ${STATUS_SYMBOL.meets}` : `is below the target ${STATUS_SYMBOL.below}`;
  return `Governing check: ${MODE_NAME[g.mode]} in ${name}, FS ${fix(g.fs)}${how} against a target of ${fix(g.target)} — it ${verdict}.`;
}

function countNote(rows: readonly CheckRow[]): string {
  const counted = rows.filter((r) => r.counts);
  if (counted.length === 0) {
    const reason = rows.find((r) => r.reason)?.reason;
    return reason ? ` Not counted (${reason}).` : ' Not counted.';
  }
  if (counted.length === rows.filter((r) => r.fs !== null).length) return ' It counts.';
  const layers = [...new Set(counted.flatMap((r) => (r.layerIndex === null ? [] : [r.layerIndex + 1])))];
  return ` It counts for layer${layers.length > 1 ? 's' : ''} ${layers.join(', ')} only; the other rows say why not.`;
}

function intactSentence(project: Project, report: Report): string {
  const tension = report.checks.filter((r) => r.mode === 'tension' && r.fs !== null);
  const worst = least(tension);
  const beam = project.opening.type === 'cantilever' ? 'an intact overhang' : 'an intact beam';
  if (worst === null) {
    return `As ${beam}: no layer is checked in tension (each is cross-jointed at this span, carries no net tension or no net load).`;
  }
  const fs = worst.fs as number;
  let text: string;
  if (fs < 1) text = `As ${beam}, ${who(worst)} would crack: its net tension exceeds the design tensile strength (${fsAgainst(worst)}).`;
  else if (fs < worst.target) text = `As ${beam}, ${who(worst)} would not crack, but its margin is short: ${fsAgainst(worst)}.`;
  else text = `As ${beam}, every layer checked in tension keeps its target; the least is ${who(worst)}, ${fsAgainst(worst)}.`;
  return text + countNote(tension);
}

function crackedSentence(project: Project, report: Report): string {
  if (project.opening.type === 'cantilever') {
    return 'As a cracked overhang: an overhang cannot form a compression arch, so it has no post-cracking reserve; the tension check decides.';
  }
  const rows = report.checks.filter((r) => (VOUSSOIR_MODES as readonly string[]).includes(r.mode));
  const snapped = rows.filter((r) => r.mode === 'snapThrough' && r.fs === 0);
  const note = countNote(rows.filter((r) => r.fs !== null));
  if (snapped.length > 0) {
    const names = snapped.map(who).join(', ');
    return `As a cracked voussoir beam it does not stand: ${names} snap${snapped.length > 1 ? '' : 's'} through — no compression arch can form at this span.${note}`;
  }
  const worst = least(rows.filter((r) => r.mode !== 'snapThrough'));
  if (worst === null) return 'As a cracked voussoir beam: no arch check applies (no layer carries a net load).';
  const fs = worst.fs as number;
  if (fs >= worst.target) {
    const margin = fs / worst.target >= 2 ? 'with wide margins' : 'with its targets met';
    return `As a cracked voussoir beam it stands ${margin}: the least is ${MODE_NAME[worst.mode]} in ${who(worst)}, ${fsAgainst(worst)}.${note}`;
  }
  return `As a cracked voussoir beam an arch forms, but ${MODE_NAME[worst.mode]} in ${who(worst)} falls short: ${fsAgainst(worst)}.${note}`;
}

function basisSentence(project: Project): string {
  const target = project.design.fsTarget.tension;
  const strength = project.design.tensileBasis === 'lab'
    ? `tension against the lab strength with the size effect (target ${fix(target)})`
    : `tension against the rock-mass strength (target ${fix(target)})`;
  if (project.opening.type === 'cantilever') {
    return `An overhang has no cracked-beam reserve, so its tension check counts whichever basis is chosen; ${strength}.`;
  }
  return project.design.basis === 'intact'
    ? `Design basis “intact”: a layer that does not crack must not crack, so its ${strength} counts and its voussoir results are post-cracking reserve; a cross-jointed layer is already cracked and its voussoir checks count. A block (span/thickness < 2) never counts its voussoir.`
    : `Design basis “jointed”: the whole roof is taken as already cracked, so tension is shown for information only and the voussoir checks decide (except for blocks, span/thickness < 2).`;
}

/** One row below its target, in the result sentence. */
function belowPhrase(r: CheckRow): string {
  // The P_f row (METHODS §16): judged by the upper end of the 95 % interval, not by an FS.
  if (r.mode === 'probabilityOfFailure') {
    return `the probability of failure of the ${r.layer} (95 % upper end ${fix(r.demand as number)} above the acceptable P_f ${fix(r.capacity as number)})`;
  }
  return `${r.mode === 'snapThrough' ? 'snap-through' : r.mode} in ${who(r)}${r.mode === 'snapThrough' ? '' : ` (FS ${fix(r.fs as number)}, target ${fix(r.target)})`}`;
}

function resultSentence(report: Report): string {
  const below = report.checks.filter((r) => r.status === 'below');
  if (below.length === 0) {
    return report.checks.some((r) => r.counts) ? `Result: every check that counts meets its target ${STATUS_SYMBOL.meets}.` : 'Result: no check counts at this span.';
  }
  const list = below.map(belowPhrase).join('; ');
  return `Result: ${below.length} check${below.length > 1 ? 's' : ''} below target ${STATUS_SYMBOL.below} — ${list}.`;
}

function spanSentence(project: Project, report: Report, units: UnitSystem): string {
  const spans = report.maxSpan_m;
  const what = spanWordOf(project);
  const current = formatQuantity(project.opening.span_m, 'length', units, 3);
  const held = project.opening.type === 'intersection' ? ' (w2/w1 held; the diagonal is analysed)' : project.opening.type === 'slab' ? ' (aspect ratio held)' : '';
  if (spans === null || spans.governing === null) {
    return `Largest ${what}: none could be determined for this roof (current ${what} ${current}).`;
  }
  const word = spans.governing >= project.opening.span_m ? 'at least the' : 'shorter than the';
  let text = `Largest ${what} meeting every counted target${held}: ${formatQuantity(spans.governing, 'length', units, 3)}, ${word} current ${what} of ${current}.`;
  // METHODS §11: sliding never limits the span from above; a shortfall stands at the current span.
  if (report.checks.some((r) => r.mode === 'sliding' && r.status === 'below')) {
    text += ` Sliding is not part of this limit (its FS rises with ${what}), so the sliding shortfall at the current ${what} must be resolved on its own.`;
  }
  return text;
}

export function buildVerdict(project: Project, report: Report, units: UnitSystem = 'SI'): Verdict {
  const g = report.governing;
  const row = g ? report.checks.find((r) => r.layerIndex === g.layerIndex && r.mode === g.mode) ?? null : null;
  const counted = report.checks.filter((r) => r.counts);
  return {
    governing: g,
    status: row ? row.status : null,
    overall: counted.length === 0 ? null : allCountedMeet(report.checks) ? 'meets' : 'below',
    counted: counted.length,
    below: counted.filter((r) => r.status === 'below').length,
    spanWord: spanWordOf(project),
    largestSpan_m: report.maxSpan_m?.governing ?? null,
    sentences: ([
      { id: 'governing', strong: true, text: governingSentence(report) },
      { id: 'intact', strong: false, text: intactSentence(project, report) },
      { id: 'cracked', strong: false, text: crackedSentence(project, report) },
      { id: 'basis', strong: false, text: basisSentence(project) },
      { id: 'result', strong: true, text: resultSentence(report) },
      { id: 'span', strong: false, text: spanSentence(project, report, units) },
    ] satisfies VerdictSentence[]).map((s) => ({ ...s, text: inOpeningWords(s.text, project.opening.type) })),
  };
}
