/**
 * The support needed (METHODS §12): searches over the one check table, each with every other
 * input held —
 * (a) the smallest standing support pressure that makes every counted check meet its target
 *     at the current span (bolts as given);
 * (b) for the given bolt length, capacity and action, the largest square spacing 0.3–3 m;
 * (c) for the given spacing, capacity and action, the shortest bolt length in 0.1 m steps
 *     (from the anchorage + 0.1 m up to the strata thickness);
 * (d) the largest span with the support as given (to 1 cm, cap 100 m).
 * Strength chains are held at the current-span values through every search (as the span
 * finder does, METHODS §11). The searches are kept cheap (they add at most 3× to an analysis,
 * test/bench/support.bench.ts): each trial gives the margin (least FS/target of the counted
 * checks) as well as pass/fail, and a crossing is narrowed by margin-guided regula falsi
 * (`refineCrossing`) rather than plain bisection; the pressure is tried up to the weight of
 * the strata and surcharge (beyond it support is dropped); spacings on a 0.25 m grid from 3 m
 * down, refined to 1 cm (patterns are set out to the centimetre); one bolt length per
 * anchorage (the checks depend on the length only through it); the span bracketed upward
 * from the given span where it passes (else an 8-sample geometric grid from the cap down),
 * refined to 1 cm. The caller's analysis may pass its
 * strength chains and check table (`analyseWithSupportNeeded` does).
 * "Passes" means: no counted row of the check table is below its target (`allCountedMeet`).
 * Where the unsupported roof (no bolts, no standing support) already passes, nothing is
 * searched: `needed` is null with the reason "no support needed". Where a search finds
 * nothing, one sentence names the check that support cannot fix, from the rows still below
 * target at the strongest support tried.
 */
import type { CheckRow, Project, SupportNeededReport } from '../model/types';
import { refineCrossing, shortestBoltLength, type Probe } from '../mechanics/support-search';
import { boltAnchorage } from '../mechanics/bolt-anchorage';
import { allCountedMeet, checkTable } from './check-table';
import { MODE_NAME } from './check-labels';
import { evaluate } from './evaluate';
import { projectToSI } from './inputs';
import type { StrengthChain } from '../strength/chain';
import { SPAN_CAP_M } from './span-finder';
import { inOpeningWords } from '../model/span-wording';

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

/** The least FS/target over the counted rows with a value (Infinity when none counts). */
export function countedMargin(rows: readonly CheckRow[]): number {
  let m = Infinity;
  for (const r of rows) if (r.counts && r.fs !== null) m = Math.min(m, r.fs / r.target);
  return m;
}

