import { describe, expect, it } from 'vitest';
import { ProjectStore, type StoreDeps, type ValidationOutcome } from '../../../src/ui/state/project-store';
import { AUTOSAVE_KEY } from '../../../src/ui/state/autosave';
import { defaultLayer, defaultProject } from '../../../src/model/defaults';
import type { Project } from '../../../src/model/types';
import type { Analysis } from '../../../src/analysis/types';
import { createInThreadClient } from '../../../src/ui/compute/client';
import type { AnalysisFunctions } from '../../../src/ui/compute/compute-core';
import type { AnalysisOutcome, ChartOutcome } from '../../../src/ui/compute/types';

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

function deps(extra: Partial<AnalysisFunctions> = {}) {
  const withSupport = Boolean(extra.supportNeeded);
  const storage = new Map<string, string>();
  const calls = { analyse: 0, chart: [] as number[] };
  const fns: AnalysisFunctions = {
    analyse: (p) => { calls.analyse++; return analyse(p); },
    spanCurve: (p) => ({ spans_m: [1], fs: {} as never, targets: {} as never, counts: {} as never, currentSpan_m: p.opening.span_m }),
    designChart: (_p, layer) => { calls.chart.push(layer); return { layer } as never; },
    minimumThickness: () => 0.3,
    supportNeeded: () => ({ needed: null, reason: null }),
    ...extra,
  } as AnalysisFunctions;
  if (extra.analyse) fns.analyse = (p) => { calls.analyse++; return extra.analyse!(p); };
  const d: StoreDeps & { storage: Storage; calls: typeof calls } = {
    calls,
    validate,
    // without a supportNeeded fixture the store gets no support search (as a client without it)
    compute: withSupport ? createInThreadClient(fns) : (({ analyse, chart }) => ({ analyse, chart }))(createInThreadClient(fns)),
    storage: {
      getItem: (k: string) => storage.get(k) ?? null,
      setItem: (k: string, v: string) => void storage.set(k, v),
      removeItem: (k: string) => void storage.delete(k),
    } as Storage,
  };
  return d;
}

/** A compute client whose answers the test releases one by one, in any order. */
function manualCompute() {
  const analyses: Array<{ project: Project; resolve(o: AnalysisOutcome | null): void }> = [];
  const charts: Array<{ project: Project; layer: number; resolve(o: ChartOutcome | null): void }> = [];
  return {
    analyses,
    charts,
    compute: {
      analyse: (project: Project) => new Promise<AnalysisOutcome | null>((resolve) => analyses.push({ project, resolve })),
      chart: (project: Project, layer: number) => new Promise<ChartOutcome | null>((resolve) => charts.push({ project, layer, resolve })),
    },
  };
}
const outcome = (p: Project): AnalysisOutcome => ({ analysis: analyse(p), error: null, timings: { analyse: 1 } });
const tick = () => new Promise((r) => setTimeout(r, 0));

function twoLayers(): Project {
  const p = defaultProject();
  p.layers = [{ ...defaultLayer(), name: 'Shale', thickness_m: 0.5 }, { ...defaultLayer(), name: 'Sandstone', thickness_m: 1.2 }];
  return p;
}

