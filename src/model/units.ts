/**
 * Units at the boundary. Text typed into a form field (`20 ft`, `2500 psi`, `160 lbf/ft^3`) is
 * parsed with a strict pattern and converted through the unit table of `unit-table.ts` (the
 * units the app accepts, with SI prefixes on m, g, N, Pa and bar); user text is never
 * evaluated as an expression. No mathjs here: the worksheet's first load stays small, and
 * test/model/units.test.ts checks every unit of the table against mathjs's own definitions.
 * Display conversions (SI ↔ US customary) use plain factors from the definitions below.
 *
 * Units: psf = lbf/ft², ksf = 1000 lbf/ft², ksi = 1000 psi, pcf = lbf/ft³, kcf = 1000 lbf/ft³;
 * psi = lbf/in² = 6894.757 Pa, lbf = 4.448222 N, ft = 0.3048 m, in = 0.0254 m (METHODS §13:
 * 1 psi = 6894.757 Pa; 1 lbf/ft³ = 0.157087 kN/m³; 1 ft = 0.3048 m; 1 ksf = 47.880 kPa).
 *
 *     parseQuantity('20 ft', 'm')   // 6.096
 *     parseQuantity('2500 psi', 'MPa') // 17.2369
 *     parseQuantity('0.45', 'm')    // 0.45 (a bare number is already in the given unit)
 */
import { normaliseDecimalComma } from './decimal-comma';
import { MISSING, PRECISION, numberText } from './number-format';
import { unitValue, type UnitValue } from './unit-table';

/** Thrown on unparsable text or a quantity of the wrong dimension. */
export class UnitError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UnitError';
  }
}

const NUMBER = String.raw`[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?`;
const UNIT_TOKEN = String.raw`[A-Za-zµμ°]+(?:[²³]|\^?[-+]?\d+)?`;
const UNIT = String.raw`${UNIT_TOKEN}(?:\s*[/*·.]\s*${UNIT_TOKEN}|\s+${UNIT_TOKEN})*`;
const QUANTITY = new RegExp(String.raw`^\s*(${NUMBER})\s*(${UNIT})?\s*$`);

/** What a unit measures, for messages: base SI unit of the dimension → name and example. */
const DIMENSIONS: ReadonlyArray<{ probe: string; name: string; example: string }> = [
  { probe: 'm', name: 'a length', example: '6 m or 20 ft' },
  { probe: 'Pa', name: 'a stress or pressure', example: '3 MPa or 450 psi' },
  { probe: 'N/m^3', name: 'a unit weight', example: '25 kN/m³ or 160 lbf/ft³' },
  { probe: 'N', name: 'a force', example: '10 kN or 2250 lbf' },
  { probe: 'rad', name: 'an angle', example: '30 deg' },
];

function dimensionOf(target: UnitValue, siUnit: string): { name: string; example: string } {
  for (const d of DIMENSIONS) if (sameDimension(target, unitValue(d.probe)!)) return d;
  return { name: `a quantity in ${siUnit}`, example: `1 ${siUnit}` };
}

const sameDimension = (a: UnitValue, b: UnitValue): boolean => a.dimension.every((x, i) => x === b.dimension[i]);

/** Accept the pretty forms people type: ³ ², `·` for a product, `m3` for `m^3`. */
function normaliseUnit(text: string): string {
  return text
    .trim()
    .replace(/³/g, '^3')
    .replace(/²/g, '^2')
    .replace(/[·]/g, ' ')
    .replace(/μ/g, 'u')
    .replace(/µ/g, 'u')
    .replace(/°/g, 'deg')
    .replace(/([A-Za-z])([23])(?![\d.])/g, '$1^$2');
}

/** Drop floating-point noise from a conversion (15 significant digits) and −0. */
function tidy(x: number): number {
  const v = Number(x.toPrecision(15));
  return v === 0 ? 0 : v;
}