/** One trial: passes (exactly as `allCountedMeet`) and the margin that guides the next trial. */
function probeOf(project: Project, chains?: Chains): Probe & { rows: CheckRow[] } {
  const rows = rowsOf(project, chains);
  return { passes: allCountedMeet(rows), margin: countedMargin(rows), rows };
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

/** One sentence naming what still falls short, from the check rows at the strongest support tried. */
export function cannotFixSentence(project: Project, what: string, rows?: readonly CheckRow[]): string {
  const below = (rows ?? rowsOf(project)).filter((r) => r.status === 'below');
  if (below.length === 0) return `${what}: nothing in the range searched passes.`;
  const worst = below.reduce((a, b) => ((a.fs as number) / a.target <= (b.fs as number) / b.target ? a : b));
  return `${what} cannot fix ${MODE_NAME[worst.mode]} of ${worst.layerIndex === null ? 'the whole roof' : `layer ${worst.layerIndex + 1} “${worst.layer}”`} (FS ${+(worst.fs as number).toPrecision(3)} against ${worst.target}).`;
}

export interface SupportNeeded {
  needed: SupportNeededReport | null;
  reason: string | null;
}

/** What an analysis of the same project already knows (saves recomputing it). */
export interface SupportNeededHints {
  /** The strength chains at the project's span. */
  chains?: StrengthChain[];
  /** The project's own check table, as given. */
  rows?: readonly CheckRow[];
}

/** Square spacings 0.3–3 m (METHODS §12): a 0.25 m grid below 3 m, tried from the top down. */
const SPACING_MAX = 3;
const SPACING_MIN = 0.3;
const SPACING_GRID = Array.from({ length: 11 }, (_, k) => +(2.75 - 0.25 * k).toFixed(2)).concat([SPACING_MIN]);
/** Refinement tolerances: spacing to 1 cm (patterns are set out to the centimetre), span to 1 cm. */
const SPACING_TOLERANCE = 1e-2;
const SPAN_TOLERANCE = 1e-2;
/** Span grid: 8 geometric samples over cap/1000 … cap (×2.68 apart), continued down to 1 mm. */
const SPAN_SAMPLES = 8;
const SPAN_FLOOR = 1e-3;

export function supportNeeded(project: Project, hints: SupportNeededHints = {}): SupportNeeded {
  const chains = hints.chains ?? evaluate(projectToSI(project)).layers.map((l) => l.chain);
  const bare: Project = { ...project, support: { standing_kPa: 0, bolts: null } };
  const bareRows = rowsOf(bare, chains);
  if (allCountedMeet(bareRows)) return { needed: null, reason: NO_SUPPORT_NEEDED };
  const reasons: string[] = [];
  const given: Probe & { rows: readonly CheckRow[] } = hints.rows
    ? { passes: allCountedMeet(hints.rows), margin: countedMargin(hints.rows), rows: hints.rows }
    : probeOf(project, chains);

  // (a) standing support, bolts as given. Pressure beyond the whole weight of the strata and
  // the surcharge is dropped (METHODS §12), so that is the strongest support worth trying.
  let pa: number | null = 0;
  if (!given.passes) {
    const weight_kPa = project.layers.reduce((w, l) => w + l.unitWeight_kNm3 * l.thickness_m, 0) + project.loads.surcharge_kPa;
    const max = Math.min(PRESSURE_MAX, weight_kPa * 1e3 * (1 + 1e-9));
    const top = probeOf(withStanding(project, max / 1e3), chains);
    if (top.passes) {
      pa = refineCrossing((x) => probeOf(withStanding(project, x / 1e3), chains), max, top, 0, given, 10);
    } else {
      pa = null;
      reasons.push(cannotFixSentence(project, `Standing support up to ${+(max / 1e3).toPrecision(3)} kPa (the weight of the strata and surcharge)`, top.rows));
    }
  }

  // (b), (c) need a pattern to vary.
  const bolts = project.support.bolts;
  let spacing: number | null = null;
  let length: number | null = null;
  if (bolts === null) {
    reasons.push('No bolt pattern given: enter a bolt length, capacity and action to size the spacing and the length.');
  } else {
    const square = (S: number) => probeOf(withBolts(project, { spacingAcross_m: S, spacingAlong_m: S }), chains);
    const top = square(SPACING_MAX);
    let last: Probe & { rows: readonly CheckRow[] } = top;
    if (top.passes) spacing = SPACING_MAX;
    else {
      // Start the downward scan just below where FS ∝ S⁻² (bolt load, skin) would cross, then
      // step down the 0.25 m grid; the crossing above the first passing trial is refined.
      const guess = top.margin > 0 && Number.isFinite(top.margin) ? SPACING_MAX * Math.sqrt(top.margin) : SPACING_MAX;
      let above: { x: number; probe: Probe } = { x: SPACING_MAX, probe: top };
      for (const S of SPACING_GRID) {
        if (S >= above.x || (S > guess && S > SPACING_MIN)) continue;
        const r = square(S);
        last = r;
        if (r.passes) {
          spacing = refineCrossing(square, S, r, above.x, above.probe, SPACING_TOLERANCE, true);
          break;
        }
        above = { x: S, probe: r };
      }
    }
    if (spacing === null) reasons.push(cannotFixSentence(project, 'Bolts at 0.3 m spacing', last.rows));

    // The checks depend on the length only through where it anchors (anchor layer, hanging and
    // bonded layers, or a zone across an interface), so one length per anchorage is evaluated.
    const thicknesses = project.layers.map((l) => l.thickness_m);
    const strata = thicknesses.reduce((t, x) => t + x, 0);
    const min = Math.round((bolts.anchorage_m + 0.1) * 10) / 10;
    const byAnchorage = new Map<string, readonly CheckRow[]>();
    // A length whose anchorage changes nothing (a zone across an interface, nothing hanging, or
    // fewer than two bonded layers) checks as the roof without bolts: known to fail when there
    // is no standing support (the bare roof was tried above).
    const key = (L: number): string => {
      const a = boltAnchorage(thicknesses, L, Math.min(bolts.anchorage_m, L));
      if (a.kind !== 'anchored') return 'none';
      if (bolts.action === 'suspension') return a.suspended.length === 0 ? 'none' : `s${a.anchorLayer}|${a.suspended.length}`;
      return a.withinBolt.length < 2 ? 'none' : `b${a.withinBolt.length}`;
    };
    if (project.support.standing_kPa === 0) byAnchorage.set('none', bareRows);
    if (min <= strata) {
      length = shortestBoltLength((L) => {
        const k = key(L);
        if (byAnchorage.has(k)) return false; // the same anchorage as a shorter bolt that failed
        const r = probeOf(withBolts(project, { length_m: L }), chains);
        byAnchorage.set(k, r.rows);
        return r.passes;
      }, { min, max: strata });
    }
    if (length === null) {
      const rows = min <= strata ? byAnchorage.get(key(strata)) : undefined;
      reasons.push(cannotFixSentence(withBolts(project, { length_m: strata }), `Bolts ${min}–${+strata.toPrecision(4)} m long (up to the strata thickness)`, rows));
    }
  }

  // (d) the largest span with the support as given. Where the given span passes, bracket upward
  // from it: first just beyond where FS ∝ s⁻² (beam tension) would cross, doubling while it
  // still passes; otherwise scan a geometric grid from the cap down. Then refine the crossing.
  const atSpan = (s: number) => probeOf(withSpan(project, s), chains);
  const cap = SPAN_CAP_M;
  const s0 = project.opening.span_m;
  let span = 0;
  if (given.passes && s0 < cap) {
    let pass = s0;
    let passing: Probe = given;
    let x = Math.min(cap, s0 * Math.sqrt(Math.min(Math.max(given.margin, 1), 1e6)) * 1.02);
    for (;;) {
      const r = atSpan(x);
      if (!r.passes) {
        span = refineCrossing(atSpan, pass, passing, x, r, SPAN_TOLERANCE, true);
        break;
      }
      if (x >= cap) {
        span = cap;
        break;
      }
      pass = x;
      passing = r;
      x = Math.min(cap, 2 * x);
    }
  } else {
    const capProbe = atSpan(cap);
    if (capProbe.passes) span = cap;
    else {
      const step = 10 ** (3 / (SPAN_SAMPLES - 1));
      let above = { x: cap, probe: capProbe as Probe };
      for (let s = cap / step; above.x > SPAN_FLOOR; s /= step) {
        const x = Math.max(s, SPAN_FLOOR);
        const r = atSpan(x);
        if (r.passes) {
          span = refineCrossing(atSpan, x, r, above.x, above.probe, Math.min(SPAN_TOLERANCE, x / 10), true);
          break;
        }
        above = { x, probe: r };
      }
    }
  }
  return {
    needed: { standing_kPa: pa === null ? null : pa / 1e3, boltSpacing_m: spacing, boltLength_m: length, maxSpan_m: span > 0 ? span : null, reasons: reasons.map((r) => inOpeningWords(r, project.opening.type)) },
    reason: null,
  };
}

/**
 * The governing FS/target of the whole check table (support rows included) against span, with
 * the support as given and without it, strength chains held at the current span (METHODS §11);
 * null where no check counts; capped at 1e6. For the "with this support" curve of the span
 * finder and the report. Spans in the entered scale (entry width for an intersection).
 */
export function supportMarginCurve(project: Project, spans_m: readonly number[], chains?: StrengthChain[]): { withSupport: (number | null)[]; unsupported: (number | null)[] } {
  const held = chains ?? evaluate(projectToSI(project)).layers.map((l) => l.chain);
  const bare: Project = { ...project, support: { standing_kPa: 0, bolts: null } };
  const at = (p: Project, s: number): number | null => {
    const m = countedMargin(rowsOf(withSpan(p, s), held));
    return Number.isFinite(m) ? Math.min(m, 1e6) : null;
  };
  return { withSupport: spans_m.map((s) => at(project, s)), unsupported: spans_m.map((s) => at(bare, s)) };
}

/**
 * For the design chart: at each thickness of layer `layerIndex`, the largest span in
 * [spans_m[0], spans_m[last]] (entered scale) at which every counted check meets its target,
 * with the support as given and without it; strength chains held at the project's span for each
 * thickness; the crossing refined to 1/100 of the range (the range's ends are tried first, and
 * the checks are taken to fall with span between them, as the chart draws them).
 */
export function supportSpanByThickness(
  project: Project, layerIndex: number, thicknesses_m: readonly number[], spanRange: readonly [number, number],
): { withSupport_m: (number | null)[]; unsupported_m: (number | null)[] } {
  const [lo, hi] = spanRange;
  const tolerance = (hi - lo) / 100;
  const largest = (p: Project): number | null => {
    const chains = evaluate(projectToSI(p)).layers.map((l) => l.chain);
    const at = (s: number) => probeOf(withSpan(p, s), chains);
    const top = at(hi);
    if (top.passes) return hi;
    const bottom = at(lo);
    if (!bottom.passes) return null;
    return refineCrossing(at, lo, bottom, hi, top, tolerance, true);
  };
  const withThickness = (p: Project, t: number): Project => ({ ...p, layers: p.layers.map((l, i) => (i === layerIndex ? { ...l, thickness_m: t } : l)) });
  const bareOf = (p: Project): Project => ({ ...p, support: { standing_kPa: 0, bolts: null } });
  const fits = (p: Project) => !p.support.bolts || p.support.bolts.length_m <= p.layers.reduce((a, l) => a + l.thickness_m, 0) + 1e-9;
  return {
    // A thinner layer can leave a bolt longer than the strata: no anchorage there, so no value.
    withSupport_m: thicknesses_m.map((t) => { const p = withThickness(project, t); return fits(p) ? largest(p) : null; }),
    unsupported_m: thicknesses_m.map((t) => largest(bareOf(withThickness(project, t)))),
  };
}
