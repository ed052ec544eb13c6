/**
 * Voussoir (jointed) roof beam — Diederichs & Kaiser (1999), IJRMMS 36:97–117, as set out in
 * Brady & Brown, Rock Mechanics for Underground Mining, 3rd ed., §8.4 (METHODS §3).
 *
 * Why a closed form works. For a trial compression-zone depth ratio n the published iteration is
 *     z ← g(z) = √( (3s/8)(8z0²/(3s) − ΔL(z)) ),   ΔL(z) = fav·L/E,
 *     fav = fc(2/3 + n)/3,  fc = γ's²/(4nz),
 * so (3s/8)·ΔL(z) = K/z with
 *     K = (3s/8) · L · ((2/3 + n)/3) · γ's²/(4nE)   (m³, > 0),
 * and g(z) = √(z0² − K/z). A fixed point z = g(z) is a positive root of
 *     p(z) = z³ − z0²·z + K = 0.
 * g is increasing in z and g(z0) = √(z0² − K/z0) < z0, so the iterates from z0 decrease
 * monotonically; if z* is any fixed point with z* ≤ z_k then z* = g(z*) ≤ g(z_k) = z_{k+1}, so
 * they never pass the LARGEST root in (0, z0] and converge to it. p has its minimum on z > 0 at
 * z = z0/√3 with p = K − 2z0³/(3√3): positive roots exist iff K ≤ Kc = 2z0³/(3√3). If K > Kc
 * the iterates keep falling (a positive limit would be a fixed point) until the radicand
 * z0² − K/z turns negative, i.e. the published "negative radicand" snap-through at that n.
 * With h = K/Kc ∈ (0, 1] the largest root is, by the trigonometric (Viète) form for
 * z³ + pz + q = 0 with p = −z0², q = K:
 *     z = (2z0/√3) · cos( arccos(−h) / 3 ),
 * which gives z = z0 at h = 0 and z = z0/√3 at h = 1. The deflection is taken from the same
 * cubic, δ = z0 − z = K/(z(z0 + z)) (equal at the root; no cancellation for stiff beams).
 */

export interface VoussoirInput {
  /** Clear span s, m (> 0). */
  span: number;
  /** Layer thickness t, m (> 0). */
  thickness: number;
  /** Effective unit weight γ' = q/t, N/m³ (> 0). */
  unitWeight: number;
  /** Modulus, Pa (> 0): the caller passes the rock-mass modulus. */
  modulus: number;
  /** Uniaxial compressive strength for FS crushing, Pa (≥ 0). */
  ucs: number;
  /** Friction angle of the cross-joints at the abutment, degrees (0..90). */
  frictionDeg: number;
  /**
   * In-situ horizontal stress, Pa, compression positive (default 0). It enters the crushing
   * check only, as demand fc + σh (METHODS §3a: superposed on the arch thrust at the
   * compression zones); n, z, fc, sliding and snap-through ignore it (no credit for clamping
   * that may relax once the roof cracks). A tensile σh (< 0) is taken as 0 (no credit).
   */
  horizontalStress?: number;
}

export interface VoussoirResult {
  snapThrough: boolean;
  /** Compression-zone depth ratio at equilibrium (fc least). null after snap-through. */
  n: number | null;
  /** Lever arm z of the compression arch, m. */
  leverArm: number | null;
  /** Initial lever arm z0 = t(1 − 2n/3), m. */
  initialLeverArm: number | null;
  /** Arch length L = s + 8z0²/(3s), m. */
  arcLength: number | null;
  /** Maximum compressive stress fc = γ's²/(4nz), Pa. */
  maxCompression: number | null;
  /** Average arch stress fav = fc(2/3 + n)/3, Pa. */
  averageStress: number | null;
  /** Elastic arch shortening ΔL = fav·L/E, m. */
  shortening: number | null;
  /** Midspan deflection δ = z0 − z, m. */
  deflection: number | null;
  /** δ/t. */
  deflectionRatio: number | null;
  /** Crushing demand fc + max(σh, 0), Pa. */
  crushingDemand: number | null;
  /** σc/(fc + σh) (0 when σc = 0). */
  fsCrushing: number | null;
  /** fc·n·tanφ/(γ's) at the abutment (= s·tanφ/(4z)). */
  fsSliding: number | null;
  /** Work done: cubic solves here, fixed-point steps in the sweep baseline. */
  iterations: number;
}