describe('ProjectStore', () => {
  it('analyses the initial project at once and puts the chart on the governing layer', async () => {
    const d = deps();
    const p = twoLayers();
    p.layers[1].thickness_m = 0.2;
    const s = new ProjectStore(d, p);
    expect(s.getState().pending).toBe(true);
    await s.settled();
    const st = s.getState();
    expect(st.analysis?.report.governing?.layer).toBe('Sandstone');
    expect(st.chartLayer).toBe(1);
    expect(st.minThickness_m).toBe(0.3);
    expect(st.pending).toBe(false);
  });

  it('with `later`, quick edits share one autosave write after the frame; a waiting write is flushed when the page goes', async () => {
    const d = deps();
    const tasks: Array<() => void> = [];
    let writes = 0;
    const setItem = d.storage.setItem.bind(d.storage);
    d.storage.setItem = (k: string, v: string) => {
      writes++;
      setItem(k, v);
    };
    const s = new ProjectStore({ ...d, later: (t) => tasks.push(t) }, twoLayers());
    await s.settled();
    s.edit('layers[0].thickness_m', 0.4);
    s.edit('layers[0].thickness_m', 0.45);
    expect(writes).toBe(0); // nothing written in the keys' own tasks
    expect(tasks).toHaveLength(1); // one write waiting for both edits
    tasks.shift()!();
    expect(writes).toBe(1);
    expect(JSON.parse(d.storage.getItem(AUTOSAVE_KEY) ?? 'null').layers[0].thickness_m).toBe(0.45);
    s.edit('layers[0].thickness_m', 0.5);
    s.flushAutosave(); // pagehide before the frame
    expect(JSON.parse(d.storage.getItem(AUTOSAVE_KEY) ?? 'null').layers[0].thickness_m).toBe(0.5);
    tasks.shift()!(); // the frame's task then finds nothing to write
    expect(writes).toBe(2);
  });

  it('an accepted edit lands at once and posts its analysis at once; pending until its answer lands', async () => {
    const d = deps();
    const s = new ProjectStore(d, twoLayers());
    await s.settled();
    const before = d.calls.analyse;
    expect(s.edit('layers[0].thickness_m', 0.4)).toBe(true);
    expect(s.edit('layers[0].thickness_m', 0.45)).toBe(true);
    expect(s.getState().project.layers[0].thickness_m).toBe(0.45);
    expect(s.getState().pending).toBe(true);
    expect(s.getState().chartPending).toBe(true);
    await s.settled();
    expect(d.calls.analyse).toBe(before + 2); // no debounce: one analysis per accepted edit
    expect(s.getState().pending).toBe(false);
    expect(s.getState().analysis?.report.governing?.fs).toBe(0.45);
    expect(JSON.parse(d.storage.getItem(AUTOSAVE_KEY) ?? 'null').layers[0].thickness_m).toBe(0.45);
  });

  it('answers for an older project are dropped, whatever order they come in; pending stays until the latest lands', async () => {
    const m = manualCompute();
    const s = new ProjectStore({ validate, compute: m.compute }, twoLayers());
    s.edit('layers[0].thickness_m', 0.4);
    s.edit('layers[0].thickness_m', 0.45);
    expect(m.analyses.map((a) => a.project.layers[0].thickness_m)).toEqual([0.5, 0.4, 0.45]);
    // the newest answer first, then the older ones late
    m.analyses[2].resolve(outcome(m.analyses[2].project));
    await tick();
    expect(s.getState().analysis?.report.governing?.fs).toBe(0.45);
    expect(s.getState().pending).toBe(false);
    m.analyses[0].resolve(outcome(m.analyses[0].project));
    m.analyses[1].resolve(outcome(m.analyses[1].project));
    await tick();
    expect(s.getState().analysis?.report.governing?.fs).toBe(0.45);
    // a chart requested for an older project is dropped too
    expect(m.charts).toHaveLength(1);
    s.edit('layers[0].thickness_m', 0.6);
    m.charts[0].resolve({ layer: 0, curve: null, chart: { layer: 0 } as never, minThickness_m: 0.3, timings: { curve: 1, chart: 1, minThickness: 1 } });
    await tick();
    expect(s.getState().chart).toBeNull();
    expect(s.getState().pending).toBe(true);
    expect(s.getState().analysis?.report.governing?.fs).toBe(0.45); // shown, but marked pending
    m.analyses[3].resolve(outcome(m.analyses[3].project));
    await tick();
    expect(s.getState().pending).toBe(false);
    expect(s.getState().chartPending).toBe(true);
    m.charts[1].resolve({ layer: 0, curve: null, chart: { layer: 0 } as never, minThickness_m: 0.3, timings: { curve: 1, chart: 1, minThickness: 1 } });
    await tick();
    expect(s.getState().chartPending).toBe(false);
    expect(s.getState().chart).toEqual({ layer: 0 });
    // an answer the client replaced (null) changes nothing
    s.edit('layers[0].thickness_m', 0.7);
    m.analyses[4].resolve(null);
    await tick();
    expect(s.getState().pending).toBe(true);
  });

  it('a rejected edit keeps the project, sets fieldErrors with the path, and runs no analysis', async () => {
    const d = deps();
    const s = new ProjectStore(d, twoLayers());
    await s.settled();
    const before = d.calls.analyse;
    expect(s.edit('layers[1].thickness_m', -0.2)).toBe(false);
    expect(s.getState().project.layers[1].thickness_m).toBe(1.2);
    expect(s.getState().fieldErrors).toEqual([{ path: 'layers[1].thickness_m', message: 'must be > 0 m, got -0.2' }]);
    expect(s.getState().stale).toBe(true);
    await s.settled();
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

  it('undo restores the previous project and redo re-applies it, each analysed', async () => {
    const s = new ProjectStore(deps(), twoLayers());
    s.edit('opening.span_m', 8);
    await s.settled();
    s.edit('layers[0].name', 'Mudstone');
    expect(s.getState().canUndo).toBe(true);
    expect(s.undo()).toBe(true);
    expect(s.getState().project.layers[0].name).toBe('Shale');
    expect(s.getState().project.opening.span_m).toBe(8);
    expect(s.getState().pending).toBe(true);
    await s.settled();
    expect(s.getState().pending).toBe(false);
    expect(s.getState().analysis?.report.layers[0].name).toBe('Shale');
    expect(s.redo()).toBe(true);
    expect(s.getState().project.layers[0].name).toBe('Mudstone');
    expect(s.getState().canRedo).toBe(false);
    await s.settled();
    expect(s.getState().analysis?.report.layers[0].name).toBe('Mudstone');
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

  it('units change display state only: no analysis runs', async () => {
    const d = deps();
    const s = new ProjectStore(d, twoLayers());
    await s.settled();
    const before = d.calls.analyse;
    s.setUnits('US');
    expect(s.getState().units).toBe('US');
    await s.settled();
    await tick();
    expect(d.calls.analyse).toBe(before);
  });

  it('a chosen chart layer is kept over later analyses; an analysis error gives text, not a throw', async () => {
    const d = deps();
    const s = new ProjectStore(d, twoLayers());
    await s.settled();
    s.setChartLayer(1);
    expect(s.getState().chartLayer).toBe(1);
    expect(s.getState().chartPending).toBe(true);
    await s.settled();
    expect(d.calls.chart.at(-1)).toBe(1);
    s.edit('layers[1].thickness_m', 2);
    await s.settled();
    expect(s.getState().chartLayer).toBe(1);
    expect(d.calls.chart.at(-1)).toBe(1);
    const failing = new ProjectStore(deps({ analyse: () => { throw new Error('no convergence'); } }), twoLayers());
    await failing.settled();
    expect(failing.getState().analysis).toBeNull();
    expect(failing.getState().error).toBe('The analysis failed: no convergence');
    // a compute client that fails altogether (worker gone) gives text too
    const broken = new ProjectStore({ validate, compute: { analyse: () => Promise.reject(new Error('worker gone')), chart: () => Promise.reject(new Error('worker gone')) } }, twoLayers());
    await broken.settled();
    expect(broken.getState().error).toBe('The analysis failed: worker gone');
  });

  it('a chart computation that fails says why (not "no thickness meets"); the next that succeeds clears it', async () => {
    const good = deps().compute;
    let fail = true;
    const s = new ProjectStore({
      validate,
      compute: { analyse: good.analyse, chart: (p: Project, layer: number) => (fail ? Promise.reject(new Error('worker gone')) : good.chart(p, layer)) },
    }, twoLayers());
    await s.settled();
    expect(s.getState().analysis).not.toBeNull();
    expect(s.getState().chartPending).toBe(false);
    expect(s.getState().minThickness_m).toBeNull();
    expect(s.getState().chartError).toBe('the computation failed: worker gone');
    fail = false;
    s.edit('layers[0].thickness_m', 0.6);
    await s.settled();
    expect(s.getState().chartError).toBeNull();
  });
});

describe('ProjectStore: the support needed runs after the results, never in their way', () => {
  it('runs after each analysis (after its chart, in the same worker), for that project; an answer for an older project is dropped', async () => {
    const seen: number[] = [];
    const d = deps({ supportNeeded: (p) => { seen.push(p.layers[0].thickness_m); return { needed: null, reason: 'no support needed' }; } });
    const s = new ProjectStore(d, twoLayers());
    expect(seen).toEqual([]); // not with the edit: after the analysis has landed
    await s.settled();
    await expect.poll(() => s.getState().supportPending).toBe(false);
    expect(seen).toEqual([0.5]);
    expect(s.getState().supportNeeded?.project).toBe(s.getState().project);
    s.edit('layers[0].thickness_m', 0.6);
    s.edit('layers[0].thickness_m', 0.7); // typing on: only the last value's results and search count
    await s.settled();
    await expect.poll(() => s.getState().supportNeeded?.project.layers[0].thickness_m).toBe(0.7);
    expect(s.getState().supportNeeded?.project).toBe(s.getState().project);
    expect(s.getState().supportPending).toBe(false);
  });

  it('a failing search is reported as a reason, not thrown; without the dependency nothing is pending', async () => {
    const s = new ProjectStore(deps({ supportNeeded: () => { throw new Error('boom'); } }), twoLayers());
    await s.settled();
    await expect.poll(() => s.getState().supportNeeded?.reason).toBe('the search failed: boom');
    const plain = new ProjectStore(deps(), twoLayers());
    await plain.settled();
    expect(plain.getState().supportPending).toBe(false);
  });
});
