/**
 * Builds the node bundle (vite.cli.config.ts, the same build `npm install` runs) into a fresh
 * temporary directory, so end-to-end tests spawn the real `lamina` file with plain node and
 * never race another test that rebuilds dist-node/.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');

export async function buildNode(): Promise<string> {
  const outDir = mkdtempSync(join(tmpdir(), 'lamina-node-'));
  await build({ configFile: join(ROOT, 'vite.cli.config.ts'), root: ROOT, logLevel: 'silent', build: { outDir, emptyOutDir: true } });
  return outDir;
}
