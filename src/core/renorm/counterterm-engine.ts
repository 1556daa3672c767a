import { Poly } from '../algebra/polynomial.ts';
import { polePart } from '../algebra/pole-part.ts';
import { Series } from '../algebra/series.ts';
import { contractParts } from '../graph/contract.ts';
import { subgraphAsGraph } from '../graph/extract-subgraph.ts';
import { bindGraph, type BoundGraph } from '../theory/bind-graph.ts';
import type { Theory } from '../theory/types.ts';
import { unlabelledLegsClassifier } from '../hopf/default-classifier.ts';
import { countertermMarks } from '../hopf/counterterm-structure.ts';
import { HopfAlgebra, type GraphAnalysis } from '../hopf/hopf-algebra.ts';
import { IntegralEvaluator, NotEvaluable } from '../integrals/evaluate-integral.ts';
import { loopsOf, type PropIntegral } from '../integrals/prop-integral.ts';
import type { Scheme } from '../schemes/scheme.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { infraredDivergence } from './infrared-safety.ts';
import { GeneralRStar } from './general-rstar.ts';
import { glueAndCut } from './glue-and-cut.ts';
import { zigzagCounterterm } from './zigzag-period.ts';
import { laplacianCounterterm } from './momentum-laplacian.ts';
import { omegaOfGraph } from '../theory/power-counting.ts';
import { loopNumber } from '../graph/connectivity.ts';
import { atReferencePoint, isLocal, logCoefficient, type ScalingTerm } from './momentum-series.ts';
import { routedIntegral } from './routed-integral.ts';
import { polesNegligible, seriesNegligible } from './negligible.ts';
import { choosePairs, type Routing } from './routings.ts';

/** The counterterm of one graph class, or why it has none that can be computed. */
export type CountertermValue =
  | { readonly ok: true; readonly value: Series; readonly detail: EvaluationDetail }
  | { readonly ok: false; readonly reason: string };

export interface EvaluationDetail {
  /** Routing used (vertex indices of the representative), or null when the graph needs none. */
  readonly routing: Routing | null;
  readonly routingsCompared: number;
  readonly routingsAgree: boolean;
  readonly method: string;
  /** R̄Γ term by term with its momentum scaling (p²)^{−lε}. */
  readonly subtracted: readonly ScalingTerm[];
  readonly local: boolean;
  /**
   * Set when the method yields the counterterm only, not R̄Γ on the true kinematics: `subtracted`
   * then holds −S_R alone, and finiteness and the renormalized value cannot be read from it.
   */
  readonly poleOnly?: string;
}

export interface EngineOptions {
  readonly cancel?: CancelToken;
  /** How many safe, evaluable routings to compare (the first gives the value). */
  readonly compareRoutings?: number;
}

/**
 * Counterterms S_R(Γ) = −R[R̄Γ] of massless scalar graphs, R̄Γ = φ(Γ) + Σ_α Π S_R(α_i) φ(Γ/α),
 * with φ evaluated exactly on a routing of the external momentum (DESIGN §5): infrared
 * rearrangement for logarithmically divergent graphs (momentum in at one vertex, out at another;
 * the MS counterterm does not depend on where), the true kinematics with p² = 1 for quadratically
 * divergent two-point graphs (the coefficient of p²). Every routing is checked for infrared safety
 * on the graph and on every cograph it uses. Results are memoized per isomorphism class.
 */
export class CountertermEngine {
  readonly algebra: HopfAlgebra;
  readonly evaluator: IntegralEvaluator;
  /** The infrared R-operation with its own memo of UV and IR counterterms of scalar graphs. */
  readonly rstar: GeneralRStar;
  private readonly memo = new Map<string, CountertermValue>();
  private readonly cancel: CancelToken;

