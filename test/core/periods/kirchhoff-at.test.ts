import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { kirchhoffAt } from '../../../src/core/periods/kirchhoff-at.ts';
import { periodGraphFromEdges } from '../../../src/core/periods/period-graph.ts';

/** ψ = Σ over spanning trees (forests) T of Π_{e∉T} α_e, by trying every edge subset. */
function bruteForcePsi(V: number, edges: [number, number][], alpha: number[]): number {
  const components = (mask: number) => {
    const parent = Array.from({ length: V }, (_, i) => i);
    const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x]!)));
    let c = V;
    edges.forEach(([a, b], i) => {
      if (!((mask >> i) & 1)) return;
      const ra = find(a);
      const rb = find(b);
      if (ra !== rb) {
        parent[ra] = rb;
        c--;
      }
    });
    return c;
  };
  const c0 = components((1 << edges.length) - 1);
  const treeSize = V - c0;
  let sum = 0;
  for (let mask = 0; mask < 1 << edges.length; mask++) {
    let size = 0;
    for (let i = 0; i < edges.length; i++) size += (mask >> i) & 1;
    if (size !== treeSize || components(mask) !== c0) continue;
    let term = 1;
    edges.forEach((_, i) => {
      if (!((mask >> i) & 1)) term *= alpha[i]!;
    });
    sum += term;
  }
  return sum;
}

const K4: [number, number][] = [[0, 1], [0, 2], [0, 3], [1, 2], [1, 3], [2, 3]];

/** The naive way, for contrast: det Σ α_e c_e c_eᵀ for a fixed cycle basis of K4, Gaussian elimination. */
function naiveK4(alpha: number[]): number {
  const cycles: Record<number, number>[] = [{ 3: 1, 0: 1, 1: -1 }, { 4: 1, 0: 1, 2: -1 }, { 5: 1, 1: 1, 2: -1 }];
  const m = cycles.map((ci) => cycles.map((cj) => alpha.reduce((s, a, e) => s + a * (ci[e] ?? 0) * (cj[e] ?? 0), 0)));
  let det = 1;
  for (let k = 0; k < 3; k++) {
    det *= m[k]![k]!;
    for (let i = k + 1; i < 3; i++) {
      const f = m[i]![k]! / m[k]![k]!;
      for (let j = k; j < 3; j++) m[i]![j]! -= f * m[k]![j]!;
    }
  }
  return det;
}

describe('kirchhoffAt (ψ as a sector-adapted loop-matrix determinant)', () => {
  it('is α1 + α2 for the one-loop bubble', () => {
    const g = periodGraphFromEdges(2, [[0, 1], [0, 1]]);
    expect(kirchhoffAt(g, [2, 5]).value).toBeCloseTo(7, 12);
  });

  it('matches the spanning-tree sum on K4 at ordinary points', () => {
    const g = periodGraphFromEdges(4, K4);
    const a = [1, 2, 3, 4, 5, 6];
    expect(kirchhoffAt(g, a).value / bruteForcePsi(4, K4, a) - 1).toBeLessThan(1e-14);
  });

  it('keeps full relative accuracy when α spans 10^±100 (where naive elimination loses every digit)', () => {
    // A plain elimination of the unscaled loop matrix forms sums like α_big + α_small = α_big
    // and later cancels α_big against α_big: the small terms are lost.
    const hard = [1e26, 1e24, 1e22, 1e-28, 1e-27, 1e-26];
    expect(Math.abs(naiveK4(hard) / bruteForcePsi(4, K4, hard) - 1)).toBeGreaterThan(1);
    const g = periodGraphFromEdges(4, K4);
    for (const a of [
      hard,
      [1e60, 1e-60, 1e-60, 1, 1e30, 1e-30],
      [1e-60, 1e-59, 1e-58, 1e58, 1e59, 1e60],
      [1, 1 + 1e-15, 1 - 1e-15, 1e-100, 1e100, 1],
    ]) {
      const got = kirchhoffAt(g, a);
      const want = bruteForcePsi(4, K4, a);
      expect(Math.abs(got.value / want - 1)).toBeLessThan(1e-13);
      expect(got.ratio).toBeGreaterThanOrEqual(1);
      expect(got.ratio).toBeLessThanOrEqual(16); // K4 has 16 spanning trees
    }
  });

  it('gives log ψ when ψ itself overflows', () => {
    // K4 at α = 1e300 everywhere: ψ = 16·1e900.
    const r = kirchhoffAt(periodGraphFromEdges(4, K4), Array(6).fill(1e300));
    expect(r.value).toBe(Infinity);
    expect(r.log).toBeCloseTo(Math.log(16) + 900 * Math.log(10), 10);
    expect(r.ratio).toBeCloseTo(16, 12);
  });

  it('property: equals the spanning-forest sum on random multigraphs with self-loops and extreme α', () => {
    const arb = fc.record({
      V: fc.integer({ min: 1, max: 5 }),
      raw: fc.array(fc.tuple(fc.nat(4), fc.nat(4), fc.integer({ min: -50, max: 50 }), fc.double({ min: 1, max: 10, noNaN: true })), { minLength: 1, maxLength: 9 }),
    });
    fc.assert(fc.property(arb, ({ V, raw }) => {
      const edges = raw.map(([a, b]) => [a % V, b % V] as [number, number]);
      const alpha = raw.map(([, , p, m]) => m * 10 ** p);
      const got = kirchhoffAt(periodGraphFromEdges(V, edges), alpha).log;
      const want = Math.log(bruteForcePsi(V, edges, alpha));
      expect(Math.abs(got - want)).toBeLessThan(1e-12 * Math.max(1, Math.abs(want)));
    }), { numRuns: 300, seed: 42 });
  });
});
