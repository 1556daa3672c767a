import { describe, expect, it } from 'vitest';
import { isOnePIGraph, loopNumber } from '../../../src/core/graph/connectivity.ts';
import { contractParts } from '../../../src/core/graph/contract.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { HopfAlgebra } from '../../../src/core/hopf/hopf-algebra.ts';
import { unlabelledLegsClassifier } from '../../../src/core/hopf/default-classifier.ts';
import { Combination, monomialKey, multiply, single, tensorKey, tensorParts } from '../../../src/core/hopf/element.ts';
import { countertermMarks } from '../../../src/core/hopf/counterterm-structure.ts';
import { listForests } from '../../../src/core/subgraphs/list-forests.ts';
import { isSubset } from '../../../src/core/graph/edge-set.ts';
import { randomTheoryGraph, rng } from '../../helpers/random-graphs.ts';

/*
 * Identities of the Connes–Kreimer Hopf algebra that are not definitions — "Hopf algebras,
 * renormalization and noncommutative geometry", Commun. Math. Phys. 199 (1998) 203,
 * arXiv:hep-th/9808042; "Renormalization in quantum field theory and the Riemann–Hilbert problem I",
 * Commun. Math. Phys. 210 (2000) 249, arXiv:hep-th/9912092; survey arXiv:math/0408405.
 */

const theories: [string, number[]][] = [
  ['phi4', [2, 3, 4, 5]],
  ['phi4-on', [2, 3, 4]],
  ['phi3', [2, 3, 4, 5, 6]],
  ['yukawa', [2, 3, 4, 5]],
  ['qed', [2, 3, 4, 5, 6]],
];

/** Random 1PI graphs with at least one loop (divergent or not). */
function sample(theory: string, sizes: number[], count: number, seed: number) {
  const t = builtinTheory(theory);
  const r = rng(seed);
  const out = [];
  while (out.length < count) {
    const g = randomTheoryGraph(t, r, { vertices: sizes[out.length % sizes.length]!, maxEdges: 9, legProbability: 0.1 });
    if (isOnePIGraph(g) && loopNumber(g) > 0) out.push(bindGraph(g, t));
  }
  return out;
}

/** (Δ⊗id) and (id⊗Δ) applied to an element of H⊗H. */
function coproductLeft(H: HopfAlgebra, x: Combination): Combination {
  const out = new Combination();
  for (const [k, v] of x.terms) {
    const [l, r] = tensorParts(k);
    for (const [dk, dv] of H.coproductOfMonomial(l!).terms) {
      const [a, b] = tensorParts(dk);
      out.add(tensorKey([a!, b!, r!]), v * dv);
    }
  }
  return out;
}
function coproductRight(H: HopfAlgebra, x: Combination): Combination {
  const out = new Combination();
  for (const [k, v] of x.terms) {
    const [l, r] = tensorParts(k);
    for (const [dk, dv] of H.coproductOfMonomial(r!).terms) {
      const [a, b] = tensorParts(dk);
      out.add(tensorKey([l!, a!, b!]), v * dv);
    }
  }
  return out;
}

