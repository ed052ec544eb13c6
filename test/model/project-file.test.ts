import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultProject } from '../../src/model/defaults';
import { locateJsonError, projectHash, readProjectText, writeProjectText } from '../../src/model/project-file';
import { ProjectError, parseProject } from '../../src/model/validate';
import { rawProjectArb } from './arbitraries';

function refusal(text: string): ProjectError {
  try {
    readProjectText(text);
  } catch (e) {
    if (e instanceof ProjectError) return e;
    throw e;
  }
  throw new Error('expected a ProjectError');
}

describe('readProjectText', () => {
  it('readProjectText(writeProjectText(defaultProject())) gives defaultProject() back, no warnings', () => {
    const { project, warnings } = readProjectText(writeProjectText(defaultProject()));
    expect(project).toStrictEqual(defaultProject());
    expect(warnings).toEqual([]);
  });

  it('a JSON syntax error becomes a ProjectError with path "" and the line and column', () => {
    const err = refusal('{\n  "schema": "lamina/1",\n  "title": }');
    expect(err.issues).toHaveLength(1);
    expect(err.issues[0].path).toBe('');
    expect(err.issues[0].code).toBe('JSON');
    // hand count: line 1 `{⏎` is 2 characters, line 2 `  "schema": "lamina/1",⏎` is 24; in line 3
    // `  "title": }` the "}" is the 12th character, so offset 2 + 24 + 11 = 37
    expect(err.message).toBe('not valid JSON at line 3, column 12 (position 37): unexpected "}" (expected a value)');
  });

  it.each([
    ['{', 'line 1, column 2', 'expected a property name in double quotes'],
    ['{"a":1,}', 'line 1, column 8', 'expected a property name in double quotes'],
    ['[1 2]', 'line 1, column 4', 'expected "," or "]"'],
    ["{'a':1}", 'line 1, column 2', 'expected a property name in double quotes'],
    ['{"a":1} x', 'line 1, column 9', 'after the end of the project'],
    ['{"a":"x\ny"}', 'line 1, column 8', 'control character'],
    ['{"a":01}', 'line 1, column 7', 'expected "," or "}"'],
    ['{"a":"\\q"}', 'line 1, column 8', 'bad escape'],
    ['{"a":NaN}', 'line 1, column 6', 'expected a value'],
    ['{"a":"abc', 'line 1, column 10', 'unterminated string'],
  ])('JSON error in %j is located at %s', (text, where, reason) => {
    const err = refusal(text);
    expect(err.issues[0].path).toBe('');
    expect(err.message).toContain(where);
    expect(err.message).toContain(reason);
  });

  it('property: locateJsonError finds no error in any text JSON.stringify writes', () => {
    fc.assert(fc.property(fc.jsonValue(), (v) => {
      expect(locateJsonError(JSON.stringify(v, null, 2))).toBeUndefined();
    }));
  });

  it('property: locateJsonError finds an error exactly when JSON.parse fails', () => {
    fc.assert(fc.property(fc.jsonValue(), fc.nat(), fc.constantFrom('}', ']', ',', ':', '"', 'x', '\n'), (v, k, junk) => {
      const text = JSON.stringify(v);
      const at = k % (text.length + 1);
      const broken = text.slice(0, at) + junk + text.slice(at);
      let parses = true;
      try { JSON.parse(broken); } catch { parses = false; }
      expect(locateJsonError(broken) === undefined).toBe(parses);
    }));
  });

  it('an empty file is refused as empty', () => {
    expect(refusal('  \n').message).toBe('not valid JSON: the file is empty');
  });

  it('a leading byte-order mark is ignored', () => {
    expect(readProjectText(`\uFEFF${writeProjectText(defaultProject())}`).project).toStrictEqual(defaultProject());
  });

  it('valid JSON that is not a valid project is refused with field paths', () => {
    const text = writeProjectText(defaultProject()).replace('"span_m": 6', '"span_m": -6');
    expect(refusal(text).message).toBe('opening.span_m: must be a number from 0.01 to 1000 m, got -6');
  });
});

