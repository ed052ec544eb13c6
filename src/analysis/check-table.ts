/**
 * The one check table (METHODS §10, DESIGN "Contract changes in v2"): every check of every
 * layer as a row — demand, capacity, FS, target, whether it counts and why not, and the status
 * — and the governing row. The report, the app, the charts, the span finder and the CLI read
 * these rows; none of them re-derives which checks count or which layer governs.
 *
 * Which checks count, per layer at the current span:
 * - Cantilever: tension always counts (an overhang has no post-cracking reserve); a
 *   cross-jointed overhang has no capacity (FS 0). No voussoir checks (no arch can form).
 * - Beam, slab, intersection: a layer is *cracked* when it is cross-jointed or the design
 *   basis is "jointed"; otherwise *uncracked*. Uncracked: tension counts and the voussoir rows
 *   are post-cracking reserve. Cracked: the voussoir rows count and tension does not.
 * - Voussoir rows never count for a block, s/t < 2 (METHODS §3a).
 * FS conventions: tension = design strength / net max tension; crushing = σc / (fc + σh);
 * sliding = fc·n·tanφ/(γ′s); deflection = limit/(δ/t) against 1; snap-through = 1 (stands)
 * or 0 (snaps) against 1. Bolt rows (`support.ts`) follow the layer rows; the probability-of-
 * failure row of the whole roof (`probability-row.ts`, only with an uncertainty run and an
 * acceptable P_f) comes last. Governing: of the counted rows, the smallest FS/target (a
 * standing arch's snap-through row and the P_f row never govern); ties go to the lower layer.
 */
import type { CheckRow, CheckStatusKind, Design, Governing, Mode } from '../model/types';
import { MODES } from './check-labels';
import type { LayerState, State } from './evaluate';
import type { ProjectSI } from './inputs';
import { applySupportRows } from './support';

// The probability-of-failure row of the whole roof (METHODS §16) is a row of this table.
export { acceptablePfMet, probabilityRow, withProbabilityRow, withUncertainty } from './probability-row';

const MPa = 1e-6;

/** Span/thickness at or below which a layer is a deep beam (ACI 318 clear span ≤ 4 × depth; memory). */
export const DEEP_BEAM_RATIO = 4;
/** Span/thickness below which a layer is a block, not a beam (METHODS §3a). */
export const BLOCK_RATIO = 2;

export const REASONS = {
  reserve: 'post-cracking reserve: the layer does not crack',
  block: 'block: s/t < 2',
  crossJointed: 'cross-jointed: no tensile strength',
  jointedBasis: 'basis "jointed": the roof is taken as cracked',
  noNetTension: 'no net tension: the horizontal stress exceeds the bending tension',
  noLoad: 'no net load on this layer',
  overhang: 'overhang: no compression arch can form',
  snapped: 'no arch forms (snap-through), so this check has no value',
} as const;

export function targetFor(mode: Mode, design: Design): number {
  switch (mode) {
    case 'tension':
      return design.fsTarget.tension;
    case 'crushing':
      return design.fsTarget.crushing;
    case 'sliding':
      return design.fsTarget.sliding;
    default:
      return 1;
  }
}

/** limit/(δ/t); a beam that does not deflect (δ = 0) has an unbounded margin, capped at 1e6. */
export function deflectionFs(ratio: number | null, limit: number): number | null {
  if (ratio === null) return null;
  return ratio > limit / 1e6 ? limit / ratio : 1e6;
}

/** How a layer is checked at a span (METHODS §10, §3a). */
export interface LayerCondition {
  cantilever: boolean;
  /** Cross-jointed at this span, or the whole roof taken as cracked (basis "jointed"). */
  cracked: boolean;
  /** s/t < 2. */
  block: boolean;
  /** s/t ≤ 4. */
  deep: boolean;
  slenderness: number;
}

export function layerCondition(p: ProjectSI, layer: Pick<LayerState, 'chain'>, span: number, thickness: number, cantilever: boolean): LayerCondition {
  const slenderness = span / thickness;
  return {
    cantilever,
    cracked: !cantilever && (layer.chain.crossJointed || p.design.basis === 'jointed'),
    block: slenderness < BLOCK_RATIO,
    deep: slenderness <= DEEP_BEAM_RATIO,
    slenderness,
  };
}

