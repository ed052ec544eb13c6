/**
 * The numeric core of an analysis: every layer's strength chain, modulus, group, load, elastic
 * beam, plate and voussoir state at one span, with no trace or formatting. `analyse` builds the
 * report from it; the span, thickness and chart searches call it (or its parts) many times.
 */
import { elasticBeam, type BeamEnds, type BeamResult } from '../mechanics/beam';
import { groupLayers, shareLoads, type GroupingStep, type SharedLoads } from '../mechanics/layering';
import { plateCoefficients, type PlateCoefficients } from '../mechanics/plate';
import { solveVoussoir, type VoussoirInput, type VoussoirRecorder, type VoussoirResult } from '../mechanics/voussoir';
import { rockMassModulus } from '../strength/rock-mass-modulus';
import { strengthChain, type StrengthChain } from '../strength/chain';
import type { LayerSI, ProjectSI } from './inputs';
import { suspendedLoads } from '../mechanics/suspension';
import { supportState, suspensionOf, type SupportState } from './support';

export interface PlateState {
  coefficients: PlateCoefficients;
  /** Net maximum tension β q a²/t² − σh, Pa. */
  maxTension: number;
  /** α q a⁴/(E t³), m. */
  deflection: number;
}

export interface LayerState {
  chain: StrengthChain;
  /** Compressive strength of the voussoir crushing check, Pa: rock-mass σci·s^a or the UCS as given. */
  crushingStrength: number;
  /** Modulus after the modulus basis (rock-mass modulus when the input is intact). */
  modulusMass: number;
  /** Modulus in the elastic beam: modulusMass, or modulusMass/(1 − ν²) with the plane-strain option. */
  modulusBeam: number;
  group: number;
  /** Load carried by the layer, Pa. */
  load: number;
  beam: BeamResult;
  plate: PlateState | null;
  /** Net maximum tension used for FS tension (plate for a slab), Pa. */
  maxTension: number;
  /**
   * FS tension; null where it does not apply (cross-jointed roof beam: the voussoir governs;
   * no net tension). A cross-jointed cantilever has no capacity at all: FS 0.
   */
  fsTension: number | null;
  fsTensionNote: 'crossJointed' | 'noNetTension' | 'jointedOverhang' | null;
  /** Effective unit weight γ' = q/t, N/m³. */
  effectiveUnitWeight: number;
  /** null for a cantilever, or when the layer carries no net downward load. */
  voussoir: VoussoirResult | null;
}

export interface State {
  span: number;
  ends: BeamEnds;
  shared: SharedLoads & { groupOf: number[] };
  layers: LayerState[];
  /** The bolt pattern applied (METHODS §12); null without bolts. */
  support: SupportState | null;
}

export function beamEnds(p: ProjectSI): BeamEnds {
  return p.type === 'cantilever' ? 'cantilever' : p.ends;
}

export function chainFor(layer: LayerSI, span: number, p: ProjectSI): StrengthChain {
  return strengthChain({
    specimens: layer.specimens,
    value: layer.tensileValue,
    method: layer.tensileMethod,
    rockClass: layer.rockClass,
    characteristic: p.design.characteristic,
    tensileBasis: p.design.tensileBasis,
    thickness: layer.thickness,
    span,
    crossJointSpacing: layer.crossJointSpacing,
    fractureFrequency: layer.fractureFrequency,
    rqd: layer.rqd,
    jointCondition: layer.jointCondition,
    ucs: layer.ucs,
    mi: layer.mi,
    disturbance: layer.disturbance,
  });
}

export function moduliFor(layer: LayerSI, chain: StrengthChain, p: ProjectSI): { mass: number; beam: number } {
  const mass = layer.modulusBasis === 'intact' ? rockMassModulus(layer.modulus, chain.gsi, layer.disturbance) : layer.modulus;
  const beam = p.design.planeStrainModulus ? mass / (1 - layer.poisson * layer.poisson) : mass;
  return { mass, beam };
}

