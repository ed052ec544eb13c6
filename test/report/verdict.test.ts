import { describe, expect, it } from 'vitest';
import { buildReportDocument } from '../../src/report/report-document';
import { allCases, presetCase, type Case } from './fixtures';

const verdict = (c: Case, units: 'SI' | 'US' = 'SI'): string => {
  const doc = buildReportDocument({ project: c.project, analysis: c.analysis, curve: c.curve, units, version: 't', date: '2026-12-01' });
  const s = doc.sections.find((x) => x.id === 'verdict');
  return (s?.blocks ?? []).map((b) => (b.kind === 'paragraph' ? b.text : '')).join('\n');
};

describe('verdict sentences', () => {
  it('every verdict makes both statements: the intact beam and the cracked beam (DESIGN.md "Report")', () => {
    for (const c of allCases()) {
      const text = verdict(c);
      expect(text).toMatch(/^Governing check: /);
      expect(text).toMatch(/As an intact (beam|overhang)/);
      expect(text).toMatch(/As a cracked/);
      expect(text).toMatch(/Design basis|An overhang has no cracked-beam reserve/);
      expect(text).toMatch(/Result: /);
      expect(text).toMatch(/Largest (span|overhang|entry width)/);
    }
  });
  it('the overhang (quarry bench) says a cantilever has no cracked-beam reserve and speaks of the overhang', () => {
    const text = verdict(presetCase('quarry-bench-overhang'));
    expect(text).toMatch(/overhang cannot form a compression arch/);
    expect(text).toMatch(/Largest overhang/);
  });
  it('the result sentence counts the checks below target, consistent with the check table', () => {
    for (const c of allCases()) {
      const text = verdict(c);
      const m = /Result: (\d+) checks? below target/.exec(text);
      const allMet = /every check that counts meets its target/.test(text);
      expect(Boolean(m) !== allMet).toBe(true);
    }
  });
  it('the span sentence is in the display unit: ft in US units (1 ft = 0.3048 m, METHODS §13)', () => {
    const c = presetCase('coal-room-shale');
    expect(verdict(c, 'US')).toMatch(/current span of 19\.7 ft/); // 6 m / 0.3048 = 19.685 ft, 3 significant figures
    expect(verdict(c, 'SI')).toMatch(/current span of 6 m/);
  });
});
