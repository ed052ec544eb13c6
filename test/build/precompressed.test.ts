import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync, mkdirSync, existsSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createServer, request } from 'node:http';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { acceptedEncodings, servePrecompressed, writeCompressedCopies } from '../../build/precompressed';

function tempSite(): string {
  const dir = mkdtempSync(join(tmpdir(), 'lamina-precompressed-'));
  mkdirSync(join(dir, 'assets'));
  writeFileSync(join(dir, 'assets', 'app.js'), `export const text = ${JSON.stringify('roof beam '.repeat(500))};\n`);
  writeFileSync(join(dir, 'assets', 'tiny.js'), 'export {};\n');
  writeFileSync(join(dir, 'assets', 'picture.png'), Buffer.alloc(4096, 7));
  return dir;
}

/** GET `path` from a server running only the middleware (404 when it passes the request on). */
async function get(dir: string, path: string, acceptEncoding: string): Promise<{ status: number; headers: Record<string, unknown>; body: Buffer }> {
  const serve = servePrecompressed(dir);
  const server = createServer((req, res) =>
    serve(req, res, () => {
      res.statusCode = 404;
      res.end();
    }),
  );
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  const port = (server.address() as { port: number }).port;
  try {
    return await new Promise((resolve, reject) => {
      const req = request({ host: '127.0.0.1', port, path, headers: { 'accept-encoding': acceptEncoding } }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
      });
      req.on('error', reject);
      req.end();
    });
  } finally {
    server.close();
  }
}

describe('precompressed assets (build/precompressed.ts)', () => {
  it('writes gzip and brotli copies of text assets of at least 1 kB that decompress to the file', () => {
    const dir = tempSite();
    try {
      const done = writeCompressedCopies(dir);
      expect(done.map((p) => p.slice(dir.length))).toEqual([join('/assets', 'app.js')]);
      const original = readFileSync(join(dir, 'assets', 'app.js'));
      // round trip through node's own zlib (RFC 1952 gzip, RFC 7932 brotli)
      expect(gunzipSync(readFileSync(join(dir, 'assets', 'app.js.gz'))).equals(original)).toBe(true);
      expect(brotliDecompressSync(readFileSync(join(dir, 'assets', 'app.js.br'))).equals(original)).toBe(true);
      expect(existsSync(join(dir, 'assets', 'tiny.js.gz'))).toBe(false);
      expect(existsSync(join(dir, 'assets', 'picture.png.gz'))).toBe(false);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('reads Accept-Encoding as RFC 9110 §12.5.3 says: q=0 refuses, * stands for the rest, brotli first', () => {
    expect(acceptedEncodings('gzip, deflate, br, zstd')).toEqual(['br', 'gzip']);
    expect(acceptedEncodings('gzip, deflate')).toEqual(['gzip']);
    expect(acceptedEncodings('br;q=0, gzip;q=0.5')).toEqual(['gzip']);
    expect(acceptedEncodings('*')).toEqual(['br', 'gzip']);
    expect(acceptedEncodings('*;q=0, identity')).toEqual([]);
    expect(acceptedEncodings(undefined)).toEqual([]);
  });

  it('sends the copy the request accepts, with its encoding and the file type; passes on anything else', async () => {
    const dir = tempSite();
    try {
      writeCompressedCopies(dir);
      const original = readFileSync(join(dir, 'assets', 'app.js'));
      const br = await get(dir, '/assets/app.js', 'gzip, br');
      expect(br.status).toBe(200);
      expect(br.headers['content-encoding']).toBe('br');
      expect(br.headers['content-type']).toBe('text/javascript');
      expect(br.headers.vary).toBe('Accept-Encoding');
      expect(brotliDecompressSync(br.body).equals(original)).toBe(true);
      const gz = await get(dir, '/assets/app.js', 'gzip');
      expect(gz.headers['content-encoding']).toBe('gzip');
      expect(gunzipSync(gz.body).equals(original)).toBe(true);
      // no accepted copy, no copy at all, or a path outside the folder: left to the next middleware
      expect((await get(dir, '/assets/app.js', 'identity')).status).toBe(404);
      expect((await get(dir, '/assets/tiny.js', 'gzip, br')).status).toBe(404);
      expect((await get(dir, '/assets/../../etc/passwd.js', 'gzip')).status).toBe(404);
      expect((await get(dir, '/assets/%2e%2e/%2e%2e/x.js', 'gzip')).status).toBe(404);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
