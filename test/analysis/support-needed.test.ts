/**
 * The support needed (METHODS §12) on the coal-room demo (presets/coal-room-shale.lamina.json,
 * invented data). At 8 m the channel sandstone's own tension is below target whatever the bolts
 * do (FS 1.87 < 2 unbolted, and suspending the shale adds its weight to it), so 8 m cannot be
 * made to work by bolting this preset; the largest span a suspension pattern reaches is about
 * 7.1 m. The test therefore asks "what makes 7 m work": the bolt FS decides the spacing,
 * 100 kN / (12.5 kPa · S²) ≥ 1.5 → S = √(100/18.75) = 2.309 m (statics; target 1.5 common practice).
 * Property tests: more bolts never lower a counted FS (skin sliding does not count); suspended
 * weight is conserved (statics).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyse, analyseWithSupportNeeded } from '../../src/analysis/analyse';
import { NO_SUPPORT_NEEDED, supportNeeded, supportPasses } from '../../src/analysis/support-needed';
import { readProjectText } from '../../src/model/project-file';
import { defaultProject } from '../../src/model/defaults';
import type { BoltPattern, Project } from '../../src/model/types';

const coal = readProjectText(readFileSync(new URL('../../presets/coal-room-shale.lamina.json', import.meta.url), 'utf8')).project;
const pattern = (extra: Partial<BoltPattern> = {}): BoltPattern => ({
  length_m: 1.8, capacity_kN: 100, spacingAcross_m: 1.2, spacingAlong_m: 1.2, anchorage_m: 0.3, action: 'suspension', shearCapacity_kN: 60, pretension_kN: 0, ...extra,
});
const bolted = (span: number, extra: Partial<BoltPattern> = {}): Project => ({
  ...coal, opening: { ...coal.opening, span_m: span }, support: { standing_kPa: 0, bolts: pattern(extra) },
});

describe('support needed — the coal-room demo, bolted', () => {
  it('8 m: no pattern works, and the reason names the sandstone tension that bolts cannot fix', () => {
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
