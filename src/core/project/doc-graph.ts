/**
 * The editor's graph document: every vertex, line and leg has a stable id that survives
 * edits (deleting a line renumbers nothing the user sees). Engine indices are produced at
 * the boundary by `toEngineGraph`, together with the maps back to ids.
 */
import type { CountertermMark, Edge, Graph, Leg, LegDirection } from '../graph/types.ts';

export interface Point {
  readonly x: number;
  readonly y: number;
}

export interface DocVertex {
  readonly id: string;
  /** The name written in the notation (letters, digits, `_`). */
  readonly name: string;
  readonly position: Point;
  readonly counterterm?: CountertermMark;
}

/** A line between two vertices; when `oriented`, the particle flows from `source` to `target`. */
export interface DocEdge {
  readonly id: string;
  readonly source: string;
  readonly target: string;
  /** Field name, or null for the theory's default field. */
  readonly field: string | null;
  readonly oriented: boolean;
}

/** An external leg; legs are labelled 1..n in list order. */
export interface DocLeg {
  readonly id: string;
  readonly vertex: string;
  readonly field: string | null;
  readonly direction: LegDirection;
}

export interface DocGraph {
  readonly id: string;
  readonly name: string;
  readonly vertices: readonly DocVertex[];
  readonly edges: readonly DocEdge[];
  readonly legs: readonly DocLeg[];
}

/** An engine graph plus the index → id maps of its vertices, edges and legs. */
export interface EngineView {
  readonly graph: Graph;
  readonly vertexIds: readonly string[];
  readonly edgeIds: readonly string[];
  readonly legIds: readonly string[];
}

export function toEngineGraph(d: DocGraph): EngineView {
  const index = new Map(d.vertices.map((v, i) => [v.id, i]));
  const at = (id: string) => {
    const i = index.get(id);
    if (i === undefined) throw new Error(`graph ${d.name}: line or leg refers to missing vertex ${id}`);
    return i;
  };
  const edges: Edge[] = d.edges.map((e) => ({ a: at(e.source), b: at(e.target), field: e.field, oriented: e.oriented }));
  const legs: Leg[] = d.legs.map((l) => ({ vertex: at(l.vertex), field: l.field, direction: l.direction }));
  return {
    graph: {
      vertices: d.vertices.map((v) => (v.counterterm ? { name: v.name, counterterm: v.counterterm } : { name: v.name })),
      edges,
      legs,
    },
    vertexIds: d.vertices.map((v) => v.id),
    edgeIds: d.edges.map((e) => e.id),
    legIds: d.legs.map((l) => l.id),
  };
}

/** Source of fresh ids: a prefix and a counter, so documents stay reproducible in tests. */
export interface IdSource {
  next(prefix: 'v' | 'e' | 'l' | 'g'): string;
}

/** An id source that never repeats an id already present in `taken`. */
export function idSource(taken: Iterable<string> = []): IdSource {
  const used = new Set(taken);
  let n = 0;
  return {
    next(prefix) {
      let id: string;
      do id = `${prefix}${++n}`;
      while (used.has(id));
      used.add(id);
      return id;
    },
  };
}

/** Every id used in a set of graphs (for seeding an IdSource). */
export function idsOf(graphs: readonly DocGraph[]): string[] {
  return graphs.flatMap((g) => [g.id, ...g.vertices.map((v) => v.id), ...g.edges.map((e) => e.id), ...g.legs.map((l) => l.id)]);
}

/**
 * A document graph from an engine graph; positions come from `positions` by vertex name when
 * given, otherwise from `layoutCircle`.
 */
export function fromEngineGraph(g: Graph, name: string, ids: IdSource, positions?: ReadonlyMap<string, Point>): DocGraph {
  const fallback = layoutCircle(g.vertices.length);
  const vertices: DocVertex[] = g.vertices.map((v, i) => {
    const p = positions?.get(v.name) ?? fallback[i]!;
    return v.counterterm ? { id: ids.next('v'), name: v.name, position: p, counterterm: v.counterterm } : { id: ids.next('v'), name: v.name, position: p };
  });
  return {
    id: ids.next('g'),
    name,
    vertices,
    edges: g.edges.map((e) => ({ id: ids.next('e'), source: vertices[e.a]!.id, target: vertices[e.b]!.id, field: e.field, oriented: e.oriented })),
    legs: g.legs.map((l) => ({ id: ids.next('l'), vertex: vertices[l.vertex]!.id, field: l.field, direction: l.direction })),
  };
}

/** n points on a circle of radius growing with n (one vertex at the origin, two side by side). */
export function layoutCircle(n: number, spacing = 120): Point[] {
  if (n === 1) return [{ x: 0, y: 0 }];
  const r = n === 2 ? spacing / 2 : spacing / (2 * Math.sin(Math.PI / n));
  return Array.from({ length: n }, (_, i) => {
    const t = Math.PI + (2 * Math.PI * i) / n;
    return { x: Math.round(r * Math.cos(t)), y: Math.round(r * Math.sin(t)) };
  });
}
