import { defineConfig } from 'vitest/config';

// Two projects: `core` runs the engine, CLI and reference tests in plain Node (so an
// accidental DOM dependency in src/core fails); `ui` runs renderer component tests in happy-dom.
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
          include: ['test/core/**/*.test.ts', 'test/cli/**/*.test.ts', 'test/reference/**/*.test.ts'],
          testTimeout: 60_000,
        },
      },
    ],
  },
});
