import type { MaxSpanReport } from '../../model/types';

/**
 * The span offered by "Use this span": the governing largest span, rounded down to 1 mm so
 * that adopting it still meets every target; null when no mode limits the span.
 *     adoptableSpan({ ...spans, governing: 1.82261 }) // 1.822
 */
export function adoptableSpan(maxSpan: MaxSpanReport | null | undefined): number | null {
  const g = maxSpan?.governing;
  if (g === null || g === undefined || !(g > 0)) return null;
  const mm = Math.floor(g * 1000 + 1e-9) / 1000;
  return mm > 0 ? mm : g;
}
