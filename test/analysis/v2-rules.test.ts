import { describe, expect, it } from 'vitest';
import { analyse, buildVerdict, spanCurve } from '../../src/analysis';
import { intersectionDiagonal } from '../../src/analysis/inputs';
import { solveVoussoir } from '../../src/mechanics/voussoir';
import { characteristicValue } from '../../src/strength/statistics';
import { fsSpanSvg } from '../../src/report/charts';
import { parseProject } from '../../src/model/validate';
import type { Project } from '../../src/model/types';
import { expectClose } from '../helpers/expect-close';
import { presets } from './fixtures';

const coalRoom = (): Project => structuredClone(presets().find((p) => p.file.endsWith('coal-room-shale.lamina.json'))!.project);

/** A plain layer (invented values). */
const bed = (name: string, thickness: number, extra: Record<string, unknown> = {}) => ({
  name, thickness_m: thickness, unitWeight_kNm3: 25, youngModulus_GPa: 10, ucs_MPa: 60, tensile: { value_MPa: 6 },
  jointing: { jointCondition: 20, jointFriction_deg: 30 }, hoekBrown: { mi: 7 }, ...extra,
});

const project = (raw: Record<string, unknown>): Project => parseProject({ schema: 'lamina/2', ...raw }).project;

describe('METHODS §3a — horizontal stress, crushing strength, deep beams and blocks', () => {
  it('σh = 3 MPa leaves n, z, fc and FS sliding of the σh = 0 voussoir unchanged; FS crushing = σc/(fc + 3 MPa) (METHODS §3a check)', () => {
    const base = { span: 10, thickness: 1, unitWeight: 25e3, modulus: 10e9, ucs: 60e6, frictionDeg: 30 };
    const a = solveVoussoir(base);
    const b = solveVoussoir({ ...base, horizontalStress: 3e6 });
    expect(b.n).toBe(a.n);
    expect(b.leverArm).toBe(a.leverArm);
    expect(b.maxCompression).toBe(a.maxCompression);
    expect(b.fsSliding).toBe(a.fsSliding);
    expectClose(b.fsCrushing!, 60e6 / (a.maxCompression! + 3e6), 1e-12);
  });

  it('field case: σh raises the crushing demand in the report and the report says why', () => {
    const p = coalRoom();
    p.design.basis = 'jointed';
    const calm = analyse(p).report;
    p.loads.horizontalStress_MPa = 3;
    const a = analyse(p);
    const row = a.report.checks.find((r) => r.layerIndex === 0 && r.mode === 'crushing')!;
    const before = calm.checks.find((r) => r.layerIndex === 0 && r.mode === 'crushing')!;
    expectClose(row.demand!, before.demand! + 3, 1e-9);
    expect(row.fs!).toBeLessThan(before.fs!);
    expect(row.note).toContain('σh 3 MPa');
    expect(a.report.warnings.map((w) => w.code)).toContain('HORIZONTAL_STRESS_VOUSSOIR');
    const trace = a.report.trace.find((t) => t.path === 'layers[0].voussoir.fsCrushing')!;
    expect(trace.formula).toBe('sigma_c / (fc + sigma_h)');
    expect(trace.note).toMatch(/horizontal stress is added to the arch thrust/);
  });

  it('crushing strength "rockMass" is σci·s^a (Hoek, Carranza-Torres & Corkum 2002; METHODS §8 check GSI 50: 6.023 MPa of 100 MPa); "lab" is the UCS as given', () => {
    const p = project({
      opening: { type: 'beam', span_m: 6, ends: 'clamped' },
      layers: [bed('Mudstone', 0.5, { ucs_MPa: 100, jointing: { rqd: 40, jointCondition: 13.333333333333334, jointFriction_deg: 30 }, hoekBrown: { mi: 10, disturbance: 0 } })],
      design: { basis: 'jointed' },
    });
    const mass = analyse(p).report.checks.find((r) => r.mode === 'crushing')!;
    expect(analyse(p).report.layers[0].strength.gsi).toBeCloseTo(40, 9); // 1.5·13.33 + 40/2
    // GSI 40: s = exp(−60/9), a = 0.5 + (e^(−40/15) − e^(−20/3))/6 (METHODS §8 formulas)
    const s = Math.exp(-60 / 9);
    const aExp = 0.5 + (Math.exp(-40 / 15) - Math.exp(-20 / 3)) / 6;
    expectClose(mass.capacity!, 100 * s ** aExp, 1e-9);
    p.design.crushingStrength = 'lab';
    expect(analyse(p).report.checks.find((r) => r.mode === 'crushing')!.capacity).toBe(100);
  });

  it('field case: the 8 m sandstone over a 6.5 m room is a block (s/t = 0.81): its sliding FS ≈ s·tanφ/(4z) with z ≈ t/2 = 0.23 at φ = 30° is shown but does not count (METHODS §3a check)', () => {
    const p = project({
      title: 'Invented: coal room under a thick sandstone',
      opening: { type: 'beam', span_m: 6.5, ends: 'clamped' },
      layers: [bed('Shale', 0.5, { youngModulus_GPa: 8, tensile: { value_MPa: 3 } }), bed('Sandstone', 8, { youngModulus_GPa: 20, tensile: { value_MPa: 8 } })],
    });
    const a = analyse(p).report;
    const sliding = a.checks.find((r) => r.layerIndex === 1 && r.mode === 'sliding')!;
    expect(sliding.fs!).toBeGreaterThan(0.2);
    expect(sliding.fs!).toBeLessThan(0.26); // ≈ 6.5·tan30°/(4·4) = 0.235 (rigid limit, z ≈ t/2)
    expect(sliding.counts).toBe(false);
    expect(sliding.status).toBe('info');
    expect(sliding.reason).toContain('post-cracking reserve');
    expect(sliding.reason).toContain('block: s/t < 2');
    expect(a.governing!.mode).not.toBe('sliding');
    expect(a.warnings.some((w) => w.code === 'DEEP_BEAM' && w.path === 'layers[1].thickness_m' && /block/.test(w.message))).toBe(true);
    // even taken as cracked, a block never counts its voussoir
    p.design.basis = 'jointed';
    const j = analyse(p).report.checks.find((r) => r.layerIndex === 1 && r.mode === 'sliding')!;
    expect(j.counts).toBe(false);
    expect(j.reason).toBe('block: s/t < 2');
  });

  it('s/t ≤ 4 carries a DEEP_BEAM warning (ACI 318 clear span ≤ 4 × depth, memory) and s/t = 4.1 does not', () => {
    const at = (t: number) => analyse(project({ opening: { type: 'beam', span_m: 4, ends: 'clamped' }, layers: [bed('Bed', t)] })).report.warnings.filter((w) => w.code === 'DEEP_BEAM');
    expect(at(1)).toHaveLength(1); // s/t = 4
    expect(at(4 / 4.1)).toHaveLength(0);
  });
});

