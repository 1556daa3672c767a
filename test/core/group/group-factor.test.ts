import { describe, expect, it } from 'vitest';
import { evaluatePoly, formatPoly, parsePoly, Poly } from '../../../src/core/algebra/index.ts';
import { Rational } from '../../../src/core/algebra/rational.ts';
import { TheoryError } from '../../../src/core/errors.ts';
import { generateGraphs, groupFactor } from '../../../src/core/generate/index.ts';
import { parseNotation, type Graph } from '../../../src/core/graph/index.ts';
import { builtinTheory } from '../../../src/core/theory/index.ts';

const on = builtinTheory('phi4-on');
const gf = (n: string) => groupFactor(on, parseNotation(n))!;

/**
 * Brute force, written plainly: the graph's tensor T for external indices a_1..a_n by summing
 * the product of vertex tensors (δδ + δδ + δδ)/3 over every index value of every line, then
 * the projection (T·S)/(S·S) onto S = the symmetrized pairing tensor (two legs: δ).
 */
function bruteForce(g: Graph, N: number): number {
  const E = g.edges.length;
  const n = g.legs.length;
  const halfIndex: number[][] = g.vertices.map(() => []);
  const idx = new Array<number>(E + n).fill(0);
  g.edges.forEach((e, i) => {
    halfIndex[e.a]!.push(i);
    halfIndex[e.b]!.push(i);
  });
  g.legs.forEach((l, i) => halfIndex[l.vertex]!.push(E + i));
  const d = (x: number, y: number) => (idx[x] === idx[y] ? 1 : 0);
  const vertex = (h: number[]) => (d(h[0]!, h[1]!) * d(h[2]!, h[3]!) + d(h[0]!, h[2]!) * d(h[1]!, h[3]!) + d(h[0]!, h[3]!) * d(h[1]!, h[2]!)) / 3;
  const S = () => {
    const L = (i: number) => E + i;
    if (n === 2) return d(L(0), L(1));
    return (d(L(0), L(1)) * d(L(2), L(3)) + d(L(0), L(2)) * d(L(1), L(3)) + d(L(0), L(3)) * d(L(1), L(2))) / 3;
  };
  let TS = 0;
  let SS = 0;
  const total = N ** (E + n);
  for (let code = 0; code < total; code++) {
    let c = code;
    for (let k = 0; k < E + n; k++) {
      idx[k] = c % N;
      c = Math.floor(c / N);
    }
    let t = 1;
    for (const h of halfIndex) t *= vertex(h);
    // Internal indices summed (each assignment once); S² counted once per external assignment.
    const s = S();
    TS += t * s;
    SS += s * s;
  }
  // SS was summed over the internal indices too: divide out their N^E copies.
  return TS / (SS / N ** E);
}

describe('O(N) group factors (vertex tensor (δ_ab δ_cd + δ_ac δ_bd + δ_ad δ_bc)/3)', () => {
  it('tree vertex 1; s-channel bubble (N+8)/9 (issue 8); sunset (N+2)/3', () => {
    expect(gf('/ 1 1 1 1').text).toBe('1');
    expect(gf('1-2 1-2 / 1 1 2 2').text).toBe('8/9 + 1/9*N');
    expect(gf('1-2 1-2 1-2 / 1 2').text).toBe('2/3 + 1/3*N');
  });
  it('the bubble tensor itself: ((N+4) δ12δ34 + 2 δ13δ24 + 2 δ14δ23)/9, worked by hand', () => {
    const t = gf('1-2 1-2 / 1 1 2 2').pairings.map((p) => [p.pairs.map((x) => x.join('')).join(' '), formatPoly(p.coefficient)]);
    expect(t).toEqual([
      ['12 34', '4/9 + 1/9*N'],
      ['13 24', '2/9'],
      ['14 23', '2/9'],
    ]);
  });
  it('one-loop β coefficient (N+8)/3 = 2 Σ_bubbles G/S: three channels, S = 2 each ("Critical Properties of φ⁴-Theories", World Scientific 2001, ch. 11: β = −2εg + (N+8)/3 g² − …; with Z_λ = 1 + a₁ g/ε in D = 4 − 2ε, β₁ = 2a₁)', () => {
    const r = generateGraphs(on, { residue: ['phi', 'phi', 'phi', 'phi'], loops: 1 });
    let sum = Poly.ZERO;
    for (const g of r.graphs) sum = sum.add(groupFactor(on, g.graph)!.value.scale(Rational.of(1n, g.symmetryFactor)));
    expect(formatPoly(sum.scale(Rational.int(2)))).toBe(formatPoly(parsePoly('(N+8)/3')));
  });
  it('γ_φ = (N+2)/36 g² (same book; Phys. Rev. D 96 (2017) 036016): its N-dependence relative to N = 1 is the sunset group factor, (N+2)/3', () => {
    const p = gf('1-2 1-2 1-2 / 1 2').value;
    for (const N of [1, 2, 3, 7]) expect(evaluatePoly(p, { N }) / evaluatePoly(p, { N: 1 })).toBeCloseTo(((N + 2) / 36) / (1 / 12), 12);
  });
  it('agrees with brute-force index sums for N = 1, 2, 3 on every 1PI graph through two loops (two and four legs, tadpoles included)', () => {
    const graphs = [
      ...generateGraphs(on, { residue: ['phi', 'phi', 'phi', 'phi'], loops: 1, all: true }).graphs,
      ...generateGraphs(on, { residue: ['phi', 'phi', 'phi', 'phi'], loops: 2, all: true }).graphs,
      ...generateGraphs(on, { residue: ['phi', 'phi'], loops: 1, all: true }).graphs,
      ...generateGraphs(on, { residue: ['phi', 'phi'], loops: 2, all: true }).graphs,
    ];
    expect(graphs.length).toBe(3 + 12 + 1 + 2);
    for (const g of graphs) {
      const exact = groupFactor(on, g.graph)!.value;
      for (const N of [1, 2, 3]) expect(evaluatePoly(exact, { N })).toBeCloseTo(bruteForce(g.graph, N), 10);
    }
  });
  it('single-component theories have no group factor (factor 1); mismatched valence is a TheoryError', () => {
    expect(groupFactor(builtinTheory('phi4'), parseNotation('1-2 1-2 / 1 1 2 2'))).toBeNull();
    expect(() => groupFactor(on, parseNotation('1-2 1-2 1-2 / 1 2 1'))).toThrow(TheoryError);
  });
});

