import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import { contractParts } from '../graph/contract.ts';
import { subgraphAsGraph } from '../graph/extract-subgraph.ts';
import { bindGraph, type BoundGraph } from '../theory/bind-graph.ts';
import { omegaOfGraph } from '../theory/power-counting.ts';
import type { Theory } from '../theory/types.ts';
import { unlabelledLegsClassifier } from '../hopf/default-classifier.ts';
import { countertermMarks } from '../hopf/counterterm-structure.ts';
import { HopfAlgebra, type GraphAnalysis } from '../hopf/hopf-algebra.ts';
import { IntegralEvaluator, NotEvaluable } from '../integrals/evaluate-integral.ts';
import { loopsOf } from '../integrals/prop-integral.ts';
import { schemeOf } from '../schemes/scheme.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { infraredDivergence } from './infrared-safety.ts';
import { logCoefficient, type ScalingTerm } from './momentum-series.ts';
import { routedIntegral } from './routed-integral.ts';
import { polesNegligible } from './negligible.ts';
import type { Routing } from './routings.ts';

export type MomResult =
  | { ok: true; value: Series; routing: Routing; method: string; finite: boolean; renormalized: Poly[]; expCheck: { checked: boolean; ok: boolean; note: string } }
  | { ok: false; reason: string };

/**
 * Momentum subtraction (DESIGN §6): R evaluates at the subtraction point — two-point graphs at
 * p² = μ², four-point graphs at the exceptional point where p enters at leg 1 and leaves at leg 2
 * (all other legs at zero momentum). A subgraph's legs carry no labels of their own, so its
 * subtraction is the average over which two of its legs carry the momentum — the same as
 * subtracting the whole Green function at that point, graph class by graph class. Where a
 * configuration has no momentum flowing through (two chosen legs on one vertex) or is infrared
 * divergent, the point is not infrared safe in the massless theory and the request is refused.
 */
export function momCounterterm(theory: Theory, bg: BoundGraph, opts: { cancel?: CancelToken } = {}): MomResult {
  const H = new HopfAlgebra(theory, unlabelledLegsClassifier);
  const ev = new IntegralEvaluator({ D0: theory.dimension, loopFactor: (k) => schemeOf('mom').loopFactor(theory.dimension, k), measure: schemeOf('mom').measure(theory.dimension), cancel: opts.cancel ?? neverCancel });
  const memo = new Map<string, { value: Series } | { reason: string }>();

  const subtracted = (a: GraphAnalysis, r: Routing, order: number): ScalingTerm[] => {
    const g = a.bound.graph;
    const main = routedIntegral(a.bound, r.u, r.v);
    if (!main.ok) throw new NotEvaluable(main.reason);
    if (infraredDivergence(main.integral, theory.dimension)) throw new NotEvaluable(`the subtraction point is not infrared safe for ${g.vertices[r.u]!.name}→${g.vertices[r.v]!.name}`);
    const terms: ScalingTerm[] = [{ loops: loopsOf(main.integral), value: ev.evaluate(main.integral, order) }];
    for (const adm of a.admissible) {
      const comps = adm.components.map((i) => a.subgraphs[i]!);
      const { graph: q, vertexMap } = contractParts(g, comps.map((c) => ({ edges: c.edgeList, mark: countertermMarks(theory, c.residue, c.omega)[0]! })));
      const rq = routedIntegral(bindGraph(q, theory), vertexMap[r.u]!, vertexMap[r.v]!);
      if (!rq.ok) throw new NotEvaluable(rq.reason);
      if (infraredDivergence(rq.integral, theory.dimension)) throw new NotEvaluable('a cograph is infrared divergent at the subtraction point');
      // Cograph values have at most 2L poles: the counterterms are needed that much further.
      const lq = loopsOf(rq.integral);
      let coefficient = Series.ONE;
      for (const c of comps) coefficient = coefficient.mul(counterterm(bindGraph(subgraphAsGraph(g, c.edgeList).graph, theory), order + 2 * lq));
      const v = ev.evaluate(rq.integral, order + (coefficient.coeffs.length ? -coefficient.val : 0));
      terms.push({ loops: lq, value: coefficient.mul(v) });
    }
    return terms;
  };

  /** The class counterterm, averaged over the leg pairs that may carry the momentum. */
  const counterterm = (g: BoundGraph, order: number): Series => {
    const key = `${H.classOf(g)}@${order}`;
    const hit = memo.get(key);
    if (hit) {
      if ('reason' in hit) throw new NotEvaluable(hit.reason);
      return hit.value;
    }
    try {
      const a = H.analyze(H.representative(H.classOf(g)));
      const legs = a.bound.graph.legs;
      const pairs: Routing[] = [];
      for (let i = 0; i < legs.length; i++) for (let j = i + 1; j < legs.length; j++) pairs.push({ u: legs[i]!.vertex, v: legs[j]!.vertex });
      if (omegaOfGraph(a.bound) === 2) pairs.splice(1);
      let sum = Series.ZERO;
      for (const r of pairs) {
        if (r.u === r.v) throw new NotEvaluable('a four-point subgraph with two legs on one vertex has no momentum flowing at the exceptional point (infrared divergent in the massless theory)');
        sum = sum.add(terms(subtracted(a, r, order)));
      }
      const value = sum.scale(Poly.constant(Rational.of(-1, pairs.length))).truncate(order);
      memo.set(key, { value });
      return value;
    } catch (e) {
      if (e instanceof NotEvaluable) memo.set(key, { reason: e.message });
      throw e;
    }
  };
  const terms = (ts: ScalingTerm[]) => ts.reduce((s, t) => s.add(t.value), Series.ZERO);

  try {
    const a = H.analyze(bg);
    if (!a.divergent) return { ok: false, reason: 'the graph is superficially convergent: it has no counterterm' };
    const g = bg.graph;
    const omega = omegaOfGraph(bg);
    if (!((omega === 0 && g.legs.length >= 2) || (omega === 2 && g.legs.length === 2))) return { ok: false, reason: `no momentum-subtraction point is defined for a graph with ω = ${omega} and ${g.legs.length} legs` };
    const r: Routing = { u: g.legs[0]!.vertex, v: g.legs[1]!.vertex };
    if (r.u === r.v) return { ok: false, reason: 'legs 1 and 2 sit on the same vertex: at the subtraction point no momentum flows through the graph, which is infrared divergent in the massless theory' };
    const ts = subtracted(a, r, 0);
    const value = terms(ts).neg();
    const ren: Poly[] = [];
    let finite = true;
    for (let j = 0; j <= g.edges.length; j++) {
      let c = logCoefficient(ts, j);
      if (j === 0) c = c.add(value);
      if (!polesNegligible(c)) finite = false;
      ren.push(c.order >= 0 ? c.coeff(0) : Poly.ZERO);
    }
    while (ren.length > 1 && ren[ren.length - 1]!.isZero()) ren.pop();
    const primitive = a.subgraphs.length === 0;
    const expCheck = primitive
      ? { checked: true, ok: ren.length <= 2, note: 'primitive graph: φ_R must be linear in ln(p²/μ²)' }
      : { checked: false, ok: true, note: 'the convolution exponential needs the linear coefficients of subgraphs and cographs; not checked' };
    return { ok: true, value, routing: r, method: `momentum subtraction at p² = μ², p in at leg 1, out at leg 2; ${ts.length} term(s) of R̄`, finite, renormalized: ren, expCheck };
  } catch (e) {
    if (e instanceof NotEvaluable) return { ok: false, reason: e.message };
    throw e;
  }
}
