/**
 * FS versus span for each mode (governing over the layers), for the app's and the report's
 * chart: the same function the span finder searches, sampled on a grid.
 */
import type { Mode, Project } from '../model/types';
import { targetFor } from './checks';
import { evaluate } from './evaluate';
import { projectToSI } from './inputs';
import { spanFsFunction, SPAN_CAP_M } from './span-finder';
import type { SpanCurve } from './types';

export function spanCurve(project: Project, options: { samples?: number; maxSpan_m?: number } = {}): SpanCurve {
  const p = projectToSI(project);
  const state = evaluate(p);
  const fsAt = spanFsFunction(p, state);
  const samples = Math.max(2, Math.min(1000, Math.round(options.samples ?? 80)));
  const top = Math.min(SPAN_CAP_M, Math.max(options.maxSpan_m ?? 2.5 * p.span, p.span * 1.05));
  const modes: Mode[] = ['tension', 'crushing', 'sliding', 'snapThrough', 'deflection'];
  const spans: number[] = [];
  const fs = Object.fromEntries(modes.map((m) => [m, [] as (number | null)[]])) as SpanCurve['fs'];
  const clampFs = (v: number | null) => (v === null ? null : Math.min(v, 1e6));
  for (let k = 1; k <= samples; k++) {
    const s = (top * k) / samples;
    spans.push(s);
    const at = fsAt(s);
    for (const m of modes) fs[m].push(clampFs(at[m]));
  }
  const targets = Object.fromEntries(modes.map((m) => [m, targetFor(m, p.design)])) as SpanCurve['targets'];
  return { spans_m: spans, fs, targets, currentSpan_m: p.span };
}
