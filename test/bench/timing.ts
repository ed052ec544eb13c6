/**
 * The one timing helper of the benchmarks: `runs` timed calls of `fn` after `warmup` untimed
 * ones, reported as the minimum and the median in milliseconds (README: quote the range, never
 * a best run alone).
 */
export const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/**
 * CPU time of this process in ms (user + system, all its threads, from getrusage via
 * process.cpuUsage): what the work costs a core, much less sensitive than the wall clock to
 * other processes on a shared machine. Pass it as `clock` to `timeMinMedian`.
 */
export const cpuClock = (): number => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e3;
};

export function timeMinMedian(fn: () => unknown, runs: number, warmup = 1, clock: () => number = () => performance.now()): { min: number; median: number } {
  for (let k = 0; k < warmup; k++) fn();
  const times: number[] = [];
  for (let k = 0; k < runs; k++) {
    const t0 = clock();
    fn();
    times.push(clock() - t0);
  }
  return { min: Math.min(...times), median: median(times) };
}

/** Median of `runs` timed calls after `warmup` untimed ones, ms. */
export const timeMedian = (fn: () => unknown, runs: number, warmup = 1): number => timeMinMedian(fn, runs, warmup).median;
