import { describe, expect, it } from 'vitest';
import { clearDemoText, demoLeftover, demoLeftoverText, DEMO_MARK } from '../../src/model/demo-leftover';
import { DEMO_PRESETS } from '../../src/model/demo-presets';
import { validateProject } from '../../src/model/validate';
import { defaultProject } from '../../src/model/defaults';
import type { Project } from '../../src/model/types';

// The rule checked here is DEVELOPERS.md's: demo data is invented and says so in its title;
// that text must not survive into a project whose values are no longer the demo's.
const load = (i: number): Project => {
  const r = validateProject(structuredClone(DEMO_PRESETS[i].data));
  if (!r.ok) throw new Error('preset refused');
  return r.project;
};

describe('demoLeftover', () => {
  it('every demo says "invented data" in its title and description, and is not flagged as shipped', () => {
    DEMO_PRESETS.forEach((d, i) => {
      const p = load(i);
      expect(DEMO_MARK.test(p.title), d.id).toBe(true);
      expect(DEMO_MARK.test(p.description ?? ''), d.id).toBe(true);
      expect(demoLeftover(p), d.id).toBeNull();
    });
  });

  it("matching a demo's text on the file as shipped is matching it on the loaded project (validation keeps the title and description as they are)", () => {
    // demoLeftover reads the demos' text from the shipped files and validates a demo only to
    // compare values with it, so the two must agree for every demo
    DEMO_PRESETS.forEach((d, i) => {
      const raw = d.data as { title?: unknown; description?: unknown };
      expect(raw.title, d.id).toBe(load(i).title);
      expect(raw.description, d.id).toBe(load(i).description);
    });
  });

  it('a changed demo that keeps its title and description is flagged, naming the demo', () => {
    const p = load(0);
    p.opening.span_m = 7;
    const l = demoLeftover(p);
    expect(l).toEqual({ preset: DEMO_PRESETS[0].id, presetTitle: load(0).title, fields: ['title', 'description'] });
    expect(demoLeftoverText(l!)).toMatch(/title and description come from the demo “Demo \(invented data\)/);
  });

  it('a new title alone does not hide a kept description; a unit round trip is not a change', () => {
    const p = load(1);
    p.title = 'Haulage drift 3 North';
    p.layers[0].ucs_MPa = 71;
    expect(demoLeftover(p)?.fields).toEqual(['description']);
    const q = load(1);
    // 4.5 m → ft → m, as the US display would give it back (1 ft = 0.3048 m, METHODS §13)
    q.opening.span_m = (q.opening.span_m / 0.3048) * 0.3048;
    expect(demoLeftover(q)).toBeNull();
  });

  it('text carrying the mark is flagged even when edited; a project of its own is not', () => {
    const p = defaultProject();
    p.description = 'Copied from a demo (invented data) and adjusted';
    expect(demoLeftover(p)).toEqual({ preset: null, presetTitle: null, fields: ['description'] });
    expect(demoLeftover(defaultProject())).toBeNull();
  });

  it('clearDemoText sets the default title, drops the description, and keeps every value', () => {
    const p = load(2);
    p.opening.span_m = 2.5;
    const cleared = clearDemoText(p, demoLeftover(p)!);
    expect(cleared.title).toBe('Untitled project');
    expect(cleared.description).toBeUndefined();
    expect(cleared.opening.span_m).toBe(2.5);
    expect(demoLeftover(cleared)).toBeNull();
    expect(validateProject(cleared).ok).toBe(true);
  });
});
