import { describe, expect, it } from 'vitest';
import {
  DEFAULT_FS_TARGET,
  DEFAULT_MI,
  DEFAULT_TENSION_TARGET,
  defaultDesign,
  defaultLayer,
  defaultProject,
} from '../../src/model/defaults';
import { validateProject } from '../../src/model/validate';

describe('defaults', () => {
  it('defaultProject() is a valid one-layer clamped beam of 6 m with no warnings', () => {
    const p = defaultProject();
    expect(p.layers).toHaveLength(1);
    expect(p.opening).toStrictEqual({ type: 'beam', span_m: 6, length_m: null, ends: 'clamped', edges: null });
    expect(p.support).toStrictEqual({ standing_kPa: 0 });
    const r = validateProject(p);
    expect(r.ok).toBe(true);
    expect(r.warnings).toEqual([]);
  });

  it('defaultLayer() fills every field with a value that validates', () => {
    const l = defaultLayer();
    expect(Object.keys(l).sort()).toEqual([
      'hoekBrown', 'jointing', 'modulusBasis', 'name', 'poisson', 'rockClass', 'tensile',
      'thickness_m', 'ucs_MPa', 'unitWeight_kNm3', 'youngModulus_GPa',
    ]);
    const p = defaultProject();
    p.layers = [l, { ...defaultLayer(), name: 'Layer 2' }];
    expect(validateProject(p).ok).toBe(true);
  });

  it('default FS targets: tension 2 on the rock-mass basis (common practice 1.5–2, METHODS §10, memory), 4 on the lab basis (Obert & Duvall, memory); crushing 2, sliding 1.5', () => {
    expect(DEFAULT_TENSION_TARGET).toStrictEqual({ rockMass: 2, lab: 4 });
    expect(DEFAULT_FS_TARGET).toStrictEqual({ tension: 2, crushing: 2, sliding: 1.5 });
    expect(defaultDesign().fsTarget).toStrictEqual({ tension: 2, crushing: 2, sliding: 1.5 });
    expect(defaultDesign().tensileBasis).toBe('rockMass');
    expect(defaultDesign().crushingStrength).toBe('rockMass');
  });

  it('default mi by rock class: sedimentary 7, igneous 25, metamorphic 12 (Hoek 2007 tables, from memory)', () => {
    expect(DEFAULT_MI).toStrictEqual({ sedimentary: 7, igneous: 25, metamorphic: 12 });
  });

  it('each call returns fresh objects (no shared mutable state)', () => {
    const a = defaultProject();
    a.layers[0].tensile.specimens.push({ id: 'x', diameter_mm: 54, thickness_mm: 27, peakLoad_kN: 9, valid: true });
    a.design.fsTarget.tension = 9;
    a.loads.surcharge_kPa = 5;
    const b = defaultProject();
    expect(b.layers[0].tensile.specimens).toEqual([]);
    expect(b.design.fsTarget.tension).toBe(2);
    expect(b.loads.surcharge_kPa).toBe(0);
  });
});
