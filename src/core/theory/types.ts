/**
 * Theories are data (DESIGN §2): named-key JSON of our own design, validated by
 * `parseTheory`. Built-in theories are written in the same shape.
 */

export type Statistics = 'boson' | 'fermion';

/** How the editor draws a field's lines: the trade's own conventions. */
export type LineStyle = 'plain' | 'dashed' | 'arrow' | 'wavy' | 'curly';

export interface FieldSpec {
  readonly name: string;
  /** Name of the antiparticle; absent for a self-conjugate (real) field. */
  readonly antiparticle?: string;
  readonly statistics: Statistics;
  /** Power of momentum in the propagator's denominator: scalar 2, Dirac fermion 1, Feynman-gauge boson 2. */
  readonly propagatorWeight: number;
  readonly line: LineStyle;
  readonly latex?: string;
}

export interface VertexSpec {
  /**
   * The half-edge labels meeting at the vertex. A self-conjugate field's label is its name;
   * for a field with an antiparticle, a line whose arrow points into the vertex is labelled
   * with the field's name (ψ), one whose arrow leaves it with the antiparticle's (ψ̄).
   */
  readonly fields: readonly string[];
  readonly coupling: string;
  /** Number of momentum derivatives at the vertex (0 for the built-in theories). */
  readonly derivatives: number;
  /** Combinatorial normalization of the vertex in the Lagrangian, e.g. "1/24" for λφ⁴/4!. */
  readonly normalization: string;
  /** Internal-symmetry tensor of the vertex, by name (see `tensors`), e.g. "on-symmetric-delta-delta". */
  readonly tensor?: string;
}

export interface CouplingSpec {
  readonly name: string;
  readonly latex?: string;
}

/** A residue that power counting calls divergent but which needs no counterterm, and why. */
export interface ProtectedResidue {
  readonly residue: readonly string[];
  readonly reason: string;
}

/** How results are normalized and defined; shown beside every result (DESIGN §2). */
export interface Conventions {
  /** D = D0 − 2ε or D = D0 − ε. */
  readonly dimension: 'D0-2eps' | 'D0-eps';
  /** Euclidean Feynman rules: each vertex contributes −(coupling × tensor); each closed fermion loop −1. */
  readonly vertexSign: -1 | 1;
  readonly fermionLoopSign: -1 | 1;
  /** Per-loop integration measure, in words: where (4π)^ε and e^{γε} go. */
  readonly loopMeasure: string;
  /** The rescaled coupling used in RG functions, e.g. "g = lambda/(16 pi^2)". */
  readonly couplingRescaling: string;
  /** Definitions of the renormalization constants. */
  readonly zDefinitions: readonly string[];
  /** γ_φ = ½ μ d ln Z_φ/dμ (true) or without the ½ (false). */
  readonly gammaPhiHalf: boolean;
  /** β = μ dg/dμ (+1) or −μ dg/dμ (−1). */
  readonly betaSign: 1 | -1;
}

export interface Theory {
  readonly name: string;
  readonly title: string;
  /** Spacetime dimension D0 before regularization. */
  readonly dimension: number;
  readonly fields: readonly FieldSpec[];
  readonly vertices: readonly VertexSpec[];
  readonly couplings: readonly CouplingSpec[];
  /** Field of an edge or leg written without `:field`. */
  readonly defaultField: string;
  /** Field of an oriented edge (`a>b`) written without `:field`, when different from the default. */
  readonly defaultOrientedField?: string;
  /** Free symbols the theory's factors use (e.g. N for O(N)). */
  readonly symbols: readonly string[];
  readonly protectedResidues: readonly ProtectedResidue[];
  readonly conventions: Conventions;
}
