/**
 * The support needed (METHODS §12) on the coal-room demo (presets/coal-room-shale.lamina.json,
 * invented data, unchanged).
 *
 * What limits 8 m. Unbolted, two counted checks are below target: the channel sandstone's
 * tension (FS 1.87 < 2) and the grey siltstone's (FS 1.885 < 2; it bends with the sandstone as
 * one §2 group and takes E t³ share 11.05 kPa, σ = q s²/(2t²) = 0.2455 MPa against 0.4628 MPa).
 * - Suspension cannot fix either: the bolts hang the shale from the sandstone, which then
 *   carries more (FS 1.59), and the siltstone's share rises with it (FS 1.61). The search says
 *   so in one sentence and stops the span near 7.1 m; at 7 m the bolt FS decides the spacing,
 *   100 kN / (12.5 kPa · S²) ≥ 1.5 → S = √(100/18.75) = 2.309 m (statics; target 1.5 common practice).
 * - Beam building with bolts that stop in the sandstone (2.3 m) bonds shale and sandstone but
 *   leaves the siltstone at 1.885: the shortest bolt that works is one that bonds all three.
 * - Fully grouted bolts through the whole 3.5 m column (200 kN, shear 120 kN = 0.6 × capacity,
 *   50 kN pretension) make 8 m work. The bonded tensions no longer depend on the spacing, so the
 *   spacing is set by the interlayer shear at the sandstone/siltstone interface: τ = V Q/(I b)
 *   on the transformed section (Gere & Timoshenko; computed here independently of the code),
 *   against (V_b + T₀ tanφ)/S² with φ = 35° (the sandstone's joint friction, DESIGN v2).
 * Property tests: more bolts (closer spacing, higher capacity) never lower a counted FS; a
 * longer bolt whose tip stays in the layer keeps its anchorage there, and thickening the anchor
 * layer never loses it; suspended weight is conserved (statics).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyse, analyseWithSupportNeeded } from '../../src/analysis/analyse';
import { NO_SUPPORT_NEEDED, supportMarginCurve, supportNeeded, supportPasses } from '../../src/analysis/support-needed';
import { spanCurve } from '../../src/analysis/span-curve';
import { designChart } from '../../src/analysis/design-chart';
import { evaluate } from '../../src/analysis/evaluate';
import { projectToSI } from '../../src/analysis/inputs';
import { readProjectText } from '../../src/model/project-file';
import { defaultProject } from '../../src/model/defaults';
import type { BoltPattern, CheckRow, Project } from '../../src/model/types';

const coal = readProjectText(readFileSync(new URL('../../presets/coal-room-shale.lamina.json', import.meta.url), 'utf8')).project;
const pattern = (extra: Partial<BoltPattern> = {}): BoltPattern => ({
  length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2, anchorage_m: 0.3, action: 'suspension', shearCapacity_kN: 60, pretension_kN: 0, ...extra,
});
const bolted = (span: number, extra: Partial<BoltPattern> = {}): Project => ({
  ...coal, opening: { ...coal.opening, span_m: span }, support: { standing_kPa: 0, bolts: pattern(extra) },
});

/** τ at the interface under layer `cut` (0-based, from the roof line) of a clamped beam, Pa: transformed section, V = q s/2. */
function interfaceShear(layers: { t: number; E: number }[], q: number, span: number, cut: number): number {
  let y = 0;
  const parts = layers.map((l) => { const c = y + l.t / 2; y += l.t; return { ...l, c }; });
  const ybar = parts.reduce((a, l) => a + l.E * l.t * l.c, 0) / parts.reduce((a, l) => a + l.E * l.t, 0);
  const EI = parts.reduce((a, l) => a + l.E * (l.t ** 3 / 12 + l.t * (l.c - ybar) ** 2), 0);
  const Q = parts.slice(cut + 1).reduce((a, l) => a + l.E * l.t * (l.c - ybar), 0);
  return ((q * span) / 2) * Q / EI;
}

