import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { canonicalForm, canonicalNotation, findIsomorphism, symmetryFactor } from '../../../src/core/canon/index.ts';
import { InputError } from '../../../src/core/errors.ts';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import type { Edge, Graph, Leg } from '../../../src/core/graph/types.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import {
  circulant,
  completeBipartite,
  random4Regular,
  randomPermutation,
  randomTheoryGraph,
  relabel,
  rng,
  rookGraph4x4,
  shrikhandeGraph,
  type TheoryName,
} from './random-graphs.ts';

const theories: TheoryName[] = ['phi4', 'phi4-on', 'phi3', 'yukawa', 'qed'];
const bound = (t: TheoryName, g: Graph) => bindGraph(g, builtinTheory(t)).graph;

describe('canonical notation', () => {
  it('is parseable and a fixed point: canonical(parse(canonical(g))) = canonical(g)', () => {
    for (const s of ['2-1 1-2 / 2 2 1 1', '1-2 1-2 2-3 2-3 / 1 1 3 3', 'x>y:psi y>x:psi x-y:A /', '1-c{phi,phi;p2} c-2 1-2 / 1 1 2 2', '1>1:psi / 1']) {
      const c = canonicalNotation(parseNotation(s));
      expect(canonicalNotation(parseNotation(c))).toBe(c);
    }
  });
  it('writes the bubble as 1-2 1-2 / 1 1 2 2 however it was entered', () => {
    expect(canonicalNotation(parseNotation('b-a a-b / b b a a'))).toBe('1-2 1-2 / 1 1 2 2');
  });
  it('with a theory: default fields left out, antiparticle-named lines the same as reversed ones', () => {
    const qed = builtinTheory('qed');
    const a = bindGraph(parseNotation('1>2:psi 2>1:psi 1-2 /'), qed).graph;
    const b = bindGraph(parseNotation('2<1:psi 1>2:psibar 1-2:A /'), qed).graph;
    expect(canonicalNotation(a, { defaultField: 'A' })).toBe(canonicalNotation(b, { defaultField: 'A' }));
    expect(canonicalNotation(a, { defaultField: 'A' })).not.toMatch(/:A/);
  });
  it('labelled legs tell apart graphs that unlabelled legs identify (s- and t-channel bubbles)', () => {
    const s = parseNotation('1-2 1-2 / 1 1 2 2');
    const t = parseNotation('1-2 1-2 / 1 2 1 2');
    expect(canonicalNotation(s)).not.toBe(canonicalNotation(t));
    expect(canonicalNotation(s, { legs: 'unlabelled' })).toBe(canonicalNotation(t, { legs: 'unlabelled' }));
  });
  it('counterterm residue and structure distinguish vertices', () => {
    const a = parseNotation('1-c{phi,phi;p2} c-2 1-2 / 1 1 2 2');
    const b = parseNotation('1-c{phi,phi;m2} c-2 1-2 / 1 1 2 2');
    expect(canonicalNotation(a)).not.toBe(canonicalNotation(b));
  });
  it('an isolated vertex (no lines, no legs) cannot be written: InputError', () => {
    const g: Graph = { vertices: [{ name: 'a' }, { name: 'b' }], edges: [{ a: 0, b: 0, field: null, oriented: false }], legs: [] };
    expect(() => canonicalForm(g)).toThrow(InputError);
  });
  it('symmetric look-alikes: C8(1,3) is K_{4,4} and not C8(1,2); K_{3,3} is not the prism (both 3-regular on 6 vertices)', () => {
    expect(canonicalNotation(circulant(8, [1, 3]))).toBe(canonicalNotation(completeBipartite(4, 4)));
    expect(canonicalNotation(circulant(8, [1, 2]))).not.toBe(canonicalNotation(completeBipartite(4, 4)));
    const prism = parseNotation('1-2 2-3 3-1 4-5 5-6 6-4 1-4 2-5 3-6 /');
    expect(canonicalNotation(prism)).not.toBe(canonicalNotation(completeBipartite(3, 3)));
  });
  it('the Shrikhande graph and the 4×4 rook graph (both srg(16,6,2,2), equal under colour refinement) differ; each is invariant', () => {
    const rand = rng(12);
    const s = shrikhandeGraph();
    const r = rookGraph4x4();
    expect(canonicalNotation(s)).not.toBe(canonicalNotation(r));
    for (const g of [s, r]) expect(canonicalNotation(relabel(g, Array.from({ length: 16 }, (_, i) => (i * 5 + 3) % 16), rand))).toBe(canonicalNotation(g));
    expect(canonicalForm(s).automorphismGroupOrder).toBe(192n);
    expect(canonicalForm(r).automorphismGroupOrder).toBe(1152n);
  });
});

