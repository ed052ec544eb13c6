/**
 * The node build: the `lamina` command (src/cli/bin.ts) and the library entry points
 * (src/index.ts, src/report/index.ts) as plain ES modules for Node 20 in dist-node/.
 * Dependencies (d3, mathjs) are bundled and tree-shaken, so the command needs no TypeScript
 * loader at run time and loads no module it does not use. Code that only some commands need
 * (the calculation report and its mathjs formula renderer) is split into chunks that are
 * imported on demand. Run by `npm run build:node`, and by `prepare` on `npm install`/`npm ci`.
 */
import { chmodSync } from 'node:fs';
import { join } from 'node:path';
import { defineConfig } from 'vite';

export const NODE_OUT_DIR = 'dist-node';

export default defineConfig({
  logLevel: 'warn',
  publicDir: false,
  build: {
    ssr: true,
    target: 'node20',
    outDir: NODE_OUT_DIR,
    emptyOutDir: true,
    minify: true,
    sourcemap: false,
    reportCompressedSize: false,
    copyPublicDir: false,
    rolldownOptions: {
      input: { lamina: 'src/cli/bin.ts', index: 'src/index.ts', report: 'src/report/index.ts' },
      output: {
        format: 'es',
        entryFileNames: '[name].js',
        chunkFileNames: 'chunks/[name]-[hash].js',
      },
    },
  },
  ssr: { target: 'node', noExternal: true },
  plugins: [
    {
      name: 'lamina-executable',
      apply: 'build',
      writeBundle(options) {
        // npm links bin files executable on install; this keeps a direct ./dist-node/lamina.js working too.
        chmodSync(join(options.dir ?? NODE_OUT_DIR, 'lamina.js'), 0o755);
      },
    },
  ],
});
