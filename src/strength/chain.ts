import { directFactor as directFactorFor } from './direct-factor';
import type { RockClassName } from './direct-factor';
import { gsiFromJointing } from './gsi';
import { hoekBrownParameters, rockMassUcs } from './hoek-brown';
import { rqdFromFrequency } from './rqd';
import { DEFAULT_LAB_DIAMETER_MM, effectiveBlockSize, sizeEffectFactor } from './size-effect';
import { reduceSpecimens } from './specimens';
import type { SpecimenReduction, SpecimenSI } from './specimens';
import { CHARACTERISTIC_RULE_NAMES, characteristicValue } from './statistics';
import type { CharacteristicRuleName } from './statistics';

/** Which strength the tension check uses (METHODS §10): rock mass min(block, mass), or lab (block). */
export type TensileBasisName = 'rockMass' | 'lab';

export interface StrengthChainInput {
  /** Brazilian discs; may be empty. */
  specimens: SpecimenSI[];
  /** Pa, a given tensile strength, or null. */
  value: number | null;
  /** What `value` is. */
  method: 'brazilian' | 'direct';
  rockClass: RockClassName;
  characteristic: CharacteristicRuleName;
  /** Default "rockMass". */
  tensileBasis?: TensileBasisName;
  /** m */
  thickness: number;
  /** m */
  span: number;
  /** m, null = no cross-joints seen */
  crossJointSpacing: number | null;
  /** per m */
  fractureFrequency: number | null;
  /** %, a given RQD; wins over the fracture frequency */
  rqd: number | null;
  /** JCond89, 0–30 */
  jointCondition: number;
  /** Pa, intact σci */
  ucs: number;
  mi: number;
  disturbance: number;
}

export interface StrengthChainWarning {
  code: string;
  /** Relative to the layer, e.g. 'tensile.specimens[2]', 'jointing'. */
  path: string;
  message: string;
}

export interface StrengthChain {
  source: 'specimens' | 'value';
  reduction: SpecimenReduction | null;
  /** Pa: mean Brazilian of the accepted specimens, or the given value */
  lab: number;
  labMethod: 'brazilian' | 'direct';
  /** 1 when labMethod is 'direct' */
  directFactor: number;
  /** Pa = directFactor · lab */
  direct: number;
  /** Pa per accepted specimen (× factor); [] for a given value */
  directValues: number[];
  stats: { n: number; mean: number; sd: number; cov: number } | null;
  /** Multiplier of the characteristic rule (see `characteristicValue`); null for the mean. */
  kn: number | null;
  /** 'lower5Log': mean and standard deviation of ln(direct strength in Pa). */
  logStats: { mean: number; sd: number } | null;
  /** Pa */
  characteristic: number;
  dLab_mm: number;
  dEffRaw_mm: number;
  dEff_mm: number;
  sizeClamped: boolean;
  sizeFactor: number;
  /** Pa = characteristic · sizeFactor */
  block: number;
  /** λ actually used (given, or 1/crossJointSpacing); null if RQD was given or nothing was */
  fractureFrequency: number | null;
  rqdSource: 'given' | 'frequency' | 'spacing' | 'none';
  rqd: number;
  gsi: number;
  mb: number;
  s: number;
  a: number;
  /** Pa, σci·s^a */
  massUcs: number;
  /** Pa = characteristic · s · mi / mb */
  mass: number;
  /** crossJointSpacing !== null && crossJointSpacing < span */
  crossJointed: boolean;
  tensileBasis: TensileBasisName;
  /** Pa: the design strength if the layer were not cross-jointed: min(block, mass) ("rockMass") or block ("lab"). */
  designUncracked: number;
  /** Pa: 0 if cross-jointed, else designUncracked */
  design: number;
  warnings: StrengthChainWarning[];
}

const MPa = (x: number): string => `${+(x / 1e6).toPrecision(4)} MPa`;

