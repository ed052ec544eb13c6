/**
 * A bolt pattern applied to the layer states (METHODS §12): where the bolts anchor, which
 * layers hang from them (suspension) or bend as one (beam building), and the rows they add to
 * the one check table — `bolt` (FS per bolt), `skin` (each hanging layer between the bolts)
 * and `interlayerShear` (each interface of a bonded set) — plus how they change the rows of
 * the layers they act on:
 * - Suspension: the hanging layers no longer span the opening (their load there is 0; the
 *   evaluation moved their weight onto the anchor layer's group with `suspendedLoads`), so
 *   their own tension and voussoir rows do not count ("suspended from the bolts"); their skin
 *   rows count. The skin's voussoir sliding FS does not count: the bolt plates hold the skin
 *   (and that FS falls as the bolts close up, `mechanics/skin.ts`).
 * - Beam building: the layers wholly within the bolt length as one composite beam (full bond,
 *   upper bound) and unbonded (§2, lower bound); the bonded tension counts only when every
 *   interface's shear FS meets `fsTarget.bolt`, else the unbonded rows count with the reason.
 * - An anchorage zone across an interface earns no credit (ANCHOR_AT_INTERFACE).
 * Standing support relieves the hanging weight first (it pushes on the lowest layer).
 * SI inside (m, N, Pa); rows in MPa, kN, kPa as labelled.
 */
import type { BoltAction, CheckRow, CheckStatusKind, Design } from '../model/types';
import { boltAnchorage, type BoltAnchorage } from '../mechanics/bolt-anchorage';
import { boltSuspension, type SuspensionResult } from '../mechanics/suspension';
import { skinCheck, type SkinResult } from '../mechanics/skin';
import { compositeBeam, type CompositeResult } from '../mechanics/composite-beam';
import { interlayerShearCheck, type InterlayerShearResult } from '../mechanics/interlayer-shear';
import type { BeamEnds } from '../mechanics/beam';
import type { ProjectSI } from './inputs';
import type { LayerState } from './evaluate';

const MPa = 1e-6;
const kPa = 1e-3;
const kN = 1e-3;

/** A bolt pattern in SI: m, N. */
export interface BoltsSI {
  length: number;
  capacity: number;
  spacingAcross: number;
  spacingAlong: number;
  anchorage: number;
  action: BoltAction;
  shearCapacity: number;
  pretension: number;
}

export const SUPPORT_REASONS = {
  suspended: 'suspended from the bolts',
  skinSliding: 'skin sliding does not count: the bolt plates hold the skin',
  notCredited: 'composite action not credited: the interlayer shear is below the bolt target, so the unbonded layers count',
  atInterface: 'the anchorage zone straddles an interface: no anchorage credited',
  nothingHangs: 'nothing hangs from the bolts: the anchorage is in the immediate roof',
} as const;

export interface SkinState {
  layer: number;
  skin: SkinResult;
}

export interface InterfaceState {
  lowerLayer: number;
  /** τ = V Q/(I b), Pa. */
  shearStress: number;
  check: InterlayerShearResult;
}

export interface CompositeState {
  /** The bonded layers (indices, from the roof line up). */
  layers: number[];
  result: CompositeResult;
  interfaces: InterfaceState[];
  /** Least interface FS; null where no interface carries shear. */
  fsShear: number | null;
  credited: boolean;
}

export interface SupportState {
  bolts: BoltsSI;
  anchorage: BoltAnchorage;
  /** Suspension with at least one hanging layer (anchored); null otherwise. */
  suspension: { anchorLayer: number; suspended: number[]; result: SuspensionResult; skins: SkinState[] } | null;
  /** Beam building with at least two bonded layers; null otherwise. */
  composite: CompositeState | null;
}

/** Where the pattern anchors (`null` without bolts). */
export function anchorageOf(p: ProjectSI): BoltAnchorage | null {
  if (!p.bolts) return null;
  return boltAnchorage(p.layers.map((l) => l.thickness), p.bolts.length, p.bolts.anchorage);
}

/** The layers that hang from the bolts (suspension, anchored), or null: the evaluation then shares loads by §2 alone. */
export function suspensionOf(p: ProjectSI): { anchorLayer: number; suspended: number[] } | null {
  const a = anchorageOf(p);
  if (!p.bolts || p.bolts.action !== 'suspension' || !a || a.kind !== 'anchored' || a.suspended.length === 0) return null;
  return { anchorLayer: a.anchorLayer, suspended: a.suspended };
}

