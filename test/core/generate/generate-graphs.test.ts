import { describe, expect, it } from 'vitest';
import { Rational } from '../../../src/core/algebra/rational.ts';
import { canonicalNotation, symmetryFactor } from '../../../src/core/canon/index.ts';
import { LimitError, InputError } from '../../../src/core/errors.ts';
import { generateGraphs, hasScalelessPart, type GeneratedGraph } from '../../../src/core/generate/index.ts';
import { isOnePIGraph, loopNumber, parseNotation, type Graph } from '../../../src/core/graph/index.ts';
import { bindGraph, builtinTheory, type Theory } from '../../../src/core/theory/index.ts';
import { cancelSource } from '../../../src/core/util/cancel.ts';
import { onePISums } from './zero-dimensional-series.ts';

const phi4 = builtinTheory('phi4');
const phi3 = builtinTheory('phi3');
const yukawa = builtinTheory('yukawa');
const qed = builtinTheory('qed');
const legs = (n: number) => Array<string>(n).fill('phi');
/** Σ_graphs (−1)^V/S: the zero-dimensional weight of each graph with coupling −1 per vertex. */
const signedWeight = (gs: readonly GeneratedGraph[]) =>
  gs.reduce((s, g) => s.add(Rational.of(g.vertexCounts.reduce((a, b) => a + b, 0) % 2 ? -1n : 1n, g.symmetryFactor)), Rational.ZERO);

describe('Σ 1/S against zero-dimensional field theory (Phys. Rev. D18 (1978) 1939; arXiv:1703.00840), computed in the test', () => {
  const z4 = onePISums(4, 6);
  const z3 = onePISums(3, 10);
  // φ⁴: V = L + n/2 − 1 vertices; φ³: V = 2L + n − 2.
  for (let L = 0; L <= 5; L++) {
    it(`φ⁴ four-point, ${L} loops, --all`, () => {
      const r = generateGraphs(phi4, { residue: legs(4), loops: L, all: true });
      expect(signedWeight(r.graphs).toString()).toBe(z4.four[L + 1]!.toString());
      expect(r.weight.toString()).toBe(z4.four[L + 1]!.abs().toString());
    });
  }
  for (let L = 1; L <= 5; L++) {
    it(`φ⁴ two-point, ${L} loops, --all`, () => {
      const r = generateGraphs(phi4, { residue: legs(2), loops: L, all: true });
      expect(signedWeight(r.graphs).toString()).toBe(z4.two[L]!.toString());
    });
  }
  it('published values of the 1PI four-point series, 1, 3/2, 21/4, 45/2, 1775/16 (arXiv:1703.00840, zero-dimensional φ⁴) come out of the test series', () => {
    expect(z4.four.slice(1, 6).map((x) => x.abs().toString())).toEqual(['1', '3/2', '21/4', '45/2', '1775/16']);
  });
  for (let L = 0; L <= 4; L++) {
    it(`φ³ three-point, ${L} loops`, () => {
      const r = generateGraphs(phi3, { residue: legs(3), loops: L, all: true });
      expect(signedWeight(r.graphs).toString()).toBe(z3.three[2 * L + 1]!.toString());
    });
  }
  for (let L = 1; L <= 4; L++) {
    it(`φ³ two-point, ${L} loops`, () => {
      const r = generateGraphs(phi3, { residue: legs(2), loops: L, all: true });
      expect(signedWeight(r.graphs).toString()).toBe(z3.two[2 * L]!.toString());
    });
  }
  it('φ⁴ vacuum graphs through 4 loops: W(0) (connected vacuum graphs of φ⁴ have no bridge: each side would have an odd number of half-edges)', () => {
    for (let L = 2; L <= 4; L++) {
      const r = generateGraphs(phi4, { residue: [], loops: L, all: true });
      expect(signedWeight(r.graphs).toString()).toBe(z4.vacuum[L - 1]!.toString());
    }
  });
  it('φ³: a cubic vertex cannot carry a scaleless part in a 1PI graph with two or more legs, so --all changes nothing', () => {
    const a = generateGraphs(phi3, { residue: legs(3), loops: 3, all: true });
    const b = generateGraphs(phi3, { residue: legs(3), loops: 3 });
    expect(b.graphs.map((g) => g.notation)).toEqual(a.graphs.map((g) => g.notation));
  });
});

