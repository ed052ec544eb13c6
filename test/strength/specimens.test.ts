import { describe, expect, it } from 'vitest';
import { reduceSpecimens, specimenOutcomes } from '../../src/strength/specimens';
import type { SpecimenSI } from '../../src/strength/specimens';
import { expectClose } from '../helpers/expect-close';

const disc = (id: string, diameter_mm: number, thickness_mm: number, peakLoad_kN: number, valid = true): SpecimenSI => ({
  id,
  diameter: diameter_mm / 1000,
  thickness: thickness_mm / 1000,
  peakLoad: peakLoad_kN * 1000,
  valid,
});

describe('reduceSpecimens', () => {
  it('reduceSpecimens([54 mm × 27 mm, 10 kN]) accepts it at 4.366 MPa with no warning — METHODS §5 (ISRM 1978)', () => {
    const r = reduceSpecimens([disc('B1', 54, 27, 10)]);
    expect(r.rejected).toEqual([]);
    expect(r.warnings).toEqual([]);
    expect(r.accepted.map((a) => [a.index, a.id])).toEqual([[0, 'B1']]);
    expectClose(r.accepted[0].brazilian, 4.366e6, 1e-3);
    expectClose(r.accepted[0].diameter, 0.054);
  });

  it('rejects a specimen marked invalid with "marked invalid (no central diametral fracture)" — ISRM 1978', () => {
    const r = reduceSpecimens([disc('B1', 54, 27, 10), disc('B2', 54, 27, 4, false)]);
    expect(r.accepted.map((a) => a.id)).toEqual(['B1']);
    expect(r.rejected).toEqual([{ index: 1, id: 'B2', reason: 'marked invalid (no central diametral fracture)' }]);
  });

  it('rejects thickness > diameter with "thickness exceeds diameter" but keeps L = D — common practice', () => {
    const r = reduceSpecimens([disc('T1', 54, 60, 10), disc('T2', 54, 54, 10)]);
    expect(r.rejected).toEqual([{ index: 0, id: 'T1', reason: 'thickness exceeds diameter' }]);
    expect(r.accepted.map((a) => a.index)).toEqual([1]);
    // L/D = 1 > 0.75 → warned, not rejected (ASTM D3967)
    expect(r.warnings.map((w) => [w.index, w.code])).toEqual([[1, 'LD_RATIO']]);
  });

  it('warns LD_RATIO outside 0.2 ≤ L/D ≤ 0.75 and not at the limits — ASTM D3967', () => {
    // L/D: 0.1, 0.2, 0.5, 0.75, 0.8 on 60 mm discs
    const r = reduceSpecimens([disc('a', 60, 6, 5), disc('b', 60, 12, 5), disc('c', 60, 30, 5), disc('d', 60, 45, 5), disc('e', 60, 48, 5)]);
    expect(r.accepted).toHaveLength(5);
    expect(r.warnings.filter((w) => w.code === 'LD_RATIO').map((w) => w.index)).toEqual([0, 4]);
    expect(r.warnings[0].message).toMatch(/ASTM D3967/);
  });

  it('warns SMALL_DIAMETER below 54 mm (ISRM 1978, NX core, from memory) and not at 54 mm', () => {
    const r = reduceSpecimens([disc('s', 42, 21, 5), disc('n', 54, 27, 5)]);
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0]).toMatchObject({ index: 0, code: 'SMALL_DIAMETER' });
    expect(r.warnings[0].message).toMatch(/42 mm/);
  });

  it('reduceSpecimens([]) returns empty lists; bad numbers throw a RangeError', () => {
    expect(reduceSpecimens([])).toEqual({ accepted: [], rejected: [], warnings: [] });
    expect(() => reduceSpecimens([disc('x', 54, 27, 0)])).toThrow(RangeError);
    expect(() => reduceSpecimens([disc('x', Number.NaN, 27, 5)])).toThrow(/diameter/);
  });
});

describe('specimenOutcomes (linear-time lookup, issue 14 item 10)', () => {
  it('gives each specimen the same outcome as searching the reduction for its index', () => {
    // invalid, too thick, small diameter (54 mm ISRM minimum, from memory), L/D outside 0.2–0.75 (ASTM D3967)
    const list = [disc('a', 54, 27, 10), disc('b', 54, 27, 10, false), disc('c', 40, 45, 10), disc('d', 42, 8, 5), disc('e', 54, 30, 9)];
    const red = reduceSpecimens(list);
    const o = specimenOutcomes(red, list.length);
    list.forEach((_, k) => {
      expect(o.accepted[k]).toBe(red.accepted.find((a) => a.index === k));
      expect(o.rejected[k]).toBe(red.rejected.find((r) => r.index === k));
      expect(o.warnings[k]).toEqual(red.warnings.filter((w) => w.index === k));
    });
    expect(o.warnings[3].map((w) => w.code).sort()).toEqual(['LD_RATIO', 'SMALL_DIAMETER']);
    expect(specimenOutcomes(null, 2)).toEqual({ accepted: [undefined, undefined], rejected: [undefined, undefined], warnings: [[], []] });
  });
});
