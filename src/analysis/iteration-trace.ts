/**
 * The iterations behind three traced numbers, recorded by the kernels themselves (their optional
 * recorder argument, so the steps are the ones the result came from):
 * - the voussoir's equilibrium n: each trial n of the bracketed search with its lever arm z and
 *   fc = γ's²/(4nz), and fc(n) on the 0.01 grid of Diederichs & Kaiser (1999) for the chart;
 * - the lever arm z at that n: the published fixed-point iteration from z0, step by step;
 * - the bending groups (Obert & Duvall 1967): each test of adding the next layer to a group.
 * Units as in the trace: m, MPa, mm, kPa.
 */
import type { TraceSteps } from '../model/types';
import type { GroupingStep } from '../mechanics/layering';
import { compressionCurve, solveVoussoir, type VoussoirInput, type VoussoirSearchStep } from '../mechanics/voussoir';
import { leverArmByIteration, type LeverArmStep } from '../mechanics/voussoir-sweep';

const MPa = 1e-6;
const kPa = 1e-3;
const mm = 1e3;

/** Rows kept of a long lever-arm iteration: the first and the last ones. */
const HEAD_ROWS = 40;
const TAIL_ROWS = 10;

/** The grid of the published sweep, n = 0.01 … 0.99, for the chart of fc(n). */
export const SWEEP_GRID: readonly number[] = Array.from({ length: 99 }, (_, i) => (i + 1) / 100);

const STAGE_WORD: Record<VoussoirSearchStep['stage'], string> = {
  scan: 'scan',
  walk: 'bracket',
  refine: 'refine',
  result: 'minimum',
};

/** The search for n as the solver did it, and the fc(n) curve; null after snap-through. */
export function voussoirSearchSteps(input: VoussoirInput): { steps: TraceSteps; n: number } | null {
  const recorded: VoussoirSearchStep[] = [];
  const result = solveVoussoir(input, (s) => recorded.push(s));
  if (result.n === null) return null;
  const curve = compressionCurve(input, SWEEP_GRID).map((p): [number, number | null] => [p.n, p.maxCompression === null ? null : p.maxCompression * MPa]);
  return {
    n: result.n,
    steps: {
      caption:
        'Search for the equilibrium n (least fc): a scan of n = 0.1 … 0.9, the bracket around the minimum, then false-position/bisection steps on d(n·z)/dn = 0 until the bracket is narrower than 1e-7. z at each n is the converged lever arm (largest root of z³ − z0² z + K = 0); "—" where n has no lever arm.',
      columns: [
        { symbol: 'n', label: 'n', unit: '' },
        { symbol: 'z', label: 'z', unit: 'm' },
        { symbol: 'fc', label: 'fc', unit: 'MPa' },
        { symbol: 'n_lower', label: 'Bracket from n', unit: '' },
        { symbol: 'n_upper', label: 'to n', unit: '' },
      ],
      rows: recorded.map((s) => [s.n, s.leverArm, s.maxCompression === null ? null : s.maxCompression * MPa, s.lower, s.upper]),
      stage: recorded.map((s) => STAGE_WORD[s.stage]),
      marked: recorded.length - 1,
      curve,
    },
  };
}

/** The published fixed-point iteration of z at n, from z0 (the trace's check on the closed form). */
export function leverArmSteps(input: VoussoirInput, n: number): TraceSteps {
  const recorded: LeverArmStep[] = [];
  leverArmByIteration(input, n, (s) => recorded.push(s));
  const total = recorded.length;
  const shown = total > HEAD_ROWS + TAIL_ROWS ? [...recorded.slice(0, HEAD_ROWS), ...recorded.slice(total - TAIL_ROWS)] : recorded;
  const skipped = total - shown.length;
  return {
    caption:
      `Lever-arm iteration at n = ${n.toPrecision(6)}: from z = z0, fc = γ' s²/(4 n z), fav = fc (2/3 + n)/3, ΔL = fav L/E, next z = √((3s/8)(8 z0²/(3s) − ΔL)), until the change is below 1e-10 t` +
      ` (${total} steps${skipped > 0 ? `; steps ${HEAD_ROWS + 1}–${total - TAIL_ROWS} not shown` : ''}).`,
    columns: [
      { symbol: 'k', label: 'Step', unit: '' },
      { symbol: 'z', label: 'z', unit: 'm' },
      { symbol: 'fc', label: 'fc', unit: 'MPa' },
      { symbol: 'dL', label: 'ΔL', unit: 'mm' },
      { symbol: 'z_next', label: 'Next z', unit: 'm' },
    ],
    rows: shown.map((s) => [s.k, s.z, s.maxCompression * MPa, s.shortening * mm, s.next]),
    stage: shown.map((s, i) => (s.next === null ? 'no root' : i === shown.length - 1 ? 'converged' : '')),
    marked: shown.length - 1,
  };
}

/** The group-formation tests as a table (layer numbers from 1). */
export function groupingTable(steps: readonly GroupingStep[], names: readonly string[]): TraceSteps {
  return {
    caption:
      'Bending groups, built upward from the immediate roof: a layer joins the group below while the load on the group\'s lowest layer does not fall when it is added, (q_{n+1})₁ ≥ (q_n)₁; otherwise it is stiffer, separates and starts the next group.',
    columns: [
      { symbol: 'layer', label: 'Layer tested', unit: '' },
      { symbol: 'lowest', label: 'Lowest layer of the group', unit: '' },
      { symbol: 'q_without', label: 'Load on the lowest without it', unit: 'kPa' },
      { symbol: 'q_with', label: 'with it', unit: 'kPa' },
    ],
    rows: steps.map((s) => [s.layer + 1, s.first + 1, s.without * kPa, s.with * kPa]),
    stage: steps.map((s) => (s.joins ? `${names[s.layer] ?? ''} joins` : `${names[s.layer] ?? ''} separates`)),
    marked: null,
  };
}