/** The design tensile strength a skin has between bolts: uncracked when its joints are wider than the bolt spacing. */
function skinStrength(ls: LayerState, skin: SkinResult): number {
  return skin.cracked ? 0 : ls.chain.designUncracked;
}

/** Apply the pattern to the evaluated layers (loads already moved by suspension). null without bolts. */
export function supportState(p: ProjectSI, span: number, ends: BeamEnds, layers: readonly LayerState[]): SupportState | null {
  const bolts = p.bolts;
  const anchorage = anchorageOf(p);
  if (!bolts || !anchorage) return null;
  if (anchorage.kind !== 'anchored') return { bolts, anchorage, suspension: null, composite: null };
  let suspension: SupportState['suspension'] = null;
  const hang = suspensionOf(p);
  if (hang) {
    const result = boltSuspension({
      suspended: hang.suspended.map((i) => ({ unitWeight: p.layers[i].unitWeight, thickness: p.layers[i].thickness })),
      spacingAcross: bolts.spacingAcross,
      spacingAlong: bolts.spacingAlong,
      capacity: bolts.capacity,
      standingSupport: p.support,
    });
    const skins = hang.suspended.map((i): SkinState => {
      const l = p.layers[i];
      return {
        layer: i,
        skin: skinCheck({
          thickness: l.thickness, unitWeight: l.unitWeight, modulus: layers[i].modulusMass,
          spacingAcross: bolts.spacingAcross, spacingAlong: bolts.spacingAlong,
          ucs: layers[i].crushingStrength, frictionDeg: l.jointFriction, jointSpacing: l.crossJointSpacing,
        }),
      };
    });
    suspension = { ...hang, result, skins };
  }
  let composite: CompositeState | null = null;
  const within = anchorage.withinBolt;
  if (bolts.action === 'beamBuilding' && within.length >= 2 && within.every((i) => layers[i].load > 0)) {
    // The bonded set carries the loads the §2 sharing gave its layers (their own weight and what bears on them).
    const result = compositeBeam({
      span,
      ends,
      layers: within.map((i) => ({ thickness: p.layers[i].thickness, modulus: layers[i].modulusBeam, unitWeight: layers[i].load / p.layers[i].thickness })),
    });
    const interfaces = result.interfaces.map((f): InterfaceState => ({
      lowerLayer: within[f.lowerLayer],
      shearStress: f.shearStress,
      check: interlayerShearCheck({
        shearStress: f.shearStress, capacity: bolts.capacity, shearCapacity: bolts.shearCapacity, pretension: bolts.pretension,
        frictionDeg: p.layers[within[f.lowerLayer]].jointFriction, spacingAcross: bolts.spacingAcross, spacingAlong: bolts.spacingAlong,
      }),
    }));
    const values = interfaces.map((f) => f.check.fs).filter((x): x is number => x !== null);
    const fsShear = values.length ? Math.min(...values) : null;
    const credited = fsShear === null || fsShear >= p.design.fsTarget.bolt * (1 - 1e-9);
    composite = { layers: within, result, interfaces, fsShear, credited };
  }
  return { bolts, anchorage, suspension, composite };
}

function statusOf(fs: number | null, target: number, counts: boolean): CheckStatusKind {
  if (fs === null) return 'na';
  if (!counts) return 'info';
  return fs >= target * (1 - 1e-9) ? 'meets' : 'below';
}

const finite = (x: number | null): number | null => (x !== null && Number.isFinite(x) ? x : null);

function row(
  p: ProjectSI, layerIndex: number, mode: CheckRow['mode'], fs: number | null, target: number, counts: boolean, reason: string | null,
  demand: number | null, capacity: number | null, unit: CheckRow['unit'], note: string,
): CheckRow {
  const value = finite(fs);
  const c = counts && value !== null;
  return {
    layerIndex, layer: p.layers[layerIndex].name, mode, demand: finite(demand), capacity: finite(capacity), unit, fs: value, target,
    counts: c, reason: c ? null : reason ?? 'does not apply', status: statusOf(value, target, c), note,
  };
}

export function boltTarget(design: Design): number {
  return design.fsTarget.bolt;
}

/**
 * The check table with the support applied: the rows of suspended layers stop counting, the
 * tension rows of a credited bonded set take the bonded stress, and the bolt, skin and
 * interlayer-shear rows follow the layer rows.
 */