describe('what makes 8 m work — the coal-room demo, bolted', () => {
  const grouted = (extra: Partial<BoltPattern> = {}): Partial<BoltPattern> => ({
    action: 'beamBuilding', length_m: 3.5, capacity_kN: 200, shearCapacity_kN: 120, pretension_kN: 50, spacingAcross_m: 1, spacingAlong_m: 1, ...extra,
  });
  // Strata weight, kPa: 25 × 0.5 + 24 × 1.8 + 25 × 1.2 (statics).
  const q = 25 * 0.5 + 24 * 1.8 + 25 * 1.2;
  const tau = interfaceShear([{ t: 0.5, E: 8 }, { t: 1.8, E: 20 }, { t: 1.2, E: 12 }], q * 1e3, 8, 1);
  const resistance = 120e3 + 50e3 * Math.tan((35 * Math.PI) / 180);
  const expected = Math.sqrt(resistance / (1.5 * tau));

  it('unbolted, the sandstone and the siltstone tension are below target', () => {
    const below = analyse({ ...bolted(8), support: { standing_kPa: 0, bolts: null } }).report.checks.filter((c) => c.status === 'below');
    expect(below.map((c) => [c.layerIndex, c.mode])).toEqual([[0, 'tension'], [1, 'tension'], [2, 'tension']]);
    const silt = below[2];
    // §2 share of the siltstone: E t³ 12 × 1.2³ of (20 × 1.8³ + 12 × 1.2³) × (43.2 + 30) kPa, clamped σ = q s²/(2t²)
    const share = ((12 * 1.2 ** 3) / (20 * 1.8 ** 3 + 12 * 1.2 ** 3)) * (43.2 + 30);
    expect(silt.demand).toBeCloseTo((share * 1e-3 * 64) / (2 * 1.44), 9);
    expect(silt.fs).toBeCloseTo(1.885, 3);
  });

  it('beam building through the column: the suggested spacing meets every counted target; 10 % sparser does not', () => {
    expect(tau).toBeCloseTo(133.5e3, -2); // hand calculation: 342.8 kN/m × 17.1 / 43.909
    const n = supportNeeded(bolted(8, grouted()));
    const s = n.needed?.boltSpacing_m as number;
    expect(s).toBeLessThanOrEqual(expected + 1e-9);
    expect(s).toBeGreaterThan(expected - 1e-2); // the search's tolerance (1 cm)
    const at = (k: number) => bolted(8, grouted({ spacingAcross_m: k * s, spacingAlong_m: k * s }));
    expect(supportPasses(at(1))).toBe(true);
    expect(supportPasses(at(1.1))).toBe(false);
    const rows = analyse(at(1)).report.checks;
    expect(rows.filter((c) => c.counts && c.status === 'below')).toEqual([]);
    const shear = rows.filter((c) => c.mode === 'interlayerShear');
    expect(shear.map((c) => c.layerIndex)).toEqual([0, 1]);
    expect(shear[1].demand).toBeCloseTo(tau / 1e3, 6);
  });

  it('bolts that stop in the sandstone leave the siltstone below: the shortest bolt bonds all three beds', () => {
    const short = bolted(8, grouted({ length_m: 2.3, spacingAcross_m: 0.8, spacingAlong_m: 0.8 }));
    const below = analyse(short).report.checks.filter((c) => c.status === 'below');
    expect(below.map((c) => [c.layerIndex, c.mode])).toEqual([[2, 'tension']]);
    const n = supportNeeded(bolted(8, grouted({ spacingAcross_m: 0.85, spacingAlong_m: 0.85 })));
    expect(n.needed?.boltLength_m).toBeCloseTo(3.5, 9);
  });
});

