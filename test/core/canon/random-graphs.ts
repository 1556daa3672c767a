/**
 * Seeded generators of random valid graphs of each built-in theory, and of the symmetric
 * families that refinement alone does not settle. Shared by the canon tests and the bench.
 */
import type { CountertermMark, Edge, Graph, Leg, Vertex } from '../../../src/core/graph/types.ts';

/** A small seeded PRNG (mulberry32, common practice), returning floats in [0, 1). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const int = (rand: () => number, n: number) => Math.floor(rand() * n);

export function shuffle<T>(rand: () => number, xs: T[]): T[] {
  for (let i = xs.length - 1; i > 0; i--) {
    const j = int(rand, i + 1);
    [xs[i], xs[j]] = [xs[j]!, xs[i]!];
  }
  return xs;
}

interface Slot {
  vertex: number;
}

/** Pairs the slots at random (configuration model): self-loops and multi-edges appear naturally. */
function pairSlots(rand: () => number, slots: Slot[], field: string | null): Edge[] {
  shuffle(rand, slots);
  const edges: Edge[] = [];
  for (let i = 0; i + 1 < slots.length; i += 2) edges.push({ a: slots[i]!.vertex, b: slots[i + 1]!.vertex, field, oriented: false });
  return edges;
}

export type TheoryName = 'phi4' | 'phi4-on' | 'phi3' | 'yukawa' | 'qed';

/**
 * A random graph of the theory with about `size` vertices: φ⁴ and φ³ graphs from the
 * configuration model (with some counterterm vertices when `counterterms`), Yukawa and QED
 * graphs with fermion lines joining an arrow-leaving slot to an arrow-entering one, so every
 * vertex is valid by construction (the tests still bind every graph to check).
 */
export function randomTheoryGraph(theory: TheoryName, rand: () => number, size: number, counterterms = true): Graph {
  const vertices: Vertex[] = [];
  const scalarSlots: Slot[] = [];
  const outs: Slot[] = []; // fermion arrow leaves the vertex here (ψ̄ half-edge)
  const ins: Slot[] = []; // fermion arrow enters here (ψ half-edge)
  const add = (mark?: CountertermMark) => {
    vertices.push(mark ? { name: `v${vertices.length}`, counterterm: mark } : { name: `v${vertices.length}` });
    return vertices.length - 1;
  };
  const boson = theory === 'qed' ? 'A' : 'phi';
  for (let i = 0; i < size; i++) {
    const r = rand();
    const ct = counterterms && r < 0.2;
    if (theory === 'phi4' || theory === 'phi4-on' || theory === 'phi3') {
      const d = theory === 'phi3' ? 3 : 4;
      const two = ct && rand() < 0.5;
      const mark: CountertermMark | undefined = !ct ? undefined : two ? { residue: ['phi', 'phi'], structure: rand() < 0.5 ? 'p2' : 'm2' } : { residue: Array(d).fill('phi'), structure: '' };
      const v = add(mark);
      for (let k = 0; k < (two ? 2 : d); k++) scalarSlots.push({ vertex: v });
    } else {
      const quartic = theory === 'yukawa' && rand() < 0.25;
      if (quartic) {
        const v = add(ct ? { residue: ['phi', 'phi', 'phi', 'phi'], structure: '' } : undefined);
        for (let k = 0; k < 4; k++) scalarSlots.push({ vertex: v });
      } else if (ct && rand() < 0.5) {
        const v = add({ residue: ['psi', 'psibar'], structure: 'pslash' });
        outs.push({ vertex: v });
        ins.push({ vertex: v });
      } else {
        const v = add(ct ? { residue: [boson, 'psi', 'psibar'].sort(), structure: '' } : undefined);
        outs.push({ vertex: v });
        ins.push({ vertex: v });
        scalarSlots.push({ vertex: v });
      }
    }
  }
  const legs: Leg[] = [];
  // Scalar legs: keep the number of remaining slots even.
  shuffle(rand, scalarSlots);
  let nl = Math.min(scalarSlots.length, int(rand, 5));
  if ((scalarSlots.length - nl) % 2) nl = nl > 0 ? nl - 1 : nl + 1;
  for (const s of scalarSlots.splice(0, nl)) legs.push({ vertex: s.vertex, field: theory === 'qed' ? 'A' : null, direction: 'none' });
  const edges = pairSlots(rand, scalarSlots, theory === 'qed' ? 'A' : null);
  // Fermion legs: as many entering as leaving, then a random bijection leaving → entering.
  shuffle(rand, outs);
  shuffle(rand, ins);
  const nf = Math.min(outs.length, int(rand, 3));
  for (const s of outs.splice(0, nf)) legs.push({ vertex: s.vertex, field: 'psi', direction: 'out' });
  for (const s of ins.splice(0, nf)) legs.push({ vertex: s.vertex, field: 'psi', direction: 'in' });
  outs.forEach((o, i) => edges.push({ a: o.vertex, b: ins[i]!.vertex, field: 'psi', oriented: true }));
  return { vertices, edges: shuffle(rand, edges), legs: shuffle(rand, legs) };
}

