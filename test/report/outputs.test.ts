import { describe, expect, it } from 'vitest';
import { csvParse } from 'd3';
import { CAUTION } from '../../src/model/caution';
import { toDisplay } from '../../src/model/units';
import { buildReportDocument } from '../../src/report/report-document';
import { renderMarkdown } from '../../src/report/render-markdown';
import { escapeHtml, renderHtml, renderHtmlBody, REPORT_CSS } from '../../src/report/render-html';
import { resultsCsv, spanCurveCsv } from '../../src/report/results-csv';
import { MODES, modeLabel } from '../../src/analysis/check-labels';
import { expectClose } from '../helpers/expect-close';
import { HOSTILE, allCases, hostileCase, presetCase, type Case } from './fixtures';

const UNITS = ['SI', 'US'] as const;

function outputs(c: Case, units: 'SI' | 'US') {
  const doc = buildReportDocument({ project: c.project, analysis: c.analysis, curve: c.curve, projectText: c.projectText, units, version: '0.1.0', date: '2026-12-01' });
  return {
    doc,
    md: renderMarkdown(doc),
    html: renderHtml(doc),
    csv: resultsCsv(c.analysis, units, c.project),
    span: spanCurveCsv(c.curve, units),
  };
}

/** Text of an HTML string with tags removed and the five escapes undone. */
const htmlText = (html: string): string =>
  html.replace(/<style>[\s\S]*?<\/style>/g, '').replace(/<[^>]*>/g, ' ')
    .replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&amp;/g, '&');

describe('every output', () => {
  it('contains no "NaN", "Infinity" or "undefined" (SI and US, all presets and variants)', () => {
    for (const c of allCases()) {
      for (const units of UNITS) {
        const o = outputs(c, units);
        for (const [kind, text] of Object.entries({ md: o.md, html: o.html, csv: o.csv, span: o.span })) {
          expect(text, `${c.name} ${units} ${kind}`).not.toMatch(/NaN|Infinity|undefined|\[object Object\]/);
        }
      }
    }
  }, 60_000);
  it('the Markdown and the HTML carry the caution at the top and again at the end', () => {
    for (const c of allCases()) {
      const { md, html } = outputs(c, 'SI');
      expect(md.split(CAUTION).length - 1).toBe(2);
      const text = htmlText(html);
      expect(text.split(CAUTION).length - 1).toBe(2);
      expect(md.indexOf(CAUTION)).toBeLessThan(md.indexOf('## Verdict'));
      expect(md.lastIndexOf(CAUTION)).toBeGreaterThan(md.indexOf('## Appendix B'));
    }
  });
  it('the Markdown and the HTML name each layer and each mode, and the sections appear in order', () => {
    const titles = ['Verdict', 'Inputs', 'Checks', 'Key charts', 'Warnings', 'Appendix A — Layer results, lab tests and strength chain', 'Appendix B — Calculation trace', 'Appendix C — Methods: assumptions and limits', 'End of report'];
    for (const c of allCases().filter((x) => x.name !== 'hostile')) {
      const { md, html } = outputs(c, 'SI');
      const text = htmlText(html);
      for (const layer of c.project.layers) {
        expect(md).toContain(layer.name);
        expect(text).toContain(layer.name);
      }
      for (const m of MODES) {
        expect(md).toContain(modeLabel(m, c.project.opening.type));
        expect(text).toContain(modeLabel(m, c.project.opening.type));
      }
      const mdAt = titles.map((t) => md.indexOf(`## ${t}`));
      const htmlAt = titles.map((t) => html.indexOf(`>${t}</h2>`));
      expect(mdAt.every((x) => x >= 0)).toBe(true);
      expect([...mdAt].sort((a, b) => a - b)).toEqual(mdAt);
      expect(htmlAt.every((x) => x >= 0)).toBe(true);
      expect([...htmlAt].sort((a, b) => a - b)).toEqual(htmlAt);
    }
  });
});

