/**
 * Bolts through the real analysis path (METHODS §12 check values): suspension (statics,
 * Obert & Duvall's suspension principle), beam building (transformed section; beam shear
 * formula, Gere & Timoshenko), the skin between bolts, the anchorage straddling an interface,
 * the empirical cross-check (Barton, Lien & Lunde 1974, from memory). Anchorage 0.3 m and bolt
 * target 1.5 are "common practice".
 */
import { describe, expect, it } from 'vitest';
import { all, create, type Unit } from 'mathjs';
import { analyse } from '../../src/analysis/analyse';
import { defaultLayer, defaultProject } from '../../src/model/defaults';
import { validateProject } from '../../src/model/validate';
import type { CheckRow, Project, Report } from '../../src/model/types';

type Json = any; // eslint-disable-line @typescript-eslint/no-explicit-any

function project(edit: (p: Json) => void): Project {
  const p: Json = JSON.parse(JSON.stringify(defaultProject()));
  edit(p);
  const r = validateProject(p);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return r.project;
}
const layer = (extra: Json): Json => ({ ...JSON.parse(JSON.stringify(defaultLayer())), ...extra });
const rowsOf = (r: Report, mode: CheckRow['mode']): CheckRow[] => r.checks.filter((c) => c.mode === mode);

/** A 0.5 m immediate roof (25 kN/m³) under a 2 m anchor bed; 1.8 m bolts at 1.2 × 1.2 m (zone 1.5–1.8 m). */
const suspensionProject = (extra: Json = {}, standing = 0): Project => project((p) => {
  p.layers = [layer({ name: 'Shale', thickness_m: 0.5, unitWeight_kNm3: 25 }), layer({ name: 'Sandstone', thickness_m: 2, unitWeight_kNm3: 25, youngModulus_GPa: 20 })];
  p.support = { standing_kPa: standing, bolts: { length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2, ...extra } };
});

describe('suspension (METHODS §12)', () => {
  it('25 kN/m³, 0.5 m, 1.2 × 1.2 m → 18.0 kN per bolt; a 100 kN bolt → FS 5.56 (METHODS §12 check, statics)', () => {
    const r = analyse(suspensionProject()).report;
    expect(r.support?.bolts?.load_kN).toBeCloseTo(18.0, 9);
    expect(r.support?.bolts?.fsBolt).toBeCloseTo(100 / 18, 9);
    expect(r.support?.bolts?.anchorLayer).toBe(1);
    expect(r.support?.bolts?.suspended).toEqual([0]);
    const bolt = rowsOf(r, 'bolt');
    expect(bolt).toHaveLength(1);
    expect(bolt[0].counts).toBe(true);
    expect(bolt[0].target).toBe(1.5);
    expect(bolt[0].fs).toBeCloseTo(5.56, 2);
  });

  it('standing support relieves the bolts first: 5 kPa → (12.5 − 5) kPa × 1.44 m² = 10.8 kN (statics)', () => {
    const r = analyse(suspensionProject({}, 5)).report;
    expect(r.support?.bolts?.load_kN).toBeCloseTo(10.8, 9);
  });

  it('the suspended weight moves to the anchor layer: its load is 50 + 12.5 kPa (statics); the hanging layer carries 0', () => {
    const r = analyse(suspensionProject()).report;
    expect(r.layers[0].load_kPa).toBe(0);
    expect(r.layers[1].load_kPa).toBeCloseTo(62.5, 9);
  });

  it('suspended layers no longer span the opening: their own rows do not count, their skin row counts', () => {
    const r = analyse(suspensionProject()).report;
    for (const c of r.checks.filter((c) => c.layerIndex === 0 && ['tension', 'crushing', 'sliding', 'deflection', 'snapThrough'].includes(c.mode))) {
      expect(c.counts).toBe(false);
      expect(c.reason).toBe('suspended from the bolts');
    }
    const skin = rowsOf(r, 'skin');
    expect(skin).toHaveLength(1);
    expect(skin[0].layerIndex).toBe(0);
    expect(skin[0].counts).toBe(true);
    // clamped skin of span 1.2 m: σ = γ s²/(2t) = 25e3 × 1.44 / 1.0 = 36 kPa (Obert & Duvall §1 formula)
    expect(skin[0].demand).toBeCloseTo(0.036, 9);
  });

  it('a cracked skin (joints closer than the spacing) is a voussoir on the spacing; its sliding FS is shown, not counted', () => {
    const p = suspensionProject();
    p.layers[0].jointing.crossJointSpacing_m = 0.5;
    const skin = rowsOf(analyse(p).report, 'skin')[0];
    expect(skin.note).toContain('cracked skin');
    expect(skin.note).toContain('the bolt plates hold the skin');
    expect(skin.counts).toBe(true);
  });

  it('an anchorage zone across an interface earns no credit, with a warning naming both layers', () => {
    // zone [0.3, 0.6] m crosses the 0.5 m interface
    const r = analyse(suspensionProject({ length_m: 0.6 })).report;
    const w = r.warnings.find((x) => x.code === 'ANCHOR_AT_INTERFACE');
    expect(w?.message).toContain('Shale');
    expect(w?.message).toContain('Sandstone');
    expect(r.support?.bolts?.anchorLayer).toBe(null);
    expect(r.support?.bolts?.suspended).toEqual([]);
    expect(r.layers[0].load_kPa).toBeGreaterThan(0);
    const bolt = rowsOf(r, 'bolt')[0];
    expect(bolt.counts).toBe(false);
    expect(bolt.reason).toContain('no anchorage credited');
  });

  it('without bolts the report has no bolt rows and support is null', () => {
    const r = analyse(defaultProject()).report;
    expect(r.support).toBe(null);
    expect(r.checks.some((c) => ['bolt', 'skin', 'interlayerShear'].includes(c.mode))).toBe(false);
  });
});

