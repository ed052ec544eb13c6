import { describe, it, expect } from 'vitest';
import { analyse, analyseProject, meetsTargets } from '../../src/analysis';
import { evaluate } from '../../src/analysis/evaluate';
import { projectToSI } from '../../src/analysis/inputs';
import { spanFsFunction } from '../../src/analysis/span-finder';
import { targetFor } from '../../src/analysis/check-table';
import type { Mode, Project } from '../../src/model/types';
import { expectClose } from '../helpers/expect-close';
import { designExample, presets, randomProject } from './fixtures';

const tweak = (p: Project, f: (q: Project) => void): Project => {
  const q = structuredClone(p);
  f(q);
  return q;
};

describe('analyseProject — the DESIGN.md report example (one shale layer, 6 m clamped span)', () => {
  const r = analyseProject(designExample());
  const l = r.layers[0];
  // Check values: DESIGN.md "Report" example, computed there from METHODS.md; printed to 3–4 digits.
  it('strength chain: lab 3.0 → direct 2.1 → characteristic 2.1 → block 1.659, mass 0.404 → design 0.404', () => {
    expectClose(l.strength.lab_MPa, 3.0);
    expectClose(l.strength.direct_MPa, 2.1);
    expectClose(l.strength.characteristic_MPa, 2.1);
    expectClose(l.strength.block_MPa, 1.659, 5e-4);
    expectClose(l.strength.mass_MPa, 0.404, 2e-3);
    expectClose(l.strength.design_MPa, 0.404, 2e-3);
    expectClose(l.strength.rqd, 96.3, 5e-4);
    expectClose(l.strength.gsi, 78.2, 1e-3);
    expect(l.strength.crossJointed).toBe(false);
  });
  it('elastic beam: abutment 1.0 MPa, midspan 0.5 MPa, 0.625 mm, FS 0.404, Euler 148.0 MPa', () => {
    expectClose(l.elastic.abutmentTension_MPa, 1.0, 1e-12);
    expectClose(l.elastic.midspanTension_MPa!, 0.5, 1e-12);
    expect(l.elastic.at).toBe('abutment');
    expectClose(l.elastic.deflection_mm, 0.625, 1e-12);
    expectClose(l.elastic.fsTension!, 0.404, 2e-3);
    expectClose(l.elastic.bucklingStress_MPa, 148.0, 5e-4);
    expect(l.load_kPa).toBeCloseTo(11.25, 12);
  });
  it('voussoir: n 0.74, z 0.2256 m, fc 1.348 MPa, δ 2.36 mm, δ/t 0.0052, FS 29.7 crushing, 4.65 sliding', () => {
    const v = l.voussoir!;
    expect(Math.abs(v.n! - 0.74)).toBeLessThan(0.01);
    expectClose(v.leverArm_m!, 0.2256, 5e-4);
    expectClose(v.maxCompression_MPa!, 1.348, 5e-4);
    expectClose(v.deflection_mm!, 2.36, 2e-3);
    expectClose(v.deflectionRatio!, 0.0052, 1e-2);
    expectClose(v.fsCrushing!, 29.7, 2e-3);
    // DESIGN.md prints 4.65, from the 0.01 sweep's n = 0.74; the exact minimum (n = 0.7401) gives 4.656.
    expectClose(v.fsSliding!, 4.65, 3e-3);
    expect(v.snapThrough).toBe(false);
  });
  it('largest spans (DESIGN.md report): tension 1.908 m; the voussoir modes count only once the layer is cracked (METHODS §11 v2): crushing 15.35, snap-through 15.46, deflection 12.58 on the jointed basis', () => {
    const m = r.maxSpan_m!;
    expect(Math.abs(m.tension! - 1.908)).toBeLessThan(1.5e-3);
    // intact basis, the shale does not crack (joints 8 m > 6 m): its voussoir is reserve, so no voussoir span limit
    expect(m.crushing).toBeNull();
    expect(m.snapThrough).toBeNull();
    expect(m.deflection).toBeNull();
    expect(m.sliding).toBeNull();
    expect(m.governing).toBe(m.tension);
    const j = analyseProject(tweak(designExample(), (q) => void (q.design.basis = 'jointed'))).maxSpan_m!;
    expect(j.tension).toBeNull();
    expect(Math.abs(j.crushing! - 15.35)).toBeLessThan(6e-3);
    expect(Math.abs(j.snapThrough! - 15.46)).toBeLessThan(6e-3);
    expect(Math.abs(j.deflection! - 12.58)).toBeLessThan(6e-3);
  });
  it('governing: tension in the shale (layer index 0) with FS 0.404, below its target of 4', () => {
    expect(r.governing).toEqual({ layerIndex: 0, layer: 'Shale', mode: 'tension', fs: l.elastic.fsTension, target: 4 });
    expect(meetsTargets(designExample(), r)).toBe(false);
  });
  it('basis "jointed" takes the roof as cracked: tension reported but not governing (METHODS §10)', () => {
    const p = tweak(designExample(), (q) => void (q.design.basis = 'jointed'));
    const j = analyseProject(p);
    expect(j.layers[0].elastic.fsTension).toBeCloseTo(l.elastic.fsTension!, 12);
    expect(j.governing!.mode).not.toBe('tension');
    expect(j.maxSpan_m!.governing).toBe(Math.min(j.maxSpan_m!.crushing!, j.maxSpan_m!.snapThrough!, j.maxSpan_m!.deflection!));
    expect(meetsTargets(p, j)).toBe(true);
  });
});

