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
 * Pearson's correlation of two rank sets from `averageRanks` (so that one set, e.g. the
 * governing FS, is ranked once for all the variables); null when either has no spread.
 */
export function rankSetCorrelation(a: Float64Array, b: Float64Array): number | null {
  if (a.length !== b.length) throw new RangeError(`rank correlation needs two sets of the same length, got ${a.length} and ${b.length}`);
  return a.length < 2 ? null : pearson(a, b);
}

/**
 * Ranks 1…n of the values, ties given the mean of the ranks they span. The values are sorted
 * together with their positions by a bottom-up merge sort (stable, sequential memory access:
 * 1e5 values rank in a few milliseconds, where a comparator sort of indices or a binary search
 * per value jumps around memory), then each run of equal values [first, last] gets the rank
 * (first + last)/2 + 1.
 */
export function averageRanks(values: ArrayLike<number>): Float64Array {
  const n = values.length;
  let keys = Float64Array.from(values);
  let index = new Uint32Array(n);
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(keys[i])) throw new RangeError(`values[${i}] is NaN`);
    index[i] = i;
  }
  let keysOut = new Float64Array(n);
  let indexOut = new Uint32Array(n);
  for (let width = 1; width < n; width *= 2) {
    for (let lo = 0; lo < n; lo += 2 * width) {
      const mid = Math.min(lo + width, n);
      const hi = Math.min(lo + 2 * width, n);
      let a = lo;
      let b = mid;
      for (let k = lo; k < hi; k++) {
        if (a < mid && (b >= hi || keys[a] <= keys[b])) {
          keysOut[k] = keys[a];
          indexOut[k] = index[a++];
        } else {
          keysOut[k] = keys[b];
          indexOut[k] = index[b++];
        }
      }
    }
    [keys, keysOut] = [keysOut, keys];
    [index, indexOut] = [indexOut, index];
  }
  const ranks = new Float64Array(n);
  for (let start = 0; start < n; ) {
    let end = start + 1;
    while (end < n && keys[end] === keys[start]) end++;
    const rank = (start + end + 1) / 2;
    for (let k = start; k < end; k++) ranks[index[k]] = rank;
    start = end;
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
