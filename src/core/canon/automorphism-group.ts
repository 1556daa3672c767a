import type { Graph } from '../graph/types.ts';
import { colouredStructure, type LegMode } from './coloured-structure.ts';
import { searchCanonical, type SearchOptions } from './search-tree.ts';

export interface AutomorphismOptions extends SearchOptions {
  /** `labelled` (default) fixes every leg; `unlabelled` lets legs of one field and direction move. */
  readonly legs?: LegMode;
}

/** The group of vertex permutations that preserve a graph. */
export interface AutomorphismGroup {
  /** Its order. */
  readonly order: bigint;
  /** Generators, each as the images of vertices 0…n−1. */
  readonly generators: readonly (readonly number[])[];
  /** For each vertex, the smallest vertex of its orbit. */
  readonly orbits: readonly number[];
}

/**
 * Vertex automorphisms of a multigraph: permutations of the vertices that keep every
 * vertex's colour (counterterm mark, legs, self-loops) and the multiset of typed, oriented
 * edges between every pair. Parallel edges and self-loop flips are not counted here; see
 * `symmetryFactor`.
 *
 *     automorphismGroup(parseNotation('1-2 1-2 1-2 1-2 /')).order   // 2n
 */
export function automorphismGroup(g: Graph, opts: AutomorphismOptions = {}): AutomorphismGroup {
  const r = searchCanonical(colouredStructure(g, opts.legs ?? 'labelled'), opts);
  return { order: r.groupOrder, generators: r.generators.map((x) => Array.from(x)), orbits: Array.from(r.orbits) };
}
