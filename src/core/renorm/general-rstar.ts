import { Poly } from '../algebra/polynomial.ts';
import { polePart } from '../algebra/pole-part.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import { LimitError } from '../errors.ts';
import { IntegralEvaluator, NotEvaluable } from '../integrals/evaluate-integral.ts';
import { indexText, type LineIndex } from '../integrals/line-index.ts';
import type { PropIntegral } from '../integrals/prop-integral.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { mergeChains } from './merge-chains.ts';
import type { SoftRegion } from './infrared-safety.ts';
import { dualGraph, infraredSpinneys, infraredSubgraphs, uvSpinneys, uvSubgraphs, type UvSubgraph } from './rstar-subgraphs.ts';
import { contractGroups, linesVertexIrreducible, loopsOfLines, piecesAround, scalarGraphKey, subgraphOfLines, touchedVertices, uvDegree, type ScalarGraph } from './scalar-graph.ts';

/** One term of R̃ applied to an integral: Π Z̃ over the soft subgraphs deleted, times what is left. */
export interface InfraredTerm {
  readonly coefficient: Series;
  readonly integral: PropIntegral;
  /** Soft lines deleted (indices into the chain-merged integral). */
  readonly deleted: readonly number[];
}

/**
 * The infrared R-operation R̃ with arbitrary infrared subgraphs, and the counterterms it needs
 * ("Infrared R-operation and ultraviolet counterterms in the MS-scheme", Phys. Lett. B114 (1982)
 * 340; "R*-operation corrected", Phys. Lett. B144 (1984) 419; the vacuum-graph form of the
 * infrared counterterm as in "The R*-operation for Feynman graphs with generic numerators",
 * JHEP 05 (2017) 037, arXiv:1703.03776).
 *
 *   R̃X = Σ_{S̃} Π_{γ̃∈S̃} Z̃(γ̃) · X∖S̃,
 *
 * the sum over sets of infrared subgraphs that go soft together (rstar-subgraphs.ts); deleting a
 * soft subgraph sets its momenta to zero, and Z̃(γ̃) depends only on its dual vacuum graph V (the
 * soft lines with the hard part shrunk to a vertex O). Z̃ of a single soft line of index
 * D0/2 + bε is the pole of ∫d^Dk/(k²)^ν near k = 0: 1/(Γ(D0/2)(1+b)ε). For larger V it follows from
 * R* of the scaleless vacuum graph vanishing: the only terms of R*V that survive are those whose
 * UV spinney S and IR spinney S̃ leave nothing to integrate, so
 *
 *   Z̃(V) = −Z(V) − Σ_{S ≠ ∅, V} Π Z(γ) · Σ_{S̃ covering V/S} Π Z̃(γ̃),
 *
 * where Z(V) = −K R*V is the UV counterterm of the logarithmically divergent V, found by infrared
 * rearrangement: the momentum routed between any two of its vertices, with R* again for the soft
 * regions that routing creates (smaller ones: the recursion ends). Results are memoized per
 * isomorphism class. Every method throws NotEvaluable with the reason when it gets stuck.
 */
export class GeneralRStar {
  private readonly uvMemo = new Map<string, Series | string>();
  private readonly irMemo = new Map<string, Series | string>();
  private readonly cancel: CancelToken;
  readonly log = { uvCounterterms: 0, irCounterterms: 0 };

  constructor(
    private readonly evaluator: IntegralEvaluator,
    private readonly D0: number,
    cancel?: CancelToken,
  ) {
    this.cancel = cancel ?? neverCancel;
  }

  /** R̃ on an integral (momentum in at s, out at t), or why it cannot be formed. */
  subtract(I: PropIntegral): { ok: true; terms: InfraredTerm[]; subgraphs: number } | { ok: false; reason: string } {
    try {
      return { ok: true, ...this.rtilde(I) };
    } catch (e) {
      // Too large for subsets of lines: this routing is out of reach, others may not be.
      if (e instanceof NotEvaluable || e instanceof LimitError) return { ok: false, reason: e.message };
      throw e;
    }
  }

