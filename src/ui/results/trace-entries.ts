/**
 * Pure helpers of the trace dialog: which trace entries belong together, and how a traced
 * value reads in the chosen unit system.
 *     tracePrefix('detail.layers[0].lab.cov') // "layers[0]"
 *     valueText(6, 'm', 'US')                   // "6 m (19.69 ft)"
 */
import type { TraceEntry } from '../../model/types';
import { toDisplay, unitLabel, type UnitSystem } from '../../model/units';
import { numberText, PRECISION } from '../../report/number-text';
import { withUnit } from '../../report/unit-text';
import { quantityOfUnit } from '../../report/format';

/**
 * The group a path belongs to for "related entries": `layers[2]` (also for the analysis details
 * `detail.layers[2].…`), `maxSpan_m`, or its first key.
 */
export function tracePrefix(path: string): string {
  const layer = /^(?:detail\.)?layers\[(\d+)\]/.exec(path);
  if (layer) return `layers[${layer[1]}]`;
  const head = /^[^.[]+/.exec(path);
  return head ? head[0] : path;
}

/** Whole-roof entries (groups, group tests, opening, governing, spans) are in every layer's reach. */
function inReach(from: string, candidate: string): boolean {
  const a = tracePrefix(from);
  const b = tracePrefix(candidate);
  return a === b || !b.startsWith('layers[');
}

/** The entries whose result is the value `v` (same unit, equal to 1e-9), within reach of `from`. */
function producers(trace: readonly TraceEntry[], from: TraceEntry, v: { value: number; unit: string }): TraceEntry[] {
  // A zero matches too many things (σh = 0, no surcharge) to say which step it came from.
  if (v.value === 0 || !Number.isFinite(v.value)) return [];
  const tol = 1e-9 * Math.abs(v.value);
  return trace.filter((t) => t !== from && t.unit === v.unit && Math.abs(t.result - v.value) <= tol && inReach(from.path, t.path));
}

/**
 * The steps the entry at `path` uses: itself and, transitively, every entry whose result is a
 * value it substitutes (same unit and number; a zero value links to nothing, an input links to
 * nothing), within its own layer and the whole-roof entries, in report order. So a beam's
 * tension lists its load, the group sums and the moduli, not the lab discs.
 */
export function relatedEntries(trace: readonly TraceEntry[], path: string): TraceEntry[] {
  const start = trace.find((t) => t.path === path);
  if (!start) return [];
  const used = new Set<TraceEntry>([start]);
  const queue: TraceEntry[] = [start];
  while (queue.length > 0) {
    const e = queue.shift()!;
    for (const v of Object.values(e.values)) {
      for (const p of producers(trace, e, v)) {
        if (used.has(p)) continue;
        used.add(p);
        queue.push(p);
      }
    }
  }
  return trace.filter((t) => used.has(t));
}

/** The rendered text, or `fallback` when rendering throws (e.g. an unparsable formula). */
export function safeText(render: () => string, fallback: string): string {
  try {
    return render();
  } catch {
    return fallback;
  }
}

/** A traced value with its unit, plus the US equivalent in brackets when US units are shown. */
export function valueText(value: number, unit: string, units: UnitSystem, path = ''): string {
  const base = withUnit(numberText(value, PRECISION.trace), unit);
  if (units !== 'US') return base;
  const q = quantityOfUnit(unit, path);
  if (!q || !Number.isFinite(value)) return base;
  return `${base} (${numberText(toDisplay(value, q, 'US'))} ${unitLabel(q, 'US')})`;
}

