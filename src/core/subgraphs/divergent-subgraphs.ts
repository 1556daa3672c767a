import { LimitError } from '../errors.ts';
import { bridges, edgeComponents } from '../graph/connectivity.ts';
import { edgeSetOf, type EdgeSet } from '../graph/edge-set.ts';
import type { BoundGraph } from '../theory/bind-graph.ts';
import { omegaOfEdges, residueOfEdges } from '../theory/power-counting.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { estimateConnectedVertexSets } from './estimate-vertex-sets.ts';
import { defaultSubgraphLimits, type SubgraphLimits } from './limits.ts';

/** A connected, one-particle-irreducible subgraph with ω ≥ 0. */
export interface DivergentSubgraph {
  readonly edges: EdgeSet;
  /** Edge indices, ascending. */
  readonly edgeList: readonly number[];
  /** Vertex indices, ascending. */
  readonly vertices: readonly number[];
  readonly loops: number;
  readonly omega: number;
  readonly residue: readonly string[];
}

export interface DivergentSubgraphOptions {
  readonly limits?: Partial<SubgraphLimits>;
  readonly cancel?: CancelToken;
}

/**
 * All connected divergent 1PI subgraphs (the graph itself included when it qualifies),
 * sorted by number of edges, then lexicographically by edge indices.
 *
 * Method: every such subgraph lives on a connected vertex set S and uses a subset F of the
 * edges E(S) with both ends in S. With F spanning and connected, ω(F) = ω(E(S)) − Σ_{e∉F}(D0 − w_e),
 * so when every line has D0 > w_e (any power-counting renormalizable theory) only removal sets
 * within the budget ω(E(S)) need trying — a handful per vertex set. Connected vertex sets are
 * enumerated once each (extension-set method), so no subgraph is found twice.
 */
export function divergentSubgraphs(bg: BoundGraph, opts: DivergentSubgraphOptions = {}): DivergentSubgraph[] {
  const limits = { ...defaultSubgraphLimits, ...opts.limits };
  const cancel = opts.cancel ?? neverCancel;
  const g = bg.graph;
  const n = g.vertices.length;
  const D0 = bg.theory.dimension;
  const nbrs: Set<number>[] = g.vertices.map(() => new Set());
  g.edges.forEach((e) => {
    if (e.a !== e.b) {
      nbrs[e.a]!.add(e.b);
      nbrs[e.b]!.add(e.a);
    }
  });
  refuseHugeSearch(nbrs, limits.maxVertexSubsets);
  const found: DivergentSubgraph[] = [];
  let visited = 0;

  const consider = (S: number[]) => {
    if (++visited > limits.maxVertexSubsets) {
      throw new LimitError('looking for divergent subgraphs', 'maxVertexSubsets', limits.maxVertexSubsets, `more than ${limits.maxVertexSubsets} connected vertex sets`, 'raise it with --max-vertex-subsets, or inspect a smaller graph');
    }
    if ((visited & 0xfff) === 0) cancel.throwIfCancelled();
    const inS = new Set(S);
    const induced: number[] = [];
    g.edges.forEach((e, i) => {
      if (inS.has(e.a) && inS.has(e.b)) induced.push(i);
    });
    if (induced.length === 0) return;
    const omegaMax = omegaOfEdges(bg, induced);
    const costs = induced.map((i) => D0 - bg.edgeWeight[i]!);
    const bounded = costs.every((c) => c > 0);
    if (bounded && omegaMax < 0) return;
    // Choose removal sets R (as a boolean mask over `induced`) with total cost within budget.
    const removed = new Array<boolean>(induced.length).fill(false);
    const visit = (from: number, budget: number) => {
      const F = induced.filter((_, k) => !removed[k]);
      tryCandidate(F, S);
      for (let k = from; k < induced.length; k++) {
        if (bounded && costs[k]! > budget) continue;
        removed[k] = true;
        visit(k + 1, budget - costs[k]!);
        removed[k] = false;
      }
    };
    visit(0, omegaMax);
  };

  const tryCandidate = (F: number[], S: number[]) => {
    if (F.length === 0) return;
    // F must touch every vertex of S (else it belongs to a smaller vertex set), be connected and bridgeless.
    const touched = new Set<number>();
    for (const i of F) {
      touched.add(g.edges[i]!.a);
      touched.add(g.edges[i]!.b);
    }
    if (touched.size !== S.length) return;
    if (edgeComponents(g, F).length !== 1 || bridges(g, F).length !== 0) return;
    const omega = omegaOfEdges(bg, F);
    if (omega < 0) return;
    if (found.length >= limits.maxDivergentSubgraphs) {
      throw new LimitError('collecting divergent subgraphs', 'maxDivergentSubgraphs', limits.maxDivergentSubgraphs, `more than ${limits.maxDivergentSubgraphs}`, 'raise it with --max-divergent-subgraphs');
    }
    found.push({
      edges: edgeSetOf(F),
      edgeList: F,
      vertices: [...S].sort((x, y) => x - y),
      loops: F.length - S.length + 1,
      omega,
      residue: residueOfEdges(bg, F),
    });
  };

  // Extension-set enumeration of connected vertex sets (each set once, rooted at its least vertex).
  const extend = (S: number[], inS: Set<number>, nbhd: Set<number>, ext: number[], root: number) => {
    consider(S);
    const ext2 = [...ext];
    while (ext2.length) {
      const w = ext2.pop()!;
      const added: number[] = [];
      for (const u of nbrs[w]!) {
        if (u > root && !inS.has(u) && !nbhd.has(u)) added.push(u);
      }
      S.push(w);
      inS.add(w);
      const nb2 = new Set(nbhd);
      for (const u of nbrs[w]!) nb2.add(u);
      extend(S, inS, nb2, [...ext2, ...added], root);
      S.pop();
      inS.delete(w);
    }
  };
  for (let v = 0; v < n; v++) {
    const nb = new Set(nbrs[v]!);
    nb.add(v);
    extend([v], new Set([v]), nb, [...nbrs[v]!].filter((u) => u > v), v);
  }
  return found.sort(compareSubgraphs);
}

/**
 * Refuses up front, in milliseconds, a graph with clearly more connected vertex sets than
 * the limit (the sampled estimate above 1.25 × the limit; it is accurate to a few per cent).
 * Graphs with 2^n − 1 ≤ limit vertex sets in all are never estimated; a graph just over the
 * limit is still stopped by the count during the search.
 */
function refuseHugeSearch(nbrs: readonly Set<number>[], limit: number): void {
  const n = nbrs.length;
  if (n < 53 && 2 ** n - 1 <= limit) return;
  const estimate = estimateConnectedVertexSets(nbrs.map((s) => [...s]), 1.25 * limit);
  if (estimate > 1.25 * limit) {
    const shown = estimate < 1e15 ? String(Math.round(estimate)) : estimate.toExponential(2);
    throw new LimitError('looking for divergent subgraphs', 'maxVertexSubsets', limit, `over ${shown} connected vertex sets (estimated)`, 'raise it with --max-vertex-subsets, or inspect a smaller graph');
  }
}

/** Size (edge count) first, then lexicographic order of the ascending edge lists. */
export function compareSubgraphs(x: { edgeList: readonly number[] }, y: { edgeList: readonly number[] }): number {
  if (x.edgeList.length !== y.edgeList.length) return x.edgeList.length - y.edgeList.length;
  for (let k = 0; k < x.edgeList.length; k++) {
    const d = x.edgeList[k]! - y.edgeList[k]!;
    if (d !== 0) return d;
  }
  return 0;
}