describe('support needed — the coal-room demo, suspension bolting', () => {
  it('8 m: no suspension pattern works, and the reason names the sandstone tension that hanging the shale cannot fix', () => {
    const n = supportNeeded(bolted(8));
    expect(n.needed?.boltSpacing_m).toBe(null);
    expect(n.needed?.reasons.join(' ')).toContain('tension of layer 2 “Channel sandstone”');
    expect(n.needed?.maxSpan_m).toBeGreaterThan(7);
    expect(n.needed?.maxSpan_m).toBeLessThan(8);
  });

  it('7 m: the suggested spacing meets every counted target; 10 % sparser does not', () => {
    const n = supportNeeded(bolted(7));
    const s = n.needed?.boltSpacing_m as number;
    expect(s).toBeCloseTo(Math.sqrt(100 / 18.75), 2); // bolt FS = 1.5 (statics)
    expect(supportPasses(bolted(7, { spacingAcross_m: s, spacingAlong_m: s }))).toBe(true);
    expect(supportPasses(bolted(7, { spacingAcross_m: 1.1 * s, spacingAlong_m: 1.1 * s }))).toBe(false);
    // and the unbolted roof at 7 m does not pass (the shale's tension)
    expect(supportPasses({ ...bolted(7), support: { standing_kPa: 0, bolts: null } })).toBe(false);
  });

  it('7 m: the shortest bolt anchors in the sandstone (0.5 m shale + 0.3 m anchorage → 0.8 m)', () => {
    const n = supportNeeded(bolted(7));
    expect(n.needed?.boltLength_m).toBeCloseTo(0.8, 9);
    expect(supportPasses(bolted(7, { length_m: 0.8 }))).toBe(true);
    expect(supportPasses(bolted(7, { length_m: 0.7 }))).toBe(false); // zone 0.4–0.7 m straddles the interface
  });

  it('the analysis passing its chains and check table to the searches changes no answer (7 m and 8 m)', () => {
    for (const p of [bolted(7), bolted(8, { action: 'beamBuilding', length_m: 3.5, capacity_kN: 200, shearCapacity_kN: 120, pretension_kN: 50 })]) {
      const support = analyseWithSupportNeeded(p).report.support;
      expect({ needed: support?.needed, reason: support?.neededReason }).toEqual(supportNeeded(p));
    }
  });

  it('the report carries the search; a roof that passes unsupported needs none', () => {
    expect(analyse(bolted(7)).report.support?.needed).toBe(null);
    expect(analyseWithSupportNeeded(bolted(7)).report.support?.needed?.boltSpacing_m).toBeCloseTo(Math.sqrt(100 / 18.75), 2);
    const fine = { ...defaultProject(), opening: { ...defaultProject().opening, span_m: 2 }, support: { standing_kPa: 0, bolts: pattern({ length_m: 0.45, anchorage_m: 0.1 }) } };
    expect(supportPasses({ ...fine, support: { standing_kPa: 0, bolts: null } })).toBe(true);
    expect(supportNeeded(fine)).toEqual({ needed: null, reason: NO_SUPPORT_NEEDED });
  });
});

describe('support properties', () => {
  it('more bolts (closer spacing) never lower a counted FS; suspended weight is conserved', () => {
    fc.assert(fc.property(fc.double({ min: 0.3, max: 3, noNaN: true }), fc.double({ min: 0.5, max: 0.95, noNaN: true }), fc.double({ min: 4, max: 9, noNaN: true }),
      (s, k, span) => {
        const a = analyse(bolted(span, { spacingAcross_m: s, spacingAlong_m: s })).report;
        const b = analyse(bolted(span, { spacingAcross_m: k * s, spacingAlong_m: k * s })).report;
        for (const row of a.checks) {
          if (!row.counts || row.fs === null) continue;
          const same = b.checks.find((x) => x.layerIndex === row.layerIndex && x.mode === row.mode);
          expect(same?.fs ?? Infinity).toBeGreaterThanOrEqual((row.fs as number) * (1 - 1e-12));
        }
        // statics: the loads over the opening plus the bolts' share add up to the strata weight
        const total = coal.layers.reduce((w, l) => w + l.unitWeight_kNm3 * l.thickness_m, 0);
        const overOpening = a.layers.reduce((w, l) => w + l.load_kPa, 0);
        const perBolt = (a.support?.bolts?.load_kN ?? 0) / (s * s);
        expect(overOpening).toBeCloseTo(total, 9);
        expect(perBolt).toBeCloseTo(coal.layers[0].unitWeight_kNm3 * coal.layers[0].thickness_m, 9);
      }), { numRuns: 8 });
  }, 120_000);
});

/** A random bedded roof from the coal demo's beds: 2–4 layers of random thickness and weight. */
const strataArb = fc.array(fc.record({
  t: fc.double({ min: 0.2, max: 2.5, noNaN: true }),
  gamma: fc.double({ min: 18, max: 28, noNaN: true }),
  from: fc.integer({ min: 0, max: 2 }),
}), { minLength: 2, maxLength: 4 });
const withStrata = (beds: { t: number; gamma: number; from: number }[], span: number, bolts: BoltPattern | null): Project => ({
  ...coal,
  opening: { ...coal.opening, span_m: span },
  layers: beds.map((b, i) => ({ ...coal.layers[b.from], name: `Bed ${i + 1}`, thickness_m: b.t, unitWeight_kNm3: b.gamma })),
  support: { standing_kPa: 0, bolts },
});
const tops = (beds: { t: number }[]) => { let h = 0; return beds.map((b) => (h += b.t)); };

