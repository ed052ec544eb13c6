/**
 * Web app benchmark: production bundle size (gzip) and edit → results time in headless
 * chromium for each preset.
 *
 * 1. `vite build` into a temporary folder; gzip (node:zlib) every emitted .js file. Target ≤ 300 kB.
 * 2. `vite preview` of that build on a free port; for each preset, ~20 edits of the immediate-roof
 *    thickness through the app's test hook `window.__lamina.editNow` (edit, analyse at once — no
 *    debounce — then wait for every element to update and for the next animation frame).
 *    Target: median ≤ 50 ms to the frame after the update.
 * 3. For information, a few real keystroke edits through the debounced path: the
 *    `lamina:edit-to-results` measure minus the 150 ms debounce.
 *
 * Run with `npm run bench` (or `npx tsx test/bench/ui.bench.ts`).
 */
import { build, preview } from 'vite';
import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { launchChromium } from '../browser/chromium';
import type { BenchResult } from './types';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const BUNDLE_TARGET_KB = 300;
const EDIT_TARGET_MS = 50;
const DEBOUNCE_MS = 150;
const PRESET_IDS = ['coal-room-shale', 'drift-limestone', 'quarry-bench-overhang', 'intersection-limestone'];

const median = (xs: number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

async function jsFiles(dir: string): Promise<string[]> {
  const out: string[] = [];
  for (const entry of await readdir(dir, { withFileTypes: true })) {
    const p = join(dir, entry.name);
    if (entry.isDirectory()) out.push(...(await jsFiles(p)));
    else if (entry.name.endsWith('.js')) out.push(p);
  }
  return out;
}

export async function benchUi(): Promise<BenchResult[]> {
  const results: BenchResult[] = [];
  const outDir = await mkdtemp(join(tmpdir(), 'lamina-ui-bench-'));
  try {
    const t0 = performance.now();
    await build({ root, configFile: resolve(root, 'vite.config.ts'), logLevel: 'error', build: { outDir, emptyOutDir: true } });
    const buildMs = performance.now() - t0;
    let raw = 0;
    let gz = 0;
    for (const f of await jsFiles(outDir)) {
      const bytes = await readFile(f);
      raw += bytes.length;
      gz += gzipSync(bytes, { level: 9 }).length;
    }
    const kB = gz / 1024;
    results.push({
      name: `production JS bundle: ${kB.toFixed(1)} kB gzip (${(raw / 1024).toFixed(0)} kB raw); figure = build time`,
      median_us: buildMs * 1000,
      target: `≤ ${BUNDLE_TARGET_KB} kB gzip`,
      pass: kB <= BUNDLE_TARGET_KB,
    });

    const server = await preview({
      root,
      configFile: resolve(root, 'vite.config.ts'),
      logLevel: 'error',
      build: { outDir },
      preview: { host: '127.0.0.1', port: 0, strictPort: false, open: false },
    });
    const url = server.resolvedUrls?.local[0];
    if (!url) throw new Error('vite preview did not report a local URL');
    const browser = await launchChromium();
    try {
      for (const id of PRESET_IDS) {
        const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
        const page = await context.newPage();
        const errors: string[] = [];
        page.on('pageerror', (e) => errors.push(e.message));
        page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
        await page.goto(url);
        const ready = () =>
          page.waitForFunction(() => {
            const s = window.__lamina?.state();
            return !!s && s.analysis !== null && !s.pending;
          });
        await ready();
        await page.locator('project-bar #preset').selectOption(id);
        await ready();
        const t = await page.evaluate(() => window.__lamina!.state().project.layers[0].thickness_m);
        // warm-up edits (JIT), then 20 timed edits alternating around the preset value
        const timings = await page.evaluate(
          async ({ t }) => {
            const out: { rendered: number; frame: number; accepted: boolean }[] = [];
            for (let k = 0; k < 25; k++) {
              const r = await window.__lamina!.editNow('layers[0].thickness_m', t * (1 + 0.02 * ((k % 5) + 1)));
              if (k >= 5) out.push({ rendered: r.rendered_ms, frame: r.frame_ms, accepted: r.accepted });
            }
            await window.__lamina!.editNow('layers[0].thickness_m', t);
            return out;
          },
          { t },
        );
        if (timings.some((x) => !x.accepted)) errors.push('an edit was refused');
        const frame = median(timings.map((x) => x.frame));
        const rendered = median(timings.map((x) => x.rendered));
        results.push({
          name: `${id}: edit → results rendered (next frame), median of ${timings.length}`,
          median_us: frame * 1000,
          target: `≤ ${EDIT_TARGET_MS} ms`,
          pass: frame <= EDIT_TARGET_MS && errors.length === 0,
        });
        results.push({ name: `${id}: edit → every element updated (before the frame)`, median_us: rendered * 1000 });

        // the real path: keystrokes → debounce → analysis → render, from the performance measure
        const field = page.locator('quantity-input[path="layers[0].thickness_m"] input');
        await page.evaluate(() => performance.clearMeasures('lamina:edit-to-results'));
        for (let k = 0; k < 5; k++) {
          await field.fill(String(Number((t * (1.1 + 0.05 * k)).toPrecision(6))));
          await page.waitForFunction((n) => performance.getEntriesByName('lamina:edit-to-results', 'measure').length >= n, k + 1);
        }
        const measured = await page.evaluate(() => performance.getEntriesByName('lamina:edit-to-results', 'measure').map((m) => m.duration));
        results.push({
          name: `${id}: typing → results, lamina:edit-to-results measure minus the ${DEBOUNCE_MS} ms debounce (median of ${measured.length})`,
          median_us: Math.max(0, median(measured) - DEBOUNCE_MS) * 1000,
        });
        if (errors.length) results.push({ name: `${id}: page errors: ${errors.join(' | ')}`, median_us: 0, pass: false });
        await context.close();
      }
    } finally {
      await browser.close();
      await new Promise<void>((r) => server.httpServer.close(() => r()));
    }
  } finally {
    await rm(outDir, { recursive: true, force: true });
  }
  return results;
}

// Run directly: npx tsx test/bench/ui.bench.ts
if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  for (const r of await benchUi()) {
    const v = r.median_us >= 1000 ? `${(r.median_us / 1000).toFixed(2)} ms` : `${r.median_us.toFixed(1)} µs`;
    console.log(`${r.pass === false ? '✗' : r.pass ? '✓' : ' '} ${r.name}: ${v}${r.target ? ` (target ${r.target})` : ''}`);
  }
}
