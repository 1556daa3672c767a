import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { beforeAll, describe, expect, it } from 'vitest';
import { cli } from '../helpers/cli.ts';

// Known values: "Quantum periods: A census of φ⁴-transcendentals", Schnetz, Commun. Number Theory
// Phys. 4 (2010) 1, arXiv:0801.2856 (wheel with three spokes 6ζ(3); ζ(3) from DLMF 25.6).
const WHEEL3 = '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4';
const K5 = 'a-b a-c a-d a-e b-c b-d b-e c-d c-e d-e /';
const SIX_ZETA3 = 6 * 1.2020569031595942854;

const bin = (...args: string[]) => spawnSync('node', ['bin/coppice.mjs', 'period', ...args], { encoding: 'utf8' });

describe('coppice period (built binary, worker threads)', () => {
  beforeAll(() => {
    execFileSync('node', ['scripts/build-cli.mjs']);
  });

  it('same seed: 1 worker and 2 workers give the identical JSON', () => {
    const one = bin('--theory', 'phi4', '--graph', WHEEL3, '--samples', '60000', '--seed', '7', '--workers', '1', '--json');
    const two = bin('--theory', 'phi4', '--graph', WHEEL3, '--samples', '60000', '--seed', '7', '--workers', '2', '--json');
    expect(one.status).toBe(0);
    expect(two.status).toBe(0);
    expect(JSON.parse(two.stdout).value).toBe(JSON.parse(one.stdout).value);
    expect(two.stdout).toBe(one.stdout);
  });

  it('the JSON has the documented shape, and the value is 6ζ(3) within 4σ', () => {
    const r = bin('--theory', 'phi4', '--graph', WHEEL3, '--samples', '100000', '--seed', '3', '--json');
    expect(r.status).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j).toMatchObject({ samples: 100000, heppBound: '84', loops: 3, seed: 3, removedVertex: null });
    expect(Math.abs(j.value - SIX_ZETA3)).toBeLessThan(4 * j.error);
    expect(j.counterterm['-1'].approx).toBeCloseTo(-j.value / 3, 12);
    expect(j.counterterm['-1'].error).toBeCloseTo(j.error / 3, 12);
  });

  it('long runs report progress on stderr, and Ctrl-C interrupts them with exit 130', async () => {
    const child = spawn('node', ['bin/coppice.mjs', 'period', '--theory', 'phi4', '--graph', WHEEL3, '--samples', '1e9', '--json']);
    let err = '';
    let out = '';
    child.stdout.on('data', (d) => (out += d));
    // The first progress line (after ~2 s) shows the run is under way with its handlers installed.
    await new Promise<void>((r) => child.stderr.on('data', (d) => {
      err += d;
      if (/period: \d+%/.test(err)) r();
    }));
    child.kill('SIGINT');
    const code = await new Promise<number | null>((r) => child.on('exit', r));
    expect(code).toBe(130);
    expect(err).toMatch(/interrupted/);
    expect(out).toBe(''); // progress never goes to the JSON on stdout
  });
});

describe('coppice period (in-process)', () => {
  it('a completed graph: removes the named vertex, and says so', async () => {
    const r = await cli('period', '--theory', 'phi4', '--graph', K5, '--remove-vertex', 'c', '--samples', '20000', '--quiet');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/vertex "c" removed/);
    expect(r.out).toMatch(/P = 7\.\d+ ± 0\.\d+/);
    expect(r.out).toMatch(/Hepp bound\s+H = 84 \(exact\)/);
    expect(r.out).toMatch(/−P\/\(Lε\) = -2\.\d+ ± 0\.\d+ \/ε/);
  });

  it('refuses a graph with subdivergences (exit 2), pointing to inspect and counterterm', async () => {
    const r = await cli('period', '--theory', 'phi4', '--graph', '1-2 1-2 2-3 2-3 / 1 1 3 3');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/not primitive/);
    expect(r.err).toMatch(/coppice inspect/);
    expect(r.err).toMatch(/coppice counterterm/);
  });

  it('refuses a graph that is not logarithmically divergent (exit 2)', async () => {
    const r = await cli('period', '--theory', 'phi4', '--graph', '1-2 1-2 1-2 / 1 2');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/ω = 2/);
  });

  it('refuses absurd --samples with a limit error (exit 3) naming the limit and the flag', async () => {
    const r = await cli('period', '--theory', 'phi4', '--graph', WHEEL3, '--samples', '1e11');
    expect(r.code).toBe(3);
    expect(r.err).toMatch(/maxSamples/);
    expect(r.err).toMatch(/--max-samples/);
  });

  it('rejects malformed counts (exit 2)', async () => {
    expect((await cli('period', '--theory', 'phi4', '--graph', WHEEL3, '--samples', 'lots')).code).toBe(2);
    expect((await cli('period', '--theory', 'phi4', '--graph', WHEEL3, '--workers', '0')).code).toBe(2);
  });
});