  private rtilde(I: PropIntegral): { terms: InfraredTerm[]; subgraphs: number } {
    const M = mergeChains(I);
    const subs = infraredSubgraphs(M, this.D0);
    if (subs.length === 0) return { terms: [{ coefficient: Series.ONE, integral: I, deleted: [] }], subgraphs: 0 };
    this.refusePowerDivergence(M, subs);
    const terms: InfraredTerm[] = [];
    for (const sp of infraredSpinneys(M, subs, this.D0)) {
      let coefficient = Series.ONE;
      const deleted: number[] = [];
      for (const i of sp) {
        coefficient = coefficient.mul(this.irCounterterm(dualGraph(M, subs[i]!)));
        deleted.push(...subs[i]!.softLines);
      }
      if (coefficient.isZero()) continue;
      terms.push({ coefficient, integral: { ...M, lines: M.lines.filter((_, k) => !deleted.includes(k)) }, deleted });
    }
    return { terms, subgraphs: subs.length };
  }

  private refusePowerDivergence(I: PropIntegral, subs: readonly SoftRegion[]): void {
    const worse = subs.find((r) => r.degree < 0);
    if (worse) {
      const idx = worse.softLines.map((k) => indexText(I.lines[k]!.index)).join(', ');
      throw new NotEvaluable(`a soft subgraph (lines of index ${idx}) diverges worse than logarithmically in the infrared (degree ${worse.degree}); R* would need derivatives of δ-functions`);
    }
  }

  /** Z̃ of a logarithmically IR-divergent soft subgraph, given by its dual vacuum graph (O = vertex 0). */
  irCounterterm(V: ScalarGraph): Series {
    if (V.lines.length === 1 && V.lines[0]!.u === V.lines[0]!.v) return this.singleLoopPole(V.lines[0]!.index);
    const key = scalarGraphKey(V, [0]);
    return this.memoized(this.irMemo, key, () => {
      this.log.irCounterterms++;
      let z = this.uvCounterterm(V).neg();
      const subs = uvSubgraphs(V, this.D0);
      for (const sp of uvSpinneys(subs)) {
        if (sp.length === 0) continue;
        const zS = this.spinneyCounterterm(V, sp.map((i) => subs[i]!));
        if (zS.isZero()) continue;
        const { graph: W, map } = contractGroups(V, sp.map((i) => subs[i]!.lines));
        if (W.lines.length === 0) {
          z = z.sub(zS);
          continue;
        }
        const WI: PropIntegral = { vertexCount: W.vertexCount, s: map[0]!, t: map[0]!, lines: W.lines };
        const wsubs = infraredSubgraphs(WI, this.D0);
        if (wsubs.length === 0) continue;
        this.refusePowerDivergence(WI, wsubs);
        const all = (1 << W.lines.length) - 1;
        for (const ssp of infraredSpinneys(WI, wsubs, this.D0)) {
          const m = ssp.reduce((acc, i) => wsubs[i]!.softLines.reduce((a, k) => a | (1 << k), acc), 0);
          if (m !== all) continue; // something left to integrate: a scaleless vacuum integral, zero
          let zt = zS;
          for (const i of ssp) zt = zt.mul(this.irCounterterm(dualGraph(WI, wsubs[i]!)));
          z = z.sub(zt);
        }
      }
      return z;
    });
  }

  /** Z of a logarithmically UV-divergent scalar graph: −K R* on some routing of a momentum through it. */
  uvCounterterm(g: ScalarGraph): Series {
    const degree = uvDegree(g.lines, this.D0);
    if (degree !== 0) throw new NotEvaluable(`a UV subgraph of degree ${degree} needs a counterterm polynomial in its momenta, which this R* does not form`);
    if (g.lines.length === 1 && g.lines[0]!.u === g.lines[0]!.v) return this.singleLoopPole(g.lines[0]!.index).neg();
    const key = scalarGraphKey(g, []);
    return this.memoized(this.uvMemo, key, () => {
      this.log.uvCounterterms++;
      const blocks = splitAtCutVertex(g);
      if (blocks) return blocks.reduce((acc, b) => acc.mul(this.uvCounterterm(subgraphOfLines(g, b).graph)), Series.ONE);
      return this.uvCountertermCompared(g, 1).value;
    });
  }

