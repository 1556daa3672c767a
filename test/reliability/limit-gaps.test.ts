/**
 * Limit gaps found by the fuzzing, each now refused up front (in-process, no build needed):
 * a 30-vertex circulant's divergent-subgraph search (sampled estimate of the connected vertex
 * sets), vacuum generation (empty without --all; the estimate counts rooted graphs), and
 * expansions whose polynomial work explodes (maxTermProducts, cancellable).
 */
import { describe, expect, it } from 'vitest';
import { expandExpression } from '../../src/core/algebra/index.ts';
import { CancelledError, LimitError } from '../../src/core/errors.ts';
import { generateGraphs } from '../../src/core/generate/index.ts';
import { parseNotation } from '../../src/core/graph/index.ts';
import { bindGraph } from '../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';
import { divergentSubgraphs } from '../../src/core/subgraphs/index.ts';
import { estimateConnectedVertexSets } from '../../src/core/subgraphs/estimate-vertex-sets.ts';
import { circulant } from './bin-helpers.ts';
import { runInProcess } from './cli-helpers.ts';

const phi4 = builtinTheory('phi4');

/** Connected vertex sets by brute force over all 2^n subsets (a plain second algorithm). */
function connectedSetsBruteForce(nbrs: number[][]): number {
  const n = nbrs.length;
  let count = 0;
  for (let mask = 1; mask < 1 << n; mask++) {
    const start = 31 - Math.clz32(mask & -mask);
    let seen = 1 << start;
    const stack = [start];
    while (stack.length) {
      const u = stack.pop()!;
      for (const w of nbrs[u]!) {
        if (mask & (1 << w) && !(seen & (1 << w))) {
          seen |= 1 << w;
          stack.push(w);
        }
      }
    }
    if (seen === mask) count++;
  }
  return count;
}
const circulantNbrs = (n: number, steps: number[]) => Array.from({ length: n }, (_, i) => [...new Set(steps.flatMap((s) => [(i + s) % n, (i - s + n) % n]))]);

describe('divergent-subgraph search: refused up front when the vertex sets explode', () => {
  // Dense graphs (the ones that explode) within 10%; sparse ones have few sets and a rougher estimate.
  it.each([
    ['C16(1,2)', circulantNbrs(16, [1, 2]), 0.1],
    ['C15(1,3)', circulantNbrs(15, [1, 3]), 0.1],
    ['C14(1,2,3)', circulantNbrs(14, [1, 2, 3]), 0.1],
    ['path of 12', Array.from({ length: 12 }, (_, i) => [i - 1, i + 1].filter((u) => u >= 0 && u < 12)), 0.5],
  ])('the sampled estimate is close to the brute-force count: %s', (_name, nbrs, tolerance) => {
    const exact = connectedSetsBruteForce(nbrs);
    expect(Math.abs(estimateConnectedVertexSets(nbrs) / exact - 1)).toBeLessThan(tolerance);
  });

  it('a 30-vertex 4-regular circulant is refused in well under a second, naming maxVertexSubsets', () => {
    const bg = bindGraph(parseNotation(circulant(30)), phi4);
    const t0 = performance.now();
    let err: unknown;
    try {
      divergentSubgraphs(bg);
    } catch (e) {
      err = e;
    }
    expect(performance.now() - t0).toBeLessThan(1000);
    expect(err).toBeInstanceOf(LimitError);
    expect((err as LimitError).limit).toBe('maxVertexSubsets');
    expect((err as LimitError).message).toMatch(/estimated/);
  });

  it('coppice inspect on it: exit 3 within a second, one line naming the limit and the flag', async () => {
    const t0 = performance.now();
    const r = await runInProcess(['inspect', '--theory', 'phi4', '--graph', circulant(30)]);
    expect(performance.now() - t0).toBeLessThan(1000);
    expect(r.code, r.err).toBe(3);
    expect(r.err.trimEnd().split('\n')).toHaveLength(1);
    expect(r.err).toMatch(/maxVertexSubsets = 5000000.*--max-vertex-subsets/);
  });

  it('graphs just under the limit are still searched (C12, whose 2038 sets fit a limit of 2100)', () => {
    const bg = bindGraph(parseNotation(circulant(12)), phi4);
    expect(() => divergentSubgraphs(bg, { limits: { maxVertexSubsets: 2100 } })).not.toThrow();
    expect(() => divergentSubgraphs(bg, { limits: { maxVertexSubsets: 2000 } })).toThrow(LimitError);
  });
});

