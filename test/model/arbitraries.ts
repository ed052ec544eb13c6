/**
 * fast-check generators of VALID raw project objects (as a `*.lamina.json` file would hold
 * them), with optional keys randomly left out so defaults are exercised.
 */
import fc from 'fast-check';

const num = (min: number, max: number, open: { min?: boolean; max?: boolean } = {}) =>
  fc.double({ min, max, minExcluded: open.min ?? false, maxExcluded: open.max ?? false, noNaN: true, noDefaultInfinity: true });

export const specimenArb = (usable: boolean) =>
  fc
    .record(
      {
        id: fc.string({ maxLength: 8 }),
        diameter_mm: num(30, 120),
        thickness_mm: num(0.04, 1), // × diameter ≥ 30 mm: at least the 1 mm floor
        peakLoad_kN: num(0.1, 30),
        valid: usable ? fc.constant(true) : fc.boolean(),
      },
      { requiredKeys: ['diameter_mm', 'thickness_mm', 'peakLoad_kN', ...(usable ? (['valid'] as const) : [])] },
    )
    // thickness as a fraction of the diameter keeps L/D ≤ 1 (usable) unless not required
    .map((s) => ({ ...s, thickness_mm: s.thickness_mm * s.diameter_mm * (usable ? 1 : 1.5) }));

const tensileArb = fc
  .tuple(
    fc.option(num(0, 20), { nil: null }),
    fc.array(specimenArb(false), { maxLength: 4 }),
    specimenArb(true),
    fc.constantFrom('brazilian', 'direct'),
    fc.boolean(),
  )
  .map(([value, specimens, usable, method, withMethod]) => {
    const out: Record<string, unknown> = {};
    if (value !== null) out.value_MPa = value;
    out.specimens = value === null ? [...specimens, usable] : specimens;
    if (withMethod) out.method = method;
    return out;
  });

const jointingArb = fc.record(
  {
    crossJointSpacing_m: fc.option(num(0.05, 30), { nil: null }),
    fractureFrequency_per_m: fc.option(num(0, 40), { nil: null }),
    rqd: fc.option(num(0, 100), { nil: null }),
    jointCondition: num(0, 30),
    jointFriction_deg: num(10, 60),
  },
  { requiredKeys: [] },
);

const hoekBrownArb = fc.record({ mi: num(2, 40), disturbance: num(0, 1) }, { requiredKeys: [] });

export const layerArb = fc.record(
  {
    name: fc.string({ maxLength: 12 }),
    thickness_m: num(0.02, 20),
    unitWeight_kNm3: num(5, 60),
    youngModulus_GPa: num(0.1, 150),
    modulusBasis: fc.constantFrom('mass', 'intact'),
    poisson: num(0, 0.5, { max: true }),
    ucs_MPa: num(60, 400),
    rockClass: fc.constantFrom('sedimentary', 'igneous', 'metamorphic'),
    tensile: tensileArb,
    jointing: jointingArb,
    hoekBrown: hoekBrownArb,
  },
  { requiredKeys: ['thickness_m', 'unitWeight_kNm3', 'youngModulus_GPa', 'ucs_MPa', 'tensile'] },
);

const openingArb = fc
  .tuple(
    fc.constantFrom('beam', 'slab', 'cantilever', 'intersection'), num(0.5, 60), num(0, 40), fc.constantFrom('clamped', 'simple'), fc.boolean(),
    fc.option(fc.record({ short: fc.constantFrom('clamped', 'simple'), long: fc.constantFrom('clamped', 'simple', 'free') })),
  )
  .map(([type, span, extra, ends, withEnds, edges]) => {
    const o: Record<string, unknown> = { type, span_m: span };
    if (type === 'slab' || type === 'intersection') o.length_m = span + extra;
    if ((type !== 'cantilever' && type !== 'intersection') || withEnds) o.ends = ends;
    if (type === 'slab' && edges !== null) o.edges = edges;
    return o;
  });

const designArb = fc.record(
  {
    fsTarget: fc.record({ tension: num(1, 10), crushing: num(1, 10), sliding: num(1, 10) }, { requiredKeys: [] }),
    deflectionLimitRatio: num(0.01, 0.25),
    characteristic: fc.constantFrom('mean', 'lower5', 'cautiousMean', 'lower5Log'),
    basis: fc.constantFrom('intact', 'jointed'),
    tensileBasis: fc.constantFrom('rockMass', 'lab'),
    crushingStrength: fc.constantFrom('rockMass', 'lab'),
    planeStrainModulus: fc.boolean(),
  },
  { requiredKeys: [] },
);

export const rawProjectArb = fc.record(
  {
    schema: fc.constant('lamina/2'),
    title: fc.string({ maxLength: 20 }),
    description: fc.string({ maxLength: 40 }),
    opening: openingArb,
    loads: fc.record(
      { surcharge_kPa: num(0, 5000), horizontalStress_MPa: num(-5, 100) },
      { requiredKeys: [] },
    ),
    support: fc.record({ standing_kPa: num(0, 500) }, { requiredKeys: [] }),
    layers: fc.array(layerArb, { minLength: 1, maxLength: 4 }),
    design: designArb,
  },
  { requiredKeys: ['schema', 'opening', 'layers'] },
);
