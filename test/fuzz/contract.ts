/**
 * The analysis contract the fuzz harness checks on every accepted project (DESIGN.md, report
 * `lamina-report/1`; METHODS §10–§11): analyse() does not throw; no NaN or Infinity anywhere in
 * the report or its details (recursively), and no "NaN"/"Infinity" in any text; every field the
 * report types as a number is a number (JSON would write null otherwise); maxSpan values are in
 * [0, 100] or null, sliding null, governing the least of the others; factors of safety ≥ 0;
 * `governing` names a layer and equals that layer's FS for the mode; the JSON round trip is
 * lossless. Returns the list of violations (empty when the contract holds).
 */
import { analyse, beamProfile, designChart, minimumThickness, slabField, spanCurve } from '../../src/analysis';
import type { Analysis } from '../../src/analysis';
import type { Project, Report } from '../../src/model/types';

/**
 * Paths of every NaN/±Infinity number and every string mentioning NaN or Infinity. Text the
 * user typed (`userText`: names, ids, titles, which may well be "NaN") is taken out of each
 * string before it is checked.
 */
export function nonFinite(value: unknown, path = '', out: string[] = [], userText: readonly string[] = []): string[] {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push(`${path} = ${value}`);
  } else if (typeof value === 'string') {
    let text = value;
    for (const u of userText) if (u) text = text.split(u).join(' ');
    if (/\bNaN\b|\bInfinity\b/.test(text)) out.push(`${path} text "${value.slice(0, 120)}"`);
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => nonFinite(v, `${path}[${i}]`, out, userText));
  } else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) nonFinite(v, path ? `${path}.${k}` : k, out, userText);
  }
  return out;
}

/** Every string of the project the user typed, longest first (so that a name inside another is taken out after it). */
export function userStrings(project: Project): string[] {
  const all = [project.title, project.description ?? '', ...project.layers.flatMap((l) => [l.name, ...l.tensile.specimens.map((s) => s.id)])];
  return [...new Set(all)].filter((x) => /NaN|Infinity/.test(x)).sort((a, b) => b.length - a.length);
}

const isNum = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

