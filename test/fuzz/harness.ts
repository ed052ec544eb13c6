/**
 * The fuzz harness behind `npm run fuzz` and the seeded slice in `npm test`: random valid
 * projects over the whole accepted range (./generate.ts) must analyse cleanly under the
 * contract (./contract.ts), and mutated presets (./mutate.ts) must either be refused with
 * field-path errors (every message starts with its path) or analyse cleanly.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { validateProject } from '../../src/model/validate';
import { seeded } from '../helpers/seeded';
import { checkProject } from './contract';
import { randomValidProject } from './generate';
import { mutateProject } from './mutate';

export interface FuzzFailure {
  kind: 'valid' | 'mutation';
  /** Seed and index that reproduce the case. */
  seed: number;
  index: number;
  problems: string[];
  input: string;
}

export interface FuzzResult {
  valid: number;
  /** Generated projects the validator refused (a generator error: counted as failures too). */
  generatorRefused: number;
  mutations: number;
  refused: number;
  accepted: number;
  failures: FuzzFailure[];
  /** analyse() times of the valid set, ms, sorted: wall clock, and the process's CPU time (the fairer figure on a shared machine). */
  times: number[];
  cpuTimes: number[];
}

const PRESET_DIR = join(import.meta.dirname, '../../presets');

export function presetFiles(): unknown[] {
  return readdirSync(PRESET_DIR).filter((f) => f.endsWith('.lamina.json')).sort().map((f) => JSON.parse(readFileSync(join(PRESET_DIR, f), 'utf8')));
}

export function percentile(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) return 0;
  return sorted[Math.min(sorted.length - 1, Math.ceil(p * sorted.length) - 1)];
}

/** Every refusal must name its fields: a non-empty path for each error, and the message starting with it. */
function refusalProblems(errors: { path: string; message: string }[]): string[] {
  const out: string[] = [];
  if (errors.length === 0) out.push('refused without an error');
  for (const e of errors) {
    if (!e.message.startsWith(e.path ? `${e.path}: ` : '')) out.push(`message does not start with its path "${e.path}": ${e.message}`);
  }
  return out;
}

export function runFuzz(options: { valid: number; mutations: number; seed: number; chartsEvery?: number; maxFailures?: number; onProgress?: (done: number) => void }): FuzzResult {
  const { valid, mutations, seed, chartsEvery = 10, maxFailures = 20 } = options;
  const result: FuzzResult = { valid, generatorRefused: 0, mutations, refused: 0, accepted: 0, failures: [], times: [], cpuTimes: [] };
  const fail = (f: FuzzFailure) => { if (result.failures.length < maxFailures) result.failures.push(f); else result.failures.length; };
  let failureCount = 0;
  const r = seeded(seed);
  for (let i = 0; i < valid; i++) {
    const raw = randomValidProject(r);
    const v = validateProject(raw);
    if (!v.ok) {
      result.generatorRefused++;
      failureCount++;
      fail({ kind: 'valid', seed, index: i, problems: ['generator made a refused project', ...v.errors.map((e) => e.message)], input: JSON.stringify(raw) });
      continue;
    }
    const { violations, ms, cpuMs } = checkProject(v.project, i % chartsEvery === 0);
    result.times.push(ms);
    result.cpuTimes.push(cpuMs);
    if (violations.length) {
      failureCount++;
      fail({ kind: 'valid', seed, index: i, problems: violations, input: JSON.stringify(raw) });
    }
    if (options.onProgress && (i + 1) % 5000 === 0) options.onProgress(i + 1);
  }
  const presets = presetFiles();
  const m = seeded(seed ^ 0x5eed);
  for (let i = 0; i < mutations; i++) {
    const text = mutateProject(m, presets[i % presets.length]);
    const v = validateProject(JSON.parse(text));
    if (!v.ok) {
      result.refused++;
      const problems = refusalProblems(v.errors);
      if (problems.length) {
        failureCount++;
        fail({ kind: 'mutation', seed, index: i, problems, input: text });
      }
      continue;
    }
    result.accepted++;
    const { violations } = checkProject(v.project, i % chartsEvery === 0);
    if (violations.length) {
      failureCount++;
      fail({ kind: 'mutation', seed, index: i, problems: violations, input: text });
    }
  }
  result.times.sort((a, b) => a - b);
  result.cpuTimes.sort((a, b) => a - b);
  Object.defineProperty(result, 'failureCount', { value: failureCount, enumerable: true });
  return result;
}

export const failureCount = (r: FuzzResult): number => (r as FuzzResult & { failureCount: number }).failureCount;
