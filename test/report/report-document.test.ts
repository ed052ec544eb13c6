import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/model/caution';
import { toDisplay } from '../../src/model/units';
import { buildReportDocument } from '../../src/report/report-document';
import type { Cell, FormulaBlock, ReportDocument, TableBlock } from '../../src/report/document-types';
import { numberText } from '../../src/report/number-text';
import { withUnit } from '../../src/report/unit-text';
import { orderedTrace, traceGroup } from '../../src/report/sections/trace';
import { expectClose } from '../helpers/expect-close';
import { allCases, jointedCase, presetCase, slabCase, valueAt, type Case } from './fixtures';

const build = (c: Case, units: 'SI' | 'US' = 'SI'): ReportDocument =>
  buildReportDocument({ project: c.project, analysis: c.analysis, curve: c.curve, projectText: c.projectText, units, version: '0.1.0', date: '2026-12-01' });

const tables = (doc: ReportDocument, caption: string | RegExp): TableBlock[] =>
  doc.sections.flatMap((s) => s.blocks).filter((b): b is TableBlock => b.kind === 'table' && (typeof caption === 'string' ? b.caption === caption : caption.test(b.caption)));

/** The check table's rows of layer i, without the layer column (Mode, Demand, Capacity, FS, Target, Status, Counts). */
const layerChecks = (doc: ReportDocument, i: number): TableBlock => {
  const [t] = tables(doc, /^Check table/);
  if (!t) throw new Error('no check table');
  return { ...t, columns: t.columns.slice(1), rows: t.rows.filter((r) => r[0]?.text.startsWith(`${i + 1} `)).map((r) => r.slice(1)) };
};

const section = (doc: ReportDocument, id: string) => {
  const s = doc.sections.find((x) => x.id === id);
  if (!s) throw new Error(`no section ${id}`);
  return s;
};

