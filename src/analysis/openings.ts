/**
 * The batch check of many openings under one strata column: each row of an openings table
 * (src/model/openings-csv.ts) replaces the project's opening and, where given, its loads; the
 * result is validated as a project file would be (same bounds, same messages) and analysed.
 * The shape of checking every room, drift and overhang of a panel plan.
 *
 *     const result = checkOpening(strata, { row: 2, name: 'Room 1', type: 'beam', span_m: 6, … });
 *     // { ok: true, result: { row: 2, name: 'Room 1', status: 'below', governing: {…}, maxSpan_m: 4.2, … } }
 */
import type { OpeningInput } from '../model/openings-csv';
import type { Loads, Mode, Opening, Project, Support } from '../model/types';
import { parseProject, ProjectError, type FieldIssue } from '../model/validate';
import { analyse, meetsTargets } from './analyse';

export interface OpeningResult {
  row: number;
  name: string;
  opening: Opening;
  loads: Loads;
  support: Support;
  /** "meets" every target, "below" one, or "n/a" when no check applies (no net load). */
  status: 'meets' | 'below' | 'n/a';
  governing: { layerIndex: number; layer: string; mode: Mode; fs: number; target: number } | null;
  /** Largest span meeting every target (m), all else fixed; null where none is found. */
  maxSpan_m: number | null;
  /** Warnings of this opening's analysis and of its opening and loads fields. */
  warnings: string[];
}

export type OpeningCheck = { ok: true; result: OpeningResult } | { ok: false; issues: FieldIssue[] };

/** The project of one opening: the strata file with this row's opening and loads. */
export function openingProject(strata: Project, input: OpeningInput): Project {
  return {
    ...strata,
    opening: {
      type: input.type,
      span_m: input.span_m,
      length_m: input.type === 'slab' || input.type === 'intersection' ? input.length_m : null,
      ends: input.ends ?? (input.type === 'intersection' ? 'simple' : strata.opening.ends),
      edges: null,
    },
    loads: {
      surcharge_kPa: input.surcharge_kPa ?? strata.loads.surcharge_kPa,
      horizontalStress_MPa: input.horizontalStress_MPa ?? strata.loads.horizontalStress_MPa,
    },
    support: { standing_kPa: input.support_kPa ?? strata.support.standing_kPa },
  };
}

const ROW_FIELDS = /^(opening|loads|support)(\.|$)/;

/** Validate and analyse one opening. Refusals keep the validator's field paths. */
export function checkOpening(strata: Project, input: OpeningInput): OpeningCheck {
  let project: Project;
  let warnings: FieldIssue[];
  try {
    ({ project, warnings } = parseProject(openingProject(strata, input)));
  } catch (e) {
    if (e instanceof ProjectError) return { ok: false, issues: e.issues };
    throw e;
  }
  const analysis = analyse(project);
  const report = analysis.report;
  const g = report.governing;
  const governing = g === null ? null : { layerIndex: g.layerIndex, layer: g.layer, mode: g.mode, fs: g.fs, target: g.target };
  return {
    ok: true,
    result: {
      row: input.row,
      name: input.name,
      opening: project.opening,
      loads: project.loads,
      support: project.support,
      status: g === null ? 'n/a' : meetsTargets(project, report) ? 'meets' : 'below',
      governing,
      maxSpan_m: report.maxSpan_m?.governing ?? null,
      warnings: [
        ...warnings.filter((w) => ROW_FIELDS.test(w.path)).map((w) => (w.message.startsWith(w.path) ? w.message : `${w.path}: ${w.message}`)),
        ...report.warnings.filter((w) => w.level === 'error').map((w) => `${w.path ? `${w.path}: ` : ''}${w.message}`),
      ],
    },
  };
}
