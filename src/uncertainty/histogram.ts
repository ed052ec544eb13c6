/**
 * The histogram of the governing factor of safety over [lowest FS, the 99.5th percentile],
 * so that a few very large factors (a nearly unloaded sample) do not squash the bars near
 * FS = 1 that matter; the samples above are counted in `above`. The bin edges are d3's "nice"
 * `ticks` inside that range (so about `binCount` bins with round edges), the first and last
 * bins closed by the range ends; each bin holds x0 ≤ FS < x1, the last one x0 ≤ FS ≤ x1.
 * One sort and one pass: 1e5 samples bin in a few milliseconds.
 *     fsHistogram(Float64Array.of(0.8, 1.2, 1.3, 40), 4) // bins over [0.8, 39.4], above: 1
 */
import { quantileSorted, ticks } from 'd3-array';

export interface HistogramBin {
  x0: number;
  x1: number;
  count: number;
}

export interface FsHistogram {
  bins: HistogramBin[];
  /** samples above the last bin (beyond the 99.5th percentile) */
  above: number;
  /** finite samples counted in all */
  total: number;
}

export function fsHistogram(values: ArrayLike<number>, binCount = 40): FsHistogram {
  if (!(Number.isInteger(binCount) && binCount >= 1)) throw new RangeError(`binCount must be a whole number ≥ 1, got ${binCount}`);
  const sorted = Float64Array.from(values).filter((v) => Number.isFinite(v)).sort();
  const total = sorted.length;
  if (total === 0) return { bins: [], above: 0, total: 0 };
  const lo = sorted[0];
  let hi = quantileSorted(sorted as unknown as number[], 0.995) ?? sorted[total - 1];
  if (!(hi > lo)) hi = sorted[total - 1] > lo ? sorted[total - 1] : lo + (Math.abs(lo) || 1) * 1e-6;
  const edges = [lo, ...ticks(lo, hi, binCount).filter((t) => t > lo && t < hi), hi];
  const bins: HistogramBin[] = [];
  for (let k = 0; k + 1 < edges.length; k++) bins.push({ x0: edges[k], x1: edges[k + 1], count: 0 });
  let k = 0;
  let i = 0;
  for (; i < total && sorted[i] <= hi; i++) {
    while (k < bins.length - 1 && sorted[i] >= bins[k].x1) k++;
    bins[k].count++;
  }
  return { bins, above: total - i, total };
}