/**
 * Parse `text` (a number, optionally followed by a unit) and return it in `siUnit`
 * (e.g. 'm', 'mm', 'MPa', 'kPa', 'GPa', 'kN/m^3', 'kN'). A bare number is taken as already
 * in `siUnit`. A decimal comma is read as a point ("2,5 m"; see decimal-comma.ts). Throws
 * `UnitError` on unparsable text or a wrong dimension, `AmbiguousNumberError` on "1,250".
 *     parseQuantity('160 lbf/ft^3', 'kN/m^3') // 25.134
 */
export function parseQuantity(text: string, siUnit: string): number {
  const target = unitValue(siUnit);
  if (!target) throw new RangeError(`parseQuantity: unknown target unit ${JSON.stringify(siUnit)}`);
  const dim = dimensionOf(target, siUnit);
  const expected = `expected ${dim.name} (e.g. ${dim.example}), got ${JSON.stringify(String(text))}`;
  if (typeof text !== 'string') throw new UnitError(expected);
  const m = QUANTITY.exec(normaliseDecimalComma(text)); // "2,5 m" → "2.5 m"; "1,250" throws (ambiguous)
  if (!m) throw new UnitError(expected);
  const value = Number(m[1]);
  if (!Number.isFinite(value)) throw new UnitError(expected);
  const unitText = m[2]?.trim();
  if (!unitText) return value;
  const unit = unitValue(normaliseUnit(unitText));
  if (!unit || !sameDimension(unit, target)) throw new UnitError(expected);
  const result = tidy((value * unit.factor) / target.factor);
  if (!Number.isFinite(result)) throw new UnitError(expected);
  return result;
}

// ---------------------------------------------------------------- display unit systems

export type UnitSystem = 'SI' | 'US';

export type Quantity =
  | 'length'
  | 'smallLength'
  | 'stress'
  | 'pressure'
  | 'modulus'
  | 'unitWeight'
  | 'force'
  | 'boltForce'
  | 'deflection';

interface QuantityUnits {
  /** Unit the project file stores this quantity in. */
  file: string;
  SI: string;
  US: string;
  label: Record<UnitSystem, string>;
}

/**
 * Display units per quantity. Pressure (surcharge, support, distributed load) is shown in psf
 * in US units, as surface loads are in US practice; stresses are in psi.
 */
export const QUANTITIES: Readonly<Record<Quantity, QuantityUnits>> = {
  length: { file: 'm', SI: 'm', US: 'ft', label: { SI: 'm', US: 'ft' } },
  smallLength: { file: 'mm', SI: 'mm', US: 'in', label: { SI: 'mm', US: 'in' } },
  stress: { file: 'MPa', SI: 'MPa', US: 'psi', label: { SI: 'MPa', US: 'psi' } },
  pressure: { file: 'kPa', SI: 'kPa', US: 'psf', label: { SI: 'kPa', US: 'psf' } },
  modulus: { file: 'GPa', SI: 'GPa', US: 'ksi', label: { SI: 'GPa', US: 'ksi' } },
  unitWeight: { file: 'kN/m^3', SI: 'kN/m^3', US: 'lbf/ft^3', label: { SI: 'kN/m³', US: 'lbf/ft³' } },
  force: { file: 'kN', SI: 'kN', US: 'lbf', label: { SI: 'kN', US: 'lbf' } },
  // A bolt's capacity, pretension and load: kips in US units (1 kip = 1000 lbf, exact and a
  // mathjs unit, so "25 kip" can be typed). Not tons-force: a "ton" may be short, long or
  // metric, and mathjs has no tonf.
  boltForce: { file: 'kN', SI: 'kN', US: 'kip', label: { SI: 'kN', US: 'kip' } },
  deflection: { file: 'mm', SI: 'mm', US: 'in', label: { SI: 'mm', US: 'in' } },
};

// Definitions (exact): 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 lbf = 0.45359237 kg × 9.80665 m/s²
// (international yard and pound, 1959; standard gravity). Hence psi = lbf/in² = 6894.757 Pa,
// psf = lbf/ft² = 47.880 Pa, lbf/ft³ = 157.087 N/m³ (METHODS §13). test/model/units.test.ts
// checks every factor against mathjs's own unit definitions.
const IN_M = 0.0254;
const FT_M = 0.3048;
const LBF_N = 0.45359237 * 9.80665;
const PSI_PA = LBF_N / (IN_M * IN_M);

