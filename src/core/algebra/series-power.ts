/**
 * Powers of series: integer powers by repeated squaring, and general powers
 * a^y = c^{y₀} ε^{v·y₀} exp(y₀·log(1+u) + (y − y₀)·log a) for a = c·ε^v(1+u) and
 * y = y₀ + O(ε) (y₀ an exact rational). This covers x^{aε} for x a positive rational or
 * a rational times a power of π (its logarithm is exact, see `logOfConstant`), and
 * rational powers such as (1 + ε)^{1/2} or (4·pi^2)^{1/2}.
 */
import { AlgebraError } from './algebra-error.ts';
import { LimitError } from '../errors.ts';
import { formatPoly } from './format-text.ts';
import { inverse } from './series-inverse.ts';
import { expSeries, logSeries } from './series-exp-log.ts';
import { logOfConstant } from './log-constant.ts';
import { invertCoefficient } from './invert-coefficient.ts';
import { monomial } from './monomial.ts';
import { Poly } from './polynomial.ts';
import { Rational, bitLength } from './rational.ts';
import { Series } from './series.ts';

/** Largest |k| accepted in an integer power. */
export const MAX_EXPONENT = 10_000;
/** Largest size, in bits, of a rational produced by a power. */
export const MAX_POWER_BITS = 1 << 20;

/** a^k for an integer k, computed through at most ε^cap. */
export function powInteger(a: Series, k: number, cap: number): Series {
  if (!Number.isInteger(k)) throw new RangeError(`integer power expected, got ${k}`);
  if (Math.abs(k) > MAX_EXPONENT) {
    throw new LimitError('integer exponent', 'maxExponent', MAX_EXPONENT, Math.abs(k), 'rewrite the expression with smaller powers');
  }
  const bits = a.coeffs.reduce((m, c) => Math.max(m, ...c.terms().map((t) => (t.coeff instanceof Rational ? bitLength(t.coeff.n) + bitLength(t.coeff.d) : 0))), 0);
  if (bits * Math.abs(k) > MAX_POWER_BITS) {
    throw new LimitError('size of a power (bits)', 'maxPowerBits', MAX_POWER_BITS, bits * Math.abs(k), 'rewrite the expression with smaller numbers or powers');
  }
  if (k === 0) {
    if (a.coeffs.length === 0 && !a.isZero()) throw new AlgebraError('0^0 is undefined: the base is zero as far as known');
    if (a.isZero()) throw new AlgebraError('0^0 is undefined');
    return Series.ONE;
  }
  if (a.isZero()) return k > 0 ? Series.ZERO : inverse(a, cap);
  const n = Math.abs(k);
  let base = k < 0 ? inverse(a, cap + (n - 1) * a.val) : a;
  // base^j has leading power j·v; the result needs every factor to relative precision cap − n·v.
  const v = base.val;
  const rel = Math.max(0, cap - n * v);
  const keep = (s: Series, j: number) => s.truncate(j * v + rel);
  let result = Series.ONE;
  let used = 0;
  let p = 1;
  let m = n;
  while (m > 0) {
    if (m & 1) {
      used += p;
      result = keep(result.mul(base), used);
    }
    m >>= 1;
    if (m) {
      p *= 2;
      base = keep(base.mul(base), p);
    }
  }
  return result.truncate(cap);
}

/** The exact rational root r^{1/q} when r is a perfect q-th power; undefined otherwise. */
function rationalRoot(r: Rational, q: number): Rational | undefined {
  if (r.sign() < 0 && q % 2 === 0) return undefined;
  const root = (x: bigint): bigint | undefined => {
    const neg = x < 0n;
    const v = neg ? -x : x;
    if (v < 2n) return neg ? -v : v;
    if (bitLength(v) > 4096) return undefined;
    const y = BigInt(Math.round(Number(v) ** (1 / q)));
    for (let d = -2n; d <= 2n; d++) if ((y + d) >= 0n && (y + d) ** BigInt(q) === v) return neg ? -(y + d) : y + d;
    return undefined;
  };
  const n = root(r.n);
  const d = root(r.d);
  return n === undefined || d === undefined ? undefined : Rational.of(n, d);
}

/** c^y for a single-term coefficient c and an exact rational y. */
function powCoefficient(c: Poly, y: Rational): Poly {
  if (y.abs().compare(Rational.int(MAX_EXPONENT)) > 0) {
    throw new LimitError('exponent', 'maxExponent', MAX_EXPONENT, y.toString(), 'rewrite the expression with smaller powers');
  }
  if (y.isInteger()) {
    const k = Number(y.n);
    if (k >= 0) return c.pow(k);
    return invertCoefficient(c).pow(-k);
  }
  const t = c.singleTerm();
  const q = Number(y.d);
  const refuse = () => new AlgebraError(`(${formatPoly(c)})^(${y.toString()}) is not exact`, 'fractional powers need a perfect power such as 4 or pi^2');
  if (!t || !(t.coeff instanceof Rational) || q > 64) throw refuse();
  const root = rationalRoot(t.coeff, q);
  if (!root || t.mono.factors.some((f) => f.exp % q !== 0)) throw refuse();
  const m = monomial(t.mono.factors.map((f) => ({ name: f.name, exp: f.exp / q })));
  const r = Poly.term(root, m).pow(Math.abs(Number(y.n)));
  return y.sign() < 0 ? invertCoefficient(r) : r;
}

/** a^y for a series exponent y, computed through at most ε^cap (see the module comment). */
export function powSeries(a: Series, y: Series, cap: number): Series {
  if (y.order !== Infinity && y.order < 0) throw new AlgebraError('the exponent is not known at eps^0');
  if (y.val < 0) throw new AlgebraError('an exponent with a pole in eps gives no Laurent expansion');
  const y0p = y.val === 0 ? y.coeffs[0]! : Poly.ZERO;
  const y0 = y0p.asRational();
  if (!y0) throw new AlgebraError(`the exponent's eps^0 term ${formatPoly(y0p)} must be an exact rational`);
  const y1 = y.sub(Series.constant(Poly.constant(y0)));
  if (y1.isZero() && y0.isInteger()) return powInteger(a, Number(y0.n), cap);
  if (a.coeffs.length === 0) throw new AlgebraError('the base of a power is zero as far as known');
  const v = a.val;
  if (!y1.isZero() && v !== 0) throw new AlgebraError(`eps^(${v}) raised to an eps-dependent power involves log(eps)`);
  const vy = y0.mul(Rational.int(v));
  if (!vy.isInteger()) throw new AlgebraError(`a fractional power eps^(${vy.toString()}) has no Laurent expansion`);
  const c = a.coeffs[0]!;
  const cInv = invertCoefficient(c);
  const rel = a.shift(-v).scale(cInv); // 1 + u
  const logRel = logSeries(rel, cap - Number(vy.n));
  let expo = logRel.scale(Poly.constant(y0));
  if (!y1.isZero()) expo = expo.add(y1.mul(logRel.add(Series.constant(logOfConstant(c)))));
  const prefactor = powCoefficient(c, y0);
  return expSeries(expo, cap - Number(vy.n)).scale(prefactor).shift(Number(vy.n)).truncate(cap);
}
