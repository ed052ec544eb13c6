/**
 * Beam building: layers bonded by fully grouted bolts acting as one composite beam
 * (METHODS §12), with the unbonded layers as the other bound.
 *
 * Bonded (upper bound of the benefit: full bond). Transformed section per unit width, heights
 * y from the bottom of the lowest layer, yᵢ the mid-height of layer i:
 *     ȳ  = Σ Eᵢtᵢyᵢ / Σ Eᵢtᵢ                                    (neutral axis, m)
 *     EI = Σ Eᵢ (tᵢ³/12 + tᵢ (yᵢ − ȳ)²)                          (N·m²/m)
 *     σ(y) = −Eᵢ M (y − ȳ) / EI   in layer i                      (tension positive, Pa)
 * with M the bending moment per unit width (sagging positive) of a uniform load
 * q = Σγᵢtᵢ + surcharge − standing support on the beam's end condition:
 *     clamped: abutment −q s²/12, midspan q s²/24;  simple: midspan q s²/8 (abutment 0);
 *     cantilever: root −q s²/2                     (standard beam tables, e.g. Roark Table 8.1).
 * Each layer's top and bottom fibres are reported so that each is checked against its own
 * strength. Deflection: clamped q s⁴/(384 EI), simple 5 q s⁴/(384 EI), cantilever q s⁴/(8 EI).
 *
 * Interlayer shear (beam shear formula τ = V Q/(I b), Gere & Timoshenko, Mechanics of
 * Materials): V = q s/2 at the abutment of a clamped or simple beam, q s at a cantilever's root;
 * b = 1 m. For the transformed section both Q and I are taken in units of a reference modulus
 * E_ref: Q* = Σ_{layers below the interface} (Eᵢ/E_ref) tᵢ (ȳ − yᵢ), I* = EI/E_ref, so E_ref
 * cancels and τ = V · |Σ_{i below} Eᵢ tᵢ (yᵢ − ȳ)| / EI — the shear flow the bolts must carry
 * per unit interface area (the same from the layers above, since Σ Eᵢtᵢ(yᵢ − ȳ) = 0).
 *
 * Unbonded (lower bound): the layers bend on their own and share load by E t³ as in §2
 * (groupLayers + shareLoads of layering.ts, Obert & Duvall 1967), each checked by the §1
 * formulas: clamped abutment qᵢs²/(2tᵢ²), midspan qᵢs²/(4tᵢ²); simple 3qᵢs²/(4tᵢ²);
 * cantilever 3qᵢs²/tᵢ².
 * Horizontal stress is not included: the caller superposes σh (§1). SI: m, Pa, N/m³.
 *
 *     compositeBeam({ span: 6, ends: 'clamped', layers: [0.3, 0.3, 0.3].map((t) =>
 *       ({ thickness: t, modulus: 10e9, unitWeight: 25e3 })) })
 *     // bonded max tension 0.5 MPa (= γs²/(2T)), unbonded 1.5 MPa (= γs²/(2t)),
 *     // interface shear 100 kPa at both interfaces
 */
import { beamCoefficients, type BeamEnds } from './beam';
import { groupLayers, shareLoads } from './layering';

export interface CompositeLayer {
  thickness: number;
  modulus: number;
  unitWeight: number;
}

export interface CompositeInput {
  /** The bonded layers, from the lowest upward (at least one). */
  layers: readonly CompositeLayer[];
  span: number;
  ends: BeamEnds;
  /** Pressure on top of the set (e.g. layers above it), Pa, ≥ 0 (default 0). */
  surcharge?: number;
  /** Standing support pushing up on the lowest layer, Pa, ≥ 0 (default 0). */
  standingSupport?: number;
}

/** Net bending stresses on a layer's fibres at a section, Pa (tension positive). */
export interface FibrePair {
  top: number;
  bottom: number;
}

export interface BondedLayer {
  /** Heights of the layer's bottom and top above the bottom of the set, m. */
  bottomHeight: number;
  topHeight: number;
  /** Abutment (root of a cantilever) fibres. */
  abutment: FibrePair;
  /** Midspan fibres; null for a cantilever. */
  midspan: FibrePair | null;
  /** Largest of the four fibre stresses, Pa. */
  maxTension: number;
}

export interface UnbondedLayer {
  /** Load carried by the layer after §2 sharing, Pa. */
  load: number;
  abutmentTension: number;
  midspanTension: number | null;
  maxTension: number;
}

export interface InterfaceShear {
  /** The layer below the interface (the interface is between it and the next one). */
  lowerLayer: number;
  /** Height of the interface above the bottom of the set, m. */
  height: number;
  /** τ = V Q* / (I* b), Q* and I* in the transformed sense (file header), Pa. */
  shearStress: number;
}

export interface CompositeResult {
  /** Total load on the set q, Pa. */
  load: number;
  /** Neutral axis height ȳ above the bottom of the set, m. */
  neutralAxis: number;
  /** EI per unit width, N·m²/m. */
  flexuralRigidity: number;
  /** Moments per unit width, sagging positive, N·m/m (midspan null for a cantilever). */
  moments: { abutment: number; midspan: number | null };
  /** Shear force at the abutment (root), N/m. */
  shearForce: number;
  /** Maximum deflection of the bonded beam, m. */
  deflection: number;
  bonded: BondedLayer[];
  unbonded: UnbondedLayer[];
  interfaces: InterfaceShear[];
}

