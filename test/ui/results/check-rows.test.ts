import { describe, expect, it } from 'vitest';
import { analyse } from '../../../src/analysis';
import { MODES } from '../../../src/analysis/check-labels';
import { checkRowViews } from '../../../src/ui/results/check-rows';
import { governingLayerIndex } from '../../../src/ui/state/project-store';
import { expectClose } from '../../helpers/expect-close';
import { copy, loadPreset, PRESET_NAMES } from './presets';
import { withUncertainty } from '../../../src/analysis/probability-row';
import { runUncertainty } from '../../../src/uncertainty/run';
import { rsProject } from '../../uncertainty/rs-project';

describe('checkRowViews(report)', () => {
  it.each(PRESET_NAMES)('gives one view per row of the analysis check table, in its order — %s', (name) => {
    const { report } = analyse(loadPreset(name));
    const views = checkRowViews(report);
    expect(views).toHaveLength(report.layers.length * MODES.length);
    expect(views.map((v) => v.row)).toEqual(report.checks);
    // a row that does not count says why (METHODS §10)
    for (const v of views) if (!v.row.counts) expect(v.note).toMatch(/^Not counted: /);
  });

  it.each(PRESET_NAMES)('every number it links to a trace path has a trace entry with that same value — %s', (name) => {
    const project = loadPreset(name);
    const { report } = analyse(project);
    const byPath = new Map(report.trace.map((t) => [t.path, t]));
    let linked = 0;
    for (const v of checkRowViews(report)) {
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

  it('a cross-jointed layer has no tension FS and says why (METHODS §10: no tension across joints)', () => {
    const project = copy(loadPreset('coal-room-shale'));
    // Joints every 2 m across a 6 m span: 2 < 6, so the layer is cross-jointed (METHODS §10 rule).
    project.layers[0]!.jointing.crossJointSpacing_m = 2;
    const { report } = analyse(project);
    const tension = checkRowViews(report).find((v) => v.layer === 0 && v.mode === 'tension')!;
    expect(tension.row.fs).toBeNull();
    expect(tension.row.status).toBe('na');
    expect(tension.note).toContain('cross-jointed: no tensile strength');
  });

  it('regression: with duplicate layer names the governing row and layer are found by index, not by name', () => {
    const project = copy(loadPreset('coal-room-shale'));
    // Give all three beds the same name; the shale (layer 1) governs in tension.
    for (const l of project.layers) l.name = 'Bed';
    project.layers[1]!.jointing.crossJointSpacing_m = null;
    const { report } = analyse(project);
    const gi = report.governing!.layerIndex;
    const governing = checkRowViews(report).filter((v) => v.governing);
    expect(governing).toHaveLength(1);
    expect(governing[0]!.layer).toBe(gi);
    expect(governingLayerIndex({ report } as never)).toBe(gi);
    // move the weak bed up: the governing index follows it although every name is the same
    const moved = copy(project);
    moved.layers = [project.layers[2]!, project.layers[1]!, project.layers[0]!];
    const r2 = analyse(moved).report;
    const row = r2.checks.find((r) => r.layerIndex === r2.governing!.layerIndex && r.mode === r2.governing!.mode)!;
    expect(row.status === 'below' || row.status === 'meets').toBe(true);
    expect(checkRowViews(r2).filter((v) => v.governing).map((v) => v.layer)).toEqual([r2.governing!.layerIndex]);
  });
});

describe('checkRowViews with an uncertainty run (METHODS §16)', () => {
  it('the whole roof’s P_f row: no layer, never governing, the interval’s upper end against the acceptable P_f', () => {
    const project = rsProject('normal', 1000, 1, 1e-3);
    const block = runUncertainty(project, { spanPoints: 0, form: false });
    const { report } = withUncertainty(analyse(project), block);
    const views = checkRowViews(report);
    const v = views.find((x) => x.mode === 'probabilityOfFailure')!;
    expect(views[views.length - 1]).toBe(v);
    expect(v.layer).toBe(null);
    expect(v.governing).toBe(false);
    expect(v.demand?.value).toBe(block.pfInterval[1]);
    expect(v.capacity?.value).toBe(1e-3);
    expect(v.note).toContain('upper end of the 95 % interval');
  });
});
