import { describe, expect, it } from 'vitest';
import { checkRows, MODES } from '../../src/report/check-rows';
import { allCases, jointedCase, presetCase } from './fixtures';

describe('checkRows', () => {
  it('gives one row per layer × mode (5 modes) with the targets of the project (METHODS §10)', () => {
    for (const c of allCases()) {
      const rows = checkRows(c.project, c.analysis.report);
      expect(rows.length).toBe(c.project.layers.length * MODES.length);
      for (const r of rows) {
        const t = c.project.design.fsTarget;
        const expected = r.mode === 'tension' ? t.tension : r.mode === 'crushing' ? t.crushing : r.mode === 'sliding' ? t.sliding : 1;
        expect(r.target).toBe(expected);
      }
    }
  });
  it('the statuses agree with the analysis: exactly the governing row is flagged, and it is the counted row with the least FS/target', () => {
    for (const c of allCases()) {
      const rows = checkRows(c.project, c.analysis.report);
      // A standing arch (snap-through FS 1) is shown but, as in the analysis, is not a check that can govern.
      const counted = rows.filter((r) => (r.status.kind === 'meets' || r.status.kind === 'below') && !(r.mode === 'snapThrough' && (r.fs as number) > 0));
      const least = counted.reduce((a, b) => ((b.fs as number) / b.target < (a.fs as number) / a.target ? b : a));
      const g = c.analysis.report.governing;
      if (!g) continue;
      expect(rows.filter((r) => r.governing).map((r) => [r.layer, r.mode])).toEqual([[g.layer, g.mode]]);
      expect((least.fs as number) / least.target).toBeCloseTo(g.fs / (rows.find((r) => r.governing)?.target ?? 1), 12);
    }
  });
  it('a cantilever (quarry bench) has no voussoir: crushing, sliding, deflection and snap-through are "n/a –" (DESIGN.md)', () => {
    const c = presetCase('quarry-bench-overhang');
    expect(c.project.opening.type).toBe('cantilever');
    const rows = checkRows(c.project, c.analysis.report).filter((r) => r.mode !== 'tension');
    expect(rows.length).toBeGreaterThan(0);
    for (const r of rows) {
      expect(r.status.text).toBe('n/a –');
      expect(r.note).toMatch(/cantilever/);
    }
  });
  it('a layer without net tension is "n/a –" with the reason, never FS 0 or ∞ (DESIGN.md: fsTension null with a reason)', () => {
    const c = presetCase('drift-limestone');
    const rows = checkRows(c.project, c.analysis.report).filter((r) => r.mode === 'tension' && r.fs === null);
    expect(rows.length).toBeGreaterThan(0);
    for (const r of rows) {
      expect(r.status.kind).toBe('na');
      expect(r.note).toMatch(/cross-jointed|no net tension/);
    }
  });
  it('deflection FS is limit/(δ/t): 0.1/0.00383… for the coal-room shale (METHODS §10, from the report values)', () => {
    const c = presetCase('coal-room-shale');
    const row = checkRows(c.project, c.analysis.report).find((r) => r.layerIndex === 0 && r.mode === 'deflection');
    const ratio = c.analysis.report.layers[0]?.voussoir?.deflectionRatio as number;
    expect(row?.demand).toBe(ratio);
    expect(row?.capacity).toBe(0.1);
    expect(row?.fs).toBeCloseTo(0.1 / ratio, 12);
  });
  it('on the jointed basis every tension row with a value is "info ○" and never the governing one', () => {
    const c = jointedCase();
    for (const r of checkRows(c.project, c.analysis.report).filter((x) => x.mode === 'tension')) {
      expect(r.status.kind === 'info' || r.status.kind === 'na').toBe(true);
      expect(r.governing).toBe(false);
    }
  });
});
