/**
 * Precompressed assets: the production build writes a gzip (`.gz`) and a brotli (`.br`) copy
 * beside each text asset it emits, and `vite preview` sends a copy the browser accepts instead
 * of compressing every response on the fly (which `vite preview` otherwise does, at about
 * 20 ms of server time for the app's entry on this kind of machine, before the first byte).
 * Any static host that serves precompressed files (nginx `gzip_static`/`brotli_static`,
 * Caddy's `precompressed`) can serve the same copies.
 */
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { extname, join, resolve, sep } from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Plugin } from 'vite';

/** Text assets worth compressing, with the type they are served as. */
export const COMPRESSIBLE: Readonly<Record<string, string>> = {
  '.js': 'text/javascript',
  '.css': 'text/css',
  '.html': 'text/html',
  '.svg': 'image/svg+xml',
  '.json': 'application/json',
};

/** Files smaller than this are sent as they are (a compressed copy saves nothing worth a header). */
export const MIN_BYTES = 1024;

/** Write `file.gz` (gzip level 9) and `file.br` (brotli quality 11) beside every compressible file of `dir` (recursively); returns the files compressed. */
export function writeCompressedCopies(dir: string): string[] {
  const done: string[] = [];
  const walk = (d: string) => {
    for (const name of readdirSync(d)) {
      const path = join(d, name);
      if (statSync(path).isDirectory()) walk(path);
      else if (COMPRESSIBLE[extname(name)] !== undefined) {
        const bytes = readFileSync(path);
        if (bytes.length < MIN_BYTES) continue;
        writeFileSync(`${path}.gz`, gzipSync(bytes, { level: 9 }));
        writeFileSync(`${path}.br`, brotliCompressSync(bytes, { params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: bytes.length } }));
        done.push(path);
      }
    }
  };
  walk(dir);
  return done;
}

/** The encodings a request accepts, of those we keep copies in, best first. */
export function acceptedEncodings(acceptEncoding: string | undefined): ('br' | 'gzip')[] {
  const accepted = new Map<string, number>();
  for (const part of (acceptEncoding ?? '').split(',')) {
    const [token, ...params] = part.trim().toLowerCase().split(';');
    if (!token) continue;
    const q = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
    accepted.set(token, q === undefined ? 1 : Number(q.slice(2)));
  }
  const ok = (e: string) => (accepted.get(e) ?? accepted.get('*') ?? 0) > 0;
  return (['br', 'gzip'] as const).filter(ok);
}

/**
 * A connect middleware sending the precompressed copy of a file of `dir` when the request
 * accepts it; anything else (no copy, a path outside `dir`, a method other than GET or HEAD)
 * goes on to the next middleware.
 */
export function servePrecompressed(dir: string) {
  const root = resolve(dir);
  return (req: IncomingMessage, res: ServerResponse, next: () => void): void => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    let pathname: string;
    try {
      pathname = decodeURIComponent(new URL(req.url ?? '/', 'http://localhost').pathname);
    } catch {
      return next();
    }
    const type = COMPRESSIBLE[extname(pathname)];
    const file = resolve(root, `.${pathname}`);
    if (type === undefined || !file.startsWith(root + sep)) return next();
    for (const encoding of acceptedEncodings(req.headers['accept-encoding'])) {
      const copy = `${file}.${encoding === 'br' ? 'br' : 'gz'}`;
      if (!existsSync(copy)) continue;
      const body = readFileSync(copy);
      res.statusCode = 200;
      res.setHeader('Content-Type', type);
      res.setHeader('Content-Encoding', encoding);
      res.setHeader('Content-Length', body.length);
      res.setHeader('Vary', 'Accept-Encoding');
      res.setHeader('Cache-Control', 'no-cache');
      res.end(req.method === 'HEAD' ? undefined : body);
      return;
    }
    next();
  };
}

/** The Vite plugin: compressed copies after `vite build`, served by `vite preview`. */
export function precompressed(): Plugin {
  let outDir = 'dist';
  return {
    name: 'lamina:precompressed',
    configResolved(config) {
      outDir = resolve(config.root, config.build.outDir);
    },
    writeBundle: {
      order: 'post',
      handler() {
        writeCompressedCopies(outDir);
      },
    },
    configurePreviewServer(server) {
      // registered before Vite's own compression and static files
      server.middlewares.use(servePrecompressed(resolve(server.config.root, server.config.build.outDir)));
    },
  };
}
