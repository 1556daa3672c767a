import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { cli } from '../helpers/cli.ts';

describe('coppice inspect', () => {
  it('gives the stable JSON shape for the sunset', async () => {
    const r = await cli('inspect', '--theory', 'phi4', '--graph', '1-2 1-2 1-2 / 1 2', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(Object.keys(j).slice(0, 11)).toEqual(['loops', 'vertices', 'edges', 'legs', 'onePI', 'omega', 'residue', 'divergentSubgraphs', 'overlapping', 'forests', 'warnings']);
    expect(j).toMatchObject({
      loops: 2,
      vertices: 2,
      edges: 3,
      legs: 2,
      onePI: true,
      omega: 2,
      residue: ['phi', 'phi'],
      overlapping: [[0, 1], [0, 2], [1, 2]],
      forests: { proper: 4, maximal: 3 },
      warnings: [],
    });
    expect(j.divergentSubgraphs[0]).toEqual({ edges: [0, 1], loops: 1, omega: 0, residue: ['phi', 'phi', 'phi', 'phi'] });
  });

  it('human output is a readable summary', async () => {
    const r = await cli('inspect', '--theory', 'phi4', '--graph', '1-2 1-2 2-3 2-3 / 1 1 3 3');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/2 loops/);
    expect(r.out).toMatch(/forests: 3 .* 2 maximal/);
  });

  it('reads theory files', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'coppice-'));
    const file = join(dir, 'phi3-mine.json');
    writeFileSync(file, JSON.stringify({
      name: 'phi3-mine', dimension: 6,
      fields: [{ name: 's', statistics: 'boson', propagatorWeight: 2, line: 'dashed' }],
      vertices: [{ fields: ['s', 's', 's'], coupling: 'g', normalization: '1/6' }],
      couplings: [{ name: 'g' }],
    }));
    const r = await cli('inspect', '--theory', file, '--graph', '1-2 2-3 3-1 / 1 2 3', '--json');
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out).omega).toBe(0);
  });

  const bad: [string, string[], RegExp][] = [
    ['a parse error with its position', ['--theory', 'phi4', '--graph', '1-2 1=2 / 1'], /expected "-" or ">".*character 6/],
    ['a wrong valence naming the vertex', ['--theory', 'phi4', '--graph', '1-2 1-2 / 1 1 2'], /vertex "2"/],
    ['an unknown theory', ['--theory', 'phi5', '--graph', '1-2 / 1'], /unknown theory "phi5"/],
    ['a missing flag', ['--theory', 'phi4'], /missing --graph/],
    ['an unknown flag', ['--theory', 'phi4', '--grahp', 'x'], /unknown flag --grahp/],
    ['a corrupt theory file', ['--theory', '/nonexistent/x.json', '--graph', '1-2 / 1'], /cannot read file/],
  ];
  it.each(bad)('bad input exits 2 with one line: %s', async (_what, args, message) => {
    const r = await cli('inspect', ...args);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect(r.err).toMatch(message);
    expect(r.err).not.toMatch(/\s+at .*\.ts:\d+/); // no stack trace
  });

  it('a limit refuses with exit 3 and names the limit', async () => {
    const r = await cli('inspect', '--theory', 'phi4', '--graph', '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4', '--max-vertex-subsets', '3');
    expect(r.code).toBe(3);
    expect(r.err).toMatch(/maxVertexSubsets/);
  });

  it('unknown commands and --help', async () => {
    expect((await cli('frobnicate')).code).toBe(2);
    const h = await cli('--help');
    expect(h.code).toBe(0);
    expect(h.out).toMatch(/inspect/);
    expect((await cli('inspect', '--help')).out).toMatch(/--theory/);
  });
});

describe('the installed binary', () => {
  beforeAll(() => {
    execFileSync('node', ['scripts/build-cli.mjs']);
  });
  it('runs npx-style through bin/coppice.mjs with exit codes', () => {
    const ok = spawnSync('node', ['bin/coppice.mjs', 'inspect', '--theory', 'phi4', '--graph', '1-2 1-2 / 1 1 2 2', '--json'], { encoding: 'utf8' });
    expect(ok.status).toBe(0);
    expect(JSON.parse(ok.stdout).forests).toEqual({ proper: 1, maximal: 1 });
    const bad = spawnSync('node', ['bin/coppice.mjs', 'inspect', '--theory', 'phi4', '--graph', '1-2 1-2 / 1 1 2'], { encoding: 'utf8' });
    expect(bad.status).toBe(2);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
  });
});
