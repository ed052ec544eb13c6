/**
 * Benchmark: the support-needed searches (METHODS §12: standing pressure, bolt spacing, bolt
 * length, largest span with the support) on the bolted coal-room demo at 7 m (1.8 m, 100 kN
 * suspension bolts at 1.2 × 1.2 m), against the unsupported analysis of the same project
 * measured in the same run. Target (issue 10): the searches add at most 3× to an analysis,
 * i.e. analyseWithSupportNeeded(bolted) / analyse(unbolted) ≤ 3.
 * Each figure is a batch of at least 1 s of calls (the count calibrated once); the two batches
 * alternate over 5 rounds so that both see the same load on the machine, and the ratio is
 * taken per round: min and median over the rounds are reported.
 * Run alone with `npx tsx test/bench/support.bench.ts`; `test/bench/run.ts` imports it.
 */
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { analyse, analyseWithSupportNeeded } from '../../src/analysis/analyse';
import { readProjectText } from '../../src/model/project-file';
import type { Project } from '../../src/model/types';
import type { BenchResult } from './types';
import { median, timeMinMedian } from './timing';

function boltedCoalRoom(): Project {
  const coal = readProjectText(readFileSync(new URL('../../presets/coal-room-shale.lamina.json', import.meta.url), 'utf8')).project;
  return {
    ...coal,
    opening: { ...coal.opening, span_m: 7 },
    support: { standing_kPa: 0, bolts: { length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2, anchorage_m: 0.3, action: 'suspension', shearCapacity_kN: 60, pretension_kN: 0 } },
  };
}

const BATCH_MS = 1000;
const ROUNDS = 5;

/** A batch of `fn` calls lasting at least BATCH_MS (count from a warm calibration). */
function batch(fn: () => unknown): { run: () => void; count: number } {
  const probe = timeMinMedian(fn, 30, 30).median;
  const count = Math.max(1, Math.ceil((1.2 * BATCH_MS) / Math.max(probe, 1e-3)));
  return { run: () => { for (let k = 0; k < count; k++) fn(); }, count };
}

export async function benchSupport(): Promise<BenchResult[]> {
  const bolted = boltedCoalRoom();
  const bare: Project = { ...bolted, support: { standing_kPa: 0, bolts: null } };
  const base = batch(() => analyse(bare));
  const withSearch = batch(() => analyseWithSupportNeeded(bolted));
  const baseMs: number[] = [];
  const searchMs: number[] = [];
  const ratios: number[] = [];
  for (let round = 0; round < ROUNDS; round++) {
    const a = timeMinMedian(base.run, 1, 0).median / base.count;
    const b = timeMinMedian(withSearch.run, 1, 0).median / withSearch.count;
    baseMs.push(a);
    searchMs.push(b);
    ratios.push(b / a);
  }
  const ratio = median(ratios);
  return [{
    name: `support needed (coal room, bolted, 7 m): analyse + searches, ${ROUNDS} rounds of ≥ 1 s batches; ratio per round min ${Math.min(...ratios).toFixed(2)}, median ${ratio.toFixed(2)}`,
    median_us: median(searchMs) * 1000,
    min_us: Math.min(...searchMs) * 1000,
    baseline: `unsupported analyse ${(Math.min(...baseMs) * 1000).toFixed(0)}–${(median(baseMs) * 1000).toFixed(0)} µs (min–median)`,
    ratio,
    target: '≤ 3× the unsupported analysis',
    pass: ratio <= 3,
  }];
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  for (const r of await benchSupport()) console.log(JSON.stringify(r));
}
