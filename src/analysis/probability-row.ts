/**
 * The probability-of-failure row of the one check table (METHODS §16): Lamina sets no
 * acceptable P_f; a file's `uncertainty.acceptablePf` adds one counted row for the whole roof.
 * The rule: P_f meets the acceptable level when the upper end of its 95 % interval is at or
 * below it (a run too short to show it gives "below"). The row counts in the verdict and the
 * exit code (`allCountedMeet`) but never governs: the governing row is a factor of safety
 * (`canGovern`). Without an acceptable P_f, or without a run, there is no row.
 *
 * Its FS is acceptable / upper end (capped at 1e6, never NaN or Infinity) against a target of
 * 1, so that FS ≥ 1 reads as it does on every other row; the status comes from the rule itself.
 *
 *     const a = withUncertainty(analyse(project), runUncertainty(project));
 *     allCountedMeet(a.report.checks) // false when the interval's upper end exceeds acceptablePf
 */
import type { CheckRow, UncertaintyReport } from '../model/types';
import { WHOLE_ROOF } from './check-labels';
import type { Analysis } from './types';

export const PF_MODE = 'probabilityOfFailure' as const;
export { WHOLE_ROOF };

/** The cap on the row's FS (an upper end of 0 cannot occur, but the FS stays finite). */
const FS_CAP = 1e6;

/** The one rule: the 95 % interval's upper end at or below the acceptable P_f. */
export function acceptablePfMet(pfInterval: readonly [number, number], acceptablePf: number): boolean {
  return pfInterval[1] <= acceptablePf;
}

type RowInputs = Pick<UncertaintyReport, 'pf' | 'pfInterval' | 'intervalMethod' | 'acceptablePf' | 'evaluated' | 'seed' | 'method'>;

const fix = (x: number): string => String(+x.toPrecision(3));

/** The row for a run, or null when the run has no acceptable P_f. */
export function probabilityRow(u: RowInputs): CheckRow | null {
  const acceptable = u.acceptablePf;
  if (acceptable === null || !(acceptable > 0)) return null;
  const upper = u.pfInterval[1];
  if (!Number.isFinite(upper) || upper < 0) return null;
  const meets = acceptablePfMet(u.pfInterval, acceptable);
  const fs = upper > acceptable / FS_CAP ? acceptable / upper : FS_CAP;
  const method = u.method === 'latinHypercube' ? 'Latin hypercube' : 'plain Monte Carlo';
  const interval = u.intervalMethod === 'wilson' ? 'Wilson' : 'rule of three 3/N';
  return {
    layerIndex: null,
    layer: WHOLE_ROOF,
    mode: PF_MODE,
    demand: upper,
    capacity: acceptable,
    unit: 'probability',
    fs,
    target: 1,
    counts: true,
    reason: null,
    status: meets ? 'meets' : 'below',
    note:
      `judged by the upper end of the 95 % interval (${interval}) of P_f ${fix(u.pf)}: ${fix(upper)} against the acceptable ${fix(acceptable)}; ` +
      `${u.evaluated} samples, ${method}, seed ${u.seed}; FS = acceptable / upper end, target 1; counted, never governing`,
  };
}

/** The rows with the run's P_f row (if any) in place of any earlier one; the layer rows untouched. */
export function withProbabilityRow(rows: readonly CheckRow[], u: RowInputs | null | undefined): CheckRow[] {
  const out = rows.filter((r) => r.mode !== PF_MODE);
  const row = u ? probabilityRow(u) : null;
  if (row) out.push(row);
  return out;
}

/**
 * The analysis with an uncertainty run in its report: `report.uncertainty` and the P_f row in
 * the check table (the governing row is unchanged: the P_f row never governs). A null run
 * removes both.
 */
export function withUncertainty(analysis: Analysis, u: UncertaintyReport | null): Analysis {
  const report = { ...analysis.report, checks: withProbabilityRow(analysis.report.checks, u), uncertainty: u };
  return { ...analysis, report };
}
