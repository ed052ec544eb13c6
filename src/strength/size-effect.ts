/** Hoek & Brown (1980) size-effect exponent. */
const EXPONENT = 0.18;
/** Upper end of the specimen sizes the size-effect fit was made on (from memory). */
export const SIZE_EFFECT_MAX_MM = 200;
/** Lab diameter assumed when only a strength value is given: NX core. */
export const DEFAULT_LAB_DIAMETER_MM = 54;

/**
 * Size-effect factor on strength, σ(dEff)/σ(dLab) = (dLab/dEff)^0.18; both sizes in the same
 * unit (mm by convention, only the ratio matters). Source: Hoek & Brown (1980), Underground
 * Excavations in Rock.
 *     sizeEffectFactor(50, 100) // 0.8827
 */
export function sizeEffectFactor(dLab_mm: number, dEff_mm: number): number {
  if (!(dLab_mm > 0) || !Number.isFinite(dLab_mm)) throw new RangeError(`dLab_mm must be a finite number > 0 mm, got ${dLab_mm}`);
  if (!(dEff_mm > 0) || !Number.isFinite(dEff_mm)) throw new RangeError(`dEff_mm must be a finite number > 0 mm, got ${dEff_mm}`);
  return Math.pow(dLab_mm / dEff_mm, EXPONENT);
}

export interface BlockSizeInput {
  /** m */
  thickness: number;
  /** m; null when no cross-joints were seen */
  crossJointSpacing: number | null;
  /** m */
  span: number;
  /** m, mean diameter of the tested specimens (0.054 m when unknown) */
  labDiameter: number;
}

export interface BlockSize {
  dLab_mm: number;
  /** min(thickness, cross-joint spacing, span), mm */
  dEffRaw_mm: number;
  /** dEffRaw clamped to [dLab, 200 mm]; the lower bound wins if dLab > 200 mm */
  dEff_mm: number;
  /** true when the clamp changed the raw size */
  clamped: boolean;
  limitedBy: 'thickness' | 'crossJointSpacing' | 'span';
}

/**
 * Effective block size for the size effect (METHODS §9): d_eff = min(t, cross-joint spacing, s)
 * in mm, clamped to [d_lab, 200 mm] so the Hoek & Brown (1980) law is used only inside its
 * fitted range and never raises the strength. SI in (m), mm out.
 *     effectiveBlockSize({thickness: 0.45, crossJointSpacing: 8, span: 6, labDiameter: 0.054})
 *     // { dLab_mm: 54, dEffRaw_mm: 450, dEff_mm: 200, clamped: true, limitedBy: 'thickness' }
 */
export function effectiveBlockSize({ thickness, crossJointSpacing, span, labDiameter }: BlockSizeInput): BlockSize {
  if (!(thickness > 0) || !Number.isFinite(thickness)) throw new RangeError(`thickness must be a finite number > 0 m, got ${thickness}`);
  if (!(span > 0) || !Number.isFinite(span)) throw new RangeError(`span must be a finite number > 0 m, got ${span}`);
  if (crossJointSpacing !== null && (!(crossJointSpacing > 0) || !Number.isFinite(crossJointSpacing))) {
    throw new RangeError(`crossJointSpacing must be null or a finite number > 0 m, got ${crossJointSpacing}`);
  }
  if (!(labDiameter > 0) || !Number.isFinite(labDiameter)) {
    throw new RangeError(`labDiameter must be a finite number > 0 m, got ${labDiameter}`);
  }
  let raw = thickness;
  let limitedBy: BlockSize['limitedBy'] = 'thickness';
  if (crossJointSpacing !== null && crossJointSpacing < raw) {
    raw = crossJointSpacing;
    limitedBy = 'crossJointSpacing';
  }
  if (span < raw) {
    raw = span;
    limitedBy = 'span';
  }
  const dLab_mm = labDiameter * 1000;
  const dEffRaw_mm = raw * 1000;
  const dEff_mm = Math.max(dLab_mm, Math.min(dEffRaw_mm, SIZE_EFFECT_MAX_MM));
  return { dLab_mm, dEffRaw_mm, dEff_mm, clamped: dEff_mm !== dEffRaw_mm, limitedBy };
}
