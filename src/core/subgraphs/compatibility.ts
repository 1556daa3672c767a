import { isSubset } from '../graph/edge-set.ts';
import type { DivergentSubgraph } from './divergent-subgraphs.ts';

/** Nested: one edge set contains the other. */
export function areNested(x: DivergentSubgraph, y: DivergentSubgraph): boolean {
  return isSubset(x.edges, y.edges) || isSubset(y.edges, x.edges);
}

/** Vertex-disjoint: no vertex in common (sharing a vertex joins two subgraphs into one component). */
export function areVertexDisjoint(x: DivergentSubgraph, y: DivergentSubgraph): boolean {
  const ys = new Set(y.vertices);
  return !x.vertices.some((v) => ys.has(v));
}

/** Two subgraphs may stand in one forest when nested or vertex-disjoint. */
export function areCompatible(x: DivergentSubgraph, y: DivergentSubgraph): boolean {
  return areNested(x, y) || areVertexDisjoint(x, y);
}

/** Overlapping pairs [i, j], i < j: neither nested nor vertex-disjoint, so they share no forest. */
export function overlappingPairs(subs: readonly DivergentSubgraph[]): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < subs.length; i++) {
    for (let j = i + 1; j < subs.length; j++) if (!areCompatible(subs[i]!, subs[j]!)) out.push([i, j]);
  }
  return out;
}
