/**
 * Benchmark: the support-needed searches (METHODS §12: standing pressure, bolt spacing, bolt
 * length, largest span with the support) on the bolted coal-room demo at 7 m, against the
 * unsupported analysis of the same project measured in the same run. Target (issue 10): the
 * searches add at most 3× to an analysis, i.e. (analyse + supportNeeded) / analyse ≤ 3.
 * Run alone with `npx tsx test/bench/support.bench.ts`; `test/bench/run.ts` imports it.
 */
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { analyse } from '../../src/analysis/analyse';
import { supportNeeded } from '../../src/analysis/support-needed';
import { readProjectText } from '../../src/model/project-file';
import type { Project } from '../../src/model/types';
import type { BenchResult } from './types';
import { timeMedian } from './timing';

function boltedCoalRoom(): Project {
  const coal = readProjectText(readFileSync(new URL('../../presets/coal-room-shale.lamina.json', import.meta.url), 'utf8')).project;
  return {
    ...coal,
    opening: { ...coal.opening, span_m: 7 },
    support: { standing_kPa: 0, bolts: { length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2, anchorage_m: 0.3, action: 'suspension', shearCapacity_kN: 60, pretension_kN: 0 } },
  };
}

const timeMs = (fn: () => unknown, runs: number): number => timeMedian(fn, runs, 2);

export async function benchSupport(): Promise<BenchResult[]> {
  const bolted = boltedCoalRoom();
  const bare: Project = { ...bolted, support: { standing_kPa: 0, bolts: null } };
  const base = timeMs(() => analyse(bare), 21);
  const searches = timeMs(() => supportNeeded(bolted), 11);
  const ratio = (base + searches) / base;
  return [{
    name: 'support needed (coal room, bolted, 7 m): analyse + searches',
    median_us: (base + searches) * 1000,
    baseline: `unsupported analyse ${(base * 1000).toFixed(0)} µs`,
    ratio,
    target: '≤ 3× the unsupported analysis',
    pass: ratio <= 3,
  }];
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  for (const r of await benchSupport()) console.log(JSON.stringify(r));
}
