export interface HoekBrownParameters {
  mb: number;
  s: number;
  a: number;
}

/**
 * Generalised Hoek–Brown rock-mass constants:
 * mb = mi·exp((GSI − 100)/(28 − 14D)), s = exp((GSI − 100)/(9 − 3D)),
 * a = 1/2 + (e^(−GSI/15) − e^(−20/3))/6. Dimensionless; GSI 0–100, mi > 0, D 0–1.
 * Source: Hoek, Carranza-Torres & Corkum (2002).
 *     hoekBrownParameters(50, 10, 0) // { mb: 1.67677, s: 0.0038659, a: 0.505734 }
 */
export function hoekBrownParameters(gsi: number, mi: number, disturbance: number): HoekBrownParameters {
  if (!(gsi >= 0 && gsi <= 100)) throw new RangeError(`gsi must be within 0–100, got ${gsi}`);
  if (!(mi > 0) || !Number.isFinite(mi)) throw new RangeError(`mi must be a finite number > 0, got ${mi}`);
  if (!(disturbance >= 0 && disturbance <= 1)) throw new RangeError(`disturbance D must be within 0–1, got ${disturbance}`);
  return {
    mb: mi * Math.exp((gsi - 100) / (28 - 14 * disturbance)),
    s: Math.exp((gsi - 100) / (9 - 3 * disturbance)),
    a: 0.5 + (Math.exp(-gsi / 15) - Math.exp(-20 / 3)) / 6,
  };
}

/**
 * Rock-mass uniaxial tensile strength of the Hoek–Brown criterion, as a positive tension
 * magnitude: σtm = s·σci/mb (the criterion writes it as −s·σci/mb). SI: Pa → Pa.
 * Source: Hoek, Carranza-Torres & Corkum (2002).
 *     rockMassTensileStrength(100e6, 1.67677, 0.0038659) // 0.2306e6
 */
export function rockMassTensileStrength(ucs: number, mb: number, s: number): number {
  if (!(ucs > 0) || !Number.isFinite(ucs)) throw new RangeError(`ucs must be a finite number > 0 Pa, got ${ucs}`);
  if (!(mb > 0) || !Number.isFinite(mb)) throw new RangeError(`mb must be a finite number > 0, got ${mb}`);
  if (!(s >= 0 && s <= 1)) throw new RangeError(`s must be within 0–1, got ${s}`);
  return (s * ucs) / mb;
}

/**
 * Rock-mass uniaxial compressive strength of the Hoek–Brown criterion: σc = σci·s^a.
 * SI: Pa → Pa. Source: Hoek, Carranza-Torres & Corkum (2002).
 *     rockMassUcs(100e6, 0.0038659, 0.505734) // 6.023e6
 */
export function rockMassUcs(ucs: number, s: number, a: number): number {
  if (!(ucs > 0) || !Number.isFinite(ucs)) throw new RangeError(`ucs must be a finite number > 0 Pa, got ${ucs}`);
  if (!(s >= 0 && s <= 1)) throw new RangeError(`s must be within 0–1, got ${s}`);
  if (!(a >= 0.5 && a <= 1)) throw new RangeError(`a must be within 0.5–1, got ${a}`);
  return ucs * Math.pow(s, a);
}
