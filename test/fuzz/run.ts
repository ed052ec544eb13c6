/**
 * `npm run fuzz [-- --valid N --mutations M --seed S]`: the fuzz harness (./harness.ts) at
 * full size — by default 100 000 random valid projects and 10 000 mutated presets — printing
 * the counts, every kind of failure found (with the seed and index that reproduce it), and the
 * analyse() time distribution of the valid set. Exit code 1 when anything failed.
 */
import { failureCount, percentile, runFuzz } from './harness';

const arg = (name: string, fallback: number): number => {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? Number(process.argv[i + 1]) : fallback;
};
const valid = arg('valid', 100_000);
const mutations = arg('mutations', 10_000);
const seed = arg('seed', 1);

const t0 = performance.now();
const r = runFuzz({ valid, mutations, seed, maxFailures: 50, onProgress: (n) => process.stderr.write(`  ${n} valid projects…\n`) });
const total = (performance.now() - t0) / 1000;
const fmt = (ms: number) => `${ms.toFixed(ms < 10 ? 2 : 1)} ms`;
console.log(`Lamina fuzz — seed ${seed}, node ${process.version}, ${total.toFixed(0)} s`);
console.log(`valid projects: ${r.valid} (generator refused ${r.generatorRefused})`);
console.log(`mutated presets: ${r.mutations} — refused with field paths ${r.refused}, accepted and analysed ${r.accepted}`);
console.log(`failures (crash, NaN/Infinity, contract): ${failureCount(r)}`);
const dist = (xs: number[]) => `p50 ${fmt(percentile(xs, 0.5))}, p99 ${fmt(percentile(xs, 0.99))}, p99.9 ${fmt(percentile(xs, 0.999))}, max ${fmt(percentile(xs, 1))}`;
console.log(`analyse() wall time over the valid set: ${dist(r.times)}`);
console.log(`analyse() CPU time over the valid set:  ${dist(r.cpuTimes)}`);
for (const f of r.failures) {
  console.log(`\n✗ ${f.kind} #${f.index} (seed ${f.seed}):\n  ${f.problems.slice(0, 6).join('\n  ')}\n  input: ${f.input.slice(0, 2000)}`);
}
process.exitCode = failureCount(r) === 0 ? 0 : 1;
