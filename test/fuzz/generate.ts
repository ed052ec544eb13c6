/**
 * Random VALID raw projects (as a `*.lamina.json` file holds them) over the whole range the
 * validator accepts: every opening type, end condition, design basis and option, 1 to 100
 * layers, tensile strength 0, specimens, and numbers drawn from the hard bounds in
 * `NUMBERS` (src/model/validate.ts) — now at a bound or just inside it, now log-uniform over
 * the whole range, now in the plausible range. Deterministic for a given PRNG.
 */
import { MAX_LAYERS, NUMBERS, type NumberRule } from '../../src/model/validate';

export type Rand = () => number;
type Json = Record<string, unknown>;

const pick = <T>(r: Rand, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)];
const uniform = (r: Rand, lo: number, hi: number) => lo + (hi - lo) * r();

/** The smallest and largest accepted values of a rule (an open bound is stepped inside). */
export function limits(rule: NumberRule): [number, number] {
  let lo = rule.min ?? -1e3;
  let hi = rule.max ?? 1e3;
  if (rule.minOpen) lo = lo === 0 ? Number.MIN_VALUE : lo + Math.abs(lo) * 1e-12;
  if (rule.maxOpen) hi = hi - Math.max(Math.abs(hi), 1) * 1e-12;
  return [lo, hi];
}

/**
 * A number the rule accepts: 12 % a bound itself, 8 % next to a bound, 30 % log-uniform over
 * the whole range (uniform when it spans zero), otherwise uniform over `typical` (clipped).
 */
export function numberIn(r: Rand, rule: NumberRule, typical: [number, number]): number {
  const [lo, hi] = limits(rule);
  const u = r();
  if (u < 0.06) return lo;
  if (u < 0.12) return hi;
  if (u < 0.16) return Math.min(hi, lo + (hi - lo) * 1e-9 + Math.abs(lo) * 1e-9);
  if (u < 0.2) return Math.max(lo, hi - (hi - lo) * 1e-9);
  if (u < 0.5) {
    if (lo > 0) return Math.min(hi, Math.max(lo, lo * (hi / lo) ** r()));
    if (lo === 0) return r() < 0.1 ? 0 : Math.min(hi, 1e-6 * hi * (1e6) ** r());
    return uniform(r, lo, hi);
  }
  return Math.min(hi, Math.max(lo, uniform(r, typical[0], typical[1])));
}

function layerCount(r: Rand): number {
  const u = r();
  if (u < 0.6) return 1 + Math.floor(r() * 3);
  if (u < 0.9) return 4 + Math.floor(r() * 10);
  if (u < 0.98) return 14 + Math.floor(r() * 37);
  return MAX_LAYERS - Math.floor(r() * 10);
}

function specimen(r: Rand, k: number, usable: boolean): Json {
  const diameter = numberIn(r, NUMBERS.specimenSize, [30, 100]);
  const ratio = usable ? uniform(r, 0.001, 1) : uniform(r, 0.001, 1.6);
  const thickness = Math.min(NUMBERS.specimenSize.max, Math.max(NUMBERS.specimenSize.min, r() < 0.1 ? numberIn(r, NUMBERS.specimenSize, [10, 50]) : diameter * ratio));
  const s: Json = {
    id: `S${k + 1}`,
    diameter_mm: diameter,
    thickness_mm: usable ? Math.min(thickness, diameter) : thickness,
    peakLoad_kN: numberIn(r, NUMBERS.peakLoad, [1, 40]),
  };
  if (!usable || r() < 0.5) s.valid = usable ? true : r() < 0.8;
  return s;
}

function tensile(r: Rand): Json {
  const out: Json = {};
  const u = r();
  const withValue = u < 0.75;
  if (withValue) out.value_MPa = r() < 0.15 ? 0 : numberIn(r, NUMBERS.tensile, [0.5, 15]);
  if (r() < 0.5) out.method = pick(r, ['brazilian', 'direct']);
  const count = r() < 0.6 ? 0 : r() < 0.97 ? 1 + Math.floor(r() * 12) : 1 + Math.floor(r() * 300);
  const specimens = Array.from({ length: count }, (_, k) => specimen(r, k, r() < 0.8));
  if (!withValue) specimens.push(specimen(r, specimens.length, true));
  if (specimens.length > 0 || r() < 0.5) out.specimens = specimens;
  return out;
}

