import type { Edge, Graph, Leg } from './types.ts';

/**
 * The subgraph on `edges` as a graph of its own: its vertices (in old order), its edges (in old
 * order), and as legs its external half-edges — the old legs at its vertices and one leg for each
 * end of an outside edge that touches it, keeping field and orientation (an outside oriented edge
 * arriving at the subgraph becomes an entering leg). Fields must be resolved (bound graph).
 */
export function subgraphAsGraph(g: Graph, edges: readonly number[]): { graph: Graph; vertexMap: Map<number, number> } {
  const inside = new Set(edges);
  const used = new Set<number>();
  for (const i of edges) {
    used.add(g.edges[i]!.a);
    used.add(g.edges[i]!.b);
  }
  const order = [...used].sort((x, y) => x - y);
  const vertexMap = new Map(order.map((v, k) => [v, k]));
  const vertices = order.map((v) => g.vertices[v]!);
  const newEdges: Edge[] = [...inside].sort((x, y) => x - y).map((i) => {
    const e = g.edges[i]!;
    return { ...e, a: vertexMap.get(e.a)!, b: vertexMap.get(e.b)! };
  });
  const legs: Leg[] = [];
  g.edges.forEach((e, i) => {
    if (inside.has(i)) return;
    if (used.has(e.a)) legs.push({ vertex: vertexMap.get(e.a)!, field: e.field, direction: e.oriented ? 'out' : 'none' });
    if (used.has(e.b)) legs.push({ vertex: vertexMap.get(e.b)!, field: e.field, direction: e.oriented ? 'in' : 'none' });
  });
  for (const l of g.legs) if (used.has(l.vertex)) legs.push({ ...l, vertex: vertexMap.get(l.vertex)! });
  return { graph: { vertices, edges: newEdges, legs }, vertexMap };
}