  constructor(
    readonly theory: Theory,
    readonly scheme: Scheme,
    private readonly opts: EngineOptions = {},
  ) {
    this.algebra = new HopfAlgebra(theory, unlabelledLegsClassifier);
    this.cancel = opts.cancel ?? neverCancel;
    this.evaluator = new IntegralEvaluator({ D0: theory.dimension, loopFactor: (k) => scheme.loopFactor(theory.dimension, k), measure: scheme.measure(theory.dimension), cancel: this.cancel });
    this.rstar = new GeneralRStar(this.evaluator, theory.dimension, this.cancel);
    if (!scheme.minimal) throw new Error('CountertermEngine handles the minimal schemes; use the momentum-subtraction engine for mom');
  }

  /**
   * Supplies the counterterm of a graph class by hand (exact, or with approximate coefficients that
   * carry their error): it is used wherever that class appears — as the graph itself, or as a
   * subgraph in the subtractions of larger graphs and in Z-factors.
   */
  supplyCounterterm(g: BoundGraph, value: Series, note = 'value supplied by the user'): void {
    const key = this.algebra.classOf(g);
    this.memo.set(key, { ok: true, value, detail: { routing: null, routingsCompared: 0, routingsAgree: true, method: note, subtracted: [{ loops: 0, value: value.neg() }], local: true } });
    this.supplied.add(key);
  }

  /** Whether a class's counterterm was supplied by hand rather than computed. */
  isSupplied(g: BoundGraph): boolean {
    return this.supplied.has(this.algebra.classOf(g));
  }

  private readonly supplied = new Set<string>();

  /** S_R of a graph (by class). */
  counterterm(g: BoundGraph): CountertermValue {
    const key = this.algebra.classOf(g);
    const hit = this.memo.get(key);
    if (hit) return hit;
    const result = this.compute(this.algebra.analyze(this.algebra.representative(key)));
    this.memo.set(key, result);
    return result;
  }

