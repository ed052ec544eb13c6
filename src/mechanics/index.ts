/** Pure numerical kernels in SI units, one method per module. */
export { elasticBeam, beamStateAt, beamCoefficients, type BeamEnds, type BeamInput, type BeamResult } from './beam';
export { groupLayers, shareLoads, loadOnLowest, type BedStiffness, type SharedLoads } from './layering';
export { solveVoussoir, leverArmAt, type VoussoirInput, type VoussoirResult } from './voussoir';
export { solveVoussoirSweep, leverArmByIteration } from './voussoir-sweep';
export { largestPassingSpan, smallestPassingValue, type SpanSearchOptions, type ValueSearchOptions } from './span-search';
export { plateCoefficients, clearPlateCache, plateAtLevel, type PlateInput, type PlateCoefficients, type PlateEdges, type EdgeSupport } from './plate';
