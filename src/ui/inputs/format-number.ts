/**
 * Text for an input box by the one precision rule (`src/model/number-format.ts`): a value in
 * the unit it is stored in is echoed as stored; a value converted for display (US units of an
 * SI project file) is shown to 4 significant figures.
 *     formatInputNumber(0.45000000001)      // "0.45"
 *     formatInputNumber(8.202099737, true)  // "8.202" (2.5 m shown in feet)
 */
import { fieldText } from '../../model/number-format';

export function formatInputNumber(value: number | null | undefined, converted = false): string {
  return fieldText(value, converted);
}
