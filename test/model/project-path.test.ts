import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { getAtPath, parsePath, setAtPath, withValueAt } from '../../src/model/project-path';

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
  it('withValueAt copies only the objects on the path and refuses missing fields and forbidden keys', () => {
    const root = { a: [{ b: 1 }, { b: 2 }], c: { d: 3 } };
    const out = withValueAt(root, ['a', 1, 'b'], 5);
    expect(out).toEqual({ a: [{ b: 1 }, { b: 5 }], c: { d: 3 } });
    expect(root.a[1].b).toBe(2);
    expect(out.c).toBe(root.c);
    expect(out.a[0]).toBe(root.a[0]);
    expect(() => withValueAt(root, ['a', 2, 'b'], 1)).toThrow(/a\[2\]\.b: no field/);
    expect(() => withValueAt(root, ['c', 'x'], 1)).toThrow(/no field/);
    expect(() => withValueAt(root, ['__proto__', 'x'], 1)).toThrow(/refused field path/);
  });
});
