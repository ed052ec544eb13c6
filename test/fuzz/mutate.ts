/**
 * Mutations of a project file as a careless or hostile user makes them: a value changed to an
 * extreme number (1e308, 5e-324, 1e-300, 3.5e299, −0, negatives), another type, null, an
 * array or object; a key deleted, renamed to an unknown or forbidden one (`__proto__`), or
 * written twice in the JSON text (the parser keeps the last); an array entry duplicated or
 * removed. The result is JSON TEXT, as a file would hold it.
 */
import type { Rand } from './generate';

type Node = Record<string, unknown> | unknown[];

const EXTREMES = [0, -0, -1, 1, 1e308, -1e308, 5e-324, -5e-324, 1e-300, 3.5e299, 1e-9, 1e9, 0.5, 100, 101, 1000, 1e5, 0.001, 0.0009999];

const pick = <T>(r: Rand, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)];

function randomValue(r: Rand, old: unknown): unknown {
  const u = r();
  if (u < 0.45) return pick(r, EXTREMES);
  if (u < 0.55 && typeof old === 'number') return old * pick(r, [-1, 10, 1e3, 1e-3, 1e100, 1e-100]);
  if (u < 0.65) return pick(r, ['', '3', 'abc', '1e308', 'NaN', 'clamped', 'slab', 'beam', 'lower5', 'jointed', '__proto__']);
  if (u < 0.72) return pick(r, [true, false]);
  if (u < 0.8) return null;
  if (u < 0.88) return [];
  if (u < 0.93) return {};
  return [pick(r, EXTREMES)];
}

/** Every container (object or array) in the tree, with the path to it. */
function containers(value: unknown, out: Node[] = []): Node[] {
  if (Array.isArray(value)) {
    out.push(value);
    for (const v of value) containers(v, out);
  } else if (value !== null && typeof value === 'object') {
    out.push(value as Node);
    for (const v of Object.values(value)) containers(v, out);
  }
  return out;
}

/** JSON text in which `dup` (if given) gets an extra, earlier entry for `key`. */
function toText(value: unknown, dup: { node: object; key: string; value: unknown } | null): string {
  if (Array.isArray(value)) return `[${value.map((v) => toText(v, dup)).join(',')}]`;
  if (value !== null && typeof value === 'object') {
    const parts = Object.entries(value).map(([k, v]) => `${JSON.stringify(k)}:${toText(v, dup)}`);
    if (dup && dup.node === value) parts.unshift(`${JSON.stringify(dup.key)}:${JSON.stringify(dup.value) ?? 'null'}`);
    return `{${parts.join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

/** Apply 1–4 random mutations to a copy of `base` and return the JSON text. */
export function mutateProject(r: Rand, base: unknown): string {
  const root = JSON.parse(JSON.stringify(base)) as Record<string, unknown>;
  let dup: { node: object; key: string; value: unknown } | null = null;
  const count = 1 + Math.floor(r() * 4);
  for (let m = 0; m < count; m++) {
    const all = containers(root);
    const node = pick(r, all);
    const u = r();
    if (Array.isArray(node)) {
      if (node.length === 0 || u < 0.2) node.push(node.length ? JSON.parse(JSON.stringify(pick(r, node))) : randomValue(r, undefined));
      else if (u < 0.4) node.splice(Math.floor(r() * node.length), 1);
      else node[Math.floor(r() * node.length)] = randomValue(r, undefined);
      continue;
    }
    const keys = Object.keys(node);
    const key = keys.length ? pick(r, keys) : 'x';
    if (u < 0.6) node[key] = randomValue(r, node[key]);
    else if (u < 0.72) delete node[key];
    else if (u < 0.82) {
      const v = node[key];
      delete node[key];
      // an own key even for "__proto__", as JSON.parse makes it
      Object.defineProperty(node, pick(r, ['__proto__', 'constructor', 'prototype', 'Span_m', 'thickness', `${key}_x`]), { value: v, enumerable: true, writable: true, configurable: true });
    } else if (u < 0.92) dup = { node, key, value: randomValue(r, node[key]) };
    else node[key] = JSON.parse(JSON.stringify(root.layers ?? null));
  }
  return toText(root, dup);
}