describe('buildReportDocument — structure', () => {
  it('the summary (header, verdict, inputs, checks, key charts, warnings), then the appendix (strength, trace, methods), then the closing caution', () => {
    for (const c of allCases()) {
      const doc = build(c);
      expect(doc.sections.map((s) => s.id)).toEqual(['header', 'verdict', 'inputs', 'checks', 'charts', 'warnings', 'strength', 'trace', 'assumptions', 'closing']);
      expect(doc.sections.filter((s) => s.appendix).map((s) => s.id)).toEqual(['strength', 'trace', 'assumptions']);
    }
  });
  it('an overhang (quarry bench): the summary says overhang, never span or abutment (an overhang has one root and no arch)', () => {
    const c = presetCase('quarry-bench-overhang');
    const doc = buildReportDocument({ project: c.project, analysis: c.analysis, curve: c.curve, units: 'SI', trace: false });
    const text = JSON.stringify(doc.sections.map((s) => s.blocks.map((b) => (b.kind === 'chart' ? [b.title, b.caption ?? ''] : b))));
    expect(text).toContain('overhang');
    expect([...text.matchAll(/.{0,40}\b(spans?|abutments?)\b.{0,20}/gi)].map((m) => m[0])).toEqual([]);
  });
  it('trace: false leaves the appendix out and keeps the summary and both cautions', () => {
    for (const c of allCases()) {
      const doc = buildReportDocument({ project: c.project, analysis: c.analysis, curve: c.curve, units: 'SI', trace: false });
      expect(doc.sections.map((s) => s.id)).toEqual(['header', 'verdict', 'inputs', 'checks', 'charts', 'warnings', 'closing']);
      expect(doc.meta.appendix).toBe(false);
      expect(doc.sections.flatMap((s) => s.blocks).filter((b) => b.kind === 'formula')).toEqual([]);
      expect(JSON.stringify(doc.sections[0])).toContain('Summary only');
      expect(doc.sections.at(-1)?.blocks.at(-1)).toMatchObject({ kind: 'callout', tone: 'caution', text: CAUTION });
    }
  });
  it('the caution (src/model/caution) is the first block of the report and the last', () => {
    for (const c of allCases()) {
      const doc = build(c);
      const first = doc.sections[0]?.blocks[0];
      const last = doc.sections.at(-1)?.blocks.at(-1);
      expect(first).toMatchObject({ kind: 'callout', tone: 'caution', text: CAUTION });
      expect(last).toMatchObject({ kind: 'callout', tone: 'caution', text: CAUTION });
    }
  });
  it('the header carries date, version, units and the FNV-1a hash of the given project text', async () => {
    const { projectHash } = await import('../../src/model/project-file');
    const c = presetCase('coal-room-shale');
    const doc = build(c, 'US');
    expect(doc.meta).toEqual({ date: '2026-12-01', version: '0.1.0', hash: projectHash(c.projectText as string), units: 'US', appendix: true });
    const kv = section(doc, 'header').blocks.find((b) => b.kind === 'keyValue');
    expect(JSON.stringify(kv)).toContain(projectHash(c.projectText as string));
  });
  it('without project text the hash is that of writeProjectText(project)', async () => {
    const { projectHash, writeProjectText } = await import('../../src/model/project-file');
    const c = presetCase('drift-limestone');
    const doc = buildReportDocument({ project: c.project, analysis: c.analysis, units: 'SI' });
    expect(doc.meta.hash).toBe(projectHash(writeProjectText(c.project)));
    expect(doc.meta.date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });
  it('refuses an unknown unit system', () => {
    const c = presetCase('drift-limestone');
    expect(() => buildReportDocument({ project: c.project, analysis: c.analysis, units: 'metric' as 'SI' })).toThrow(RangeError);
  });
});

describe('buildReportDocument — the trace', () => {
  it('the trace section has one formula block per report.trace entry, grouped by layer in analysis order, showing the traced result', () => {
    for (const c of allCases()) {
      const blocks = section(build(c), 'trace').blocks.filter((b): b is FormulaBlock => b.kind === 'formula');
      const trace = orderedTrace(c.analysis.report.trace);
      expect(blocks.length).toBe(c.analysis.report.trace.length);
      expect(new Set(trace)).toEqual(new Set(c.analysis.report.trace));
      const groups = trace.map(traceGroup);
      expect([...groups].sort((a, b) => a - b)).toEqual(groups);
      blocks.forEach((b, i) => {
        const entry = trace[i];
        if (!entry) throw new Error('missing entry');
        expect(b.path).toBe(entry.path);
        expect(b.resultValue).toBe(entry.result);
        expect(b.result.startsWith(withUnit(numberText(entry.result, 6), entry.unit))).toBe(true);
        expect(b.source).toBe(entry.source);
        for (const [name, v] of Object.entries(entry.values)) {
          expect(b.values.some((t) => t.endsWith(`= ${withUnit(numberText(v.value, 6), v.unit)}`)), `${entry.path}: ${name}`).toBe(true);
        }
      });
    }
  });
  it('every traced value that names a numeric report (or detail.*: analysis) field equals that field (trace cannot drift)', () => {
    let compared = 0;
    for (const c of allCases()) {
      for (const entry of c.analysis.report.trace) {
        const v = entry.path.startsWith('detail.') ? valueAt(c.analysis, entry.path.slice('detail.'.length)) : valueAt(c.analysis.report, entry.path);
        if (typeof v !== 'number') continue;
        expectClose(entry.result, v, 1e-9);
        compared += 1;
      }
    }
    expect(compared).toBeGreaterThan(300);
  });
  it('no trace entry appears twice: every entry once, in the trace appendix; none in the summary', () => {
    for (const c of allCases()) {
      const doc = build(c);
      const formulas = doc.sections.flatMap((sec) => sec.blocks.filter((b): b is FormulaBlock => b.kind === 'formula').map((b) => ({ sec: sec.id, path: b.path })));
      expect(formulas.every((f) => f.sec === 'trace')).toBe(true);
      const paths = formulas.map((f) => f.path);
      expect(new Set(paths).size).toBe(paths.length);
      expect(paths.length).toBe(c.analysis.report.trace.length);
    }
  });
  it('the recorded iterations print with their entry: the n search table and its chart, the lever-arm steps, the group tests', () => {
    const doc = build(presetCase('coal-room-shale'));
    const blocks = section(doc, 'trace').blocks;
    const at = blocks.findIndex((b) => b.kind === 'formula' && b.path === 'layers[0].voussoir.n');
    expect(blocks[at + 1]).toMatchObject({ kind: 'table' });
    expect((blocks[at + 1] as TableBlock).caption).toMatch(/^Search for the equilibrium n/);
    expect(blocks[at + 2]).toMatchObject({ kind: 'chart', title: 'fc(n) with its minimum' });
    const z = blocks.findIndex((b) => b.kind === 'formula' && b.path === 'layers[0].voussoir.leverArm_m');
    expect((blocks[z + 1] as TableBlock).caption).toMatch(/^Lever-arm iteration/);
    const g = blocks.findIndex((b) => b.kind === 'formula' && b.path === 'detail.grouping[0].with_kPa');
    expect((blocks[g + 1] as TableBlock).caption).toMatch(/^Bending groups/);
  });
});

function cellValue(table: TableBlock, rowLabel: RegExp, column: number): Cell {
  const row = table.rows.find((r) => rowLabel.test(r[0]?.text ?? ''));
  if (!row || !row[column]) throw new Error(`no row ${rowLabel} in ${table.caption}`);
  return row[column] as Cell;
}

describe('buildReportDocument — checks', () => {
  it('the check table of each layer shows the report values: demand, capacity and FS of every mode', () => {
    for (const c of allCases()) {
      const doc = build(c);
      c.analysis.report.layers.forEach((layer, i) => {
        const t = layerChecks(doc, i);
        if (!t) throw new Error('no table');
        expect(t.rows.length).toBe(5);
        const tension = layer.plate ? layer.plate.maxTension_MPa : layer.elastic.maxTension_MPa;
        expect(cellValue(t, /^tension/, 1).value).toBe(tension);
        expect(cellValue(t, /^tension/, 2).value).toBe(layer.strength.design_MPa);
        expect(cellValue(t, /^tension/, 3).value).toBe(layer.elastic.fsTension);
        const v = layer.voussoir;
        const sh = Math.max(0, c.project.loads.horizontalStress_MPa);
        const demand = cellValue(t, /^crushing/, 1).value;
        if (v && v.maxCompression_MPa !== null) expectClose(demand as number, v.maxCompression_MPa + sh, 1e-12); // fc + σh (METHODS §3a)
        else expect(demand).toBe(null);
        expect(cellValue(t, /^crushing/, 3).value).toBe(v ? v.fsCrushing : null);
        expect(cellValue(t, /sliding \(voussoir/, 3).value).toBe(v ? v.fsSliding : null);
        expect(cellValue(t, /deflection δ\/t/, 1).value).toBe(v ? v.deflectionRatio : null);
        expect(cellValue(t, /^snap-through/, 3).value).toBe(v === null ? null : v.snapThrough ? 0 : 1);
      });
    }
  });
  it('coal-room shale: abutment tension q·s²/(2t²) = 12.5 kPa·(6 m)²/(2·(0.5 m)²) = 0.9 MPa (hand calculation, Obert & Duvall 1967)', () => {
    // The shale (γ = 25 kN/m³, t = 0.5 m) separates from the stiff sandstone above, so it
    // carries its own weight q = γt = 12.5 kPa; clamped ends, s = 6 m.
    const doc = build(presetCase('coal-room-shale'));
    const t = layerChecks(doc, 0);
    if (!t) throw new Error('no table');
    const demand = cellValue(t, /^tension/, 1);
    expectClose(demand.value as number, 0.9, 1e-9);
    expect(demand.text).toBe('0.9 MPa');
  });
  it('in US units the same cells show psi (1 MPa = 145.04 psi, METHODS §10) while keeping the SI value', () => {
    const c = presetCase('coal-room-shale');
    const t = layerChecks(build(c, 'US'), 0);
    if (!t) throw new Error('no table');
    const demand = cellValue(t, /^tension/, 1);
    expect(demand.text).toBe(`${numberText(0.9 * 145.0377)} psi`);
    expect(demand.value).toBe(c.analysis.report.layers[0]?.elastic.maxTension_MPa);
  });
  it('the governing row is flagged and the verdict names its layer and FS', () => {
    for (const c of allCases()) {
      const doc = build(c);
      const g = c.analysis.report.governing;
      if (!g) continue;
      const verdict = section(doc, 'verdict').blocks[0];
      expect(verdict?.kind).toBe('paragraph');
      const text = verdict && verdict.kind === 'paragraph' ? verdict.text : '';
      expect(text).toContain(g.layer);
      if (g.mode !== 'snapThrough') expect(text).toContain(numberText(g.fs, 3));
      const flagged = tables(doc, /^Check table/).flatMap((t) => t.rows).filter((r) => /\(governing\)$/.test(r[1]?.text ?? ''));
      expect(flagged.length).toBe(1);
    }
  });
  it('coal room (DESIGN.md): the report says the intact beam would crack AND how the cracked voussoir fares', () => {
    const doc = build(presetCase('coal-room-shale'));
    const text = section(doc, 'verdict').blocks.map((b) => (b.kind === 'paragraph' ? b.text : '')).join('\n');
    expect(text).toMatch(/As an intact beam, layer 1 .* would crack/);
    expect(text).toMatch(/As a cracked voussoir beam/);
    expect(text).toMatch(/Design basis “intact”/);
  });
  it('on the jointed basis tension is shown as "info ○" and the basis sentence says the arch checks decide', () => {
    const doc = build(jointedCase());
    const tension = jointedCase().analysis.report.layers.map((_l, i) => cellValue(layerChecks(doc, i), /^tension/, 5));
    expect(tension.every((cell) => cell.text === 'info ○' || cell.text === 'n/a –')).toBe(true);
    const text = section(doc, 'verdict').blocks.map((b) => (b.kind === 'paragraph' ? b.text : '')).join('\n');
    expect(text).toMatch(/Design basis “jointed”.*voussoir checks decide/);
  });
  it('the largest-span table shows report.maxSpan_m per mode in the display unit (1 ft = 0.3048 m, METHODS §13)', () => {
    const c = presetCase('coal-room-shale');
    const spans = c.analysis.report.maxSpan_m;
    if (!spans) throw new Error('no spans');
    const [t] = tables(build(c, 'US'), /^Largest span/);
    if (!t) throw new Error('no table');
    const governing = cellValue(t, /^governing/, 1);
    expect(governing.value).toBe(spans.governing);
    expect(governing.text).toBe(numberText((spans.governing as number) / 0.3048));
    expect(t.columns[1]?.title).toBe('Largest span (ft)');
  });
  it('a slab report has the plate table and the slab contour chart; a curve gives the FS–span chart', () => {
    const doc = build(slabCase());
    expect(tables(doc, /^Rectangular plate/).length).toBe(1);
    const charts = section(doc, 'charts').blocks.filter((b) => b.kind === 'chart').map((b) => (b.kind === 'chart' ? b.title : ''));
    expect(charts.some((t) => t.startsWith('Slab stress contours'))).toBe(true);
    expect(charts).toContain('Factor of safety versus span');
    expect(charts).toContain('Strata column');
  });
  it('every chart block is an SVG and the chart section has no "could not be drawn" notes for the presets', () => {
    for (const c of allCases()) {
      const blocks = section(build(c), 'charts').blocks;
      expect(blocks.filter((b) => b.kind === 'callout')).toEqual([]);
      for (const b of blocks) if (b.kind === 'chart') expect(b.svg.trimStart().startsWith('<svg')).toBe(true);
    }
  });
});

describe('buildReportDocument — inputs and warnings', () => {
  it('the strata table lists every layer with its thickness, and US units convert (1 ft = 0.3048 m)', () => {
    const c = presetCase('drift-limestone');
    const [si] = tables(build(c), 'Strata: geometry and stiffness');
    const [us] = tables(build(c, 'US'), 'Strata: geometry and stiffness');
    if (!si || !us) throw new Error('no table');
    expect(si.columns[2]?.title).toBe('Thickness (m)');
    expect(us.columns[2]?.title).toBe('Thickness (ft)');
    c.project.layers.forEach((l, i) => {
      expect(si.rows[i]?.[1]?.text).toBe(l.name);
      expect(si.rows[i]?.[2]?.value).toBe(l.thickness_m);
      expect(us.rows[i]?.[2]?.text).toBe(numberText(toDisplay(l.thickness_m, 'length', 'US'), 4));
    });
  });
  it('rejected specimens appear with the reason they were not used', () => {
    const c = presetCase('coal-room-shale');
    const [t] = tables(build(c), 'Specimens of layer 1');
    if (!t) throw new Error('no table');
    const rejected = c.analysis.layers[0]?.lab.specimens.filter((s) => !s.accepted) ?? [];
    expect(rejected.length).toBeGreaterThan(0);
    for (const s of rejected) {
      const row = t.rows.find((r) => r[0]?.text === s.id);
      expect(row?.[7]?.text).toBe('no ✗');
      expect(row?.[8]?.text).toContain(s.reason as string);
    }
  });
  it('every warning appears with its code, path and message', () => {
    for (const c of allCases()) {
      const [t] = tables(build(c), 'All warnings');
      const warnings = c.analysis.report.warnings;
      if (warnings.length === 0) continue;
      if (!t) throw new Error('no warnings table');
      expect(t.rows.length).toBe(warnings.length);
      warnings.forEach((w, i) => {
        expect(t.rows[i]?.[1]?.text).toBe(w.code);
        expect(t.rows[i]?.[2]?.text).toBe(w.path || '(whole project)');
        expect(t.rows[i]?.[3]?.text).toBe(w.message);
      });
    }
  });
});