/** Which modes count for a layer in this condition (before asking whether each has a value). */
export function countedModes(c: LayerCondition): Record<Mode, boolean> {
  const voussoir = !c.cantilever && c.cracked && !c.block;
  return { tension: c.cantilever || !c.cracked, crushing: voussoir, sliding: voussoir, deflection: voussoir, snapThrough: voussoir };
}

function status(fs: number | null, target: number, counts: boolean): CheckStatusKind {
  if (fs === null) return 'na';
  if (!counts) return 'info';
  // A span found by the search to 1 mm meets its target to rounding: allow 1e-9 relative.
  return fs >= target * (1 - 1e-9) ? 'meets' : 'below';
}

function finite(x: number | null | undefined): number | null {
  return x !== null && x !== undefined && Number.isFinite(x) ? x : null;
}

/**
 * The FS of a layer's row of `mode` (null: the row has no value), the number `checkTable`
 * shows; `limit` is the deflection limit ratio. Shared with the uncertainty run's per-sample
 * path (`sample-evaluate.ts`), which reads the same numbers without building rows.
 */
export function layerRowFs(ls: LayerState, mode: Mode, limit: number): number | null {
  const v = ls.voussoir;
  const snapped = v !== null && v.snapThrough;
  switch (mode) {
    case 'tension':
      return finite(ls.fsTension);
    case 'crushing':
      return snapped || !v ? null : finite(v.fsCrushing);
    case 'sliding':
      return snapped || !v ? null : finite(v.fsSliding);
    case 'deflection': {
      const ratio = v && !snapped ? v.deflectionRatio : null;
      return finite(ratio === null ? null : deflectionFs(ratio, limit));
    }
    case 'snapThrough':
      return v === null ? null : snapped ? 0 : 1;
  }
}

/** A layer row counts when its mode counts for the layer (`countedModes`) and it has a value. */
export function rowCounts(counted: Record<Mode, boolean>, mode: Mode, fs: number | null): boolean {
  return counted[mode] && fs !== null;
}

/** Which modes count in each layer at the state's span (by rule, whether or not the check has a value). */
export function countedModesAt(p: ProjectSI, state: State): Record<Mode, boolean>[] {
  const cantilever = state.ends === 'cantilever';
  return state.layers.map((ls, i) => countedModes(layerCondition(p, ls, state.span, p.layers[i].thickness, cantilever)));
}

