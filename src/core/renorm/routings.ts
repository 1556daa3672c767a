import type { GraphAnalysis } from '../hopf/hopf-algebra.ts';
import { omegaOfGraph } from '../theory/power-counting.ts';

/** External momentum in at vertex u, out at vertex v (indices of the graph). */
export interface Routing {
  readonly u: number;
  readonly v: number;
}

/**
 * The routings worth trying, in order. A logarithmically divergent graph may take the momentum
 * through any two vertices that lie in no subgraph of positive degree (injecting momentum into a
 * quadratically divergent self-energy would change its polynomial counterterm); vertices that
 * carried external legs come first, then pairs far apart in input order. A quadratically
 * divergent two-point graph keeps its real kinematics: the momentum enters and leaves at its legs.
 */
export function choosePairs(a: GraphAnalysis): { ok: true; pairs: Routing[] } | { ok: false; reason: string } {
  const g = a.bound.graph;
  const omega = omegaOfGraph(a.bound);
  const legVertices = [...new Set(g.legs.map((l) => l.vertex))];
  if (omega === 2 && g.legs.length === 2) {
    const [s, t] = [g.legs[0]!.vertex, g.legs[1]!.vertex];
    return { ok: true, pairs: s === t ? [] : [{ u: s, v: t }] };
  }
  if (omega !== 0) {
    return { ok: false, reason: `a graph with ω = ${omega} and ${g.legs.length} legs needs a counterterm polynomial of degree ${omega} in the momenta, which the exact evaluator does not extract` };
  }
  const blocked = new Set<number>();
  for (const s of a.subgraphs) if (s.omega > 0) for (const v of s.vertices) blocked.add(v);
  const pairs: Routing[] = [];
  const n = g.vertices.length;
  for (let u = 0; u < n; u++) for (let v = u + 1; v < n; v++) if (!blocked.has(u) && !blocked.has(v)) pairs.push({ u, v });
  const score = (r: Routing) => (legVertices.includes(r.u) ? 0 : 2) + (legVertices.includes(r.v) ? 0 : 2);
  pairs.sort((x, y) => score(x) - score(y) || x.u - y.u || x.v - y.v);
  return { ok: true, pairs };
}
