/**
 * Benchmark: one uncached roof-slab plate solve to the default 0.5% accuracy (cache cleared
 * before every solve), median over 6 aspect ratios × 2 edge conditions × 5 repetitions, and the
 * cached lookup. Accuracy of the same solves: simple supports against the Navier double series,
 * clamped against the Timoshenko values of METHODS §4 (rounded to 4 digits).
 * Target (brief): ≤ 30 ms median per uncached solve.
 * Run alone with `npx tsx test/bench/plate.bench.ts`; `test/bench/run.ts` imports it.
 */
import { pathToFileURL } from 'node:url';
import { clearPlateCache, plateCoefficients, type PlateInput } from '../../src/mechanics/plate';
import type { BenchResult } from './types';

const ASPECTS = [1, 1.2, 1.5, 2, 3, 5];
const REPEATS = 5;

/** Navier double series, centre short-direction stress coefficient of a simply supported plate. */
function navierBeta(aspect: number, nu: number, N = 399): number {
  let m6 = 0;
  for (let m = 1; m <= N; m += 2) {
    for (let n = 1; n <= N; n += 2) {
      const sign = ((m - 1) / 2 + (n - 1) / 2) % 2 === 0 ? 1 : -1;
      const W = 16 / (Math.PI ** 6 * m * n * (m * m + (n * n) / (aspect * aspect)) ** 2);
      m6 += sign * W * ((m * Math.PI) ** 2 + nu * ((n * Math.PI) / aspect) ** 2);
    }
  }
  return 6 * m6;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const k = s.length >> 1;
  return s.length % 2 ? s[k] : (s[k - 1] + s[k]) / 2;
};

export async function benchPlate(): Promise<BenchResult[]> {
  const inputs: PlateInput[] = [];
  for (const edges of ['clamped', 'simple'] as const) for (const aspect of ASPECTS) inputs.push({ aspect, edges, poisson: 0.3 });
  // warm-up (JIT)
  for (const i of inputs) { clearPlateCache(); plateCoefficients(i); }
  const times: number[] = [];
  for (let r = 0; r < REPEATS; r++) {
    for (const i of inputs) {
      clearPlateCache();
      const t0 = performance.now();
      plateCoefficients(i);
      times.push((performance.now() - t0) * 1000);
    }
  }
  const uncached = median(times);

  let maxErr = 0;
  let maxEstimate = 0;
  for (const aspect of ASPECTS) {
    const p = plateCoefficients({ aspect, edges: 'simple', poisson: 0.3 });
    maxErr = Math.max(maxErr, Math.abs(p.beta - navierBeta(aspect, 0.3)) / navierBeta(aspect, 0.3));
    maxEstimate = Math.max(maxEstimate, p.errorEstimate);
  }
  const clampedTable: Array<[number, number]> = [[1, 0.3078], [1.2, 0.3834], [1.4, 0.4356], [1.6, 0.468], [1.8, 0.4872], [2, 0.4974]];
  let maxClamped = 0;
  for (const [aspect, beta] of clampedTable) {
    const p = plateCoefficients({ aspect, edges: 'clamped', poisson: 0.3 });
    maxClamped = Math.max(maxClamped, Math.abs(p.beta - beta) / beta);
    maxEstimate = Math.max(maxEstimate, p.errorEstimate);
  }

  const cachedTimes: number[] = [];
  for (let batch = 0; batch < 21; batch++) {
    const t0 = performance.now();
    for (let k = 0; k < 1000; k++) plateCoefficients(inputs[k % inputs.length]);
    cachedTimes.push(((performance.now() - t0) * 1000) / 1000);
  }

  return [
    {
      name: `plate: uncached solve to 0.5% (${inputs.length} plates × ${REPEATS}, b/a 1–5, clamped and simple)`,
      median_us: uncached,
      target: '≤ 30 ms median',
      pass: uncached <= 30_000,
    },
    { name: 'plate: cached lookup', median_us: median(cachedTimes) },
    {
      name:
        `plate accuracy of those solves: simple β vs Navier max ${(100 * maxErr).toFixed(4)}%, ` +
        `clamped β vs METHODS §4 table max ${(100 * maxClamped).toFixed(3)}%, largest error estimate ${(100 * maxEstimate).toFixed(3)}%`,
      median_us: 0,
      target: 'errors ≤ 0.5%',
      pass: maxErr <= 0.005 && maxClamped <= 0.005,
    },
  ];
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  for (const r of await benchPlate()) {
    const parts = [`${r.name}: ${r.median_us.toFixed(3)} µs`];
    if (r.target) parts.push(`target ${r.target}: ${r.pass ? 'PASS' : 'FAIL'}`);
    console.log(parts.join(' | '));
  }
}
