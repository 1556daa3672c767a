import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import { inverse } from '../algebra/series-inverse.ts';
import { LimitError } from '../errors.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { gFunction, type LoopMeasure } from './g-function.ts';
import { findCut } from './graph-cuts.ts';
import { integralKey } from './integral-key.ts';
import { addIndex, indexSeries, indexText, type LineIndex } from './line-index.ts';
import { loopsOf, type PropIntegral } from './prop-integral.ts';
import { simplifyIntegral } from './simplify-integral.ts';
import { findTriangles, triangleDenominator } from './triangle-rule.ts';

/** Thrown inside the evaluator when no reduction applies; carries the reason for the user. */
export class NotEvaluable extends Error {}

export interface EvaluatorOptions {
  readonly D0: number;
  /** The scheme's per-loop measure factor, exact through ε^order. */
  readonly loopFactor: (order: number) => Series;
  /** The same factor as Gammas, folded into each G-function's Gamma product when given. */
  readonly measure?: LoopMeasure;
  readonly cancel?: CancelToken;
  /** Integrals evaluated (memo entries) before giving up. */
  readonly maxIntegrals?: number;
}

/** Steps taken, for the `method` report. */
export interface ReductionLog {
  bubbles: number;
  triangles: number;
  factorizations: number;
}

/**
 * Exact evaluation of massless propagator-type integrals by bubbles (G-functions), series
 * merging, factorization at cut vertices and the triangle rule, memoized by isomorphism class.
 * `evaluate(I, order)` returns the value exact through ε^order (p² = 1), or throws NotEvaluable.
 *
 * Precision: each step asks its parts for what it needs — a factor of valuation v makes the other
 * factor needed through order − v; the triangle rule's 1/(D − 2α0 − α1 − α2) costs one order when
 * its ε⁰ part vanishes. Valuations are bounded by −2L (a UV and an IR pole per loop at most) to pick
 * the first request, and any shortfall is made up by asking again.
 */
export class IntegralEvaluator {
  private readonly memo = new Map<string, Series>();
  private readonly stuck = new Map<string, string>();
  readonly log: ReductionLog = { bubbles: 0, triangles: 0, factorizations: 0 };
  private readonly cancel: CancelToken;
  private readonly loopFactors = new Map<number, Series>();

  constructor(private readonly opts: EvaluatorOptions) {
    this.cancel = opts.cancel ?? neverCancel;
  }

  evaluate(input: PropIntegral, order: number): Series {
    const simple = simplifyIntegral(input);
    if (simple.kind === 'zero') return Series.ZERO;
    if (simple.kind === 'one') return Series.ONE;
    const I = simple.integral;
    if (I.lines.length === 1) return Series.ONE; // a single line s–t at p² = 1
    const key = integralKey(I);
    const known = this.memo.get(key);
    if (known && known.order >= order) return known;
    const why = this.stuck.get(key);
    if (why) throw new NotEvaluable(why);
    if (this.memo.size > (this.opts.maxIntegrals ?? 200_000)) {
      throw new LimitError('evaluating an integral', 'maxIntegrals', this.opts.maxIntegrals ?? 200_000, `more than ${this.opts.maxIntegrals ?? 200_000} intermediate integrals`, 'the reduction explodes; supply the value by hand');
    }
    this.cancel.throwIfCancelled();
    let value: Series;
    try {
      value = this.reduce(I, order);
    } catch (e) {
      if (e instanceof NotEvaluable) this.stuck.set(key, e.message);
      throw e;
    }
    const prev = this.memo.get(key);
    if (!prev || prev.order < value.order) this.memo.set(key, value);
    return value;
  }

  private readonly bubbles = new Map<string, Series>();

  /** G(ν1,ν2) times the loop factor, exact through ε^k; cached (G is symmetric), reused when known further. */
  private bubbleFactor(x: LineIndex, y: LineIndex, k: number): Series {
    const [p, q] = [indexText(x), indexText(y)].sort();
    const key = `${p}|${q}`;
    const hit = this.bubbles.get(key);
    if (hit && hit.order >= k) return hit;
    const m = this.opts.measure;
    const g = gFunction(x, y, this.opts.D0, k + 1, m);
    if (!g) throw new NotEvaluable(`a one-loop bubble with indices ${indexText(x)}, ${indexText(y)} has an unregulated divergence`);
    const v = m || g.isZero() ? g : g.mul(this.loopFactor(k + 2 - g.val)).truncate(k + 1);
    this.bubbles.set(key, v);
    return v;
  }

