/**
 * An overhang is not a span (the trade's own words; source: common practice). For the
 * quarry-bench-overhang preset (a cantilever) every text Lamina prints — the CLI check, span
 * and support text, the openings table, and the Markdown and HTML report with the whole
 * appendix (layer results, strength chain, calculation trace, methods) — speaks of the
 * overhang, its fixed end (root) and free end, never of a span, abutments or midspan, except
 * inside field paths and JSON keys (span_m, maxSpan_m.governing, abutmentTension_MPa). A beam
 * preset keeps its span, abutment and midspan words.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { run, type Io } from '../../src/cli/main';
import { inOpeningWords, openingWords, SPAN_WORD_PATTERN } from '../../src/model/span-wording';
import { analyse } from '../../src/analysis/analyse';
import { buildReportDocument } from '../../src/report/report-document';
import { renderMarkdown } from '../../src/report/render-markdown';
import { renderHtml } from '../../src/report/render-html';
import { readProjectText } from '../../src/model/project-file';

const OVERHANG = 'presets/quarry-bench-overhang.lamina.json';
const BEAM = 'presets/drift-limestone.lamina.json';

function cli(args: string[], files: Record<string, string> = {}) {
  const out: string[] = [];
  const io: Io = {
    out: (t) => void out.push(t),
    err: () => undefined,
    readFile: (p) => (p in files ? files[p] : readFileSync(p, 'utf8')),
    writeFile: () => undefined,
    readStdin: () => { throw new Error('no standard input in this test'); },
    errIsTty: false,
  };
  return run(args, io).then(() => out.join(''));
}

/**
 * Every span/abutment/midspan word of a text with some context, leaving out what is a name
 * rather than a word: code spans (`maxSpan_m.governing`, `lamina span`) and the command's own
 * name in the heading "Lamina span — …". Field paths and keys (span_m, abutmentTension_MPa)
 * never match the whole-word pattern.
 */