describe('support properties at the analysis level', () => {
  const sameRow = (rows: CheckRow[], r: CheckRow, k: number) =>
    rows.filter((x) => x.layerIndex === r.layerIndex && x.mode === r.mode)[k];

  it('a higher bolt capacity (shear capacity with it) never lowers any FS, either action', () => {
    fc.assert(fc.property(fc.double({ min: 20, max: 300, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }),
      fc.constantFrom('suspension', 'beamBuilding' as const), fc.double({ min: 0.6, max: 2, noNaN: true }), fc.double({ min: 5, max: 9, noNaN: true }),
      (cap, k, action, s, span) => {
        const at = (c: number) => analyse(bolted(span, { action: action as BoltPattern['action'], length_m: 3.5, capacity_kN: c, shearCapacity_kN: 0.6 * c, spacingAcross_m: s, spacingAlong_m: s })).report.checks;
        const a = at(cap);
        const b = at(k * cap);
        // beam building: a credited bond replaces the unbonded rows; compare like with like by mode, layer and order
        a.forEach((row, i) => {
          if (row.fs === null) return;
          const nth = a.slice(0, i).filter((x) => x.layerIndex === row.layerIndex && x.mode === row.mode).length;
          const other = sameRow(b, row, nth);
          // a row that stops counting because composite action became credited is replaced by a better-or-equal bonded row
          expect(other?.fs ?? Infinity).toBeGreaterThanOrEqual((row.fs as number) * (1 - 1e-9));
        });
      }), { numRuns: 12 });
  }, 120_000);

  it('closer bolts never lower a counted FS, beam building included', () => {
    fc.assert(fc.property(fc.double({ min: 0.3, max: 3, noNaN: true }), fc.double({ min: 0.5, max: 0.95, noNaN: true }), fc.double({ min: 4, max: 9, noNaN: true }),
      (s, k, span) => {
        const at = (x: number) => analyse(bolted(span, { action: 'beamBuilding', length_m: 3.5, capacity_kN: 200, shearCapacity_kN: 120, pretension_kN: 50, spacingAcross_m: x, spacingAlong_m: x })).report.checks;
        const a = at(s);
        const b = at(k * s);
        for (const row of a) {
          if (!row.counts || row.fs === null) continue;
          const same = b.find((x) => x.layerIndex === row.layerIndex && x.mode === row.mode);
          expect(same?.fs ?? Infinity).toBeGreaterThanOrEqual((row.fs as number) * (1 - 1e-9));
        }
      }), { numRuns: 10 });
  }, 120_000);

  it('a longer bolt whose tip stays in its anchor layer keeps that anchorage; a thicker anchor layer never loses it (geometry, METHODS §12)', () => {
    fc.assert(fc.property(strataArb, fc.nat(), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }),
      (beds, pick, u, v, grow) => {
        const k = pick % beds.length;
        const top = tops(beds);
        const bottom = k === 0 ? 0 : top[k - 1];
        const a = Math.min(0.3, beds[k].t / 2);
        // a tip with the whole anchorage zone in layer k, and a longer one still in layer k
        const L = bottom + a + u * (beds[k].t - a);
        const L2 = L + v * (top[k] - L);
        const bolts = (len: number): BoltPattern => pattern({ length_m: len, anchorage_m: a });
        const r1 = analyse(withStrata(beds, 6, bolts(L))).report.support?.bolts;
        const r2 = analyse(withStrata(beds, 6, bolts(L2))).report.support?.bolts;
        fc.pre(r1?.anchorLayer === k); // heights within 1e-9 m of an interface may round either way
        expect(r2?.anchorLayer).toBe(k);
        const thicker = beds.map((b, i) => (i === k ? { ...b, t: b.t * grow } : b));
        expect(analyse(withStrata(thicker, 6, bolts(L))).report.support?.bolts?.anchorLayer).toBe(k);
      }), { numRuns: 40 });
  }, 120_000);

  it('suspended weight is conserved: loads over the opening and on the bolts add up to the strata weight (statics)', () => {
    fc.assert(fc.property(strataArb, fc.nat(), fc.double({ min: 0.5, max: 2, noNaN: true }), fc.double({ min: 3, max: 9, noNaN: true }),
      (beds, pick, s, span) => {
        const k = 1 + (pick % (beds.length - 1)); // anchor above the immediate roof so something hangs
        const top = tops(beds);
        const a = Math.min(0.3, beds[k].t / 2);
        const L = top[k - 1] + a + 0.5 * (beds[k].t - a);
        const r = analyse(withStrata(beds, span, pattern({ length_m: L, anchorage_m: a, spacingAcross_m: s, spacingAlong_m: s, capacity_kN: 1000 }))).report;
        const total = beds.reduce((w, b) => w + b.gamma * b.t, 0);
        const hanging = beds.slice(0, k).reduce((w, b) => w + b.gamma * b.t, 0);
        expect(r.support?.bolts?.suspended).toEqual([...Array(k).keys()]);
        expect(r.layers.reduce((w, l) => w + l.load_kPa, 0)).toBeCloseTo(total, 8);
        expect(r.layers.slice(0, k).every((l) => l.load_kPa === 0)).toBe(true);
        expect((r.support?.bolts?.load_kN as number) / (s * s)).toBeCloseTo(hanging, 8);
      }), { numRuns: 40 });
  }, 120_000);
});

