/**
 * The Lamina library (package entry `lamina`, built to dist-node/index.js): read and validate
 * a project, analyse it, find spans and thicknesses, check a table of openings. Plain SI
 * numbers in, the `lamina-report/1` report out; no I/O, no mathjs.
 *
 *     import { readProjectText, analyseProject, meetsTargets } from 'lamina';
 *     const { project } = readProjectText(fs.readFileSync('roof.lamina.json', 'utf8'));
 *     const report = analyseProject(project);
 *     console.log(report.governing, meetsTargets(project, report));
 *
 * The calculation report (Markdown, HTML, CSV) is the separate entry `lamina/report`.
 */
export { analyse, analyseProject, meetsTargets, spanCurve, minimumThickness, designChart, beamProfile, slabField } from './analysis';
export type * from './analysis/types';
export { checkOpening, openingProject, type OpeningCheck, type OpeningResult } from './analysis/openings';
export type * from './model/types';
export { parseProject, validateProject, ProjectError, type FieldIssue, type ValidationResult } from './model/validate';
export { readProjectText, writeProjectText, projectHash } from './model/project-file';
export { defaultProject, defaultLayer } from './model/defaults';
export { parseSpecimensCsv, type SpecimensCsv, type SpecimensCsvError } from './model/specimens-csv';
export { parseOpeningsCsv, MAX_OPENING_ROWS, type OpeningInput, type OpeningsCsv, type OpeningsCsvError } from './model/openings-csv';
export { formatQuantity, toDisplay, fromDisplay, unitLabel, type Quantity, type UnitSystem } from './model/units';
export { CAUTION } from './model/caution';
