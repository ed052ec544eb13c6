/**
 * The seeded slice of the fuzz harness (`npm run fuzz` runs the full size): random valid
 * projects over the whole accepted range analyse without throwing, with finite numbers and
 * within the report contract; mutated presets are refused with field-path errors or analyse
 * cleanly (issue 14). A correctness test: it asserts no times.
 */
import { describe, it, expect } from 'vitest';
import { failureCount, runFuzz } from './harness';

describe('fuzz slice (seeded): every accepted project analyses cleanly', () => {
  it('2000 random valid projects and 2000 mutated presets: 0 crashes, 0 NaN/Infinity, 0 contract violations, every refusal names its fields', () => {
    const r = runFuzz({ valid: 2000, mutations: 2000, seed: 20261, chartsEvery: 20 });
    const summary = r.failures.map((f) => `${f.kind} #${f.index}: ${f.problems.slice(0, 3).join('; ')}\n  ${f.input.slice(0, 400)}`).join('\n');
    expect(summary).toBe('');
    expect(failureCount(r)).toBe(0);
    expect(r.generatorRefused).toBe(0);
    // the mutations reach both branches: refusals and accepted files
    expect(r.refused).toBeGreaterThan(200);
    expect(r.accepted).toBeGreaterThan(100);
  }, 300_000);
});
