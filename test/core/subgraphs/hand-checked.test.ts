import { describe, expect, it } from 'vitest';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { inspectGraph } from '../../../src/core/inspect/graph-report.ts';
import { listForests } from '../../../src/core/subgraphs/list-forests.ts';
import { LimitError } from '../../../src/core/errors.ts';

const report = (theory: string, text: string) => inspectGraph(bindGraph(parseNotation(text), builtinTheory(theory)));

// Cases worked out by hand (common practice: the divergent subgraphs of the sunset are its three
// one-loop bubbles, pairwise overlapping; the two bubbles of the s-channel chain share a vertex).
describe('hand-checked divergent subgraphs and forests', () => {
  it('two-loop sunset: 3 subgraphs, pairwise overlapping, 4 proper forests, 3 maximal', () => {
    const r = report('phi4', '1-2 1-2 1-2 / 1 2');
    expect(r.divergentSubgraphs.map((s) => s.edgeList)).toEqual([[0, 1], [0, 2], [1, 2]]);
    expect(r.divergentSubgraphs.every((s) => s.omega === 0 && s.loops === 1)).toBe(true);
    expect(r.overlapping).toEqual([[0, 1], [0, 2], [1, 2]]);
    expect(r.forests).toEqual({ proper: 4n, maximal: 3n });
  });

  it('s-channel chain of two bubbles: 2 subgraphs touching at a vertex, 3 proper forests, 2 maximal', () => {
    const r = report('phi4', '1-2 1-2 2-3 2-3 / 1 1 3 3');
    expect(r.divergentSubgraphs.map((s) => s.edgeList)).toEqual([[0, 1], [2, 3]]);
    expect(r.divergentSubgraphs[0]!.vertices).toContain(1);
    expect(r.divergentSubgraphs[1]!.vertices).toContain(1);
    expect(r.forests).toEqual({ proper: 3n, maximal: 2n });
  });

  it('primitive wheel with three spokes: no proper subgraph, one forest', () => {
    const r = report('phi4', '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4');
    expect(r.divergentSubgraphs).toEqual([]);
    expect(r.forests).toEqual({ proper: 1n, maximal: 1n });
    expect(r.divergent).toBe(true);
  });

  it('nested bubbles: a bubble inside a bubble gives a chain of nested forests', () => {
    // Two-loop four-point graph with a vertex insertion: 1-2 1-2 bubble inside the t-channel loop.
    const r = report('phi4', '1-2 1-2 1-3 2-3 / 1 3 3 1'.replace('/ 1 3 3 1', '/ 1 2 3 3'));
    // Edges 0,1 form a bubble; the whole graph is the outer divergence.
    expect(r.divergentSubgraphs.map((s) => s.edgeList)).toEqual([[0, 1]]);
    expect(r.forests).toEqual({ proper: 2n, maximal: 1n });
  });

  it('tadpoles: self-loops are divergent subgraphs (ω = 2)', () => {
    const r = report('phi4', '1-1 1-2 1-2 / 2 2');
    // Self-loop at 1 (ω=2), bubble 1-2 1-2 (four-point, ω=0); whole graph is the two-point function.
    expect(r.divergentSubgraphs.map((s) => [s.edgeList, s.omega])).toEqual([
      [[0], 2],
      [[1, 2], 0],
    ]);
    expect(r.overlapping).toEqual([[0, 1]]);
  });

  it('QED vertex graph with a self-energy on an internal fermion line: the self-energy is the one subdivergence', () => {
    // Edges: 0 = 1>4, 1 = 4>5, 2 = 5>2, 3 = 4-5 (photon), 4 = 2>3, 5 = 1-3 (photon).
    const r = report('qed', '1>4 4>5 5>2 4-5 2>3 1-3 / >1 2 3>');
    expect(r.omega).toBe(0);
    expect(r.divergentSubgraphs.map((s) => [s.edgeList, s.omega, s.residue])).toEqual([[[1, 3], 1, ['psi', 'psibar']]]);
    expect(r.forests).toEqual({ proper: 2n, maximal: 1n });
    expect(report('qed', '1>2 2>3 1-3 / >1 2 3>').divergentSubgraphs).toEqual([]);
  });

  it('listing forests is refused beyond the limit, with the limit named', () => {
    const bg = bindGraph(parseNotation('1-2 1-2 1-2 / 1 2'), builtinTheory('phi4'));
    const subs = inspectGraph(bg).divergentSubgraphs;
    expect(listForests(subs)).toEqual([[], [0], [1], [2]]);
    let err: unknown;
    try {
      listForests(subs, { limits: { maxForests: 3 } });
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(LimitError);
    expect((err as LimitError).limit).toBe('maxForests');
  });
});
