/**
 * exp and log of truncated series, by the derivative recurrences (f = e^a ⇒ f' = a'f;
 * f = log a ⇒ a f' = a'), which cost O(n²) coefficient products.
 *
 * Precision: exp(a) with a = O(ε) known through k is known through k; log(a) with a of
 * leading power 0 known through k is known through k. Exact inputs are cut at `cap`.
 */
import { AlgebraError } from './algebra-error.ts';
import { invertCoefficient } from './invert-coefficient.ts';
import { logOfConstant } from './log-constant.ts';
import { Poly } from './polynomial.ts';
import { Rational } from './rational.ts';
import { Series } from './series.ts';

/** e^a for a series vanishing at ε = 0, computed through at most ε^cap. */
export function expSeries(a: Series, cap: number): Series {
  if (a.isZero()) return Series.ONE;
  if (a.val < 1) {
    throw new AlgebraError(
      a.val < 0 ? 'exp of a series with a pole in eps has no Laurent expansion' : 'exp of an argument that does not vanish at eps = 0 is not exact',
      'exp(...) takes arguments like euler_gamma*eps; move constant factors outside',
    );
  }
  const K = Math.max(0, Math.min(a.order, cap));
  const l: Poly[] = [];
  for (let k = 0; k <= K; k++) l.push(k >= a.val ? a.coeff(k).scale(Rational.int(k)) : Poly.ZERO);
  // n e_n = Σ_{k=1}^{n} k l_k e_{n−k}
  const e: Poly[] = [Poly.ONE];
  for (let n = 1; n <= K; n++) {
    const pairs: [Poly, Poly][] = [];
    for (let k = a.val; k <= n; k++) if (!l[k]!.isZero()) pairs.push([l[k]!, e[n - k]!]);
    e.push(Poly.sumOfProducts(pairs).scale(Rational.of(1n, BigInt(n))));
  }
  return Series.make(0, e, K);
}

/**
 * log a for a series with a non-zero ε^0 term c whose logarithm is exact (see
 * `logOfConstant`), computed through at most ε^cap.
 */
export function logSeries(a: Series, cap: number): Series {
  if (a.coeffs.length === 0) throw new AlgebraError('log of a series that is zero as far as it is known');
  if (a.val !== 0) {
    throw new AlgebraError(
      `log of a series starting at eps^${a.val} involves log(eps), which has no Laurent expansion`,
      'take the logarithm of a series whose leading power is eps^0',
    );
  }
  const c = a.coeffs[0]!;
  const logC = logOfConstant(c);
  if (a.coeffs.length === 1 && a.order === Infinity) return Series.constant(logC);
  const K = Math.max(0, Math.min(a.order, cap));
  const cInv = invertCoefficient(c);
  const b: Poly[] = [];
  for (let n = 0; n <= K; n++) b.push(a.coeff(n).mul(cInv));
  // n f_n = n b_n − Σ_{k=1}^{n−1} k f_k b_{n−k}   (b_0 = 1)
  const f: Poly[] = [logC];
  for (let n = 1; n <= K; n++) {
    const pairs: [Poly, Poly, Rational][] = [];
    for (let k = 1; k < n; k++) if (!f[k]!.isZero() && !b[n - k]!.isZero()) pairs.push([f[k]!, b[n - k]!, Rational.int(k)]);
    const s = b[n]!.scale(Rational.int(n)).sub(Poly.sumOfProducts(pairs));
    f.push(s.scale(Rational.of(1n, BigInt(n))));
  }
  return Series.make(0, f, K);
}

/** log(1 + t) for t vanishing at ε = 0, through at most ε^cap (fast when t is one term c·ε^m). */
export function log1pSeries(t: Series, cap: number): Series {
  if (t.isZero()) return Series.ZERO;
  if (t.val < 1) throw new AlgebraError('log(1 + t) needs t to vanish at eps = 0');
  if (t.coeffs.length === 1 && t.order === Infinity) {
    const m = t.val;
    const K = Math.floor(cap / m);
    const out: Poly[] = new Array(K * m + 1).fill(Poly.ZERO);
    let pw = Poly.ONE;
    for (let k = 1; k <= K; k++) {
      pw = pw.mul(t.coeffs[0]!);
      out[k * m] = pw.scale(Rational.of(k % 2 === 1 ? 1n : -1n, BigInt(k)));
    }
    return Series.make(0, out, cap);
  }
  return logSeries(Series.ONE.add(t), cap);
}