describe('analyse — rules of METHODS §1–§4, §10, §11', () => {
  it('a cross-jointed layer has no tensile strength: design 0, FS tension null, voussoir governs (common practice)', () => {
    const p = tweak(designExample(), (q) => void (q.layers[0].jointing.crossJointSpacing_m = 2));
    const r = analyse(p).report;
    expect(r.layers[0].strength.crossJointed).toBe(true);
    expect(r.layers[0].strength.design_MPa).toBe(0);
    expect(r.layers[0].elastic.fsTension).toBeNull();
    expect(r.governing!.mode).not.toBe('tension');
    expect(r.maxSpan_m!.tension).toBeNull();
    expect(r.warnings.some((w) => w.code === 'CROSS_JOINTED')).toBe(true);
  });
  it('a cantilever has no voussoir (a jointed overhang has no capacity) and only a tension span', () => {
    const p = tweak(designExample(), (q) => void Object.assign(q.opening, { type: 'cantilever', span_m: 1.5 }));
    const r = analyse(p).report;
    expect(r.layers[0].voussoir).toBeNull();
    expect(r.layers[0].elastic.at).toBe('root');
    expect(r.layers[0].elastic.midspanTension_MPa).toBeNull();
    // 3 q s²/t² = 3·11.25 kPa·2.25/0.2025 = 0.375 MPa (METHODS §1 table, hand arithmetic)
    expectClose(r.layers[0].elastic.maxTension_MPa, 0.375, 1e-12);
    expect(r.maxSpan_m!.crushing).toBeNull();
    expect(r.maxSpan_m!.governing).toBe(r.maxSpan_m!.tension);
    const jointed = analyse(tweak(p, (q) => void (q.layers[0].jointing.crossJointSpacing_m = 1))).report;
    expect(jointed.layers[0].elastic.fsTension).toBe(0);
    expect(jointed.governing!.fs).toBe(0);
  });
  it('horizontal stress above the bending tension: no net tension, FS tension null with a warning', () => {
    const r = analyse(tweak(designExample(), (q) => void (q.loads.horizontalStress_MPa = 2))).report;
    expect(r.layers[0].elastic.maxTension_MPa).toBeCloseTo(-1, 12);
    expect(r.layers[0].elastic.fsTension).toBeNull();
    expect(r.warnings.some((w) => w.code === 'NO_NET_TENSION')).toBe(true);
  });
  it('σh ≥ σcr/2 warns of buckling, σh ≥ σcr is an error-level warning (METHODS §1)', () => {
    const half = analyse(tweak(designExample(), (q) => void (q.loads.horizontalStress_MPa = 80))).report;
    expect(half.warnings.find((w) => w.code === 'BUCKLING_RISK')).toBeTruthy();
    const full = analyse(tweak(designExample(), (q) => void (q.loads.horizontalStress_MPa = 150))).report;
    expect(full.warnings.find((w) => w.code === 'BUCKLING')?.level).toBe('error');
  });
  it('a stiff bed above separates (METHODS §2 check): two groups, each carrying its own weight', () => {
    const p = tweak(designExample(), (q) => {
      q.layers[0].thickness_m = 0.5;
      q.layers[0].unitWeight_kNm3 = 25;
      q.layers[0].youngModulus_GPa = 10;
      q.layers.push({ ...structuredClone(q.layers[0]), name: 'Stiff', thickness_m: 1.0, youngModulus_GPa: 20 });
    });
    const a = analyse(p);
    expect(a.report.layers.map((l) => l.group)).toEqual([0, 1]);
    expectClose(a.report.layers[0].load_kPa, 12.5);
    expectClose(a.report.layers[1].load_kPa, 25);
    expect(a.separations).toEqual([[0, 1]]);
    expect(a.report.warnings.some((w) => w.code === 'BED_SEPARATION')).toBe(true);
  });
  it('a soft bed above loads the bed below (METHODS §2 check): one group, 18.05 kPa on bed 1', () => {
    const p = tweak(designExample(), (q) => {
      q.layers[0].thickness_m = 0.5;
      q.layers[0].youngModulus_GPa = 10;
      q.layers.push({ ...structuredClone(q.layers[0]), name: 'Soft', thickness_m: 0.3, youngModulus_GPa: 5 });
    });
    const r = analyse(p).report;
    expect(r.layers.map((l) => l.group)).toEqual([0, 0]);
    expectClose(r.layers[0].load_kPa, 18.05, 2e-4);
    // loads in the group sum to its weight: 12.5 + 7.5 kPa
    expectClose(r.layers[0].load_kPa + r.layers[1].load_kPa, 20);
  });
  it('a slab uses the plate stress for tension and warns that the voussoir uses the short span', () => {
    const p = tweak(designExample(), (q) => void Object.assign(q.opening, { type: 'slab', length_m: 6 }));
    const r = analyse(p).report;
    const plate = r.layers[0].plate!;
    // Square clamped plate: β ≈ 0.3078 (METHODS §4, Timoshenko & Woinowsky-Krieger 1959, from memory)
    expect(Math.abs(plate.beta - 0.3078) / 0.3078).toBeLessThan(5e-3);
    expectClose(plate.maxTension_MPa, (plate.beta * 11.25e3 * 36) / 0.2025 / 1e6, 1e-9);
    expectClose(r.layers[0].elastic.fsTension!, r.layers[0].strength.design_MPa / plate.maxTension_MPa, 1e-12);
    expect(r.warnings.some((w) => w.code === 'SLAB_PLANE_STRAIN')).toBe(true);
    // A long slab tends to the beam: β → 1/2 for clamped edges (METHODS §4 plane-strain limit)
    const long = analyse(tweak(p, (q) => void (q.opening.length_m = 60))).report;
    expect(Math.abs(long.layers[0].plate!.maxTension_MPa - long.layers[0].elastic.maxTension_MPa) / long.layers[0].elastic.maxTension_MPa).toBeLessThan(0.01);
  });
  it('the presets analyse without error and produce no NaN or Infinity', () => {
    for (const { file, project } of presets()) {
      const r = analyseProject(project);
      const text = JSON.stringify(r);
      expect(text, file).not.toMatch(/NaN|Infinity|null,"trace"/);
      expect(r.layers.length).toBe(project.layers.length);
    }
  });
  it('300 generated projects analyse with finite numbers only (JSON has no NaN/Infinity)', { timeout: 120_000 }, () => {
    for (let seed = 100; seed < 400; seed++) {
      const r = analyseProject(randomProject(seed));
      const walk = (x: unknown, path: string): void => {
        if (typeof x === 'number') expect(Number.isFinite(x), `seed ${seed} ${path}`).toBe(true);
        else if (x && typeof x === 'object') for (const [k, v] of Object.entries(x)) walk(v, `${path}.${k}`);
      };
      walk(r, '');
    }
  });
});

