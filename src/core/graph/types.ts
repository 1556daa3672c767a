/**
 * The graph model: a multigraph with typed edges (oriented for fermions), self-loops,
 * external legs labelled 1..n in order, and counterterm vertices that stand for a
 * contracted subgraph. Vertices and edges are addressed by index; indices are the input
 * order of the notation (CLI JSON uses them), names are what the user wrote.
 */

/** A counterterm vertex: the residue (half-edge labels, sorted) and structure of a contracted subgraph. */
export interface CountertermMark {
  /** Half-edge labels of the contracted subgraph's residue, e.g. ["phi","phi"] or ["A","psi","psibar"]. */
  readonly residue: readonly string[];
  /** The counterterm structure: "" for a plain vertex, "p2" for a scalar propagator insertion, "pslash" for a fermion one, "m2" for a mass insertion. */
  readonly structure: string;
}

export interface Vertex {
  /** The name written in the notation (letters, digits, `_`). */
  readonly name: string;
  readonly counterterm?: CountertermMark;
}

/**
 * An edge between vertices `a` and `b` (indices). When `oriented`, the arrow runs a → b
 * (the particle flows from a to b). `field` is the particle's field name, or `null` for the
 * theory's default field (resolved when the graph is bound to a theory).
 */
export interface Edge {
  readonly a: number;
  readonly b: number;
  readonly field: string | null;
  readonly oriented: boolean;
}

/** Direction of an oriented external leg: "in" enters the graph at its vertex, "out" leaves it. */
export type LegDirection = 'none' | 'in' | 'out';

/** External leg number i+1 (legs are labelled by their position). */
export interface Leg {
  readonly vertex: number;
  readonly field: string | null;
  readonly direction: LegDirection;
}

export interface Graph {
  readonly vertices: readonly Vertex[];
  readonly edges: readonly Edge[];
  readonly legs: readonly Leg[];
}

/** Number of independent loops L = E − V + (connected components); isolated vertices count as components. */
export function isSelfLoop(e: Edge): boolean {
  return e.a === e.b;
}
