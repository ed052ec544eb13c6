/**
 * The units the worksheet accepts in a field, as factors to SI base units with their
 * dimension (length, mass, time, angle), and a strict reader for a unit product such as
 * `kN/m^3`, `lbf / ft^3`, `N/mm^2` or `kN m^-3`. Read left to right: `/` divides by the next
 * unit only, `*` or a space multiplies (`kN/m m` is kN·m/m = kN, as mathjs reads it).
 *
 * SI prefixes (G M k h da d c m u n) go on m, g, N, Pa and bar. Definitions (exact): in =
 * 0.0254 m, ft = 0.3048 m, yd = 0.9144 m, mi = 1609.344 m, lb = 0.45359237 kg, lbf = lb ×
 * 9.80665 m/s² (international yard and pound, 1959; standard gravity), kip = 1000 lbf,
 * psi = lbf/in², ksi = 1000 psi, psf = lbf/ft², ksf = 1000 psf, pcf = lbf/ft³, kcf =
 * 1000 pcf, bar = 1e5 Pa, atm = 101 325 Pa, kgf = 9.80665 N, dyn = 1e-5 N, t = 1000 kg,
 * deg = π/180 rad, grad = π/200 rad. test/model/units.test.ts checks each against mathjs.
 */

/** [length, mass, time, angle] exponents */
export type Dimension = readonly [number, number, number, number];

export interface UnitValue {
  /** SI base units per one of this unit */
  factor: number;
  dimension: Dimension;
}

const L: Dimension = [1, 0, 0, 0];
const M: Dimension = [0, 1, 0, 0];
const FORCE: Dimension = [1, 1, -2, 0];
const STRESS: Dimension = [-1, 1, -2, 0];
const WEIGHT_DENSITY: Dimension = [-2, 1, -2, 0];
const ANGLE: Dimension = [0, 0, 0, 1];

const IN = 0.0254;
const FT = 0.3048;
const LB = 0.45359237;
const LBF = LB * 9.80665;

/** Unit symbols and names; `prefix`: SI prefixes allowed. */
export const UNIT_TABLE: Readonly<Record<string, { factor: number; dimension: Dimension; prefix?: boolean }>> = {
  m: { factor: 1, dimension: L, prefix: true },
  in: { factor: IN, dimension: L },
  inch: { factor: IN, dimension: L },
  inches: { factor: IN, dimension: L },
  ft: { factor: FT, dimension: L },
  foot: { factor: FT, dimension: L },
  feet: { factor: FT, dimension: L },
  yd: { factor: 0.9144, dimension: L },
  yard: { factor: 0.9144, dimension: L },
  yards: { factor: 0.9144, dimension: L },
  mi: { factor: 1609.344, dimension: L },
  mile: { factor: 1609.344, dimension: L },
  g: { factor: 1e-3, dimension: M, prefix: true },
  t: { factor: 1000, dimension: M },
  tonne: { factor: 1000, dimension: M },
  lb: { factor: LB, dimension: M },
  N: { factor: 1, dimension: FORCE, prefix: true },
  lbf: { factor: LBF, dimension: FORCE },
  kip: { factor: 1000 * LBF, dimension: FORCE },
  kips: { factor: 1000 * LBF, dimension: FORCE },
  kgf: { factor: 9.80665, dimension: FORCE },
  dyn: { factor: 1e-5, dimension: FORCE },
  Pa: { factor: 1, dimension: STRESS, prefix: true },
  bar: { factor: 1e5, dimension: STRESS, prefix: true },
  atm: { factor: 101325, dimension: STRESS },
  psi: { factor: LBF / (IN * IN), dimension: STRESS },
  ksi: { factor: (1000 * LBF) / (IN * IN), dimension: STRESS },
  psf: { factor: LBF / (FT * FT), dimension: STRESS },
  ksf: { factor: (1000 * LBF) / (FT * FT), dimension: STRESS },
  pcf: { factor: LBF / FT ** 3, dimension: WEIGHT_DENSITY },
  kcf: { factor: (1000 * LBF) / FT ** 3, dimension: WEIGHT_DENSITY },
  rad: { factor: 1, dimension: ANGLE },
  deg: { factor: Math.PI / 180, dimension: ANGLE },
  degree: { factor: Math.PI / 180, dimension: ANGLE },
  degrees: { factor: Math.PI / 180, dimension: ANGLE },
  grad: { factor: Math.PI / 200, dimension: ANGLE },
};

const PREFIXES: ReadonlyArray<[string, number]> = [
  ['da', 1e1], ['G', 1e9], ['M', 1e6], ['k', 1e3], ['h', 1e2], ['d', 1e-1], ['c', 1e-2], ['m', 1e-3], ['u', 1e-6], ['n', 1e-9],
];

/** One unit symbol, with an SI prefix where allowed; undefined when unknown. */
function symbolValue(symbol: string): UnitValue | undefined {
  if (Object.hasOwn(UNIT_TABLE, symbol)) return UNIT_TABLE[symbol];
  for (const [p, f] of PREFIXES) {
    if (!symbol.startsWith(p)) continue;
    const rest = symbol.slice(p.length);
    if (Object.hasOwn(UNIT_TABLE, rest) && UNIT_TABLE[rest].prefix) return { factor: f * UNIT_TABLE[rest].factor, dimension: UNIT_TABLE[rest].dimension };
  }
  return undefined;
}

const TERM = /^([A-Za-z]+)(?:\^([-+]?\d+))?/;

/**
 * A unit product as a factor to SI and a dimension: `unitValue('kN/m^3')` →
 * { factor: 1000, dimension: [-2, 1, -2, 0] }. Undefined for anything it cannot read.
 */
export function unitValue(text: string): UnitValue | undefined {
  let rest = text.trim();
  let factor = 1;
  const dimension = [0, 0, 0, 0];
  let sign = 1;
  let first = true;
  while (rest.length > 0) {
    if (!first) {
      const sep = /^\s*([*/])\s*|^\s+/.exec(rest);
      if (!sep) return undefined;
      sign = sep[1] === '/' ? -1 : 1;
      rest = rest.slice(sep[0].length);
    }
    first = false;
    const term = TERM.exec(rest);
    if (!term) return undefined;
    const unit = symbolValue(term[1]);
    if (!unit) return undefined;
    const power = sign * (term[2] === undefined ? 1 : Number(term[2]));
    factor *= unit.factor ** power;
    for (let i = 0; i < 4; i++) dimension[i] += unit.dimension[i] * power;
    rest = rest.slice(term[0].length);
  }
  if (first || !Number.isFinite(factor) || factor === 0) return undefined;
  return { factor, dimension: dimension as unknown as Dimension };
}