/** Three equal 0.3 m layers (25 kN/m³, 10 GPa) under a stiff 2 m bed that separates; 6 m clamped; 1 × 1 m grouted bolts 1.25 m long. */
const beamBuilding = (capacity_kN: number): Project => project((p) => {
  const bed = (name: string): Json => layer({ name, thickness_m: 0.3, unitWeight_kNm3: 25, youngModulus_GPa: 10 });
  p.layers = [bed('A'), bed('B'), bed('C'), layer({ name: 'Roof rock', thickness_m: 2, unitWeight_kNm3: 25, youngModulus_GPa: 60 })];
  p.support = { standing_kPa: 0, bolts: { length_m: 1.25, capacity_kN, spacingAcross_m: 1, spacingAlong_m: 1, action: 'beamBuilding' } };
});

describe('beam building (METHODS §12)', () => {
  it('three equal 0.3 m layers, 6 m clamped: unbonded 1.500 MPa, bonded 0.500 MPa, τ = 100.0 kPa at both interfaces (METHODS §12 check)', () => {
    // 300 kN bolt → shear capacity 180 kN over 1 m² = 180 kPa ≥ 1.5 × 100 kPa: composite credited.
    const r = analyse(beamBuilding(300)).report;
    expect(r.layers.slice(0, 3).map((l) => l.elastic.maxTension_MPa)).toEqual([1.5, 1.5, 1.5].map((x) => expect.closeTo(x, 9)));
    const shear = rowsOf(r, 'interlayerShear');
    expect(shear.map((s) => s.demand)).toEqual([expect.closeTo(100, 9), expect.closeTo(100, 9)]);
    expect(shear.map((s) => s.fs)).toEqual([expect.closeTo(1.8, 9), expect.closeTo(1.8, 9)]);
    expect(r.support?.bolts?.composite).toEqual({ credited: true, fsShear: expect.closeTo(1.8, 9) });
    const tension = rowsOf(r, 'tension');
    // the top fibre of the top bonded layer at the abutment: γ s²/(2T) = 0.5 MPa
    expect(tension[2].demand).toBeCloseTo(0.5, 9);
    expect(tension[2].note).toContain('bonded');
  });

  it('below the bolt target the bonded bound is not credited: the unbonded 1.5 MPa counts and the row says why', () => {
    // 200 kN → 120 kPa against 100 kPa: FS 1.2 < 1.5.
    const r = analyse(beamBuilding(200)).report;
    expect(r.support?.bolts?.composite?.credited).toBe(false);
    const tension = rowsOf(r, 'tension');
    expect(tension[2].demand).toBeCloseTo(1.5, 9);
    expect(tension[2].note).toContain('not credited');
    for (const s of rowsOf(r, 'interlayerShear')) {
      expect(s.counts).toBe(false);
      expect(s.status).toBe('info');
    }
  });
});

