import { describe, expect, it } from 'vitest';
import { analyse } from '../../../src/analysis';
import { checkRowViews, verdictSentence, MODES } from '../../../src/ui/results/check-rows';
import { expectClose } from '../../helpers/expect-close';
import { copy, loadPreset, PRESET_NAMES } from './presets';

describe('checkRowViews(project, report)', () => {
  it.each(PRESET_NAMES)('gives one row per layer and mode, each with a status word and symbol — %s', (name) => {
    const project = loadPreset(name);
    const { report } = analyse(project);
    const views = checkRowViews(project, report);
    expect(views).toHaveLength(report.layers.length * MODES.length);
    for (const v of views) {
      expect(v.row.status.word.length).toBeGreaterThan(0);
      expect(v.row.status.symbol.length).toBeGreaterThan(0);
      expect(v.row.status.text).toBe(`${v.row.status.word} ${v.row.status.symbol}`);
    }
  });

  it.each(PRESET_NAMES)('every number it links to a trace path has a trace entry with that same value — %s', (name) => {
    const project = loadPreset(name);
    const { report } = analyse(project);
    const byPath = new Map(report.trace.map((t) => [t.path, t]));
    let linked = 0;
    for (const v of checkRowViews(project, report)) {
      for (const cell of [v.demand, v.capacity]) {
        if (!cell?.path) continue;
        const entry = byPath.get(cell.path);
        expect(entry, `trace entry for ${cell.path}`).toBeDefined();
        expectClose(entry!.result, cell.value, 1e-9);
        linked++;
      }
      if (v.fsPath) {
        const entry = byPath.get(v.fsPath);
        expect(entry, `trace entry for ${v.fsPath}`).toBeDefined();
        expectClose(entry!.result, v.row.fs as number, 1e-9);
        linked++;
      }
    }
    expect(linked).toBeGreaterThan(0);
  });

  it('a cross-jointed layer has no tension FS and its note says why (METHODS §10: no tension across joints)', () => {
    const project = copy(loadPreset('coal-room-shale'));
    // Joints every 2 m across a 6 m span: 2 < 6, so the layer is cross-jointed (METHODS §10 rule).
    project.layers[0]!.jointing.crossJointSpacing_m = 2;
    const { report } = analyse(project);
    expect(report.layers[0]!.strength.crossJointed).toBe(true);
    const tension = checkRowViews(project, report).find((v) => v.layer === 0 && v.mode === 'tension')!;
    expect(tension.row.fs).toBeNull();
    expect(tension.row.status.kind).toBe('na');
    expect(tension.fsPath).toBeNull();
    expect(tension.note).toMatch(/not applicable/i);
    expect(tension.note).toContain('cross-joints every 2 m');
    expect(tension.note).toMatch(/no tension is carried across/);
  });

  it('after snap-through the voussoir rows say so plainly and FS is shown only as snap-through 0', () => {
    const project = copy(loadPreset('coal-room-shale'));
    const { report } = analyse(project);
    // Hand-made snap-through: the report's contract nulls every numeric voussoir field (METHODS §3).
    const v = report.layers[0]!.voussoir!;
    report.layers[0]!.voussoir = { ...v, n: null, leverArm_m: null, maxCompression_MPa: null, deflection_mm: null, deflectionRatio: null, fsCrushing: null, fsSliding: null, snapThrough: true };
    const rows = checkRowViews(project, report).filter((r) => r.layer === 0);
    const snap = rows.find((r) => r.mode === 'snapThrough')!;
    expect(snap.row.fs).toBe(0);
    expect(snap.row.status.kind).toBe('below');
    for (const mode of ['crushing', 'sliding', 'deflection'] as const) {
      const r = rows.find((x) => x.mode === mode)!;
      expect(r.row.fs).toBeNull();
      expect(r.note).toMatch(/snaps through/);
    }
  });
});

describe('verdictSentence(project, report)', () => {
  it('coal room: names the governing layer and mode, and says the intact beam cracks but the voussoir stands', () => {
    const project = loadPreset('coal-room-shale');
    const { report } = analyse(project);
    const text = verdictSentence(project, report);
    expect(report.governing!.mode).toBe('tension');
    expect(text).toContain(`Governing: tension in ${report.governing!.layer}`);
    expect(text).toContain('against a target of 4');
    // FS tension < 1 means net tension exceeds the design strength: it cracks (METHODS §10).
    expect(report.governing!.fs).toBeLessThan(1);
    expect(text).toContain('would crack');
    // Every arch check short of its target is named in the sentence.
    const short = checkRowViews(project, report).filter(
      (v) => v.mode !== 'tension' && v.mode !== 'snapThrough' && v.row.fs !== null && v.row.fs < v.row.target,
    );
    if (short.length) {
      expect(text).toContain('as a cracked voussoir it falls short too');
      for (const v of short) expect(text).toContain(v.row.layer);
    } else {
      expect(text).toContain('as a cracked voussoir it stands');
    }
    expect(text.split('. ').length).toBe(1); // one sentence
  });

  it('when every arch check meets its target it says the cracked voussoir stands, with the least margins', () => {
    const project = copy(loadPreset('coal-room-shale'));
    // Lower the sliding target to the smallest sliding FS found, so that every arch check meets it.
    const first = analyse(project);
    const slidingFs = checkRowViews(project, first.report)
      .filter((v) => v.mode === 'sliding' && v.row.fs !== null)
      .map((v) => v.row.fs as number);
    project.design.fsTarget.sliding = Math.min(...slidingFs) * 0.99;
    project.design.fsTarget.crushing = 1.01;
    const { report } = analyse(project);
    const text = verdictSentence(project, report);
    expect(text).toContain('as a cracked voussoir it stands (least FS crushing');
    expect(text).toContain('sliding');
  });

  it('design basis "jointed": tension is shown for information only', () => {
    const project = copy(loadPreset('coal-room-shale'));
    project.design.basis = 'jointed';
    const { report } = analyse(project);
    const text = verdictSentence(project, report);
    expect(report.governing!.mode).not.toBe('tension');
    expect(text).toContain('basis "jointed"');
    expect(text).toContain('information only');
  });

  it('an overhang: says a cracked overhang has no arch to fall back on', () => {
    const project = loadPreset('quarry-bench-overhang');
    const { report } = analyse(project);
    const text = verdictSentence(project, report);
    expect(text).toContain('overhang');
    expect(text).not.toContain('voussoir it stands');
  });

  it('no governing check: says nothing governs', () => {
    const project = loadPreset('coal-room-shale');
    const { report } = analyse(project);
    expect(verdictSentence(project, { ...report, governing: null })).toMatch(/nothing governs/);
  });
});