describe('writeProjectText', () => {
  it('writes the DESIGN.md key order, 2-space indent and a trailing newline', () => {
    const p = defaultProject();
    p.description = 'd';
    p.opening = { type: 'slab', span_m: 6, length_m: 9, ends: 'clamped', edges: { short: 'clamped', long: 'free' } };
    const text = writeProjectText(p);
    expect(text.endsWith('}\n')).toBe(true);
    expect(text.startsWith('{\n  "schema": "lamina/2",\n  "title": ')).toBe(true);
    const raw = JSON.parse(text);
    expect(Object.keys(raw)).toEqual(['schema', 'title', 'description', 'opening', 'loads', 'support', 'layers', 'design']);
    expect(Object.keys(raw.opening)).toEqual(['type', 'span_m', 'length_m', 'ends', 'edges']);
    expect(Object.keys(raw.loads)).toEqual(['surcharge_kPa', 'horizontalStress_MPa']);
    expect(Object.keys(raw.support)).toEqual(['standing_kPa']);
    expect(Object.keys(raw.layers[0])).toEqual([
      'name', 'thickness_m', 'unitWeight_kNm3', 'youngModulus_GPa', 'modulusBasis', 'poisson',
      'ucs_MPa', 'rockClass', 'tensile', 'jointing', 'hoekBrown',
    ]);
    expect(Object.keys(raw.layers[0].tensile)).toEqual(['value_MPa', 'method', 'specimens']);
    expect(Object.keys(raw.layers[0].jointing)).toEqual([
      'crossJointSpacing_m', 'fractureFrequency_per_m', 'rqd', 'jointCondition', 'jointFriction_deg',
    ]);
    expect(Object.keys(raw.design)).toEqual(['fsTarget', 'deflectionLimitRatio', 'characteristic', 'basis', 'tensileBasis', 'crushingStrength', 'planeStrainModulus']);
  });

  it('omits length_m when it is null (beam, cantilever)', () => {
    expect(writeProjectText(defaultProject())).not.toContain('length_m');
  });

  it('writes keys in the same order whatever order the object was built in', () => {
    const p = defaultProject();
    const shuffled = { design: p.design, layers: p.layers, support: p.support, loads: p.loads, opening: p.opening, title: p.title, schema: p.schema };
    expect(writeProjectText(shuffled)).toBe(writeProjectText(p));
  });

  it('property: read(write(p)) deep-equals p and write is a fixed point, for generated valid projects', () => {
    fc.assert(
      fc.property(rawProjectArb, (raw) => {
        const { project } = parseProject(raw);
        const text = writeProjectText(project);
        const back = readProjectText(text).project;
        expect(back).toStrictEqual(project);
        expect(writeProjectText(back)).toBe(text);
      }),
      { numRuns: 300 },
    );
  });
});

describe('projectHash — 64-bit FNV-1a of the UTF-8 bytes', () => {
  it.each([
    ['', 'cbf29ce484222325'], // FNV-1a 64 offset basis (Fowler–Noll–Vo reference test vectors, from memory)
    ['a', 'af63dc4c8601ec8c'], // FNV reference test vector (from memory)
    ['foobar', '85944171f73967e8'], // FNV reference test vector (from memory)
  ])('projectHash(%j) is %s', (text, hex) => {
    expect(projectHash(text)).toBe(hex);
  });

  it('hashes the UTF-8 bytes of "é" (C3 A9), not its single UTF-16 code unit E9', () => {
    // the FNV-1a recurrence h ← ((h XOR byte)·prime) mod 2^64 written out for the two inputs
    const fnv = (bytes: number[]): string => {
      let h = 0xcbf29ce484222325n;
      for (const b of bytes) h = ((h ^ BigInt(b)) * 0x100000001b3n) & 0xffffffffffffffffn;
      return h.toString(16).padStart(16, '0');
    };
    expect(projectHash('é')).toBe(fnv([0xc3, 0xa9]));
    expect(projectHash('é')).not.toBe(fnv([0xe9]));
  });

  it('property: always 16 lower-case hex digits', () => {
    fc.assert(fc.property(fc.string({ unit: 'grapheme' }), (s) => {
      expect(projectHash(s)).toMatch(/^[0-9a-f]{16}$/);
    }));
  });

  it('property: changing one character of an ASCII text always changes the hash', () => {
    // FNV-1a step h → (h XOR byte)·prime mod 2^64 is a bijection in h for a fixed byte (prime is
    // odd) and a bijection in the byte for a fixed h, so a one-byte substitution cannot collide.
    fc.assert(fc.property(fc.string({ minLength: 1, unit: 'binary-ascii' }), fc.nat(), fc.string({ minLength: 1, maxLength: 1, unit: 'binary-ascii' }), (s, k, c) => {
      const i = k % s.length;
      fc.pre(s[i] !== c);
      expect(projectHash(s.slice(0, i) + c + s.slice(i + 1))).not.toBe(projectHash(s));
    }));
  });
});

describe('writeProjectText — length_m', () => {
  it('writes length_m for a slab and an intersection and never for a beam or cantilever, even if the object carries one', () => {
    const slab = defaultProject();
    slab.opening = { type: 'slab', span_m: 6, length_m: 9, ends: 'simple', edges: null };
    expect(JSON.parse(writeProjectText(slab)).opening.length_m).toBe(9);
    const crossing = defaultProject();
    crossing.opening = { type: 'intersection', span_m: 6, length_m: 8, ends: 'simple', edges: null };
    expect(JSON.parse(writeProjectText(crossing)).opening.length_m).toBe(8);
    const beam = defaultProject();
    beam.opening = { type: 'beam', span_m: 6, length_m: 9, ends: 'clamped', edges: null };
    expect(writeProjectText(beam)).not.toContain('length_m');
    expect(writeProjectText(beam)).not.toContain('edges');
  });
});