const SQRT3 = Math.sqrt(3);
const KC_FACTOR = 2 / (3 * SQRT3); // Kc = KC_FACTOR·z0³

/** Coarse scan n = 1/GRID … (GRID−1)/GRID, to bracket the equilibrium. */
const GRID = 10;
/** Stop refining n when the bracket is narrower than this. */
const N_TOLERANCE = 1e-7;
/** Hard cap on refinement steps (the tolerance is reached well before). */
const MAX_REFINE_STEPS = 100;

/** One trial n of the equilibrium search, as `solveVoussoir` records it when asked. */
export interface VoussoirSearchStep {
  /** "scan": the coarse scan n = 0.1 … 0.9; "walk": the bracket walk from n = 0.75; "refine": a false-position/bisection trial; "result": the equilibrium n. */
  stage: 'scan' | 'walk' | 'refine' | 'result';
  n: number;
  /** Lever arm z at n, m (null: no real lever arm at this n). */
  leverArm: number | null;
  /** fc = γ's²/(4nz) at n, Pa (null where there is no lever arm). */
  maxCompression: number | null;
  /** The bracket [lower, upper] holding the equilibrium after this step (the scan: the whole range). */
  lower: number;
  upper: number;
}

/** Receives each step of the search (optional argument of `solveVoussoir`). */
export type VoussoirRecorder = (step: VoussoirSearchStep) => void;

/**
 * fc(n) = γ's²/(4nz(n)) at each n (null where n has no lever arm), z from the closed form of
 * the published iteration (`leverArmAt`). For the chart of the search. SI: Pa.
 */
export function compressionCurve(input: VoussoirInput, ns: readonly number[]): Array<{ n: number; maxCompression: number | null }> {
  validateVoussoirInput(input);
  const { span: s, unitWeight: g } = input;
  return ns.map((n) => {
    const z = leverArmAt(input, n);
    return { n, maxCompression: z !== null && z > 0 ? (g * s * s) / (4 * n * z) : null };
  });
}

/** Throws RangeError naming the first invalid field. NaN-safe. */
export function validateVoussoirInput(input: VoussoirInput): void {
  const { span, thickness, unitWeight, modulus, ucs, frictionDeg } = input;
  if (!(span > 0 && span < Infinity)) throw new RangeError(`span must be > 0 m, got ${span}`);
  if (!(thickness > 0 && thickness < Infinity))
    throw new RangeError(`thickness must be > 0 m, got ${thickness}`);
  if (!(unitWeight > 0 && unitWeight < Infinity))
    throw new RangeError(`unitWeight (effective γ' = q/t) must be > 0 N/m³, got ${unitWeight}`);
  if (!(modulus > 0 && modulus < Infinity))
    throw new RangeError(`modulus must be > 0 Pa, got ${modulus}`);
  if (!(ucs >= 0 && ucs < Infinity)) throw new RangeError(`ucs must be ≥ 0 Pa, got ${ucs}`);
  if (!(frictionDeg >= 0 && frictionDeg <= 90))
    throw new RangeError(`frictionDeg must be in [0, 90] degrees, got ${frictionDeg}`);
  const sh = input.horizontalStress;
  if (sh !== undefined && !Number.isFinite(sh)) throw new RangeError(`horizontalStress must be a finite number of Pa, got ${sh}`);
}

