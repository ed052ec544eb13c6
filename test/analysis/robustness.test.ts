/**
 * Regression tests for issue 14 ("nothing a user types crashes it"), the analysis part: one test
 * per defect, each named after the defect it guards against.
 */
import { describe, it, expect } from 'vitest';
import { analyse } from '../../src/analysis';
import { solvePlateRitz } from '../../src/mechanics/plate-ritz';
import { NUMBERS, validateProject } from '../../src/model/validate';
import { reduceSpecimens } from '../../src/strength/specimens';
import { characteristicValue } from '../../src/strength/statistics';
import type { Project } from '../../src/model/types';
import { nonFinite, reportViolations } from '../fuzz/contract';
import { designExample } from './fixtures';

const tweak = (p: Project, f: (q: Project) => void): Project => {
  const q = structuredClone(p);
  f(q);
  return q;
};

/** Analyses, and checks the report contract (finite numbers, types, spans in [0, 100]) on the way. */
function analysed(p: Project) {
  const a = analyse(p);
  expect(reportViolations(p, a.report)).toEqual([]);
  expect(nonFinite(a.layers)).toEqual([]);
  return a.report;
}

describe('issue 14 item 1: tensile strength 0 means no tensile strength', () => {
  it('tensile strength 0 gives FS 0, not a crash, with a warning naming layers[0].tensile.value_MPa', () => {
    // "an uncemented sand has zero tensile strength" (METHODS §10, common practice)
    const r = analysed(tweak(designExample(), (q) => void (q.layers[0].tensile.value_MPa = 0)));
    const l = r.layers[0];
    expect(l.strength.design_MPa).toBe(0);
    expect(l.elastic.fsTension).toBe(0);
    expect(r.governing).toEqual({ layerIndex: 0, layer: 'Shale', mode: 'tension', fs: 0, target: 4 });
    const w = r.warnings.find((x) => x.code === 'NO_TENSILE_STRENGTH');
    expect(w?.path).toBe('layers[0].tensile.value_MPa');
    // FS 0 at every span: the tension mode fails even at 1 mm (METHODS §11 v2)
    expect(r.maxSpan_m!.tension).toBe(0);
  });

  it('specimens whose characteristic strength is 0 (a negative 5 % fractile, EN 1990 Annex D) give FS 0, not a crash', () => {
    const spread = [1, 1, 1, 30].map((kN, k) => ({ id: `B${k}`, diameter_mm: 54, thickness_mm: 27, peakLoad_kN: kN, valid: true }));
    const r = analysed(tweak(designExample(), (q) => {
      q.layers[0].tensile = { value_MPa: null, method: 'brazilian', specimens: spread };
      q.design.characteristic = 'lower5';
    }));
    expect(r.layers[0].strength.characteristic_MPa).toBe(0);
    expect(r.layers[0].elastic.fsTension).toBe(0);
    expect(r.warnings.some((w) => w.code === 'LOWER5_NEGATIVE')).toBe(true);
  });

  it('a cantilever with tensile strength 0 has FS 0 and a largest span of 0', () => {
    const r = analysed(tweak(designExample(), (q) => {
      q.opening = { type: 'cantilever', span_m: 2, length_m: null, ends: 'clamped', edges: null };
      q.layers[0].tensile.value_MPa = 0;
    }));
    expect(r.layers[0].elastic.fsTension).toBe(0);
    expect(r.maxSpan_m!.tension).toBe(0);
    expect(r.maxSpan_m!.governing).toBe(0);
  });
});

describe('issue 14 item 2: a slab longer than 100 spans', () => {
  // b/a → ∞ limits of METHODS §4 (the plane-strain strip): β → 1/2 clamped, 3/4 simple;
  // α → 12(1 − ν²)/384 clamped, 5·12(1 − ν²)/384 simple.
  it.each([
    ['clamped', 0.5, (12 * (1 - 0.25 ** 2)) / 384],
    ['simple', 0.75, (5 * 12 * (1 - 0.25 ** 2)) / 384],
  ] as const)('a %s slab with length/span 250 analyses as its plane-strain strip (β, α within half a per cent of the strip limit)', (ends, beta, alpha) => {
    const r = analysed(tweak(designExample(), (q) => void (q.opening = { type: 'slab', span_m: 2, length_m: 500, ends, edges: null })));
    const plate = r.layers[0].plate!;
    expect(Math.abs(plate.beta - beta) / beta).toBeLessThan(5e-3);
    expect(Math.abs(plate.alpha - alpha) / alpha).toBeLessThan(5e-3);
    expect(r.warnings.find((w) => w.code === 'SLAB_STRIP')?.path).toBe('opening.length_m');
  });

  it('the longest slab the validator accepts (100 km on a 1 cm span) analyses finitely', () => {
    analysed(tweak(designExample(), (q) => void (q.opening = { type: 'slab', span_m: 0.01, length_m: 100_000, ends: 'simple', edges: null })));
  });
});