const MOMENTS: Record<BeamEnds, { abutment: number; midspan: number | null; shear: number; deflection: number }> = {
  clamped: { abutment: -1 / 12, midspan: 1 / 24, shear: 1 / 2, deflection: 1 / 384 },
  simple: { abutment: 0, midspan: 1 / 8, shear: 1 / 2, deflection: 5 / 384 },
  cantilever: { abutment: -1 / 2, midspan: null, shear: 1, deflection: 1 / 8 },
};

const finitePositive = (x: number) => x > 0 && x < Infinity;

function checkInput(input: CompositeInput): void {
  const { layers, span, ends, surcharge = 0, standingSupport = 0 } = input;
  if (!Array.isArray(layers) || layers.length === 0) throw new RangeError('layers must list at least one layer');
  layers.forEach((l, i) => {
    if (!finitePositive(l?.thickness)) throw new RangeError(`layers[${i}].thickness must be > 0 m, got ${l?.thickness}`);
    if (!finitePositive(l.modulus)) throw new RangeError(`layers[${i}].modulus must be > 0 Pa, got ${l.modulus}`);
    if (!finitePositive(l.unitWeight))
      throw new RangeError(`layers[${i}].unitWeight must be > 0 N/m³, got ${l.unitWeight}`);
  });
  if (!finitePositive(span)) throw new RangeError(`span must be > 0 m, got ${span}`);
  if (!(ends in MOMENTS)) throw new RangeError(`ends must be clamped, simple or cantilever, got ${ends}`);
  if (!(surcharge >= 0 && surcharge < Infinity)) throw new RangeError(`surcharge must be ≥ 0 Pa, got ${surcharge}`);
  if (!(standingSupport >= 0 && standingSupport < Infinity))
    throw new RangeError(`standingSupport must be ≥ 0 Pa, got ${standingSupport}`);
}

/** Bonded and unbonded bounds of a bolted layer set (formulas in the file header). */
export function compositeBeam(input: CompositeInput): CompositeResult {
  checkInput(input);
  const { layers, span: s, ends, surcharge = 0, standingSupport = 0 } = input;
  const k = MOMENTS[ends];
  const weight = layers.reduce((w, l) => w + l.unitWeight * l.thickness, 0);
  const q = weight + surcharge - standingSupport;

  // Transformed section.
  const bottoms: number[] = [];
  let h = 0;
  let sumEt = 0;
  let sumEty = 0;
  for (const l of layers) {
    bottoms.push(h);
    sumEt += l.modulus * l.thickness;
    sumEty += l.modulus * l.thickness * (h + l.thickness / 2);
    h += l.thickness;
  }
  const yBar = sumEty / sumEt;
  let EI = 0;
  layers.forEach((l, i) => {
    const d = bottoms[i] + l.thickness / 2 - yBar;
    EI += l.modulus * (l.thickness ** 3 / 12 + l.thickness * d * d);
  });

  const mAbutment = k.abutment * q * s * s;
  const mMidspan = k.midspan === null ? null : k.midspan * q * s * s;
  const V = k.shear * q * s;
  const fibres = (E: number, M: number, bottom: number, top: number): FibrePair => ({
    top: (-E * M * (top - yBar)) / EI + 0,
    bottom: (-E * M * (bottom - yBar)) / EI + 0,
  });
  const bonded: BondedLayer[] = layers.map((l, i) => {
    const bottom = bottoms[i];
    const top = bottom + l.thickness;
    const abutment = fibres(l.modulus, mAbutment, bottom, top);
    const midspan = mMidspan === null ? null : fibres(l.modulus, mMidspan, bottom, top);
    const all = [abutment.top, abutment.bottom, ...(midspan ? [midspan.top, midspan.bottom] : [])];
    return { bottomHeight: bottom, topHeight: top, abutment, midspan, maxTension: Math.max(...all) };
  });

  // Interfaces: first moment of the transformed part below each interface.
  const interfaces: InterfaceShear[] = [];
  let firstMoment = 0;
  for (let i = 0; i < layers.length - 1; i++) {
    const l = layers[i];
    firstMoment += l.modulus * l.thickness * (bottoms[i] + l.thickness / 2 - yBar);
    interfaces.push({ lowerLayer: i, height: bottoms[i + 1], shearStress: Math.abs((V * firstMoment) / EI) });
  }

  // Unbonded: §2 sharing, §1 formulas per layer.
  const groups = groupLayers(layers);
  const shared = shareLoads(layers, groups, surcharge, standingSupport);
  const c = beamCoefficients(ends);
  const unbonded: UnbondedLayer[] = layers.map((l, i) => {
    const qi = shared.loads[i];
    const scale = (qi * s * s) / (l.thickness * l.thickness);
    const abutmentTension = c.abutment * scale;
    const midspanTension = ends === 'cantilever' ? null : c.midspan * scale;
    // Under a net upward load the faces swap: the compression face becomes the tension face.
    const maxTension = Math.max(abutmentTension, midspanTension ?? -Infinity, -abutmentTension, -(midspanTension ?? Infinity));
    return { load: qi, abutmentTension, midspanTension, maxTension };
  });

  const result: CompositeResult = {
    load: q,
    neutralAxis: yBar,
    flexuralRigidity: EI,
    moments: { abutment: mAbutment + 0, midspan: mMidspan },
    shearForce: V,
    deflection: (k.deflection * q * s ** 4) / EI,
    bonded,
    unbonded,
    interfaces,
  };
  const values = [EI, yBar, result.deflection, V, mAbutment, mMidspan ?? 0, ...bonded.map((b) => b.maxTension), ...unbonded.map((u) => u.maxTension), ...interfaces.map((f) => f.shearStress)];
  if (!values.every(Number.isFinite))
    throw new RangeError(`composite beam results are not finite for span ${s} m and ${layers.length} layers`);
  return result;
}
