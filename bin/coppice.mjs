#!/usr/bin/env node
// Thin launcher: the engine is bundled into dist/cli by `npm install` (the `prepare` script).
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const bundle = fileURLToPath(new URL('../dist/cli/coppice.mjs', import.meta.url));
if (!existsSync(bundle)) {
  process.stderr.write('coppice: the command is not built yet; run `npm run build:cli` (or `npm install`) in the project folder\n');
  process.exit(2);
}
await import(bundle);