/** The result after snap-through: every numeric field null. */
export function snapThroughResult(iterations: number): VoussoirResult {
  return {
    snapThrough: true,
    n: null,
    leverArm: null,
    initialLeverArm: null,
    arcLength: null,
    maxCompression: null,
    averageStress: null,
    shortening: null,
    deflection: null,
    deflectionRatio: null,
    crushingDemand: null,
    fsCrushing: null,
    fsSliding: null,
    iterations,
  };
}

/**
 * All voussoir outputs at a solved state (n, z). Shared by both solvers so that they report
 * identically. Throws RangeError if the inputs are so extreme that a value is not finite.
 */
export function voussoirResultAt(
  input: VoussoirInput,
  n: number,
  z: number,
  iterations: number,
): VoussoirResult {
  const { span: s, thickness: t, unitWeight: g, modulus: E, ucs, frictionDeg } = input;
  const z0 = t * (1 - (2 * n) / 3);
  const L = s + (8 * z0 * z0) / (3 * s);
  const fc = (g * s * s) / (4 * n * z);
  const fav = (fc * (2 / 3 + n)) / 3;
  const dL = (fav * L) / E;
  const K = ((3 * s) / 8) * dL * z; // = (3s/8)·L·((2/3+n)/3)·γ's²/(4nE)
  const deflection = K / (z * (z0 + z)); // z0 − z at the root of z³ − z0²z + K = 0
  const tanPhi = Math.tan((frictionDeg * Math.PI) / 180);
  const crushingDemand = fc + Math.max(0, input.horizontalStress ?? 0);
  const result: VoussoirResult = {
    snapThrough: false,
    n,
    leverArm: z,
    initialLeverArm: z0,
    arcLength: L,
    maxCompression: fc,
    averageStress: fav,
    shortening: dL,
    deflection,
    deflectionRatio: deflection / t,
    crushingDemand,
    fsCrushing: ucs / crushingDemand,
    fsSliding: frictionDeg === 0 ? 0 : (fc * n * tanPhi) / (g * s),
    iterations,
  };
  // Finite inputs can still overflow (e.g. s = 1e200); never hand back Infinity or NaN.
  if (!Number.isFinite(fc * fav * dL * deflection * L * result.fsSliding! * result.fsCrushing! + z))
    throw new RangeError(`voussoir results are not finite for ${JSON.stringify(input)}`);
  return result;
}

/**
 * Lever arm z at a given compression-zone depth ratio n: the largest root of
 * z³ − z0²z + K = 0, z = (2z0/√3)·cos(arccos(−K/Kc)/3), Kc = 2z0³/(3√3) (see the file header),
 * or null where K > Kc (no real lever arm at this n). SI: m. Source: closed form of the
 * Diederichs & Kaiser (1999) iteration.
 *     leverArmAt({ span: 6, thickness: 0.45, unitWeight: 25e3, modulus: 8e9,
 *                  ucs: 40e6, frictionDeg: 35 }, 0.74) // ≈ 0.22564 m
 */
export function leverArmAt(input: VoussoirInput, n: number): number | null {
  validateVoussoirInput(input);
  if (!(n > 0 && n < 1)) throw new RangeError(`n must be in (0, 1), got ${n}`);
  const { span: s, thickness: t, unitWeight: g, modulus: E } = input;
  const z0 = t * (1 - (2 * n) / 3);
  const L = s + (8 * z0 * z0) / (3 * s);
  const K = ((3 * s) / 8) * L * ((2 / 3 + n) / 3) * ((g * s * s) / (4 * n * E));
  const h = K / (KC_FACTOR * z0 * z0 * z0);
  if (!(h <= 1)) return null;
  return Math.min(z0, ((2 * z0) / SQRT3) * Math.cos(Math.acos(-h) / 3));
}

