import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  QUANTITIES,
  UnitError,
  formatQuantity,
  fromDisplay,
  parseDisplayQuantity,
  parseQuantity,
  toDisplay,
  unitLabel,
  type Quantity,
} from '../../src/model/units';
import { create, createUnitDependencies, unitDependencies } from 'mathjs';
import { expectClose } from '../helpers/expect-close';
import { UNIT_TABLE, unitValue } from '../../src/model/unit-table';

// METHODS §13 factors: 1 psi = 6894.757 Pa; 1 lbf/ft³ = 0.157087 kN/m³; 1 ft = 0.3048 m;
// 1 ksf = 47.880 kPa. Common practice: 1 MPa = 145.04 psi.
const PSI_PA = 6894.757;
const PCF_KNM3 = 0.157087;
const FT_M = 0.3048;
const KSF_KPA = 47.88;

describe('parseQuantity — conversions checked against METHODS §13', () => {
  it('parseQuantity("2500 psi", "MPa") is 17.237 MPa — 2500 × 6894.757 Pa = 17 236 892 Pa (METHODS §13)', () => {
    expectClose(parseQuantity('2500 psi', 'MPa'), (2500 * PSI_PA) / 1e6, 1e-6);
    expectClose(parseQuantity('2500 psi', 'MPa'), 17.237, 1e-4);
  });

  it('parseQuantity("160 lbf/ft^3", "kN/m^3") is 25.134 — 160 × 0.157087 = 25.134 kN/m³ (METHODS §13)', () => {
    expectClose(parseQuantity('160 lbf/ft^3', 'kN/m^3'), 160 * PCF_KNM3, 1e-5);
    expectClose(parseQuantity('160 lbf/ft^3', 'kN/m^3'), 25.134, 1e-4);
  });

  it('parseQuantity("20 ft", "m") is 6.096 m — 20 × 0.3048 (METHODS §13; exact by definition)', () => {
    expect(parseQuantity('20 ft', 'm')).toBe(6.096);
  });

  it('parseQuantity("1 ksf", "kPa") is 47.880 kPa (METHODS §13)', () => {
    expectClose(parseQuantity('1 ksf', 'kPa'), KSF_KPA, 1e-4);
  });

  it('parseQuantity("1 psi", "Pa") is 6894.757 Pa (METHODS §13)', () => {
    expectClose(parseQuantity('1 psi', 'Pa'), PSI_PA, 1e-7);
  });

  it('parseQuantity("1 MPa", "psi") is 145.04 psi (common practice, METHODS §10)', () => {
    expectClose(parseQuantity('1 MPa', 'psi'), 145.04, 1e-4);
  });

  it.each([
    ['0.45 m', 'm', 0.45], // identity
    ['45 cm', 'm', 0.45], // 45 / 100
    ['450 mm', 'm', 0.45], // 450 / 1000
    ['3 MPa', 'MPa', 3], // identity
    ['3000 kPa', 'MPa', 3], // 3000 / 1000
    ['8 GPa', 'MPa', 8000], // 8 × 1000
    ['25 kN/m³', 'kN/m^3', 25], // pretty superscript accepted
    ['25 kN/m3', 'kN/m^3', 25], // m3 read as m^3
    ['25000 N/m^3', 'kN/m^3', 25], // 25000 / 1000
    ['160 pcf', 'kN/m^3', 160 * PCF_KNM3], // pcf = lbf/ft³ (METHODS §13 factor)
    ['12 in', 'm', 12 * 0.0254], // 1 in = 0.0254 m (exact by definition)
    ['1 ksi', 'MPa', (1000 * PSI_PA) / 1e6], // ksi = 1000 psi
    ['1000 psf', 'kPa', KSF_KPA], // 1000 psf = 1 ksf
    ['2 kip', 'kN', 2 * 4.4482216], // 1 kip = 1000 lbf, 1 lbf = 4.4482216 N (exact by definition)
    ['  -1.5e1 m ', 'm', -15], // signs, exponents and spaces
    ['.5 m', 'm', 0.5],
    ['30 deg', 'deg', 30],
  ])('parseQuantity(%j, %j) is %d', (text, unit, expected) => {
    expectClose(parseQuantity(text, unit), expected, 1e-5); // METHODS §13 factors carry 6 digits
  });

  it.each([
    ['6', 'm', 6],
    ['2500', 'psi', 2500],
    ['-3', 'MPa', -3],
    ['1e3', 'kPa', 1000],
  ])('a bare number %j is taken as already in %s', (text, unit, expected) => {
    expect(parseQuantity(text, unit)).toBe(expected);
  });

  it('a wrong dimension throws UnitError naming what was expected: expected a length (e.g. 6 m or 20 ft), got "3 MPa"', () => {
    expect(() => parseQuantity('3 MPa', 'm')).toThrow(UnitError);
    expect(() => parseQuantity('3 MPa', 'm')).toThrow('expected a length (e.g. 6 m or 20 ft), got "3 MPa"');
  });

  it.each([
    ['25 kN/m^3', 'MPa', 'expected a stress or pressure (e.g. 3 MPa or 450 psi), got "25 kN/m^3"'],
    ['6 m', 'kN/m^3', 'expected a unit weight (e.g. 25 kN/m³ or 160 lbf/ft³), got "6 m"'],
    ['6 m', 'kN', 'expected a force (e.g. 10 kN or 2250 lbf), got "6 m"'],
    ['6 m^2', 'm', 'expected a length (e.g. 6 m or 20 ft), got "6 m^2"'],
    ['6 m m', 'm', 'expected a length (e.g. 6 m or 20 ft), got "6 m m"'],
  ])('parseQuantity(%j, %j) throws %j', (text, unit, message) => {
    expect(() => parseQuantity(text, unit)).toThrow(new UnitError(message));
  });

  it.each([
    '', '   ', 'abc', 'm', '3 MPa 5', '1+2 m', '2*3 m', '3 m + 4 m', 'sqrt(4) m', 'eval("1") m',
    '1,5,0 m', '3 furlongs', '1e400 m', '6 m;', 'Infinity m', 'NaN',
  ])('unparsable or unsafe text %j throws UnitError (text is never evaluated)', (text) => {
    expect(() => parseQuantity(text, 'm')).toThrow(UnitError);
  });

  it('an unknown target unit is a programming error (RangeError), not a user error', () => {
    expect(() => parseQuantity('3 m', 'parsec-ish')).toThrow(RangeError);
  });

  it('property: parseQuantity(`${x} ft`, "m") = 0.3048·x for any finite x (METHODS §13)', () => {
    fc.assert(fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
      const got = parseQuantity(`${x} ft`, 'm');
      if (x === 0) expect(got).toBe(0);
      else expectClose(got, x * FT_M, 1e-12);
    }));
  });

  it('property: parseQuantity(`${x} psi`, "kPa") = 6.894757·x (METHODS §13)', () => {
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 1e6, noNaN: true }), (x) => {
      expectClose(parseQuantity(`${x} psi`, 'kPa'), (x * PSI_PA) / 1000, 1e-6);
    }));
  });
});

