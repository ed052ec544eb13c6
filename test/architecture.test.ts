import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

// The layering rule of DESIGN.md ("dependencies point downward only") and STYLE.md §1 (the
// kernels cannot touch the DOM), checked on the source text.
const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const src = join(root, 'src');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : path.endsWith('.ts') ? [path] : [];
  });
}

const RANK: Record<string, number> = { model: 0, strength: 1, mechanics: 1, analysis: 2, uncertainty: 3, report: 4, cli: 5, ui: 5 };
const layerOf = (path: string) => relative(src, path).split(/[\\/]/)[0];

function imports(text: string): string[] {
  return [...text.matchAll(/(?:import|export)[^'"]*?from\s+['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)].map((m) => m[1] ?? m[2]);
}

describe('architecture', () => {
  const all = files(src);
  it('finds the source files', () => {
    expect(all.length).toBeGreaterThan(30);
  });
  it('every folder under src is ranked (a new folder fails until it gets a place in the layers)', () => {
    const folders = readdirSync(src).filter((name) => statSync(join(src, name)).isDirectory());
    expect(folders.length).toBeGreaterThan(5);
    for (const folder of folders) expect(folder in RANK, `src/${folder} has no rank in test/architecture.test.ts`).toBe(true);
    // files directly in src are entry points only: the browser entry main.ts and the library entry index.ts
    const loose = readdirSync(src).filter((name) => !statSync(join(src, name)).isDirectory());
    expect(loose.filter((f) => f.endsWith('.ts')).sort()).toEqual(['index.ts', 'main.ts']);
  });
  it('the check rules live in analysis only: no other layer imports the check table internals or re-derives counting', () => {
    for (const file of all.filter((f) => !['analysis'].includes(layerOf(f)))) {
      const text = readFileSync(file, 'utf8');
      expect(/findIndex\(\(l\) => l\.name === /.test(text), `${relative(root, file)} looks up a layer by name`).toBe(false);
      expect(/design\.basis === 'jointed' && .*tension/.test(text), `${relative(root, file)} re-derives the tension rule`).toBe(false);
    }
  });
  it('every import points to the same layer or a lower one (DESIGN.md layers)', () => {
    for (const file of all) {
      const from = layerOf(file);
      if (!(from in RANK)) continue;
      for (const spec of imports(readFileSync(file, 'utf8'))) {
        if (!spec.startsWith('.')) continue;
        const target = resolve(dirname(file), spec);
        const to = layerOf(target);
        if (!(to in RANK) || to === from) continue;
        const ok = RANK[to] < RANK[from] && !(from === 'cli' && to === 'ui') && !(from === 'ui' && to === 'cli');
        expect(ok, `${relative(root, file)} imports ${spec} (${from} → ${to})`).toBe(true);
      }
    }
  });
  it('kernels in src/mechanics and src/strength use no DOM, I/O, mathjs, lit or d3 (STYLE.md §1)', () => {
    for (const file of all.filter((f) => ['mechanics', 'strength'].includes(layerOf(f)))) {
      const text = readFileSync(file, 'utf8').replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, '');
      for (const spec of imports(text)) expect(spec.startsWith('.'), `${relative(root, file)} imports ${spec}`).toBe(true);
      expect(/\b(document|window|localStorage|fetch|process)\b/.test(text), `${relative(root, file)} touches the DOM or I/O`).toBe(false);
    }
  });
  it('src/uncertainty touches no DOM, storage, network or process (it runs in node and a Web Worker)', () => {
    const found = all.filter((f) => layerOf(f) === 'uncertainty');
    expect(found.length).toBeGreaterThan(5);
    for (const file of found) {
      const text = readFileSync(file, 'utf8').replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, '');
      expect(/\b(document|window|localStorage|fetch|process)\b/.test(text), `${relative(root, file)} touches the DOM or I/O`).toBe(false);
      expect(imports(text).some((s) => s === 'mathjs' || s === 'lit'), `${relative(root, file)} imports mathjs or lit`).toBe(false);
    }
  });
  it('only src/model/units.ts and the report use mathjs; nothing else uses it for units', () => {
    for (const file of all) {
      const text = readFileSync(file, 'utf8');
      if (!imports(text).includes('mathjs')) continue;
      const rel = relative(src, file).replace(/\\/g, '/');
      expect(rel === 'model/units.ts' || rel.startsWith('report/'), `${rel} imports mathjs`).toBe(true);
    }
  });
});
