/**
 * Benchmark of the built command line (dist-node/, built first), each figure beside a baseline
 * measured in the same run:
 *   - cold start: CPU time of `lamina --help` and of `lamina check PRESET` for every shipped
 *     preset, against `node -e 0` (targets ≤ 2× and ≤ 3×);
 *   - 1,000 project files in one `lamina check` call (target ≤ 5 s), against the same 1,000
 *     files analysed by a plain script through the library entry;
 *   - a batch of 10,000 openings (target ≤ 30 s), against the same rows checked through the
 *     library entry.
 *
 * Method. Each process's CPU time (user + system, all threads) is what `process.cpuUsage()`
 * reads from getrusage(RUSAGE_SELF) inside that process at exit: test/bench/cpu-report.mjs is
 * preloaded with `node --import` into every measured process, baseline included, and appends
 * it to a file. This needs no `/usr/bin/time`, has microsecond resolution (unlike the 10 ms
 * ticks of /proc's child times) and is immune to other load on the machine (wall time is not;
 * it is printed beside). Cold starts run in 5 batches of ≥ 1 s of baseline processes each,
 * the kinds interleaved within a batch so they share the machine's state; each figure is the
 * min / median over the batches of the mean per process, and the ratio is the median of the
 * per-batch ratios. The two batch jobs run 5 times each, alternating with their baseline.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { BenchResult } from './types';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const HOOK = join(ROOT, 'test/bench/cpu-report.mjs');
const RUNS = 5;

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const min = (xs: number[]) => Math.min(...xs);

/** CPU time (µs) and wall time (µs) of one node process running `args`. */
function measure(args: string[], cpuFile: string): { cpu: number; wall: number } {
  writeFileSync(cpuFile, '');
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, ['--import', HOOK, ...args], { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'], env: { ...process.env, LAMINA_BENCH_CPU_FILE: cpuFile }, maxBuffer: 1 << 26 });
  const wall = Number(process.hrtime.bigint() - t0) / 1e3;
  if (r.status !== 0 && r.status !== 1) throw new Error(`${args.join(' ')} exited ${r.status}: ${r.stderr}`);
  const cpu = Number(readFileSync(cpuFile, 'utf8').trim().split('\n').pop());
  if (!(cpu > 0)) throw new Error(`no CPU time reported by ${args.join(' ')}`);
  return { cpu, wall };
}

export async function benchCli(): Promise<BenchResult[]> {
  const build = spawnSync('npm', ['run', '-s', 'build:node'], { cwd: ROOT, stdio: 'inherit' });
  if (build.status !== 0) throw new Error('npm run build:node failed');
  const work = mkdtempSync(join(tmpdir(), 'lamina-bench-'));
  const cpuFile = join(work, 'cpu.txt');
  const bin = join(ROOT, 'dist-node/lamina.js');
  const presets = readdirSync(join(ROOT, 'presets')).filter((f) => f.endsWith('.lamina.json')).sort();
  if (presets.length === 0) throw new Error('no presets/*.lamina.json to time');
  // the strata of the openings batch: the coal-room demo
  const coalName = presets.find((p) => p.includes('coal'));
  if (!coalName) throw new Error('no coal-room preset in presets/ for the openings batch');
  const coal = `presets/${coalName}`;
  const results: BenchResult[] = [];
  try {
    // ---- cold start: --help, and check of every shipped preset (the heaviest decides the target)
    const kinds: Record<string, string[]> = { baseline: ['-e', '0'], help: [bin, '--help'] };
    for (const p of presets) kinds[p] = [bin, 'check', `presets/${p}`];
    const probe = median(Array.from({ length: 3 }, () => measure(kinds.baseline, cpuFile).cpu));
    const perBatch = Math.max(5, Math.ceil(1e6 / probe)); // ≥ 1 s of baseline CPU per batch
    const means: Record<string, number[]> = Object.fromEntries(Object.keys(kinds).map((k) => [k, [] as number[]]));
    for (let b = 0; b < RUNS; b++) {
      const sums: Record<string, number> = Object.fromEntries(Object.keys(kinds).map((k) => [k, 0]));
      for (let k = 0; k < perBatch; k++) for (const [kind, args] of Object.entries(kinds)) sums[kind] += measure(args, cpuFile).cpu;
      for (const kind of Object.keys(kinds)) means[kind].push(sums[kind] / perBatch);
    }
    const base = means.baseline;
    const baseText = `node -e 0: ${(min(base) / 1e3).toFixed(0)}/${(median(base) / 1e3).toFixed(0)} ms CPU (min/median of ${RUNS} batches × ${perBatch})`;
    const cold = (kind: string, name: string, limit: number): BenchResult => {
      const ratio = median(means[kind].map((m, b) => m / base[b]));
      return { name, min_us: min(means[kind]), median_us: median(means[kind]), baseline: baseText, ratio, target: `≤ ${limit}× node -e 0 (CPU)`, pass: ratio <= limit };
    };
    results.push(cold('help', 'cold start `lamina --help`, CPU per process', 2));
    for (const p of presets) results.push(cold(p, `\`lamina check presets/${p}\`, CPU per process`, 3));

    // ---- 1,000 project files in one call
    const filesDir = join(work, 'files');
    spawnSync('mkdir', ['-p', filesDir]);
    const texts = presets.map((p) => JSON.parse(readFileSync(join(ROOT, 'presets', p), 'utf8')));
    for (let i = 0; i < 1000; i++) {
      const p = structuredClone(texts[i % texts.length]);
      p.opening.span_m = Number((p.opening.span_m * (0.8 + (0.4 * i) / 1000)).toFixed(3)); // distinct projects, no cache hits
      if (p.opening.length_m) p.opening.length_m = Math.max(p.opening.length_m, p.opening.span_m);
      writeFileSync(join(filesDir, `p${String(i).padStart(4, '0')}.lamina.json`), JSON.stringify(p));
    }
    const libScript = join(work, 'lib-check.mjs');
    writeFileSync(libScript, [
      `import { readFileSync, readdirSync } from 'node:fs';`,
      `import { readProjectText, analyseProject } from ${JSON.stringify(join(ROOT, 'dist-node/index.js'))};`,
      `const dir = ${JSON.stringify(filesDir)};`,
      `for (const f of readdirSync(dir).sort()) process.stdout.write(JSON.stringify(analyseProject(readProjectText(readFileSync(dir + '/' + f, 'utf8')).project)) + '\\n');`,
    ].join('\n'));
    const many = { cli: [] as { cpu: number; wall: number }[], lib: [] as { cpu: number; wall: number }[] };
    for (let r = 0; r < RUNS; r++) {
      many.lib.push(measure([libScript], cpuFile));
      many.cli.push(measure([bin, 'check', `${filesDir}/*.lamina.json`, '--jsonl'], cpuFile));
    }
    const pair = (xs: { cpu: number; wall: number }[], k: 'cpu' | 'wall') => xs.map((x) => x[k]);
    const fmtS = (us: number[]) => `${(min(us) / 1e6).toFixed(2)}/${(median(us) / 1e6).toFixed(2)} s`;
    results.push({
      name: `1,000 project files in one \`lamina check --jsonl\` call, CPU (wall ${fmtS(pair(many.cli, 'wall'))} min/median)`,
      min_us: min(pair(many.cli, 'cpu')), median_us: median(pair(many.cli, 'cpu')),
      baseline: `the same files through the library entry: ${fmtS(pair(many.lib, 'cpu'))} CPU`,
      ratio: median(many.cli.map((c, i) => c.cpu / many.lib[i].cpu)), target: '≤ 5 s', pass: median(pair(many.cli, 'cpu')) <= 5e6,
    });

    // ---- 10,000 openings
    const types = ['beam', 'beam', 'slab', 'cantilever'];
    const rows = ['name,type,span_m,length_m,ends,surcharge_kPa'];
    for (let i = 0; i < 10_000; i++) {
      const t = types[i % 4];
      const s = t === 'cantilever' ? 0.5 + (i % 30) * 0.05 : 3 + (i % 50) * 0.1;
      rows.push([`Opening ${i + 1}`, t, s.toFixed(2), t === 'slab' ? (s * (1 + (i % 7) * 0.3)).toFixed(2) : '', i % 3 ? 'clamped' : 'simple', (i % 5) * 5].join(','));
    }
    const table = join(work, 'openings.csv');
    writeFileSync(table, rows.join('\n') + '\n');
    const batchScript = join(work, 'lib-openings.mjs');
    writeFileSync(batchScript, [
      `import { readFileSync } from 'node:fs';`,
      `import { readProjectText, parseOpeningsCsv, checkOpening } from ${JSON.stringify(join(ROOT, 'dist-node/index.js'))};`,
      `const strata = readProjectText(readFileSync(${JSON.stringify(join(ROOT, coal))}, 'utf8')).project;`,
      `for (const o of parseOpeningsCsv(readFileSync(${JSON.stringify(table)}, 'utf8')).openings) process.stdout.write(JSON.stringify(checkOpening(strata, o)) + '\\n');`,
    ].join('\n'));
    const batch = { cli: [] as { cpu: number; wall: number }[], lib: [] as { cpu: number; wall: number }[] };
    for (let r = 0; r < RUNS; r++) {
      batch.lib.push(measure([batchScript], cpuFile));
      batch.cli.push(measure([bin, 'openings', coal, table, '--csv', join(work, 'out.csv')], cpuFile));
    }
    results.push({
      name: `batch of 10,000 openings (\`lamina openings … --csv\`), CPU (wall ${fmtS(pair(batch.cli, 'wall'))} min/median)`,
      min_us: min(pair(batch.cli, 'cpu')), median_us: median(pair(batch.cli, 'cpu')),
      baseline: `the same rows through the library entry: ${fmtS(pair(batch.lib, 'cpu'))} CPU`,
      ratio: median(batch.cli.map((c, i) => c.cpu / batch.lib[i].cpu)), target: '≤ 30 s', pass: median(pair(batch.cli, 'cpu')) <= 30e6,
    });
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
  return results;
}
