import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';

/**
 * A truncated power series in one coupling g whose coefficients are Laurent series in ε
 * (themselves polynomials in N, ζ-values, …): Σ_k c_k(ε) g^k, known through g^order. Each
 * ε-series carries its own precision (Series), so both directions of truncation are tracked:
 * a graph that could not be evaluated lowers `order`; a momentum-subtraction counterterm known
 * only through ε⁰ lowers the ε-precision of whatever it enters.
 *
 * Precision in g follows the usual rules for truncated series: a ± b is known through
 * min(k_a, k_b); a·b through min(k_a + v_b, k_b + v_a), v the lowest power that may be non-zero.
 * Immutable.
 */
export class GSeries {
  private constructor(
    /** c[k] is the coefficient of g^k, for k = 0 … order. */
    readonly coeffs: readonly Series[],
    /** Known through g^order. */
    readonly order: number,
  ) {}

  static make(coeffs: readonly Series[], order: number): GSeries {
    const c: Series[] = [];
    for (let k = 0; k <= order; k++) c.push(coeffs[k] ?? Series.ZERO);
    return new GSeries(c, order);
  }
  /** The constant 1, known through g^order. */
  static one(order: number): GSeries {
    return GSeries.make([Series.ONE], order);
  }
  /** c·g^k, known through g^order. */
  static monomial(c: Series, k: number, order: number): GSeries {
    const arr: Series[] = [];
    arr[k] = c;
    return GSeries.make(arr, order);
  }

  coeff(k: number): Series {
    if (k > this.order) throw new RangeError(`the coefficient of g^${k} is not known (series known through g^${this.order})`);
    return this.coeffs[k] ?? Series.ZERO;
  }
  /** Lowest power that may be non-zero (order + 1 when every known coefficient is zero). */
  get val(): number {
    for (let k = 0; k <= this.order; k++) if (!this.coeffs[k]!.isZero()) return k;
    return this.order + 1;
  }

  add(o: GSeries): GSeries {
    const order = Math.min(this.order, o.order);
    const c: Series[] = [];
    for (let k = 0; k <= order; k++) c.push(this.coeffs[k]!.add(o.coeffs[k]!));
    return new GSeries(c, order);
  }
  neg(): GSeries {
    return new GSeries(this.coeffs.map((s) => s.neg()), this.order);
  }
  sub(o: GSeries): GSeries {
    return this.add(o.neg());
  }
  /** Multiplies every coefficient by an ε-series. */
  scaleSeries(s: Series): GSeries {
    return new GSeries(this.coeffs.map((x) => x.mul(s)), this.order);
  }
  scale(c: Rational): GSeries {
    const p = Poly.constant(c);
    return new GSeries(this.coeffs.map((x) => x.scale(p)), this.order);
  }
  /** g^k times the series (order moves up by k). */
  shift(k: number): GSeries {
    const c: Series[] = [];
    for (let i = 0; i < k; i++) c.push(Series.ZERO);
    return new GSeries([...c, ...this.coeffs], this.order + k);
  }
  /** Forgets everything beyond g^k. */
  truncate(k: number): GSeries {
    return k >= this.order ? this : new GSeries(this.coeffs.slice(0, k + 1), k);
  }

  mul(o: GSeries): GSeries {
    const va = this.val;
    const vb = o.val;
    const order = Math.min(this.order + vb, o.order + va);
    const c: Series[] = [];
    for (let n = 0; n <= order; n++) {
      let s = Series.ZERO;
      for (let i = va; i <= n - vb; i++) {
        if (i > this.order || n - i > o.order) continue;
        const a = this.coeffs[i]!;
        const b = o.coeffs[n - i]!;
        if (!a.isZero() && !b.isZero()) s = s.add(a.mul(b));
      }
      c.push(s);
    }
    return new GSeries(c, order);
  }

  /** g ∂/∂g: c_k → k c_k (the precision in g is unchanged). */
  gDerivative(): GSeries {
    return new GSeries(this.coeffs.map((s, k) => s.scale(Poly.constant(Rational.int(k)))), this.order);
  }

  /** log(1 + x) for this = x with no g⁰ term: Σ (−1)^{n+1} xⁿ/n. */
  log1p(): GSeries {
    this.requireNoConstant('log1p');
    let out = GSeries.make([], this.order);
    let power = this.truncate(this.order);
    for (let n = 1; n <= this.order; n++) {
      out = out.add(power.scale(Rational.of(n % 2 === 1 ? 1 : -1, n)));
      power = power.mul(this).truncate(this.order);
    }
    return out;
  }
  /** 1/(1 + x) for this = x with no g⁰ term. */
  inverseOnePlus(): GSeries {
    this.requireNoConstant('1/(1 + x)');
    let out = GSeries.one(this.order);
    let power = this.truncate(this.order);
    for (let n = 1; n <= this.order; n++) {
      out = out.add(n % 2 === 1 ? power.neg() : power);
      power = power.mul(this).truncate(this.order);
    }
    return out;
  }

  private requireNoConstant(what: string): void {
    if (!this.coeffs[0]!.isZero()) throw new RangeError(`${what} needs a series without a g^0 term`);
  }
}
