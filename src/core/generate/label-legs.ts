import type { Edge, Graph, Leg, Vertex } from '../graph/types.ts';
import type { GenerationContext } from './generation-context.ts';
import type { PartialState } from './partial-state.ts';

/** The lines of a complete state as graph edges (vertices named 1…V, fields written out). */
export function stateEdges(ctx: GenerationContext, s: PartialState): Edge[] {
  const V = s.V;
  const edges: Edge[] = [];
  ctx.kinds.forEach((kind, k) => {
    for (let a = 0; a < V; a++) {
      for (let c = 0; c < s.loops[k * V + a]!; c++) edges.push({ a, b: a, field: kind.field, oriented: kind.oriented });
      for (let b = kind.oriented ? 0 : a + 1; b < V; b++) {
        if (b === a) continue;
        for (let c = 0; c < s.mult[(k * V + a) * V + b]!; c++) edges.push({ a, b, field: kind.field, oriented: kind.oriented });
      }
    }
  });
  return edges;
}

/**
 * The distinct ways to put labels 1..n on the legs of a complete state, one per orbit of its
 * vertex automorphism group (legs unlabelled; given by generators): a labelling is a map
 * from leg numbers to vertices with the right label counts at each vertex, and two give
 * isomorphic labelled graphs exactly when an automorphism carries one to the other (legs of
 * one label at one vertex are not told apart by the graph). Returns, for each orbit, the
 * vertex of each leg and the orbit's size.
 * @internal
 */
export function legLabellings(ctx: GenerationContext, s: PartialState, generators: readonly Int32Array[]): { vertexOfLeg: number[]; orbitSize: number }[] {
  const nl = ctx.labels.length;
  const n = ctx.legs.length;
  const need = Int32Array.from(s.legs);
  const all: number[][] = [];
  const f = new Array<number>(n);
  const rec = (i: number) => {
    if (i === n) {
      all.push([...f]);
      return;
    }
    const l = ctx.legs[i]!.label;
    for (let v = 0; v < s.V; v++) {
      if (need[v * nl + l]! === 0) continue;
      need[v * nl + l]!--;
      f[i] = v;
      rec(i + 1);
      need[v * nl + l]!++;
    }
  };
  rec(0);
  const index = new Map(all.map((a, i) => [a.join(','), i]));
  const orbitOf = new Int32Array(all.length).fill(-1);
  const out: { vertexOfLeg: number[]; orbitSize: number }[] = [];
  for (let i = 0; i < all.length; i++) {
    if (orbitOf[i]! >= 0) continue;
    orbitOf[i] = i;
    const queue = [i];
    for (let q = 0; q < queue.length; q++) {
      const cur = all[queue[q]!]!;
      for (const g of generators) {
        const j = index.get(cur.map((v) => g[v]!).join(','))!;
        if (orbitOf[j]! < 0) {
          orbitOf[j] = i;
          queue.push(j);
        }
      }
    }
    out.push({ vertexOfLeg: all[i]!, orbitSize: queue.length });
  }
  return out;
}

/** The graph of a complete state with its legs in the given order (leg i+1 at `vertexOfLeg[i]`). */
export function stateGraph(ctx: GenerationContext, s: PartialState, edges: readonly Edge[], vertexOfLeg: readonly number[]): Graph {
  const vertices: Vertex[] = Array.from({ length: s.V }, (_, i) => ({ name: String(i + 1) }));
  const legs: Leg[] = ctx.legs.map((l, i) => ({ vertex: vertexOfLeg[i]!, field: l.field, direction: l.direction }));
  return { vertices, edges: [...edges], legs };
}