describe('METHODS §10 — tensile basis, targets, which checks count', () => {
  it('coal-room demo at 6 m, basis intact: the shale is uncracked, tension governs and no voussoir check counts; basis jointed: tension does not count and the voussoir checks decide (METHODS §10 check)', () => {
    const p = coalRoom();
    const a = analyse(p).report;
    expect(a.governing).toMatchObject({ layerIndex: 0, mode: 'tension' });
    expect(a.checks.filter((r) => r.mode !== 'tension' && r.counts)).toEqual([]);
    for (const r of a.checks.filter((x) => x.mode !== 'tension' && x.fs !== null)) expect(r.reason).toBe('post-cracking reserve: the layer does not crack');
    p.design.basis = 'jointed';
    const j = analyse(p).report;
    expect(j.checks.filter((r) => r.mode === 'tension' && r.counts)).toEqual([]);
    expect(j.governing!.mode).not.toBe('tension');
    expect(j.checks.find((r) => r.layerIndex === 0 && r.mode === 'tension')!.reason).toBe('basis "jointed": the roof is taken as cracked');
  });

  it('a file that omits fsTarget.tension gets its basis default: 2 on "rockMass", 4 on "lab" (METHODS §10)', () => {
    const raw = { opening: { type: 'beam', span_m: 6, ends: 'clamped' }, layers: [bed('Bed', 0.5)] };
    expect(project(raw).design.fsTarget.tension).toBe(2);
    expect(project({ ...raw, design: { tensileBasis: 'lab' } }).design.fsTarget.tension).toBe(4);
    expect(project({ ...raw, design: { tensileBasis: 'lab', fsTarget: { tension: 3 } } }).design.fsTarget.tension).toBe(3);
  });

  it('tensile basis "lab" uses the block-scale strength, "rockMass" min(block, mass) (METHODS §10)', () => {
    const p = coalRoom();
    const s = analyse(p).report.layers[0].strength;
    expect(s.design_MPa).toBe(Math.min(s.block_MPa, s.mass_MPa));
    p.design.tensileBasis = 'lab';
    const l = analyse(p).report.layers[0].strength;
    expect(l.design_MPa).toBe(l.block_MPa);
  });

  it('a cross-jointed overhang has no capacity: FS tension 0, counted, with an error-level warning (METHODS §10)', () => {
    const p = project({ opening: { type: 'cantilever', span_m: 2 }, layers: [bed('Ledge', 0.6, { jointing: { crossJointSpacing_m: 1, jointCondition: 20, jointFriction_deg: 30 } })] });
    const a = analyse(p).report;
    const t = a.checks.find((r) => r.mode === 'tension')!;
    expect(t.fs).toBe(0);
    expect(t.counts).toBe(true);
    expect(a.warnings.find((w) => w.code === 'JOINTED_OVERHANG')?.level).toBe('error');
  });

  it('regression: the FS–span chart of a jointed-basis overhang agrees with the analysis that tension governs', () => {
    const p = structuredClone(presets().find((x) => x.file.endsWith('quarry-bench-overhang.lamina.json'))!.project);
    p.design.basis = 'jointed';
    const a = analyse(p);
    expect(a.report.governing!.mode).toBe('tension');
    const curve = spanCurve(p, { samples: 20 });
    expect(curve.counts.tension).toBe(true);
    const svg = fsSpanSvg(curve, a.report.maxSpan_m, { units: 'SI', spanWord: 'overhang' });
    expect(svg).not.toMatch(/not governing|tension \(not counted\)/);
    expect(svg).toContain('current overhang');
    const words = buildVerdict(p, a.report).sentences.map((s) => s.text).join(' ');
    expect(words).toMatch(/Largest overhang/);
    expect(words).not.toMatch(/abutments/);
  });
});