/**
 * Voussoir roof beam, optimised solver (METHODS §3). For each trial n the lever arm is the
 * largest root of z³ − z0²z + K = 0 in closed form (see the file header). The equilibrium n,
 * where fc = γ's²/(4nz) is least, i.e. n·z is greatest, is bracketed by a scan of h = K/Kc at
 * n = 0.1 … 0.9 (which points have a lever arm) and a walk over those points from n = 0.75 (the
 * rigid-beam optimum) until d(nz)/dn changes sign — n·z is taken as unimodal over the feasible
 * window, which the tests check against the 0.01-step sweep on thousands of beams — and
 * refined to 1e-7 in n by a safeguarded false-position (Illinois) search for the root of
 *     D(n) = d(nz)/dn = z + n·z',   z' = (2z0·z0'·z − K')/(3z² − z0²)   (implicit derivative
 * of the cubic), bisecting wherever a trial n has no lever arm. D → +∞ at the left edge of the
 * feasible window and −∞ at its right edge, so the window always holds the root. Where no scan
 * point is feasible, the least h = K/Kc is found the same way (root of d ln h/dn): h ≤ 1 there
 * means a narrow feasible window; h > 1 means snap-through (no n in (0,1) has a lever arm).
 * SI: m, N/m³, Pa → m, Pa. FS crushing = σc/(fc + σh) (σh ≥ 0; METHODS §3a); FS sliding = fc·n·tanφ/(γ's).
 * `record`, when given, receives every trial n with its lever arm, fc and the bracket after it
 * (for the calculation trace); the search itself is the same with or without it.
 * Sources: Diederichs & Kaiser (1999); Brady & Brown (2004) §8.4.
 *     solveVoussoir({ span: 6, thickness: 0.45, unitWeight: 25e3, modulus: 8e9,
 *                     ucs: 40e6, frictionDeg: 35 })
 *     // n ≈ 0.740, leverArm ≈ 0.2256 m, maxCompression ≈ 1.3475e6 Pa, deflection ≈ 2.36e-3 m
 */
