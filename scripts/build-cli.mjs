// Bundles the `coppice` command into dist/cli (run by `npm install` through `prepare`).
import { build } from 'esbuild';

await build({
  entryPoints: { coppice: 'src/cli/main.ts', 'period-worker': 'src/cli/period-worker.ts' },
  outdir: 'dist/cli',
  outExtension: { '.js': '.mjs' },
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  sourcemap: true,
  logLevel: 'warning',
  banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
});