  private compute(a: GraphAnalysis): CountertermValue {
    this.cancel.throwIfCancelled();
    if (!a.divergent) return { ok: true, value: Series.ZERO, detail: { routing: null, routingsCompared: 0, routingsAgree: true, method: 'superficially convergent: no counterterm', subtracted: [], local: true } };
    const bg = a.bound;
    const pairs = choosePairs(a);
    if (!pairs.ok) return { ok: false, reason: pairs.reason };
    if (pairs.pairs.length === 0) {
      // Two-point graph with both legs on one vertex: no momentum flows, p-independent: no p² counterterm.
      return { ok: true, value: Series.ZERO, detail: { routing: null, routingsCompared: 0, routingsAgree: true, method: 'no momentum flows through the graph (massless tadpole type): the p² counterterm vanishes', subtracted: [], local: true } };
    }
    const found: { routing: Routing; value: Series; terms: ScalingTerm[]; local: boolean; method: string }[] = [];
    const reasons: string[] = [];
    const want = Math.max(1, this.opts.compareRoutings ?? 2);
    // Infrared-safe routings first; then, for what is still missing, routings made safe by R*.
    for (const rstar of [false, true]) {
      for (const r of pairs.pairs) {
        if (found.length >= want) break;
        if (found.some((f) => f.routing === r)) continue;
        const tried = this.subtractedOnRouting(a, r, rstar);
        if (!tried.ok) {
          if (!rstar) reasons.push(tried.reason);
          continue;
        }
        const K = polePart(atReferencePoint(tried.terms));
        found.push({ routing: r, value: K.neg(), terms: tried.terms, local: isLocal(tried.terms, a.bound.graph.edges.length), method: tried.method });
      }
    }
    // Primitive graphs: glue-and-cut gives the counterterm from a finite integral one loop lower —
    // the value when no routing works, and a second method when fewer than `want` routings did.
    const glued = a.subgraphs.length === 0 && found.length < want ? glueAndCut(a, this.evaluator, this.theory.dimension) : null;
    // Zigzag graphs: their period is known in closed form — a value where nothing else reaches, a check otherwise.
    const zig = a.subgraphs.length === 0 ? zigzagCounterterm(a, this.theory.dimension) : null;
    if (found.length === 0) {
      const box = omegaOfGraph(bg) === 2 && bg.graph.legs.length === 2 ? laplacianCounterterm(a, this.theory.dimension, this.rstar, want) : null;
      if (box?.ok) {
        return poleOnlyValue(bg, box.value, box.method, box.routingsCompared, box.routingsAgree, 'the □_p route gives the pole part only: R̄Γ on the true kinematics is what could not be evaluated');
      }
      if (zig?.ok) {
        const agree = !glued?.ok || seriesEqual(glued.value, zig.value);
        const method = `the zigzag period in closed form (Brown–Schnetz, arXiv:1208.1890): S = −P(Z_${zig.loops})/(${zig.loops}ε)${glued?.ok ? '; compared with glue-and-cut' : ''}`;
        return poleOnlyValue(bg, zig.value, method, glued?.ok ? 2 : 1, agree, 'a closed-form period gives the pole part only: R̄Γ on the true kinematics was not evaluated');
      }
      if (glued?.ok) {
        const name = (e: number) => `${bg.graph.vertices[bg.graph.edges[e]!.a]!.name}-${bg.graph.vertices[bg.graph.edges[e]!.b]!.name}`;
        return poleOnlyValue(bg, glued.value, `glue-and-cut: the period from the finite integral with line ${glued.line + 1} (${name(glued.line)}) cut`, 1, true, 'glue-and-cut gives the pole part only (the period): R̄Γ on the true kinematics was not evaluated');
      }
      return { ok: false, reason: `no routing of the external momentum is both infrared safe and evaluable; ${summarize(reasons)}${glued && !glued.ok ? `; glue-and-cut: ${glued.reason}` : ''}${box && !box.ok ? `; □_p: ${box.reason}` : ''}` };
    }
    const first = found[0]!;
    const values = [...found.map((f) => f.value), ...(glued?.ok ? [glued.value] : []), ...(zig?.ok ? [zig.value] : [])];
    const agree = values.every((v) => seriesEqual(v, first.value));
    return {
      ok: true,
      value: first.value,
      detail: { routing: first.routing, routingsCompared: values.length, routingsAgree: agree, method: first.method + (glued?.ok ? '; cross-checked by glue-and-cut' : '') + (zig?.ok ? '; cross-checked by the zigzag period' : ''), subtracted: first.terms, local: first.local },
    };
  }

