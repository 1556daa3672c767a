/**
 * The graph the period machinery works on: vertices 0..V−1 and edges as pairs of vertex
 * indices, with the half-dimension h of the integrand Ω/ψ^h (h = 2 for φ⁴ in four dimensions).
 * Plain data (arrays of numbers), so it crosses to worker threads unchanged.
 */
export interface PeriodGraph {
  readonly vertexCount: number;
  /** Edge i joins ends[2i] and ends[2i+1]. */
  readonly ends: readonly number[];
  readonly edgeCount: number;
  /** Loop number (first Betti number) of the whole graph. */
  readonly loops: number;
  /** h = D0/2: the integrand is Ω/ψ^h, and the graph has h·L edges. */
  readonly halfDimension: number;
}

/** A PeriodGraph from endpoint pairs (the loop number counts components, so forests work too). */
export function periodGraphFromEdges(vertexCount: number, edges: readonly (readonly [number, number])[], halfDimension = 2): PeriodGraph {
  const parent = Array.from({ length: vertexCount }, (_, i) => i);
  const find = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]!]!;
    return x;
  };
  let components = vertexCount;
  const ends: number[] = [];
  for (const [a, b] of edges) {
    ends.push(a, b);
    const ra = find(a);
    const rb = find(b);
    if (ra !== rb) {
      parent[ra] = rb;
      components--;
    }
  }
  return { vertexCount, ends, edgeCount: edges.length, loops: edges.length - vertexCount + components, halfDimension };
}