describe('issue 14 item 3: finite but extreme values', () => {
  it.each([
    ['loads.horizontalStress_MPa', 1e308, (p: Record<string, any>, v: number) => void (p.loads.horizontalStress_MPa = v)],
    ['layers[0].ucs_MPa', 1e308, (p: Record<string, any>, v: number) => void (p.layers[0].ucs_MPa = v)],
    ['layers[0].thickness_m', 3.5e299, (p: Record<string, any>, v: number) => void (p.layers[0].thickness_m = v)],
    ['layers[0].thickness_m', 1e-300, (p: Record<string, any>, v: number) => void (p.layers[0].thickness_m = v)],
    ['layers[0].youngModulus_GPa', 5e-324, (p: Record<string, any>, v: number) => void (p.layers[0].youngModulus_GPa = v)],
    ['layers[0].tensile.specimens[0].thickness_mm', 5e-324, (p: Record<string, any>, v: number) => void (p.layers[0].tensile.specimens = [{ diameter_mm: 54, thickness_mm: v, peakLoad_kN: 9 }])],
    ['layers[0].tensile.specimens[0].peakLoad_kN', 1e308, (p: Record<string, any>, v: number) => void (p.layers[0].tensile.specimens = [{ diameter_mm: 54, thickness_mm: 27, peakLoad_kN: v }])],
  ])('%s = %s is refused with the field path and the bounds in the message', (path, value, set) => {
    const raw = JSON.parse(JSON.stringify(designExample())) as Record<string, any>;
    set(raw, value);
    const r = validateProject(raw);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toHaveLength(1);
    expect(r.errors[0].path).toBe(path);
    expect(r.errors[0].message).toMatch(new RegExp(`^${path.replace(/[[\].]/g, '\\$&')}: must be a number from -?[\\d.]+ to [\\d.]+( \\S+)?, got ${String(value).replace(/[.+]/g, '\\$&')}$`));
  });

  it('a project with every number at its bound analyses with finite numbers and never says "bending tension NaN MPa"', () => {
    for (const [lo, hi] of [[true, false], [false, true]]) {
      const p = tweak(designExample(), (q) => {
        q.opening.span_m = lo ? 0.01 : 1000;
        q.loads = { surcharge_kPa: hi ? 100_000 : 0, horizontalStress_MPa: hi ? 1000 : -1000 };
        q.support = { standing_kPa: lo ? 100_000 : 0 };
        const l = q.layers[0];
        l.thickness_m = lo ? 0.001 : 1000;
        l.youngModulus_GPa = lo ? 0.001 : 10_000;
        l.ucs_MPa = lo ? 0.01 : 1000;
        l.tensile.value_MPa = hi ? 100 : 0;
        l.jointing.crossJointSpacing_m = lo ? 0.001 : 10_000;
        l.hoekBrown.mi = lo ? 1 : 100;
        q.layers.push({ ...structuredClone(l), name: 'Second', thickness_m: hi ? 0.001 : 1000, youngModulus_GPa: hi ? 0.001 : 10_000 });
      });
      const r = analysed(p);
      expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
    }
  });
});

describe('issue 14 item 11: largest spans are in [0, 100] m, searched down to 1 mm', () => {
  it('a 0.57 m overhang of a 0.57 m bed with a tiny tensile strength reports its short largest span, not 0', () => {
    const p = tweak(designExample(), (q) => {
      q.opening = { type: 'cantilever', span_m: 0.57, length_m: null, ends: 'clamped', edges: null };
      q.layers[0].thickness_m = 0.57;
      q.layers[0].tensile.value_MPa = 0.02;
    });
    const r = analysed(p);
    const design = r.layers[0].strength.design_MPa * 1e6;
    const gamma = 25e3;
    const target = p.design.fsTarget.tension;
    // Cantilever root tension 3 q s²/t² with q = γ t (Obert & Duvall 1967), so FS = target at
    // s = √(σd t / (3 γ target)).
    const expected = Math.sqrt((design * 0.57) / (3 * gamma * target));
    expect(expected).toBeGreaterThan(0.01);
    expect(expected).toBeLessThan(0.1);
    const s = r.maxSpan_m!.tension!;
    expect(s).toBeGreaterThan(0);
    expect(s).toBeLessThanOrEqual(expected);
    expect(expected - s).toBeLessThanOrEqual(1e-3);
  });

  it('the tension span of a layer with cross-joints stops at its joint spacing (METHODS §11)', () => {
    // DESIGN example with a strong bed: tension alone would allow far more than 7 m.
    const p = tweak(designExample(), (q) => {
      q.layers[0].tensile.value_MPa = 20;
      q.layers[0].thickness_m = 2;
      q.layers[0].jointing.crossJointSpacing_m = 7;
    });
    const r = analysed(p);
    expect(r.layers[0].strength.crossJointed).toBe(false);
    const s = r.maxSpan_m!.tension!;
    expect(s).toBeLessThanOrEqual(7);
    expect(7 - s).toBeLessThanOrEqual(1e-3);
  });
});