/** Vertices 0…n−1 named by their number. */
const named = (n: number): Vertex[] => Array.from({ length: n }, (_, i) => ({ name: String(i) }));
const line = (a: number, b: number): Edge => ({ a, b, field: null, oriented: false });

/** The circulant graph C_n(jumps): i joined to i ± s for each jump s (each pair once). */
export function circulant(n: number, jumps: readonly number[]): Graph {
  const edges: Edge[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const d = Math.min(j - i, n - (j - i));
      if (jumps.includes(d)) edges.push(line(i, j));
    }
  }
  return { vertices: named(n), edges, legs: [] };
}

/**
 * The completed zigzag graph with `loops` loops: the circulant C_{loops+2}(1, 2) (the
 * zigzag family's completions, "Quantum periods: A census of φ⁴-transcendentals",
 * arXiv:0801.2856 — from memory; K5 = C5(1,2) is the completed wheel with three spokes).
 */
export function completedZigzag(loops: number): Graph {
  return circulant(loops + 2, [1, 2]);
}

/** Removes vertex v and puts a leg on each end of its lines: the decompleted (four-point) graph. */
export function decomplete(g: Graph, v: number): Graph {
  const keep = g.vertices.map((_, i) => i).filter((i) => i !== v);
  const idx = new Map(keep.map((old, i) => [old, i]));
  const edges: Edge[] = [];
  const legs: Leg[] = [];
  for (const e of g.edges) {
    if (e.a === v && e.b === v) continue;
    if (e.a === v || e.b === v) legs.push({ vertex: idx.get(e.a === v ? e.b : e.a)!, field: e.field, direction: 'none' });
    else edges.push({ ...e, a: idx.get(e.a)!, b: idx.get(e.b)! });
  }
  return { vertices: keep.map((i) => g.vertices[i]!), edges, legs };
}

/** The complete bipartite graph K_{m,n}, each edge `times` times. */
export function completeBipartite(m: number, n: number, times = 1): Graph {
  const edges: Edge[] = [];
  for (let i = 0; i < m; i++) for (let j = 0; j < n; j++) for (let t = 0; t < times; t++) edges.push(line(i, m + j));
  return { vertices: named(m + n), edges, legs: [] };
}

/** A random 4-regular multigraph on n vertices (configuration model, loops and multi-edges allowed). */
export function random4Regular(rand: () => number, n: number): Graph {
  const slots: Slot[] = [];
  for (let v = 0; v < n; v++) for (let k = 0; k < 4; k++) slots.push({ vertex: v });
  return { vertices: named(n), edges: pairSlots(rand, slots, null), legs: [] };
}

/** The same graph with vertices renumbered by `perm` (vertex v becomes perm[v]) and edges and legs reordered. */
export function relabel(g: Graph, perm: readonly number[], rand: () => number, keepLegOrder = true): Graph {
  const vertices: Vertex[] = new Array(g.vertices.length);
  g.vertices.forEach((v, i) => (vertices[perm[i]!] = { ...v, name: `w${perm[i]}` }));
  const edges = shuffle(rand, g.edges.map((e) => {
    const a = perm[e.a]!;
    const b = perm[e.b]!;
    return !e.oriented && rand() < 0.5 ? { ...e, a: b, b: a } : { ...e, a, b };
  }));
  const legs = g.legs.map((l) => ({ ...l, vertex: perm[l.vertex]! }));
  return { vertices, edges, legs: keepLegOrder ? legs : shuffle(rand, legs) };
}

export function randomPermutation(rand: () => number, n: number): number[] {
  return shuffle(rand, Array.from({ length: n }, (_, i) => i));
}

/** A graph on Z4 × Z4 (vertex 4a + b) joining (a,b) and (c,d) when `adjacent(a, b, c, d)`. */
function onZ4Squared(adjacent: (a: number, b: number, c: number, d: number) => boolean): Graph {
  const edges: Edge[] = [];
  for (let x = 0; x < 16; x++) for (let y = x + 1; y < 16; y++) if (adjacent(x >> 2, x & 3, y >> 2, y & 3)) edges.push(line(x, y));
  return { vertices: named(16), edges, legs: [] };
}

/**
 * The Shrikhande graph and the 4 × 4 rook's graph: both strongly regular with parameters
 * (16, 6, 2, 2) and not isomorphic — a classical pair that colour refinement cannot tell apart
 * (common practice; |Aut| = 192 and 1152 = 2 · 4!², from memory, checked against nauty in the tests).
 */
export function shrikhandeGraph(): Graph {
  const m = (v: number) => ((v % 4) + 4) % 4;
  return onZ4Squared((a, b, c, d) => {
    const da = m(c - a);
    const db = m(d - b);
    return (da === 0 && db % 2 === 1) || (db === 0 && da % 2 === 1) || (da === db && da % 2 === 1);
  });
}

export function rookGraph4x4(): Graph {
  return onZ4Squared((a, b, c, d) => (a === c) !== (b === d));
}

/** The k-dimensional hypercube graph. */
export function hypercube(k: number): Graph {
  const edges: Edge[] = [];
  for (let x = 0; x < 1 << k; x++) for (let i = 0; i < k; i++) if (x < (x ^ (1 << i))) edges.push(line(x, x ^ (1 << i)));
  return { vertices: named(1 << k), edges, legs: [] };
}