function layer(r: Rand, i: number): Json {
  const l: Json = {
    thickness_m: numberIn(r, NUMBERS.thickness, [0.05, 3]),
    unitWeight_kNm3: numberIn(r, NUMBERS.unitWeight, [18, 30]),
    youngModulus_GPa: numberIn(r, NUMBERS.modulus, [1, 60]),
    ucs_MPa: numberIn(r, NUMBERS.ucs, [10, 200]),
    tensile: tensile(r),
  };
  if (r() < 0.7) l.name = `Bed ${i + 1}`;
  if (r() < 0.6) l.modulusBasis = pick(r, ['mass', 'intact']);
  if (r() < 0.7) l.poisson = numberIn(r, NUMBERS.poisson, [0.15, 0.35]);
  if (r() < 0.6) l.rockClass = pick(r, ['sedimentary', 'igneous', 'metamorphic']);
  if (r() < 0.8) {
    const j: Json = {};
    if (r() < 0.6) j.crossJointSpacing_m = r() < 0.3 ? null : numberIn(r, NUMBERS.spacing, [0.3, 20]);
    if (r() < 0.5) j.fractureFrequency_per_m = r() < 0.3 ? null : numberIn(r, NUMBERS.frequency, [0.5, 20]);
    if (r() < 0.3) j.rqd = r() < 0.3 ? null : numberIn(r, NUMBERS.rqd, [20, 100]);
    if (r() < 0.7) j.jointCondition = numberIn(r, NUMBERS.jointCondition, [5, 30]);
    if (r() < 0.7) j.jointFriction_deg = numberIn(r, NUMBERS.friction, [15, 45]);
    l.jointing = j;
  }
  if (r() < 0.6) {
    const h: Json = {};
    if (r() < 0.7) h.mi = numberIn(r, NUMBERS.mi, [4, 30]);
    if (r() < 0.7) h.disturbance = numberIn(r, NUMBERS.disturbance, [0, 1]);
    l.hoekBrown = h;
  }
  return l;
}

function opening(r: Rand): Json {
  const type = pick(r, ['beam', 'slab', 'cantilever', 'intersection'] as const);
  const span = numberIn(r, NUMBERS.span, [0.5, 30]);
  const o: Json = { type, span_m: span };
  if (type === 'intersection') o.length_m = Math.min(NUMBERS.length.max, span * uniform(r, 1, 3));
  if (type === 'slab') {
    if (r() < 0.3) o.edges = { short: pick(r, ['clamped', 'simple', 'free']), long: pick(r, ['clamped', 'simple']) };
    const u = r();
    const aspect = u < 0.1 ? 1 : u < 0.7 ? uniform(r, 1, 4) : u < 0.9 ? uniform(r, 4, 100) : uniform(r, 100, 1e4);
    o.length_m = Math.min(NUMBERS.length.max, Math.max(span, r() < 0.05 ? NUMBERS.length.max : span * aspect));
  }
  if (type !== 'cantilever' || r() < 0.5) o.ends = pick(r, ['clamped', 'simple']);
  return o;
}

/** One random valid project. */
export function randomValidProject(r: Rand): Json {
  const p: Json = { schema: 'lamina/2', opening: opening(r) };
  if (r() < 0.5) p.title = 'Fuzz project (invented)';
  if (r() < 0.8) {
    const loads: Json = {};
    if (r() < 0.6) loads.surcharge_kPa = numberIn(r, NUMBERS.pressure, [0, 200]);
    if (r() < 0.6) loads.horizontalStress_MPa = numberIn(r, NUMBERS.horizontalStress, [-2, 20]);
    p.loads = loads;
  }
  if (r() < 0.4) p.support = { standing_kPa: numberIn(r, NUMBERS.pressure, [0, 50]) };
  p.layers = Array.from({ length: layerCount(r) }, (_, i) => layer(r, i));
  if (r() < 0.8) {
    const d: Json = {};
    if (r() < 0.6) {
      const fs: Json = {};
      for (const k of ['tension', 'crushing', 'sliding']) if (r() < 0.6) fs[k] = numberIn(r, NUMBERS.factor, [1, 6]);
      d.fsTarget = fs;
    }
    if (r() < 0.5) d.deflectionLimitRatio = numberIn(r, NUMBERS.ratio, [0.05, 0.25]);
    if (r() < 0.6) d.characteristic = pick(r, ['mean', 'lower5', 'cautiousMean', 'lower5Log']);
    if (r() < 0.5) d.tensileBasis = pick(r, ['rockMass', 'lab']);
    if (r() < 0.5) d.crushingStrength = pick(r, ['rockMass', 'lab']);
    if (r() < 0.6) d.basis = pick(r, ['intact', 'jointed']);
    if (r() < 0.5) d.planeStrainModulus = r() < 0.5;
    p.design = d;
  }
  return p;
}
