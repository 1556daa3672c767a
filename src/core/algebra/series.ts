/**
 * Truncated Laurent series in ε whose coefficients are polynomials, and which know their
 * precision: a series is exact through ε^order (order = Infinity for a finite exact
 * Laurent polynomial such as 1 or 1/ε + ε). Every coefficient of a power ≤ order is known.
 *
 * Precision rules (standard for truncated series; cf. Knuth, TAOCP vol. 2, §4.7):
 *  - a ± b is known through min(k_a, k_b);
 *  - a·b with a = O(ε^{v_a}) known through k_a, and b likewise, is known through
 *    min(k_a + v_b, k_b + v_a);
 *  - 1/a is known through k_a − 2v_a (its relative precision equals a's);
 * where v is the lowest power that may be non-zero (order + 1 for a series that is zero as
 * far as it is known).
 */
import { Poly } from './polynomial.ts';
import type { Num } from './num.ts';

/** A truncated Laurent series in ε. Immutable; build with `Series.make`. */
export class Series {
  /** Lowest power with a non-zero coefficient (order + 1 when every known coefficient is 0; Infinity for exact 0). */
  readonly val: number;
  /** Coefficients of ε^val, ε^{val+1}, …; coeffs[0] is non-zero when present. */
  readonly coeffs: readonly Poly[];
  /** The series is exact through ε^order; Infinity when exact to all orders. */
  readonly order: number;

  private constructor(val: number, coeffs: readonly Poly[], order: number) {
    this.val = val;
    this.coeffs = coeffs;
    this.order = order;
  }

  /**
   * Normalizes: keeps only powers ≤ order, strips leading zero coefficients (and trailing
   * ones when exact), so that `val` is the true leading power when it is known.
   */
  static make(val: number, coeffs: readonly Poly[], order: number = Infinity): Series {
    if (!Number.isInteger(val) && coeffs.length > 0) throw new RangeError(`series start ${val} must be an integer`);
    if (!(Number.isInteger(order) || order === Infinity)) throw new RangeError(`series order ${order} must be an integer or Infinity`);
    let end = coeffs.length; // exclusive
    if (order !== Infinity) end = Math.min(end, Math.max(0, order - val + 1));
    let start = 0;
    while (start < end && coeffs[start]!.isZero()) start++;
    if (order === Infinity) while (end > start && coeffs[end - 1]!.isZero()) end--;
    if (start === end) return new Series(order === Infinity ? Infinity : order + 1, [], order);
    return new Series(val + start, coeffs.slice(start, end), order);
  }
  /** The exact constant c (as a polynomial). */
  static constant(c: Poly): Series {
    return Series.make(0, [c]);
  }
  /** The exact monomial c·ε^k. */
  static monomial(c: Poly, k: number): Series {
    return Series.make(k, [c]);
  }
  /** Exact zero. */
  static readonly ZERO = Series.make(0, []);
  /** Exact one. */
  static readonly ONE = Series.make(0, [Poly.ONE]);
  /** The expansion variable ε. */
  static readonly EPS = Series.make(1, [Poly.ONE]);
  /** Zero known through ε^k, i.e. O(ε^{k+1}). */
  static bigO(k: number): Series {
    return Series.make(k + 1, [], k);
  }

  /** Highest power with a stored coefficient (val − 1 when none). */
  get top(): number {
    return this.val + this.coeffs.length - 1;
  }
  /** Whether the series is exactly zero (to all orders). */
  isZero(): boolean {
    return this.coeffs.length === 0 && this.order === Infinity;
  }
  /** Whether every known coefficient is exact (no approximate numbers). */
  isExact(): boolean {
    return this.coeffs.every((c) => c.isExact());
  }
  /** The coefficient of ε^p; throws RangeError beyond the known order. */
  coeff(p: number): Poly {
    if (p > this.order) throw new RangeError(`the coefficient of eps^${p} is not known (series exact through eps^${this.order})`);
    const i = p - this.val;
    return i >= 0 && i < this.coeffs.length ? this.coeffs[i]! : Poly.ZERO;
  }

  add(o: Series): Series {
    const order = Math.min(this.order, o.order);
    if (this.isZero()) return o;
    if (o.isZero()) return this;
    const lo = Math.min(this.val, o.val);
    const hi = Math.min(order, Math.max(this.top, o.top));
    if (hi < lo) return Series.make(lo, [], order);
    const out: Poly[] = [];
    for (let p = lo; p <= hi; p++) out.push(this.coeffAt(p).add(o.coeffAt(p)));
    return Series.make(lo, out, order);
  }
  neg(): Series {
    return new Series(this.val, this.coeffs.map((c) => c.neg()), this.order);
  }
  sub(o: Series): Series {
    return this.add(o.neg());
  }
  /** c·s for a polynomial c (exact: the order is unchanged). */
  scale(c: Poly | Num): Series {
    const p = c instanceof Poly ? c : Poly.constant(c);
    return Series.make(this.val, this.coeffs.map((x) => x.mul(p)), this.order);
  }
  /** ε^k·s: every power and the order move by k. */
  shift(k: number): Series {
    if (this.coeffs.length === 0) return Series.make(this.val + k, [], this.order + k);
    return new Series(this.val + k, this.coeffs, this.order + k);
  }
  /**
   * The same series, forgotten beyond ε^k — except that an exact Laurent polynomial with no
   * terms beyond ε^k stays exact (nothing is lost), so constants keep order Infinity.
   */
  truncate(k: number): Series {
    if (k >= this.order) return this;
    if (this.order === Infinity && (this.coeffs.length === 0 || this.top <= k)) return this;
    return Series.make(this.val, this.coeffs, k);
  }

  /** Product with precision min(k_a + v_b, k_b + v_a). */
  mul(o: Series): Series {
    if (this.isZero() || o.isZero()) return Series.ZERO;
    const order = Math.min(this.order + o.val, o.order + this.val);
    const val = this.val + o.val;
    const hi = Math.min(order, this.top + o.top);
    const out: Poly[] = [];
    for (let p = val; p <= hi; p++) {
      const pairs: [Poly, Poly][] = [];
      // i indexes this, j = p − val − i indexes o
      const n = p - val;
      const iMin = Math.max(0, n - (o.coeffs.length - 1));
      const iMax = Math.min(n, this.coeffs.length - 1);
      for (let i = iMin; i <= iMax; i++) pairs.push([this.coeffs[i]!, o.coeffs[n - i]!]);
      out.push(Poly.sumOfProducts(pairs));
    }
    return Series.make(val, out, order);
  }

  /** Coefficient without the order check (zero outside the stored range). */
  private coeffAt(p: number): Poly {
    const i = p - this.val;
    return i >= 0 && i < this.coeffs.length ? this.coeffs[i]! : Poly.ZERO;
  }
}
