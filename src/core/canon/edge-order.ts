import type { Edge } from '../graph/types.ts';

/** How canonical graphs write and order their edges (shared by the canonical form and the generator). */
const fieldKey = (f: string | null) => f ?? '';

/** Writes edge e with canonical vertex numbers: undirected ends low-high, arrows tail>head. */
export function placeEdge(e: Edge, pos: readonly number[]): Edge {
  const a = pos[e.a]!;
  const b = pos[e.b]!;
  if (e.oriented) return { a, b, field: e.field, oriented: true };
  return { a: Math.min(a, b), b: Math.max(a, b), field: e.field, oriented: false };
}

export function compareEdges(x: Edge, y: Edge): number {
  const lo = Math.min(x.a, x.b) - Math.min(y.a, y.b);
  if (lo) return lo;
  const hi = Math.max(x.a, x.b) - Math.max(y.a, y.b);
  if (hi) return hi;
  const fx = fieldKey(x.field);
  const fy = fieldKey(y.field);
  if (fx !== fy) return fx < fy ? -1 : 1;
  const code = (e: Edge) => (!e.oriented ? 0 : e.a <= e.b ? 1 : 2);
  return code(x) - code(y);
}