describe('display unit systems', () => {
  it.each([
    ['length', 1, 1 / FT_M], // 1 m = 3.28084 ft
    ['smallLength', 25.4, 1], // 25.4 mm = 1 in (exact)
    ['stress', 1, 145.04], // 1 MPa = 145.04 psi (common practice; 5 digits)
    ['pressure', KSF_KPA, 1000], // 47.880 kPa = 1 ksf = 1000 psf (METHODS §13)
    ['modulus', 1, 145.04], // 1 GPa = 1e9 Pa / (1000 × 6894.757 Pa) = 145.04 ksi
    ['unitWeight', PCF_KNM3, 1], // 0.157087 kN/m³ = 1 lbf/ft³ (METHODS §13)
    ['force', 4.4482216152605, 1000], // 4.448 kN = 1000 lbf (1 lbf = 4.4482216152605 N, exact by definition)
    ['deflection', 25.4, 1], // 25.4 mm = 1 in
  ] as Array<[Quantity, number, number]>)('%s: toDisplay(%d in file units, "US") is %d', (quantity, fileValue, usValue) => {
    expectClose(toDisplay(fileValue, quantity, 'US'), usValue, 5e-5); // check values carry 5–6 digits
  });

  it('each plain display factor equals the mathjs conversion of the same units (registry library) to 1e-9', () => {
    // units.ts formats without mathjs; the factors must agree with mathjs's ft, in, lbf, psi.
    const m = create({ unitDependencies, createUnitDependencies }, {});
    m.createUnit('psf', '1 lbf/ft^2');
    m.createUnit('ksi', '1000 psi');
    // mathjs's own kip is 4448.2216 N (8 digits, 3.4e-9 off); the definition is 1000 lbf exactly.
    m.createUnit('kip', '1000 lbf', { override: true });
    for (const q of Object.keys(QUANTITIES) as Quantity[]) {
      const { file, US } = QUANTITIES[q];
      // 1e-9: mathjs stores psi rounded to 6894.75729 Pa (9 digits); units.ts derives it from lbf and in.
      expectClose(toDisplay(1, q, 'US'), m.unit(1, file).toNumber(US), 1e-9);
    }
  });

  it('a bolt force typed in kips: "25 kip" is 111.206 kN (25 × 1000 × 4.4482216153 N, 1 lbf = 0.45359237 kg × 9.80665 m/s²)', () => {
    expectClose(parseDisplayQuantity('25 kip', 'boltForce', 'US'), 25 * 4.4482216152605, 1e-12);
    expectClose(parseDisplayQuantity('25', 'boltForce', 'US'), 25 * 4.4482216152605, 1e-12);
    expectClose(parseDisplayQuantity('2 kips', 'boltForce', 'SI'), 2 * 4.4482216152605, 1e-12);
    expect(unitLabel('boltForce', 'US')).toBe('kip');
  });

  it('SI display units are the file units (factor 1)', () => {
    for (const q of Object.keys(QUANTITIES) as Quantity[]) {
      expect(toDisplay(12.5, q, 'SI')).toBe(12.5);
      expect(fromDisplay(12.5, q, 'SI')).toBe(12.5);
    }
  });

  it('property: fromDisplay(toDisplay(x)) returns x (to 1e-12)', () => {
    const quantity = fc.constantFrom(...(Object.keys(QUANTITIES) as Quantity[]));
    fc.assert(fc.property(fc.double({ min: 1e-9, max: 1e9, noNaN: true }), fc.boolean(), quantity, fc.constantFrom('SI', 'US' as const), (m, negative, q, sys) => {
      const x = negative ? -m : m;
      expectClose(fromDisplay(toDisplay(x, q, sys), q, sys), x, 1e-12);
    }));
  });

  it('unitLabel gives pretty labels: kN/m³, lbf/ft³, psi, psf, ksi', () => {
    expect(unitLabel('unitWeight', 'SI')).toBe('kN/m³');
    expect(unitLabel('unitWeight', 'US')).toBe('lbf/ft³');
    expect(unitLabel('stress', 'US')).toBe('psi');
    expect(unitLabel('pressure', 'US')).toBe('psf');
    expect(unitLabel('modulus', 'US')).toBe('ksi');
    expect(unitLabel('length', 'SI')).toBe('m');
  });

  it('formatQuantity(6, "length", "US") is "19.7 ft" — 6/0.3048 = 19.685, a result to 3 significant figures (METHODS §13)', () => {
    expect(formatQuantity(6, 'length', 'US')).toBe('19.7 ft');
    expect(formatQuantity(6, 'length', 'US', 4)).toBe('19.69 ft');
    expect(formatQuantity(25, 'unitWeight', 'US')).toBe('159 lbf/ft³'); // 25/0.157087 = 159.15
    expect(formatQuantity(3, 'stress', 'US', 3)).toBe('435 psi'); // 3 × 145.04 = 435.1
    expect(formatQuantity(0.45, 'length', 'SI')).toBe('0.45 m');
    expect(formatQuantity(null, 'length', 'SI')).toBe('—');
    expect(formatQuantity(-0, 'stress', 'SI')).toBe('0 MPa');
  });

  it('parseDisplayQuantity reads a field shown in US units: bare "20" in ft and "6.096 m" both give 6.096 m', () => {
    expectClose(parseDisplayQuantity('20', 'length', 'US'), 6.096, 1e-12);
    expectClose(parseDisplayQuantity('6.096 m', 'length', 'US'), 6.096, 1e-12);
    expectClose(parseDisplayQuantity('2500 psi', 'stress', 'SI'), 17.237, 1e-4);
  });

  it('non-finite values, unknown quantities and systems and bad digits throw RangeError (never NaN)', () => {
    expect(() => toDisplay(NaN, 'length', 'US')).toThrow(RangeError);
    expect(() => fromDisplay(Infinity, 'length', 'US')).toThrow(RangeError);
    expect(() => toDisplay(1, 'speed' as Quantity, 'US')).toThrow(RangeError);
    expect(() => toDisplay(1, 'length', 'imperial' as 'US')).toThrow(RangeError);
    expect(() => unitLabel('length', 'metric' as 'SI')).toThrow(RangeError);
    expect(() => formatQuantity(1, 'length', 'SI', 0)).toThrow(RangeError);
  });
});