/**
 * Longest b/a solved. A longer plate has reached its plane-strain strip limit (METHODS §4,
 * b/a → ∞) wherever it matters: the short-edge effects decay within about 2a, and Lamina's β
 * and α at b/a = 20, 40, 70 and 100 agree within 0.05 % (clamped β 0.5021–0.5022, α 0.0294;
 * simple β 0.7500, α 0.1465 at ν = 0.25), a tenth of the 0.5 % solution accuracy. The limit is
 * β = 3/4 simple and 1/2 clamped; the clamped plate keeps a 0.4 % overshoot of the edge moment
 * near its short edges, which the b/a = 20 solution includes. Solving at 20 rather than at the
 * true ratio keeps a long slab as fast as a short one.
 */
export const STRIP_ASPECT = 20;

/** b/a solved for a slab: the project's ratio (held fixed when the span varies, METHODS §11), at most `STRIP_ASPECT`. */
export function plateAspect(p: ProjectSI): number {
  return p.length === null ? 1 : Math.min(p.length / p.span, STRIP_ASPECT);
}

/** β, α for a slab at `plateAspect` (the aspect ratio is held fixed when the span varies). */
export function plateFor(p: ProjectSI, poisson: number): PlateCoefficients | null {
  if (p.type !== 'slab' || p.length === null) return null;
  const aspect = plateAspect(p);
  return p.plateSource ? p.plateSource(aspect, poisson) : plateCoefficients({ aspect, edges: p.plateEdges, poisson });
}

export interface EvaluateOptions {
  /** Span to evaluate at (default: the project's). */
  span?: number;
  /** Strength chains to hold fixed (the current-span values), instead of recomputing. */
  chains?: StrengthChain[];
  /** Solve the voussoir only for this layer (design-chart cells); others get null. */
  voussoirOnly?: number;
}

/** Crushing strength of the voussoir (METHODS §3a): "rockMass" σci·s^a (default) or "lab" (UCS as given). */
export function crushingStrengthFor(layer: LayerSI, chain: StrengthChain, p: ProjectSI): number {
  return p.design.crushingStrength === 'lab' ? layer.ucs : chain.massUcs;
}

/** The voussoir of one layer; σh enters its crushing demand only (METHODS §3a). null when unloaded. */
export function voussoirFor(
  layer: LayerSI,
  span: number,
  thickness: number,
  effectiveUnitWeight: number,
  modulus: number,
  crushingStrength: number,
  horizontalStress: number,
  record?: VoussoirRecorder,
): VoussoirResult | null {
  if (!(effectiveUnitWeight > 0)) return null;
  return solveVoussoir(voussoirInputFor(layer, span, thickness, effectiveUnitWeight, modulus, crushingStrength, horizontalStress), record);
}

/** The voussoir kernel's input for one layer (see `voussoirFor`). */
export function voussoirInputFor(
  layer: LayerSI,
  span: number,
  thickness: number,
  effectiveUnitWeight: number,
  modulus: number,
  crushingStrength: number,
  horizontalStress: number,
): VoussoirInput {
  return { span, thickness, unitWeight: effectiveUnitWeight, modulus, ucs: crushingStrength, frictionDeg: layer.jointFriction, horizontalStress };
}

export function evaluate(p: ProjectSI, options: EvaluateOptions = {}): State {
  const span = options.span ?? p.span;
  const ends = beamEnds(p);
  const chains = options.chains ?? p.layers.map((layer) => chainFor(layer, span, p));
  const moduli = p.layers.map((layer, i) => moduliFor(layer, chains[i], p));
  const shared = layerLoads(p, moduli);
  const layers = p.layers.map((layer, i): LayerState => {
    const wantVoussoir = options.voussoirOnly === undefined || options.voussoirOnly === i;
    return layerState(p, layer, span, chains[i], moduli[i], shared.groupOf[i], shared.loads[i], wantVoussoir);
  });
  return { span, ends, shared, layers, support: supportState(p, span, ends, layers) };
}

/**
 * The tests of the bending-group formation (METHODS §2) as `layerLoads` makes them, with bed
 * indices of the whole roof: every bed from the immediate roof up, or, where layers hang from
 * bolts, the beds from the anchor layer up (the hanging ones are groups of their own).
 */
export function groupingSteps(p: ProjectSI, moduli: readonly { beam: number }[]): GroupingStep[] {
  const beds = p.layers.map((layer, i) => ({ unitWeight: layer.unitWeight, thickness: layer.thickness, modulus: moduli[i].beam }));
  const offset = suspensionOf(p)?.anchorLayer ?? 0;
  const steps: GroupingStep[] = [];
  groupLayers(beds.slice(offset), (s) => steps.push({ ...s, layer: s.layer + offset, first: s.first + offset }));
  return steps;
}

