import { InputError } from '../errors.ts';
import type { Edge, Graph, Leg } from '../graph/types.ts';

/**
 * Decompletion: a completed (vacuum, 4-regular) φ⁴ graph minus one vertex is a four-point
 * graph, with a leg at the far end of every line that met the removed vertex. Its period does
 * not depend on which vertex is removed ("Quantum periods: A census of φ⁴-transcendentals",
 * Schnetz, Commun. Number Theory Phys. 4 (2010) 1, arXiv:0801.2856).
 *
 * Lines are kept in input order (minus the removed ones); vertices keep their names.
 */
export function removeVertex(g: Graph, vertex: number): Graph {
  if (!Number.isInteger(vertex) || vertex < 0 || vertex >= g.vertices.length) {
    throw new InputError(`no vertex number ${vertex} to remove`, undefined, `the graph has ${g.vertices.length} vertices`);
  }
  const name = g.vertices[vertex]!.name;
  const renumber = (v: number) => (v < vertex ? v : v - 1);
  const edges: Edge[] = [];
  const legs: Leg[] = [...g.legs.filter((l) => l.vertex !== vertex).map((l) => ({ ...l, vertex: renumber(l.vertex) }))];
  for (const e of g.edges) {
    if (e.a === vertex && e.b === vertex) {
      throw new InputError(`vertex "${name}" carries a self-loop, so removing it leaves no four-point graph`, undefined, 'remove another vertex (a graph with a self-loop is not primitive anyway)');
    }
    if (e.a === vertex || e.b === vertex) {
      const other = e.a === vertex ? e.b : e.a;
      legs.push({ vertex: renumber(other), field: e.field, direction: 'none' });
      continue;
    }
    edges.push({ ...e, a: renumber(e.a), b: renumber(e.b) });
  }
  // Legs in order of their vertex, so the notation reads naturally.
  legs.sort((x, y) => x.vertex - y.vertex);
  return { vertices: g.vertices.filter((_, i) => i !== vertex), edges, legs };
}

/** The index of the vertex called `name`, or an InputError listing the names. */
export function vertexByName(g: Graph, name: string): number {
  const i = g.vertices.findIndex((v) => v.name === name);
  if (i < 0) throw new InputError(`the graph has no vertex "${name}"`, undefined, `vertices: ${g.vertices.map((v) => v.name).join(', ')}`);
  return i;
}
