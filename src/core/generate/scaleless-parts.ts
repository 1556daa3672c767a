import type { Graph } from '../graph/types.ts';

/**
 * Whether a graph has a part that vanishes in massless dimensional regularization: a
 * self-loop, or a vertex whose removal leaves a component without external legs (that part
 * hangs at a single vertex, so no external momentum flows through it: a scaleless tadpole
 * part). A graph without external legs is scaleless as a whole.
 */
export function hasScalelessPart(g: Graph): boolean {
  const V = g.vertices.length;
  if (g.legs.length === 0) return true;
  if (g.edges.some((e) => e.a === e.b)) return true;
  const adj: number[][] = Array.from({ length: V }, () => []);
  for (const e of g.edges) {
    adj[e.a]!.push(e.b);
    adj[e.b]!.push(e.a);
  }
  const hasLeg = new Uint8Array(V);
  for (const l of g.legs) hasLeg[l.vertex] = 1;
  for (let c = 0; c < V; c++) {
    const seen = new Uint8Array(V);
    seen[c] = 1;
    for (const start of adj[c]!) {
      if (seen[start]) continue;
      seen[start] = 1;
      const stack = [start];
      let legs = 0;
      while (stack.length) {
        const u = stack.pop()!;
        legs += hasLeg[u]!;
        for (const w of adj[u]!) {
          if (seen[w]) continue;
          seen[w] = 1;
          stack.push(w);
        }
      }
      if (legs === 0) return true;
    }
  }
  return false;
}