describe('the unit table of the field reader (no mathjs in the app) against mathjs, the registry library', () => {
  const math = create({ unitDependencies, createUnitDependencies }, {});
  for (const [n, d] of [['psf', '1 lbf/ft^2'], ['ksf', '1000 lbf/ft^2'], ['ksi', '1000 psi'], ['pcf', '1 lbf/ft^3'], ['kcf', '1000 lbf/ft^3']]) math.createUnit(n, d);
  const siOf = (u: string) => {
    const x = math.unit(1, u).toSI();
    return { factor: x.toNumber(), dims: x.formatUnits() };
  };
  const symbols = [
    ...Object.keys(UNIT_TABLE),
    'mm', 'cm', 'km', 'dm', 'um', 'dam', 'kg', 'kN', 'MN', 'GN', 'kPa', 'MPa', 'GPa', 'hPa', 'mbar', 'kbar',
    'kN/m^3', 'N/m^3', 'lbf/ft^3', 'N/mm^2', 'kN/m^2', 'lbf/in^2', 'kN m^-3', 'kN/m m', 'kN/m/m', 'kN*m', 'm^2/m', 'ft^1', 'lbf / ft^3',
  ];
  it.each(symbols)('%s: the same factor to SI base units (to 1e-8; mathjs rounds kip to 8 digits) and the same dimension', (u) => {
    const ours = unitValue(u)!;
    expect(ours).toBeDefined();
    const ref = siOf(u);
    expectClose(ours.factor, ref.factor, 1e-8);
    // the same dimension: a unit of the same SI base units, factor 1, gives the same SI form
    const probe = `${ours.dimension[0] ? `m^${ours.dimension[0]}` : ''} ${ours.dimension[1] ? `kg^${ours.dimension[1]}` : ''} ${ours.dimension[2] ? `s^${ours.dimension[2]}` : ''} ${ours.dimension[3] ? `rad^${ours.dimension[3]}` : ''}`.trim();
    expect(siOf(probe).dims).toBe(ref.dims);
  });
  it.each(['KN', 'mpa', 'Mpa', 'kpa', 'kft', 'kpsi', 'klbf', 'kN.m', 'm^', '^2', 'furlongs', 'cdeg'])('%s is refused (mathjs refuses it too, or it is a prefix on a unit that takes none here)', (u) => {
    expect(unitValue(u)).toBeUndefined();
  });
});