describe('textbook graphs and symmetry factors ("An Introduction to Quantum Field Theory", 1995, §4.4; "Quantum Field Theory", Cambridge 2007, ch. 9–10)', () => {
  const find = (r: { graphs: readonly GeneratedGraph[] }, n: string) => r.graphs.find((g) => g.notation === canonicalNotation(bindGraph(parseNotation(n), phi4).graph, { defaultField: 'phi' }));
  it('one loop: the three bubbles, S = 2 each; the tadpole S = 2 (vanishing)', () => {
    const r = generateGraphs(phi4, { residue: legs(4), loops: 1 });
    expect(r.graphs.map((g) => g.notation)).toEqual(['1-2 1-2 / 1 1 2 2', '1-2 1-2 / 1 2 1 2', '1-2 1-2 / 1 2 2 1']);
    expect(r.graphs.map((g) => g.symmetryFactor)).toEqual([2n, 2n, 2n]);
    expect(generateGraphs(phi4, { residue: legs(2), loops: 1 }).graphs).toHaveLength(0);
    const t = generateGraphs(phi4, { residue: legs(2), loops: 1, all: true }).graphs;
    expect(t.map((g) => [g.notation, g.symmetryFactor, g.vanishes])).toEqual([['1-1 / 1 1', 2n, true]]);
  });
  it('two loops: sunset S = 6 (the only non-vanishing two-point graph), s-channel double bubble S = 4', () => {
    const two = generateGraphs(phi4, { residue: legs(2), loops: 2 }).graphs;
    expect(two.map((g) => [g.notation, g.symmetryFactor])).toEqual([['1-2 1-2 1-2 / 1 2', 6n]]);
    const four = generateGraphs(phi4, { residue: legs(4), loops: 2 });
    expect(find(four, '1-2 1-2 2-3 2-3 / 1 1 3 3')!.symmetryFactor).toBe(4n);
    // 3 channels × double bubble (1/4) + 6 eye graphs (1/2): 3/4 + 3 = 15/4.
    expect(four.graphs).toHaveLength(9);
    expect(four.weight.toString()).toBe('15/4');
  });
  it('vacuum: figure eight S = 8; two vertices joined by four lines S = 48', () => {
    expect(generateGraphs(phi4, { residue: [], loops: 2, all: true }).graphs.map((g) => [g.notation, g.symmetryFactor])).toEqual([['1-1 1-1 / ', 8n]].map(([n, s]) => [String(n).trimEnd(), s]));
    const v3 = generateGraphs(phi4, { residue: [], loops: 3, all: true }).graphs;
    expect(v3.find((g) => g.notation === '1-2 1-2 1-2 1-2 /')!.symmetryFactor).toBe(48n);
  });
});

/** Checks every generated graph against the engine's own graph functions. */
function checkGraphs(theory: Theory, residue: string[], loops: number, gs: readonly GeneratedGraph[], all: boolean) {
  const seen = new Set<string>();
  for (const g of gs) {
    expect(seen.has(g.notation)).toBe(false);
    seen.add(g.notation);
    const bg = bindGraph(parseNotation(g.notation), theory); // every vertex is a theory vertex
    expect(isOnePIGraph(bg.graph)).toBe(true);
    expect(loopNumber(bg.graph)).toBe(loops);
    expect(bg.graph.legs.map((l) => (l.direction === 'out' ? theory.fields.find((f) => f.name === l.field)!.antiparticle : l.field))).toEqual(residue);
    // The generator's fast canonical form and S agree with the canon module's.
    expect(canonicalNotation(bg.graph, { defaultField: theory.defaultField })).toBe(g.notation);
    expect(symmetryFactor(bg.graph)).toBe(g.symmetryFactor);
    expect(hasScalelessPart(bg.graph)).toBe(g.vanishes);
    if (!all) expect(g.vanishes).toBe(false);
  }
}

