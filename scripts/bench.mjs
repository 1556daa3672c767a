// `npm run bench`: bundles bench/cases/*.ts, times every case, prints ms per run and the ratio
// to the committed baseline (bench/baseline.json). `--update` rewrites the baseline.
import { build } from 'esbuild';
import { readdirSync, readFileSync, writeFileSync, existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

const update = process.argv.includes('--update');
const heavy = process.argv.includes('--heavy');
const filter = process.argv.find((a) => a.startsWith('--only='))?.slice(7);
const caseFiles = readdirSync('bench/cases').filter((f) => f.endsWith('.ts')).sort();
mkdirSync('.bench-results', { recursive: true });
const baselinePath = 'bench/baseline.json';
const baseline = existsSync(baselinePath) ? JSON.parse(readFileSync(baselinePath, 'utf8')) : {};
const results = {};

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

for (const file of caseFiles) {
  if (filter && !file.includes(filter)) continue;
  const out = join('.bench-results', file.replace(/\.ts$/, '.mjs'));
  await build({ entryPoints: [join('bench/cases', file)], outfile: out, bundle: true, platform: 'node', format: 'esm', logLevel: 'warning',
    banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" } });
  const { cases } = await import(pathToFileURL(out).href);
  console.log(`\n${file}`);
  for (const c of cases) {
    if (c.heavy && !heavy) {
      console.log(`  ${c.name.padEnd(64)}   (heavy: run with --heavy)`);
      continue;
    }
    c.run(); // warm-up
    const samples = [];
    const t0 = performance.now();
    let runs = 0;
    const fixed = c.iterations;
    while (fixed ? runs < fixed : (performance.now() - t0 < 300 || runs < 3)) {
      const s = performance.now();
      c.run();
      samples.push(performance.now() - s);
      runs++;
    }
    const ms = median(samples) / (c.perRun ?? 1);
    results[c.name] = ms;
    const base = baseline[c.name];
    const ratio = base ? `${(ms / base).toFixed(2)}× baseline` : 'no baseline';
    const target = c.targetMs ? (ms <= c.targetMs ? `  target ${c.targetMs} ms: met` : `  target ${c.targetMs} ms: MISSED`) : '';
    console.log(`  ${c.name.padEnd(64)} ${ms.toFixed(3).padStart(10)} ms/run  (${runs} runs)  ${ratio}${target}`);
  }
}
if (update) {
  writeFileSync(baselinePath, JSON.stringify({ ...baseline, ...results }, null, 2) + '\n');
  console.log(`\nbaseline written to ${baselinePath}`);
}
