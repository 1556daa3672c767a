/**
 * Limits instead of crashes: requests whose work explodes are refused with exit 3 and a
 * one-line message naming the limit and how to raise it, quickly and within a capped heap
 * (child processes run with --max-old-space-size). Needs the built CLI (`npm run build:cli`).
 */
import { describe, expect, it } from 'vitest';
import { built, circulant, runBin } from './bin-helpers.ts';

const K4 = '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4';

const cases: { what: string; argv: string[]; limit: RegExp; raise: RegExp }[] = [
  {
    what: 'forests of a huge graph (30-vertex circulant, work limit lowered so the refusal comes fast)',
    argv: ['inspect', '--theory', 'phi4', '--graph', circulant(30), '--max-vertex-subsets', '100000'],
    limit: /maxVertexSubsets = 100000/,
    raise: /--max-vertex-subsets/,
  },
  { what: 'generation at 12 loops', argv: ['generate', '--theory', 'phi4', '--legs', '4', '--loops', '12'], limit: /maxGraphs = 3000000/, raise: /--max-graphs/ },
  { what: 'expansion to order 1000', argv: ['expand', 'Gamma(1+eps)', '--order', '1000'], limit: /maxOrder = 40/, raise: /order between -40 and 40/ },
  { what: 'a period with 10^12 samples', argv: ['period', '--theory', 'phi4', '--graph', K4, '--samples', '1000000000000'], limit: /maxSamples/, raise: /--max-samples/ },
  { what: 'a period of a graph with too many lines', argv: ['period', '--theory', 'phi4', '--graph', circulant(14), '--samples', '1000'], limit: /maxEdges = 22/, raise: /--max-edges/ },
  { what: 'an expansion whose polynomial work explodes (order 40 of 25 Gammas)', argv: ['expand', 'Gamma(eps)^10*Gamma(1-eps)^10/Gamma(2-2*eps)^5', '--order', '40'], limit: /maxTermProducts = 3000000/, raise: /--max-term-products/ },
  { what: 'an expression with a huge power', argv: ['expand', '(1+eps)^1000000', '--order', '3'], limit: /maxExponent/, raise: /smaller powers/ },
];

describe.skipIf(!built && !process.env.CI)('limits: refused with exit 3, quickly, in bounded memory', () => {
  it('memory stays bounded: an expansion that outgrows a 64 MB heap is refused with exit 3, not a crash', async () => {
    const r = await runBin(['expand', 'Gamma(eps)^10*Gamma(1-eps)^10/Gamma(2-2*eps)^5', '--order', '40'], { heapMb: 64, timeoutMs: 30_000 });
    expect(r.code, r.err).toBe(3);
    expect(r.err.trimEnd().split('\n'), r.err).toHaveLength(1);
    // Whichever comes first: the heap (exit 3 from the worker's OOM) or the expansion's work limit.
    expect(r.err).toMatch(/more memory .*--max-old-space-size|maxTermProducts/);
  });

  it.concurrent.each(cases)('$what', async ({ argv, limit, raise }) => {
    const r = await runBin(argv, { heapMb: 128, timeoutMs: 20_000 });
    expect(r.code, r.err).toBe(3);
    expect(r.out).toBe('');
    expect(r.err.trimEnd().split('\n'), r.err).toHaveLength(1);
    expect(r.err).toMatch(limit);
    expect(r.err).toMatch(raise);
    expect(r.ms).toBeLessThan(10_000);
  });
});
