/**
 * The recorded steps of a trace entry (the n search, the lever-arm iteration, the bending-group
 * tests) as a printable table, and the n search as a chart. Used by the report's trace and by
 * the app's trace dialog, so both show the same steps.
 */
import type { TraceSteps } from '../model/types';
import type { ChartBlock, TableBlock } from './document-types';
import { searchCurveSvg } from './charts/search-curve';
import { MISSING, PRECISION, numberText } from './number-text';
import { unitText } from './unit-text';

/** The steps as a table: one row per step, numbers to the trace precision, the stage last. */
export function stepsTable(steps: TraceSteps): TableBlock {
  const integer = (symbol: string): boolean => symbol === 'k' || symbol === 'layer' || symbol === 'lowest';
  return {
    kind: 'table',
    caption: steps.caption,
    columns: [
      ...steps.columns.map((c) => ({ title: c.unit ? `${c.label} (${unitText(c.unit)})` : c.label, numeric: true })),
      { title: 'Stage' },
    ],
    rows: steps.rows.map((row, r) => [
      ...row.map((v, j) => ({ text: v === null ? MISSING : integer(steps.columns[j]?.symbol ?? '') ? String(v) : numberText(v, PRECISION.trace), value: v, numeric: true })),
      { text: r === steps.marked ? `${steps.stage[r] ?? ''} ◀` : steps.stage[r] ?? '' },
    ]),
  };
}

/** The chart of the searched function, where the steps carry one (fc against n). */
export function stepsChart(steps: TraceSteps): ChartBlock | null {
  if (!steps.curve) return null;
  return {
    kind: 'chart',
    title: 'fc(n) with its minimum',
    svg: searchCurveSvg(steps),
    caption: 'fc = γ\'s²/(4nz) on the 0.01 grid of Diederichs & Kaiser (line), the trials of the search (circles), the equilibrium n (diamond).',
  };
}
