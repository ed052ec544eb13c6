/**
 * Number text for the report: the one precision rule of `src/model/number-format.ts`
 * (results to 3 significant figures, the trace to 6, "×10ⁿ" for very small or large
 * magnitudes, the true minus sign, "—" for a missing value), re-exported for the report's
 * modules.
 *
 *     numberText(1.25e6)        // "1.25×10⁶"
 *     numberText(0.40404)       // "0.404"
 *     numberText(-2.5)          // "−2.5"
 */
export { MISSING, PRECISION, numberText, superscript } from '../model/number-format';
