import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseSpecimensCsv } from '../../src/model/specimens-csv';
import type { Specimen } from '../../src/model/types';

const HEADER = 'id,diameter_mm,thickness_mm,peakLoad_kN,valid';

describe('parseSpecimensCsv', () => {
  it('reads a CSV of Brazilian discs in file units (mm, kN) — DESIGN.md specimen fields', () => {
    const r = parseSpecimensCsv(`${HEADER}\nB1,54,27,7.0,true\nB2,54,27.5,8.25,false\n`);
    expect(r.errors).toEqual([]);
    expect(r.specimens).toEqual([
      { id: 'B1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 7, valid: true },
      { id: 'B2', diameter_mm: 54, thickness_mm: 27.5, peakLoad_kN: 8.25, valid: false },
    ]);
  });

  it('valid is optional (default true) and accepts true/false/yes/no/1/0/y/n in any case — brief', () => {
    const lines = ['TRUE', 'False', 'yes', 'NO', '1', '0', 'Y', 'n', ''].map((v, i) => `S${i},54,27,5,${v}`);
    const r = parseSpecimensCsv([HEADER, ...lines].join('\n'));
    expect(r.errors).toEqual([]);
    expect(r.specimens.map((s) => s.valid)).toEqual([true, false, true, false, true, false, true, false, true]);
    const noColumn = parseSpecimensCsv('id,diameter_mm,thickness_mm,peakLoad_kN\nB1,54,27,5');
    expect(noColumn.specimens[0].valid).toBe(true);
  });

  it('matches headers case-insensitively and trimmed, in any order, ignoring extra columns', () => {
    const r = parseSpecimensCsv(' PeakLoad_KN , notes ,ID,Thickness_mm,DIAMETER_MM\n10,broke clean,B1,27,54');
    expect(r.errors).toEqual([]);
    expect(r.specimens).toEqual([{ id: 'B1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 10, valid: true }]);
  });

  it('reads tab-separated text pasted from a spreadsheet (tab in the header line)', () => {
    const r = parseSpecimensCsv('id\tdiameter_mm\tthickness_mm\tpeakLoad_kN\tvalid\r\nB1\t54\t27\t7\tyes\r\nB,2\t63.5\t30\t9.5\tno\r\n');
    expect(r.errors).toEqual([]);
    expect(r.specimens.map((s) => [s.id, s.diameter_mm, s.valid])).toEqual([['B1', 54, true], ['B,2', 63.5, false]]);
  });

  it('skips blank lines, strips a byte-order mark, reads CRLF and quoted ids', () => {
    const r = parseSpecimensCsv(`\uFEFF${HEADER}\r\n\r\n"B,1",54,27,7,true\r\n   \r\nB2,54,27,7,true\r\n`);
    expect(r.errors).toEqual([]);
    expect(r.specimens.map((s) => s.id)).toEqual(['B,1', 'B2']);
  });

  it('names row and column: `row 3, diameter_mm: must be a number > 0 (mm), got "abc"`', () => {
    const r = parseSpecimensCsv(`${HEADER}\nB1,54,27,7,true\nB2,abc,27,7,true`);
    expect(r.specimens.map((s) => s.id)).toEqual(['B1']);
    expect(r.errors).toEqual([{ row: 3, column: 'diameter_mm', message: 'row 3, diameter_mm: must be a number > 0 (mm), got "abc"' }]);
  });

  it('counts rows as a spreadsheet shows them: a blank line still takes a row number', () => {
    const r = parseSpecimensCsv(`${HEADER}\n\nB1,54,27,-7,true`);
    expect(r.errors).toEqual([{ row: 3, column: 'peakLoad_kN', message: 'row 3, peakLoad_kN: must be a number > 0 (kN), got "-7"' }]);
  });

  it('reports every bad cell of a row and leaves the row out: zero, empty, hex, decimal comma, bad flag, no id', () => {
    const r = parseSpecimensCsv(`${HEADER}\n,0,,0x10,maybe\nB9,"54,5",27,7,`);
    expect(r.specimens).toEqual([]);
    expect(r.errors.map((e) => [e.row, e.column])).toEqual([
      [2, 'id'], [2, 'diameter_mm'], [2, 'thickness_mm'], [2, 'peakLoad_kN'], [2, 'valid'], [3, 'diameter_mm'],
    ]);
    expect(r.errors[0].message).toBe('row 2, id: must not be empty');
    expect(r.errors[2].message).toBe('row 2, thickness_mm: must be a number > 0 (mm), got ""');
    expect(r.errors[4].message).toBe('row 2, valid: must be true/false, yes/no, y/n or 1/0, got "maybe"');
    expect(r.errors[5].message).toMatch(/got "54,5" \(use a point as the decimal separator\)/);
  });

  it('rejects a repeated id, naming the row where it was first used', () => {
    const r = parseSpecimensCsv(`${HEADER}\nB1,54,27,7,true\nB1,54,27,8,true`);
    expect(r.specimens).toHaveLength(1);
    expect(r.errors).toEqual([{ row: 3, column: 'id', message: 'row 3, id: "B1" is already used on row 2' }]);
  });

  it('missing required columns give one error naming them', () => {
    const r = parseSpecimensCsv('id,diameter,thickness_mm\nB1,54,27');
    expect(r.specimens).toEqual([]);
    expect(r.errors).toHaveLength(1);
    expect(r.errors[0]).toMatchObject({ row: 1, column: 'diameter_mm, peakLoad_kN' });
    expect(r.errors[0].message).toMatch(/^row 1: missing columns diameter_mm, peakLoad_kN; expected columns/);
  });

  it('empty text gives one "no header line" error; a header without rows gives no specimen and no error', () => {
    expect(parseSpecimensCsv('').errors[0].message).toMatch(/no header line/);
    expect(parseSpecimensCsv(' \n\n').errors).toHaveLength(1);
    expect(parseSpecimensCsv(HEADER)).toEqual({ specimens: [], errors: [] });
  });

  it('never throws, whatever the text (property)', () => {
    const piece = fc.oneof(
      fc.constantFrom(',', '\t', '\n', '\r\n', '"', '""', ' ', '\uFEFF', HEADER, 'id', 'valid', '54', '-1', 'NaN', 'Infinity', '1e400', 'yes'),
      fc.string({ maxLength: 6 }),
    );
    fc.assert(
      fc.property(fc.array(piece, { maxLength: 40 }), (pieces) => {
        const r = parseSpecimensCsv(pieces.join(''));
        expect(Array.isArray(r.specimens)).toBe(true);
        for (const s of r.specimens) {
          expect(s.diameter_mm > 0 && Number.isFinite(s.diameter_mm)).toBe(true);
          expect(s.thickness_mm > 0 && Number.isFinite(s.thickness_mm)).toBe(true);
          expect(s.peakLoad_kN > 0 && Number.isFinite(s.peakLoad_kN)).toBe(true);
        }
        for (const e of r.errors) expect(e.row).toBeGreaterThanOrEqual(1);
      }),
    );
    expect(parseSpecimensCsv(undefined as unknown as string).errors).toHaveLength(1);
  });

  it('reads back what a CSV writer produces, as CSV or as tab-separated text (round-trip property)', () => {
    const specimen = fc.record({
      diameter_mm: fc.double({ min: 10, max: 200, noNaN: true }),
      thickness_mm: fc.double({ min: 1, max: 200, noNaN: true }),
      peakLoad_kN: fc.double({ min: 0.01, max: 500, noNaN: true }),
      valid: fc.boolean(),
    });
    fc.assert(
      fc.property(fc.array(specimen, { minLength: 1, maxLength: 10 }), fc.boolean(), (list, tabs) => {
        const specimens: Specimen[] = list.map((s, i) => ({ id: `S ${i}`, ...s }));
        const sep = tabs ? '\t' : ',';
        const text = [HEADER.split(',').join(sep), ...specimens.map((s) => [s.id, s.diameter_mm, s.thickness_mm, s.peakLoad_kN, s.valid].join(sep))].join('\n');
        expect(parseSpecimensCsv(text)).toEqual({ specimens, errors: [] });
      }),
    );
  });
});