export function solveVoussoir(input: VoussoirInput, record?: VoussoirRecorder): VoussoirResult {
  validateVoussoirInput(input);
  const { span: s, thickness: t, unitWeight: g, modulus: E } = input;
  const kScale = ((3 * s) / 8) * ((g * s * s) / (4 * E)); // K = kScale·L·c, c = (2/3 + n)/(3n)
  let evaluations = 0;
  // Only when recording: the lever arm and fc at a trial n (same closed form as the search).
  const note = record
    ? (stage: VoussoirSearchStep['stage'], n: number, lower: number, upper: number): void => {
        const h = loadRatio(s, t, kScale, n);
        const z = h <= 1 ? leverArmFromRatio(t, n, h) : null;
        const ok = z !== null && z > 0;
        record({ stage, n, leverArm: ok ? z : null, maxCompression: ok ? (g * s * s) / (4 * n * z) : null, lower, upper });
      }
    : null;

  // Coarse scan of h (cheap, no trig): which scan points have a lever arm, and the least h.
  let first = 0; // first and last feasible scan index (the feasible window is an interval)
  let last = 0;
  let jMinH = 1;
  let minH = Infinity;
  for (let i = 1; i < GRID; i++) {
    const h = loadRatio(s, t, kScale, i / GRID);
    if (h <= 1) {
      if (first === 0) first = i;
      last = i;
    }
    if (h < minH) {
      minH = h;
      jMinH = i;
    }
    note?.('scan', i / GRID, 0, 1);
  }
  evaluations += GRID - 1;

  let a: number; // D > 0 side (left of the root)
  let b: number; // D < 0 side (right of the root)
  let Da: number; // D(a), or +Infinity where unknown (no lever arm at a, or a = 0)
  let Db: number; // D(b), or −Infinity where unknown (no lever arm at b)
  if (first > 0) {
    // Walk the feasible scan points from the one nearest the rigid-beam optimum n = 0.75
    // until D = d(nz)/dn changes sign (n·z is unimodal in n over the window).
    let i = Math.min(last, Math.max(first, Math.round(0.75 * GRID)));
    let D = slopeOrUnknown(s, t, kScale, i / GRID, NaN);
    evaluations++;
    if (D >= 0) {
      a = i / GRID;
      Da = D;
      b = 1;
      Db = -Infinity;
      while (i < last) {
        i++;
        D = slopeOrUnknown(s, t, kScale, i / GRID, NaN);
        evaluations++;
        if (D < 0) {
          b = i / GRID;
          Db = D;
          break;
        }
        a = i / GRID;
        Da = D;
      }
      if (i === last && Db === -Infinity) {
        b = (last + 1) / GRID;
        if (last + 1 === GRID) {
          // n·z still rising at n = 1: the least fc lies at the end of the range (0, 1).
          const D1 = slopeOrUnknown(s, t, kScale, 1, -Infinity);
          evaluations++;
          if (D1 >= 0) a = b = 1 - N_TOLERANCE;
          else Db = D1;
        }
      }
    } else {
      b = i / GRID;
      Db = D;
      a = (first - 1) / GRID;
      Da = Infinity;
      while (i > first) {
        i--;
        D = slopeOrUnknown(s, t, kScale, i / GRID, NaN);
        evaluations++;
        if (D >= 0) {
          a = i / GRID;
          Da = D;
          break;
        }
        b = i / GRID;
        Db = D;
      }
    }
  } else {
    // No scan point has a lever arm: find the least h, the root of d ln h/dn (−∞ as n → 0),
    // by the same safeguarded false position.
    let lo = (jMinH - 1) / GRID;
    let hi = (jMinH + 1) / GRID;
    let flo = lo > 0 ? logRatioSlope(s, t, lo) : -Infinity;
    let fhi = logRatioSlope(s, t, hi);
    evaluations += 2;
    if (fhi <= 0) lo = hi; // h still falling at n = 1: its least value is there
    let side = 0;
    for (let k = 0; k < MAX_REFINE_STEPS && hi - lo > N_TOLERANCE; k++) {
      const x = flo > -Infinity ? hi - (fhi * (hi - lo)) / (fhi - flo) : 0.5 * (lo + hi);
      const m = x > lo && x < hi ? x : 0.5 * (lo + hi);
      const fm = logRatioSlope(s, t, m);
      evaluations++;
      if (fm < 0) {
        lo = m;
        flo = fm;
        if (side === -1) fhi /= 2;
        side = -1;
      } else {
        hi = m;
        fhi = fm;
        if (side === 1 && flo > -Infinity) flo /= 2;
        side = 1;
      }
    }
    const nMinH = 0.5 * (lo + hi);
    const h = loadRatio(s, t, kScale, nMinH);
    evaluations++;
    if (!(h <= 1)) return snapThroughResult(evaluations);
    const slope = momentArmSlope(s, t, kScale, nMinH, leverArmFromRatio(t, nMinH, h));
    if (slope >= 0) {
      a = nMinH;
      Da = slope;
      b = Math.min(1, (jMinH + 1) / GRID);
      Db = -Infinity;
    } else {
      b = nMinH;
      Db = slope;
      a = (jMinH - 1) / GRID;
      Da = Infinity;
    }
  }

  if (note) {
    // The bracket the walk (or the least-h search) found, at its ends that have a lever arm.
    if (a > 0 && a < 1) note('walk', a, a, b);
    if (b > 0 && b < 1 && b !== a) note('walk', b, a, b);
  }

  // Safeguarded false position (Illinois) on D over [a, b]; bisect while an end is unknown.
  // One end always has a lever arm and the feasible window is an interval, so a trial n
  // without one lies beyond the window on the side of the unknown end.
  let side = 0;
  for (let k = 0; k < MAX_REFINE_STEPS && b - a > N_TOLERANCE; k++) {
    const x = Da < Infinity && Db > -Infinity ? b - (Db * (b - a)) / (Db - Da) : 0.5 * (a + b);
    const m = x > a && x < b ? x : 0.5 * (a + b);
    const h = loadRatio(s, t, kScale, m);
    evaluations++;
    let slope: number;
    if (h <= 1) slope = momentArmSlope(s, t, kScale, m, leverArmFromRatio(t, m, h));
    else slope = Da === Infinity ? Infinity : -Infinity;
    if (slope === 0) {
      a = b = m;
      note?.('refine', m, a, b);
      break;
    }
    if (slope > 0) {
      a = m;
      Da = slope;
      if (side === -1 && Db > -Infinity) Db /= 2;
      side = -1;
    } else {
      b = m;
      Db = slope;
      if (side === 1 && Da < Infinity) Da /= 2;
      side = 1;
    }
    note?.('refine', m, a, b);
  }

  // The refined root, on its feasible side.
  let n = Da < Infinity ? (Db > -Infinity ? 0.5 * (a + b) : a) : b;
  let h = loadRatio(s, t, kScale, n);
  if (!(h <= 1)) {
    n = Da < Infinity ? a : b;
    h = loadRatio(s, t, kScale, n);
  }
  evaluations++;
  const z = h <= 1 ? leverArmFromRatio(t, n, h) : NaN;
  if (!(z > 0)) return snapThroughResult(evaluations);
  note?.('result', n, a, b);
  return voussoirResultAt(input, n, z, evaluations);
}