describe('issue 14 item 12: the work behind a many-layer slab', () => {
  it('the Ritz deflection of a plate with every edge clamped or simple does not depend on ν (Timoshenko & Woinowsky-Krieger 1959, §10), so layers share one solve', () => {
    for (const supports of [{ x: [2, 2], y: [2, 2] }, { x: [1, 1], y: [1, 1] }] as const) {
      const a = solvePlateRitz(3.7, 0, supports, 10, 6);
      const b = solvePlateRitz(3.7, 0.45, supports, 10, 6);
      const scale = Math.max(...a.c.map(Math.abs));
      for (let k = 0; k < a.c.length; k++) expect(Math.abs(a.c[k] - b.c[k])).toBeLessThan(1e-9 * scale);
    }
  });

  it('a 40-layer slab whose layers differ only in ν: the layer with ν = 0.3 has the tabulated β, α (METHODS §4, Roark Table 11.4 case 1a, b/a = 2 simple)', () => {
    const base = tweak(designExample(), (q) => void (q.opening = { type: 'slab', span_m: 5, length_m: 10, ends: 'simple', edges: null }));
    const many = tweak(base, (q) => {
      q.layers = Array.from({ length: 40 }, (_, i) => ({ ...structuredClone(base.layers[0]), name: `L${i}`, poisson: i === 20 ? 0.3 : 0.1 + 0.0075 * i }));
    });
    const r = analysed(many);
    const plate = r.layers[20].plate!;
    expect(Math.abs(plate.beta - 0.6102) / 0.6102).toBeLessThan(5e-3);
    expect(Math.abs(plate.alpha - 0.1106) / 0.1106).toBeLessThan(5e-3);
    // α = 12(1 − ν²)·w D/(q a⁴) with w independent of ν: the layers' α scale exactly with 1 − ν²
    const ratio = r.layers[0].plate!.alpha / (1 - many.layers[0].poisson ** 2);
    for (const i of [7, 33, 39]) expect(r.layers[i].plate!.alpha / (1 - many.layers[i].poisson ** 2)).toBeCloseTo(ratio, 12);
  });
});

describe('issue 14 item 3, the lab reduction: specimens at the bounds give finite strengths', () => {
  it('discs of 1 and 1000 mm with loads of 0.001 and 10 000 kN (the NUMBERS bounds) reduce to finite, positive Brazilian strengths and statistics', () => {
    const { specimenSize, peakLoad } = NUMBERS;
    const discs = [];
    for (const d of [specimenSize.min, specimenSize.max]) for (const p of [peakLoad.min, peakLoad.max]) {
      discs.push({ id: `d${d}p${p}`, diameter: d / 1e3, thickness: Math.min(d, specimenSize.min) / 1e3, peakLoad: p * 1e3, valid: true });
    }
    const red = reduceSpecimens(discs);
    expect(red.accepted).toHaveLength(4);
    // σt = 2P/(πDL) (ISRM 1978): 1 N on a 1000 mm × 1 mm disc is the smallest, 10 000 kN on 1 mm × 1 mm the largest
    expect(Math.min(...red.accepted.map((a) => a.brazilian))).toBeCloseTo((2 * 1) / (Math.PI * 1 * 1e-3), 6);
    expect(Math.max(...red.accepted.map((a) => a.brazilian))).toBeCloseTo((2 * 1e7) / (Math.PI * 1e-3 * 1e-3), -3);
    for (const rule of ['mean', 'lower5'] as const) {
      const c = characteristicValue(red.accepted.map((a) => a.brazilian), rule);
      expect(nonFinite(c)).toEqual([]);
      expect(c.value).toBeGreaterThanOrEqual(0);
    }
  });
});
