/**
 * The one timing helper of the benchmarks: `runs` timed calls of `fn` after `warmup` untimed
 * ones, reported as the minimum and the median in milliseconds (README: quote the range, never
 * a best run alone).
 */
export const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export function timeMinMedian(fn: () => unknown, runs: number, warmup = 1): { min: number; median: number } {
  for (let k = 0; k < warmup; k++) fn();
  const times: number[] = [];
  for (let k = 0; k < runs; k++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  return { min: Math.min(...times), median: median(times) };
}

/** Median of `runs` timed calls after `warmup` untimed ones, ms. */
export const timeMedian = (fn: () => unknown, runs: number, warmup = 1): number => timeMinMedian(fn, runs, warmup).median;
