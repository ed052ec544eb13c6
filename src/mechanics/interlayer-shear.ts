/**
 * Resistance of grouted bolts to the shear between bonded layers (METHODS §12):
 *     τ_R = (V_b + T₀ · tan φⱼ) / (Sx · Sy)        (Pa)
 *     FS shear = τ_R / τ                          (null when τ = 0)
 * V_b the bolt's shear capacity (N), T₀ its pretension (N) clamping the interface, φⱼ the
 * friction angle of the bedding interface (the lower layer's joint friction, DESIGN v2), Sx, Sy
 * the spacing (m); τ the interlayer shear stress from compositeBeam (Pa).
 * Default V_b = 0.6 × the axial capacity: von Mises gives shear yield fy/√3 = 0.577 fy, and
 * 0.6 fy is the usual rounded design value for shear yielding of steel (e.g. AISC 360 §G2,
 * from memory) — 4 % above the von Mises figure.
 * Source: statics of the bolt pattern (each bolt serves Sx·Sy of interface); common practice.
 *
 *     interlayerShearCheck({ shearStress: 100e3, capacity: 100e3, shearCapacity: null,
 *                            pretension: 0, frictionDeg: 30, spacingAcross: 1, spacingAlong: 1 })
 *     // { shearCapacity: 60e3, resistance: 60e3, fs: 0.6 }
 */
import { checkSpacing } from './suspension';

/** Shear capacity of a bolt as a fraction of its axial capacity when none is given. */
export const DEFAULT_SHEAR_FRACTION = 0.6;

export interface InterlayerShearInput {
  /** Interlayer shear stress to carry, Pa (≥ 0). */
  shearStress: number;
  /** Axial bolt capacity, N (> 0): the default shear capacity is 0.6 of it. */
  capacity: number;
  /** Bolt shear capacity, N (> 0), or null for the default. */
  shearCapacity: number | null;
  /** Pretension, N (≥ 0). */
  pretension: number;
  /** Friction angle of the interface, degrees (0…90). */
  frictionDeg: number;
  spacingAcross: number;
  spacingAlong: number;
}

export interface InterlayerShearResult {
  /** The shear capacity used, N. */
  shearCapacity: number;
  /** τ_R, Pa. */
  resistance: number;
  /** τ_R / τ; null when τ = 0. */
  fs: number | null;
}

/** Bolt resistance to interlayer shear and its FS (formulas in the file header). */
export function interlayerShearCheck(input: InterlayerShearInput): InterlayerShearResult {
  const { shearStress, capacity, shearCapacity, pretension, frictionDeg, spacingAcross, spacingAlong } = input;
  checkSpacing(spacingAcross, spacingAlong);
  if (!(shearStress >= 0 && shearStress < Infinity))
    throw new RangeError(`shearStress must be ≥ 0 Pa, got ${shearStress}`);
  if (!(capacity > 0 && capacity < Infinity)) throw new RangeError(`capacity must be > 0 N, got ${capacity}`);
  if (shearCapacity !== null && !(shearCapacity > 0 && shearCapacity < Infinity))
    throw new RangeError(`shearCapacity must be > 0 N or null, got ${shearCapacity}`);
  if (!(pretension >= 0 && pretension < Infinity))
    throw new RangeError(`pretension must be ≥ 0 N, got ${pretension}`);
  if (!(frictionDeg >= 0 && frictionDeg < 90))
    throw new RangeError(`frictionDeg must be in [0, 90) degrees, got ${frictionDeg}`);
  const vb = shearCapacity ?? DEFAULT_SHEAR_FRACTION * capacity;
  const resistance = (vb + pretension * Math.tan((frictionDeg * Math.PI) / 180)) / (spacingAcross * spacingAlong);
  return { shearCapacity: vb, resistance, fs: shearStress > 0 ? resistance / shearStress : null };
}
