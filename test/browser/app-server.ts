/**
 * Serve the app for browser tests: a Vite dev server on a free loopback port, from the
 * project's own vite.config.ts. Close it in afterAll.
 */
import { createServer } from 'vite';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');

export interface AppServer {
  url: string;
  close(): Promise<void>;
}

export async function startApp(): Promise<AppServer> {
  const server = await createServer({
    root,
    configFile: resolve(root, 'vite.config.ts'),
    logLevel: 'error',
    server: { host: '127.0.0.1', port: 0, strictPort: false, hmr: false },
  });
  await server.listen();
  const url = server.resolvedUrls?.local[0];
  if (!url) throw new Error('vite dev server did not report a local URL');
  return { url, close: () => server.close() };
}

/**
 * Serve the production build (`vite build` into a temporary folder, then `vite preview`), as
 * users get it from `npm run build`: for benchmarks that time the page. `extraFiles` (name →
 * text) are written beside the build before it is served; `outDir` is the folder (removed on
 * close).
 */
export async function startBuiltApp(extraFiles: Record<string, string> = {}): Promise<AppServer & { outDir: string }> {
  const { build, preview } = await import('vite');
  const { mkdtemp, rm, writeFile } = await import('node:fs/promises');
  const { tmpdir } = await import('node:os');
  const outDir = await mkdtemp(resolve(tmpdir(), 'lamina-built-'));
  await build({ root, configFile: resolve(root, 'vite.config.ts'), logLevel: 'error', build: { outDir, emptyOutDir: true } });
  for (const [name, text] of Object.entries(extraFiles)) await writeFile(resolve(outDir, name), text);
  const server = await preview({
    root,
    configFile: resolve(root, 'vite.config.ts'),
    logLevel: 'error',
    build: { outDir },
    preview: { host: '127.0.0.1', port: 0, strictPort: false, open: false },
  });
  const url = server.resolvedUrls?.local[0];
  if (!url) throw new Error('vite preview did not report a local URL');
  return {
    url,
    outDir,
    close: async () => {
      await new Promise<void>((r) => server.httpServer.close(() => r()));
      await rm(outDir, { recursive: true, force: true });
    },
  };
}
