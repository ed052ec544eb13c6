/** Pure SVG chart builders shared by the app and the report: each returns an SVG string. */
export { strataColumnSvg, type StrataColumnOptions } from './strata-column';
export { strengthStripSvg, type StrengthStripOptions } from './strength-strip';
export { strengthChainSvg, type StrengthChainOptions } from './strength-chain';
export { beamProfileSvg, type BeamProfileOptions } from './beam-profile';
export { voussoirArchSvg, type VoussoirArchInput, type VoussoirArchOptions } from './voussoir-arch';
export { fsSpanSvg, MODE_STYLE, type FsSpanOptions } from './fs-span';
export { slabContourSvg, type SlabContourOptions } from './slab-contour';
export { designChartSvg, type DesignChartOptions } from './design-chart';
export { escapeXml, PALETTE } from './svg';
export { fsHistogramSvg, type FsHistogramOptions } from './fs-histogram';
export { sensitivitySvg } from './sensitivity';
export { searchCurveSvg, type SearchCurveOptions } from './search-curve';
export { pfSpanSvg, type PfSpanOptions } from './pf-span';
