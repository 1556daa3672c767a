/**
 * DESIGN §10 for every command: bad input → exit 2 with one line on stderr and nothing on
 * stdout; a good request → exit 0 with the result on stdout and nothing on stderr; a failed
 * check (iso of non-isomorphic graphs) → exit 1. Also through the built binary, whose entry
 * relays the worker thread's streams.
 */
import { describe, expect, it } from 'vitest';
import { built, runBin } from './bin-helpers.ts';
import { expectContract, runInProcess } from './cli-helpers.ts';

const BUBBLE = '1-2 1-2 / 1 1 2 2';
const K4 = '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4';
const bad: Record<string, string[][]> = {
  inspect: [['--theory', 'phi4', '--graph', '1-2 1-2 / 1 1 2'], ['--theory', 'phi9', '--graph', BUBBLE], ['--graph', BUBBLE], ['--theory', 'phi4', '--graph', '1-2 / 1 1 2 2', '--max-vertex-subsets', 'x']],
  expand: [['Gamma('], [], ['1/(1+N)'], ['eps', '--order', 'two'], ['a', 'b']],
  period: [['--theory', 'phi4', '--graph', BUBBLE.replace('/', '1-2 /')], ['--theory', 'phi4', '--graph', K4, '--samples', 'lots'], ['--theory', 'phi4', '--graph', K4, '--workers', '0']],
  coproduct: [['--theory', 'phi4', '--graph', '1-2 / 1'], ['--theory', 'qed', '--graph', BUBBLE]],
  counterterm: [['--theory', 'phi4', '--graph', '1-2 / 1'], ['--symbolic', '--theory', 'phi4', '--graph', '1-']],
  iso: [['--graph', BUBBLE], ['--graph', BUBBLE, '--graph', 'nickel:e1|e|x']],
  generate: [['--theory', 'phi4', '--legs', '4'], ['--theory', 'phi4', '--legs', '4', '--loops', '-1'], ['--theory', 'phi4', '--legs', 'psi,psibar', '--loops', '1']],
  '(unknown)': [['--frobnicate']],
};
const good: string[][] = [
  ['inspect', '--theory', 'phi4', '--graph', BUBBLE, '--json'],
  ['expand', 'Gamma(1+eps)', '--order', '2', '--json'],
  ['period', '--theory', 'phi4', '--graph', K4, '--samples', '2000', '--quiet', '--json'],
  ['coproduct', '--theory', 'phi4', '--graph', BUBBLE, '--json'],
  ['counterterm', '--symbolic', '--theory', 'phi4', '--graph', BUBBLE, '--json'],
  ['iso', '--graph', BUBBLE, '--graph', 'b-a a-b / b b a a', '--json'],
  ['generate', '--theory', 'phi4', '--legs', '4', '--loops', '1', '--json'],
];

describe('exit codes and streams (in-process)', () => {
  for (const [verb, cases] of Object.entries(bad)) {
    it(`${verb}: bad input gives exit 2, one stderr line, empty stdout`, async () => {
      for (const rest of cases) {
        const argv = verb === '(unknown)' ? rest : [verb, ...rest];
        const r = await runInProcess(argv);
        expect(r.code, JSON.stringify(argv) + r.err).toBe(2);
        expect(r.out).toBe('');
        expectContract(argv, r);
      }
    });
  }

  it.each(good)('%s: a good request gives exit 0, JSON on stdout, empty stderr', async (...argv) => {
    const r = await runInProcess(argv);
    expect(r.code, r.err).toBe(0);
    expect(r.err).toBe('');
    expect(() => JSON.parse(r.out)).not.toThrow();
  });

  it('a failed check gives exit 1 with the answer on stdout', async () => {
    const r = await runInProcess(['iso', '--graph', BUBBLE, '--graph', '1-2 1-2 1-2 / 1 2', '--json']);
    expect(r.code).toBe(1);
    expect(r.err).toBe('');
    expect(JSON.parse(r.out)).toMatchObject({ isomorphic: false });
  });
});

describe.skipIf(!built && !process.env.CI)('exit codes and streams (built binary, worker-thread entry)', () => {
  it('results on stdout, messages on stderr, codes 0 / 1 / 2', async () => {
    const [ok, no, bad1] = await Promise.all([
      runBin(['inspect', '--theory', 'phi4', '--graph', BUBBLE, '--json']),
      runBin(['iso', '--graph', BUBBLE, '--graph', '1-2 1-2 1-2 / 1 2']),
      runBin(['inspect', '--theory', 'phi4', '--graph', '1-2 1-2 / 1 1 2']),
    ]);
    expect([ok.code, ok.err]).toEqual([0, '']);
    expect(JSON.parse(ok.out)).toMatchObject({ loops: 1 });
    expect([no.code, no.err]).toEqual([1, '']);
    expect(no.out).toMatch(/^not isomorphic/);
    expect(bad1.code).toBe(2);
    expect(bad1.out).toBe('');
    expect(bad1.err).toMatch(/^coppice inspect: [^\n]+\n$/);
  });
});
