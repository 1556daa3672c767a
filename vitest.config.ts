import { defineConfig } from 'vitest/config';

// Two projects: `core` runs the engine, CLI and reference tests in plain Node (so an
// accidental DOM dependency in src/core fails); `ui` runs renderer component tests in happy-dom.
export default defineConfig({
  test: {
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
