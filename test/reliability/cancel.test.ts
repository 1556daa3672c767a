/**
 * Every long job can be cancelled: the built binary gets SIGINT while working and exits 130
 * within a couple of seconds, with one "interrupted" line on stderr and nothing on stdout.
 * Jobs whose loops poll the cancel token stop at once (the algebra of `expand` polls as it
 * charges its work budget); a loop that does not is stopped by the entry's grace period (2 s).
 */
import { describe, expect, it } from 'vitest';
import { built, circulant, runBin } from './bin-helpers.ts';

const K4 = '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4';
const jobs: { what: string; argv: string[]; withinMs: number }[] = [
  { what: 'period with 10^10 samples', argv: ['period', '--theory', 'phi4', '--graph', K4, '--samples', '1e10', '--json'], withinMs: 2500 },
  { what: 'inspect of a 30-vertex circulant (synchronous subgraph search)', argv: ['inspect', '--theory', 'phi4', '--graph', circulant(30), '--max-vertex-subsets', '100000000'], withinMs: 2500 },
  { what: 'generate: 12-loop vacuum graphs with scaleless parts', argv: ['generate', '--theory', 'phi4', '--legs', '0', '--loops', '12', '--all'], withinMs: 2500 },
  // The work limit is raised so that the job is still running when SIGINT comes; the algebra polls the token as it charges work.
  { what: 'expand at order 40 of a heavy product (work limit raised)', argv: ['expand', 'Gamma(eps)^10*Gamma(1-eps)^10/Gamma(2-2*eps)^5', '--order', '40', '--max-term-products', '1000000000000'], withinMs: 4000 },
];

describe.skipIf(!built && !process.env.CI)('cancellation: Ctrl-C gives exit 130', () => {
  it.each(jobs)('$what', async ({ argv, withinMs }) => {
    const r = await runBin(argv, { interruptAfterMs: 2500, timeoutMs: 20_000 });
    expect(r.code, `signal ${r.signal}, stderr ${r.err}`).toBe(130);
    expect(r.ms).toBeLessThan(withinMs);
    expect(r.out).toBe('');
    const lines = r.err.trimEnd().split('\n').filter((l) => !/^period: \d+%/.test(l));
    expect(lines, r.err).toEqual([`coppice ${argv[0]}: interrupted`]);
  });
});
