/**
 * Report test fixtures: the shipped presets and a few variants made from them (a slab, the
 * jointed design basis, hostile user text), each analysed once with the real analysis.
 */
import { readFileSync } from 'node:fs';
import { analyse, spanCurve } from '../../src/analysis/index';
import type { Analysis, SpanCurve } from '../../src/analysis/types';
import { parseProject } from '../../src/model/validate';
import { readProjectText } from '../../src/model/project-file';
import type { Project } from '../../src/model/types';

export const PRESETS = ['coal-room-shale', 'drift-limestone', 'quarry-bench-overhang'] as const;

export const HOSTILE = '<img src=x onerror=alert(1)>';

export interface Case {
  name: string;
  project: Project;
  projectText?: string;
  analysis: Analysis;
  curve: SpanCurve;
}

function make(name: string, project: Project, projectText?: string): Case {
  const analysis = analyse(project);
  const c: Case = { name, project, analysis, curve: spanCurve(project, { samples: 40 }) };
  if (projectText !== undefined) c.projectText = projectText;
  return c;
}

export function presetText(name: string): string {
  return readFileSync(new URL(`../../presets/${name}.lamina.json`, import.meta.url), 'utf8');
}

export function presetCase(name: string): Case {
  const text = presetText(name);
  return make(name, readProjectText(text).project, text);
}

function variant(base: string, edit: (raw: Record<string, any>) => void): Project {
  const raw = JSON.parse(presetText(base)) as Record<string, any>;
  edit(raw);
  return parseProject(raw).project;
}

/** The coal-room preset as a 6 m × 9 m clamped roof slab. */
export const slabCase = (): Case =>
  make('slab', variant('coal-room-shale', (raw) => { raw.opening = { type: 'slab', span_m: 6, length_m: 9, ends: 'clamped' }; }));

/** The coal-room preset on the "jointed" design basis. */
export const jointedCase = (): Case =>
  make('jointed', variant('coal-room-shale', (raw) => { raw.design = { ...raw.design, basis: 'jointed' }; }));

/** User text that must show as text: a layer name, the title and a specimen id. */
export const hostileCase = (): Case =>
  make('hostile', variant('coal-room-shale', (raw) => {
    raw.title = `Roof ${HOSTILE} & "quotes" | pipes *stars*`;
    raw.layers[0].name = HOSTILE;
    raw.layers[0].tensile.specimens[0].id = HOSTILE;
  }));

let cache: Case[] | null = null;
export function allCases(): Case[] {
  cache ??= [...PRESETS.map(presetCase), slabCase(), jointedCase(), hostileCase()];
  return cache;
}

/** Value at a report path such as `layers[0].elastic.maxTension_MPa` (undefined if absent). */
export function valueAt(root: unknown, path: string): unknown {
  let node: unknown = root;
  for (const part of path.replace(/\[(\d+)\]/g, '.$1').split('.').filter((p) => p)) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string, unknown>)[part];
  }
  return node;
}
