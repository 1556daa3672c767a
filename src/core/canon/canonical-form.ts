import { InputError } from '../errors.ts';
import { printNotation } from '../graph/notation-print.ts';
import type { Graph, Leg, Vertex } from '../graph/types.ts';
import { colouredStructure, legCode, type LegMode } from './coloured-structure.ts';
import { searchCanonical, type SearchOptions } from './search-tree.ts';
import { compareEdges, placeEdge } from './edge-order.ts';

export interface CanonOptions extends SearchOptions {
  /** `labelled` (default): leg i must go to leg i. `unlabelled`: legs of one field and direction are interchangeable. */
  readonly legs?: LegMode;
  /** A field name left out of the notation (pass the theory's default field, as `printNotation` does). */
  readonly defaultField?: string;
}

/** A graph's canonical form: the same for two graphs exactly when they are isomorphic. */
export interface CanonicalForm {
  /** The canonical graph in compact notation (DESIGN §10); `parseNotation` reads it back. */
  readonly notation: string;
  /** The canonical graph: vertices named 1…n in canonical order, edges and legs sorted. */
  readonly graph: Graph;
  /** `vertexPosition[v]`: the canonical index of input vertex v. */
  readonly vertexPosition: readonly number[];
  /** `edgeOrigin[k]`: the input index of the canonical graph's edge k. */
  readonly edgeOrigin: readonly number[];
  /** `legOrigin[k]`: the input index of the canonical graph's leg k (the identity for labelled legs). */
  readonly legOrigin: readonly number[];
  /** Order of the group of vertex permutations preserving the graph (legs as chosen by `legs`). */
  readonly automorphismGroupOrder: bigint;
  /** Generators of that group, as images of the input vertices. */
  readonly generators: readonly (readonly number[])[];
}


/**
 * The canonical form of a multigraph with typed and oriented edges, self-loops, external
 * legs and counterterm vertices (whose residue and structure are part of the vertex).
 * Fields are compared as written: bind the graph to its theory first so that `1-2` and
 * `1-2:phi` (or an edge written with the antiparticle's name) mean the same.
 *
 *     canonicalForm(parseNotation('2-1 1-2 / 2 1 2 1')).notation   // '1-2 1-2 / 1 1 2 2'
 *
 * A vertex with neither lines nor legs cannot be written in the notation: InputError.
 */
export function canonicalForm(g: Graph, opts: CanonOptions = {}): CanonicalForm {
  const legMode = opts.legs ?? 'labelled';
  const n = g.vertices.length;
  const touched = new Uint8Array(n);
  for (const e of g.edges) touched[e.a] = touched[e.b] = 1;
  for (const l of g.legs) touched[l.vertex] = 1;
  const lonely = touched.indexOf(0);
  if (lonely >= 0) {
    throw new InputError(`vertex "${g.vertices[lonely]!.name}" has no lines and no legs, so the compact notation cannot write it`, undefined, 'remove isolated vertices before asking for a canonical form');
  }
  const search = searchCanonical(colouredStructure(g, legMode), opts);
  const pos = new Array<number>(n);
  search.lab.forEach((v, i) => (pos[v] = i));

  const vertices: Vertex[] = Array.from(search.lab, (v, i) => {
    const ct = g.vertices[v]!.counterterm;
    return ct ? { name: String(i + 1), counterterm: ct } : { name: String(i + 1) };
  });
  const placed = g.edges.map((e, i) => ({ e: placeEdge(e, pos), i }));
  placed.sort((x, y) => compareEdges(x.e, y.e) || x.i - y.i);
  const placedLegs = g.legs.map((l, i) => ({ l: { ...l, vertex: pos[l.vertex]! } as Leg, i }));
  if (legMode === 'unlabelled') {
    placedLegs.sort((x, y) => {
      if (x.l.vertex !== y.l.vertex) return x.l.vertex - y.l.vertex;
      const cx = legCode(x.l);
      const cy = legCode(y.l);
      return cx < cy ? -1 : cx > cy ? 1 : x.i - y.i;
    });
  }
  const graph: Graph = { vertices, edges: placed.map((p) => p.e), legs: placedLegs.map((p) => p.l) };
  return {
    notation: printNotation(graph, opts.defaultField === undefined ? {} : { defaultField: opts.defaultField }),
    graph,
    vertexPosition: pos,
    edgeOrigin: placed.map((p) => p.i),
    legOrigin: placedLegs.map((p) => p.i),
    automorphismGroupOrder: search.groupOrder,
    generators: search.generators.map((gen) => Array.from(gen)),
  };
}

/** Shorthand for `canonicalForm(g, opts).notation`. */
export function canonicalNotation(g: Graph, opts: CanonOptions = {}): string {
  return canonicalForm(g, opts).notation;
}
