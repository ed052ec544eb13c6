import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { boltSuspension, suspendedLoads } from '../../src/mechanics/suspension';
import { groupLayers } from '../../src/mechanics/layering';
import { expectClose } from '../helpers/expect-close';

describe('boltSuspension — statics (METHODS §12)', () => {
  it('25 kN/m³ × 0.5 m over a 1.2 × 1.2 m pattern → 18.0 kN per bolt; a 100 kN bolt → FS 5.56 (METHODS §12 check, statics)', () => {
    const r = boltSuspension({ suspended: [{ unitWeight: 25e3, thickness: 0.5 }], spacingAcross: 1.2, spacingAlong: 1.2, capacity: 100e3 });
    expectClose(r.weight, 12.5e3);
    expectClose(r.load, 18.0e3);
    expectClose(r.fs!, 5.56, 1e-3);
  });

  it('two hanging layers on a 1.0 × 1.5 m pattern: (25·0.5 + 22·0.3) kPa × 1.5 m² = 28.65 kN (hand statics)', () => {
    const r = boltSuspension({
      suspended: [{ unitWeight: 25e3, thickness: 0.5 }, { unitWeight: 22e3, thickness: 0.3 }],
      spacingAcross: 1.0, spacingAlong: 1.5, capacity: 120e3,
    });
    expectClose(r.load, 28.65e3);
    expectClose(r.fs!, 120 / 28.65);
  });

  it('standing support relieves the bolts first: 12.5 kPa − 5 kPa over 1.44 m² → 10.8 kN; more than the weight → 0 kN and FS null (statics)', () => {
    const base = { suspended: [{ unitWeight: 25e3, thickness: 0.5 }], spacingAcross: 1.2, spacingAlong: 1.2, capacity: 100e3 };
    expectClose(boltSuspension({ ...base, standingSupport: 5e3 }).load, 10.8e3);
    const lifted = boltSuspension({ ...base, standingSupport: 20e3 });
    expect(lifted.load).toBe(0);
    expect(lifted.fs).toBeNull();
  });

  it('nothing suspended (anchored in the lowest layer): load 0, FS null, never Infinity', () => {
    const r = boltSuspension({ suspended: [], spacingAcross: 1, spacingAlong: 1, capacity: 100e3 });
    expect(r).toEqual({ weight: 0, pressure: 0, load: 0, fs: null });
  });

  it('refuses bad input with a RangeError naming the parameter (negative spacing, zero capacity, NaN)', () => {
    const ok = { suspended: [{ unitWeight: 25e3, thickness: 0.5 }], spacingAcross: 1.2, spacingAlong: 1.2, capacity: 100e3 };
    expect(() => boltSuspension({ ...ok, spacingAcross: -1 })).toThrow(/spacingAcross/);
    expect(() => boltSuspension({ ...ok, spacingAlong: NaN })).toThrow(/spacingAlong/);
    expect(() => boltSuspension({ ...ok, capacity: 0 })).toThrow(/capacity/);
    expect(() => boltSuspension({ ...ok, capacity: NaN })).toThrow(/capacity/);
    expect(() => boltSuspension({ ...ok, standingSupport: -1 })).toThrow(/standingSupport/);
    expect(() => boltSuspension({ ...ok, suspended: [{ unitWeight: 25e3, thickness: NaN }] })).toThrow(/suspended\[0\]\.thickness/);
    expect(() => boltSuspension({ ...ok, suspended: [{ unitWeight: -1, thickness: 1 }] })).toThrow(/suspended\[0\]\.unitWeight/);
  });
});

