/** Checks every chart must pass: well-formed XML, unit-bearing labels, escaping, no NaN. */
import { expect } from 'vitest';
import { EVIL } from './fixtures';
import { textContent, xmlProblems } from './xml-check';

export function expectWellFormed(svg: string): void {
  expect(xmlProblems(svg)).toEqual([]);
  expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
  expect(svg).toMatch(/role="img"/);
  expect(svg).toMatch(/aria-label="[^"]+"/);
  expect(svg).toMatch(/<title>[^<]+<\/title>/);
  expect(svg).toMatch(/<desc id="[^"]+">[^<]+<\/desc>/);
  expect(svg).toMatch(/viewBox="0 0 \d+ \d+" width="100%"/);
}

export function expectNoBadNumbers(svg: string): void {
  expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  // Every number in an attribute (coordinates, paths) has at most 2 decimals; text labels
  // use 3 significant figures below 1 (0.404 MPa), which is just as stable.
  const attrs = [...svg.matchAll(/\s[\w:-]+="([^"]*)"/g)].map((m) => m[1]).join(' ');
  expect(attrs.match(/\d\.\d{3,}/g) ?? []).toEqual([]);
}

/** The hostile text appears only escaped: never as a tag, always as text. */
export function expectEscaped(svg: string): void {
  expect(svg).not.toContain('<img');
  expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt;');
  expect(textContent(svg)).toContain(EVIL);
  expect(xmlProblems(svg)).toEqual([]);
}

/** Labels with units appear as text, e.g. 'Span (m)' in SI and 'Span (ft)' in US. */
export function expectLabels(svg: string, labels: string[]): void {
  const t = textContent(svg);
  for (const l of labels) expect(t, `label "${l}"`).toContain(l);
}
