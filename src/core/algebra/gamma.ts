/**
 * Γ(n + δ) for an integer n and a series δ vanishing at ε = 0 (typically δ = aε), exactly,
 * in exponential form, from
 *   ln Γ(1 + x) = −γx + Σ_{k≥2} (−1)^k ζ(k) x^k / k          (DLMF 5.7.3; A&S 6.1.33)
 * and the recurrence Γ(z + 1) = zΓ(z) (DLMF 5.5.1):
 *   n ≥ 1:  Γ(n + δ) = Γ(1 + δ) · Π_{j=1}^{n−1} (j + δ)
 *   n ≤ 0:  Γ(n + δ) = Γ(1 + δ) / Π_{j=n}^{0} (j + δ)      (the j = 0 factor δ gives the pole)
 * with log(j + δ) = log j + log(1 + δ/j), and log j kept as the rational prefactor j.
 */
import { AlgebraError } from './algebra-error.ts';
import { LimitError } from '../errors.ts';
import { EXP_FORM_ONE, mulExpForms, type ExpForm } from './exp-form.ts';
import { formatPoly } from './format-text.ts';
import { invertCoefficient } from './invert-coefficient.ts';
import { variable } from './monomial.ts';
import { Poly } from './polynomial.ts';
import { Rational } from './rational.ts';
import { log1pSeries } from './series-exp-log.ts';
import { Series } from './series.ts';
import { zetaPoly } from './zeta.ts';

/** Largest |n| accepted in Γ(n + δ) (the recurrence is linear in n). */
export const MAX_GAMMA_SHIFT = 1000;

/** ln Γ(1 + δ) through at most ε^cap. */
export function logGamma1p(delta: Series, cap: number): Series {
  if (delta.isZero()) return Series.ZERO;
  if (delta.val < 1) throw new AlgebraError('lnΓ(1 + δ) needs δ to vanish at eps = 0');
  const K = Math.max(0, Math.min(cap, delta.order));
  const coeffK = (k: number): Poly =>
    k === 1 ? Poly.term(Rational.MINUS_ONE, variable('euler_gamma')) : zetaPoly(k).scale(Rational.of(k % 2 === 0 ? 1n : -1n, BigInt(k)));
  // Fast path: δ = a·ε exactly.
  if (delta.val === 1 && delta.coeffs.length === 1 && delta.order === Infinity) {
    const a = delta.coeffs[0]!;
    const out: Poly[] = [Poly.ZERO];
    let ak = Poly.ONE;
    for (let k = 1; k <= K; k++) {
      ak = ak.mul(a);
      out.push(coeffK(k).mul(ak));
    }
    return Series.make(0, out, K);
  }
  let sum: Series = Series.bigO(K);
  let pw: Series = Series.ONE;
  for (let k = 1; k * delta.val <= K; k++) {
    pw = pw.mul(delta).truncate(K);
    sum = sum.add(pw.scale(coeffK(k)));
  }
  return sum;
}

/** Γ(n + δ) in exponential form, its log-series through at most ε^cap. */
export function gammaExpForm(n: number, delta: Series, cap: number): ExpForm {
  if (!Number.isInteger(n)) throw new RangeError(`Gamma shift must be an integer, got ${n}`);
  if (Math.abs(n) > MAX_GAMMA_SHIFT) {
    throw new LimitError('Gamma argument', 'maxGammaShift', MAX_GAMMA_SHIFT, Math.abs(n), 'use arguments n + a*eps with |n| ≤ 1000');
  }
  if (delta.isZero()) {
    if (n <= 0) throw new AlgebraError(`Gamma has a pole at ${n}`, 'regulate the argument, e.g. Gamma(n + eps)');
    let f = 1n;
    for (let j = 2; j < n; j++) f *= BigInt(j);
    return { prefactor: Poly.constant(Rational.int(f)), epsPower: 0, log: Series.ZERO };
  }
  if (delta.coeffs.length === 0) throw new AlgebraError('the Gamma argument is not known beyond its integer part');
  if (delta.val < 1) throw new AlgebraError('Gamma(n + δ) needs δ to vanish at eps = 0');
  let form: ExpForm = { prefactor: Poly.ONE, epsPower: 0, log: logGamma1p(delta, cap) };
  const factor = (j: number): ExpForm => {
    if (j !== 0) {
      return { prefactor: Poly.constant(Rational.int(j)), epsPower: 0, log: log1pSeries(delta.scale(Rational.of(1n, BigInt(j))), cap) };
    }
    // δ = d·ε^v (1 + w)
    const d = delta.coeffs[0]!;
    const w = delta.shift(-delta.val).scale(invertCoefficient(d)).sub(Series.ONE);
    return { prefactor: d, epsPower: delta.val, log: log1pSeries(w, cap) };
  };
  if (n >= 1) {
    for (let j = 1; j < n; j++) form = mulExpForms(form, factor(j));
  } else {
    let den: ExpForm = EXP_FORM_ONE;
    for (let j = n; j <= 0; j++) den = mulExpForms(den, factor(j));
    form = { prefactor: form.prefactor.mul(invertCoefficient(den.prefactor)), epsPower: form.epsPower - den.epsPower, log: form.log.sub(den.log) };
  }
  return form;
}

/** Reads x = n + δ (n an integer, δ vanishing at ε = 0) from a Gamma argument. */
export function splitGammaArgument(x: Series): { n: number; delta: Series } {
  if (x.val < 0) throw new AlgebraError('Gamma of an argument with a pole in eps has no Laurent expansion');
  if (x.order < 0) throw new AlgebraError('the Gamma argument is not known at eps^0');
  const c0 = x.coeff(0);
  const r = c0.asRational();
  if (!r || !r.isInteger()) {
    throw new AlgebraError(`Gamma(${formatPoly(c0)} + ...) is not exact: the eps^0 part of the argument must be an integer`, 'write Gamma(n + a*eps) with an integer n');
  }
  if (r.n > BigInt(MAX_GAMMA_SHIFT) || r.n < -BigInt(MAX_GAMMA_SHIFT)) {
    throw new LimitError('Gamma argument', 'maxGammaShift', MAX_GAMMA_SHIFT, r.n.toString(), 'use arguments n + a*eps with |n| ≤ 1000');
  }
  const n = Number(r.n);
  return { n, delta: x.sub(Series.constant(Poly.constant(r))) };
}
