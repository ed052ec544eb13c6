/**
 * File-name patterns expanded by the command line itself, for shells that do not (Windows'
 * cmd and PowerShell) and for quoted patterns: `lamina check "presets/*.lamina.json"`.
 * Node 20 has no `fs.globSync` (it arrived in Node 22), hence this small one.
 *
 * In a path segment `*` matches any run of characters, `?` one character and `[abc]`,
 * `[a-z]`, `[!abc]` one of a set (not `/`); a whole segment `**` matches any number of
 * directories. As in a POSIX shell, a leading `.` in a name is matched only by a leading `.`
 * in the pattern. Matches are regular files (symbolic links followed), sorted, and keep the
 * pattern's literal prefix: `presets/*.json` → `presets/a.json`.
 *
 *     expandGlob('presets/*.lamina.json') // ['presets/coal-room-shale.lamina.json', …]
 */
import { readdirSync, statSync } from 'node:fs';

const MAGIC = /[*?[]/;

/** True when `text` contains a pattern character (`*`, `?` or `[`). */
export const hasGlob = (text: string): boolean => MAGIC.test(text);

/** The regular expression of one path segment of a pattern. */
export function segmentPattern(segment: string): RegExp {
  let re = '';
  for (let i = 0; i < segment.length; i++) {
    const c = segment[i];
    if (c === '*') re += '[^/]*';
    else if (c === '?') re += '[^/]';
    else if (c === '[') {
      const close = segment.indexOf(']', i + 2);
      if (close < 0) {
        re += '\\[';
        continue;
      }
      let set = segment.slice(i + 1, close);
      const negate = set.startsWith('!') || set.startsWith('^');
      if (negate) set = set.slice(1);
      re += `[${negate ? '^/' : ''}${set.replace(/[\\\]^]/g, '\\$&')}]`;
      i = close;
    } else re += c.replace(/[.+^${}()|\\\]]/g, '\\$&');
  }
  return new RegExp(`^${re}$`, 'u');
}

function kind(path: string): 'file' | 'dir' | null {
  try {
    const s = statSync(path);
    return s.isFile() ? 'file' : s.isDirectory() ? 'dir' : null;
  } catch {
    return null;
  }
}

function entries(dir: string): string[] {
  try {
    return readdirSync(dir === '' ? '.' : dir);
  } catch {
    return [];
  }
}

/** Paths of the regular files matching `pattern`, sorted; [] when none match. */
export function expandGlob(pattern: string): string[] {
  const parts = pattern.split(/[\\/]/);
  const found = new Set<string>();
  const MAX_DEPTH = 64; // a guard against directory cycles through symbolic links under `**`
  const walk = (prefix: string, i: number, depth: number): void => {
    if (depth > MAX_DEPTH) return;
    const segment = parts[i];
    const last = i === parts.length - 1;
    if (segment === '**') {
      if (last) return; // a trailing `**` names directories, not files
      walk(prefix, i + 1, depth);
      for (const name of entries(prefix)) {
        if (!name.startsWith('.') && kind(prefix + name) === 'dir') walk(`${prefix}${name}/`, i, depth + 1);
      }
      return;
    }
    if (segment === '' && i === 0) return walk('/', 1, depth); // absolute path
    if (!hasGlob(segment)) {
      const next = prefix + segment;
      if (last) {
        if (kind(next) === 'file') found.add(next);
      } else if (kind(next) === 'dir') walk(`${next}/`, i + 1, depth);
      return;
    }
    const re = segmentPattern(segment);
    const dotOk = segment.startsWith('.');
    for (const name of entries(prefix)) {
      if ((name.startsWith('.') && !dotOk) || !re.test(name)) continue;
      const next = prefix + name;
      const k = kind(next);
      if (last) {
        if (k === 'file') found.add(next);
      } else if (k === 'dir') walk(`${next}/`, i + 1, depth + 1);
    }
  };
  walk('', 0, 0);
  return [...found].sort();
}