/** h = K/Kc at n (h ≤ 1 ⇔ a real lever arm). K = kScale·L·(2/(9n) + 1/3), Kc = 2z0³/(3√3). */
function loadRatio(s: number, t: number, kScale: number, n: number): number {
  const z0 = t * (1 - (2 * n) / 3);
  const L = s + (8 * z0 * z0) / (3 * s);
  return (kScale * L * (2 / (9 * n) + 1 / 3)) / (KC_FACTOR * z0 * z0 * z0);
}

/** Largest root of z³ − z0²z + K = 0 for h = K/Kc ∈ [0, 1]: (2z0/√3)·cos(arccos(−h)/3). */
function leverArmFromRatio(t: number, n: number, h: number): number {
  const z0 = t * (1 - (2 * n) / 3);
  // min: at h → 0 rounding in cos(π/6)·2/√3 could put z a hair above z0.
  return Math.min(z0, ((2 * z0) / SQRT3) * Math.cos(Math.acos(-h) / 3));
}

/** D(n) = d(n·z)/dn = z + n·z', z' = (2z0·z0'·z − K')/(3z² − z0²), at a solved (n, z). */
function momentArmSlope(s: number, t: number, kScale: number, n: number, z: number): number {
  const dz0 = (-2 * t) / 3;
  const z0 = t + dz0 * n;
  const L = s + (8 * z0 * z0) / (3 * s);
  const c = 2 / (9 * n) + 1 / 3;
  const dK = kScale * (((16 * z0 * dz0) / (3 * s)) * c - (2 * L) / (9 * n * n));
  return z + (n * (2 * z0 * dz0 * z - dK)) / (3 * z * z - z0 * z0);
}

/** D at n, or `unknown` (±Infinity, the side's sign) where n has no lever arm. */
function slopeOrUnknown(s: number, t: number, kScale: number, n: number, unknown: number): number {
  const h = loadRatio(s, t, kScale, n);
  if (!(h <= 1)) return unknown;
  return momentArmSlope(s, t, kScale, n, leverArmFromRatio(t, n, h));
}

/** d ln h/dn = L'/L + c'/c − 3z0'/z0 (kScale cancels). */
function logRatioSlope(s: number, t: number, n: number): number {
  const dz0 = (-2 * t) / 3;
  const z0 = t + dz0 * n;
  const L = s + (8 * z0 * z0) / (3 * s);
  const c = 2 / (9 * n) + 1 / 3;
  return (16 * z0 * dz0) / (3 * s * L) - 2 / (9 * n * n * c) - (3 * dz0) / z0;
}
