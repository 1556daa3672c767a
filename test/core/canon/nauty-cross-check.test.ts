/**
 * Automorphism group orders and isomorphism classes checked against nauty's dreadnaut
 * ("Practical graph isomorphism, II", J. Symbolic Comput. 60 (2014) 94), run once per batch.
 * CI installs nauty (.ci/run); outside CI the suite is skipped when dreadnaut is missing.
 */
import { describe, expect, it } from 'vitest';
import { automorphismGroup, canonicalNotation, edgePermutationFactor, symmetryFactor } from '../../../src/core/canon/index.ts';
import type { Graph } from '../../../src/core/graph/types.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { dreadnautAvailable, encodeForNauty, nautyCanonicalGraphs, nautyGroupSizes, sameSize } from './dreadnaut.ts';
import {
  circulant,
  completeBipartite,
  completedZigzag,
  decomplete,
  hypercube,
  random4Regular,
  randomPermutation,
  randomTheoryGraph,
  relabel,
  rng,
  rookGraph4x4,
  shrikhandeGraph,
  type TheoryName,
} from './random-graphs.ts';

const available = dreadnautAvailable();
const inCI = Boolean(process.env.CI);

if (!available && inCI) {
  describe('nauty cross-check', () => {
    it('needs dreadnaut (Debian package nauty) in CI', () => {
      throw new Error('dreadnaut is not installed: run `apt-get install nauty` (.ci/run installs it)');
    });
  });
}

const theories: TheoryName[] = ['phi4', 'phi4-on', 'phi3', 'yukawa', 'qed'];

/** 250 random graphs, 50 per built-in theory, bound to their theory (fields resolved). */
function randomBatch(): { name: string; graph: Graph }[] {
  const rand = rng(20240603);
  const out: { name: string; graph: Graph }[] = [];
  for (const t of theories) {
    const theory = builtinTheory(t);
    for (let i = 0; i < 50; i++) {
      const g = randomTheoryGraph(t, rand, 2 + Math.floor(rand() * 9));
      out.push({ name: `${t} #${i}`, graph: bindGraph(g, theory).graph });
    }
  }
  return out;
}

/** Symmetric families where refinement alone settles nothing: circulants, completed zigzags, K_{m,n}. */
function symmetricBatch(): { name: string; graph: Graph }[] {
  const out: { name: string; graph: Graph }[] = [];
  for (let n = 5; n <= 16; n++) out.push({ name: `C_${n}(1,2)`, graph: circulant(n, [1, 2]) });
  for (let n = 7; n <= 14; n++) out.push({ name: `C_${n}(1,3)`, graph: circulant(n, [1, 3]) });
  for (let n = 9; n <= 13; n++) out.push({ name: `C_${n}(1,2,4)`, graph: circulant(n, [1, 2, 4]) });
  for (let loops = 3; loops <= 10; loops++) {
    const z = completedZigzag(loops);
    out.push({ name: `completed zigzag, ${loops} loops`, graph: z });
    out.push({ name: `zigzag four-point graph, ${loops} loops`, graph: decomplete(z, 0) });
  }
  for (let m = 1; m <= 6; m++) for (let n = m; n <= 6; n++) out.push({ name: `K_${m},${n}`, graph: completeBipartite(m, n) });
  out.push({ name: 'K_4,4 with doubled lines', graph: completeBipartite(4, 4, 2) });
  out.push({ name: 'K_3,5 with tripled lines', graph: completeBipartite(3, 5, 3) });
  out.push({ name: 'K_8,8', graph: completeBipartite(8, 8) });
  out.push({ name: 'Shrikhande graph', graph: shrikhandeGraph() }, { name: '4×4 rook graph', graph: rookGraph4x4() });
  for (let k = 2; k <= 5; k++) out.push({ name: `hypercube Q${k}`, graph: hypercube(k) });
  return out;
}