export function applySupportRows(
  p: ProjectSI, support: SupportState | null, layers: readonly LayerState[], rows: CheckRow[], tensionCounted: readonly boolean[],
): CheckRow[] {
  if (!support) return rows;
  const out = rows.map((r) => ({ ...r }));
  const b = support.bolts;
  const target = boltTarget(p.design);
  const sh = p.horizontalStress;
  const extra: CheckRow[] = [];
  const a = support.anchorage;
  if (a.kind === 'atInterface') {
    extra.push(row(p, a.lowerLayer, 'bolt', null, target, false, SUPPORT_REASONS.atInterface, null, b.capacity * kN, 'kN',
      `anchorage zone ${+a.zone[0].toFixed(3)}–${+a.zone[1].toFixed(3)} m crosses the interface at ${+a.interfaceHeight.toFixed(3)} m`));
    return [...out, ...extra];
  }
  if (a.kind !== 'anchored') return out;
  if (b.action === 'suspension') {
    const s = support.suspension;
    if (!s) {
      extra.push(row(p, a.anchorLayer, 'bolt', null, target, false, SUPPORT_REASONS.nothingHangs, null, b.capacity * kN, 'kN', 'suspension: no layer lies wholly below the anchorage zone'));
    } else {
      for (const r of out) {
        if (r.layerIndex !== null && s.suspended.includes(r.layerIndex)) {
          r.counts = false;
          r.reason = SUPPORT_REASONS.suspended;
          r.status = r.fs === null ? 'na' : 'info';
        }
      }
      extra.push(row(p, s.anchorLayer, 'bolt', s.result.fs, target, true, 'no load hangs from the bolts', s.result.load * kN, b.capacity * kN, 'kN',
        `load per bolt P = (Σγt of layers ${s.suspended.map((i) => i + 1).join(', ')} − standing support) × Sx × Sy; FS = capacity / P`));
      for (const { layer, skin } of s.skins) {
        const ls = layers[layer];
        if (skin.cracked) {
          const v = skin.voussoir;
          const snapped = !v || v.snapThrough;
          const fs = snapped ? 0 : v.fsCrushing;
          const slide = v && !v.snapThrough && v.fsSliding !== null ? `; sliding FS ${+v.fsSliding.toPrecision(3)} shown, not counted (${SUPPORT_REASONS.skinSliding})` : '';
          extra.push(row(p, layer, 'skin', fs, p.design.fsTarget.crushing, true, null,
            snapped ? null : (v.crushingDemand ?? 0) * MPa, ls.crushingStrength * MPa, 'MPa',
            `cracked skin (joints closer than the ${+skin.span.toPrecision(3)} m bolt spacing): voussoir crushing on the bolt spacing${snapped ? ', snaps through: FS 0' : ''}${slide}`));
        } else {
          const net = skin.elastic.maxTension - sh;
          const strength = skinStrength(ls, skin);
          extra.push(row(p, layer, 'skin', net > 0 ? strength / net : null, p.design.fsTarget.tension, true,
            'no net tension: the horizontal stress exceeds the bending tension', net * MPa, strength * MPa, 'MPa',
            `skin between bolts: clamped beam of span max(Sx, Sy) = ${+skin.span.toPrecision(3)} m under its own weight`));
        }
      }
    }
  }
  const c = support.composite;
  if (c) {
    for (const f of c.interfaces) {
      extra.push(row(p, f.lowerLayer, 'interlayerShear', f.check.fs, target, c.credited, c.credited ? 'no shear at this interface' : SUPPORT_REASONS.notCredited,
        f.shearStress * kPa, f.check.resistance * kPa, 'kPa',
        `interface above layer ${f.lowerLayer + 1}: τ = V Q/(I b) against the bolts' (V_b + T₀ tanφ)/(Sx Sy)`));
    }
    c.layers.forEach((layerIndex, k) => {
      const r = out.find((x) => x.layerIndex === layerIndex && x.mode === 'tension');
      if (!r) return;
      const bonded = c.result.bonded[k].maxTension - sh;
      const unbonded = r.demand;
      if (c.credited) {
        const design = layers[layerIndex].chain.design;
        const fs = bonded > 0 && design > 0 ? design / bonded : bonded > 0 ? 0 : null;
        const replaced = row(p, layerIndex, 'tension', fs, r.target, tensionCounted[layerIndex], r.reason ?? 'no net tension in the bonded beam',
          bonded * MPa, design * MPa, 'MPa',
          `bonded composite beam (beam building, upper bound), own fibres against own strength; unbonded ${unbonded === null ? 'n/a' : `${+unbonded.toPrecision(3)} MPa`}`);
        Object.assign(r, replaced);
      } else {
        r.note = `${r.note}; unbonded (lower bound) counts: ${SUPPORT_REASONS.notCredited}; bonded would be ${+(bonded * MPa).toPrecision(3)} MPa`;
      }
    });
  }
  return [...out, ...extra];
}