  /**
   * Z(g) on up to `want` routings, for cross-checks: the value of the first, how many were
   * compared and whether they agree (throws NotEvaluable when none works).
   */
  uvCountertermCompared(g: ScalarGraph, want: number): { value: Series; compared: number; agree: boolean } {
    const values: Series[] = [];
    const reasons: string[] = [];
    const verts = [...touchedVertices(g.lines)].sort((a, b) => a - b);
    for (let i = 0; i < verts.length && values.length < want; i++) for (let j = i + 1; j < verts.length && values.length < want; j++) {
      try {
        values.push(this.uvCountertermOnRouting(g, verts[i]!, verts[j]!));
      } catch (e) {
        if (!(e instanceof NotEvaluable)) throw e;
        reasons.push(e.message);
      }
    }
    if (values.length === 0) throw new NotEvaluable(`no routing gives the UV counterterm of a ${loopsOfLines(g.lines)}-loop scalar graph (${reasons[0] ?? 'no two vertices'})`);
    const agree = values.every((v) => v.sub(values[0]!).isZero());
    return { value: values[0]!, compared: values.length, agree };
  }

  /** −K R*g with the momentum in at u and out at v (throws NotEvaluable); for cross-checks. */
  uvCountertermOnRouting(g: ScalarGraph, u: number, v: number): Series {
    this.cancel.throwIfCancelled();
    const subs = uvSubgraphs(g, this.D0);
    let sum = Series.ZERO;
    for (const sp of uvSpinneys(subs)) {
      const zS = this.spinneyCounterterm(g, sp.map((i) => subs[i]!));
      if (zS.isZero()) continue;
      const { graph: W, map } = contractGroups(g, sp.map((i) => subs[i]!.lines));
      const WI: PropIntegral = { vertexCount: W.vertexCount, s: map[u]!, t: map[v]!, lines: W.lines };
      for (const term of this.rtilde(WI).terms) {
        const c = zS.mul(term.coefficient);
        const need = -1 - (c.isZero() ? 0 : c.val);
        sum = sum.add(c.mul(this.evaluator.evaluate(term.integral, need)));
      }
    }
    return polePart(sum).neg();
  }

  private spinneyCounterterm(g: ScalarGraph, parts: readonly UvSubgraph[]): Series {
    let z = Series.ONE;
    for (const p of parts) z = z.mul(this.uvCounterterm(subgraphOfLines(g, p.lines).graph));
    return z;
  }

  /** 1/(Γ(D0/2)(1+b)ε): the pole of one line of index D0/2 + bε at zero (IR) or infinite (UV) momentum. */
  private singleLoopPole(index: LineIndex): Series {
    if (2 * index.a !== this.D0) throw new NotEvaluable(`a single soft line of index ${indexText(index)} is not logarithmically divergent`);
    let gamma = Rational.ONE;
    for (let k = 2; k < this.D0 / 2; k++) gamma = gamma.mul(Rational.int(k));
    return Series.monomial(Poly.constant(Rational.ONE.div(gamma.mul(Rational.ONE.add(index.b)))), -1);
  }

  private memoized(memo: Map<string, Series | string>, key: string, compute: () => Series): Series {
    const hit = memo.get(key);
    if (typeof hit === 'string') throw new NotEvaluable(hit);
    if (hit) return hit;
    try {
      const v = compute();
      memo.set(key, v);
      return v;
    } catch (e) {
      if (e instanceof NotEvaluable) memo.set(key, e.message);
      throw e;
    }
  }
}

/** The lines split at a cut vertex into groups (each a union of blocks), or null when irreducible. */
function splitAtCutVertex(g: ScalarGraph): number[][] | null {
  if (linesVertexIrreducible(g.lines)) return null;
  for (const x of touchedVertices(g.lines)) {
    const pieces = piecesAround(g.lines, x);
    if (pieces.length > 1) return pieces;
  }
  return null;
}