  /** R̄Γ on one routing, term by term, or why the routing fails. */
  subtractedOnRouting(a: GraphAnalysis, r: Routing, rstar = false): { ok: true; terms: ScalingTerm[]; method: string } | { ok: false; reason: string } {
    const bg = a.bound;
    const where = `routing ${bg.graph.vertices[r.u]!.name}→${bg.graph.vertices[r.v]!.name}`;
    const main = routedIntegral(bg, r.u, r.v);
    if (!main.ok) return { ok: false, reason: main.reason };
    const pieces: { coefficient: Series; integral: PropIntegral }[] = [];
    let irTerms = 0;
    // R̃ on one term of R̄: the term itself when infrared safe, else its infrared subtractions (R*).
    const addPiece = (coefficient: Series, integral: PropIntegral, what: string): string | null => {
      const ir = infraredDivergence(integral, this.theory.dimension);
      if (!ir) {
        pieces.push({ coefficient, integral });
        return null;
      }
      if (!rstar) return `${where}: ${what} is infrared divergent when lines ${ir.softLines.map((k) => k + 1).join(',')} go soft`;
      const sub = this.rstar.subtract(integral);
      if (!sub.ok) return `${where}: ${what}: ${sub.reason}`;
      for (const t of sub.terms) {
        pieces.push({ coefficient: coefficient.mul(t.coefficient), integral: t.integral });
        if (t.deleted.length) irTerms++;
      }
      return null;
    };
    const failMain = addPiece(Series.ONE, main.integral, 'the graph');
    if (failMain) return { ok: false, reason: failMain };
    for (const adm of a.admissible) {
      const comps = adm.components.map((i) => a.subgraphs[i]!);
      let coefficient = Series.ONE;
      for (const c of comps) {
        const sub = bindGraph(subgraphAsGraph(bg.graph, c.edgeList).graph, this.theory);
        const ct = this.counterterm(sub);
        if (!ct.ok) return { ok: false, reason: `the counterterm of a subgraph is not available (${ct.reason})` };
        coefficient = coefficient.mul(ct.value);
      }
      if (coefficient.isZero()) continue;
      const parts = comps.map((c) => ({ edges: c.edgeList, mark: countertermMarks(this.theory, c.residue, c.omega)[0]! }));
      const { graph: q, vertexMap } = contractParts(bg.graph, parts);
      const routedQ = routedIntegral(bindGraph(q, this.theory), vertexMap[r.u]!, vertexMap[r.v]!);
      if (!routedQ.ok) return { ok: false, reason: `${where}: ${routedQ.reason}` };
      const failQ = addPiece(coefficient, routedQ.integral, `the cograph after contracting lines ${comps.map((c) => c.edgeList.map((e) => e + 1).join(',')).join(' | ')}`);
      if (failQ) return { ok: false, reason: failQ };
    }
    const terms: ScalingTerm[] = [];
    const before = { ...this.evaluator.log };
    try {
      for (const p of pieces) {
        // φ(Γ/α) through ε^{−val(coefficient)} so that the product is known through ε⁰.
        const need = p.coefficient.isZero() ? 0 : -p.coefficient.val;
        const v = this.evaluator.evaluate(p.integral, need);
        terms.push({ loops: loopsOf(p.integral), value: p.coefficient.mul(v) });
      }
    } catch (e) {
      if (e instanceof NotEvaluable) return { ok: false, reason: `${where}: ${e.message}` };
      throw e;
    }
    const log = this.evaluator.log;
    const steps = `${log.bubbles - before.bubbles} bubble(s), ${log.triangles - before.triangles} triangle rule(s), ${log.factorizations - before.factorizations} factorization(s)`;
    const rs = irTerms ? `; R*: ${irTerms} infrared counterterm term(s)` : '';
    return { ok: true, terms, method: `${where}; ${pieces.length} term(s) of R̄${rs}; ${steps} (new integrals only)` };
  }
}

/** A counterterm from a method that gives its pole part only: `subtracted` holds −S alone. */
function poleOnlyValue(bg: BoundGraph, value: Series, method: string, routingsCompared: number, routingsAgree: boolean, poleOnly: string): CountertermValue {
  return { ok: true, value, detail: { routing: null, routingsCompared, routingsAgree, method, subtracted: [{ loops: loopNumber(bg.graph), value: value.neg() }], local: true, poleOnly } };
}

function seriesEqual(x: Series, y: Series): boolean {
  return seriesNegligible(x.sub(y));
}

function summarize(reasons: string[]): string {
  const uniq = [...new Set(reasons)];
  return uniq.slice(0, 3).join('; ') + (uniq.length > 3 ? `; and ${uniq.length - 3} more` : '');
}

/** The renormalized value φ_R = R̄Γ + S_R(Γ) as a polynomial in L = ln(p²/μ²) at ε⁰, and whether it is finite. */
export function renormalizedValue(terms: readonly ScalingTerm[], counterterm: Series, maxJ: number): { finite: boolean; coefficients: Poly[] } {
  const out: Poly[] = [];
  let finite = true;
  for (let j = 0; j <= maxJ; j++) {
    let c = logCoefficient(terms, j);
    if (j === 0) c = c.add(counterterm);
    if (!polesNegligible(c)) finite = false;
    out.push(c.order >= 0 ? c.coeff(0) : Poly.ZERO);
  }
  while (out.length > 1 && out[out.length - 1]!.isZero()) out.pop();
  return { finite, coefficients: out };
}
