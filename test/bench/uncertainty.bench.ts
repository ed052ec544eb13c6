/**
 * Benchmark: the overhead of the uncertainty layer per sample. 1e5 Latin hypercube samples of
 * a cheap closed-form limit state (FS = R/S, R and S lognormal; 5 further normal variables
 * truncated at 0 to give the sampler realistic width) through `runMonteCarlo`, against a plain
 * loop that draws the same 7 numbers per sample from Math.random, transforms them with
 * Math.exp/Math.log and counts failures, with no statistics. The difference is the layer's
 * overhead: sampling, inverse distribution functions, storage, rank correlations, histogram.
 * Target: ≤ 3 µs a sample, so that the full-analysis run (about 10 µs a sample for a 3-layer
 * beam, issue 11) is dominated by the analysis itself.
 */
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { evaluate } from '../../src/analysis/evaluate';
import { projectToSI } from '../../src/analysis/inputs';
import { parseProject } from '../../src/model/validate';
import { runUncertainty } from '../../src/uncertainty/run';
import { distribution } from '../../src/uncertainty/distributions';
import { runMonteCarlo } from '../../src/uncertainty/monte-carlo';
import type { BenchResult } from './types';
import { cpuClock, timeMedian, timeMinMedian } from './timing';

const N = 100_000;


export async function benchUncertainty(): Promise<BenchResult[]> {
  const distributions = [
    distribution({ distribution: 'lognormal', mean: 2, cov: 0.25 }),
    distribution({ distribution: 'lognormal', mean: 1, cov: 0.1 }),
    ...Array.from({ length: 5 }, () => distribution({ distribution: 'normal', mean: 1, cov: 0.3, min: 0 })),
  ];
  let sink = 0;
  const layerMs = timeMedian(() => {
    const r = runMonteCarlo({
      distributions, modes: ['tension'], samples: N, seed: 1, method: 'latinHypercube',
      evaluate: (x) => {
        const fs = x[0] / x[1];
        return { modeFs: [fs], governingFs: fs, targetRatio: fs / 2 };
      },
    });
    sink += r.failure.pf;
  }, 5);
  const loopMs = timeMedian(() => {
    let failures = 0;
    for (let i = 0; i < N; i++) {
      let extra = 0;
      for (let j = 0; j < 5; j++) extra += Math.random();
      const r = Math.exp(0.66 + 0.25 * Math.log(Math.random() + 1e-12) + 0 * extra);
      const s = Math.exp(0.1 * Math.log(Math.random() + 1e-12));
      if (r / s < 1) failures++;
    }
    sink += failures;
  }, 5);
  if (sink === -1) console.log(sink);
  const perSample = ((layerMs - loopMs) * 1e3) / N;
  return [
    ...benchAnalysisSamples(),
    {
      name: `Monte Carlo, 1e5 Latin hypercube samples × 7 variables, closed-form FS (${perSample.toFixed(2)} µs a sample over the loop)`,
      median_us: layerMs * 1e3,
      baseline: `plain Math.random loop ${loopMs.toFixed(1)} ms`,
      ratio: layerMs / loopMs,
      target: '≤ 3 µs a sample of overhead',
      pass: perSample <= 3,
    },
  ];
}


/**
 * The full per-sample path (issue 11): `runUncertainty` on the 3-layer coal-room beam preset,
 * 4 variables (thickness, unit weight and tensile value of the immediate roof, modulus of the
 * second bed), Latin hypercube, no FORM and no span points: sampling, the fast per-sample path
 * (`analysis/sample-evaluate.ts`: evaluate's parts and the check table's counting rules at each
 * sample) and the statistics. Target of the issue: 1e5 samples in ≤ 1 s on one core (≈ 10 µs a
 * sample). Baseline in the same run: a plain loop of as many `evaluate` calls on the fixed SI
 * project (strength chains, loads, beams, voussoirs; no check table, sampling or statistics),
 * i.e. what a sample cost when each one ran the whole evaluation. Each timed batch is two runs
 * (≥ 1 s); figures are per 1e5 samples, in CPU time of the process (`cpuClock`: what the run
 * costs a core; the wall clock on the shared 2-core machine varied 2× with the load). The
 * CPU time includes V8's GC threads. LAMINA_BENCH_SAMPLES lowers N for a quick look.
 */
function benchAnalysisSamples(): BenchResult[] {
  const n = Number(process.env.LAMINA_BENCH_SAMPLES ?? 100_000);
  const raw = JSON.parse(readFileSync(new URL('../../presets/coal-room-shale.lamina.json', import.meta.url), 'utf8'));
  raw.uncertainty = {
    samples: n, seed: 1, method: 'latinHypercube',
    variables: [
      { path: 'layers[0].thickness_m', distribution: 'normal', cov: 0.1 },
      { path: 'layers[0].unitWeight_kNm3', distribution: 'normal', cov: 0.05 },
      { path: 'layers[0].tensile.value_MPa', distribution: 'lognormal', mean: 4, cov: 0.3 },
      { path: 'layers[1].youngModulus_GPa', distribution: 'lognormal', cov: 0.2 },
    ],
  };
  const project = parseProject(raw).project;
  const si = projectToSI(project);
  const batch = 2;
  const per1e5 = 1e5 / (batch * n);
  let sink = 0;
  const run = timeMinMedian(() => {
    for (let b = 0; b < batch; b++) sink += runUncertainty(project, { spanPoints: 0, form: false }).pf;
  }, 5, 1, cpuClock);
  const loop = timeMinMedian(() => {
    for (let i = 0; i < batch * n; i++) sink += evaluate(si).layers.length;
  }, 5, 1, cpuClock);
  if (sink === -1) console.log(sink);
  const ratio = run.median / loop.median;
  const median1e5 = run.median * per1e5;
  return [{
    name: `Uncertainty run, 1e5 samples of the 3-layer coal-room beam, 4 variables, CPU time (${(median1e5 / 100).toFixed(1)} µs a sample, median)`,
    median_us: median1e5 * 1e3,
    min_us: run.min * per1e5 * 1e3,
    baseline: `a plain loop of 1e5 evaluate calls, ${(loop.median * per1e5).toFixed(0)} ms CPU (min ${(loop.min * per1e5).toFixed(0)} ms)`,
    ratio,
    target: 'issue: 1e5 samples in ≤ 1 s on one core (median); ratio shown against the plain evaluate loop',
    pass: median1e5 <= 1000,
  }];
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  for (const r of await benchUncertainty()) console.log(r);
}