describe('suspendedLoads — the hanging weight moves to the anchor layer\'s group', () => {
  it('anchor layer 1 alone: 25 kPa own weight + 12.5 kPa hanging = 37.5 kPa (statics)', () => {
    const r = suspendedLoads({
      beds: [{ unitWeight: 25e3, thickness: 0.5, modulus: 10e9 }, { unitWeight: 25e3, thickness: 1, modulus: 10e9 }],
      anchorLayer: 1,
    });
    expect(r.loads[0]).toBe(0);
    expectClose(r.loads[1], 37.5e3);
    expect(r.groups).toEqual([null, 0]);
    expectClose(r.transferred, 12.5e3);
  });

  it('the anchor shares the hanging load with a soft bed above by E t³ (Obert & Duvall §2): 45 kPa × 10/10.135 and × 0.135/10.135', () => {
    // Beds 1 (E 10 GPa, 1.0 m) and 2 (E 5 GPa, 0.3 m) bend together: (q₂)₁ = 10·32.5/10.135 kPa
    // = 32.07 kPa > 25 kPa (METHODS §2 test). Group load 25 + 7.5 + 12.5 (hanging) = 45 kPa.
    const r = suspendedLoads({
      beds: [
        { unitWeight: 25e3, thickness: 0.5, modulus: 10e9 },
        { unitWeight: 25e3, thickness: 1.0, modulus: 10e9 },
        { unitWeight: 25e3, thickness: 0.3, modulus: 5e9 },
      ],
      anchorLayer: 1,
    });
    expect(r.groups).toEqual([null, 0, 0]);
    expectClose(r.loads[1], (45e3 * 10) / 10.135);
    expectClose(r.loads[2], (45e3 * 0.135) / 10.135);
  });

  it('a stiff bed above the anchor separates and takes none of the hanging load (METHODS §2 grouping)', () => {
    // Anchor 0.5 m E 10 GPa alone carries 12.5 kPa; adding 1.0 m E 20 GPa gives 2.206 kPa < 12.5.
    const r = suspendedLoads({
      beds: [
        { unitWeight: 25e3, thickness: 0.4, modulus: 8e9 },
        { unitWeight: 25e3, thickness: 0.5, modulus: 10e9 },
        { unitWeight: 25e3, thickness: 1.0, modulus: 20e9 },
      ],
      anchorLayer: 1,
    });
    expect(r.groups).toEqual([null, 0, 1]);
    expectClose(r.loads[1], 12.5e3 + 10e3);
    expectClose(r.loads[2], 25e3);
  });

  it('refuses a bad anchor index or negative surcharge, naming the parameter', () => {
    const beds = [{ unitWeight: 25e3, thickness: 0.5, modulus: 10e9 }];
    expect(() => suspendedLoads({ beds, anchorLayer: 1 })).toThrow(/anchorLayer/);
    expect(() => suspendedLoads({ beds, anchorLayer: 0.5 })).toThrow(/anchorLayer/);
    expect(() => suspendedLoads({ beds, anchorLayer: 0, surcharge: -1 })).toThrow(/surcharge/);
    expect(() => suspendedLoads({ beds: [{ ...beds[0], modulus: NaN }], anchorLayer: 0 })).toThrow(/beds\[0\]\.modulus/);
  });
});

const bedArb = fc.record({
  unitWeight: fc.double({ min: 15e3, max: 30e3, noNaN: true }),
  thickness: fc.double({ min: 0.05, max: 3, noNaN: true }),
  modulus: fc.double({ min: 1e9, max: 60e9, noNaN: true }),
});

describe('suspension — properties', () => {
  it('suspended weight is conserved: loads on the spanning layers add up to Σγt + surcharge − the standing support applied (statics)', () => {
    fc.assert(
      fc.property(
        fc.array(bedArb, { minLength: 1, maxLength: 7 }),
        fc.nat(),
        fc.double({ min: 0, max: 100e3, noNaN: true }),
        fc.double({ min: 0, max: 50e3, noNaN: true }),
        (beds, pick, surcharge, standing) => {
          const anchorLayer = pick % beds.length;
          const r = suspendedLoads({ beds, anchorLayer, surcharge, standingSupport: standing });
          const total = beds.reduce((w, b) => w + b.unitWeight * b.thickness, 0);
          const sum = r.loads.reduce((a, b) => a + b, 0);
          const scale = total + surcharge + standing; // round-off is relative to the largest term
          // v2 (METHODS §12): standing support beyond the load it can relieve is dropped, never negative.
          const applied = standing - r.spanning.supportExcess;
          expect(r.spanning.supportExcess).toBeGreaterThanOrEqual(0);
          expect(Math.abs(sum - (total + surcharge - applied))).toBeLessThanOrEqual(1e-12 * scale);
          // The hanging layers carry nothing over the opening; the bolts carry their weight.
          for (let i = 0; i < anchorLayer; i++) expect(r.loads[i]).toBe(0);
          const bolts = boltSuspension({ suspended: beds.slice(0, anchorLayer), spacingAcross: 1, spacingAlong: 1, capacity: 1 });
          expect(Math.abs(bolts.weight - r.transferred - standing)).toBeLessThanOrEqual(1e-12 * scale);
          // The layers from the anchor up are grouped as a roof of their own (§2).
          expect(r.groups.slice(anchorLayer)).toEqual(groupLayers(beds.slice(anchorLayer)));
        },
      ),
    );
  });

  it('more bolts never lower the bolt FS: FS ∝ 1/(Sx Sy) (statics)', () => {
    fc.assert(
      fc.property(
        fc.array(bedArb, { minLength: 1, maxLength: 4 }),
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 0.3, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 1, noNaN: true }),
        fc.double({ min: 0.1, max: 1, noNaN: true }),
        (suspended, sx, sy, kx, ky) => {
          const wide = boltSuspension({ suspended, spacingAcross: sx, spacingAlong: sy, capacity: 100e3 });
          const dense = boltSuspension({ suspended, spacingAcross: sx * kx, spacingAlong: sy * ky, capacity: 100e3 });
          expect(dense.fs!).toBeGreaterThanOrEqual(wide.fs!);
          expectClose(dense.fs! / wide.fs!, 1 / (kx * ky), 1e-9);
        },
      ),
    );
  });
});