describe('vacuum generation', () => {
  it('without --all there is nothing to generate (every graph without legs is scaleless): empty at once', async () => {
    const t0 = performance.now();
    const r = await runInProcess(['generate', '--theory', 'phi4', '--legs', '0', '--loops', '12', '--json']);
    expect(performance.now() - t0).toBeLessThan(1000);
    expect(r.code, r.err).toBe(0);
    expect(JSON.parse(r.out)).toMatchObject({ count: 0, weight: '0', graphs: [] });
  });

  it('with --all the estimate counts rooted graphs, so 14 loops is refused at once (maxGraphs)', () => {
    const t0 = performance.now();
    expect(() => generateGraphs(phi4, { residue: [], loops: 14, all: true })).toThrow(/maxGraphs = 3000000/);
    expect(performance.now() - t0).toBeLessThan(1000);
  });

  it('the vacuum estimate tracks the real count (8 loops: 359 graphs)', () => {
    const real = generateGraphs(phi4, { residue: [], loops: 8, all: true }).graphs.length;
    expect(real).toBe(359);
    // The estimate is in the error message when the limit is set below it.
    let shown = 0;
    try {
      generateGraphs(phi4, { residue: [], loops: 8, all: true, limits: { maxGraphs: 1 } });
    } catch (e) {
      shown = Number((e as LimitError).requested);
    }
    expect(shown / real).toBeGreaterThan(0.5);
    expect(shown / real).toBeLessThan(2);
  });
});

describe('expansion work: maxTermProducts, and cancellation', () => {
  const heavy = 'Gamma(eps)^10*Gamma(1-eps)^10/Gamma(2-2*eps)^5';

  it('an explosive expansion is refused before the work, naming maxTermProducts and how to raise it', () => {
    const t0 = performance.now();
    let err: unknown;
    try {
      expandExpression(heavy, 40, { maxTermProducts: 100_000 });
    } catch (e) {
      err = e;
    }
    expect(performance.now() - t0).toBeLessThan(2000);
    expect(err).toBeInstanceOf(LimitError);
    expect((err as LimitError).limit).toBe('maxTermProducts');
    expect((err as LimitError).hint).toMatch(/--max-term-products/);
  });

  it('ordinary expansions fit the default budget', () => {
    expect(expandExpression('Gamma(eps)*Gamma(1-eps)^2/Gamma(2-2*eps)*exp(euler_gamma*eps)', 6).order).toBe(6);
    expect(expandExpression(heavy, 5).order).toBe(5);
  });

  it('a cancel token is polled as the work goes on', () => {
    let polls = 0;
    const cancel = {
      get cancelled() {
        return polls > 20;
      },
      throwIfCancelled() {
        if (++polls > 20) throw new CancelledError('expansion');
      },
    };
    expect(() => expandExpression(heavy, 30, { cancel })).toThrow(CancelledError);
  });

  it('the CLI flag raises the budget; a bad value is an input error', async () => {
    const low = await runInProcess(['expand', heavy, '--order', '10', '--max-term-products', '1000']);
    expect(low.code).toBe(3);
    expect(low.err).toMatch(/maxTermProducts = 1000.*--max-term-products/);
    const bad = await runInProcess(['expand', 'Gamma(eps)', '--max-term-products', 'lots']);
    expect(bad.code).toBe(2);
  });
});
