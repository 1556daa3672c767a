import { edgeComponents, loopsOfEdges, verticesOfEdges, loopNumber } from '../graph/connectivity.ts';
import type { BoundGraph } from './bind-graph.ts';
import { halfEdgeLabel, legLabel } from './bind-graph.ts';
import type { Theory } from './types.ts';

/**
 * Superficial degree of divergence of an edge set: ω = D0·L − Σ_edges weight + Σ_vertices derivatives
 * (DESIGN §2), summed over the vertices the edges touch.
 */
export function omegaOfEdges(bg: BoundGraph, edges: readonly number[]): number {
  const L = loopsOfEdges(bg.graph, edges);
  let w = 0;
  for (const i of edges) w += bg.edgeWeight[i]!;
  let d = 0;
  for (const v of verticesOfEdges(bg.graph, edges)) d += bg.vertexDerivatives[v]!;
  return bg.theory.dimension * L - w + d;
}

/** ω of the whole graph (every vertex counts, including one without edges). */
export function omegaOfGraph(bg: BoundGraph): number {
  const L = loopNumber(bg.graph);
  const w = bg.edgeWeight.reduce((s, x) => s + x, 0);
  const d = bg.vertexDerivatives.reduce((s, x) => s + x, 0);
  return bg.theory.dimension * L - w + d;
}

/**
 * Residue of an edge set: the labels of its external half-edges as seen from inside — legs at
 * its vertices and the ends of edges outside the set — sorted.
 */
export function residueOfEdges(bg: BoundGraph, edges: readonly number[]): string[] {
  const g = bg.graph;
  const inside = new Set(edges);
  const verts = new Set(verticesOfEdges(g, edges));
  const out: string[] = [];
  g.edges.forEach((e, i) => {
    if (inside.has(i)) return;
    if (verts.has(e.a)) out.push(halfEdgeLabel(bg.theory, e, false));
    if (verts.has(e.b)) out.push(halfEdgeLabel(bg.theory, e, true));
  });
  for (const l of g.legs) if (verts.has(l.vertex)) out.push(legLabel(bg.theory, l));
  return out.sort();
}

export function residueOfGraph(bg: BoundGraph): string[] {
  return bg.graph.legs.map((l) => legLabel(bg.theory, l)).sort();
}

/** What in the theory renormalizes a residue. */
export type CountertermMatch =
  | { readonly kind: 'vertex'; readonly index: number }
  | { readonly kind: 'propagator'; readonly field: string }
  | { readonly kind: 'vacuum' }
  | { readonly kind: 'protected'; readonly reason: string }
  | { readonly kind: 'missing'; readonly reason: string };

const key = (labels: readonly string[]) => [...labels].sort().join(',');

export function countertermFor(theory: Theory, residue: readonly string[]): CountertermMatch {
  if (residue.length === 0) return { kind: 'vacuum' };
  const k = key(residue);
  const vi = theory.vertices.findIndex((v) => key(v.fields) === k);
  if (vi >= 0) return { kind: 'vertex', index: vi };
  for (const f of theory.fields) if (key([f.name, f.antiparticle ?? f.name]) === k) return { kind: 'propagator', field: f.name };
  const p = theory.protectedResidues.find((r) => key(r.residue) === k);
  if (p) return { kind: 'protected', reason: p.reason };
  return {
    kind: 'missing',
    reason: 'either the Lagrangian lacks this term (add the vertex to the theory) or a symmetry of the theory makes the divergence cancel in the sum of graphs',
  };
}

/**
 * Mass dimension of each coupling: D0 − Σ field dimensions − derivatives, with a field's
 * dimension (D0 − propagator weight)/2. Negative means non-renormalizable by power counting.
 */
export function couplingDimensions(theory: Theory): Map<string, number> {
  const dims = new Map<string, number>();
  const fieldDim = (label: string) => {
    const f = theory.fields.find((x) => x.name === label || x.antiparticle === label)!;
    return (theory.dimension - f.propagatorWeight) / 2;
  };
  for (const v of theory.vertices) {
    const d = theory.dimension - v.fields.reduce((s, l) => s + fieldDim(l), 0) - v.derivatives;
    const prev = dims.get(v.coupling);
    dims.set(v.coupling, prev === undefined ? d : Math.min(prev, d));
  }
  return dims;
}

/** Loops and components of an edge set, for summaries. */
export function componentsOfEdges(bg: BoundGraph, edges: readonly number[]): number {
  return edgeComponents(bg.graph, edges).length;
}
