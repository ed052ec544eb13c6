import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { escapeXml, formatValue, num, svgDocument, wrapText, ID } from '../../../src/report/charts/svg';
import { textContent, xmlProblems } from './xml-check';

describe('svg helpers', () => {
  it('escapeXml("<img src=x onerror=alert(1)>") is "&lt;img src=x onerror=alert(1)&gt;" (XML 1.0 predefined entities)', () => {
    expect(escapeXml('<img src=x onerror=alert(1)>')).toBe('&lt;img src=x onerror=alert(1)&gt;');
    expect(escapeXml(`a & "b" 'c'`)).toBe('a &amp; &quot;b&quot; &apos;c&apos;');
  });

  it('escapeXml(s) inside a text node always parses back to s (property)', () => {
    fc.assert(
      fc.property(fc.string(), (s) => {
        const markup = `<svg><text>${escapeXml(s)}</text></svg>`;
        expect(xmlProblems(markup)).toEqual([]);
        expect(textContent(markup)).toBe(`\n\n${s}\n\n`);
      }),
    );
  });

  it('num(x) rounds to at most 2 decimals and never prints NaN, Infinity or -0 (common practice)', () => {
    expect(num(1.23456)).toBe('1.23');
    expect(num(-0.001)).toBe('0');
    expect(num(NaN)).toBe('0');
    expect(num(Infinity)).toBe('0');
    fc.assert(fc.property(fc.double(), (v) => /^-?\d+(\.\d{1,2})?$/.test(num(v))));
  });

  it('formatValue keeps 3 significant figures below 1 and ≤ 2 decimals above (0.404, 1.66, 209)', () => {
    expect(formatValue(0.40412)).toBe('0.404');
    expect(formatValue(1.659)).toBe('1.66');
    expect(formatValue(208.86)).toBe('209');
    expect(formatValue(-0.5)).toBe('−0.5');
    expect(formatValue(NaN)).toBe('–');
  });

  it('wrapText splits at spaces within the width and marks a cut with an ellipsis', () => {
    expect(wrapText('one two three four', 9)).toEqual(['one two', 'three', 'four']);
    expect(wrapText('a b c d e f g h', 1, 2)).toEqual(['a', 'b …']);
  });

  it('svgDocument gives a deterministic id prefix that differs between different charts', () => {
    const make = (body: string) => svgDocument({ width: 10, height: 10, title: 'T', desc: 'D', body, className: 'c', defs: `<clipPath id="${ID}c"><rect width="1" height="1"/></clipPath>` });
    const a = make('<g/>');
    expect(make('<g/>')).toBe(a);
    const idA = /id="(lm[0-9a-f]{8}-)c"/.exec(a)?.[1];
    const idB = /id="(lm[0-9a-f]{8}-)c"/.exec(make('<g></g>'))?.[1];
    expect(idA).toBeDefined();
    expect(idA).not.toBe(idB);
    expect(a).not.toContain(ID);
    expect(xmlProblems(a)).toEqual([]);
  });
});
