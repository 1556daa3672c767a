/**
 * Pure edits of a document graph. Each returns a new graph (structural sharing), so the
 * editor's undo history is a list of snapshots.
 */
import type { LegDirection } from '../graph/types.ts';
import type { DocEdge, DocGraph, DocLeg, DocVertex, IdSource, Point } from './doc-graph.ts';

/** The lowest positive integer not yet used as a vertex name. */
export function nextVertexName(g: DocGraph): string {
  const used = new Set(g.vertices.map((v) => v.name));
  let n = 1;
  while (used.has(String(n))) n++;
  return String(n);
}

export function addVertex(g: DocGraph, ids: IdSource, position: Point, name = nextVertexName(g)): { graph: DocGraph; id: string } {
  const v: DocVertex = { id: ids.next('v'), name, position };
  return { graph: { ...g, vertices: [...g.vertices, v] }, id: v.id };
}

/** How a line or leg of `field` is drawn by default: oriented when the field has an antiparticle. */
export interface FieldChoice {
  readonly field: string | null;
  readonly oriented: boolean;
}

export function addEdge(g: DocGraph, ids: IdSource, source: string, target: string, choice: FieldChoice): { graph: DocGraph; id: string } {
  requireVertex(g, source);
  requireVertex(g, target);
  const e: DocEdge = { id: ids.next('e'), source, target, field: choice.field, oriented: choice.oriented };
  return { graph: { ...g, edges: [...g.edges, e] }, id: e.id };
}

export function addLeg(g: DocGraph, ids: IdSource, vertex: string, choice: FieldChoice, direction: LegDirection = 'in'): { graph: DocGraph; id: string } {
  requireVertex(g, vertex);
  const l: DocLeg = { id: ids.next('l'), vertex, field: choice.field, direction: choice.oriented ? direction : 'none' };
  return { graph: { ...g, legs: [...g.legs, l] }, id: l.id };
}

/** Removes the given vertices, lines and legs; lines and legs at a removed vertex go too. */
export function deleteElements(g: DocGraph, ids: Iterable<string>): DocGraph {
  const gone = new Set(ids);
  const vertices = g.vertices.filter((v) => !gone.has(v.id));
  const alive = new Set(vertices.map((v) => v.id));
  const edges = g.edges.filter((e) => !gone.has(e.id) && alive.has(e.source) && alive.has(e.target));
  const legs = g.legs.filter((l) => !gone.has(l.id) && alive.has(l.vertex));
  const keep = <T>(before: readonly T[], after: readonly T[]) => (after.length === before.length ? before : after);
  if (vertices.length === g.vertices.length && edges.length === g.edges.length && legs.length === g.legs.length) return g;
  return { ...g, vertices: keep(g.vertices, vertices), edges: keep(g.edges, edges), legs: keep(g.legs, legs) };
}

export function moveVertices(g: DocGraph, moves: ReadonlyMap<string, Point>): DocGraph {
  let changed = false;
  const vertices = g.vertices.map((v) => {
    const p = moves.get(v.id);
    if (!p || (p.x === v.position.x && p.y === v.position.y)) return v;
    changed = true;
    return { ...v, position: { x: p.x, y: p.y } };
  });
  return changed ? { ...g, vertices } : g;
}

/** Sets the field of the given lines and legs (orientation follows the field). */
export function setField(g: DocGraph, ids: ReadonlySet<string>, choice: FieldChoice): DocGraph {
  const edges = g.edges.map((e) => (ids.has(e.id) ? { ...e, field: choice.field, oriented: choice.oriented } : e));
  const legs = g.legs.map((l) =>
    ids.has(l.id) ? { ...l, field: choice.field, direction: choice.oriented ? (l.direction === 'none' ? 'in' : l.direction) : ('none' as const) } : l,
  );
  return { ...g, edges, legs };
}

/** Reverses the arrow of oriented lines and legs among `ids`; unoriented ones are left alone. */
export function reverseArrows(g: DocGraph, ids: ReadonlySet<string>): DocGraph {
  const edges = g.edges.map((e) => (ids.has(e.id) && e.oriented ? { ...e, source: e.target, target: e.source } : e));
  const legs = g.legs.map((l) => (ids.has(l.id) && l.direction !== 'none' ? { ...l, direction: l.direction === 'in' ? ('out' as const) : ('in' as const) } : l));
  return { ...g, edges, legs };
}

export function renameGraph(g: DocGraph, name: string): DocGraph {
  return name === g.name ? g : { ...g, name };
}

/**
 * Replaces the structure of `g` by `next` (e.g. parsed from the notation box), keeping the
 * ids and positions of vertices whose names survive, and the ids of lines and legs in the
 * same place with the same ends.
 */
export function replaceStructure(g: DocGraph, next: DocGraph): DocGraph {
  const byName = new Map(g.vertices.map((v) => [v.name, v]));
  const idMap = new Map<string, string>();
  const vertices = next.vertices.map((v) => {
    const old = byName.get(v.name);
    if (!old) return v;
    idMap.set(v.id, old.id);
    return { ...v, id: old.id, position: old.position };
  });
  const vid = (id: string) => idMap.get(id) ?? id;
  const edges = next.edges.map((e, i) => {
    const src = vid(e.source);
    const tgt = vid(e.target);
    const old = g.edges[i];
    const same = old && ((old.source === src && old.target === tgt) || (old.source === tgt && old.target === src));
    return { ...e, id: same ? old.id : e.id, source: src, target: tgt };
  });
  const legs = next.legs.map((l, i) => {
    const v = vid(l.vertex);
    const old = g.legs[i];
    return { ...l, id: old && old.vertex === v ? old.id : l.id, vertex: v };
  });
  return { ...g, vertices, edges, legs };
}

function requireVertex(g: DocGraph, id: string): void {
  if (!g.vertices.some((v) => v.id === id)) throw new Error(`graph ${g.name} has no vertex ${id}`);
}
