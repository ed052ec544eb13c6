import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { getAtPath, parsePath, setAtPath } from '../../src/model/project-path';

describe('project-path', () => {
  it("parsePath('layers[1].tensile.specimens[0].valid') is ['layers', 1, 'tensile', 'specimens', 0, 'valid'] — DESIGN.md path form", () => {
    expect(parsePath('layers[1].tensile.specimens[0].valid')).toEqual(['layers', 1, 'tensile', 'specimens', 0, 'valid']);
  });

  it('parsePath refuses malformed paths', () => {
    for (const bad of ['', '.a', 'a.', 'a..b', '[0]', 'a[x]', 'a[0', 'a b']) {
      expect(() => parsePath(bad), bad).toThrow(RangeError);
    }
  });

  it('setAtPath changes only the addressed field and leaves the input untouched (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ noNaN: true }), { minLength: 1, maxLength: 6 }), fc.nat(), fc.double({ noNaN: true }), (xs, k, v) => {
        const root = { layers: xs.map((t) => ({ thickness_m: t })), opening: { span_m: 6 } };
        const before = JSON.stringify(root);
        const i = k % xs.length;
        const out = setAtPath(root, `layers[${i}].thickness_m`, v);
        expect(JSON.stringify(root)).toBe(before);
        expect(getAtPath(out, `layers[${i}].thickness_m`)).toBe(v);
        xs.forEach((t, j) => {
          if (j !== i) expect(out.layers[j].thickness_m).toBe(t);
        });
        expect(out.opening.span_m).toBe(6);
      }),
    );
  });

  it('setAtPath never invents structure and refuses prototype keys', () => {
    const root = { opening: { span_m: 6 }, layers: [] as unknown[] };
    expect(() => setAtPath(root, 'loads.surcharge_kPa', 1)).toThrow(RangeError);
    expect(() => setAtPath(root, 'layers[3]', {})).toThrow(RangeError);
    expect(() => setAtPath(root, 'opening.__proto__', {})).toThrow(RangeError);
    expect(setAtPath(root, 'layers[0]', { a: 1 }).layers).toEqual([{ a: 1 }]);
  });

  it('getAtPath of a missing step is undefined', () => {
    expect(getAtPath({ a: null }, 'a.b')).toBeUndefined();
    expect(getAtPath({ a: [1, 2] }, 'a[1]')).toBe(2);
  });
});
