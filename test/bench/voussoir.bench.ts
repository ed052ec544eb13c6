/**
 * Benchmark: the closed-form voussoir solver against the 0.01-step fixed-point sweep
 * (Diederichs & Kaiser 1999 scheme) on the same 200 seeded random beams, in the same run.
 * Median over 51 interleaved batches of µs per solve; accuracy against the sweep.
 * Targets (brief): optimised ≤ 5 µs per solve and ≥ 10× faster than the sweep.
 * Run alone with `npx tsx test/bench/voussoir.bench.ts`; `test/bench/run.ts` imports it.
 */
import { pathToFileURL } from 'node:url';
import { solveVoussoir, type VoussoirInput, type VoussoirResult } from '../../src/mechanics/voussoir';
import { solveVoussoirSweep } from '../../src/mechanics/voussoir-sweep';
import type { BenchResult } from './types';
import { seeded } from '../helpers/seeded';

const BEAMS = 200;
const BATCHES = 51;
const OPT_REPEATS = 10; // solves of each beam per batch (the sweep: 1)


function randomBeams(count: number, seed: number): VoussoirInput[] {
  const rnd = seeded(seed);
  return Array.from({ length: count }, () => ({
    span: 1 + 39 * rnd(),
    thickness: 0.1 + 2.9 * rnd(),
    unitWeight: 15e3 + 20e3 * rnd(),
    modulus: 0.2e9 * Math.pow(400, rnd()), // 0.2–80 GPa
    ucs: 40e6,
    frictionDeg: 30,
  }));
}

const median = (xs: number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
};

/** µs per solve for one batch. Returns a checksum too so the work cannot be optimised away. */
function timeBatch(
  solve: (b: VoussoirInput) => VoussoirResult,
  beams: VoussoirInput[],
  repeats: number,
): { us: number; sink: number } {
  let sink = 0;
  const t0 = performance.now();
  for (let r = 0; r < repeats; r++) for (const b of beams) sink += solve(b).iterations;
  const t1 = performance.now();
  return { us: ((t1 - t0) * 1000) / (repeats * beams.length), sink };
}

export async function benchVoussoir(): Promise<BenchResult[]> {
  const beams = randomBeams(BEAMS, 20240611);

  // Accuracy on the benchmark set.
  let maxDn = 0;
  let maxFcExcess = -Infinity; // max fc_opt/fc_sweep − 1 (≤ 1e-9 required)
  let flagMismatches = 0;
  for (const b of beams) {
    const o = solveVoussoir(b);
    const w = solveVoussoirSweep(b);
    if (o.snapThrough !== w.snapThrough) {
      flagMismatches++;
      continue;
    }
    if (o.snapThrough) continue;
    maxDn = Math.max(maxDn, Math.abs(o.n! - w.n!));
    maxFcExcess = Math.max(maxFcExcess, o.maxCompression! / w.maxCompression! - 1);
  }

  // Warm-up, then interleaved batches so both solvers see the same machine load.
  for (let i = 0; i < 3; i++) {
    timeBatch(solveVoussoir, beams, OPT_REPEATS);
    timeBatch(solveVoussoirSweep, beams, 1);
  }
  const opt: number[] = [];
  const sweep: number[] = [];
  let sink = 0;
  for (let i = 0; i < BATCHES; i++) {
    const a = timeBatch(solveVoussoir, beams, OPT_REPEATS);
    const b = timeBatch(solveVoussoirSweep, beams, 1);
    opt.push(a.us);
    sweep.push(b.us);
    sink += a.sink + b.sink;
  }
  if (!(sink > 0)) throw new Error('benchmark did no work');
  const optUs = median(opt);
  const sweepUs = median(sweep);
  const ratio = sweepUs / optUs;
  const accurate = maxDn <= 0.01 && maxFcExcess <= 1e-9;
  return [
    {
      name: 'voussoir: closed-form lever arm + bracketed n search (solveVoussoir)',
      median_us: optUs,
      baseline: 'voussoir: 0.01-step fixed-point sweep (solveVoussoirSweep)',
      ratio,
      target: '≤ 5 µs per solve and ≥ 10× faster than the sweep',
      pass: optUs <= 5 && ratio >= 10,
    },
    {
      name: 'voussoir: 0.01-step fixed-point sweep (baseline)',
      median_us: sweepUs,
    },
    {
      name:
        `voussoir accuracy vs sweep on ${BEAMS} beams: max |Δn| = ${maxDn.toFixed(4)}, ` +
        `max fc_opt/fc_sweep − 1 = ${maxFcExcess.toExponential(2)}, ` +
        `snap-through flag differences = ${flagMismatches}`,
      median_us: 0,
      target: '|Δn| ≤ 0.01 and fc_opt ≤ fc_sweep·(1 + 1e-9)',
      pass: accurate,
    },
  ];
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  for (const r of await benchVoussoir()) {
    const parts = [`${r.name}: ${r.median_us.toFixed(3)} µs`];
    if (r.ratio !== undefined) parts.push(`${r.ratio.toFixed(1)}× vs ${r.baseline}`);
    if (r.target) parts.push(`target ${r.target}: ${r.pass ? 'PASS' : 'FAIL'}`);
    console.log(parts.join(' | '));
  }
}