/**
 * The lab → design tensile strength chain of one layer (METHODS §5–§10):
 * lab (mean Brazilian of accepted discs, or a given value) → direct (× 0.7/0.8/0.9,
 * Perras & Diederichs 2014) → characteristic (mean, or EN 1990 Annex D 5 % fractile) →
 * block (× (d_lab/d_eff)^0.18, Hoek & Brown 1980) and rock mass (× s·mi/mb, Hoek–Brown 2002,
 * GSI from RQD and JCond89) → design = min(block, mass) on the "rockMass" basis, block on the
 * "lab" basis (METHODS §10), or 0 when cross-jointed (common practice). SI in and out (m, Pa).
 * A given value of 0 means no tensile strength: every strength is 0 and a NO_TENSILE_STRENGTH
 * warning says so. Throws a RangeError when there is neither an accepted specimen nor a value.
 *     strengthChain({specimens: [], value: 3e6, method: 'brazilian', rockClass: 'sedimentary',
 *       characteristic: 'mean', thickness: 0.45, span: 6, crossJointSpacing: 8,
 *       fractureFrequency: 3, rqd: null, jointCondition: 20, ucs: 40e6, mi: 7, disturbance: 0})
 *     // direct 2.1e6, block 1.659e6, rqd 96.3, gsi 78.2, mass 0.4043e6, design 0.4043e6
 */