  private loopFactor(order: number): Series {
    const hit = this.loopFactors.get(order);
    if (hit) return hit;
    const f = this.opts.loopFactor(order);
    this.loopFactors.set(order, f);
    return f;
  }

  private reduce(I: PropIntegral, order: number): Series {
    const L = loopsOf(I);
    // 1. A bubble: two lines between the same pair of vertices.
    for (let i = 0; i < I.lines.length; i++) {
      for (let j = i + 1; j < I.lines.length; j++) {
        const a = I.lines[i]!;
        const b = I.lines[j]!;
        if (!((a.u === b.u && a.v === b.v) || (a.u === b.v && a.v === b.u))) continue;
        const merged = { a: a.index.a + b.index.a - this.opts.D0 / 2, b: a.index.b.add(b.index.b).add(Rational.ONE) };
        const rest: PropIntegral = { ...I, lines: [...I.lines.filter((_, k) => k !== i && k !== j), { u: a.u, v: a.v, index: merged }] };
        this.log.bubbles++;
        return this.product(
          (k) => this.bubbleFactor(a.index, b.index, k),
          (k) => this.evaluate(rest, k),
          order,
          2, // a G-function has at most two poles
        );
      }
    }
    // 2. A cut vertex: factorize, or a scaleless part.
    const cut = findCut(I);
    if (cut?.kind === 'scaleless') return Series.ZERO;
    if (cut?.kind === 'factor') {
      this.log.factorizations++;
      return this.product((k) => this.evaluate(cut.first, k), (k) => this.evaluate(cut.second, k), order, 2 * loopsOf(cut.first));
    }
    // 3. The triangle rule on the triangle with the smallest lowered indices.
    const triangles = findTriangles(I);
    if (triangles.length === 0) {
      throw new NotEvaluable(
        `no reduction applies to a ${L}-loop integral with lines ${I.lines.map((l) => indexText(l.index)).join(', ')}: no bubble, no lines in series, no cut vertex, and no triangle at three-valent vertices whose lowered lines have integer indices`,
      );
    }
    const weight = (t: (typeof triangles)[number]) => t.alpha0.a + t.terms.reduce((s, x) => s + x.integral.lines.reduce((u, l) => u + Math.max(0, l.index.a), 0), 0);
    const t = triangles.reduce((best, x) => (weight(x) < weight(best) ? x : best));
    const den = triangleDenominator(t, this.opts.D0);
    if (den.a === 0 && den.b.isZero()) throw new NotEvaluable('the triangle rule degenerates (D − 2α0 − α1 − α2 = 0)');
    this.log.triangles++;
    const alphas = [t.alpha1, t.alpha2];
    return this.product(
      (k) => inverse(indexSeries(den), k),
      (k) => {
        let sum = Series.ZERO;
        for (const term of t.terms) {
          const alpha = indexSeries(alphas[term.coefficient - 1]!);
          const need = k - (alpha.isZero() ? 0 : alpha.val);
          const v = this.evaluate(term.integral, need);
          sum = sum.add(alpha.mul(v).scale(Poly.constant(Rational.int(term.sign))));
        }
        return sum;
      },
      order,
      1, // 1/(D − 2α0 − α1 − α2) has at most a simple pole
    );
  }

  /**
   * a·b exact through ε^order: b is asked for first with room for a's poles (`bound` ≥ −valuation of a),
   * then a for what b's valuation leaves; repeated with more room until the product is precise enough.
   */
  private product(fa: (k: number) => Series, fb: (k: number) => Series, order: number, bound: number): Series {
    let room = bound;
    for (let attempt = 0; attempt < 12; attempt++) {
      const b = fb(order + room);
      if (b.isZero()) return Series.ZERO;
      const bVal = b.coeffs.length ? b.val : b.order + 1;
      const a = fa(order - bVal);
      if (a.isZero()) return Series.ZERO;
      const r = a.mul(b);
      if (r.order >= order) return r.truncate(Math.max(order, r.order === Infinity ? order : order));
      room += order - r.order + 1;
    }
    throw new NotEvaluable('precision could not be reached (the expansion keeps losing orders)');
  }
}

export { addIndex };
