import { describe, expect, it } from 'vitest';
import { analyse, meetsTargets } from '../../src/analysis/analyse';
import { allCountedMeet, canGovern, governingOf, governingRow } from '../../src/analysis/check-table';
import { acceptablePfMet, probabilityRow, withProbabilityRow, withUncertainty, WHOLE_ROOF } from '../../src/analysis/probability-row';
import { buildVerdict } from '../../src/analysis/verdict';
import type { Project, UncertaintyReport } from '../../src/model/types';
import { resultsCsv } from '../../src/report/results-csv';
import { normalCdf } from '../../src/uncertainty/standard-normal';
import { runUncertainty } from '../../src/uncertainty/run';
import { rsProject } from '../uncertainty/rs-project';

/**
 * The R − S arrangement of METHODS §16 (normal R μ 2 V 0.25, S μ 1 V 0.1): P_f = Φ(−1/√(0.5² + 0.1²))
 * = 2.49e-2 in closed form (Ang & Tang 2007, ch. 6; memory). At the means FS = 2; with the tension
 * target set to 1.5 every deterministic check meets, so only the P_f row can make the verdict "below".
 */
function rs(acceptablePf: number | null): Project {
  const p = rsProject('normal', 4000, 1, acceptablePf);
  p.design.fsTarget.tension = 1.5;
  return p;
}
const CLOSED_PF = normalCdf(-1 / Math.sqrt(0.5 ** 2 + 0.1 ** 2));

function run(p: Project): UncertaintyReport {
  return runUncertainty(p, { spanPoints: 0, form: false });
}