/** Contract violations of one report for its project. */
export function reportViolations(project: Project, report: Report): string[] {
  const bad: string[] = [];
  const num = (path: string, v: unknown) => { if (!isNum(v)) bad.push(`${path}: expected a number, got ${String(v)}`); };
  const numOrNull = (path: string, v: unknown) => { if (v !== null && !isNum(v)) bad.push(`${path}: expected a number or null, got ${String(v)}`); };
  const fs = (path: string, v: number | null) => { if (v !== null && !(v >= 0)) bad.push(`${path}: FS must be ≥ 0, got ${v}`); };
  const cantilever = project.opening.type === 'cantilever';
  if (report.layers.length !== project.layers.length) bad.push(`layers: ${report.layers.length} reported for ${project.layers.length}`);
  report.layers.forEach((l, i) => {
    const at = `layers[${i}]`;
    for (const k of ['thickness_m', 'group', 'load_kPa'] as const) num(`${at}.${k}`, l[k]);
    for (const [k, v] of Object.entries(l.strength)) if (k !== 'crossJointed') num(`${at}.strength.${k}`, v);
    if (!(l.strength.design_MPa >= 0)) bad.push(`${at}.strength.design_MPa: negative`);
    const e = l.elastic;
    for (const k of ['abutmentTension_MPa', 'maxTension_MPa', 'deflection_mm', 'bucklingStress_MPa'] as const) num(`${at}.elastic.${k}`, e[k]);
    if (cantilever ? e.midspanTension_MPa !== null : !isNum(e.midspanTension_MPa)) bad.push(`${at}.elastic.midspanTension_MPa: ${e.midspanTension_MPa} for ${project.opening.type}`);
    numOrNull(`${at}.elastic.fsTension`, e.fsTension);
    fs(`${at}.elastic.fsTension`, e.fsTension);
    const v = l.voussoir;
    if (cantilever && v !== null) bad.push(`${at}.voussoir: must be null for a cantilever`);
    if (v) {
      // after snap-through, or on a layer with no net downward load (NO_NET_LOAD), every value is null; otherwise all are numbers
      const values = Object.entries(v).filter(([k]) => k !== 'snapThrough');
      const unloaded = !(l.load_kPa > 0);
      if (v.snapThrough || unloaded) for (const [k, x] of values) { if (x !== null) bad.push(`${at}.voussoir.${k}: not null ${v.snapThrough ? 'after snap-through' : 'without a net load'}`); }
      else for (const [k, x] of values) num(`${at}.voussoir.${k}`, x);
      fs(`${at}.voussoir.fsCrushing`, v.fsCrushing);
      fs(`${at}.voussoir.fsSliding`, v.fsSliding);
    }
    if ((project.opening.type === 'slab') !== (l.plate !== null)) bad.push(`${at}.plate: ${l.plate === null ? 'missing for a slab' : 'given for a non-slab'}`);
    if (l.plate) for (const k of ['maxTension_MPa', 'deflection_mm', 'beta', 'alpha'] as const) num(`${at}.plate.${k}`, l.plate[k]);
  });
  const g = report.governing;
  if (g) {
    num('governing.fs', g.fs);
    fs('governing.fs', g.fs);
    const layer = report.layers[g.layerIndex];
    if (!layer || layer.name !== g.layer) bad.push(`governing.layerIndex: ${g.layerIndex} is not the layer "${g.layer}"`);
    // the governing row is a counted row of the check table with the same FS and target
    const row = report.checks.find((r) => r.layerIndex === g.layerIndex && r.mode === g.mode);
    if (!row) bad.push(`governing: no check row for layer ${g.layerIndex} ${g.mode}`);
    else if (!row.counts || row.fs === null || Math.abs(row.fs - g.fs) > 1e-9 * Math.max(1, Math.abs(g.fs)) || row.target !== g.target) {
      bad.push(`governing: fs ${g.fs} (${g.mode}) does not match its counted row ${JSON.stringify(row)}`);
    }
    if (layer && g.mode === 'tension' && layer.elastic.fsTension !== g.fs) bad.push(`governing: fs ${g.fs} is not layers[${g.layerIndex}].elastic.fsTension`);
  }
  for (const r of report.checks) {
    if (!r.counts && !r.reason) bad.push(`checks: layer ${r.layerIndex} ${r.mode} does not count but gives no reason`);
    if (r.counts && r.reason !== null) bad.push(`checks: layer ${r.layerIndex} ${r.mode} counts but has a reason`);
    numOrNull(`checks[${r.layerIndex}].${r.mode}.fs`, r.fs);
  }
  const m = report.maxSpan_m;
  if (m === null) bad.push('maxSpan_m: null');
  else {
    for (const [k, v] of Object.entries(m)) {
      numOrNull(`maxSpan_m.${k}`, v);
      if (v !== null && !(v >= 0 && v <= 100)) bad.push(`maxSpan_m.${k}: ${v} is outside [0, 100]`);
    }
    if (m.sliding !== null) bad.push('maxSpan_m.sliding: must be null');
    // maxSpan holds only the modes counted at the current span, so governing is the least of them
    const cands = [m.tension, m.crushing, m.snapThrough, m.deflection].filter((x): x is number => x !== null);
    const least = cands.length ? Math.min(...cands) : null;
    if (m.governing !== least) bad.push(`maxSpan_m.governing: ${m.governing}, the least of the modes is ${least}`);
  }
  for (const w of report.warnings) if (typeof w.message !== 'string' || typeof w.path !== 'string') bad.push(`warnings: malformed ${JSON.stringify(w)}`);
  for (const t of report.trace) num(`trace ${t.path}.result`, t.result);
  bad.push(...nonFinite(report, '', [], userStrings(project)).map((x) => `non-finite ${x}`));
  const json = JSON.stringify(report);
  if (json !== JSON.stringify(JSON.parse(json))) bad.push('JSON round trip changed the report');
  return bad;
}

/** Analyse a valid project and check the contract; also the chart data and the thickness search on request. */
export function checkProject(project: Project, withCharts: boolean): { violations: string[]; ms: number; cpuMs: number; analysis: Analysis | null } {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const cpu = () => { const c = process.cpuUsage(c0); return (c.user + c.system) / 1000; };
  let analysis: Analysis;
  try {
    analysis = analyse(project);
  } catch (e) {
    return { violations: [`analyse threw: ${(e as Error).stack ?? String(e)}`], ms: performance.now() - t0, cpuMs: cpu(), analysis: null };
  }
  const ms = performance.now() - t0;
  const cpuMs = cpu();
  const violations = reportViolations(project, analysis.report);
  const typed = userStrings(project);
  violations.push(...nonFinite(analysis.layers, 'detail.layers', [], typed).map((x) => `non-finite ${x}`));
  violations.push(...nonFinite(analysis.groups, 'detail.groups', [], typed).map((x) => `non-finite ${x}`));
  if (withCharts) {
    try {
      violations.push(...nonFinite(spanCurve(project), 'spanCurve').map((x) => `non-finite ${x}`));
      violations.push(...nonFinite(beamProfile(project, analysis, 0), 'beamProfile').map((x) => `non-finite ${x}`));
      violations.push(...nonFinite(slabField(project, analysis, 0), 'slabField').map((x) => `non-finite ${x}`));
      const last = project.layers.length - 1;
      violations.push(...nonFinite(designChart(project, last, { spans_m: [0.01, 1, 100], thicknesses_m: [0.001, 1, 1000] }), 'designChart').map((x) => `non-finite ${x}`));
      const tMin = minimumThickness(project, last);
      if (tMin !== null && !(tMin > 0 && Number.isFinite(tMin))) violations.push(`minimumThickness: ${tMin}`);
    } catch (e) {
      violations.push(`chart data threw: ${(e as Error).stack ?? String(e)}`);
    }
  }
  return { violations, ms, cpuMs, analysis };
}
