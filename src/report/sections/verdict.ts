/**
 * Section 2: the verdict in plain sentences written from the numbers: the governing check, what
 * the intact beam would do, what the cracked (voussoir) beam would do, which of the two the
 * design basis counts, the overall result and the largest span.
 */
import type { Block, Section } from '../document-types';
import { MODE_NAME, type CheckRow } from '../check-rows';
import { fsText, quantityText } from '../format';
import { numberText } from '../number-text';
import { layerName, type SectionContext } from './context';

const VOUSSOIR_MODES = new Set(['crushing', 'sliding', 'deflection', 'snapThrough']);

function least(rows: CheckRow[]): CheckRow | null {
  let best: CheckRow | null = null;
  for (const r of rows) {
    if (r.fs === null) continue;
    if (best === null || r.fs / r.target < (best.fs as number) / best.target) best = r;
  }
  return best;
}

function fsAgainst(row: CheckRow): string {
  return `FS ${fsText(row.fs)} against a target of ${numberText(row.target, 3)}`;
}

export function governingSentence(ctx: SectionContext): string {
  const g = ctx.analysis.report.governing;
  if (g === null) return 'No check applies to this roof, so there is no governing check.';
  const row = ctx.rows.find((r) => r.layer === g.layer && r.mode === g.mode);
  const index = row ? row.layerIndex : ctx.analysis.report.layers.findIndex((l) => l.name === g.layer);
  const who = layerName(ctx, index);
  if (g.mode === 'snapThrough') {
    return `Governing check: snap-through of ${who} — no compression arch can form at this span (counted as FS 0).`;
  }
  const target = row ? row.target : 1;
  const verdict = g.fs >= target ? 'meets the target ✓' : 'is below the target ✗';
  const how = g.mode === 'deflection' ? ' (FS = deflection limit / (δ/t))' : '';
  return `Governing check: ${MODE_NAME[g.mode]} in ${who}, FS ${fsText(g.fs)}${how} against a target of ${numberText(target, 3)} — it ${verdict}.`;
}

export function intactSentence(ctx: SectionContext): string {
  const tension = ctx.rows.filter((r) => r.mode === 'tension');
  const worst = least(tension);
  if (worst === null) {
    return 'As an intact beam: no layer is checked in tension (each is cross-jointed at this span or carries no net tension), so only the cracked-beam checks apply.';
  }
  const who = layerName(ctx, worst.layerIndex);
  const fs = worst.fs as number;
  if (fs < 1) {
    return `As an intact beam, ${who} would crack: its net tension exceeds the design tensile strength (${fsAgainst(worst)}).`;
  }
  if (fs < worst.target) {
    return `As an intact beam, ${who} would not crack, but its margin is short: ${fsAgainst(worst)}.`;
  }
  return `As an intact beam, every layer checked in tension keeps its target; the least is ${who}, ${fsAgainst(worst)}.`;
}

export function voussoirSentence(ctx: SectionContext): string {
  if (ctx.project.opening.type === 'cantilever') {
    return 'As a cracked beam: an overhang cannot form a compression arch, so it has no post-cracking reserve; the intact tension check decides.';
  }
  const rows = ctx.rows.filter((r) => VOUSSOIR_MODES.has(r.mode));
  const snapped = rows.filter((r) => r.mode === 'snapThrough' && r.fs === 0);
  if (snapped.length > 0) {
    const names = snapped.map((r) => layerName(ctx, r.layerIndex)).join(', ');
    return `As a cracked voussoir beam it does not stand: ${names} snap${snapped.length > 1 ? '' : 's'} through — no compression arch can form at this span.`;
  }
  const worst = least(rows.filter((r) => r.mode !== 'snapThrough'));
  if (worst === null) return 'As a cracked voussoir beam: no arch check applies.';
  const who = layerName(ctx, worst.layerIndex);
  if ((worst.fs as number) >= worst.target) {
    const ratio = (worst.fs as number) / worst.target;
    const margin = ratio >= 2 ? 'with wide margins' : 'with its targets met';
    return `As a cracked voussoir beam it stands ${margin}: the least is ${MODE_NAME[worst.mode]} in ${who}, ${fsAgainst(worst)}.`;
  }
  return `As a cracked voussoir beam an arch forms, but ${MODE_NAME[worst.mode]} in ${who} falls short: ${fsAgainst(worst)}.`;
}

export function basisSentence(ctx: SectionContext): string {
  if (ctx.project.opening.type === 'cantilever') {
    return 'Design basis: an overhang has no cracked-beam reserve, so the tension check counts whichever basis is chosen.';
  }
  return ctx.project.design.basis === 'intact'
    ? 'Design basis “intact”: the beam must not crack, so the intact tension check counts in the verdict together with the arch checks.'
    : 'Design basis “jointed”: the roof is taken as already cracked, so tension is shown for information only (“info ○”) and the arch checks decide.';
}

export function resultSentence(ctx: SectionContext): string {
  const below = ctx.rows.filter((r) => r.status.kind === 'below');
  if (below.length === 0) return 'Result: every check that counts meets its target ✓.';
  const list = below
    .map((r) => `${r.mode === 'snapThrough' ? 'snap-through' : r.mode} in ${layerName(ctx, r.layerIndex)}${r.mode === 'snapThrough' ? '' : ` (FS ${fsText(r.fs)}, target ${numberText(r.target, 3)})`}`)
    .join('; ');
  return `Result: ${below.length} check${below.length > 1 ? 's' : ''} below target ✗ — ${list}.`;
}

export function spanSentence(ctx: SectionContext): string {
  const spans = ctx.analysis.report.maxSpan_m;
  const what = ctx.project.opening.type === 'cantilever' ? 'overhang' : 'span';
  const current = quantityText(ctx.project.opening.span_m, 'length', ctx.units);
  if (spans === null || spans.governing === null) {
    return `Largest ${what}: none could be determined for this roof (current ${what} ${current}).`;
  }
  const word = spans.governing >= ctx.project.opening.span_m ? 'at least the' : 'shorter than the';
  let text = `Largest ${what} meeting every counted target: ${quantityText(spans.governing, 'length', ctx.units)}, ${word} current ${what} of ${current}.`;
  // METHODS §11: sliding never limits the span from above; a shortfall stands at the current span.
  if (ctx.rows.some((r) => r.mode === 'sliding' && r.status.kind === 'below')) {
    text += ' Sliding is not part of this limit (its FS rises with span), so the sliding shortfall at the current span must be resolved on its own.';
  }
  return text;
}

export function verdictSection(ctx: SectionContext): Section {
  const blocks: Block[] = [
    { kind: 'paragraph', strong: true, text: governingSentence(ctx) },
    { kind: 'paragraph', text: intactSentence(ctx) },
    { kind: 'paragraph', text: voussoirSentence(ctx) },
    { kind: 'paragraph', text: basisSentence(ctx) },
    { kind: 'paragraph', strong: true, text: resultSentence(ctx) },
    { kind: 'paragraph', text: spanSentence(ctx) },
  ];
  return { id: 'verdict', title: 'Verdict', blocks };
}