export function strengthChain(input: StrengthChainInput): StrengthChain {
  const { specimens, value, method, rockClass, characteristic: rule } = input;
  const { thickness, span, crossJointSpacing, fractureFrequency, jointCondition, ucs, mi, disturbance } = input;
  if (!Array.isArray(specimens)) throw new RangeError('tensile.specimens must be an array');
  if (value !== null && (!(value >= 0) || !Number.isFinite(value))) {
    throw new RangeError(`tensile value must be null or a finite number ≥ 0 Pa, got ${value}`);
  }
  if (method !== 'brazilian' && method !== 'direct') {
    throw new RangeError(`tensile method must be "brazilian" or "direct", got ${JSON.stringify(method)}`);
  }
  if (!CHARACTERISTIC_RULE_NAMES.includes(rule)) {
    throw new RangeError(`characteristic must be one of ${CHARACTERISTIC_RULE_NAMES.join(', ')}, got ${JSON.stringify(rule)}`);
  }
  const tensileBasis = input.tensileBasis ?? 'rockMass';
  if (tensileBasis !== 'rockMass' && tensileBasis !== 'lab') {
    throw new RangeError(`tensileBasis must be "rockMass" or "lab", got ${JSON.stringify(tensileBasis)}`);
  }
  const classFactor = directFactorFor(rockClass);
  const warnings: StrengthChainWarning[] = [];

  // ---- lab → direct → characteristic
  const reduction = specimens.length > 0 ? reduceSpecimens(specimens) : null;
  if (reduction) {
    for (const r of reduction.rejected) {
      warnings.push({ code: 'SPECIMEN_REJECTED', path: `tensile.specimens[${r.index}]`, message: `specimen ${r.id} not used: ${r.reason}` });
    }
    for (const w of reduction.warnings) {
      warnings.push({ code: w.code, path: `tensile.specimens[${w.index}]`, message: w.message });
    }
  }
  const accepted = reduction ? reduction.accepted : [];
  let source: StrengthChain['source'];
  let lab: number;
  let labMethod: StrengthChain['labMethod'];
  let factor: number;
  let directValues: number[] = [];
  let stats: StrengthChain['stats'] = null;
  let kn: number | null = null;
  let logStats: StrengthChain['logStats'] = null;
  let characteristic: number;
  let labDiameter: number;
  if (accepted.length > 0) {
    source = 'specimens';
    labMethod = 'brazilian';
    factor = classFactor;
    lab = accepted.reduce((sum, a) => sum + a.brazilian, 0) / accepted.length;
    directValues = accepted.map((a) => a.brazilian * factor);
    const result = characteristicValue(directValues, rule);
    stats = { n: result.n, mean: result.mean, sd: result.sd, cov: result.cov };
    kn = result.kn;
    logStats = result.log ?? null;
    characteristic = result.value;
    if (result.warning !== undefined) {
      warnings.push({ code: result.kn === null ? 'FEW_SPECIMENS' : 'LOWER5_NEGATIVE', path: 'tensile.specimens', message: result.warning });
    }
    labDiameter = accepted.reduce((sum, a) => sum + a.diameter, 0) / accepted.length;
  } else if (value !== null) {
    source = 'value';
    labMethod = method;
    factor = method === 'direct' ? 1 : classFactor;
    lab = value;
    characteristic = factor * value;
    if (specimens.length > 0) {
      warnings.push({
        code: 'NO_ACCEPTED_SPECIMEN',
        path: 'tensile.specimens',
        message: `none of the ${specimens.length} specimen(s) was accepted; the given value ${MPa(value)} is used`,
      });
    }
    if (rule !== 'mean') {
      warnings.push({
        code: 'LOWER5_GIVEN_VALUE',
        path: 'tensile.value_MPa',
        message: `the characteristic rule "${rule}" needs test results; the given value is used as the characteristic value`,
      });
    }
    labDiameter = DEFAULT_LAB_DIAMETER_MM / 1000;
    if (value === 0) {
      warnings.push({
        code: 'NO_TENSILE_STRENGTH',
        path: 'tensile.value_MPa',
        message: 'tensile strength 0 MPa: no tensile strength, so the design strength is 0 and FS tension is 0 wherever the layer is in net tension',
      });
    }
  } else {
    throw new RangeError('tensile: no accepted specimen and no value_MPa');
  }
  const direct = factor * lab;

  // ---- size effect → block
  const size = effectiveBlockSize({ thickness, crossJointSpacing, span, labDiameter });
  const sizeFactor = sizeEffectFactor(size.dLab_mm, size.dEff_mm);
  const block = characteristic * sizeFactor;

  // ---- jointing → RQD → GSI → Hoek–Brown rock mass
  let rqd: number;
  let rqdSource: StrengthChain['rqdSource'];
  let frequencyUsed: number | null = null;
  if (input.rqd !== null) {
    rqd = input.rqd;
    rqdSource = 'given';
  } else if (fractureFrequency !== null) {
    frequencyUsed = fractureFrequency;
    rqd = rqdFromFrequency(fractureFrequency);
    rqdSource = 'frequency';
  } else if (crossJointSpacing !== null) {
    frequencyUsed = 1 / crossJointSpacing;
    rqd = rqdFromFrequency(frequencyUsed);
    rqdSource = 'spacing';
  } else {
    rqd = 100;
    rqdSource = 'none';
    warnings.push({
      code: 'RQD_ASSUMED',
      path: 'jointing',
      message: 'no RQD, fracture frequency or cross-joint spacing given: RQD 100 assumed',
    });
  }
  const gsi = gsiFromJointing(jointCondition, rqd);
  const { mb, s, a } = hoekBrownParameters(gsi, mi, disturbance);
  const massUcs = rockMassUcs(ucs, s, a);
  // Intact Hoek–Brown tension is σci/mi and the mass value s·σci/mb: scale the measured
  // strength by the same ratio (METHODS §8).
  const mass = characteristic * ((s * mi) / mb);

  // ---- design
  const crossJointed = crossJointSpacing !== null && crossJointSpacing < span;
  if (crossJointed) {
    warnings.push({
      code: 'CROSS_JOINTED',
      path: 'jointing.crossJointSpacing_m',
      message: `cross-joint spacing ${crossJointSpacing} m is less than the span ${span} m: no tensile strength across the joints (design 0); the voussoir checks govern`,
    });
  }
  const designUncracked = tensileBasis === 'lab' ? block : Math.min(block, mass);
  const design = crossJointed ? 0 : designUncracked;

  return {
    source, reduction, lab, labMethod, directFactor: factor, direct, directValues, stats, kn, logStats, characteristic,
    dLab_mm: size.dLab_mm, dEffRaw_mm: size.dEffRaw_mm, dEff_mm: size.dEff_mm, sizeClamped: size.clamped, sizeFactor,
    block, fractureFrequency: frequencyUsed, rqdSource, rqd, gsi, mb, s, a, massUcs, mass, crossJointed, tensileBasis, designUncracked, design, warnings,
  };
}