/** A seeded generator (mulberry32). */
function rng(seed: number) {
  return () => {
    seed |= 0;
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
function relabel(g: Graph, r: () => number): Graph {
  const perm = g.vertices.map((_, i) => i);
  for (let i = perm.length - 1; i > 0; i--) {
    const j = Math.floor(r() * (i + 1));
    [perm[i], perm[j]] = [perm[j]!, perm[i]!];
  }
  const vertices = g.vertices.map((_, i) => g.vertices[perm.indexOf(i)]!).map((v, i) => ({ ...v, name: `v${i}` }));
  const edges = g.edges.map((e) => ({ ...e, a: perm[e.a]!, b: perm[e.b]! })).sort(() => r() - 0.5);
  return { vertices, edges, legs: g.legs.map((l) => ({ ...l, vertex: perm[l.vertex]! })) };
}

describe('each graph once, valid, and invariant under relabelling', () => {
  const cases: [string, Theory, string[], number][] = [
    ['φ⁴ four-point 3 loops', phi4, legs(4), 3],
    ['φ⁴ two-point 4 loops', phi4, legs(2), 4],
    ['φ³ three-point 3 loops', phi3, legs(3), 3],
    ['Yukawa ψ̄ψφ vertex, 2 loops (y and λ vertices)', yukawa, ['psi', 'psibar', 'phi'], 2],
    ['Yukawa fermion self-energy, 2 loops', yukawa, ['psi', 'psibar'], 2],
    ['Yukawa scalar four-point, 1 loop (fermion box and scalar bubbles)', yukawa, legs(4), 1],
    ['QED vertex, 2 loops', qed, ['psi', 'psibar', 'A'], 2],
    ['QED photon self-energy, 2 loops', qed, ['A', 'A'], 2],
  ];
  for (const [name, theory, residue, loops] of cases) {
    for (const all of [false, true]) {
      it(`${name}${all ? ', --all' : ''}`, () => {
        const r = generateGraphs(theory, { residue, loops, all });
        expect(r.graphs.length).toBeGreaterThan(0);
        checkGraphs(theory, residue, loops, r.graphs, all);
        const rand = rng(17 + loops);
        const set = new Set(r.graphs.map((g) => g.notation));
        const again = new Set(r.graphs.map((g) => canonicalNotation(relabel(bindGraph(parseNotation(g.notation), theory).graph, rand), { defaultField: theory.defaultField })));
        expect(again).toEqual(set);
      });
    }
  }
  it('the default set is the --all set without the vanishing graphs', () => {
    const all = generateGraphs(phi4, { residue: legs(4), loops: 3, all: true }).graphs;
    const def = generateGraphs(phi4, { residue: legs(4), loops: 3 }).graphs;
    expect(def.map((g) => g.notation)).toEqual(all.filter((g) => !g.vanishes).map((g) => g.notation));
  });
  it('QED: one-loop vertex, self-energies (one graph each, S = 1)', () => {
    for (const residue of [['psi', 'psibar', 'A'], ['psi', 'psibar'], ['A', 'A']]) {
      const r = generateGraphs(qed, { residue, loops: 1 });
      expect(r.graphs.map((g) => g.symmetryFactor)).toEqual([1n]);
    }
    // Fermion number: a lone fermion leg has no graph.
    expect(generateGraphs(qed, { residue: ['psi', 'A'], loops: 1 }).graphs).toHaveLength(0);
  });
});

describe('limits, input errors, cancellation', () => {
  it('12-loop φ⁴ four-point graphs are refused up front with LimitError naming maxGraphs', () => {
    try {
      generateGraphs(phi4, { residue: legs(4), loops: 12 });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(LimitError);
      expect((e as LimitError).limit).toBe('maxGraphs');
    }
  });
  it('unknown labels are InputErrors', () => {
    expect(() => generateGraphs(phi4, { residue: ['chi'], loops: 1 })).toThrow(InputError);
  });
  it('a cancelled token stops the run', () => {
    const c = cancelSource();
    c.cancel();
    expect(() => generateGraphs(phi4, { residue: legs(4), loops: 4, cancel: c })).toThrow(/cancelled/);
  });
});
