import type { EdgeSet } from './edge-set.ts';
import { edgeIndices } from './edge-set.ts';
import type { Graph } from './types.ts';

/** Vertices touched by an edge set (ascending indices). */
export function verticesOfEdges(g: Graph, edges: readonly number[]): number[] {
  const seen = new Set<number>();
  for (const i of edges) {
    const e = g.edges[i]!;
    seen.add(e.a);
    seen.add(e.b);
  }
  return [...seen].sort((x, y) => x - y);
}

/** Union–find over vertex indices. */
class DisjointSets {
  private readonly parent: Int32Array;
  constructor(n: number) {
    this.parent = new Int32Array(n);
    for (let i = 0; i < n; i++) this.parent[i] = i;
  }
  find(x: number): number {
    while (this.parent[x] !== x) {
      this.parent[x] = this.parent[this.parent[x]!]!;
      x = this.parent[x]!;
    }
    return x;
  }
  union(x: number, y: number): boolean {
    const a = this.find(x);
    const b = this.find(y);
    if (a === b) return false;
    this.parent[a] = b;
    return true;
  }
}

/**
 * Connected components of the edge-induced subgraph (components that share a vertex are
 * one component), each as a list of edge indices. Without `edges`, the whole graph, where
 * vertices without edges are their own (edge-less) components.
 */
export function edgeComponents(g: Graph, edges: readonly number[]): number[][] {
  const ds = new DisjointSets(g.vertices.length);
  for (const i of edges) ds.union(g.edges[i]!.a, g.edges[i]!.b);
  const byRoot = new Map<number, number[]>();
  for (const i of edges) {
    const r = ds.find(g.edges[i]!.a);
    let list = byRoot.get(r);
    if (!list) byRoot.set(r, (list = []));
    list.push(i);
  }
  return [...byRoot.values()];
}

/** Number of connected components of the whole graph (every vertex counts, with or without edges). */
export function componentCount(g: Graph): number {
  const ds = new DisjointSets(g.vertices.length);
  let n = g.vertices.length;
  for (const e of g.edges) if (ds.union(e.a, e.b)) n--;
  return n;
}

/** Loop number of the whole graph: L = E − V + components. */
export function loopNumber(g: Graph): number {
  return g.edges.length - g.vertices.length + componentCount(g);
}

/** Loop number of an edge set: |F| − |V(F)| + components(F). */
export function loopsOfEdges(g: Graph, edges: readonly number[]): number {
  if (edges.length === 0) return 0;
  const verts = verticesOfEdges(g, edges);
  return edges.length - verts.length + edgeComponents(g, edges).length;
}

/**
 * Bridges of the subgraph formed by `edges` (edge indices whose removal increases the number
 * of components), by Tarjan's low-link method, iteratively so deep graphs cannot overflow the stack.
 * Parallel edges are never bridges; self-loops never are.
 */
export function bridges(g: Graph, edges: readonly number[]): number[] {
  const adj = new Map<number, { to: number; edge: number }[]>();
  const link = (v: number, to: number, edge: number) => {
    let l = adj.get(v);
    if (!l) adj.set(v, (l = []));
    l.push({ to, edge });
  };
  for (const i of edges) {
    const e = g.edges[i]!;
    if (e.a === e.b) continue;
    link(e.a, e.b, i);
    link(e.b, e.a, i);
  }
  const disc = new Map<number, number>();
  const low = new Map<number, number>();
  const out: number[] = [];
  let time = 0;
  for (const root of adj.keys()) {
    if (disc.has(root)) continue;
    // Stack frames: vertex, the edge we came by, next neighbour position.
    const stack: { v: number; via: number; next: number }[] = [{ v: root, via: -1, next: 0 }];
    disc.set(root, time);
    low.set(root, time++);
    while (stack.length) {
      const top = stack[stack.length - 1]!;
      const nbrs = adj.get(top.v)!;
      if (top.next < nbrs.length) {
        const { to, edge } = nbrs[top.next++]!;
        if (edge === top.via) continue;
        if (!disc.has(to)) {
          disc.set(to, time);
          low.set(to, time++);
          stack.push({ v: to, via: edge, next: 0 });
        } else {
          low.set(top.v, Math.min(low.get(top.v)!, disc.get(to)!));
        }
      } else {
        stack.pop();
        const parent = stack[stack.length - 1];
        if (parent) {
          low.set(parent.v, Math.min(low.get(parent.v)!, low.get(top.v)!));
          if (low.get(top.v)! > disc.get(parent.v)!) out.push(top.via);
        }
      }
    }
  }
  return out.sort((x, y) => x - y);
}

/** One-particle irreducible: connected and without bridges. The empty set is not 1PI. */
export function isOnePIEdges(g: Graph, edges: readonly number[]): boolean {
  if (edges.length === 0) return false;
  return edgeComponents(g, edges).length === 1 && bridges(g, edges).length === 0;
}

/** The whole graph is 1PI: connected (as a graph) and without bridges. A single vertex counts. */
export function isOnePIGraph(g: Graph): boolean {
  if (componentCount(g) !== 1) return false;
  return bridges(g, g.edges.map((_, i) => i)).length === 0;
}

export function isOnePISet(g: Graph, s: EdgeSet): boolean {
  return isOnePIEdges(g, edgeIndices(s));
}