describe.skipIf(!available)('nauty cross-check', () => {
  const batch = [...randomBatch(), ...symmetricBatch()];

  it(`symmetry factor S equals the order of the half-edge automorphism group from dreadnaut (${batch.length} graphs)`, () => {
    const sizes = nautyGroupSizes(batch.map((b) => encodeForNauty(b.graph)));
    const bad: string[] = [];
    batch.forEach((b, i) => {
      const s = symmetryFactor(b.graph);
      if (!sameSize(sizes[i]!, s)) bad.push(`${b.name}: ours ${s}, nauty ${sizes[i]}`);
    });
    expect(bad).toEqual([]);
    expect(batch.length).toBeGreaterThanOrEqual(300);
  });

  it('with unlabelled legs, |Aut| × line permutations × leg permutations at each vertex equals dreadnaut (legs by field)', () => {
    const withLegs = batch.filter((b) => b.graph.legs.length > 1);
    const sizes = nautyGroupSizes(withLegs.map((b) => encodeForNauty(b.graph, 'unlabelled')));
    const bad: string[] = [];
    withLegs.forEach((b, i) => {
      const legGroups = new Map<string, number>();
      for (const l of b.graph.legs) {
        const k = `${l.vertex} ${l.direction} ${l.field}`;
        legGroups.set(k, (legGroups.get(k) ?? 0) + 1);
      }
      let legPerms = 1n;
      for (const c of legGroups.values()) for (let j = 2; j <= c; j++) legPerms *= BigInt(j);
      const ours = automorphismGroup(b.graph, { legs: 'unlabelled' }).order * edgePermutationFactor(b.graph) * legPerms;
      if (!sameSize(sizes[i]!, ours)) bad.push(`${b.name}: ours ${ours}, nauty ${sizes[i]}`);
    });
    expect(bad).toEqual([]);
    expect(withLegs.length).toBeGreaterThan(100);
  });

  it('canonical notations agree with nauty canonical graphs on which pairs are isomorphic (relabelled copies and look-alikes)', () => {
    const rand = rng(77);
    const graphs: Graph[] = [];
    // Random 4-regular multigraphs on 6–8 vertices: all share the degree sequence.
    for (let i = 0; i < 40; i++) {
      const g = random4Regular(rand, 6 + (i % 3));
      graphs.push(g, relabel(g, randomPermutation(rand, g.vertices.length), rand));
    }
    for (const t of theories) {
      for (let i = 0; i < 8; i++) {
        const g = bindGraph(randomTheoryGraph(t, rand, 3 + (i % 4)), builtinTheory(t)).graph;
        graphs.push(g, relabel(g, randomPermutation(rand, g.vertices.length), rand));
      }
    }
    graphs.push(circulant(8, [1, 2]), circulant(8, [1, 3]), completeBipartite(4, 4), circulant(10, [1, 2]), circulant(10, [1, 3]), circulant(10, [2, 3]));
    // Strongly regular look-alikes (16, 6, 2, 2), each also in a random numbering.
    for (const g of [shrikhandeGraph(), rookGraph4x4()]) graphs.push(g, relabel(g, randomPermutation(rand, 16), rand));
    const encoded = graphs.map((g) => encodeForNauty(g));
    // Colours go with the canonical graph, so look-alikes with different colours stay apart.
    const nauty = nautyCanonicalGraphs(encoded).map((c, i) => `${encoded[i]!.cells.map((x, k) => `${encoded[i]!.cellKeys[k]}×${x.length}`).join(',')}\n${c}`);
    const ours = graphs.map((g) => canonicalNotation(g));
    let isoPairs = 0;
    const bad: string[] = [];
    for (let i = 0; i < graphs.length; i++) {
      for (let j = i + 1; j < graphs.length; j++) {
        const a = ours[i] === ours[j];
        const b = nauty[i] === nauty[j];
        if (b) isoPairs++;
        if (a !== b) bad.push(`graphs ${i} and ${j}: ours ${a ? 'isomorphic' : 'different'}, nauty ${b ? 'isomorphic' : 'different'}`);
      }
    }
    expect(bad).toEqual([]);
    expect(isoPairs).toBeGreaterThanOrEqual(80);
  });
});
