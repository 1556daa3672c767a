/**
 * Polynomials over Q (or over approximate numbers, term by term) in the constants and
 * symbols of `variables.ts`. Immutable; terms are keyed by their monomial's canonical key.
 */
import { addNum, isExactNum, isZeroNum, mulNum, negNum, type Num } from './num.ts';
import { Rational } from './rational.ts';
import { compareMonomials, mulMonomials, ONE_MONOMIAL, powMonomial, type Monomial } from './monomial.ts';
import { chargeTermProducts } from './work-budget.ts';

/** One term `coeff * mono`. */
export interface Term {
  readonly mono: Monomial;
  readonly coeff: Num;
}

/** A polynomial: a sum of terms with distinct monomials and non-zero coefficients. */
export class Poly {
  /** Terms by monomial key. Do not mutate. */
  readonly map: ReadonlyMap<string, Term>;
  private sortedCache: readonly Term[] | undefined;
  private wordsCache: number | undefined;

  private constructor(map: ReadonlyMap<string, Term>) {
    this.map = map;
  }

  static readonly ZERO = new Poly(new Map());
  static readonly ONE = Poly.constant(Rational.ONE);

  /** Builds a polynomial from terms (merging equal monomials, dropping zeros). */
  static fromTerms(terms: Iterable<Term>): Poly {
    const m = new Map<string, Term>();
    for (const t of terms) accumulate(m, t.mono, t.coeff);
    return new Poly(m);
  }
  /** The constant c. */
  static constant(c: Num): Poly {
    return isZeroNum(c) ? new Poly(new Map()) : new Poly(new Map([['', { mono: ONE_MONOMIAL, coeff: c }]]));
  }
  /** The single term c·m. */
  static term(c: Num, m: Monomial): Poly {
    return isZeroNum(c) ? new Poly(new Map()) : new Poly(new Map([[m.key, { mono: m, coeff: c }]]));
  }

  /**
   * Σ c_i · a_i · b_i accumulated into one polynomial (the scalar c_i defaults to 1): the
   * inner loop of series products, without intermediate polynomials.
   */
  static sumOfProducts(items: Iterable<readonly [Poly, Poly, Num?]>): Poly {
    const list = Array.isArray(items) ? (items as readonly (readonly [Poly, Poly, Num?])[]) : [...items];
    let work = 0;
    for (const [a, b] of list) work += a.map.size * b.map.size * (a.words() + b.words());
    chargeTermProducts(work);
    const m = new Map<string, Term>();
    for (const [a, b, c] of list) {
      for (const x of a.map.values()) {
        const xc = c === undefined ? x.coeff : mulNum(x.coeff, c);
        for (const y of b.map.values()) accumulate(m, mulMonomials(x.mono, y.mono), mulNum(xc, y.coeff));
      }
    }
    return new Poly(m);
  }

  /**
   * Size of a typical coefficient in 64-bit words (at least 1), from one term: the cost of a
   * term product grows with it, which the work budget (work-budget.ts) takes into account.
   */
  words(): number {
    if (this.wordsCache === undefined) {
      const t = this.map.values().next().value;
      const c = t?.coeff;
      this.wordsCache = c instanceof Rational ? 1 + Math.floor((c.n.toString(16).length + c.d.toString(16).length) / 16) : 1;
    }
    return this.wordsCache;
  }

  /** Terms in the canonical order (DESIGN §4). */
  terms(): readonly Term[] {
    if (!this.sortedCache) this.sortedCache = [...this.map.values()].sort((a, b) => compareMonomials(a.mono, b.mono));
    return this.sortedCache;
  }
  isZero(): boolean {
    return this.map.size === 0;
  }
  /** Whether every coefficient is exact. */
  isExact(): boolean {
    for (const t of this.map.values()) if (!isExactNum(t.coeff)) return false;
    return true;
  }
  /** The rational value when the polynomial is an exact constant; otherwise undefined. */
  asRational(): Rational | undefined {
    if (this.map.size === 0) return Rational.ZERO;
    if (this.map.size !== 1) return undefined;
    const t = this.map.get('');
    return t && isExactNum(t.coeff) ? t.coeff : undefined;
  }
  /** The single term, when there is exactly one. */
  singleTerm(): Term | undefined {
    if (this.map.size !== 1) return undefined;
    return this.map.values().next().value;
  }
  /** Coefficient of a monomial (exact zero when absent). */
  coefficient(m: Monomial): Num {
    return this.map.get(m.key)?.coeff ?? Rational.ZERO;
  }

