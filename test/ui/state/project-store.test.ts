import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ProjectStore, type StoreDeps, type ValidationOutcome } from '../../../src/ui/state/project-store';
import { AUTOSAVE_KEY } from '../../../src/ui/state/autosave';
import { defaultLayer, defaultProject } from '../../../src/model/defaults';
import type { Project } from '../../../src/model/types';
import type { Analysis } from '../../../src/analysis/types';

/** Fixture model: refuses a thickness ≤ 0 (DESIGN.md "Invalid input"), like the real validator. */
function validate(input: unknown): ValidationOutcome {
  const p = input as Project;
  const errors = p.layers
    .map((l, i) => (l.thickness_m > 0 ? null : { path: `layers[${i}].thickness_m`, message: `must be > 0 m, got ${l.thickness_m}` }))
    .filter((e): e is { path: string; message: string } => e !== null);
  return errors.length ? { ok: false, errors } : { ok: true, project: structuredClone(p), warnings: [] };
}

/** Fixture analysis: the governing layer is the thinnest one; FS = thickness (a stand-in number). */
function analyse(p: Project): Analysis {
  let gi = 0;
  p.layers.forEach((l, i) => { if (l.thickness_m < p.layers[gi].thickness_m) gi = i; });
  return {
    report: {
      schema: 'lamina-report/2',
      opening: { type: p.opening.type, span_m: p.opening.span_m, designSpan_m: p.opening.span_m, basis: 'span' },
      layers: p.layers.map((l) => ({ name: l.name, thickness_m: l.thickness_m } as never)),
      checks: [],
      governing: { layerIndex: gi, layer: p.layers[gi].name, mode: 'tension', fs: p.layers[gi].thickness_m, target: 2 },
      maxSpan_m: null,
      support: null,
      empirical: null,
      warnings: [],
      trace: [],
    },
    layers: [],
    groups: [],
    grouping: [],
    separations: [],
  };
}

function deps(extra: Partial<StoreDeps> = {}) {
  const storage = new Map<string, string>();
  const d: StoreDeps & { storage: Storage; calls: { analyse: number; chart: number[] } } = {
    ...extra,
    calls: { analyse: 0, chart: [] },
    validate,
    analyse: (p) => { d.calls.analyse++; return analyse(p); },
    spanCurve: (p) => ({ spans_m: [1], fs: {} as never, targets: {} as never, counts: {} as never, currentSpan_m: p.opening.span_m }),
    designChart: (_p, layer) => { d.calls.chart.push(layer); return { layer } as never; },
    minimumThickness: () => 0.3,
    storage: {
      getItem: (k: string) => storage.get(k) ?? null,
      setItem: (k: string, v: string) => void storage.set(k, v),
      removeItem: (k: string) => void storage.delete(k),
    } as Storage,
  };
  if (extra.analyse) d.analyse = extra.analyse;
  return d;
}

function twoLayers(): Project {
  const p = defaultProject();
  p.layers = [{ ...defaultLayer(), name: 'Shale', thickness_m: 0.5 }, { ...defaultLayer(), name: 'Sandstone', thickness_m: 1.2 }];
  return p;
}

