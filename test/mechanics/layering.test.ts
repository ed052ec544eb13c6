import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { groupLayers, loadOnLowest, shareLoads } from '../../src/mechanics/layering';
import { expectClose } from '../helpers/expect-close';

// Check values: METHODS §2 (arithmetic from Obert & Duvall 1967 load sharing).
const bed1 = { unitWeight: 25e3, thickness: 0.5, modulus: 10e9 };
const stiff = { unitWeight: 25e3, thickness: 1.0, modulus: 20e9 };
const soft = { unitWeight: 25e3, thickness: 0.3, modulus: 5e9 };

describe('layered roof — Obert & Duvall 1967', () => {
  it('bed 1 alone carries 12.5 kPa', () => {
    expectClose(loadOnLowest([bed1]), 12.5e3);
  });
  it('a stiff bed above gives (q₂)₁ = 2.206 kPa < 12.5 kPa, so it separates', () => {
    expectClose(loadOnLowest([bed1, stiff]), 2.206e3, 2e-4);
    expect(groupLayers([bed1, stiff])).toEqual([0, 1]);
  });
  it('a soft bed above gives (q₂)₁ = 18.05 kPa > 12.5 kPa, so they bend together', () => {
    expectClose(loadOnLowest([bed1, soft]), 18.05e3, 2e-4);
    expect(groupLayers([bed1, soft])).toEqual([0, 0]);
  });

  // Hand-worked example (ours): soft shale 0.4 m (E 5 GPa, 24 kN/m³) under a 0.2 m coal-like
  // band (E 2 GPa, 14 kN/m³), then a 1.5 m sandstone (E 20 GPa, 25 kN/m³).
  //   (q₁)₁ = 24·0.4 = 9.6 kPa.
  //   Add band: Σγt = 9.6 + 2.8 = 12.4 kPa; ΣEt³ = 5·0.064 + 2·0.008 = 0.336 GPa·m³;
  //   (q₂)₁ = 0.32·12.4/0.336 = 11.810 kPa ≥ 9.6 → joins.
  //   Add sandstone: Σγt = 12.4 + 37.5 = 49.9; ΣEt³ = 0.336 + 20·3.375 = 67.836;
  //   (q₃)₁ = 0.32·49.9/67.836 = 0.2354 kPa < 11.81 → sandstone separates: groups [0, 0, 1].
  //   Shared loads in group 0: shale 0.32/0.336·12.4 = 11.810 kPa, band 0.016/0.336·12.4 = 0.5905 kPa;
  //   sandstone alone 37.5 kPa.
  it('hand example: shale + soft band bend together, the sandstone above separates', () => {
    const beds = [
      { unitWeight: 24e3, thickness: 0.4, modulus: 5e9 },
      { unitWeight: 14e3, thickness: 0.2, modulus: 2e9 },
      { unitWeight: 25e3, thickness: 1.5, modulus: 20e9 },
    ];
    const groups = groupLayers(beds);
    expect(groups).toEqual([0, 0, 1]);
    const { loads } = shareLoads(beds, groups, 0, 0);
    expectClose(loads[0], 11.8095e3, 1e-4);
    expectClose(loads[1], 0.59048e3, 1e-4);
    expectClose(loads[2], 37.5e3);
  });
  it('surcharge goes to the top group, support to group 0, shared by stiffness', () => {
    const beds = [bed1, stiff];
    const { loads } = shareLoads(beds, [0, 1], 10e3, 4e3);
    expectClose(loads[0], 12.5e3 - 4e3);
    expectClose(loads[1], 25e3 + 10e3);
    const together = shareLoads([bed1, soft], [0, 0], 10e3, 4e3);
    // one group: Σ = 12.5 + 7.5 + 10 − 4 = 26 kPa shared as Et³: 1.25 : 0.135
    expectClose(together.loads[0], (1.25 / 1.385) * 26e3, 1e-12);
  });
  it('standing support is capped at the load it relieves (METHODS §12): 0.6 m, 25 kN/m³ (15 kPa) under 400 kPa → load 0, excess 385 kPa', () => {
    const bed = { unitWeight: 25e3, thickness: 0.6, modulus: 10e9 };
    const shared = shareLoads([bed], [0], 0, 400e3);
    expect(shared.loads[0]).toBe(0);
    expectClose(shared.supportApplied, 15e3, 1e-12);
    expectClose(shared.supportExcess, 385e3, 1e-12);
    // with a surcharge on the same (only) group the support can relieve that too
    const loaded = shareLoads([bed], [0], 10e3, 400e3);
    expect(loaded.loads[0]).toBe(0);
    expectClose(loaded.supportApplied, 25e3, 1e-12);
  });
  it('loads in a group sum to the group weight plus surcharge minus the applied support (conservation), never negative', () => {
    const bed = fc.record({
      unitWeight: fc.double({ min: 15e3, max: 30e3, noNaN: true }),
      thickness: fc.double({ min: 0.05, max: 3, noNaN: true }),
      modulus: fc.double({ min: 0.5e9, max: 60e9, noNaN: true }),
    });
    fc.assert(
      fc.property(fc.array(bed, { minLength: 1, maxLength: 6 }), fc.double({ min: 0, max: 100e3, noNaN: true }), fc.double({ min: 0, max: 50e3, noNaN: true }), (beds, sur, sup) => {
        const groups = groupLayers(beds);
        const shared = shareLoads(beds, groups, sur, sup);
        for (const g of shared.groups) {
          let sum = 0;
          for (let i = g.first; i <= g.last; i++) sum += shared.loads[i];
          expectClose(sum, g.weight + g.extra, 1e-9);
        }
        const total = shared.loads.reduce((a, b) => a + b, 0);
        const weight = beds.reduce((a, b) => a + b.unitWeight * b.thickness, 0);
        expectClose(total, weight + sur - shared.supportApplied, 1e-9);
        expect(shared.supportApplied).toBeLessThanOrEqual(sup);
        expectClose(shared.supportApplied + shared.supportExcess, sup, 1e-12);
        for (const q of shared.loads) expect(q).toBeGreaterThanOrEqual(0);
        // groups are contiguous and start at 0
        expect(groups[0]).toBe(0);
        for (let i = 1; i < groups.length; i++) expect(groups[i] - groups[i - 1]).toBeGreaterThanOrEqual(0);
      }),
    );
  });
});