  add(o: Poly): Poly {
    if (o.map.size === 0) return this;
    if (this.map.size === 0) return o;
    const m = new Map(this.map);
    for (const t of o.map.values()) accumulate(m, t.mono, t.coeff);
    return new Poly(m);
  }
  neg(): Poly {
    const m = new Map<string, Term>();
    for (const [k, t] of this.map) m.set(k, { mono: t.mono, coeff: negNum(t.coeff) });
    return new Poly(m);
  }
  sub(o: Poly): Poly {
    return this.add(o.neg());
  }
  mul(o: Poly): Poly {
    if (this.map.size === 0 || o.map.size === 0) return Poly.ZERO;
    if (o.map.size === 1 && o.map.has('')) return this.scale(o.map.get('')!.coeff);
    if (this.map.size === 1 && this.map.has('')) return o.scale(this.map.get('')!.coeff);
    chargeTermProducts(this.map.size * o.map.size * (this.words() + o.words()));
    const m = new Map<string, Term>();
    for (const a of this.map.values()) {
      for (const b of o.map.values()) accumulate(m, mulMonomials(a.mono, b.mono), mulNum(a.coeff, b.coeff));
    }
    return new Poly(m);
  }
  /** c·p for a scalar c. */
  scale(c: Num): Poly {
    if (isZeroNum(c)) return Poly.ZERO;
    if (c instanceof Rational && c.isOne()) return this;
    const m = new Map<string, Term>();
    for (const [k, t] of this.map) {
      const v = mulNum(t.coeff, c);
      if (!isZeroNum(v)) m.set(k, { mono: t.mono, coeff: v });
    }
    return new Poly(m);
  }
  /** p^k for a non-negative integer k. */
  pow(k: number): Poly {
    if (!Number.isInteger(k) || k < 0) throw new RangeError(`polynomial power needs a non-negative integer, got ${k}`);
    const single = this.singleTerm();
    if (single && single.coeff instanceof Rational) return Poly.term(single.coeff.pow(k), powMonomial(single.mono, k));
    let result = Poly.ONE;
    let base = this as Poly;
    while (k > 0) {
      if (k & 1) result = result.mul(base);
      k >>= 1;
      if (k) base = base.mul(base);
    }
    return result;
  }
  /** Structural equality (exact coefficients compared exactly, approximate ones by value and error). */
  equals(o: Poly): boolean {
    if (this.map.size !== o.map.size) return false;
    for (const [k, t] of this.map) {
      const u = o.map.get(k);
      if (!u) return false;
      const a = t.coeff;
      const b = u.coeff;
      if (a instanceof Rational !== b instanceof Rational) return false;
      if (a instanceof Rational) {
        if (!a.equals(b as Rational)) return false;
      } else if (a.value !== (b as typeof a).value || a.error !== (b as typeof a).error) return false;
    }
    return true;
  }
}

function accumulate(m: Map<string, Term>, mono: Monomial, c: Num): void {
  if (isZeroNum(c)) return;
  const old = m.get(mono.key);
  if (!old) {
    m.set(mono.key, { mono, coeff: c });
    return;
  }
  const v = addNum(old.coeff, c);
  if (isZeroNum(v)) m.delete(mono.key);
  else m.set(mono.key, { mono: old.mono, coeff: v });
}

/** The polynomial of a rational (or integer) constant. */
export function constPoly(c: Rational | bigint | number): Poly {
  return Poly.constant(c instanceof Rational ? c : Rational.int(c));
}
