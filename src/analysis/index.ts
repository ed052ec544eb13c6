/** The analysis layer: orchestrates the kernels into the report, traces and chart data. */
export { analyse, analyseProject, meetsTargets } from './analyse';
export { spanCurve } from './span-curve';
export { beamProfile } from './profile';
export { designChart } from './design-chart';
export { slabField } from './slab-field';
export { minimumThickness } from './thickness';
export type * from './types';