describe('the "with this support" curve of the span curve', () => {
  it('is the least FS/target of the whole check table: at the given span it equals the analysis; it crosses 1 at the largest span with the support', () => {
    const p = bolted(7);
    const c = spanCurve(p);
    const sc = c.support!;
    expect(sc.spans_m).toHaveLength(24);
    const margin = (rows: CheckRow[]) => Math.min(...rows.filter((r) => r.counts && r.fs !== null).map((r) => (r.fs as number) / r.target));
    // evaluate the curve's own function at the given span: the same check table as the analysis
    const at7 = supportMarginCurve(p, [7]);
    expect(at7.withSupport[0]).toBeCloseTo(margin(analyse(p).report.checks), 12);
    expect(at7.unsupported[0]).toBeCloseTo(margin(analyse({ ...p, support: { standing_kPa: 0, bolts: null } }).report.checks), 12);
    const max = supportNeeded(p).needed!.maxSpan_m!;
    sc.spans_m.forEach((s, i) => {
      if (s < max - 0.01) expect(sc.withSupport[i]!).toBeGreaterThanOrEqual(1 - 1e-9);
      if (s > max + 0.01) expect(sc.withSupport[i]!).toBeLessThan(1);
    });
    // the unbolted roof fails at 7 m (the shale's tension), the bolted one passes there
    expect(at7.unsupported[0]!).toBeLessThan(1);
    expect(at7.withSupport[0]!).toBeGreaterThanOrEqual(1);
  });

  it('is absent without support', () => {
    expect(spanCurve({ ...bolted(7), support: { standing_kPa: 0, bolts: null } }).support).toBe(null);
  });
});

describe('the design chart with this support', () => {
  it('gives, per thickness, a span that passes with the support (and one 1/100 of the range longer that does not)', () => {
    const p = bolted(7);
    const chart = designChart(p, 1);
    const sc = chart.support!;
    expect(sc.thicknesses_m).toHaveLength(6);
    const hi = Math.max(...chart.spans_m);
    const tol = (hi - Math.min(...chart.spans_m)) / 100;
    for (const k of [0, 2, 5]) {
      const t = sc.thicknesses_m[k];
      const pt: Project = { ...p, layers: p.layers.map((l, i) => (i === 1 ? { ...l, thickness_m: t } : l)) };
      const chains = evaluate(projectToSI(pt)).layers.map((l) => l.chain);
      const at = (q: Project, s: number) => supportPasses({ ...q, opening: { ...q.opening, span_m: s } }, chains);
      for (const [q, s] of [[pt, sc.withSupport_m[k]], [{ ...pt, support: { standing_kPa: 0, bolts: null } }, sc.unsupported_m[k]]] as const) {
        if (s === null) continue;
        expect(at(q, s)).toBe(true);
        if (s < hi) expect(at(q, s + tol)).toBe(false);
      }
    }
    // without support there is no such curve
    expect(designChart({ ...p, support: { standing_kPa: 0, bolts: null } }, 1).support).toBe(null);
  }, 60_000);
});