describe('the probability-of-failure row of the check table (METHODS §16)', () => {
  const met = rs(1e-1);
  const metBlock = run(met);
  const notMet = rs(1e-3);
  const notMetBlock = run(notMet);

  it('the run brackets the closed-form P_f 2.49e-2 (the row is judged on this interval)', () => {
    expect(CLOSED_PF).toBeCloseTo(2.49e-2, 4);
    expect(metBlock.pfInterval[0]).toBeLessThanOrEqual(CLOSED_PF);
    expect(metBlock.pfInterval[1]).toBeGreaterThanOrEqual(CLOSED_PF);
  });

  it('acceptable P_f 1e-1 above the interval: one counted row that meets, FS = acceptable / upper end', () => {
    const a = withUncertainty(analyse(met), metBlock);
    const rows = a.report.checks.filter((r) => r.mode === 'probabilityOfFailure');
    expect(rows).toHaveLength(1);
    const row = rows[0];
    expect(row.layerIndex).toBe(null);
    expect(row.layer).toBe(WHOLE_ROOF);
    expect(row.counts).toBe(true);
    expect(row.reason).toBe(null);
    expect(row.status).toBe('meets');
    expect(row.demand).toBe(metBlock.pfInterval[1]);
    expect(row.capacity).toBe(1e-1);
    expect(row.target).toBe(1);
    expect(row.fs).toBeCloseTo(1e-1 / metBlock.pfInterval[1], 12);
    expect(row.fs as number).toBeGreaterThan(1);
    expect(row.note).toContain('upper end of the 95 % interval');
    expect(row.note).toContain(`${metBlock.evaluated} samples`);
    expect(row.note).toContain(`seed ${metBlock.seed}`);
    expect(allCountedMeet(a.report.checks)).toBe(true);
    expect(meetsTargets(met, a.report)).toBe(true);
    expect(buildVerdict(met, a.report).overall).toBe('meets');
    expect(metBlock.meetsAcceptablePf).toBe(true);
  }, 60_000);

  it('acceptable P_f 1e-3 below the interval: the row is below and the verdict turns below, the governing row unchanged', () => {
    const plain = analyse(notMet);
    expect(allCountedMeet(plain.report.checks)).toBe(true); // FS 2 against 1.5
    const a = withUncertainty(plain, notMetBlock);
    const row = a.report.checks.find((r) => r.mode === 'probabilityOfFailure')!;
    expect(row.status).toBe('below');
    expect(row.fs as number).toBeLessThan(1);
    expect(allCountedMeet(a.report.checks)).toBe(false);
    expect(meetsTargets(notMet, a.report)).toBe(false);
    expect(notMetBlock.meetsAcceptablePf).toBe(false);
    // never governs: the governing row is still the tension factor of safety
    expect(a.report.governing).toEqual(plain.report.governing);
    expect(governingRow(a.report.checks)?.mode).toBe('tension');
    expect(governingOf(a.report.checks)).toEqual(plain.report.governing);
    const v = buildVerdict(notMet, a.report);
    expect(v.below).toBe(1);
    expect(v.governing?.mode).toBe('tension');
    // the governing FS meets; all counted rows together do not
    expect(v.status).toBe('meets');
    expect(v.overall).toBe('below');
    expect(v.sentences.find((s) => s.id === 'result')!.text).toContain('probability of failure');
  }, 60_000);

  it('no acceptable P_f, or no run: no row', () => {
    const none = rs(null);
    const block = run(none);
    expect(probabilityRow(block)).toBe(null);
    expect(withUncertainty(analyse(none), block).report.checks.some((r) => r.mode === 'probabilityOfFailure')).toBe(false);
    expect(withProbabilityRow(analyse(met).report.checks, null).some((r) => r.mode === 'probabilityOfFailure')).toBe(false);
    expect(block.meetsAcceptablePf).toBe(null);
  }, 60_000);

  it('the row never governs, even at an FS far below every other row', () => {
    expect(canGovern('probabilityOfFailure', 0)).toBe(false);
    expect(canGovern('probabilityOfFailure', 1e-6)).toBe(false);
    const rows = withProbabilityRow(analyse(notMet).report.checks, { ...notMetBlock, pfInterval: [0.5, 0.99], pf: 0.9 });
    const row = rows.find((r) => r.mode === 'probabilityOfFailure')!;
    expect(row.fs as number).toBeLessThan(0.01);
    expect(governingRow(rows)?.mode).toBe('tension');
  });

  it('a second run replaces the row (never two)', () => {
    const once = withUncertainty(analyse(met), metBlock);
    const twice = withUncertainty(once, notMetBlock);
    expect(twice.report.checks.filter((r) => r.mode === 'probabilityOfFailure').map((r) => r.status)).toEqual(['below']);
    expect(withUncertainty(twice, null).report.checks.some((r) => r.mode === 'probabilityOfFailure')).toBe(false);
  });

  it('the rule is the interval’s upper end at or below the acceptable P_f; the FS stays finite', () => {
    // Wilson upper end equal to the acceptable level: met (at or below), FS exactly 1.
    expect(acceptablePfMet([0.01, 0.02], 0.02)).toBe(true);
    expect(acceptablePfMet([0.01, 0.0200001], 0.02)).toBe(false);
    const base = { pf: 0, intervalMethod: 'ruleOfThree' as const, evaluated: 1000, seed: 1, method: 'monteCarlo' as const };
    const zero = probabilityRow({ ...base, pfInterval: [0, 0], acceptablePf: 1e-3 })!;
    expect(zero.fs).toBe(1e6);
    expect(zero.status).toBe('meets');
    // no failure in 1000: the rule of three gives 3/1000 = 3e-3 (METHODS §16), above 1e-3
    const three = probabilityRow({ ...base, pfInterval: [0, 3 / 1000], acceptablePf: 1e-3 })!;
    expect(three.status).toBe('below');
    expect(three.fs).toBeCloseTo(1 / 3, 12);
    expect(JSON.stringify([zero, three])).not.toMatch(/NaN|Infinity/);
  });

  it('the CSV writes the row with an empty layer number and the probabilities in the ratio columns', () => {
    const a = withUncertainty(analyse(notMet), notMetBlock);
    const csv = resultsCsv(a, 'SI', notMet);
    const line = csv.split('\n').find((l) => l.includes('probabilityOfFailure'))!;
    expect(line.startsWith(`,${WHOLE_ROOF},probabilityOfFailure,,,${notMetBlock.pfInterval[1]},0.001,`)).toBe(true);
    expect(line).toContain(',yes,below,');
    expect(csv).not.toMatch(/NaN|Infinity/);
  });
});
