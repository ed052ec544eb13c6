/**
 * Benchmark: `lamina lab` in-process (CSV parse, Brazilian reduction, per-specimen table, JSON)
 * on 1,000 and 10,000 rows (the row cap), and the per-specimen table built with a search of
 * the whole reduction per specimen (the former O(n²) way: 100,000 rows took 17 s) as the
 * baseline, in the same run. Targets: 10,000 rows ≤ 1 s; ten times the rows costs ≤ 20× the
 * time (linear within noise; quadratic would be 100×).
 * Run alone with `npx tsx test/bench/lab.bench.ts`; `test/bench/run.ts` imports it.
 */
import { pathToFileURL } from 'node:url';
import { run, type Io } from '../../src/cli/main';
import { parseSpecimensCsv } from '../../src/model/specimens-csv';
import { reduceSpecimens, specimenOutcomes } from '../../src/strength/specimens';
import type { BenchResult } from './types';

function table(rows: number): string {
  const lines = ['id,diameter_mm,thickness_mm,peakLoad_kN,valid'];
  for (let i = 0; i < rows; i++) lines.push(`B${i},54,${20 + (i % 15)},${(5 + (i % 50) / 10).toFixed(1)},${i % 7 === 0 ? 'no' : 'yes'}`);
  return lines.join('\n');
}

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function timeLab(text: string, repeats: number): Promise<number> {
  const io: Io = { out: () => undefined, err: (t) => { throw new Error(t); }, readFile: () => text, writeFile: () => undefined, readStdin: () => '', errIsTty: false };
  const times: number[] = [];
  for (let r = 0; r < repeats; r++) {
    const t0 = performance.now();
    const code = await run(['lab', 'specimens.csv', '--json'], io);
    times.push(performance.now() - t0);
    if (code !== 0) throw new Error(`lab exited ${code}`);
  }
  return median(times) * 1000;
}

/** The table step alone, by index (now) and by a search per specimen (before). */
function timeTable(text: string, repeats: number): { indexed: number; searched: number } {
  const parsed = parseSpecimensCsv(text);
  const si = parsed.specimens.map((s) => ({ id: s.id, diameter: s.diameter_mm / 1e3, thickness: s.thickness_mm / 1e3, peakLoad: s.peakLoad_kN * 1e3, valid: s.valid }));
  const reduction = reduceSpecimens(si);
  const indexed: number[] = [];
  const searched: number[] = [];
  let sink = 0;
  for (let r = 0; r < repeats; r++) {
    let t0 = performance.now();
    const o = specimenOutcomes(reduction, si.length);
    for (let k = 0; k < si.length; k++) sink += (o.accepted[k] ? 1 : 0) + (o.rejected[k] ? 2 : 0) + o.warnings[k].length;
    indexed.push(performance.now() - t0);
    t0 = performance.now();
    for (let k = 0; k < si.length; k++) {
      sink += (reduction.accepted.find((a) => a.index === k) ? 1 : 0) + (reduction.rejected.find((x) => x.index === k) ? 2 : 0) + reduction.warnings.filter((w) => w.index === k).length;
    }
    searched.push(performance.now() - t0);
  }
  if (sink < 0) console.log(sink);
  return { indexed: median(indexed) * 1000, searched: median(searched) * 1000 };
}

export async function benchLab(): Promise<BenchResult[]> {
  const small = await timeLab(table(1_000), 7);
  const large = await timeLab(table(10_000), 5);
  const t = timeTable(table(10_000), 3);
  return [
    { name: 'lab, 1,000 rows (parse, reduce, table, JSON)', median_us: small },
    { name: 'lab, 10,000 rows (the row cap)', median_us: large, baseline: '1,000 rows', ratio: large / small, target: '≤ 1 s, ≤ 20× the 1,000-row time', pass: large <= 1e6 && large / small <= 20 },
    { name: 'per-specimen table by index, 10,000 rows', median_us: t.indexed, baseline: 'a search per specimen', ratio: t.searched / t.indexed, target: '≥ 10× faster', pass: t.searched / t.indexed >= 10 },
  ];
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  for (const r of await benchLab()) console.log(r);
}
