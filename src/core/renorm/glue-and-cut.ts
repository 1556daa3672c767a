import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import { loopNumber } from '../graph/connectivity.ts';
import type { GraphAnalysis } from '../hopf/hopf-algebra.ts';
import { IntegralEvaluator, NotEvaluable } from '../integrals/evaluate-integral.ts';
import { omegaOfGraph } from '../theory/power-counting.ts';
import { infraredDivergence } from './infrared-safety.ts';
import { routedIntegral } from './routed-integral.ts';

/**
 * Glue-and-cut for primitive graphs (DESIGN §5 and §8): a primitive logarithmically divergent
 * graph Γ with L loops has Z(Γ) = −P/(Lε), and its period P is the value at ε = 0 of the finite
 * (L−1)-loop propagator integral Γ∖e with the momentum in and out at the ends of a line e — the
 * line e closes the propagator into Γ again ("gluing"), e.g. K4 minus a line is the two-loop master,
 * 6ζ(3) ("Integration by parts: the algorithm to calculate β-functions in 4 loops", Nucl. Phys.
 * B192 (1981) 159; "Quantum periods: A census of φ⁴-transcendentals", arXiv:0801.2856). Only an
 * ε⁰ value of a lower-loop integral is needed, which is much cheaper than the pole of Γ itself.
 */
export function glueAndCut(a: GraphAnalysis, evaluator: IntegralEvaluator, D0: number): { ok: true; value: Series; line: number } | { ok: false; reason: string } {
  const bg = a.bound;
  if (a.subgraphs.length > 0) return { ok: false, reason: 'glue-and-cut applies to primitive graphs only' };
  if (omegaOfGraph(bg) !== 0) return { ok: false, reason: 'glue-and-cut needs a logarithmically divergent graph' };
  const L = loopNumber(bg.graph);
  const reasons: string[] = [];
  for (let e = 0; e < bg.graph.edges.length; e++) {
    const { a: u, b: v } = bg.graph.edges[e]!;
    if (u === v) continue;
    const cut = { ...bg, graph: { ...bg.graph, edges: bg.graph.edges.filter((_, k) => k !== e) } };
    const routed = routedIntegral(cut, u, v);
    if (!routed.ok) return { ok: false, reason: routed.reason };
    if (infraredDivergence(routed.integral, D0)) {
      reasons.push(`cutting line ${e + 1} leaves an infrared divergence`);
      continue;
    }
    try {
      const p = evaluator.evaluate(routed.integral, 0);
      if (p.coeffs.length && p.val < 0) {
        reasons.push(`cutting line ${e + 1} leaves a divergent integral`);
        continue;
      }
      const P = p.coeff(0);
      return { ok: true, value: Series.monomial(P.scale(Rational.of(-1, L)), -1), line: e };
    } catch (err) {
      if (err instanceof NotEvaluable) {
        reasons.push(`cutting line ${e + 1}: ${err.message}`);
        continue;
      }
      throw err;
    }
  }
  return { ok: false, reason: reasons[0] ?? 'no line to cut' };
}

export { Poly };