describe('METHODS §11 — span search v2', () => {
  it('the tension span of a layer with cross-joints stops at its joint spacing (beyond it the layer is cracked)', () => {
    const p = project({
      opening: { type: 'beam', span_m: 2, ends: 'clamped' },
      layers: [bed('Strong bed', 1, { tensile: { value_MPa: 15 }, jointing: { crossJointSpacing_m: 3, jointCondition: 25, jointFriction_deg: 30 } })],
    });
    const m = analyse(p).report.maxSpan_m!;
    expect(m.tension!).toBeLessThanOrEqual(3);
    expect(m.tension!).toBeGreaterThan(3 - 1e-3);
  });
});

describe('METHODS §12 — standing support capped at the load it relieves', () => {
  it('0.6 m bed, 25 kN/m³ (15 kPa), 400 kPa standing support → load 0, deflection 0, SUPPORT_EXCEEDS_LOAD, never negative (METHODS §12 check)', () => {
    const p = project({ opening: { type: 'beam', span_m: 5, ends: 'clamped' }, support: { standing_kPa: 400 }, layers: [bed('Mudstone', 0.6)] });
    const a = analyse(p).report;
    expect(a.layers[0].load_kPa).toBe(0);
    expect(a.layers[0].elastic.deflection_mm).toBe(0);
    expect(a.warnings.map((w) => w.code)).toContain('SUPPORT_EXCEEDS_LOAD');
    expect(a.warnings.find((w) => w.code === 'SUPPORT_EXCEEDS_LOAD')!.message).toContain('385 kPa');
    for (const r of a.checks) if (r.demand !== null) expect(r.demand).toBeLessThanOrEqual(0 + 1e-12);
  });
});