/** Every check of every layer at the state's span, in layer order, modes in `MODES` order. */
export function checkTable(p: ProjectSI, state: State): CheckRow[] {
  const rows: CheckRow[] = [];
  const cantilever = state.ends === 'cantilever';
  const limit = p.design.deflectionLimitRatio;
  const tensionCounted: boolean[] = [];
  state.layers.forEach((ls, i) => {
    const input = p.layers[i];
    const cond = layerCondition(p, ls, state.span, input.thickness, cantilever);
    const counted = countedModes(cond);
    tensionCounted.push(counted.tension);
    const v = ls.voussoir;
    const unloaded = !(ls.load > 0);
    const push = (mode: Mode, demand: number | null, capacity: number | null, unit: CheckRow['unit'], why: string | null, note: string) => {
      const value = layerRowFs(ls, mode, limit);
      const counts = rowCounts(counted, mode, value);
      const target = targetFor(mode, p.design);
      const reason = counts ? null : why ?? 'does not apply';
      rows.push({
        layerIndex: i, layer: input.name, mode, demand: finite(demand), capacity: finite(capacity), unit,
        fs: value, target, counts, reason, status: status(value, target, counts), note,
      });
    };

    // Tension: the intact beam (the plate for a slab) against the design tensile strength.
    const demand = ls.maxTension * MPa;
    let tensionWhy: string | null = null;
    if (unloaded) tensionWhy = REASONS.noLoad;
    else if (ls.fsTensionNote === 'crossJointed') tensionWhy = REASONS.crossJointed;
    else if (ls.fsTensionNote === 'noNetTension') tensionWhy = REASONS.noNetTension;
    else if (!counted.tension) tensionWhy = p.design.basis === 'jointed' ? REASONS.jointedBasis : REASONS.crossJointed;
    const where = ls.plate ? `plate maximum at the ${ls.plate.coefficients.at}` : `net maximum at the ${ls.beam.at}`;
    const basisText = p.design.tensileBasis === 'lab' ? 'lab basis (block-scale strength)' : 'rock-mass basis min(block, mass)';
    const tensionNote = ls.fsTensionNote === 'jointedOverhang'
      ? 'cross-jointed overhang: no tensile strength and no arch, FS 0'
      : `${where}; design strength on the ${basisText}`;
    push('tension', demand, ls.chain.design * MPa, 'MPa', tensionWhy, tensionNote);

    // Voussoir rows.
    let archWhy: string | null = null;
    if (cantilever) archWhy = REASONS.overhang;
    else if (unloaded || v === null) archWhy = REASONS.noLoad;
    else if (cond.block) archWhy = cond.cracked ? REASONS.block : `${REASONS.reserve}; ${REASONS.block}`;
    else if (!cond.cracked) archWhy = REASONS.reserve;
    const snapped = v !== null && v.snapThrough;
    const valueWhy = snapped ? REASONS.snapped : archWhy;
    const sh = Math.max(0, p.horizontalStress) * MPa;
    const crushNote = `arch thrust fc${sh > 0 ? ` + σh ${+sh.toPrecision(3)} MPa` : ''} against the ${p.design.crushingStrength === 'lab' ? 'UCS as given' : 'rock-mass UCS σci·s^a'}`;
    push('crushing', v && !snapped ? (v.crushingDemand ?? 0) * MPa : null, v ? ls.crushingStrength * MPa : null, 'MPa', valueWhy, crushNote);
    push('sliding', null, null, null, valueWhy, `FS = fc·n·tanφ/(γ′·s), friction on the cross-joints at the ${cantilever ? 'support' : 'abutment'}`);
    const ratio = v && !snapped ? v.deflectionRatio : null;
    push('deflection', ratio, v && !snapped ? limit : null, 'ratio', valueWhy, 'FS = limit/(δ/t), target 1');
    push('snapThrough', null, null, null, archWhy,
      snapped ? 'the beam snaps through: no compression arch can carry it' : 'an arch forms: FS shown as 1 (stands), target 1');
  });
  // Support (METHODS §12): suspended layers stop counting, bonded tension, bolt/skin/shear rows.
  return applySupportRows(p, state.support, state.layers, rows, tensionCounted);
}

/**
 * Whether a counted row with this FS can govern: a standing arch's snap-through row (FS 1, a
 * yes/no check that is met) never does, nor does the probability-of-failure row (it counts,
 * but the governing row is a factor of safety: `probability-row.ts`); every other counted row
 * can. The uncertainty run's governing FS per sample follows the same rule.
 */
export function canGovern(mode: CheckRow['mode'], fs: number): boolean {
  if (mode === 'probabilityOfFailure') return false;
  return !(mode === 'snapThrough' && fs > 0);
}

/** The counted row with the smallest FS/target (ties: the lower layer); a standing arch's snap-through row and the P_f row never govern. */
export function governingRow(rows: readonly CheckRow[]): CheckRow | null {
  let best: CheckRow | null = null;
  let bestRatio = Infinity;
  for (const r of rows) {
    if (!r.counts || r.fs === null) continue;
    if (!canGovern(r.mode, r.fs)) continue;
    const ratio = r.fs / r.target;
    if (ratio < bestRatio) {
      best = r;
      bestRatio = ratio;
    }
  }
  return best;
}

export function governingOf(rows: readonly CheckRow[]): Governing | null {
  const g = governingRow(rows);
  // Only layer rows can govern (`canGovern`), so the index is a number.
  return g === null ? null : { layerIndex: g.layerIndex ?? 0, layer: g.layer, mode: g.mode, fs: g.fs as number, target: g.target };
}

/** True when every counted check meets its target, the P_f row included when there is one (CLI exit code 0). */
export function allCountedMeet(rows: readonly CheckRow[]): boolean {
  return rows.every((r) => r.status !== 'below');
}

/** The modes counted in at least one layer. */
export function modesCounted(rows: readonly CheckRow[]): Record<Mode, boolean> {
  const out = Object.fromEntries(MODES.map((m) => [m, false])) as Record<Mode, boolean>;
  for (const r of rows) if (r.counts && (MODES as readonly string[]).includes(r.mode)) out[r.mode as Mode] = true;
  return out;
}
