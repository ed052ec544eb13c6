/**
 * The support needed (METHODS §12): searches over the one check table, each with every other
 * input held —
 * (a) the smallest standing support pressure that makes every counted check meet its target
 *     at the current span (bolts as given);
 * (b) for the given bolt length, capacity and action, the largest square spacing 0.3–3 m;
 * (c) for the given spacing, capacity and action, the shortest bolt length in 0.1 m steps
 *     (from the anchorage + 0.1 m up to the strata thickness);
 * (d) the largest span with the support as given (to 1 mm, cap 100 m).
 * Strength chains are held at the current-span values through every search (as the span
 * finder does, METHODS §11). The span search samples 16 spans (not 64) and bisects to 1 cm;
 * the spacing is found to 5 mm (bolt patterns are set out to the centimetre).
 * "Passes" means: no counted row of the check table is below its target (`allCountedMeet`).
 * Where the unsupported roof (no bolts, no standing support) already passes, nothing is
 * searched: `needed` is null with the reason "no support needed". Where a search finds
 * nothing, one sentence names the check that support cannot fix, from the rows still below
 * target at the strongest support tried.
 */
import type { CheckRow, Project, SupportNeededReport } from '../model/types';
import { largestPassingSpan } from '../mechanics/span-search';
import { largestSquareSpacing, shortestBoltLength, smallestStandingPressure } from '../mechanics/support-search';
import { allCountedMeet, checkTable } from './check-table';
import { MODE_NAME } from './check-labels';
import { evaluate } from './evaluate';
import { projectToSI } from './inputs';
import type { StrengthChain } from '../strength/chain';
import { SPAN_CAP_M } from './span-finder';

export const NO_SUPPORT_NEEDED = 'no support needed';

/** Largest standing pressure tried, Pa (10 MPa: far beyond any prop or crib). */
const PRESSURE_MAX = 10e6;

/** Strength chains held fixed through a search (they depend on the span only; METHODS §11 holds them at the current span). */
type Chains = StrengthChain[] | undefined;

function rowsOf(project: Project, chains?: Chains): CheckRow[] {
  const p = projectToSI(project);
  return checkTable(p, evaluate(p, chains ? { chains } : {}));
}

/** True when every counted check of the project meets its target (strength chains recomputed unless given). */
export function supportPasses(project: Project, chains?: Chains): boolean {
  return allCountedMeet(rowsOf(project, chains));
}

const withStanding = (project: Project, kPa: number): Project => ({ ...project, support: { ...project.support, standing_kPa: kPa } });
const withBolts = (project: Project, edit: Partial<NonNullable<Project['support']['bolts']>>): Project => ({
  ...project,
  support: { ...project.support, bolts: project.support.bolts ? { ...project.support.bolts, ...edit } : null },
});
/** The project at another span; a slab's or intersection's other side keeps its ratio to the span. */
const withSpan = (project: Project, span_m: number): Project => {
  const o = project.opening;
  const length_m = o.length_m === null ? null : (o.length_m * span_m) / o.span_m;
  return { ...project, opening: { ...o, span_m, length_m } };
};

/** One sentence naming what still falls short when `project` is given the strongest support tried. */
export function cannotFixSentence(project: Project, what: string): string {
  const below = rowsOf(project).filter((r) => r.status === 'below');
  if (below.length === 0) return `${what}: nothing in the range searched passes.`;
  const worst = below.reduce((a, b) => ((a.fs as number) / a.target <= (b.fs as number) / b.target ? a : b));
  return `${what} cannot fix ${MODE_NAME[worst.mode]} of layer ${worst.layerIndex + 1} “${worst.layer}” (FS ${+(worst.fs as number).toPrecision(3)} against ${worst.target}).`;
}

export interface SupportNeeded {
  needed: SupportNeededReport | null;
  reason: string | null;
}

export function supportNeeded(project: Project): SupportNeeded {
  const bare: Project = { ...project, support: { standing_kPa: 0, bolts: null } };
  if (supportPasses(bare)) return { needed: null, reason: NO_SUPPORT_NEEDED };
  const reasons: string[] = [];
  const chains = evaluate(projectToSI(project)).layers.map((l) => l.chain);

  // (a) standing support, bolts as given.
  const pa = smallestStandingPressure((pr) => supportPasses(withStanding(project, pr / 1e3), chains), { max: PRESSURE_MAX });
  if (pa === null) reasons.push(cannotFixSentence(withStanding(project, PRESSURE_MAX / 1e3), 'Standing support up to 10 MPa'));

  // (b), (c) need a pattern to vary.
  const bolts = project.support.bolts;
  let spacing: number | null = null;
  let length: number | null = null;
  if (bolts === null) {
    reasons.push('No bolt pattern given: enter a bolt length, capacity and action to size the spacing and the length.');
  } else {
    spacing = largestSquareSpacing((s) => supportPasses(withBolts(project, { spacingAcross_m: s, spacingAlong_m: s }), chains), { tolerance: 5e-3 });
    if (spacing === null) reasons.push(cannotFixSentence(withBolts(project, { spacingAcross_m: 0.3, spacingAlong_m: 0.3 }), 'Bolts at 0.3 m spacing'));
    const strata = project.layers.reduce((t, l) => t + l.thickness_m, 0);
    const min = Math.round((bolts.anchorage_m + 0.1) * 10) / 10;
    if (min <= strata) {
      length = shortestBoltLength((L) => supportPasses(withBolts(project, { length_m: L }), chains), { min, max: strata });
    }
    if (length === null) reasons.push(cannotFixSentence(withBolts(project, { length_m: strata }), `Bolts ${min}–${+strata.toPrecision(4)} m long (up to the strata thickness)`));
  }

  // (d) the largest span with the support as given.
  const cap = SPAN_CAP_M;
  const span = largestPassingSpan((s) => (supportPasses(withSpan(project, s), chains) ? 1 : 0), { cap, tolerance: 1e-2, samples: 16 });
  return {
    needed: { standing_kPa: pa === null ? null : pa / 1e3, boltSpacing_m: spacing, boltLength_m: length, maxSpan_m: span > 0 ? span : null, reasons },
    reason: null,
  };
}