describe('Hopf algebra identities on random graphs of every theory', () => {
  for (const [theory, sizes] of theories) {
    const H = new HopfAlgebra(builtinTheory(theory), unlabelledLegsClassifier);
    const graphs = sample(theory, sizes, 100, 31 * theory.length + 5);

    it(`${theory}: coassociativity (Δ⊗id)Δ = (id⊗Δ)Δ`, () => {
      let nontrivial = 0;
      for (const bg of graphs) {
        const a = H.analyze(bg);
        if (!a.divergent) continue; // the coaction is coassociative too, but its left factor needs Δ of a convergent graph
        const k = H.classOf(bg);
        const d = H.coproduct(k);
        expect(coproductLeft(H, d).equals(coproductRight(H, d))).toBe(true);
        if (a.terms.length >= 2) nontrivial++;
      }
      expect(nontrivial).toBeGreaterThan(3);
    });

    it(`${theory}: m∘(id⊗S)∘Δ = η∘ε and S² = id`, () => {
      for (const bg of graphs) {
        if (!H.analyze(bg).divergent) continue;
        const k = H.classOf(bg);
        // Σ Γ' S(Γ''): the side that does not define S.
        const total = new Combination();
        for (const [t, v] of H.coproduct(k).terms) {
          const [l, r] = tensorParts(t);
          total.addAll(multiply(single(l!), H.antipodeOfMonomial(r!)), v);
        }
        expect(total.isZero).toBe(true);
        expect(H.antipodeOf(H.antipode(k)).equals(single([k]))).toBe(true);
      }
    });

    it(`${theory}: the forest formula gives the recursive antipode`, () => {
      for (const bg of graphs) {
        const a = H.analyze(bg);
        if (!a.divergent) continue;
        const E = bg.graph.edges.length;
        const full = (1n << BigInt(E)) - 1n;
        // S(Γ) = Σ_{forests F ∋ Γ} (−1)^{|F|} Π_{γ ∈ F} γ/(members of F maximal in γ)  (Zimmermann's forest formula
        // in Hopf-algebraic form; common practice, e.g. arXiv:math/0408405 §2).
        const members = [...a.subgraphs.map((s) => ({ edges: s.edges, edgeList: s.edgeList, residue: s.residue, omega: s.omega })), { edges: full, edgeList: bg.graph.edges.map((_, i) => i), residue: [], omega: 0 }];
        const viaForests = new Combination();
        for (const f of listForests(a.subgraphs)) {
          const F = [...f, members.length - 1];
          const factors: string[] = [];
          for (const m of F) {
            const inside = F.filter((o) => o !== m && isSubset(members[o]!.edges, members[m]!.edges));
            const maximal = inside.filter((o) => !inside.some((p) => p !== o && isSubset(members[o]!.edges, members[p]!.edges)));
            // γ/(maximal members): take γ as a graph of its own, then contract.
            const edges = members[m]!.edgeList;
            const sub = m === members.length - 1 ? bg.graph : subgraphOf(bg.graph, edges);
            const local = new Map(edges.map((e, i) => [e, i]));
            const q = contractParts(
              sub,
              maximal.map((o) => ({
                edges: members[o]!.edgeList.map((e) => (m === members.length - 1 ? e : local.get(e)!)),
                mark: countertermMarks(bg.theory, members[o]!.residue, members[o]!.omega)[0]!,
              })),
            ).graph;
            factors.push(H.classOf(bindGraph(q, bg.theory)));
          }
          viaForests.add(monomialKey(factors), F.length % 2 === 0 ? 1n : -1n);
        }
        expect(viaForests.equals(H.antipode(H.classOf(bg)))).toBe(true);
      }
    });
  }
});

/** The subgraph on `edges` with its external half-edges as legs (plain, for the forest-formula route). */
function subgraphOf(g: import('../../../src/core/graph/types.ts').Graph, edges: readonly number[]) {
  const inside = new Set(edges);
  const verts = [...new Set(edges.flatMap((i) => [g.edges[i]!.a, g.edges[i]!.b]))].sort((x, y) => x - y);
  const idx = new Map(verts.map((v, k) => [v, k]));
  const legs: import('../../../src/core/graph/types.ts').Leg[] = [];
  g.edges.forEach((e, i) => {
    if (inside.has(i)) return;
    if (idx.has(e.a)) legs.push({ vertex: idx.get(e.a)!, field: e.field, direction: e.oriented ? 'out' : 'none' });
    if (idx.has(e.b)) legs.push({ vertex: idx.get(e.b)!, field: e.field, direction: e.oriented ? 'in' : 'none' });
  });
  for (const l of g.legs) if (idx.has(l.vertex)) legs.push({ ...l, vertex: idx.get(l.vertex)! });
  return {
    vertices: verts.map((v) => g.vertices[v]!),
    edges: edges.map((i) => ({ ...g.edges[i]!, a: idx.get(g.edges[i]!.a)!, b: idx.get(g.edges[i]!.b)! })),
    legs,
  };
}
