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