describe('METHODS §14 — intersections', () => {
  it('design span is the diagonal: 6 × 6 m → 8.485 m; 8 × 10 m → 12.806 m (METHODS §14 check, Pythagoras)', () => {
    expectClose(intersectionDiagonal(6, 6), 8.485, 1e-4);
    expectClose(intersectionDiagonal(8, 10), 12.806, 1e-4);
    const p = project({ opening: { type: 'intersection', span_m: 8, length_m: 10 }, layers: [bed('Limestone', 0.8)] });
    expect(p.opening.ends).toBe('simple');
    const a = analyse(p).report;
    expect(a.opening).toEqual({ type: 'intersection', span_m: 8, designSpan_m: Math.hypot(8, 10), basis: 'diagonal' });
    // the beam is checked on the diagonal: simple ends, midspan 3qs²/(4t²) with s = 12.806 m
    expectClose(a.layers[0].elastic.maxTension_MPa, (3 * 20 * Math.hypot(8, 10) ** 2) / (4 * 0.8 ** 2) / 1000, 1e-9);
  });

  it('the largest span is an entry width w1 with w2/w1 held: at w1 = maxSpan the diagonal just meets the target', () => {
    const p = project({ opening: { type: 'intersection', span_m: 6, length_m: 9 }, layers: [bed('Limestone', 0.8)] });
    const w = analyse(p).report.maxSpan_m!.tension!;
    const q = structuredClone(p);
    q.opening.span_m = w;
    q.opening.length_m = w * 1.5;
    const fs = analyse(q).report.governing!;
    expect(fs.mode).toBe('tension');
    expect(Math.abs(fs.fs / fs.target - 1)).toBeLessThan(2e-3);
  });

  it('slab edges (METHODS §14): free long edges leave the slab spanning its long side, so it carries more stress than with every edge clamped', () => {
    const slab = (edges: unknown) =>
      analyse(project({ opening: { type: 'slab', span_m: 6, length_m: 9, ends: 'clamped', edges }, layers: [bed('Limestone', 0.8)] })).report.layers[0].plate!;
    const all = slab(null);
    const open = slab({ short: 'clamped', long: 'free' });
    // free long edges: the slab spans the long side (9 m) between the clamped short edges, so it carries far more stress
    expect(open.maxTension_MPa).toBeGreaterThan(all.maxTension_MPa);
  });
});

describe('METHODS §15 — characteristic values', () => {
  it('cautiousMean: n = 3 → factor t(0.95, 2)/√3 = 2.9200/1.7321 = 1.686 (EN 1997-1 §2.4.5.2, METHODS §15 check)', () => {
    const c = characteristicValue([2, 2.5, 3], 'cautiousMean');
    expectClose(c.kn!, 2.92 / Math.sqrt(3), 2e-4);
    expectClose(c.value, 2.5 * (1 - (2.92 / Math.sqrt(3)) * 0.2), 2e-4);
  });
  it('lower5Log: 5, 10, 15 MPa → 1.397 MPa with kn = 3.37 (EN 1990 Annex D D7.3, METHODS §15 check); never negative', () => {
    expectClose(characteristicValue([5, 10, 15], 'lower5Log').value, 1.397, 5e-4);
    expect(characteristicValue([0.1, 10, 50], 'lower5Log').value).toBeGreaterThan(0);
    expect(characteristicValue([0.1, 10, 50], 'lower5').value).toBe(0); // the normal fractile clamps at 0
  });
});
