import type { Edge, Graph, Leg } from '../graph/types.ts';

/**
 * How external legs take part in isomorphism: `labelled` (default) keeps every leg number
 * distinct, so an isomorphism must send leg i to leg i; `unlabelled` lets legs of the same
 * field and direction be exchanged.
 */
export type LegMode = 'labelled' | 'unlabelled';

/**
 * A graph seen as a vertex-coloured complete directed "bundle" structure: the initial colour
 * of each vertex (counterterm mark, legs, self-loops) and, for each ordered pair u ≠ v, the
 * bundle id of the multiset of edges between them as seen from u (0 when there is none).
 * Every id is assigned by sorting the keys that occur, so the structure of two isomorphic
 * graphs uses the same ids: the search over it is invariant.
 *
 * @internal
 */
export interface ColouredStructure {
  readonly n: number;
  /** Initial colour of each vertex: 0, 1, … in the order of the sorted colour keys. */
  readonly colour: Int32Array;
  /** Bundle id from u to v at `u * n + v` (0 = no edge). */
  readonly bundle: Int32Array;
  /**
   * Adjacency in CSR form: for vertex u, entries adjStart[u] … adjStart[u+1]−1 give each
   * v ≠ u joined to u (`adjVertex`) with a 32-bit hash of the bundle from v to u (`adjHash`).
   */
  readonly adjStart: Int32Array;
  readonly adjVertex: Int32Array;
  readonly adjHash: Int32Array;
}

/** The code of one edge's end at a vertex: undirected `-f`, tail of an arrow `>f`, head `<f`. */
export function edgeCode(e: Edge, fromA: boolean): string {
  const f = e.field ?? '';
  if (!e.oriented) return `-${f}`;
  return fromA ? `>${f}` : `<${f}`;
}

/** The code of a self-loop (its orientation does not distinguish its two ends). */
export function loopCode(e: Edge): string {
  return `${e.oriented ? '>' : '-'}${e.field ?? ''}`;
}

/** The type of a leg, without its number: direction and field. */
export function legCode(l: Leg): string {
  return `${l.direction === 'in' ? '>' : l.direction === 'out' ? '<' : '-'}${l.field ?? ''}`;
}

/** Deterministic 32-bit hash of a small integer (the same for every graph). */
export function hashId(id: number): number {
  let h = Math.imul(id + 0x9e3779b9, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h | 1;
}

function vertexKey(g: Graph, v: number, legsAt: readonly number[][], loopsAt: readonly string[][], legMode: LegMode): string {
  const legs = legsAt[v]!;
  const legPart = legMode === 'labelled'
    ? legs.map((i) => `${String(i).padStart(7, '0')}${legCode(g.legs[i]!)}`).join(' ')
    : legs.map((i) => legCode(g.legs[i]!)).sort().join(' ');
  const ct = g.vertices[v]!.counterterm;
  const ctPart = ct ? `{${ct.residue.join(',')};${ct.structure}}` : '';
  // Vertices with legs first (by their first leg), then the rest.
  return `${legs.length ? '0' : '1'}[${legPart}]${ctPart}[${[...loopsAt[v]!].sort().join(' ')}]`;
}

/** Builds the coloured structure of a graph (fields compared as written; bind the graph first to resolve them). */
export function colouredStructure(g: Graph, legMode: LegMode = 'labelled'): ColouredStructure {
  const n = g.vertices.length;
  const legsAt: number[][] = g.vertices.map(() => []);
  g.legs.forEach((l, i) => legsAt[l.vertex]!.push(i));
  const loopsAt: string[][] = g.vertices.map(() => []);
  const codes = new Map<number, string[]>(); // u*n+v → codes seen from u
  for (const e of g.edges) {
    if (e.a === e.b) {
      loopsAt[e.a]!.push(loopCode(e));
      continue;
    }
    const k1 = e.a * n + e.b;
    const k2 = e.b * n + e.a;
    if (!codes.has(k1)) codes.set(k1, []);
    if (!codes.has(k2)) codes.set(k2, []);
    codes.get(k1)!.push(edgeCode(e, true));
    codes.get(k2)!.push(edgeCode(e, false));
  }

  const keys = g.vertices.map((_, v) => vertexKey(g, v, legsAt, loopsAt, legMode));
  const sortedKeys = [...new Set(keys)].sort();
  const colourOf = new Map(sortedKeys.map((k, i) => [k, i]));
  const colour = Int32Array.from(keys, (k) => colourOf.get(k)!);

  const bundleKeyOf = new Map<number, string>();
  for (const [k, list] of codes) bundleKeyOf.set(k, list.sort().join(' '));
  const bundleKeys = [...new Set(bundleKeyOf.values())].sort();
  const bundleId = new Map(bundleKeys.map((k, i) => [k, i + 1]));
  const bundle = new Int32Array(n * n);
  for (const [k, key] of bundleKeyOf) bundle[k] = bundleId.get(key)!;

  // CSR adjacency: for u, every v with a bundle, and the hash of bundle(v → u).
  const adjStart = new Int32Array(n + 1);
  for (const k of codes.keys()) adjStart[Math.floor(k / n) + 1]!++;
  for (let u = 0; u < n; u++) adjStart[u + 1]! += adjStart[u]!;
  const fill = adjStart.slice(0, n);
  const adjVertex = new Int32Array(adjStart[n]!);
  const adjHash = new Int32Array(adjStart[n]!);
  const sortedPairs = [...codes.keys()].sort((x, y) => x - y);
  for (const k of sortedPairs) {
    const u = Math.floor(k / n);
    const v = k % n;
    const at = fill[u]!++;
    adjVertex[at] = v;
    adjHash[at] = hashId(bundle[v * n + u]!);
  }
  return { n, colour, bundle, adjStart, adjVertex, adjHash };
}