describe('empirical cross-check (Barton, Lien & Lunde 1974; memory)', () => {
  it('Q = 10, ESR 1.6 → 8.04 m; B = 6 m, ESR 1.6 → 2.56 m; never a check row', () => {
    const p = project((q) => {
      q.layers[0].jointing.rqd = 90;
      q.empirical = { q: { jn: 9, jr: 1.5, ja: 1.5, jw: 1, srf: 1, esr: 1.6 } };
    });
    const r = analyse(p).report;
    expect(r.empirical?.q).toBeCloseTo(10, 9);
    expect(r.empirical?.unsupportedSpan_m).toBeCloseTo(8.04, 2);
    expect(r.empirical?.boltLength_m).toBeCloseTo(2.5625, 9);
    expect(r.empirical?.note).toContain('case histories');
  });
});

describe('trace of the support numbers', () => {
  const math = create(all);
  it('every new entry reproduces its value when evaluated by mathjs', () => {
    const p = suspensionProject({}, 5);
    p.layers[0].jointing.rqd = 90;
    p.empirical = { q: { jn: 9, jr: 1.5, ja: 1.5, jw: 1, srf: 1, esr: 1.6 } };
    const entries = [...analyse(p).report.trace, ...analyse(beamBuilding(200)).report.trace].filter((e) => e.path.startsWith('support') || e.path.startsWith('empirical') || e.path === 'layers[0].load_kPa');
    expect(entries.map((e) => e.path)).toEqual(expect.arrayContaining(['support.bolts.load_kN', 'support.bolts.fsBolt', 'support.bolts.composite.fsShear', 'empirical.q', 'empirical.unsupportedSpan_m', 'empirical.boltLength_m']));
    for (const e of entries) {
      const scope: Record<string, number | Unit> = {};
      for (const [k, v] of Object.entries(e.values)) scope[k] = v.unit === '' ? v.value : math.unit(v.value, v.unit);
      const out = math.evaluate(e.formula, scope) as number | Unit;
      const value = typeof out === 'number' ? out : e.unit === '' ? out.toNumber('') : out.toNumber(e.unit);
      expect(Math.abs(value - e.result) / Math.max(Math.abs(e.result), 1e-9), e.path).toBeLessThan(1e-7);
    }
  });
});

describe('every accepted bolt pattern analyses with finite numbers', () => {
  it('property: patterns within the hard bounds over two to four random layers never throw or give NaN/Infinity', async () => {
    const fc = (await import('fast-check')).default;
    fc.assert(fc.property(
      fc.array(fc.record({ t: fc.double({ min: 0.05, max: 3, noNaN: true }), E: fc.double({ min: 0.5, max: 60, noNaN: true }), joints: fc.option(fc.double({ min: 0.05, max: 10, noNaN: true })) }), { minLength: 2, maxLength: 4 }),
      fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0.01, max: 0.9, noNaN: true }),
      fc.double({ min: 0.1, max: 10, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }),
      fc.double({ min: 1e-3, max: 5000, noNaN: true }), fc.constantFrom('suspension', 'beamBuilding'), fc.double({ min: 0, max: 1, noNaN: true }),
      fc.double({ min: 1, max: 30, noNaN: true }), fc.constantFrom(0, 50, 500),
      (beds, lf, af, sx, sy, cap, action, pf, span, standing) => {
        const strata = beds.reduce((s, b) => s + b.t, 0);
        const length = Math.max(0.1, Math.min(20, lf * strata));
        if (length > strata) return;
        const p = project((q) => {
          q.opening.span_m = span;
          q.layers = beds.map((b, i) => layer({ name: `L${i + 1}`, thickness_m: b.t, youngModulus_GPa: b.E, jointing: { ...q.layers[0].jointing, crossJointSpacing_m: b.joints } }));
          q.support = { standing_kPa: standing, bolts: { length_m: length, anchorage_m: Math.max(1e-3, af * length), capacity_kN: cap, spacingAcross_m: sx, spacingAlong_m: sy, action, pretension_kN: pf * cap } };
        });
        // JSON.stringify would turn NaN into null, so walk the report and test every number.
        const bad: string[] = [];
        const walk = (v: unknown, path: string): void => {
          if (typeof v === 'number') { if (!Number.isFinite(v)) bad.push(path); }
          else if (Array.isArray(v)) v.forEach((x, i) => walk(x, `${path}[${i}]`));
          else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, `${path}.${k}`);
        };
        walk(analyse(p).report, 'report');
        expect(bad).toEqual([]);
      },
    ), { numRuns: 60 });
  }, 120_000);
});
