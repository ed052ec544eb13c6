/**
 * Number-with-unit text in the report's unit system, through the model's unit helpers
 * (src/model/units). Values come in the report's practical SI units (m, kPa, MPa, GPa, kN/m³,
 * mm, kN), the units of the project file and of the Report.
 *
 *     quantityText(6, 'length', 'US')   // "19.7 ft"
 *     quantityText(null, 'stress', 'SI') // "—"
 */
import { toDisplay, unitLabel, type Quantity, type UnitSystem } from '../model/units';
import { MISSING, PRECISION, numberText } from './number-text';
import { inputSignificant } from '../model/number-format';

export function quantityText(value: number | null | undefined, quantity: Quantity, units: UnitSystem, digits: number = PRECISION.result): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  return `${numberText(toDisplay(value, quantity, units), digits)} ${unitLabel(quantity, units)}`;
}

/** The number alone in the display unit (for table cells whose column title gives the unit). */
export function displayNumber(value: number | null | undefined, quantity: Quantity, units: UnitSystem, digits: number = PRECISION.result): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  return numberText(toDisplay(value, quantity, units), digits);
}

/** An input with its unit: as stored in SI, to 4 significant figures when converted to US. */
export const inputQuantityText = (value: number | null | undefined, quantity: Quantity, units: UnitSystem): string =>
  quantityText(value, quantity, units, inputSignificant(units !== 'SI'));

/** "Span (ft)" — a column or axis title with its display unit. */
export function titleWithUnit(title: string, quantity: Quantity, units: UnitSystem): string {
  return `${title} (${unitLabel(quantity, units)})`;
}

/** Factor of safety text (dimensionless), a result by the precision rule. */
export const fsText = (fs: number | null | undefined): string => numberText(fs);

/** Which display quantity a trace unit belongs to (null: show as traced only). */
export function quantityOfUnit(unit: string, path = ''): Quantity | null {
  // A bolt's forces (support.bolts.*) show in kips in US units; specimen loads in lbf.
  if (path.startsWith('support.') && unit.replace(/\s+/g, '') === 'kN') return 'boltForce';
  switch (unit.replace(/\s+/g, '')) {
    case 'm': return 'length';
    case 'mm': return 'smallLength';
    case 'MPa': return 'stress';
    case 'kPa': return 'pressure';
    case 'GPa': return 'modulus';
    case 'kN/m^3': case 'kN/m³': return 'unitWeight';
    case 'kN': return 'force';
    default: return null;
  }
}
