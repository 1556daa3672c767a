import { describe, expect, it } from 'vitest';
import { estimatePeriod, preparePeriod, type PeriodEstimate } from '../../../src/core/periods/period-estimate.ts';
import { periodInput } from '../../../src/core/periods/period-input.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import { circulant12, glueAlongTriangle, graph, WHEEL3, ZETA, zigzagPeriod } from './graphs.ts';

// Known periods from "Quantum periods: A census of φ⁴-transcendentals" (Schnetz, Commun. Number
// Theory Phys. 4 (2010) 1, arXiv:0801.2856) and the zigzag formula of "Single-valued multiple
// polylogarithms and a proof of the zig-zag conjecture" (Brown & Schnetz, J. Number Theory 148
// (2015) 478, arXiv:1208.1890), computed by tropical importance sampling ("Tropical Monte Carlo
// quadrature for Feynman integrals", Borinsky, Ann. Inst. Henri Poincaré D (2023), arXiv:2008.12310).
// Seeds are fixed, so these runs are deterministic; the tolerance is 4 standard errors.

const phi4 = builtinTheory('phi4');
const period = (text: string, samples: number, seed: number, removeVertex?: string): PeriodEstimate => {
  const input = periodInput(graph(text), phi4, removeVertex === undefined ? {} : { removeVertex });
  return estimatePeriod(preparePeriod(input.periodGraph), { samples, seed });
};
const within = (e: PeriodEstimate, exact: number, sigmas = 4) => {
  expect(Math.abs(e.value - exact)).toBeLessThan(sigmas * e.error);
};

describe('periods of primitive φ⁴ graphs', () => {
  it('one-loop bubble: P = 1 (∫₀^∞ dα/(1+α)²)', () => {
    within(period('1-2 1-2 / 1 1 2 2', 50_000, 3), 1);
  });

  it('wheel with three spokes (K4 as a four-point graph): 6ζ(3)', () => {
    const e = period(WHEEL3, 400_000, 11);
    within(e, 6 * ZETA[3]!);
    expect(e.error / e.value).toBeLessThan(2e-3);
    expect(e.heppBound).toBe(84);
  });

  it('wheel with four spokes (completed: the octahedron): 20ζ(5)', () => {
    within(period(circulant12(6), 200_000, 12), 20 * ZETA[5]!);
  });

  for (const [n, samples] of [[3, 100_000], [4, 100_000], [5, 100_000], [6, 100_000]] as const) {
    it(`zigzag Z_${n} (C_${n + 2}(1,2) minus a vertex): zigzag formula ${zigzagPeriod(n).toFixed(4)}`, () => {
      within(period(circulant12(n + 2), samples, 20 + n), zigzagPeriod(n));
    });
  }

  it('the zigzag formula gives 6ζ(3), 20ζ(5), 441/8 ζ(7), 168ζ(9)', () => {
    expect(zigzagPeriod(3)).toBeCloseTo(6 * ZETA[3]!, 12);
    expect(zigzagPeriod(4)).toBeCloseTo(20 * ZETA[5]!, 12);
    expect(zigzagPeriod(5)).toBeCloseTo((441 / 8) * ZETA[7]!, 12);
    expect(zigzagPeriod(6)).toBeCloseTo(168 * ZETA[9]!, 12);
  });

  it('the statistical error shrinks like 1/√samples', () => {
    const small = period(WHEEL3, 4096 * 10, 5);
    const large = period(WHEEL3, 4096 * 160, 5);
    const ratio = small.error / large.error;
    expect(ratio).toBeGreaterThan(4 * 0.85);
    expect(ratio).toBeLessThan(4 * 1.15);
  });

  it('same seed, same value; another seed, another (consistent) value', () => {
    const a = period(WHEEL3, 20_000, 9);
    expect(period(WHEEL3, 20_000, 9)).toEqual(a);
    const b = period(WHEEL3, 20_000, 10);
    expect(b.value).not.toBe(a.value);
    expect(Math.abs(a.value - b.value)).toBeLessThan(5 * Math.hypot(a.error, b.error));
  });
});

describe('completed graphs: completion invariance and the product rule (census, arXiv:0801.2856)', () => {
  // K5 (completed wheel 3) and the octahedron (completed wheel 4) glued along a triangle: a
  // completed 6-loop graph with the three-vertex cut {a, b, c}; its period is 6ζ(3)·20ζ(5).
  const k5 = circulant12(5, 'p');
  const octahedron = circulant12(6, 'q');
  const glued = glueAlongTriangle(k5, octahedron, ['p0', 'q0'], ['p1', 'q1'], ['p2', 'q2']);

  it('the glued graph is completed: 8 vertices, 16 lines, every vertex 4-valent', () => {
    const g = graph(glued);
    expect(g.vertices.length).toBe(8);
    expect(g.edges.length).toBe(16);
    const degree = g.vertices.map((_, v) => g.edges.reduce((d, e) => d + (e.a === v ? 1 : 0) + (e.b === v ? 1 : 0), 0));
    expect(new Set(degree)).toEqual(new Set([4]));
  });

  it('removing a cut vertex, a vertex on the K5 side or one on the octahedron side gives the same period', () => {
    const cut = period(glued, 150_000, 31, 'a');
    const left = period(glued, 150_000, 32, 'p3');
    const right = period(glued, 150_000, 33, 'q4');
    expect(Math.abs(cut.value - left.value)).toBeLessThan(4 * Math.hypot(cut.error, left.error));
    expect(Math.abs(cut.value - right.value)).toBeLessThan(4 * Math.hypot(cut.error, right.error));
    expect(Math.abs(left.value - right.value)).toBeLessThan(4 * Math.hypot(left.error, right.error));
    within(cut, 120 * ZETA[3]! * ZETA[5]!);
  });

  it('product rule: P(glued) = P(K5) · P(octahedron), each computed here', () => {
    const whole = period(glued, 150_000, 41);
    const p1 = period(k5, 200_000, 42);
    const p2 = period(octahedron, 200_000, 43);
    const product = p1.value * p2.value;
    const productError = product * Math.hypot(p1.error / p1.value, p2.error / p2.value);
    expect(Math.abs(whole.value - product)).toBeLessThan(4 * Math.hypot(whole.error, productError));
  });

  it('K5 with each vertex removed in turn: the same four-point graph up to relabelling, the same period', () => {
    const values = ['p0', 'p1', 'p2', 'p3', 'p4'].map((v, i) => period(k5, 50_000, 50 + i, v));
    for (const e of values) within(e, 6 * ZETA[3]!);
  });
});