function spanWords(text: string): string[] {
  const shown = text.replace(/`[^`\n]*`/g, ' ').replace(/^Lamina span — /gm, 'Lamina — ');
  return [...shown.matchAll(new RegExp(`.{0,50}${SPAN_WORD_PATTERN.source}.{0,30}`, 'gi'))].map((m) => m[0]);
}

function reportOf(path: string): { md: string; html: string } {
  const text = readFileSync(path, 'utf8');
  const { project } = readProjectText(text);
  const doc = buildReportDocument({ project, analysis: analyse(project), projectText: text, units: 'SI', version: '0.1.0', date: '2026-12-02' });
  return { md: renderMarkdown(doc), html: renderHtml(doc) };
}

/** The visible text of an HTML report: no style, no tags, entities of the escaper undone. */
function visibleText(html: string): string {
  return html.replace(/<style[\s\S]*?<\/style>/g, ' ').replace(/<[^>]+>/g, ' ')
    .replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&amp;/g, '&');
}

describe('overhang wording (quarry-bench-overhang, a cantilever)', () => {
  it('the wording helper: an overhang has an overhang, a fixed end and a free end; field paths untouched', () => {
    expect(openingWords('cantilever').span).toBe('overhang');
    expect(openingWords('beam').span).toBe('span');
    expect(openingWords('intersection').span).toBe('entry width');
    expect(inOpeningWords('Largest span with this support', 'cantilever')).toBe('Largest overhang with this support');
    expect(inOpeningWords('FS sliding at the abutment, at midspan', 'cantilever')).toBe('FS sliding at the fixed end, at the free end');
    expect(inOpeningWords('A span of `maxSpan_m.governing`, span_m, midspanTension_MPa', 'cantilever')).toBe('An overhang of `maxSpan_m.governing`, span_m, midspanTension_MPa');
    expect(inOpeningWords('Largest span at the abutment', 'beam')).toBe('Largest span at the abutment');
  });

  it('CLI check text says overhang, never span/abutment/midspan', async () => {
    const text = await cli(['check', OVERHANG]);
    expect(text).toContain('Largest overhang meeting every counted target');
    expect(text).toContain('overhang');
    expect(spanWords(text)).toEqual([]);
  });

  it('CLI span and support commands say overhang', async () => {
    const span = await cli(['span', OVERHANG]);
    expect(span).toContain('Current overhang: 2 m');
    expect(spanWords(span)).toEqual([]);
    const support = await cli(['support', OVERHANG]);
    expect(support).toContain('largest overhang with this support');
    expect(spanWords(support)).toEqual([]);
  });

  it('CLI openings table of cantilever rows names the overhang; a mixed table names both', async () => {
    const only = await cli(['openings', OVERHANG, 'o.csv'], { 'o.csv': 'name,type,span_m\nA,cantilever,2\nB,cantilever,1.5\n' });
    expect(only).toMatch(/type\s+overhang\s+governing/);
    expect(only).toContain('largest overhang');
    expect(spanWords(only)).toEqual([]);
    const mixed = await cli(['openings', OVERHANG, 'o.csv'], { 'o.csv': 'name,type,span_m\nA,cantilever,2\nB,beam,4\n' });
    expect(mixed).toContain('span or overhang');
  });

  it('Markdown and HTML report with the whole appendix say overhang, fixed end (root), never span/abutment/midspan', () => {
    const { md, html } = reportOf(OVERHANG);
    // The appendix is there (layer results, strength chain, trace, methods).
    for (const heading of ['Appendix A', 'Appendix B', 'Appendix C']) expect(md).toContain(heading);
    expect(md).toContain('Root tension');
    expect(md).toContain('Overhang search');
    expect(md).toContain('Largest overhang meeting every counted target');
    expect(spanWords(md)).toEqual([]);
    expect(visibleText(html)).toContain('Largest overhang meeting every counted target');
    expect(spanWords(visibleText(html))).toEqual([]);
    // The JSON keys stay: the trace still points at maxSpan_m.governing.
    expect(md).toContain('maxSpan_m.governing');
  });

  it('with Q ratings, the Q system\'s unsupported width is a roof width, not a limit on the overhang; a beam keeps its span (CLI and report)', async () => {
    // ratings from DESIGN.md's example of `empirical.q`
    const withQ = (path: string) => {
      const p = JSON.parse(readFileSync(path, 'utf8'));
      p.empirical = { q: { jn: 9, jr: 1.5, ja: 1, jw: 1, srf: 1, esr: 1.6 } };
      return JSON.stringify(p);
    };
    const overhang = await cli(['check', 'q.json'], { 'q.json': withQ(OVERHANG) });
    expect(overhang).toMatch(/largest unsupported roof width \d/);
    expect(overhang).toContain('not the reach of an overhang');
    expect(spanWords(overhang)).toEqual([]);
    const { project } = readProjectText(withQ(OVERHANG));
    const doc = buildReportDocument({ project, analysis: analyse(project), projectText: withQ(OVERHANG), units: 'SI', version: '0.1.0', date: '2026-12-02' });
    const md = renderMarkdown(doc);
    expect(md).toContain('largest unsupported roof width');
    expect(md).toContain('Largest unsupported roof width (Q system)');
    expect(spanWords(md)).toEqual([]);
    const beam = await cli(['check', 'q.json'], { 'q.json': withQ(BEAM) });
    expect(beam).toMatch(/largest unsupported span \d/);
    expect(beam).not.toContain('reach of an overhang');
  });

  it('a beam preset still says span, abutment and midspan', async () => {
    const text = await cli(['check', BEAM]);
    expect(text).toContain('Largest span meeting every counted target');
    const { md } = reportOf(BEAM);
    expect(md).toContain('Abutment/root tension');
    expect(md).toContain('Midspan tension');
    expect(md).toContain('Span search');
    expect(md).toMatch(/intersection/i);
  });
});
