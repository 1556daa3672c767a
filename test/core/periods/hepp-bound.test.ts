import { describe, expect, it } from 'vitest';
import { formatRational, heppBoundExact, rationalToNumber } from '../../../src/core/periods/hepp-bound-exact.ts';
import { periodGraphFromEdges, type PeriodGraph } from '../../../src/core/periods/period-graph.ts';
import { periodInput } from '../../../src/core/periods/period-input.ts';
import { buildSectorTables } from '../../../src/core/periods/sector-tables.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { circulant12, graph, WHEEL3 } from './graphs.ts';

/**
 * The Hepp bound written out plainly: the sum over all N! orderings of the edges (Hepp sectors
 * α_{σ1} > … > α_{σN}) of Π_{k=1}^{N−1} 1/sdc(the k smallest edges), sdc(γ) = |γ| − h·L(γ) —
 * "Hepp's bound for Feynman graphs and matroids", E. Panzer, Ann. Inst. Henri Poincaré D (2022),
 * arXiv:1908.09820, and the sector integral of "Tropical Monte Carlo quadrature for Feynman
 * integrals", M. Borinsky, Ann. Inst. Henri Poincaré D (2023), arXiv:2008.12310. Exact rationals
 * as [numerator, denominator] bigints.
 */
function bruteForceHepp(g: PeriodGraph): [bigint, bigint] {
  const N = g.edgeCount;
  const edges = Array.from({ length: N }, (_, i) => [g.ends[2 * i]!, g.ends[2 * i + 1]!] as const);
  const loopsOf = (set: number[]) => {
    const seen = new Set<number>();
    const adj = new Map<number, number[]>();
    for (const i of set) {
      const [a, b] = edges[i]!;
      adj.set(a, [...(adj.get(a) ?? []), b]);
      adj.set(b, [...(adj.get(b) ?? []), a]);
    }
    let components = 0;
    for (const v of adj.keys()) {
      if (seen.has(v)) continue;
      components++;
      const stack = [v];
      seen.add(v);
      while (stack.length) {
        for (const w of adj.get(stack.pop()!)!) {
          if (seen.has(w)) continue;
          seen.add(w);
          stack.push(w);
        }
      }
    }
    return set.length - adj.size + components;
  };
  const gcd = (a: bigint, b: bigint): bigint => (b === 0n ? a : gcd(b, a % b));
  let num = 0n;
  let den = 1n;
  const permute = (prefix: number[], rest: number[]) => {
    if (rest.length === 0) {
      let d = 1n;
      for (let k = 1; k < N; k++) d *= BigInt(k - g.halfDimension * loopsOf(prefix.slice(N - k)));
      num = num * d + den;
      den *= d;
      const c = gcd(num, den);
      num /= c;
      den /= c;
      return;
    }
    rest.forEach((e, i) => permute([...prefix, e], [...rest.slice(0, i), ...rest.slice(i + 1)]));
  };
  permute([], edges.map((_, i) => i));
  return [num, den];
}

const phi4 = builtinTheory('phi4');
const fourPoint = (text: string) => periodInput(graph(text), phi4).periodGraph;

describe('Hepp bound', () => {
  const cases: [string, PeriodGraph][] = [
    ['one-loop bubble', fourPoint('1-2 1-2 / 1 1 2 2')],
    ['wheel with three spokes', fourPoint(WHEEL3)],
    ['wheel with four spokes (octahedron minus a vertex)', fourPoint(circulant12(6))],
    ['φ³ triangle in six dimensions (h = 3)', periodGraphFromEdges(3, [[0, 1], [1, 2], [2, 0]], 3)],
  ];
  for (const [name, g] of cases) {
    it(`recursion = brute-force sum over all edge orderings: ${name}`, () => {
      const [p, q] = bruteForceHepp(g);
      const exact = heppBoundExact(buildSectorTables(g));
      expect([exact.numerator, exact.denominator]).toEqual([p, q]);
      expect(buildSectorTables(g).heppBound).toBeCloseTo(Number(p) / Number(q), 9);
    });
  }

  it('known small values: bubble 2, φ³ triangle 3, wheel with three spokes 84', () => {
    expect(formatRational(heppBoundExact(buildSectorTables(cases[0]![1])))).toBe('2');
    expect(formatRational(heppBoundExact(buildSectorTables(cases[3]![1])))).toBe('3');
    expect(formatRational(heppBoundExact(buildSectorTables(cases[1]![1])))).toBe('84');
  });

  it('exact and floating point agree on a 6-loop zigzag', () => {
    const t = buildSectorTables(fourPoint(circulant12(8)));
    const exact = heppBoundExact(t);
    expect(rationalToNumber(exact) / t.heppBound - 1).toBeLessThan(1e-13);
  });

  it('rationalToNumber is exact for huge numerators and denominators', () => {
    expect(rationalToNumber({ numerator: 10n ** 400n + 1n, denominator: 3n * 10n ** 399n })).toBeCloseTo(10 / 3, 14);
    expect(formatRational({ numerator: 7n, denominator: 8n })).toBe('7/8');
  });
});
