import { defineConfig } from 'vitest/config';

export default defineConfig({
  base: './',
  build: { target: 'es2022', outDir: 'dist', reportCompressedSize: true },
  // ES-module workers may load chunks on demand (the compute worker loads the uncertainty code
  // only for a study: src/ui/compute/compute-core.ts).
  worker: { format: 'es' },
  server: { host: '127.0.0.1', port: 5173 },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['test/**/*.test.ts'], exclude: ['test/browser/**'], environment: 'node' },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          include: ['test/browser/**/*.test.ts'],
          environment: 'node',
          testTimeout: 60_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