describe('ProjectStore', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('analyses the initial project at once and puts the chart on the governing layer', () => {
    const d = deps();
    const p = twoLayers();
    p.layers[1].thickness_m = 0.2;
    const s = new ProjectStore(d, p);
    const st = s.getState();
    expect(st.analysis?.report.governing?.layer).toBe('Sandstone');
    expect(st.chartLayer).toBe(1);
    expect(st.minThickness_m).toBe(0.3);
    expect(st.pending).toBe(false);
  });

  it('an accepted edit lands at once, and the analysis runs once, 150 ms after the last of several edits (debounce)', () => {
    const d = deps();
    const s = new ProjectStore(d, twoLayers());
    const before = d.calls.analyse;
    expect(s.edit('layers[0].thickness_m', 0.4)).toBe(true);
    expect(s.edit('layers[0].thickness_m', 0.45)).toBe(true);
    expect(s.getState().project.layers[0].thickness_m).toBe(0.45);
    expect(s.getState().pending).toBe(true);
    vi.advanceTimersByTime(149);
    expect(d.calls.analyse).toBe(before);
    vi.advanceTimersByTime(1);
    expect(d.calls.analyse).toBe(before + 1);
    expect(s.getState().analysis?.report.governing?.fs).toBe(0.45);
    expect(JSON.parse(d.storage.getItem(AUTOSAVE_KEY) ?? 'null').layers[0].thickness_m).toBe(0.45);
  });

  it('a rejected edit keeps the project, sets fieldErrors with the path, and runs no analysis', () => {
    const d = deps();
    const s = new ProjectStore(d, twoLayers());
    const before = d.calls.analyse;
    expect(s.edit('layers[1].thickness_m', -0.2)).toBe(false);
    expect(s.getState().project.layers[1].thickness_m).toBe(1.2);
    expect(s.getState().fieldErrors).toEqual([{ path: 'layers[1].thickness_m', message: 'must be > 0 m, got -0.2' }]);
    expect(s.getState().stale).toBe(true);
    s.flush();
    expect(d.calls.analyse).toBe(before);
    // retyping the unchanged value clears the error without an undo step or an analysis
    expect(s.edit('layers[1].thickness_m', 1.2)).toBe(true);
    expect(s.getState().fieldErrors).toEqual([]);
    expect(s.getState().stale).toBe(false);
    expect(s.getState().canUndo).toBe(false);
    expect(s.getState().pending).toBe(false);
    expect(s.edit('layers[1].thickness_m', 1.0)).toBe(true);
    expect(s.getState().fieldErrors).toEqual([]);
  });

  it('undo restores the previous project and redo re-applies it; flush() analyses at once', () => {
    const s = new ProjectStore(deps(), twoLayers());
    s.edit('opening.span_m', 8);
    vi.advanceTimersByTime(2000);
    s.edit('layers[0].name', 'Mudstone');
    expect(s.getState().canUndo).toBe(true);
    expect(s.undo()).toBe(true);
    expect(s.getState().project.layers[0].name).toBe('Shale');
    expect(s.getState().project.opening.span_m).toBe(8);
    s.flush();
    expect(s.getState().pending).toBe(false);
    expect(s.getState().analysis?.report.layers[0].name).toBe('Shale');
    expect(s.redo()).toBe(true);
    expect(s.getState().project.layers[0].name).toBe('Mudstone');
    expect(s.getState().canRedo).toBe(false);
  });

  it('replace with a refused project leaves the old one and lists the errors apart from the fields', () => {
    const s = new ProjectStore(deps(), twoLayers());
    const bad = twoLayers();
    bad.layers[0].thickness_m = 0;
    expect(s.replace(bad, 'bad.lamina.json')).toBe(false);
    expect(s.getState().project.layers[0].thickness_m).toBe(0.5);
    expect(s.getState().fileErrors?.source).toBe('bad.lamina.json');
    expect(s.getState().fileErrors?.errors[0].path).toBe('layers[0].thickness_m');
    // the current project's fields are valid: nothing is attached to them, nothing is stale
    expect(s.getState().fieldErrors).toEqual([]);
    expect(s.getState().stale).toBe(false);
    expect(s.getState().notice).toMatch(/bad\.lamina\.json: not loaded/);
    s.dismissFileErrors();
    expect(s.getState().fileErrors).toBeNull();
    expect(s.replace(bad, 'bad.lamina.json')).toBe(false);
    const good = twoLayers();
    good.opening.span_m = 5;
    expect(s.replace(good, 'File good.lamina.json')).toBe(true);
    expect(s.getState().notice).toBe('Loaded: File good.lamina.json.');
    expect(s.getState().fileErrors).toBeNull();
  });

  it('a refused field stays listed and the results stale while other fields are edited, until it is accepted', () => {
    const s = new ProjectStore(deps(), twoLayers());
    expect(s.edit('layers[0].thickness_m', -1)).toBe(false);
    expect(s.edit('opening.span_m', 7)).toBe(true);
    expect(s.getState().stale).toBe(true);
    expect(s.getState().fieldErrors.map((e) => e.path)).toEqual(['layers[0].thickness_m']);
    // text that cannot be read at all is reported by the field itself
    s.markRefused('layers[1].ucs_MPa', 'UCS: expected a stress, got "abc"');
    expect(s.getState().fieldErrors).toHaveLength(2);
    expect(s.edit('layers[0].thickness_m', 0.6)).toBe(true);
    expect(s.getState().stale).toBe(true);
    s.markRefused('layers[1].ucs_MPa', null);
    expect(s.getState().stale).toBe(false);
    expect(s.getState().fieldErrors).toEqual([]);
  });

  it('undo, redo and a replaced project reset the fields, so no field stays refused', () => {
    const s = new ProjectStore(deps(), twoLayers());
    s.edit('opening.span_m', 7);
    s.markRefused('layers[1].ucs_MPa', 'UCS: expected a stress, got "abc"');
    expect(s.undo()).toBe(true);
    expect(s.getState().stale).toBe(false);
    s.markRefused('layers[1].ucs_MPa', 'UCS: expected a stress, got "abc"');
    expect(s.replace(twoLayers(), 'Demo x')).toBe(true);
    expect(s.getState().stale).toBe(false);
  });

  it('units change display state only: no analysis runs', () => {
    const d = deps();
    const s = new ProjectStore(d, twoLayers());
    const before = d.calls.analyse;
    s.setUnits('US');
    expect(s.getState().units).toBe('US');
    s.flush();
    expect(d.calls.analyse).toBe(before);
  });

  it('a chosen chart layer is kept over later analyses; an analysis error gives text, not a throw', () => {
    const d = deps();
    const s = new ProjectStore(d, twoLayers());
    s.setChartLayer(1);
    expect(s.getState().chartLayer).toBe(1);
    s.edit('layers[1].thickness_m', 2);
    s.flush();
    expect(s.getState().chartLayer).toBe(1);
    const failing = new ProjectStore(deps({ analyse: () => { throw new Error('no convergence'); } }), twoLayers());
    expect(failing.getState().analysis).toBeNull();
    expect(failing.getState().error).toBe('The analysis failed: no convergence');
  });
});

