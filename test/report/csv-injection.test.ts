/**
 * CSV formula injection (issue 14 item 4). OWASP "CSV Injection": a cell beginning with
 * `=`, `+`, `-`, `@`, tab or carriage return is evaluated by spreadsheets; prefix an
 * apostrophe. Numbers, negative ones included, are data and are never changed.
 */
import { csvParse, csvParseRows } from 'd3';
import { describe, expect, it } from 'vitest';
import { csvSafeRow, neutraliseCsvText } from '../../src/report/csv-cell';
import { resultsCsv, spanCurveCsv } from '../../src/report/results-csv';
import { hostileCase } from './fixtures';

const PAYLOADS = ['=HYPERLINK("http://example.invalid/?x","x")', '+cmd|\' /C calc\'!A0', '-2+3', '@SUM(1)', '\tTAB', '\rCR'];

describe('neutraliseCsvText', () => {
  it.each(PAYLOADS)('prefixes an apostrophe to %j', (p) => {
    expect(neutraliseCsvText(p)).toBe(`'${p}`);
  });
  it('leaves ordinary text alone, including a formula character later in the text', () => {
    for (const t of ['Shale', 'a=b', '', ' =x', 'n/a', '– not applicable', "'quoted"]) expect(neutraliseCsvText(t)).toBe(t);
  });
  it('csvSafeRow neutralises text cells only: numbers (negative ones too) stay numbers', () => {
    expect(csvSafeRow({ name: '-shale', demand: -1.5, fs: '', ok: true })).toEqual({ name: "'-shale", demand: -1.5, fs: '', ok: true });
  });
});

describe('resultsCsv and spanCurveCsv: nothing a spreadsheet would evaluate', () => {
  it('a layer named with each payload is written neutralised, and a negative demand stays a plain number', () => {
    const c = hostileCase();
    for (const name of PAYLOADS) {
      // The CSV renders the check table (report.checks): rename layer 1 there and give its tension row a negative demand.
      const report = {
        ...c.analysis.report,
        checks: c.analysis.report.checks.map((r) =>
          r.layerIndex === 0 ? { ...r, layer: name, ...(r.mode === 'tension' ? { demand: -1.25, unit: 'MPa' as const } : {}) } : r,
        ),
      };
      const text = resultsCsv({ ...c.analysis, report }, 'SI', c.project);
      const rows = csvParse(text);
      const tension = rows.find((r) => r.layer === '1' && r.mode === 'tension')!;
      expect(tension.layer_name).toBe(`'${name}`);
      expect(tension.demand_MPa).toBe('-1.25');
      // no cell of the file (text or not) begins with a formula character, except numbers
      for (const cells of csvParseRows(text)) {
        for (const cell of cells) if (/^[=+\-@\t\r]/.test(cell)) expect(Number.isFinite(Number(cell)), cell).toBe(true);
      }
    }
  });

  it('the span curve holds only numbers: none is altered', () => {
    const c = hostileCase();
    const text = spanCurveCsv(c.curve, 'SI');
    expect(text).not.toContain("'");
    expect(Number(csvParse(text)[0]?.span_m)).toBe(c.curve.spans_m[0]);
  });
});
