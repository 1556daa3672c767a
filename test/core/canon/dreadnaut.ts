/**
 * nauty's `dreadnaut` as an external cross-check ("Practical graph isomorphism, II",
 * J. Symbolic Comput. 60 (2014) 94; Debian package `nauty`). A multigraph with legs is
 * encoded as a vertex-coloured simple graph whose automorphisms are exactly the half-edge
 * permutations that preserve it with legs fixed (so its group order is the Feynman S):
 *
 *  - each vertex stays a vertex, coloured by its counterterm mark;
 *  - each line a–b becomes a path a – x – y – b of two new vertices (its half-edges):
 *    both coloured "line of field f" when undirected, "tail of f" and "head of f" when the
 *    line carries an arrow a → b; so a self-loop a – x – y – a can be flipped (x ↔ y) only
 *    when it has no arrow, and identical parallel lines permute;
 *  - each leg becomes a pendant vertex with a colour of its own (labelled legs), or one
 *    colour per field and direction (unlabelled legs).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import type { Graph } from '../../../src/core/graph/types.ts';

export function dreadnautAvailable(): boolean {
  const r = spawnSync('dreadnaut', [], { input: 'q\n', encoding: 'utf8' });
  return !r.error;
}

export interface NautyGraph {
  readonly n: number;
  readonly adj: number[][];
  readonly cells: number[][];
  /** The colour of each cell, in cell order. */
  readonly cellKeys: string[];
}

export function encodeForNauty(g: Graph, legs: 'labelled' | 'unlabelled' = 'labelled'): NautyGraph {
  const colour: string[] = [];
  const adj: number[][] = [];
  const vertex = (c: string) => {
    colour.push(c);
    adj.push([]);
    return colour.length - 1;
  };
  const join = (x: number, y: number) => adj[Math.min(x, y)]!.push(Math.max(x, y));
  g.vertices.forEach((v) => vertex(v.counterterm ? `V{${v.counterterm.residue.join(',')};${v.counterterm.structure}}` : 'V'));
  for (const e of g.edges) {
    const f = e.field ?? '';
    const x = vertex(e.oriented ? `T${f}` : `U${f}`);
    const y = vertex(e.oriented ? `H${f}` : `U${f}`);
    join(e.a, x);
    join(x, y);
    join(y, e.b);
  }
  g.legs.forEach((l, i) => {
    const p = vertex(legs === 'labelled' ? `L${String(i).padStart(4, '0')}` : `L${l.direction}${l.field ?? ''}`);
    join(p, l.vertex);
  });
  const byColour = new Map<string, number[]>();
  colour.forEach((c, i) => {
    if (!byColour.has(c)) byColour.set(c, []);
    byColour.get(c)!.push(i);
  });
  const cellKeys = [...byColour.keys()].sort();
  return { n: colour.length, adj, cells: cellKeys.map((k) => byColour.get(k)!), cellKeys };
}

function script(gr: NautyGraph, command: string): string {
  const lists = gr.adj.map((nb, i) => (nb.length ? `${i}:${nb.join(' ')};` : '')).join('');
  return `n=${gr.n} g ${lists}. f=[${gr.cells.map((c) => c.join(',')).join('|')}] ${command}\n`;
}

/** Group sizes, one per graph, from one run of dreadnaut: an exact bigint, or a float when nauty prints one. */
export function nautyGroupSizes(graphs: readonly NautyGraph[]): (bigint | number)[] {
  const input = '-a -m\n' + graphs.map((gr) => script(gr, 'x')).join('') + 'q\n';
  const out = execFileSync('dreadnaut', [], { input, encoding: 'utf8', maxBuffer: 1 << 26 });
  const sizes = [...out.matchAll(/grpsize=([0-9.e+]+);/g)].map((m) => (/^\d+$/.test(m[1]!) ? BigInt(m[1]!) : Number(m[1]!)));
  if (sizes.length !== graphs.length) throw new Error(`dreadnaut printed ${sizes.length} group sizes for ${graphs.length} graphs:\n${out.slice(0, 2000)}`);
  return sizes;
}

/** nauty's canonically labelled graph, as text, one per graph (equal exactly when the coloured graphs are isomorphic). */
export function nautyCanonicalGraphs(graphs: readonly NautyGraph[]): string[] {
  const input = '-a -m l=0\n' + graphs.map((gr) => script(gr, 'c x b')).join('') + 'q\n';
  const out = execFileSync('dreadnaut', [], { input, encoding: 'utf8', maxBuffer: 1 << 26 });
  // After each "grpsize" summary comes the canonical labelling, then the adjacency lines "  i : … ;".
  const blocks = out.split(/\n(?=\d+ orbits?;)/).slice(0);
  const result: string[] = [];
  for (const b of blocks) {
    if (!/grpsize=/.test(b)) continue;
    const lines = b.split('\n').filter((l) => /^\s*\d+\s*:/.test(l));
    result.push(lines.map((l) => l.trim().replace(/\s+/g, ' ')).join('\n'));
  }
  if (result.length !== graphs.length) throw new Error(`dreadnaut printed ${result.length} canonical graphs for ${graphs.length} graphs`);
  return result;
}

/** Whether a nauty group size equals ours (exactly, or to 12 digits when nauty printed a float). */
export function sameSize(nauty: bigint | number, ours: bigint): boolean {
  if (typeof nauty === 'bigint') return nauty === ours;
  return Math.abs(Number(ours) / nauty - 1) < 1e-10;
}
