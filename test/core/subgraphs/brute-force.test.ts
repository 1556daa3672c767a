import { describe, expect, it } from 'vitest';
import type { Graph } from '../../../src/core/graph/types.ts';
import { bindGraph, type BoundGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { divergentSubgraphs } from '../../../src/core/subgraphs/divergent-subgraphs.ts';
import { countForests, countMaximalForests } from '../../../src/core/subgraphs/count-forests.ts';
import { listForests } from '../../../src/core/subgraphs/list-forests.ts';
import { randomTheoryGraph, rng } from '../../helpers/random-graphs.ts';

/*
 * A reference written plainly: every non-empty edge subset (graphs of at most 14 edges),
 * connectivity by search, 1PI by deleting each edge in turn, ω from its definition
 * (D0·L − Σ weights + Σ derivatives). It shares no code with the engine's enumeration.
 */
interface PlainSub {
  edges: number[];
  vertices: Set<number>;
}

function plainConnected(g: Graph, edges: number[]): boolean {
  if (edges.length === 0) return false;
  const verts = new Set<number>();
  for (const i of edges) {
    verts.add(g.edges[i]!.a);
    verts.add(g.edges[i]!.b);
  }
  const start = g.edges[edges[0]!]!.a;
  const seen = new Set([start]);
  let grew = true;
  while (grew) {
    grew = false;
    for (const i of edges) {
      const { a, b } = g.edges[i]!;
      if (seen.has(a) !== seen.has(b)) {
        seen.add(a);
        seen.add(b);
        grew = true;
      }
    }
  }
  return seen.size === verts.size;
}

function plainDivergent(bg: BoundGraph): PlainSub[] {
  const g = bg.graph;
  const E = g.edges.length;
  const out: PlainSub[] = [];
  for (let mask = 1; mask < 1 << E; mask++) {
    const edges: number[] = [];
    for (let i = 0; i < E; i++) if (mask & (1 << i)) edges.push(i);
    if (!plainConnected(g, edges)) continue;
    const verts = new Set<number>();
    for (const i of edges) {
      verts.add(g.edges[i]!.a);
      verts.add(g.edges[i]!.b);
    }
    // 1PI: removing any single edge keeps the same vertex set connected.
    let onePI = true;
    for (const i of edges) {
      const rest = edges.filter((j) => j !== i);
      const restVerts = new Set<number>();
      for (const j of rest) {
        restVerts.add(g.edges[j]!.a);
        restVerts.add(g.edges[j]!.b);
      }
      if (g.edges[i]!.a === g.edges[i]!.b) continue; // a self-loop never disconnects
      if (restVerts.size !== verts.size || !plainConnected(g, rest)) {
        onePI = false;
        break;
      }
    }
    if (!onePI) continue;
    const L = edges.length - verts.size + 1;
    let omega = bg.theory.dimension * L;
    for (const i of edges) omega -= bg.edgeWeight[i]!;
    for (const v of verts) omega += bg.vertexDerivatives[v]!;
    if (omega >= 0) out.push({ edges, vertices: verts });
  }
  return out;
}

const compatible = (x: PlainSub, y: PlainSub) => {
  const xs = new Set(x.edges);
  const ys = new Set(y.edges);
  const nested = x.edges.every((e) => ys.has(e)) || y.edges.every((e) => xs.has(e));
  const disjoint = [...x.vertices].every((v) => !y.vertices.has(v));
  return nested || disjoint;
};

/** All forests of the proper subgraphs, and the maximal ones, by trying every subset. */
function plainForests(subs: PlainSub[]): { all: number; maximal: number } {
  const n = subs.length;
  const forests: number[] = [];
  for (let mask = 0; mask < 1 << n; mask++) {
    let ok = true;
    for (let i = 0; i < n && ok; i++) for (let j = i + 1; j < n && ok; j++) {
      if (mask & (1 << i) && mask & (1 << j) && !compatible(subs[i]!, subs[j]!)) ok = false;
    }
    if (ok) forests.push(mask);
  }
  const isForest = new Set(forests);
  const maximal = forests.filter((m) => {
    for (let k = 0; k < n; k++) if (!(m & (1 << k)) && isForest.has(m | (1 << k))) return false;
    return true;
  });
  return { all: forests.length, maximal: maximal.length };
}

const theories: [string, number[]][] = [
  ['phi4', [2, 3, 4, 5, 6]],
  ['phi4-on', [3, 4, 5]],
  ['phi3', [3, 4, 5, 6, 7, 8]],
  ['yukawa', [3, 4, 5, 6, 7]],
  ['qed', [3, 4, 5, 6, 7, 8]],
];

describe('fast enumeration agrees with the all-subsets reference (seeded random graphs)', () => {
  for (const [theory, sizes] of theories) {
    it(`${theory}: 120 random graphs`, () => {
      const t = builtinTheory(theory);
      const random = rng(theory.length * 1009 + 17);
      let nonTrivial = 0;
      for (let k = 0; k < 120; k++) {
        const g = randomTheoryGraph(t, random, { vertices: sizes[k % sizes.length]!, maxEdges: 14, legProbability: 0.12 });
        const bg = bindGraph(g, t);
        const fast = divergentSubgraphs(bg);
        const plain = plainDivergent(bg);
        const key = (edges: readonly number[]) => edges.join(',');
        expect(fast.map((s) => key(s.edgeList)).sort()).toEqual(plain.map((s) => key(s.edges)).sort());
        // Sorted by size, then lexicographically.
        for (let i = 1; i < fast.length; i++) {
          const [p, q] = [fast[i - 1]!.edgeList, fast[i]!.edgeList];
          const firstDiff = p.findIndex((x, j) => x !== q[j]);
          expect(p.length < q.length || (p.length === q.length && firstDiff >= 0 && p[firstDiff]! < q[firstDiff]!)).toBe(true);
        }
        const all = new Set(g.edges.map((_, i) => i).join(','));
        const properFast = fast.filter((s) => !all.has(key(s.edgeList)));
        const properPlain = plain.filter((s) => !all.has(key(s.edges)));
        if (properPlain.length <= 14) {
          const ref = plainForests(properPlain);
          expect(countForests(properFast)).toBe(BigInt(ref.all));
          expect(countMaximalForests(properFast)).toBe(BigInt(ref.maximal));
          const listed = listForests(properFast);
          expect(listed.length).toBe(ref.all);
          // Every reported forest is pairwise nested or vertex-disjoint.
          const asPlain = properFast.map((s) => ({ edges: [...s.edgeList], vertices: new Set(s.vertices) }));
          for (const f of listed) for (let i = 0; i < f.length; i++) for (let j = i + 1; j < f.length; j++) expect(compatible(asPlain[f[i]!]!, asPlain[f[j]!]!)).toBe(true);
          if (properPlain.length >= 3) nonTrivial++;
        }
      }
      // The sample must exercise real forest structure, not just primitive graphs.
      expect(nonTrivial).toBeGreaterThan(10);
    });
  }
});
