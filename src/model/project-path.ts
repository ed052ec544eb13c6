/**
 * Project field paths as used by the report, warnings and the `project-edit` event:
 * `layers[1].thickness_m`, `opening.span_m`, `layers[0].tensile.specimens[2].valid`.
 * `setAtPath` returns a changed deep copy and never mutates its input.
 *     setAtPath({ a: [{ b: 1 }] }, 'a[0].b', 2) // { a: [{ b: 2 }] }
 */
export type PathKey = string | number;

/** Splits `layers[1].thickness_m` into `['layers', 1, 'thickness_m']`; throws on a malformed path. */
export function parsePath(path: string): PathKey[] {
  if (typeof path !== 'string' || path.length === 0) throw new RangeError(`empty field path`);
  const keys: PathKey[] = [];
  const re = /([A-Za-z_$][\w$]*)|\[(\d+)\]|(\.)/gy;
  let expectName = true;
  let m: RegExpExecArray | null;
  let last = 0;
  while ((m = re.exec(path)) !== null) {
    if (m[1] !== undefined) {
      if (!expectName) throw new RangeError(`malformed field path "${path}"`);
      keys.push(m[1]);
      expectName = false;
    } else if (m[2] !== undefined) {
      if (expectName) throw new RangeError(`malformed field path "${path}"`);
      keys.push(Number(m[2]));
    } else {
      if (expectName) throw new RangeError(`malformed field path "${path}"`);
      expectName = true;
    }
    last = re.lastIndex;
  }
  if (last !== path.length || expectName) throw new RangeError(`malformed field path "${path}"`);
  return keys;
}

const FORBIDDEN = new Set(['__proto__', 'prototype', 'constructor']);

/** Throws when a parsed path names `__proto__`, `prototype` or `constructor`. */
export function refuseForbiddenKeys(keys: readonly PathKey[], path: string): void {
  for (const k of keys) {
    if (typeof k === 'string' && FORBIDDEN.has(k)) throw new RangeError(`refused field path "${path}"`);
  }
}

/** Reads the value at `path`, or `undefined` when any step is missing. */
export function getAtPath(root: unknown, path: string): unknown {
  let node: unknown = root;
  for (const key of parsePath(path)) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<PathKey, unknown>)[key];
  }
  return node;
}

/**
 * A deep copy of `root` with `value` at `path`. Intermediate objects must exist (an edit never
 * invents structure); an array index may be at most the array length (append).
 */
export function setAtPath<T>(root: T, path: string, value: unknown): T {
  const keys = parsePath(path);
  refuseForbiddenKeys(keys, path);
  const copy = structuredClone(root) as unknown;
  let node = copy as Record<PathKey, unknown>;
  for (let i = 0; i < keys.length - 1; i++) {
    const next = node[keys[i]];
    if (next === null || typeof next !== 'object') {
      throw new RangeError(`${path}: no field at "${keys.slice(0, i + 1).join('.')}"`);
    }
    node = next as Record<PathKey, unknown>;
  }
  const lastKey = keys[keys.length - 1];
  if (Array.isArray(node)) {
    if (typeof lastKey !== 'number' || lastKey > node.length) {
      throw new RangeError(`${path}: index out of range`);
    }
  } else if (typeof lastKey === 'number') {
    throw new RangeError(`${path}: not a list`);
  }
  node[lastKey] = structuredClone(value);
  return copy as T;
}

/**
 * A copy of `root` with the number `value` at the already parsed `keys` (from `parsePath`),
 * sharing every object that is not on the path: only the objects along the path are copied, so
 * a change costs a few shallow copies however large the project is (for the many samples of the
 * uncertainty run). The field must already exist; `root` is never mutated.
 *     withValueAt({ a: [{ b: 1 }], c: {} }, ['a', 0, 'b'], 2) // { a: [{ b: 2 }], c: <same object> }
 */
export function withValueAt<T>(root: T, keys: readonly PathKey[], value: unknown): T {
  const path = keys.map((k) => (typeof k === 'number' ? `[${k}]` : `.${k}`)).join('').replace(/^\./, '');
  refuseForbiddenKeys(keys, path);
  const copyAt = (node: unknown, depth: number): unknown => {
    if (node === null || typeof node !== 'object') throw new RangeError(`${path}: no field at "${keys.slice(0, depth).join('.')}"`);
    const key = keys[depth];
    if (Array.isArray(node) !== (typeof key === 'number') || !Object.prototype.hasOwnProperty.call(node, key)) {
      throw new RangeError(`${path}: no field at "${keys.slice(0, depth + 1).join('.')}"`);
    }
    const copy = (Array.isArray(node) ? [...node] : { ...node }) as Record<PathKey, unknown>;
    copy[key] = depth === keys.length - 1 ? value : copyAt((node as Record<PathKey, unknown>)[key], depth + 1);
    return copy;
  };
  if (keys.length === 0) throw new RangeError('empty field path');
  return copyAt(root, 0) as T;
}
