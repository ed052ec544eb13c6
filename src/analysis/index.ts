/** The analysis layer: orchestrates the kernels into the report, the check table, the verdict, traces and chart data. */
export { analyse, analyseProject, analyseWithSupportNeeded, meetsTargets } from './analyse';
export { supportNeeded, supportPasses, NO_SUPPORT_NEEDED } from './support-needed';
export { spanCurve } from './span-curve';
export { beamProfile } from './profile';
export { designChart } from './design-chart';
export { slabField } from './slab-field';
export { minimumThickness } from './thickness';
export { buildVerdict, layerPhrase, spanWordOf, type Verdict, type VerdictSentence } from './verdict';
export { MODES, VOUSSOIR_MODES, MODE_LABEL, MODE_NAME, MODE_SHORT, STATUS_TEXT, STATUS_WORD, STATUS_SYMBOL, STATUS_LEGEND, statusDescription, WHOLE_ROOF } from './check-labels';
export { targetFor, REASONS, allCountedMeet } from './check-table';
export { acceptablePfMet, probabilityRow, withProbabilityRow, withUncertainty } from './probability-row';
export type * from './types';
