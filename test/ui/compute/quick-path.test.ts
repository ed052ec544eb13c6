/**
 * Where an edit's analysis runs (src/ui/compute/quick-path.ts): in the page only once its
 * project shape is known to analyse within the budget, else in the worker; the answer is the
 * same either way (the real analysis of the presets).
 */
import { describe, expect, it } from 'vitest';
import { analyse } from '../../../src/analysis/index';
import { createQuickPath, projectShape } from '../../../src/ui/compute/quick-path';
import { ANALYSIS_FUNCTIONS } from '../../../src/ui/compute/compute-core';
import type { AnalysisFunctions } from '../../../src/ui/compute/jobs';
import type { AnalysisOutcome } from '../../../src/ui/compute/types';
import type { Project } from '../../../src/model/types';
import { PRESET_NAMES, loadPreset } from '../results/presets';

const project = loadPreset('coal-room-shale');
const withThickness = (p: Project, t: number): Project => ({ ...p, layers: [{ ...p.layers[0], thickness_m: t }, ...p.layers.slice(1)] });

/** A worker stand-in that answers with the real analysis and a chosen time. */
function worker(ms: number) {
  const calls: Project[] = [];
  return {
    calls,
    slow: (p: Project): Promise<AnalysisOutcome | null> => {
      calls.push(p);
      return Promise.resolve({ analysis: analyse(p), error: null, timings: { analyse: ms } });
    },
  };
}

describe('the quick path', () => {
  it('sends a shape not timed yet to the worker, then analyses it in the page when it was quick', async () => {
    const w = worker(1.5);
    const q = createQuickPath({ slow: w.slow, local: () => ANALYSIS_FUNCTIONS, budgetMs: 6 });
    const first = await q.analyse(project);
    expect(q.lastRoute).toBe('worker');
    expect(first?.analysis).toEqual(analyse(project));
    const edited = withThickness(project, project.layers[0].thickness_m + 0.1);
    const second = await q.analyse(edited);
    expect(q.lastRoute).toBe('local');
    expect(w.calls).toHaveLength(1);
    // the same answer as the worker would give
    expect(second?.analysis).toEqual(analyse(edited));
    // the page's own time replaces the worker's
    expect(q.knownMs(edited)).toBe(second?.timings.analyse);
  });

  it('keeps a slow shape in the worker, and a shape it has not seen (more layers) too', async () => {
    const w = worker(20);
    const q = createQuickPath({ slow: w.slow, local: () => ANALYSIS_FUNCTIONS, budgetMs: 6 });
    await q.analyse(project);
    await q.analyse(withThickness(project, 0.9));
    expect(q.lastRoute).toBe('worker');
    const quick = createQuickPath({ slow: worker(1).slow, local: () => ANALYSIS_FUNCTIONS, budgetMs: 6 });
    await quick.analyse(project);
    const another = PRESET_NAMES.map(loadPreset).find((x) => projectShape(x) !== projectShape(project));
    expect(another).toBeDefined();
    await quick.analyse(another!);
    expect(quick.lastRoute).toBe('worker');
  });

  it('uses the worker while the page has no analysis code loaded', async () => {
    const w = worker(1);
    let local: AnalysisFunctions | null = null;
    const q = createQuickPath({ slow: w.slow, local: () => local, budgetMs: 6 });
    await q.analyse(project);
    await q.analyse(project);
    expect(q.lastRoute).toBe('worker');
    local = ANALYSIS_FUNCTIONS;
    await q.analyse(project);
    expect(q.lastRoute).toBe('local');
  });

  it('learns from a slow page analysis and goes back to the worker', async () => {
    const w = worker(1);
    const slowFns: AnalysisFunctions = {
      ...ANALYSIS_FUNCTIONS,
      analyse: (p) => {
        const t = performance.now();
        while (performance.now() - t < 12); // a page analysis that took 12 ms
        return analyse(p);
      },
    };
    const q = createQuickPath({ slow: w.slow, local: () => slowFns, budgetMs: 6 });
    await q.analyse(project); // worker: 1 ms
    await q.analyse(project); // page: 12 ms
    expect(q.lastRoute).toBe('local');
    await q.analyse(project);
    expect(q.lastRoute).toBe('worker');
  });
});
