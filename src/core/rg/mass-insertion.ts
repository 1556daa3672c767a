import { canonicalNotation } from '../canon/canonical-form.ts';
import type { Edge, Graph } from '../graph/types.ts';
import { hasScalelessPart } from '../generate/scaleless-parts.ts';
import type { Theory } from '../theory/types.ts';

/**
 * The mass through a φ² insertion (DESIGN §7). Z_{m²} is the counterterm of ∂Γ^(2)/∂m² at
 * m = 0: the massive propagator's derivative −1/(k²+m²)² puts a two-valent vertex with factor −1
 * (per m²) on one line, so ∂/∂m² of a two-point graph Γ with weight 1/S(Γ) is the sum over its
 * lines of Γ with that line split by an insertion, each with the same weight 1/S(Γ).
 *
 * The UV counterterm of such a graph is logarithmic and momentum independent, so it may be
 * computed with the insertion carrying momentum (infrared rearrangement): we write the insertion
 * as a vertex σφφ of an auxiliary theory whose field σ only appears on one external leg. Then
 * the graph is an ordinary three-point graph (legs φ, φ, σ), its divergent subgraphs that
 * contain the insertion have residue (φ, φ, σ) and contract to a σφφ vertex — the m² counterterm
 * of the subgraph — and those without it are the massless theory's (p² for self-energies;
 * the m² part of a self-energy subgraph is the subgraph with the insertion, counted when the
 * insertion sits on one of its lines). A part of the graph that still hangs at one vertex with
 * no external leg is scaleless and vanishes.
 */
export const INSERTION_FIELD = 'sigma';

/** The theory plus the insertion vertex σφφ (normalization ½: the Lagrangian's ½ m² φ²). */
export function insertionTheory(theory: Theory): Theory {
  const phi = theory.defaultField;
  return {
    ...theory,
    name: `${theory.name}+phi^2`,
    title: `${theory.title}, with a φ² insertion (σ)`,
    fields: [...theory.fields, { name: INSERTION_FIELD, statistics: 'boson', propagatorWeight: 2, line: 'dashed', latex: '\\sigma' }],
    vertices: [...theory.vertices, { fields: [phi, phi, INSERTION_FIELD], coupling: INSERTION_FIELD, derivatives: 0, normalization: '1/2' }],
    couplings: [...theory.couplings, { name: INSERTION_FIELD }],
  };
}

/** One two-point graph with the insertion on one of its lines. */
export interface InsertedGraph {
  /** Line of the two-point graph (index, 0-based) that carries the insertion. */
  readonly line: number;
  /** The three-point graph of the auxiliary theory (legs φ, φ, σ; the σ vertex last). */
  readonly graph: Graph;
  /** Canonical notation of `graph` (the σ leg marks the insertion). */
  readonly notation: string;
  /** It still has a scaleless part: it vanishes (no counterterm). */
  readonly vanishes: boolean;
}

/** Every line of a two-point graph with a φ² insertion on it. */
export function insertOnLines(g: Graph, defaultField: string): InsertedGraph[] {
  const out: InsertedGraph[] = [];
  const s = g.vertices.length;
  g.edges.forEach((e, line) => {
    const edges: Edge[] = g.edges.filter((_, k) => k !== line).map((x) => ({ ...x }));
    edges.push({ a: e.a, b: s, field: e.field, oriented: false }, { a: s, b: e.b, field: e.field, oriented: false });
    const graph: Graph = {
      vertices: [...g.vertices, { name: `m${s + 1}` }],
      edges,
      legs: [...g.legs, { vertex: s, field: INSERTION_FIELD, direction: 'none' }],
    };
    out.push({ line, graph, notation: canonicalNotation(graph, { defaultField }), vanishes: hasScalelessPart(graph) });
  });
  return out;
}
