/**
 * Spearman's rank correlation ρ_s: Pearson's correlation of the ranks, tied values sharing
 * their mean rank (Spearman 1904; e.g. Kendall & Gibbons, Rank Correlation Methods, 1990).
 * Used as the sensitivity of the governing factor of safety to each input variable.
 * null when either set has no spread (a constant variable has no correlation to report).
 * simple-statistics 7.8.8 `sampleRankCorrelation` gives tied values distinct ranks, so a
 * constant input would show a spurious correlation; this file averages the ranks of ties.
 *     rankCorrelation([1, 2, 3, 4], [10, 20, 30, 25]) // 0.8
 */
export function rankCorrelation(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  const n = x.length;
  if (y.length !== n) throw new RangeError(`rank correlation needs two sets of the same length, got ${n} and ${y.length}`);
  if (n < 2) return null;
  return pearson(averageRanks(x), averageRanks(y));
}

/**
 * Ranks 1…n of the values, ties given the mean of the ranks they span: the values are sorted
 * once (a native numeric sort) and each one's rank read by binary search, the tie run
 * [first, last] giving the rank (first + last)/2 + 1.
 */
export function averageRanks(values: ArrayLike<number>): Float64Array {
  const n = values.length;
  const sorted = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(values[i])) throw new RangeError(`values[${i}] is NaN`);
    sorted[i] = values[i];
  }
  sorted.sort();
  const ranks = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const v = values[i];
    let lo = 0;
    let hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (sorted[mid] < v) lo = mid + 1;
      else hi = mid;
    }
    const first = lo;
    hi = n;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (sorted[mid] <= v) lo = mid + 1;
      else hi = mid;
    }
    ranks[i] = (first + lo - 1) / 2 + 1;
  }
  return ranks;
}

function pearson(a: Float64Array, b: Float64Array): number | null {
  const n = a.length;
  let ma = 0;
  let mb = 0;
  for (let i = 0; i < n; i++) {
    ma += a[i];
    mb += b[i];
  }
  ma /= n;
  mb /= n;
  let sab = 0;
  let saa = 0;
  let sbb = 0;
  for (let i = 0; i < n; i++) {
    const da = a[i] - ma;
    const db = b[i] - mb;
    sab += da * db;
    saa += da * da;
    sbb += db * db;
  }
  if (!(saa > 0 && sbb > 0)) return null;
  const r = sab / Math.sqrt(saa * sbb);
  return r > 1 ? 1 : r < -1 ? -1 : r;
}