// Property tests (fast-check, fixed seeds): invariance under relabelling, and a brute-force
// isomorphism test over all vertex permutations, written plainly here.
describe('canonical form: properties', () => {
  it('is invariant under random vertex relabelling and edge reordering (all theories; labelled and unlabelled legs)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 31 - 1 }), fc.constantFrom(...theories), fc.integer({ min: 1, max: 14 }), (seed, t, size) => {
        const rand = rng(seed);
        const g = bound(t, randomTheoryGraph(t, rand, size));
        const h = relabel(g, randomPermutation(rand, g.vertices.length), rand);
        expect(canonicalNotation(h)).toBe(canonicalNotation(g));
        const hu = relabel(g, randomPermutation(rand, g.vertices.length), rand, false);
        expect(canonicalNotation(hu, { legs: 'unlabelled' })).toBe(canonicalNotation(g, { legs: 'unlabelled' }));
        const map = findIsomorphism(g, h)!;
        expect(map).not.toBeNull();
        expectMapping(g, h, map.vertices, map.edges);
      }),
      { seed: 4242, numRuns: 300 },
    );
  });

  it('agrees with brute-force isomorphism on small graphs, including pairs with equal degree sequences', () => {
    const rand = rng(99);
    let iso = 0;
    let non = 0;
    const pairs: [Graph, Graph][] = [];
    for (let i = 0; i < 150; i++) {
      // 4-regular multigraphs on 4–6 vertices: every pair has the same degree sequence.
      const a = random4Regular(rand, 4 + (i % 3));
      const b = rand() < 0.3 ? relabel(a, randomPermutation(rand, a.vertices.length), rand) : random4Regular(rand, a.vertices.length);
      pairs.push([a, b]);
    }
    for (let i = 0; i < 100; i++) {
      const t = theories[i % theories.length]!;
      const a = bound(t, randomTheoryGraph(t, rand, 2 + (i % 4)));
      const b = rand() < 0.3 ? relabel(a, randomPermutation(rand, a.vertices.length), rand) : bound(t, randomTheoryGraph(t, rand, a.vertices.length));
      pairs.push([a, b]);
    }
    for (const [a, b] of pairs) {
      for (const legs of ['labelled', 'unlabelled'] as const) {
        const brute = bruteIsomorphic(a, b, legs);
        expect(canonicalNotation(a, { legs }) === canonicalNotation(b, { legs })).toBe(brute);
        if (brute) iso++;
        else non++;
      }
    }
    expect(iso).toBeGreaterThan(60);
    expect(non).toBeGreaterThan(60);
  });

  it('symmetry factor equals the brute-force count of half-edge permutations fixing the legs (tiny graphs)', () => {
    const edgeArb = fc.record({ a: fc.nat(2), b: fc.nat(2), field: fc.constantFrom(null, 'x'), oriented: fc.boolean() });
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 3 }), fc.array(edgeArb, { maxLength: 4 }), fc.array(fc.nat(2), { maxLength: 3 }), fc.nat(3), (n, es, legAt, ct) => {
        const edges: Edge[] = es.map((e) => ({ a: e.a % n, b: e.b % n, field: e.field, oriented: e.oriented }));
        const legs: Leg[] = legAt.map((v) => ({ vertex: v % n, field: null, direction: 'none' }));
        const vertices = Array.from({ length: n }, (_, i) => (i < ct - 1 ? { name: `v${i}`, counterterm: { residue: ['x'], structure: '' } } : { name: `v${i}` }));
        const g: Graph = { vertices, edges, legs };
        expect(symmetryFactor(g)).toBe(bruteSymmetryFactor(g));
      }),
      { seed: 7, numRuns: 400 },
    );
  });
});