describe('ProjectStore: the support needed runs after the results, never in their way', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('runs in a task of its own after each analysis, for that project; an edit cancels a search not yet run', () => {
    const seen: number[] = [];
    const d = deps({ supportNeeded: (p) => { seen.push(p.layers[0].thickness_m); return { needed: null, reason: 'no support needed' }; } });
    const s = new ProjectStore(d, twoLayers());
    expect(s.getState().supportPending).toBe(true);
    expect(seen).toEqual([]); // not in the same task as the analysis
    vi.advanceTimersByTime(1);
    expect(seen).toEqual([0.5]);
    expect(s.getState().supportNeeded?.project).toBe(s.getState().project);
    expect(s.getState().supportPending).toBe(false);
    s.edit('layers[0].thickness_m', 0.6);
    vi.advanceTimersByTime(150); // the analysis; its search is queued
    s.edit('layers[0].thickness_m', 0.7); // typing on: the queued search is dropped
    vi.advanceTimersByTime(150);
    expect(seen).toEqual([0.5]);
    vi.advanceTimersByTime(1); // fake timers run a 0 ms timeout 1 ms later
    expect(seen).toEqual([0.5, 0.7]);
    expect(s.getState().supportNeeded?.project.layers[0].thickness_m).toBe(0.7);
  });

  it('a failing search is reported as a reason, not thrown; without the dependency nothing is pending', () => {
    const s = new ProjectStore(deps({ supportNeeded: () => { throw new Error('boom'); } }), twoLayers());
    s.flush();
    expect(s.getState().supportNeeded?.reason).toBe('the search failed: boom');
    const plain = new ProjectStore(deps(), twoLayers());
    expect(plain.getState().supportPending).toBe(false);
  });
});
