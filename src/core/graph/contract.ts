import type { CountertermMark, Edge, Graph, Leg, Vertex } from './types.ts';

/** One part of a contraction: the edges of a connected subgraph and what its vertex becomes. */
export interface ContractionPart {
  readonly edges: readonly number[];
  /** The new vertex's counterterm mark, or null for an ordinary vertex of the theory. */
  readonly mark: CountertermMark | null;
}

/**
 * Γ/γ: each part's vertices merge into one new vertex, its edges disappear, every other edge
 * and leg is re-attached (an edge with both ends in a part becomes a self-loop). The parts must
 * be vertex-disjoint. New vertices are named `c1`, `c2`, … (made unique against existing names);
 * vertex order: untouched vertices first in their old order, then the new ones. Edge and leg
 * order is kept. Returns the graph and, for each old edge, its index in the new graph (or −1).
 */
export function contractParts(g: Graph, parts: readonly ContractionPart[]): { graph: Graph; edgeMap: number[]; vertexMap: number[] } {
  const partOfVertex = new Map<number, number>();
  const removed = new Set<number>();
  parts.forEach((p, k) => {
    for (const i of p.edges) {
      removed.add(i);
      partOfVertex.set(g.edges[i]!.a, k);
      partOfVertex.set(g.edges[i]!.b, k);
    }
  });
  const names = new Set(g.vertices.map((v) => v.name));
  const freshName = (k: number) => {
    let n = k + 1;
    let s = `c${n}`;
    while (names.has(s)) s = `c${++n}_`;
    names.add(s);
    return s;
  };
  const vertices: Vertex[] = [];
  const vertexMap: number[] = [];
  g.vertices.forEach((v, i) => {
    if (partOfVertex.has(i)) return;
    vertexMap[i] = vertices.length;
    vertices.push(v);
  });
  const partVertex: number[] = parts.map((p, k) => {
    const idx = vertices.length;
    vertices.push(p.mark ? { name: freshName(k), counterterm: p.mark } : { name: freshName(k) });
    return idx;
  });
  for (const [v, k] of partOfVertex) vertexMap[v] = partVertex[k]!;
  const edges: Edge[] = [];
  const edgeMap: number[] = [];
  g.edges.forEach((e, i) => {
    if (removed.has(i)) {
      edgeMap[i] = -1;
      return;
    }
    edgeMap[i] = edges.length;
    edges.push({ ...e, a: vertexMap[e.a]!, b: vertexMap[e.b]! });
  });
  const legs: Leg[] = g.legs.map((l) => ({ ...l, vertex: vertexMap[l.vertex]! }));
  return { graph: { vertices, edges, legs }, edgeMap, vertexMap };
}
