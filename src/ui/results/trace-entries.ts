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

/** The trace entries related to `path` (same prefix), in report order. */
export function relatedEntries(trace: readonly TraceEntry[], path: string): TraceEntry[] {
  const prefix = tracePrefix(path);
  return trace.filter((t) => tracePrefix(t.path) === prefix);
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
export function valueText(value: number, unit: string, units: UnitSystem): string {
  const base = withUnit(numberText(value, PRECISION.trace), unit);
  if (units !== 'US') return base;
  const q = quantityOfUnit(unit);
  if (!q || !Number.isFinite(value)) return base;
  return `${base} (${numberText(toDisplay(value, q, 'US'))} ${unitLabel(q, 'US')})`;
}

