/** Pure numerical kernels in SI units, one method per module. */
export { elasticBeam, beamStateAt, beamCoefficients, type BeamEnds, type BeamInput, type BeamResult } from './beam';
export { groupLayers, shareLoads, loadOnLowest, type BedStiffness, type SharedLoads } from './layering';
export { solveVoussoir, leverArmAt, type VoussoirInput, type VoussoirResult } from './voussoir';
export { solveVoussoirSweep, leverArmByIteration } from './voussoir-sweep';
export { largestPassingSpan, smallestPassingValue, type SpanSearchOptions, type ValueSearchOptions } from './span-search';
export { plateCoefficients, clearPlateCache, plateAtLevel, type PlateInput, type PlateCoefficients, type PlateEdges, type EdgeSupport } from './plate';
export { boltAnchorage, layerTops, DEFAULT_ANCHORAGE_M, type BoltAnchorage, type Anchored, type AnchorAtInterface, type BeyondStrata } from './bolt-anchorage';
export { boltSuspension, suspendedLoads, type SuspensionInput, type SuspensionResult, type SuspendedLayer, type SuspendedLoads, type SuspendedLoadsInput } from './suspension';
export { skinCheck, type SkinInput, type SkinResult } from './skin';
export { compositeBeam, type CompositeInput, type CompositeLayer, type CompositeResult, type BondedLayer, type UnbondedLayer, type InterfaceShear, type FibrePair } from './composite-beam';
export { interlayerShearCheck, DEFAULT_SHEAR_FRACTION, type InterlayerShearInput, type InterlayerShearResult } from './interlayer-shear';
export { smallestStandingPressure, largestSquareSpacing, shortestBoltLength, type PressureSearchOptions, type SpacingSearchOptions, type LengthSearchOptions } from './support-search';
