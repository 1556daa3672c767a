import vue from '@vitejs/plugin-vue';
import { defineConfig } from 'vitest/config';

// Projects: `core` runs the engine, CLI and reference tests in plain Node (so an accidental
// DOM dependency in src/core fails); `main` tests the Electron main-process modules with the
// Electron API faked at the module boundary; `ui` runs renderer component tests in happy-dom;
// `e2e` drives Chromium against the built renderer (`npm run build:renderer` first).
// In CI, also write the JSON report that .ci/run turns into an "N passed, N failed" line.
const jsonReport = process.env.COPPICE_VITEST_JSON;

export default defineConfig({
  test: {
    reporters: jsonReport ? ['default', ['json', { outputFile: jsonReport }]] : ['default'],
    projects: [
      {
        test: {
          name: 'core',
          environment: 'node',
          include: ['test/core/**/*.test.ts', 'test/cli/**/*.test.ts', 'test/reference/**/*.test.ts', 'test/reliability/**/*.test.ts'],
          testTimeout: 60_000,
        },
      },
      {
        test: { name: 'main', environment: 'node', include: ['test/main/**/*.test.ts'] },
      },
      {
        plugins: [vue()],
        test: { name: 'ui', environment: 'happy-dom', include: ['test/renderer/**/*.test.ts'] },
      },
      {
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['test/e2e/**/*.test.ts'],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
