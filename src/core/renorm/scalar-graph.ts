import { canonicalNotation } from '../canon/canonical-form.ts';
import type { Graph } from '../graph/types.ts';
import { indexToken } from '../integrals/line-index.ts';
import type { PropLine } from '../integrals/prop-integral.ts';

/**
 * A massless scalar Feynman graph as the integral sees it: vertices and lines 1/(k²)^ν, no legs.
 * The general R* works on these — vacuum graphs dual to soft regions, their subgraphs and
 * cographs — where no theory's vertex rules apply any more.
 */
export interface ScalarGraph {
  readonly vertexCount: number;
  readonly lines: readonly PropLine[];
}

/** L = E − V + C over the vertices the lines touch. */
export function loopsOfLines(lines: readonly PropLine[]): number {
  const parent = new Map<number, number>();
  const find = (x: number): number => {
    let r = x;
    while (parent.has(r) && parent.get(r) !== r) r = parent.get(r)!;
    return r;
  };
  let merges = 0;
  for (const l of lines) {
    if (!parent.has(l.u)) parent.set(l.u, l.u);
    if (!parent.has(l.v)) parent.set(l.v, l.v);
    const a = find(l.u);
    const b = find(l.v);
    if (a !== b) {
      parent.set(a, b);
      merges++;
    }
  }
  return lines.length - merges;
}

/** The UV degree D0·L − 2Σν (integer parts of the indices). */
export function uvDegree(lines: readonly PropLine[], D0: number): number {
  return D0 * loopsOfLines(lines) - 2 * lines.reduce((s, l) => s + l.index.a, 0);
}

/** Whether the lines form one connected piece. */
export function linesConnected(lines: readonly PropLine[]): boolean {
  if (lines.length === 0) return true;
  return loopsOfLines(lines) === lines.length - (touchedVertices(lines).size - 1);
}

/** Whether no line is a bridge (every line lies on a cycle): one-particle irreducible. */
export function linesBridgeless(lines: readonly PropLine[]): boolean {
  const L = loopsOfLines(lines);
  return lines.every((l, k) => l.u === l.v || loopsOfLines(lines.filter((_, j) => j !== k)) === L - 1);
}

/**
 * Whether no vertex cuts the lines into two pieces (one-vertex irreducible). A single line is
 * irreducible; two self-loops at one vertex are not.
 */
export function linesVertexIrreducible(lines: readonly PropLine[]): boolean {
  if (!linesConnected(lines)) return false;
  for (const x of touchedVertices(lines)) if (isCutVertex(lines, x)) return false;
  return true;
}

/** Whether removing vertex x splits the lines into more than one piece (a self-loop at x is a piece). */
export function isCutVertex(lines: readonly PropLine[], x: number): boolean {
  return piecesAround(lines, x).length > 1;
}

/** The lines (indices) grouped into the pieces that stay connected when vertex x is removed. */
export function piecesAround(lines: readonly PropLine[], x: number): number[][] {
  // Lines joined when they share a vertex other than x.
  const parent = lines.map((_, k) => k);
  const find = (k: number): number => (parent[k] === k ? k : (parent[k] = find(parent[k]!)));
  const byVertex = new Map<number, number>();
  lines.forEach((l, k) => {
    for (const y of [l.u, l.v]) {
      if (y === x) continue;
      const o = byVertex.get(y);
      if (o === undefined) byVertex.set(y, k);
      else parent[find(k)] = find(o);
    }
  });
  const groups = new Map<number, number[]>();
  lines.forEach((_, k) => groups.set(find(k), [...(groups.get(find(k)) ?? []), k]));
  return [...groups.values()];
}

export function touchedVertices(lines: readonly PropLine[]): Set<number> {
  const s = new Set<number>();
  for (const l of lines) s.add(l.u).add(l.v);
  return s;
}

/**
 * The cograph g/S: every group of lines contracted to one vertex (its lines removed, its vertices
 * merged). `map` sends old vertices to new ones; vertices are renumbered 0..n−1.
 */
export function contractGroups(g: ScalarGraph, groups: readonly (readonly number[])[]): { graph: ScalarGraph; map: number[] } {
  const parent = Array.from({ length: g.vertexCount }, (_, i) => i);
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x]!)));
  const removed = new Set<number>();
  for (const grp of groups) for (const k of grp) {
    removed.add(k);
    parent[find(g.lines[k]!.u)] = find(g.lines[k]!.v);
  }
  const roots = [...new Set(Array.from({ length: g.vertexCount }, (_, i) => find(i)))].sort((a, b) => a - b);
  const idx = new Map(roots.map((r, i) => [r, i]));
  const map = Array.from({ length: g.vertexCount }, (_, i) => idx.get(find(i))!);
  const lines = g.lines.filter((_, k) => !removed.has(k)).map((l) => ({ u: map[l.u]!, v: map[l.v]!, index: l.index }));
  return { graph: { vertexCount: roots.length, lines }, map };
}

/** The subgraph on a set of lines, renumbered; `map` sends old vertices to new ones (−1 if untouched). */
export function subgraphOfLines(g: ScalarGraph, lineSet: readonly number[]): { graph: ScalarGraph; map: number[] } {
  const verts = [...touchedVertices(lineSet.map((k) => g.lines[k]!))].sort((a, b) => a - b);
  const map = Array.from({ length: g.vertexCount }, () => -1);
  verts.forEach((v, i) => (map[v] = i));
  return { graph: { vertexCount: verts.length, lines: lineSet.map((k) => ({ ...g.lines[k]!, u: map[g.lines[k]!.u]!, v: map[g.lines[k]!.v]! })) }, map };
}

/** A key equal for isomorphic graphs, the vertices in `marked` distinguished (as unlabelled legs). */
export function scalarGraphKey(g: ScalarGraph, marked: readonly number[]): string {
  const G: Graph = {
    vertices: Array.from({ length: g.vertexCount }, (_, i) => ({ name: `v${i}` })),
    edges: g.lines.map((l) => ({ a: l.u, b: l.v, field: indexToken(l.index), oriented: false })),
    legs: marked.map((v) => ({ vertex: v, field: 'mark', direction: 'none' as const })),
  };
  return canonicalNotation(G, { legs: 'unlabelled' });
}
