/**
 * One calculation-trace entry as a printable block: the formula rendered from the traced mathjs
 * expression, the same expression with the values substituted, each value with its unit, the
 * result (and, in US units, its display equivalent) and the source.
 */
import type { TraceEntry } from '../model/types';
import type { UnitSystem } from '../model/units';
import type { FormulaBlock } from './document-types';
import { quantityOfUnit, quantityText } from './format';
import { formulaSymbols, formulaText, substitutedText } from './formula-text';
import { PRECISION, numberText } from './number-text';
import { symbolText } from './symbol-text';
import { withUnit } from './unit-text';

export function traceBlock(entry: TraceEntry, units: UnitSystem): FormulaBlock {
  let formula: string;
  let substituted: string;
  let order: string[];
  try {
    formula = formulaText(entry.formula);
    substituted = substitutedText(entry.formula, entry.values);
    order = formulaSymbols(entry.formula);
  } catch {
    // An expression the parser refuses is shown as traced rather than dropped.
    formula = entry.formula;
    substituted = entry.formula;
    order = [];
  }
  const names = [...order.filter((n) => n in entry.values), ...Object.keys(entry.values).filter((n) => !order.includes(n))];
  const values = names.map((n) => {
    const v = entry.values[n] as { value: number; unit: string };
    return `${symbolText(n)} = ${withUnit(numberText(v.value, PRECISION.trace), v.unit)}`;
  });
  let result = withUnit(numberText(entry.result, PRECISION.trace), entry.unit);
  const quantity = quantityOfUnit(entry.unit, entry.path);
  if (units === 'US' && quantity !== null) result += ` (= ${quantityText(entry.result, quantity, 'US')})`;
  const block: FormulaBlock = {
    kind: 'formula',
    path: entry.path,
    label: entry.label,
    expression: entry.formula,
    formula,
    substituted,
    values,
    result,
    resultValue: entry.result,
    unit: entry.unit,
    source: entry.source,
  };
  if (entry.note) block.note = entry.note;
  return block;
}