describe('span and FS — properties (METHODS §11)', () => {
  it('FS never increases with span for tension, crushing and deflection (100 generated projects)', { timeout: 60_000 }, () => {
    for (let seed = 1000; seed < 1100; seed++) {
      const project = randomProject(seed);
      const p = projectToSI(project);
      const fsAt = spanFsFunction(p, evaluate(p));
      let prev: Record<Mode, number | null> | null = null;
      for (const s of [0.5, 1, 2, 3, 5, 8, 12, 18, 27, 40]) {
        const now = fsAt(s);
        if (prev) for (const m of ['tension', 'crushing', 'deflection'] as Mode[]) {
          if (prev[m] !== null && now[m] !== null) expect(now[m]!, `seed ${seed} ${m} at ${s} m`).toBeLessThanOrEqual(prev[m]! * (1 + 1e-9));
        }
        prev = now;
      }
    }
  });
  it('at the returned largest span FS equals the target (within 1 mm) and exceeds it just below', { timeout: 60_000 }, () => {
    let checked = 0;
    for (let seed = 2000; seed < 2080; seed++) {
      const project = randomProject(seed);
      const p = projectToSI(project);
      const state = evaluate(p);
      const fsAt = spanFsFunction(p, state);
      const r = analyseProject(project);
      for (const m of ['tension', 'crushing', 'deflection'] as Mode[]) {
        const s = r.maxSpan_m![m];
        if (s === null || s >= 100 || s < 0.01) continue;
        const target = targetFor(m, project.design);
        expect(fsAt(s - 1e-4)[m]! / target, `seed ${seed} ${m} below ${s}`).toBeGreaterThanOrEqual(1);
        expect(fsAt(s + 1e-3)[m]! / target, `seed ${seed} ${m} above ${s}`).toBeLessThan(1);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(50);
  });
  it('tension FS ∝ 1/s² for the intact beam without horizontal stress (METHODS §1 scaling)', () => {
    const p = projectToSI(designExample());
    const fsAt = spanFsFunction(p, evaluate(p));
    expectClose(fsAt(3).tension! / fsAt(6).tension!, 4, 1e-12);
  });
});
