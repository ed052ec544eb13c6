/** Shared inputs for the voussoir tests: the DESIGN.md example beam and a random-beam arbitrary. */
import fc from 'fast-check';
import type { VoussoirInput } from '../../src/mechanics/voussoir';

/** The one-layer example of DESIGN.md: 6 m span, 0.45 m shale, γ' 25 kN/m³, E 8 GPa. */
export const designExample: VoussoirInput = {
  span: 6,
  thickness: 0.45,
  unitWeight: 25e3,
  modulus: 8e9,
  ucs: 40e6,
  frictionDeg: 35,
};

/** Rounds to `digits` decimals, as the report prints. */
export const printed = (x: number | null, digits: number): number => Number((x as number).toFixed(digits));

/** Random beams over the ranges of the solver comparison (spans 1–40 m, t 0.1–3 m, E 0.2–80 GPa). */
export const beamArbitrary = (frictionDeg: fc.Arbitrary<number> = fc.constant(30)) =>
  fc.record({
    span: fc.double({ min: 1, max: 40, noNaN: true }),
    thickness: fc.double({ min: 0.1, max: 3, noNaN: true }),
    unitWeight: fc.double({ min: 15e3, max: 35e3, noNaN: true }),
    modulus: fc.double({ min: 0.2e9, max: 80e9, noNaN: true }),
    ucs: fc.constant(40e6),
    frictionDeg,
  });
