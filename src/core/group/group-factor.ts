import { formatPoly } from '../algebra/format-text.ts';
import type { Poly } from '../algebra/polynomial.ts';
import { TheoryError } from '../errors.ts';
import type { Graph } from '../graph/types.ts';
import type { Theory } from '../theory/types.ts';
import { onTensor, type LegPairingTerm } from './on-group-factor.ts';

/** A graph's internal-symmetry factor. */
export interface GroupFactor {
  /** The graph's tensor projected onto the residue's invariant tensor (polynomial in the theory's symbols). */
  readonly value: Poly;
  /** `value` in the canonical text form, e.g. `8/9 + 1/9*N`. */
  readonly text: string;
  /** The tensor itself, as a combination of leg pairings (O(N)). */
  readonly pairings: readonly LegPairingTerm[];
}

/** Vertex tensors the engine knows how to contract. */
import { KNOWN_TENSORS } from '../theory/parse-theory.ts';

/** Whether the theory's vertices carry internal-symmetry tensors (then graphs have group factors). */
export function hasGroupFactors(theory: Theory): boolean {
  return theory.vertices.some((v) => v.tensor !== undefined);
}

/**
 * The group factor of a graph of the theory: its vertex tensors contracted over the lines and
 * projected onto the residue's invariant tensor. For a theory without tensors every graph has
 * factor 1: returns null. Supported: O(N) φ⁴ with the symmetrized δδ vertex
 * ('on-symmetric-delta-delta'; four legs project onto that tensor, two onto δ).
 */
export function groupFactor(theory: Theory, g: Graph): GroupFactor | null {
  if (!hasGroupFactors(theory)) return null;
  const tensors = new Set(theory.vertices.map((v) => v.tensor ?? ''));
  if (tensors.size !== 1 || !tensors.has('on-symmetric-delta-delta') || theory.fields.length !== 1 || theory.fields[0]!.antiparticle) {
    throw new TheoryError(`group factors need every vertex to carry one known tensor (${KNOWN_TENSORS.join(', ')}) over a single real field`, `theory ${theory.name}`, 'write the theory with the O(N) tensor on its quartic vertex, or without tensors');
  }
  if (g.vertices.some((v) => v.counterterm)) throw new TheoryError('group factors of graphs with counterterm vertices are not defined here', 'graph', 'pass the uncontracted graph');
  const t = onTensor(g);
  return { value: t.projection, text: formatPoly(t.projection), pairings: t.terms };
}
