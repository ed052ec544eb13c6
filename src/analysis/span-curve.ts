/**
 * FS versus span for each mode, for the app's and the report's chart: the same function the
 * span finder searches, sampled on a grid of entered spans (entry widths for an intersection).
 * A mode counted in some layer at the current span is drawn over those layers (`counts` true);
 * a mode counted nowhere (e.g. the voussoir reserve of an uncracked roof) is drawn over every
 * layer where it applies, with `counts` false, so the chart can say it does not count.
 * With support (bolts or standing support) it also gives the governing FS/target of the whole
 * check table with the support as given and without it (`support`, 24 spans).
 */
import type { Mode, Project } from '../model/types';
import { MODES } from './check-labels';
import { countedModesAt, layerCondition, targetFor } from './check-table';
import { evaluate } from './evaluate';
import { projectToSI } from './inputs';
import { spanFsFunction, SPAN_CAP_M, type SpanInclude } from './span-finder';
import type { SpanCurve, SupportCurve } from './types';
import { supportMarginCurve } from './support-needed';

/** Samples of the with/without-support curves (each sample is one check table per case). */
const SUPPORT_SAMPLES = 24;

export function spanCurve(project: Project, options: { samples?: number; maxSpan_m?: number } = {}): SpanCurve {
  const p = projectToSI(project);
  const state = evaluate(p);
  const counted = countedModesAt(p, state);
  const counts = Object.fromEntries(MODES.map((m) => [m, counted.some((c) => c[m])])) as Record<Mode, boolean>;
  const cantilever = state.ends === 'cantilever';
  const include: SpanInclude = (i, mode) => {
    if (counts[mode]) return counted[i][mode];
    if (mode === 'tension') return cantilever || !layerCondition(p, state.layers[i], state.span, p.layers[i].thickness, cantilever).cracked;
    return !cantilever;
  };
  const fsAt = spanFsFunction(p, state, include);
  const samples = Math.max(2, Math.min(1000, Math.round(options.samples ?? 80)));
  const entry = p.entrySpan;
  const top = Math.min(SPAN_CAP_M, Math.max(options.maxSpan_m ?? 2.5 * entry, entry * 1.05));
  const spans: number[] = [];
  const fs = Object.fromEntries(MODES.map((m) => [m, [] as (number | null)[]])) as SpanCurve['fs'];
  const clampFs = (v: number | null) => (v === null ? null : Math.min(v, 1e6));
  for (let k = 1; k <= samples; k++) {
    const s = (top * k) / samples;
    spans.push(s);
    const at = fsAt(s * p.spanScale);
    for (const m of MODES) fs[m].push(clampFs(at[m]));
  }
  const targets = Object.fromEntries(MODES.map((m) => [m, targetFor(m, p.design)])) as SpanCurve['targets'];
  let support: SupportCurve | null = null;
  if (project.support.bolts || project.support.standing_kPa > 0) {
    const n = Math.min(SUPPORT_SAMPLES, samples);
    const at = Array.from({ length: n }, (_, k) => (top * (k + 1)) / n);
    support = { spans_m: at, ...supportMarginCurve(project, at, state.layers.map((l) => l.chain)) };
  }
  return { spans_m: spans, fs, targets, counts, currentSpan_m: entry, support };
}
