import { describe, expect, it } from 'vitest';
import { canonicalNotation } from '../../../src/core/canon/canonical-form.ts';
import { symmetryFactor } from '../../../src/core/canon/symmetry-factor.ts';
import { isOnePIGraph, loopNumber } from '../../../src/core/graph/connectivity.ts';
import { contractParts } from '../../../src/core/graph/contract.ts';
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import type { Edge, Graph, Leg } from '../../../src/core/graph/types.ts';
import { bindGraph, type BoundGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { HopfAlgebra } from '../../../src/core/hopf/hopf-algebra.ts';
import { unlabelledLegsClassifier } from '../../../src/core/hopf/default-classifier.ts';
import { buildFormulaTree, forestExpression, unfoldFormulaTree, unfoldedTermCount } from '../../../src/core/hopf/formula-tree.ts';
import { forestToRootedTree, loopWeightedTreeFactorial, treeFactorial } from '../../../src/core/hopf/rooted-tree.ts';
import { countertermMarks } from '../../../src/core/hopf/counterterm-structure.ts';
import { countForests } from '../../../src/core/subgraphs/count-forests.ts';
import { listForests } from '../../../src/core/subgraphs/list-forests.ts';
import { randomTheoryGraph, rng } from '../../helpers/random-graphs.ts';

const phi4 = builtinTheory('phi4');
const bind = (text: string, theory = phi4) => bindGraph(parseNotation(text), theory);

describe('coproduct worked examples (two-loop φ⁴; common practice, cf. arXiv:math/0408405 §2)', () => {
  const H = new HopfAlgebra(phi4, unlabelledLegsClassifier);
  const show = (k: string) => canonicalNotation(H.representative(k).graph, { legs: 'unlabelled', defaultField: 'phi' });
  const reduced = (text: string) => H.analyze(bind(text)).terms.map((t) => [t.left.map(show), show(t.right), t.multiplicity]);

  it('sunset: Δ′ = 3 γ ⊗ (tadpole with the contracted vertex) — the cographs are tadpoles', () => {
    expect(reduced('1-2 1-2 1-2 / 1 2')).toEqual([[['1-2 1-2 / 1 1 2 2'], '1-1 / 1 1', 3]]);
  });
  it('s-channel chain: Δ′ = 2 γ ⊗ γ', () => {
    expect(reduced('1-2 1-2 2-3 2-3 / 1 1 3 3')).toEqual([[['1-2 1-2 / 1 1 2 2'], '1-2 1-2 / 1 1 2 2', 2]]);
  });
  it('vertex-corrected bubble: Δ′ = γ ⊗ γ, and S(Γ) = −Γ + γ²', () => {
    const text = '1-2 1-2 1-3 2-3 / 1 2 3 3';
    expect(reduced(text)).toEqual([[['1-2 1-2 / 1 1 2 2'], '1-2 1-2 / 1 1 2 2', 1]]);
    const k = H.classOf(bind(text));
    const gamma = H.classOf(bind('1-2 1-2 / 1 1 2 2'));
    expect(H.antipode(k).entries()).toEqual([[`${gamma} * ${gamma}`, 1n], [k, -1n]].sort(([a], [b]) => ((a as string) < (b as string) ? -1 : 1)));
  });
  it('a primitive graph has Δ = Γ⊗1 + 1⊗Γ and S = −Γ', () => {
    const k = H.classOf(bind('1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4'));
    expect(H.coproduct(k).terms.size).toBe(2);
    expect(H.antipode(k).entries()).toEqual([[k, -1n]]);
  });
  it('a convergent graph with a subdivergence has the coaction (no Γ⊗1)', () => {
    // Six-point graph in φ⁴ (ω = −2) with one bubble inside.
    const a = H.analyze(bind('1-2 1-2 1-3 2-4 3-4 / 1 2 3 3 4 4'));
    expect(a.divergent).toBe(false);
    const k = H.classOf(a.bound);
    const d = H.coproduct(k);
    expect(d.terms.has(`${k} ⊗ 1`)).toBe(false);
    expect(d.terms.has(`1 ⊗ ${k}`)).toBe(true);
    expect(d.terms.size).toBe(2);
  });
});

/** Brute force: every edge subset whose components (vertex-sharing joined) are 1PI and divergent. */
function bruteAdmissible(bg: BoundGraph): number[][][] {
  const g = bg.graph;
  const E = g.edges.length;
  const out: number[][][] = [];
  for (let mask = 1; mask < (1 << E) - 1; mask++) {
    const edges = [...Array(E).keys()].filter((i) => mask & (1 << i));
    // Components by repeated merging on shared vertices.
    const comps: { edges: number[]; verts: Set<number> }[] = [];
    for (const i of edges) {
      const here = { edges: [i], verts: new Set([g.edges[i]!.a, g.edges[i]!.b]) };
      for (let k = comps.length - 1; k >= 0; k--) {
        if ([...comps[k]!.verts].some((v) => here.verts.has(v))) {
          here.edges.push(...comps[k]!.edges);
          for (const v of comps[k]!.verts) here.verts.add(v);
          comps.splice(k, 1);
        }
      }
      comps.push(here);
    }
    const ok = comps.every((c) => {
      const sub: Graph = { vertices: g.vertices, edges: c.edges.map((i) => g.edges[i]!), legs: [] };
      const verts = [...c.verts];
      // 1PI: no single edge removal disconnects the component's vertex set.
      const connectedWithout = (skip: number) => {
        const seen = new Set([verts[0]!]);
        let grew = true;
        while (grew) {
          grew = false;
          sub.edges.forEach((e, j) => {
            if (j === skip) return;
            if (seen.has(e.a) !== seen.has(e.b)) {
              seen.add(e.a);
              seen.add(e.b);
              grew = true;
            }
          });
        }
        return verts.every((v) => seen.has(v));
      };
      if (!sub.edges.every((_, j) => connectedWithout(j))) return false;
      const L = c.edges.length - verts.length + 1;
      const omega = bg.theory.dimension * L - c.edges.reduce((s, i) => s + bg.edgeWeight[i]!, 0) + verts.reduce((s, v) => s + bg.vertexDerivatives[v]!, 0);
      return omega >= 0;
    });
    if (ok) out.push(comps.map((c) => c.edges.sort((a, b) => a - b)));
  }
  return out;
}

describe('admissible subgraphs and class multiplicities against brute force', () => {
  for (const theory of ['phi4', 'phi3', 'yukawa', 'qed']) {
    it(`${theory}: 60 random graphs`, () => {
      const t = builtinTheory(theory);
      const H = new HopfAlgebra(t, unlabelledLegsClassifier);
      const r = rng(theory.length * 77 + 1);
      let checked = 0;
      while (checked < 60) {
        const g = randomTheoryGraph(t, r, { vertices: 2 + (checked % 5), maxEdges: 11, legProbability: 0.1 });
        if (!isOnePIGraph(g) || loopNumber(g) === 0) continue;
        checked++;
        const bg = bindGraph(g, t);
        const a = H.analyze(bg);
        const brute = bruteAdmissible(bg);
        expect(a.admissible.length).toBe(brute.length);
        // Classes of pairs, computed from the brute-force list with plain contraction.
        const counts = new Map<string, number>();
        for (const comps of brute) {
          const left = comps.map((c) => H.classOf(bindGraph(extract(bg.graph, c), t))).sort();
          const q = contractParts(bg.graph, comps.map((c) => {
            const sub = a.subgraphs.find((s) => s.edgeList.join() === c.join())!;
            return { edges: c, mark: countertermMarks(t, sub.residue, sub.omega)[0]! };
          })).graph;
          const key = `${left.join(' * ')} ⊗ ${H.classOf(bindGraph(q, t))}`;
          counts.set(key, (counts.get(key) ?? 0) + 1);
        }
        const fast = new Map(a.terms.map((x) => [`${x.left.join(' * ')} ⊗ ${x.right}`, x.multiplicity]));
        expect(fast).toEqual(counts);
      }
    });
  }
});

function extract(g: Graph, edges: number[]): Graph {
  const inside = new Set(edges);
  const verts = [...new Set(edges.flatMap((i) => [g.edges[i]!.a, g.edges[i]!.b]))].sort((x, y) => x - y);
  const idx = new Map(verts.map((v, k) => [v, k]));
  const legs: Leg[] = [];
  g.edges.forEach((e, i) => {
    if (inside.has(i)) return;
    if (idx.has(e.a)) legs.push({ vertex: idx.get(e.a)!, field: e.field, direction: e.oriented ? 'out' : 'none' });
    if (idx.has(e.b)) legs.push({ vertex: idx.get(e.b)!, field: e.field, direction: e.oriented ? 'in' : 'none' });
  });
  for (const l of g.legs) if (idx.has(l.vertex)) legs.push({ ...l, vertex: idx.get(l.vertex)! });
  return { vertices: verts.map((v) => g.vertices[v]!), edges: edges.map((i): Edge => ({ ...g.edges[i]!, a: idx.get(g.edges[i]!.a)!, b: idx.get(g.edges[i]!.b)! })), legs };
}

describe('counterterm formula tree = forest formula, term by term', () => {
  for (const theory of ['phi4', 'phi3', 'qed']) {
    it(`${theory}: random graphs`, () => {
      const t = builtinTheory(theory);
      const H = new HopfAlgebra(t, unlabelledLegsClassifier);
      const r = rng(theory.length * 13 + 3);
      let done = 0;
      while (done < 60) {
        const g = randomTheoryGraph(t, r, { vertices: 2 + (done % 5), maxEdges: 11, legProbability: 0.1 });
        if (!isOnePIGraph(g) || loopNumber(g) === 0) continue;
        done++;
        const a = H.analyze(bindGraph(g, t));
        const tree = buildFormulaTree(a.bound, a.subgraphs, a.divergent);
        const terms = unfoldFormulaTree(tree);
        expect(unfoldedTermCount(tree)).toBe(countForests(a.subgraphs));
        // The forests reached by unfolding are exactly the forests containing Γ, each once…
        const viaTree = terms.map((x) => x.forest.filter((id) => id !== tree.root).map((id) => tree.nodes[id]!.subgraphIndex).sort((p, q) => p - q).join(',')).sort();
        const direct = listForests(a.subgraphs).map((f) => [...f].sort((p, q) => p - q).join(',')).sort();
        expect(viaTree).toEqual(direct);
        // …and each unfolded expression is the forest formula's term for its forest, with sign (−1)^|R|.
        for (const x of terms) {
          expect(x.expression).toBe(forestExpression(tree, x.forest));
          const rCount = (x.expression.match(/R\[/g) ?? []).length;
          expect(x.sign).toBe(rCount % 2 === 0 ? 1 : -1);
        }
      }
    });
  }
});

describe('rooted trees of forests', () => {
  // Worked by hand: in 1-2 1-2 1-3 2-3 3-4 3-4 / 1 2 4 4, g0 = lines 1,2 ⊂ g2 = lines 1–4, and
  // g1 = lines 5,6 is vertex-disjoint from g0. {g0, g2, Γ} is a ladder (t! = 3·2·1, loop-weighted
  // 3·2·1); {g0, g1, Γ} is a root with two leaves (t! = 3, loop-weighted 3·1·1).
  it('ladders and cherries: tree factorials of the forests of a nested graph', () => {
    const bg = bind('1-2 1-2 1-3 2-3 3-4 3-4 / 1 2 4 4');
    const H = new HopfAlgebra(phi4, unlabelledLegsClassifier);
    const a = H.analyze(bg);
    expect(a.subgraphs.map((x) => x.edgeList)).toEqual([[0, 1], [4, 5], [0, 1, 2, 3]]);
    const tree = buildFormulaTree(bg, a.subgraphs, true);
    const node = (i: number) => tree.nodes.findIndex((n) => n.subgraphIndex === i);
    const ladder = forestToRootedTree(tree, [tree.root, node(0), node(2)]);
    expect(treeFactorial(ladder)).toBe(6n);
    expect(loopWeightedTreeFactorial(ladder)).toBe(6n);
    const cherry = forestToRootedTree(tree, [tree.root, node(0), node(1)]);
    expect(cherry.children).toHaveLength(2);
    expect(treeFactorial(cherry)).toBe(3n);
    expect(loopWeightedTreeFactorial(cherry)).toBe(3n);
  });
});

/*
 * The identity linking automorphisms, coproduct multiplicities and marked counterterm diagrams:
 * inserting g (legs free) into the marked vertex of G* in every type-respecting way, the orbit–
 * stabilizer theorem gives, for each resulting Γ,
 *   n_Γ(g, G*) · |Aut_free g| · S(G*) = S(Γ) · #(insertions giving Γ),
 * n_Γ the number of subgraphs γ ≅ g of Γ with marked cograph ≅ G* (common practice in
 * renormalized perturbation theory; cf. arXiv:hep-th/9912092 on insertion and the coproduct).
 */
describe('automorphisms, multiplicities and marked counterterm diagrams', () => {
  const H = new HopfAlgebra(phi4, unlabelledLegsClassifier);
  const gs = ['1-2 1-2 / 1 1 2 2', '1-2 1-2 2-3 2-3 / 1 1 3 3', '1-2 1-2 1-3 2-3 / 1 2 3 3', '1-2 1-2 1-2 / 1 2', '1-1 / 1 1'];
  const stars = ['m{phi,phi,phi,phi}-m / m m', 'm{phi,phi,phi,phi}-2 m-2 / m m 2 2', 'm{phi,phi,phi,phi}-2 m-2 2-3 2-3 / m m 3 3', '1-m{phi,phi,phi,phi} 1-m 1-3 m-3 / 1 3 3 m'.replace('1-3 m-3 / 1 3 3 m', '1-3 m-3 / 3 3'), 'm{phi,phi;p2}-1 m-1 1-1 / 1 1'.replace('1-1 / 1 1', '/ 1 1'), '1-m{phi,phi;p2} m-2 1-2 1-2 / 1 2'];
  for (const gText of gs) for (const starText of stars) {
    const g = bind(gText);
    let star: Graph;
    try {
      star = bind(starText).graph;
    } catch {
      continue;
    }
    const m = star.vertices.findIndex((v) => v.name === 'm');
    const residue = star.vertices[m]!.counterterm!.residue;
    const gRes = bind(gText).graph.legs.length;
    if (gRes !== residue.length) continue;
    const needP2 = residue.length === 2;
    if (needP2 !== (star.vertices[m]!.counterterm!.structure === 'p2')) continue;
    it(`g = ${gText} into G* = ${starText}`, () => {
      // Slots at the marked vertex: its legs and each end of its edges.
      const slots: ({ kind: 'leg'; i: number } | { kind: 'end'; e: number; atB: boolean })[] = [];
      star.legs.forEach((l, i) => l.vertex === m && slots.push({ kind: 'leg', i }));
      star.edges.forEach((e, i) => {
        if (e.a === m) slots.push({ kind: 'end', e: i, atB: false });
        if (e.b === m) slots.push({ kind: 'end', e: i, atB: true });
      });
      const perms = permutations(slots.length);
      const gluedCount = new Map<string, { graph: Graph; count: number }>();
      for (const p of perms) {
        const G = glue(g.graph, star, m, slots, p);
        const key = canonicalNotation(G);
        const hit = gluedCount.get(key);
        if (hit) hit.count++;
        else gluedCount.set(key, { graph: G, count: 1 });
      }
      const autFree = symmetryFactor(g.graph) * BigInt(permutations(g.graph.legs.length).filter((p) => canonicalNotation({ ...g.graph, legs: p.map((k) => g.graph.legs[k]!) }) === canonicalNotation(g.graph)).length);
      const starKey = canonicalNotation(star);
      const gKey = H.classOf(g);
      for (const { graph: G, count } of gluedCount.values()) {
        const bg = bindGraph(G, phi4);
        const a = H.analyze(bg);
        let n = 0;
        for (const adm of a.admissible) {
          if (adm.components.length !== 1) continue;
          const s = a.subgraphs[adm.components[0]!]!;
          if (H.classOf(bindGraph(extract(bg.graph, [...s.edgeList]), phi4)) !== gKey) continue;
          const mark = countertermMarks(phi4, s.residue, s.omega)[0] ?? { residue: [...s.residue], structure: '' };
          const marked = contractParts(bg.graph, [{ edges: s.edgeList, mark }]).graph;
          if (canonicalNotation(marked) === starKey) n++;
        }
        expect(BigInt(n) * autFree * symmetryFactor(star)).toBe(symmetryFactor(G) * BigInt(count));
      }
    });
  }
});

function permutations(n: number): number[][] {
  if (n === 0) return [[]];
  return permutations(n - 1).flatMap((p) => Array.from({ length: n }, (_, i) => [...p.slice(0, i), n - 1, ...p.slice(i)]));
}

/** Glue g's legs onto the marked vertex m of G*: g's leg k takes slot perm[k]. */
function glue(g: Graph, star: Graph, m: number, slots: ({ kind: 'leg'; i: number } | { kind: 'end'; e: number; atB: boolean })[], perm: number[]): Graph {
  const offset = star.vertices.length;
  const vertices = [...star.vertices.map((v, i) => (i === m ? { name: '__unused' } : v)), ...g.vertices.map((v, i) => ({ name: `g${i}_${v.name}` }))];
  const edges: Edge[] = star.edges.map((e) => ({ ...e }));
  const legs: Leg[] = star.legs.map((l) => ({ ...l }));
  g.legs.forEach((gl, k) => {
    const slot = slots[perm[k]!]!;
    const target = offset + gl.vertex;
    if (slot.kind === 'leg') legs[slot.i] = { ...legs[slot.i]!, vertex: target };
    else edges[slot.e] = slot.atB ? { ...edges[slot.e]!, b: target } : { ...edges[slot.e]!, a: target };
  });
  for (const e of g.edges) edges.push({ ...e, a: e.a + offset, b: e.b + offset });
  // Drop the emptied marked vertex and renumber.
  const keep = vertices.map((_, i) => i).filter((i) => i !== m);
  const idx = new Map(keep.map((v, k) => [v, k]));
  return { vertices: keep.map((i) => vertices[i]!), edges: edges.map((e) => ({ ...e, a: idx.get(e.a)!, b: idx.get(e.b)! })), legs: legs.map((l) => ({ ...l, vertex: idx.get(l.vertex)! })) };
}