/** US display units per file unit, per quantity (SI display units are the file units). */
const US_PER_FILE_UNIT: Readonly<Record<Quantity, number>> = {
  length: 1 / FT_M, // m → ft
  smallLength: 1e-3 / IN_M, // mm → in
  stress: 1e6 / PSI_PA, // MPa → psi
  pressure: 1e3 / (LBF_N / (FT_M * FT_M)), // kPa → psf
  modulus: 1e9 / (1e3 * PSI_PA), // GPa → ksi
  unitWeight: 1e3 / (LBF_N / FT_M ** 3), // kN/m³ → lbf/ft³
  force: 1e3 / LBF_N, // kN → lbf
  boltForce: 1 / LBF_N, // kN → kip (1000 lbf)
  deflection: 1e-3 / IN_M, // mm → in
};

/** Display units per file unit for `quantity` in `system` (all conversions are linear). */
function displayFactor(quantity: Quantity, system: UnitSystem): number {
  if (!Object.hasOwn(QUANTITIES, quantity)) throw new RangeError(`unknown quantity ${JSON.stringify(quantity)}`);
  if (system !== 'SI' && system !== 'US') throw new RangeError(`unknown unit system ${JSON.stringify(system)}`);
  return system === 'SI' ? 1 : US_PER_FILE_UNIT[quantity];
}

/** Convert a value in the file unit of `quantity` to the display unit of `system`. */
export function toDisplay(valueInFileUnit: number, quantity: Quantity, system: UnitSystem): number {
  if (!Number.isFinite(valueInFileUnit)) throw new RangeError(`toDisplay: value must be finite, got ${valueInFileUnit}`);
  return tidy(valueInFileUnit * displayFactor(quantity, system));
}

/** Convert a value in the display unit of `system` back to the file unit of `quantity`. */
export function fromDisplay(valueInDisplayUnit: number, quantity: Quantity, system: UnitSystem): number {
  if (!Number.isFinite(valueInDisplayUnit)) throw new RangeError(`fromDisplay: value must be finite, got ${valueInDisplayUnit}`);
  return tidy(valueInDisplayUnit / displayFactor(quantity, system));
}

/** The display unit as a mathjs unit string ('lbf/ft^3'), e.g. for `parseQuantity`. */
export const displayUnit = (quantity: Quantity, system: UnitSystem): string => QUANTITIES[quantity][system];

/** The file unit of `quantity` as a mathjs unit string ('kN/m^3'). */
export const fileUnit = (quantity: Quantity): string => QUANTITIES[quantity].file;

/** Pretty unit label for display: 'kN/m³', 'lbf/ft³', 'psi'. */
export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  displayFactor(quantity, system); // validates both arguments
  return QUANTITIES[quantity].label[system];
}

/**
 * Format a value given in the file unit as display text with its unit, by the precision rule
 * of `number-format.ts` (a result: 3 significant figures unless `digits` says otherwise):
 * formatQuantity(6, 'length', 'US') // "19.7 ft". `null` formats as "—".
 */
export function formatQuantity(value: number | null, quantity: Quantity, system: UnitSystem, digits: number = PRECISION.result): string {
  if (value === null) return MISSING;
  if (!(Number.isInteger(digits) && digits >= 1 && digits <= 15)) {
    throw new RangeError(`formatQuantity: digits must be an integer from 1 to 15, got ${digits}`);
  }
  return `${numberText(toDisplay(value, quantity, system), digits)} ${unitLabel(quantity, system)}`;
}

/** Parse text typed into a field showing `quantity` in `system`; returns the file unit value. */
export function parseDisplayQuantity(text: string, quantity: Quantity, system: UnitSystem): number {
  const bareInDisplay = parseQuantity(text, displayUnit(quantity, system));
  return fromDisplay(bareInDisplay, quantity, system);
}
