import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { unit } from 'mathjs';
import { MAX_SPECIMEN_ROWS, detectSeparator, parseSpecimensCsv } from '../../src/model/specimens-csv';
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
    expect(r.errors[4].message).toBe('row 2, valid: must be true/false, yes/no, y/n, ok or 1/0, got "maybe"');
    expect(r.errors[5].message).toMatch(/got "54,5" \(use a point as the decimal separator\)/);
  });

  it('rejects a repeated id, naming the row where it was first used', () => {
    const r = parseSpecimensCsv(`${HEADER}\nB1,54,27,7,true\nB1,54,27,8,true`);
    expect(r.specimens).toHaveLength(1);
    expect(r.errors).toEqual([{ row: 3, column: 'id', message: 'row 3, id: "B1" is already used on row 2' }]);
  });

  it('missing required columns give one error naming them', () => {
    const r = parseSpecimensCsv('id,width,thickness_mm\nB1,54,27');
    expect(r.specimens).toEqual([]);
    expect(r.errors).toHaveLength(1);
    expect(r.errors[0]).toMatchObject({ row: 1, column: 'diameter_mm, peakLoad_kN' });
    expect(r.errors[0].message).toMatch(/^row 1: missing columns diameter_mm, peakLoad_kN; expected columns/);
  });

  it('empty text gives one "no header line" error; a header without rows gives no specimen and no error', () => {
    expect(parseSpecimensCsv('').errors[0].message).toMatch(/no header line/);
    expect(parseSpecimensCsv(' \n\n').errors).toHaveLength(1);
    expect(parseSpecimensCsv(HEADER)).toMatchObject({ specimens: [], errors: [] });
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
        expect(parseSpecimensCsv(text)).toMatchObject({ specimens, errors: [], reading: { header: true, exact: true } });
      }),
    );
  });

  describe('data as it comes (issue 13: paste and import)', () => {
    it('recognises a spreadsheet header by meaning: Sample, Dia (mm), Thk (mm), Load (kN), Valid', () => {
      const r = parseSpecimensCsv('Sample, Dia (mm), Thk (mm), Load (kN), Valid\nS-1, 54, 27, 10, Y\nS-2, 54, 26.5, 9.5, N\n');
      expect(r.errors).toEqual([]);
      expect(r.specimens).toEqual([
        { id: 'S-1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 10, valid: true },
        { id: 'S-2', diameter_mm: 54, thickness_mm: 26.5, peakLoad_kN: 9.5, valid: false },
      ]);
      expect(r.reading.header).toBe(true);
      expect(r.reading.exact).toBe(false); // the panel shows how it was read before applying
      expect(r.reading.columns.map((c) => [c.heading, c.field, c.unit])).toEqual([
        ['Sample', 'id', ''], ['Dia (mm)', 'diameter_mm', 'mm'], ['Thk (mm)', 'thickness_mm', 'mm'], ['Load (kN)', 'peakLoad_kN', 'kN'], ['Valid', 'valid', ''],
      ]);
    });

    it('other common spellings: No., D, L, P, ok; t, peak; specimen, length, force', () => {
      for (const header of ['No.,D,L,P,ok', 'ID,diam,t,peak,Y/N', 'Specimen,Diameter,Length,Force,Accepted']) {
        const r = parseSpecimensCsv(`${header}\nB1,54,27,10,yes`);
        expect(r.errors, header).toEqual([]);
        expect(r.specimens, header).toEqual([{ id: 'B1', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 10, valid: true }]);
      }
    });

    it('converts units in the heading to mm and kN — factors checked against mathjs', () => {
      const r = parseSpecimensCsv('Sample,Dia (in),Thk [cm],Load (lbf)\nB1,2.125,2.7,2250\nB2,2,3,10');
      expect(r.errors).toEqual([]);
      const [b1] = r.specimens;
      expect(b1.diameter_mm).toBeCloseTo(unit(2.125, 'inch').toNumber('mm'), 10); // 53.975 mm
      expect(b1.thickness_mm).toBeCloseTo(27, 10);
      // mathjs rounds lbf to 4.4482216 N; NIST SP 811 defines 1 lbf = 4.4482216152605 N exactly
      expect(b1.peakLoad_kN).toBeCloseTo(unit(2250, 'lbf').toNumber('kN'), 6);
      expect(b1.peakLoad_kN).toBeCloseTo(2250 * 4.4482216152605e-3, 12);
      const n = parseSpecimensCsv('id,diameter_mm,thickness_mm,Load N\nB1,54,27,10000');
      expect(n.specimens[0].peakLoad_kN).toBe(10);
      const kip = parseSpecimensCsv('id,D (mm),L (mm),P (kips)\nB1,54,27,2.25');
      expect(kip.specimens[0].peakLoad_kN).toBeCloseTo(unit(2.25, 'kip').toNumber('kN'), 6);
    });

    it('a heading unit of the wrong kind is refused naming the heading', () => {
      const r = parseSpecimensCsv('Sample,Dia (mm),Thk (mm),Load (MPa)\nB1,54,27,10');
      expect(r.specimens).toEqual([]);
      expect(r.errors).toEqual([{ row: 1, column: 'Load (MPa)', message: 'row 1, Load (MPa): unit "MPa" is not a force: kN, N, lbf or kip' }]);
    });

    it('reads a headerless paste by column order (id, D, L, P [, valid]) and says so', () => {
      const r = parseSpecimensCsv('B1\t54\t27\t10\tyes\nB2\t54\t27\t11\tno\n');
      expect(r.errors).toEqual([]);
      expect(r.reading.header).toBe(false);
      expect(r.reading.columns.map((c) => `${c.heading}=${c.field}`)).toEqual(['column 1=id', 'column 2=diameter_mm', 'column 3=thickness_mm', 'column 4=peakLoad_kN', 'column 5=valid']);
      expect(r.specimens.map((s) => [s.id, s.peakLoad_kN, s.valid])).toEqual([['B1', 10, true], ['B2', 11, false]]);
      const bad = parseSpecimensCsv('54,27,10\n54,27,11');
      expect(bad.specimens).toEqual([]);
      expect(bad.errors[0].message).toMatch(/^row 1: no header line and 3 columns; without a header the columns must be id, diameter/);
      const cell = parseSpecimensCsv('B1,54,27,10\nB2,54,x,10');
      expect(cell.errors).toEqual([{ row: 2, column: 'column 3 (thickness_mm)', message: 'row 2, column 3 (thickness_mm): must be a number > 0 (mm), got "x"' }]);
    });

    it('detects the separator: tab, then a semicolon outside quotes, else comma', () => {
      expect(detectSeparator('\n id\tD;x,y')).toBe('\t');
      expect(detectSeparator('id;D;L;P')).toBe(';');
      expect(detectSeparator('"a;b",D,L,P\nx;y')).toBe(',');
      expect(detectSeparator('')).toBe(',');
    });
  });

  describe('decimal commas (issue 14 item 6)', () => {
    it('semicolon-separated text with decimal commas is read (European spreadsheet export)', () => {
      const r = parseSpecimensCsv('id;diameter_mm;thickness_mm;peakLoad_kN;valid\nB1;54,1;27,0;10,2;1\nB2;"54,0";26,5;9;0\n');
      expect(r.errors).toEqual([]);
      expect(r.reading).toMatchObject({ separator: ';', decimalComma: true, exact: false });
      expect(r.specimens).toEqual([
        { id: 'B1', diameter_mm: 54.1, thickness_mm: 27, peakLoad_kN: 10.2, valid: true },
        { id: 'B2', diameter_mm: 54, thickness_mm: 26.5, peakLoad_kN: 9, valid: false },
      ]);
    });

    it('tab-separated text with decimal commas is read; with no header too', () => {
      const r = parseSpecimensCsv('B1\t54,1\t27\t10,25\nB2\t54\t27,5\t9\n');
      expect(r.errors).toEqual([]);
      expect(r.specimens.map((s) => [s.diameter_mm, s.thickness_mm, s.peakLoad_kN])).toEqual([[54.1, 27, 10.25], [54, 27.5, 9]]);
    });

    it('`B1,54,1,27,0,10,2` in comma-separated text is refused naming row and column, never misread', () => {
      const r = parseSpecimensCsv(`${HEADER}\nB0,54,27,10,true\nB1,54,1,27,0,10,2\n`);
      expect(r.specimens.map((s) => s.id)).toEqual(['B0']);
      expect(r.errors).toHaveLength(1);
      expect(r.errors[0].row).toBe(3);
      expect(r.errors[0].column).toBe('diameter_mm');
      expect(r.errors[0].message).toMatch(/^row 3, diameter_mm: the row has 7 cells where the header has 5; a decimal comma cannot be told from the separator/);
      // without a valid column the split row is just as visible (4 header cells, 7 in the row)
      const four = parseSpecimensCsv('id,diameter_mm,thickness_mm,peakLoad_kN\nB1,54,1,27,0,10,2');
      expect(four.specimens).toEqual([]);
      expect(four.errors[0]).toMatchObject({ row: 2, column: 'diameter_mm' });
    });

    it('empty cells after the last column (a spreadsheet export) are not extra cells', () => {
      const r = parseSpecimensCsv(`${HEADER}\nB1,54,27,10,true,,\n`);
      expect(r.errors).toEqual([]);
      expect(r.specimens).toHaveLength(1);
    });

    it('a comma that could be a thousands separator ("2,250" lbf) is refused, not guessed', () => {
      const r = parseSpecimensCsv('id\tD (mm)\tL (mm)\tP (lbf)\nB1\t54\t27\t2,250\n');
      expect(r.specimens).toEqual([]);
      expect(r.errors).toEqual([{ row: 2, column: 'P (lbf)', message: 'row 2, P (lbf): "2,250" is ambiguous: the comma could separate thousands (2250) or decimals (2.250); write 2250 or 2.250' }]);
    });
  });

  it(`refuses more than ${MAX_SPECIMEN_ROWS} rows with one error that states the cap`, () => {
    const rows = Array.from({ length: MAX_SPECIMEN_ROWS + 1 }, (_, i) => `B${i},54,27,10`);
    const r = parseSpecimensCsv([HEADER, ...rows].join('\n'));
    expect(r.specimens).toEqual([]);
    expect(r.errors).toEqual([{ row: 1, column: '', message: '10,001 specimen rows; at most 10,000 are read at once — split the table' }]);
    expect(parseSpecimensCsv([HEADER, ...rows.slice(1)].join('\n')).specimens).toHaveLength(MAX_SPECIMEN_ROWS);
  });
});