describe('renderHtml', () => {
  it(`escapes user text: a layer named ${HOSTILE} appears as text, never as a tag`, () => {
    const c = hostileCase();
    for (const units of UNITS) {
      const { html, md } = outputs(c, units);
      expect(html).not.toMatch(/<img/i);
      expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
      expect(htmlText(html)).toContain(HOSTILE);
      expect(md).not.toMatch(/<img/i);
      expect(md).toContain('&lt;img src=x onerror=alert(1)&gt;');
    }
  });
  it('is self-contained: no scripts, no links, no external URLs; print CSS with @page and page breaks', () => {
    for (const c of allCases()) {
      const { html } = outputs(c, 'SI');
      expect(html.startsWith('<!doctype html>')).toBe(true);
      expect(html).not.toMatch(/<script|<link|<iframe|<img|@import|url\((?!#)/i);
      expect(html).not.toMatch(/(src|href)\s*=\s*["']?(https?:)?\/\//i);
      expect(html).toMatch(/@page \{ size: A4 portrait;/);
      expect(html).toContain('break-before: page');
      expect(html).toContain('<svg');
    }
  });
  it('the embedded charts follow the unit system: their axes say (ft) in US units and (m) in SI', () => {
    const c = presetCase('coal-room-shale');
    const svgs = (html: string) => (html.match(/<svg[\s\S]*?<\/svg>/g) ?? []).join('\n');
    const us = svgs(outputs(c, 'US').html);
    const si = svgs(outputs(c, 'SI').html);
    expect(us).toContain('(ft)');
    expect(si).toContain('(m)');
    expect(si).not.toContain('(ft)');
  });
  it('renders Letter paper on request and refuses other sizes', () => {
    const { doc } = outputs(presetCase('drift-limestone'), 'SI');
    expect(renderHtml(doc, { paper: 'Letter' })).toContain('size: Letter portrait');
    expect(() => renderHtml(doc, { paper: 'A3' as 'A4' })).toThrow(RangeError);
  });
  it('renderHtmlBody is the <article> of the full page, and REPORT_CSS is scoped to .lamina-report', () => {
    const { doc, html } = outputs(presetCase('drift-limestone'), 'SI');
    const body = renderHtmlBody(doc);
    expect(body.startsWith('<article class="lamina-report"')).toBe(true);
    expect(html).toContain(body);
    const selectors = REPORT_CSS.replace(/@media print \{|\n\}/g, '').match(/^[^{}@]+(?=\{)/gm) ?? [];
    expect(selectors.length).toBeGreaterThan(10);
    for (const s of selectors) for (const part of s.split(',')) expect(part.trim().startsWith('.lamina-report')).toBe(true);
  });
  it('escapeHtml escapes & < > " and \'', () => {
    expect(escapeHtml(`a & <b> "c" 'd'`)).toBe('a &amp; &lt;b&gt; &quot;c&quot; &#39;d&#39;');
  });
});

describe('resultsCsv', () => {
  it('parses back with d3-dsv csvParse to the report numbers: one row per layer × mode, SI', () => {
    for (const c of allCases()) {
      const rows = csvParse(resultsCsv(c.analysis, 'SI', c.project));
      expect(rows.columns).toContain('demand_MPa');
      expect(rows.length).toBe(c.analysis.report.layers.length * MODES.length);
      c.analysis.report.layers.forEach((layer, i) => {
        const get = (mode: string) => rows.find((r) => r.layer === String(i + 1) && r.mode === mode);
        const tension = get('tension');
        expect(tension?.layer_name).toBe(layer.name);
        const demand = layer.plate ? layer.plate.maxTension_MPa : layer.elastic.maxTension_MPa;
        expect(Number(tension?.demand_MPa)).toBe(demand);
        expect(Number(tension?.capacity_MPa)).toBe(layer.strength.design_MPa);
        expect(tension?.fs === '' ? null : Number(tension?.fs)).toBe(layer.elastic.fsTension);
        expect(Number(tension?.target)).toBe(c.project.design.fsTarget.tension);
        const crushing = get('crushing');
        const v = layer.voussoir;
        expect(crushing?.fs === '' ? null : Number(crushing?.fs)).toBe(v ? v.fsCrushing : null);
        // demand fc + σh (METHODS §3a)
        const sh = Math.max(0, c.project.loads.horizontalStress_MPa);
        if (v && v.maxCompression_MPa !== null) expectClose(Number(crushing?.demand_MPa), v.maxCompression_MPa + sh, 1e-12);
        else expect(crushing?.demand_MPa).toBe('');
        expect(get('sliding')?.fs === '' ? null : Number(get('sliding')?.fs)).toBe(v ? v.fsSliding : null);
        expect(get('deflection')?.demand_ratio === '' ? null : Number(get('deflection')?.demand_ratio)).toBe(v ? v.deflectionRatio : null);
      });
      const g = c.analysis.report.governing;
      const flagged = rows.filter((r) => r.governing === 'yes');
      if (g) expect(flagged.map((r) => [r.layer_name, r.mode])).toEqual([[g.layer, g.mode]]);
    }
  });
  it('in US units stresses are in psi (1 MPa = 145.04 psi, METHODS §10) and the column names say so', () => {
    const c = presetCase('coal-room-shale');
    const rows = csvParse(resultsCsv(c.analysis, 'US', c.project));
    expect(rows.columns).toContain('demand_psi');
    const layer = c.analysis.report.layers[0];
    if (!layer) throw new Error('no layer');
    const tension = rows.find((r) => r.layer === '1' && r.mode === 'tension');
    expectClose(Number(tension?.demand_psi), layer.elastic.maxTension_MPa * 145.0377, 1e-6);
    expectClose(Number(tension?.demand_psi), toDisplay(layer.elastic.maxTension_MPa, 'stress', 'US'), 1e-12);
  });
  it('quotes user text so that a name with commas, quotes and newlines parses back unchanged', () => {
    const c = hostileCase();
    const name = 'Shale, "grey"\nlaminated';
    const report = {
      ...c.analysis.report,
      layers: c.analysis.report.layers.map((l, i) => (i === 0 ? { ...l, name } : l)),
      checks: c.analysis.report.checks.map((r) => (r.layerIndex === 0 ? { ...r, layer: name } : r)),
    };
    const rows = csvParse(resultsCsv({ ...c.analysis, report }, 'SI', c.project));
    expect(rows[0]?.layer_name).toBe(name);
  });
});

describe('spanCurveCsv', () => {
  it('parses back to the curve: span in m or ft and FS per mode, empty where null', () => {
    for (const c of allCases()) {
      for (const units of UNITS) {
        const rows = csvParse(spanCurveCsv(c.curve, units));
        const span = units === 'SI' ? 'span_m' : 'span_ft';
        expect(rows.length).toBe(c.curve.spans_m.length);
        rows.forEach((r, i) => {
          expectClose(Number(r[span]), toDisplay(c.curve.spans_m[i] as number, 'length', units), 1e-12);
          for (const m of MODES) {
            const expected = c.curve.fs[m][i] ?? null;
            expect(r[`fs_${m}`] === '' ? null : Number(r[`fs_${m}`])).toBe(expected);
            expect(Number(r[`target_${m}`])).toBe(c.curve.targets[m]);
          }
        });
      }
    }
  });
});