/** Groups and shared loads (they depend on thickness, unit weight and modulus, not on the span). */
export function layerLoads(p: ProjectSI, moduli: readonly { beam: number }[]): SharedLoads & { groupOf: number[] } {
  const beds = p.layers.map((layer, i) => ({ unitWeight: layer.unitWeight, thickness: layer.thickness, modulus: moduli[i].beam }));
  const hang = suspensionOf(p);
  if (hang) return suspendedShare(p, beds, hang.anchorLayer);
  const groupOf = groupLayers(beds);
  return { ...shareLoads(beds, groupOf, p.surcharge, p.support), groupOf };
}

/**
 * Loads when the layers below `anchorLayer` hang from the bolts (METHODS §12): each hanging
 * layer is a group of its own whose `extra` is −γt (it carries nothing over the opening); the
 * layers from the anchor up are regrouped by §2 with the hanging pressure (less the standing
 * support, which relieves it first) on the anchor's group.
 */
function suspendedShare(p: ProjectSI, beds: { unitWeight: number; thickness: number; modulus: number }[], anchorLayer: number): SharedLoads & { groupOf: number[] } {
  const r = suspendedLoads({ beds, anchorLayer, surcharge: p.surcharge, standingSupport: p.support });
  const hanging = beds.slice(0, anchorLayer).map((b, i) => ({
    first: i, last: i, weight: b.unitWeight * b.thickness, stiffness: b.modulus * b.thickness ** 3, extra: -b.unitWeight * b.thickness,
  }));
  const hangingWeight = hanging.reduce((w, g) => w + g.weight, 0);
  const groups = [...hanging, ...r.spanning.groups.map((g) => ({ ...g, first: g.first + anchorLayer, last: g.last + anchorLayer }))];
  const groupOf = r.groups.map((g, i) => (g === null ? i : g + anchorLayer));
  return {
    loads: r.loads,
    groups,
    supportApplied: Math.min(p.support, hangingWeight) + r.spanning.supportApplied,
    supportExcess: r.spanning.supportExcess,
    groupOf,
  };
}

/** One layer's elastic, plate, FS-tension and voussoir state at a span, given its chain, moduli and load. */
export function layerState(
  p: ProjectSI,
  layer: LayerSI,
  span: number,
  chain: StrengthChain,
  moduli: { mass: number; beam: number },
  group: number,
  load: number,
  wantVoussoir = true,
): LayerState {
  const ends = beamEnds(p);
  const t = layer.thickness;
  const beam = elasticBeam({ ends, span, thickness: t, load, modulus: moduli.beam, horizontalStress: p.horizontalStress });
  const coefficients = plateFor(p, layer.poisson);
  const plate: PlateState | null = coefficients
    ? {
        coefficients,
        maxTension: (coefficients.beta * load * span * span) / (t * t) - p.horizontalStress,
        deflection: (coefficients.alpha * load * span ** 4) / (moduli.mass * t ** 3),
      }
    : null;
  const maxTension = plate ? plate.maxTension : beam.maxTension;
  let fsTension: number | null;
  let fsTensionNote: LayerState['fsTensionNote'] = null;
  if (chain.crossJointed && ends === 'cantilever') {
    fsTension = 0;
    fsTensionNote = 'jointedOverhang';
  } else if (chain.crossJointed) {
    fsTension = null;
    fsTensionNote = 'crossJointed';
  } else if (!(maxTension > 0)) {
    fsTension = null;
    fsTensionNote = 'noNetTension';
  } else {
    fsTension = chain.design / maxTension;
  }
  const effectiveUnitWeight = load / t;
  const crushingStrength = crushingStrengthFor(layer, chain, p);
  const voussoir =
    wantVoussoir && ends !== 'cantilever'
      ? voussoirFor(layer, span, t, effectiveUnitWeight, moduli.mass, crushingStrength, p.horizontalStress)
      : null;
  return {
    chain,
    crushingStrength,
    modulusMass: moduli.mass,
    modulusBeam: moduli.beam,
    group,
    load,
    beam,
    plate,
    maxTension,
    fsTension,
    fsTensionNote,
    effectiveUnitWeight,
    voussoir,
  };
}
