/**
 * 1/a and a/b for truncated Laurent series, with precision tracking: with a = c·ε^v(1 + u)
 * known through k, 1/a = c⁻¹ε^{−v}(1 + u)⁻¹ is known through k − 2v.
 */
import { AlgebraError } from './algebra-error.ts';
import { invertCoefficient } from './invert-coefficient.ts';
import { Poly } from './polynomial.ts';
import { Series } from './series.ts';

/**
 * The inverse 1/a, computed through at most ε^cap (needed when a is exact and its inverse
 * infinite). Throws AlgebraError when a is zero as far as known, or its leading coefficient
 * is not invertible.
 */
export function inverse(a: Series, cap: number): Series {
  if (a.coeffs.length === 0) {
    throw new AlgebraError(
      a.isZero() ? 'division by zero' : `division by a series that is zero through eps^${a.order}: its leading term is unknown`,
      a.isZero() ? undefined : 'expand the divisor to a higher order',
    );
  }
  const v = a.val;
  const cInv = invertCoefficient(a.coeffs[0]!);
  if (a.coeffs.length === 1 && a.order === Infinity) return Series.monomial(cInv, -v);
  const rel = a.order - v; // relative precision (may be Infinity)
  const n = Math.max(0, Math.min(rel, cap + v));
  // normalized u_i = a_i / c
  const u: Poly[] = [];
  for (let i = 1; i <= n; i++) u.push(i < a.coeffs.length ? a.coeffs[i]!.mul(cInv) : Poly.ZERO);
  const b: Poly[] = [Poly.ONE];
  for (let m = 1; m <= n; m++) {
    const pairs: [Poly, Poly][] = [];
    for (let i = 1; i <= m; i++) if (!u[i - 1]!.isZero()) pairs.push([u[i - 1]!, b[m - i]!]);
    b.push(Poly.sumOfProducts(pairs).neg());
  }
  return Series.make(-v, b.map((x) => x.mul(cInv)), -v + n);
}

/** a/b = a·(1/b); the result is computed through at most ε^cap. */
export function divide(a: Series, b: Series, cap: number): Series {
  if (a.isZero()) {
    inverse(b, cap); // still refuse a zero divisor
    return Series.ZERO;
  }
  // 1/b is needed through cap − v_a for the product to reach cap.
  const bInv = inverse(b, a.val === Infinity ? cap : cap - a.val);
  return a.mul(bInv).truncate(cap);
}