function expectMapping(a: Graph, b: Graph, vmap: readonly number[], emap: readonly number[]): void {
  expect(new Set(vmap).size).toBe(a.vertices.length);
  expect(new Set(emap).size).toBe(a.edges.length);
  a.edges.forEach((e, i) => {
    const f = b.edges[emap[i]!]!;
    expect(f.field).toBe(e.field);
    expect(f.oriented).toBe(e.oriented);
    const ends = [vmap[e.a]!, vmap[e.b]!];
    if (e.oriented) expect([f.a, f.b]).toEqual(ends);
    else expect([f.a, f.b].sort()).toEqual(ends.sort());
  });
  a.legs.forEach((l, i) => expect(b.legs[i]!.vertex).toBe(vmap[l.vertex]));
}

const markKey = (g: Graph, v: number) => {
  const c = g.vertices[v]!.counterterm;
  return c ? `${c.residue.join(',')};${c.structure}` : '';
};

/** Isomorphism by trying every vertex permutation. */
function bruteIsomorphic(a: Graph, b: Graph, legs: 'labelled' | 'unlabelled'): boolean {
  const n = a.vertices.length;
  if (n !== b.vertices.length || a.edges.length !== b.edges.length || a.legs.length !== b.legs.length) return false;
  const edgeKeys = (g: Graph, p: readonly number[]) =>
    g.edges
      .map((e) => {
        const x = p[e.a]!;
        const y = p[e.b]!;
        return e.oriented ? `${x}>${y}:${e.field}` : `${Math.min(x, y)}-${Math.max(x, y)}:${e.field}`;
      })
      .sort()
      .join(' ');
  const legKeys = (g: Graph, p: readonly number[]) => {
    const k = g.legs.map((l) => `${p[l.vertex]}${l.direction}${l.field}`);
    return (legs === 'labelled' ? k : k.sort()).join(' ');
  };
  const id = Array.from({ length: n }, (_, i) => i);
  const target = edgeKeys(b, id) + '/' + legKeys(b, id);
  const perm: number[] = [];
  const used: boolean[] = [];
  const go = (v: number): boolean => {
    if (v === n) return edgeKeys(a, perm) + '/' + legKeys(a, perm) === target;
    for (let w = 0; w < n; w++) {
      if (used[w] || markKey(a, v) !== markKey(b, w)) continue;
      used[w] = true;
      perm[v] = w;
      if (go(v + 1)) return true;
      used[w] = false;
    }
    return false;
  };
  return go(0);
}

/** Permutations σ of the half-edges (2i: end a of edge i, 2i+1: end b) preserving the graph with legs fixed. */
function bruteSymmetryFactor(g: Graph): bigint {
  const h = g.edges.length * 2;
  const vertexOf = (x: number) => (x % 2 === 0 ? g.edges[x >> 1]!.a : g.edges[x >> 1]!.b);
  const typeOf = (x: number) => {
    const e = g.edges[x >> 1]!;
    return `${e.field}${e.oriented ? (x % 2 === 0 ? 'tail' : 'head') : 'line'}`;
  };
  const pinned = new Set(g.legs.map((l) => l.vertex));
  let count = 0n;
  const sigma: number[] = [];
  const used: boolean[] = [];
  const go = (x: number) => {
    if (x === h) {
      const f = new Map<number, number>();
      for (let y = 0; y < h; y++) {
        const from = vertexOf(y);
        const to = vertexOf(sigma[y]!);
        if (f.has(from) && f.get(from) !== to) return;
        f.set(from, to);
        if (sigma[y ^ 1] !== (sigma[y]! ^ 1)) return; // the two ends of a line go to the two ends of a line
      }
      if (new Set(f.values()).size !== f.size) return;
      for (const [v, w] of f) if ((pinned.has(v) && v !== w) || markKey(g, v) !== markKey(g, w)) return;
      count++;
      return;
    }
    for (let y = 0; y < h; y++) {
      if (used[y] || typeOf(y) !== typeOf(x)) continue;
      used[y] = true;
      sigma[x] = y;
      go(x + 1);
      used[y] = false;
    }
  };
  go(0);
  return count;
}
