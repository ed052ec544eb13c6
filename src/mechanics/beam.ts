/**
 * Elastic roof beam under uniform load (Obert & Duvall 1967, Rock Mechanics and the Design of
 * Structures in Rock, roof-beam chapter). Plane strain, unit width, SI units: q in Pa
 * (load per unit plan area), s and t in m, E and stresses in Pa; tension positive.
 *
 * | ends       | max tension  | where    | midspan     | max deflection     | Euler σcr        |
 * |------------|--------------|----------|-------------|--------------------|------------------|
 * | clamped    | q s²/(2t²)   | abutment | q s²/(4t²)  | q s⁴/(32 E t³)     | π² E t²/(3 s²)   |
 * | simple     | 3 q s²/(4t²) | midspan  | same        | 5 q s⁴/(32 E t³)   | π² E t²/(12 s²)  |
 * | cantilever | 3 q s²/t²    | root     | —           | 3 q s⁴/(2 E t³)    | π² E t²/(48 s²)  |
 *
 * Horizontal stress σh (compression positive) is superposed as a uniform compression:
 * net tension = bending tension − σh. No P-δ amplification.
 *
 *     elasticBeam({ ends: 'clamped', span: 10, thickness: 1, load: 25e3, modulus: 10e9, horizontalStress: 0 })
 *     // maxTension 1.25e6 Pa at the abutment, deflection 7.8125e-4 m, bucklingStress 3.2899e8 Pa
 */
export type BeamEnds = 'clamped' | 'simple' | 'cantilever';

export interface BeamInput {
  ends: BeamEnds;
  span: number;
  thickness: number;
  /** Distributed load on the layer, Pa (may be ≤ 0 when support exceeds the weight). */
  load: number;
  modulus: number;
  horizontalStress: number;
}

export interface BeamResult {
  /** Net tension at the abutment top fibre (root for a cantilever). */
  abutmentTension: number;
  /** Net tension at the midspan bottom fibre; null for a cantilever. */
  midspanTension: number | null;
  maxTension: number;
  at: 'abutment' | 'midspan' | 'root';
  /** Bending tension before the horizontal stress is superposed. */
  bendingTension: number;
  /** Maximum deflection (midspan, or tip of a cantilever), m, downward positive. */
  deflection: number;
  bucklingStress: number;
}

/** Coefficients c in σ = c·q·s²/t², w = k·q·s⁴/(E t³), σcr = π² E t²/(m s²). */
const COEFFICIENTS: Record<BeamEnds, { abutment: number; midspan: number; deflection: number; euler: number }> = {
  clamped: { abutment: 1 / 2, midspan: 1 / 4, deflection: 1 / 32, euler: 3 },
  simple: { abutment: 0, midspan: 3 / 4, deflection: 5 / 32, euler: 12 },
  cantilever: { abutment: 3, midspan: 0, deflection: 3 / 2, euler: 48 },
};

export function beamCoefficients(ends: BeamEnds) {
  return COEFFICIENTS[ends];
}

function checkInput({ ends, span, thickness, load, modulus, horizontalStress }: BeamInput): void {
  if (!(ends in COEFFICIENTS)) throw new RangeError(`ends must be clamped, simple or cantilever, got ${ends}`);
  if (!(span > 0) || !Number.isFinite(span)) throw new RangeError(`span must be > 0 m, got ${span}`);
  if (!(thickness > 0) || !Number.isFinite(thickness)) throw new RangeError(`thickness must be > 0 m, got ${thickness}`);
  if (!Number.isFinite(load)) throw new RangeError(`load must be a finite pressure, got ${load}`);
  if (!(modulus > 0) || !Number.isFinite(modulus)) throw new RangeError(`modulus must be > 0 Pa, got ${modulus}`);
  if (!Number.isFinite(horizontalStress)) throw new RangeError(`horizontalStress must be finite, got ${horizontalStress}`);
}

export function elasticBeam(input: BeamInput): BeamResult {
  checkInput(input);
  const { ends, span: s, thickness: t, load: q, modulus: E, horizontalStress: sh } = input;
  const c = COEFFICIENTS[ends];
  const scale = (q * s * s) / (t * t);
  const abutmentBending = c.abutment * scale;
  const midspanBending = c.midspan * scale;
  const deflection = (c.deflection * q * s ** 4) / (E * t ** 3);
  const bucklingStress = (Math.PI ** 2 * E * t * t) / (c.euler * s * s);
  if (ends === 'cantilever') {
    return {
      abutmentTension: abutmentBending - sh,
      midspanTension: null,
      maxTension: abutmentBending - sh,
      at: 'root',
      bendingTension: abutmentBending,
      deflection,
      bucklingStress,
    };
  }
  const abutmentTension = abutmentBending - sh;
  const midspanTension = midspanBending - sh;
  // Under a net upward load the extreme tension flips face; take the largest net tension.
  const atAbutment = ends === 'clamped' ? abutmentTension >= midspanTension : false;
  return {
    abutmentTension,
    midspanTension,
    maxTension: atAbutment ? abutmentTension : midspanTension,
    at: atAbutment ? 'abutment' : 'midspan',
    bendingTension: atAbutment ? abutmentBending : midspanBending,
    deflection,
    bucklingStress,
  };
}

/**
 * Fibre stresses and deflection at a distance x from the left abutment (from the root of a
 * cantilever). Bending moment per unit width, sagging positive:
 * clamped M = q(6sx − 6x² − s²)/12; simple M = q x (s − x)/2; cantilever M = −q (s − x)²/2.
 * Deflection with EI = E t³/12: clamped q x²(s−x)²/(24EI); simple q x(s³ − 2s x² + x³)/(24EI);
 * cantilever q x²(6s² − 4s x + x²)/(24EI) (standard beam tables, e.g. Roark's Formulas, Table 8.1).
 * Returns net tension (tension positive) on the top and bottom fibres.
 */
export function beamStateAt(input: BeamInput, x: number): { top: number; bottom: number; deflection: number } {
  checkInput(input);
  const { ends, span: s, thickness: t, load: q, modulus: E, horizontalStress: sh } = input;
  const xi = Math.min(Math.max(x, 0), s);
  let moment: number;
  let w: number;
  const twoEt3 = 2 * E * t ** 3; // 24 EI
  if (ends === 'clamped') {
    moment = (q * (6 * s * xi - 6 * xi * xi - s * s)) / 12;
    w = (q * xi * xi * (s - xi) ** 2) / twoEt3;
  } else if (ends === 'simple') {
    moment = (q * xi * (s - xi)) / 2;
    w = (q * xi * (s ** 3 - 2 * s * xi * xi + xi ** 3)) / twoEt3;
  } else {
    moment = (-q * (s - xi) ** 2) / 2;
    w = (q * xi * xi * (6 * s * s - 4 * s * xi + xi * xi)) / twoEt3;
  }
  const bending = (6 * moment) / (t * t);
  return { top: -bending - sh, bottom: bending - sh, deflection: w };
}
