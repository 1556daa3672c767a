// Lint: typescript-eslint's recommended rules, plus the one rule that keeps the
// engine pure — src/core imports nothing from Node, Electron, Vue or the DOM.
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', 'out/**', 'release/**', 'renderer/dist/**', 'coverage/**', '**/*.d.ts', '.bench-results/**', '.ci-out/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-non-null-assertion': 'off',
    },
  },
  {
    files: ['src/core/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: ['node:*', 'fs', 'path', 'os', 'child_process', 'worker_threads'], message: 'src/core is pure: no Node APIs.' },
          { group: ['electron', 'vue', 'pinia', 'cytoscape', 'katex'], message: 'src/core is pure: no UI or Electron.' },
          { group: ['../cli/*', '../main/*', '../../renderer/*'], message: 'Dependencies point into src/core, never out of it.' },
        ],
      }],
      'no-restricted-globals': ['error', 'window', 'document', 'process', 'setTimeout', 'Date', 'performance'],
    },
  },
);
