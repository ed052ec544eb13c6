/**
 * `npm run bench`: every benchmark, each figure beside a baseline measured in the same run and
 * the target it is held to. Figures depend on the machine and its load; the ratios much less.
 */
import { benchVoussoir } from './voussoir.bench';
import { benchPlate } from './plate.bench';
import { benchAnalysis } from './analysis.bench';
import { benchCli } from './cli.bench';
import { benchWorstCase } from './worst-case.bench';
import { benchLab } from './lab.bench';
import { benchUncertainty } from './uncertainty.bench';
import { benchSupport } from './support.bench';
import type { BenchResult } from './types';

const groups: [string, () => Promise<BenchResult[]>][] = [
  ['voussoir', benchVoussoir],
  ['plate', benchPlate],
  ['analysis', benchAnalysis],
  ['command line', benchCli],
  ['worst case (fuzz set)', () => benchWorstCase()],
  ['lab', benchLab],
  ['uncertainty', benchUncertainty],
  ['support needed', benchSupport],
];

// The browser benchmark (edit → results, bundle size) builds the app and starts chromium.
const uiModule = './ui.bench';
const ui = (await import(uiModule).catch(() => null)) as { benchUi?: () => Promise<BenchResult[]> } | null;
if (ui?.benchUi) groups.push(['web app', ui.benchUi]);
// The uncertainty study in the app (chromium, the production build): the main thread during a run.
const uncertaintyUiModule = './uncertainty-ui.bench';
const uncertaintyUi = (await import(uncertaintyUiModule).catch(() => null)) as { benchUncertaintyUi?: () => Promise<BenchResult[]> } | null;
if (uncertaintyUi?.benchUncertaintyUi) groups.push(['uncertainty in the web app', uncertaintyUi.benchUncertaintyUi]);

const fmt = (us: number) => (us >= 1000 ? `${(us / 1000).toFixed(2)} ms` : `${us.toFixed(2)} µs`);
let failed = 0;
console.log(`Lamina benchmarks — node ${process.version}, ${new Date().toISOString()}`);
for (const [name, run] of groups) {
  console.log(`\n## ${name}`);
  let rows: BenchResult[];
  try {
    rows = await run();
  } catch (e) {
    // one broken benchmark must not hide the others' figures: report it as a failure and go on
    failed++;
    console.log(`✗ ${name}: the benchmark failed: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
    continue;
  }
  for (const r of rows) {
    if (r.pass === false) failed++;
    const ratio = r.ratio === undefined ? '' : `  ×${r.ratio.toFixed(1)} vs ${r.baseline ?? 'baseline'}`;
    console.log(`${r.pass === false ? '✗' : r.pass ? '✓' : ' '} ${r.name}: ${r.min_us === undefined ? fmt(r.median_us) : `${fmt(r.min_us)} / ${fmt(r.median_us)} (min / median)`}${ratio}${r.target ? `  (target ${r.target})` : ''}`);
  }
}
console.log(`\n${failed === 0 ? 'All targets met.' : `${failed} target(s) missed.`}`);
process.exitCode = failed === 0 ? 0 : 1;
