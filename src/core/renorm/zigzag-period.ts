import { parsePoly } from '../algebra/parse-poly.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import { canonicalNotation } from '../canon/canonical-form.ts';
import { loopNumber } from '../graph/connectivity.ts';
import type { Graph } from '../graph/types.ts';
import type { GraphAnalysis } from '../hopf/hopf-algebra.ts';
import { omegaOfGraph } from '../theory/power-counting.ts';

/**
 * The zigzag graphs: primitive φ⁴ graphs whose completion (a new vertex joined to the four legs)
 * is the circulant C_{n+2}(1, 2) — the wheel with three spokes (n = 3, completion K5) and with
 * four (n = 4, the octahedron) are the first two. Their periods are known in closed form
 * ("Proof of the zig-zag conjecture", F. Brown, O. Schnetz, Ann. Math. 2016, arXiv:1208.1890;
 * conjectured in "Knots and numbers in φ⁴ theory to 7 loops and beyond", Int. J. Mod. Phys. C6
 * (1995) 519, hep-ph/9504352):
 *   P(Z_n) = 4 (2n−2)! / (n! (n−1)!) · (1 − (1 − (−1)ⁿ)/2^{2n−3}) · ζ(2n−3),
 * and the period does not depend on which vertex of the completion is removed ("Quantum periods:
 * A census of φ⁴-transcendentals", arXiv:0801.2856). The counterterm is then −P/(nε), as for
 * glue-and-cut. This is a published value used where no integral reduction reaches (the
 * zigzag with five loops and beyond), and a cross-check where one does.
 */
export function zigzagCounterterm(a: GraphAnalysis, D0: number): { ok: true; value: Series; loops: number } | { ok: false; reason: string } {
  const g = a.bound.graph;
  if (D0 !== 4 || a.subgraphs.length > 0 || omegaOfGraph(a.bound) !== 0 || g.legs.length !== 4) return { ok: false, reason: 'the zigzag periods are for primitive four-point φ⁴ graphs' };
  const n = loopNumber(g);
  if (n < 3) return { ok: false, reason: 'zigzag graphs have at least three loops' };
  if (g.edges.some((e) => e.a === e.b) || g.vertices.some((v) => v.counterterm)) return { ok: false, reason: 'not a zigzag graph' };
  const inf = g.vertices.length;
  const completion: Graph = {
    vertices: [...g.vertices.map((v) => ({ name: v.name })), { name: 'completion' }],
    edges: [...g.edges.map((e) => ({ a: e.a, b: e.b, field: 'x', oriented: false })), ...g.legs.map((l) => ({ a: l.vertex, b: inf, field: 'x', oriented: false }))],
    legs: [],
  };
  const N = n + 2;
  if (completion.vertices.length !== N) return { ok: false, reason: 'not a zigzag graph' };
  const circulant: Graph = {
    vertices: Array.from({ length: N }, (_, i) => ({ name: `c${i}` })),
    edges: Array.from({ length: N }, (_, i) => [
      { a: i, b: (i + 1) % N, field: 'x', oriented: false },
      { a: i, b: (i + 2) % N, field: 'x', oriented: false },
    ]).flat(),
    legs: [],
  };
  if (canonicalNotation(completion, { legs: 'unlabelled' }) !== canonicalNotation(circulant, { legs: 'unlabelled' })) return { ok: false, reason: 'not a zigzag graph' };
  const P = zigzagPeriod(n);
  return { ok: true, value: Series.monomial(parsePoly(`zeta(${2 * n - 3})`).scale(P.div(Rational.int(-n))), -1), loops: n };
}

/** The rational factor of P(Z_n) = c_n ζ(2n−3). */
export function zigzagPeriod(n: number): Rational {
  const fact = (k: number) => {
    let f = 1n;
    for (let i = 2n; i <= BigInt(k); i++) f *= i;
    return f;
  };
  const binomialPart = Rational.of(4n * fact(2 * n - 2), fact(n) * fact(n - 1));
  const sign = n % 2 === 0 ? Rational.ONE : Rational.ONE.sub(Rational.of(2n, 2n ** BigInt(2 * n - 3)));
  return binomialPart.mul(sign);
}
