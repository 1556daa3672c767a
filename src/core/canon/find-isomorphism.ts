import type { Graph } from '../graph/types.ts';
import { canonicalForm, type CanonOptions } from './canonical-form.ts';

/** An isomorphism from graph A to graph B, as input indices of B for each element of A. */
export interface GraphIsomorphism {
  /** `vertices[v]`: the vertex of B that vertex v of A goes to. */
  readonly vertices: readonly number[];
  /** `edges[i]`: the edge of B that edge i of A goes to (orientation and field kept). */
  readonly edges: readonly number[];
  /** `legs[i]`: the leg of B that leg i of A goes to (i itself when legs are labelled). */
  readonly legs: readonly number[];
}

/**
 * An isomorphism between two graphs, or null when there is none: compares canonical forms
 * and composes A's canonical labelling with the inverse of B's. Both graphs should be bound
 * to the same theory (fields resolved) first.
 *
 *     findIsomorphism(parseNotation('1-2 1-2 2-3 2-3 / 1 1 3 3'), parseNotation('b-c a-b c-b b-a / a a c c'))
 *     // { vertices: [2, 0, 1], edges: [1, 3, 0, 2], legs: [0, 1, 2, 3] }: 1→a, 2→b, 3→c (B numbers b, c, a)
 */
export function findIsomorphism(a: Graph, b: Graph, opts: CanonOptions = {}): GraphIsomorphism | null {
  if (a.vertices.length !== b.vertices.length || a.edges.length !== b.edges.length || a.legs.length !== b.legs.length) return null;
  const ca = canonicalForm(a, opts);
  const cb = canonicalForm(b, opts);
  if (ca.notation !== cb.notation) return null;
  const atPosition = new Array<number>(b.vertices.length);
  cb.vertexPosition.forEach((p, v) => (atPosition[p] = v));
  const vertices = ca.vertexPosition.map((p) => atPosition[p]!);
  const edges = new Array<number>(a.edges.length);
  ca.edgeOrigin.forEach((ia, k) => (edges[ia] = cb.edgeOrigin[k]!));
  const legs = new Array<number>(a.legs.length);
  ca.legOrigin.forEach((ia, k) => (legs[ia] = cb.legOrigin[k]!));
  return { vertices, edges, legs };
}

/** Whether two graphs are isomorphic (see `findIsomorphism`). */
export function isIsomorphic(a: Graph, b: Graph, opts: CanonOptions = {}): boolean {
  return findIsomorphism(a, b, opts) !== null;
}
