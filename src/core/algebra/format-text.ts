/**
 * The canonical text form (a CLI contract, DESIGN §4): a sum of terms `c*m`, c an integer
 * or p/q (coefficient 1 omitted, negative terms joined by ` - `), m a product of factors
 * `N^k`, `pi^k`, `zeta(k)^e`, `euler_gamma^e`, `log(2)` (exponent 1 omitted) joined by
 * `*`, terms in the order of `compareMonomials`. Zero is `0`. Approximate coefficients
 * print in concise notation `1.2345(12)`. `parseExpression` reads every output back.
 */
import { Approx } from './approx.ts';
import type { Monomial } from './monomial.ts';
import type { Num } from './num.ts';
import type { Poly } from './polynomial.ts';
import { Rational } from './rational.ts';
import type { Series } from './series.ts';

/** `N^2*pi^2*zeta(3)` (empty string for the monomial 1). */
export function formatMonomial(m: Monomial): string {
  return m.factors.map((f) => (f.exp === 1 ? f.name : `${f.name}^${f.exp}`)).join('*');
}

/** Magnitude and sign of a scalar, for joining terms with ` - `. */
function splitSign(c: Num): { negative: boolean; abs: Num } {
  if (c instanceof Rational) return { negative: c.sign() < 0, abs: c.abs() };
  return c.value < 0 ? { negative: true, abs: c.neg() } : { negative: false, abs: c };
}

function formatTerm(abs: Num, m: Monomial): string {
  const mono = formatMonomial(m);
  if (abs instanceof Approx) return mono ? `${abs.toString()}*${mono}` : abs.toString();
  if (mono === '') return abs.toString();
  if (abs.isOne()) return mono;
  return `${abs.toString()}*${mono}`;
}

/** The canonical text of a polynomial, e.g. `145/8 + 12*zeta(3)`, `8/3 + 1/3*N`, `0`. */
export function formatPoly(p: Poly): string {
  const terms = p.terms();
  if (terms.length === 0) return '0';
  let s = '';
  terms.forEach((t, i) => {
    const { negative, abs } = splitSign(t.coeff);
    const body = formatTerm(abs, t.mono);
    if (i === 0) s = negative ? `-${body}` : body;
    else s += negative ? ` - ${body}` : ` + ${body}`;
  });
  return s;
}

/** `eps^-1`, `1`, `eps`, `eps^2`. */
function epsPower(k: number): string {
  return k === 0 ? '' : k === 1 ? 'eps' : `eps^${k}`;
}

/**
 * A series as one expression, e.g. `(1)*eps^-1 + (2 - euler_gamma) + O(eps)`; the parser
 * does not read `O(...)`, so parse the coefficients (or use `formatSeriesExact` for exact
 * Laurent polynomials).
 */
export function formatSeries(s: Series): string {
  const parts: string[] = [];
  for (let i = 0; i < s.coeffs.length; i++) {
    const c = s.coeffs[i]!;
    if (c.isZero()) continue;
    const e = epsPower(s.val + i);
    parts.push(e ? `(${formatPoly(c)})*${e}` : `(${formatPoly(c)})`);
  }
  if (s.order !== Infinity) parts.push(`O(${epsPower(s.order + 1) || '1'})`);
  return parts.length ? parts.join(' + ') : '0';
}

/** A series as a parseable expression: its known terms only (the O(...) remainder dropped). */
export function formatSeriesExact(s: Series): string {
  const parts: string[] = [];
  for (let i = 0; i < s.coeffs.length; i++) {
    const c = s.coeffs[i]!;
    if (c.isZero()) continue;
    const e = epsPower(s.val + i);
    parts.push(e ? `(${formatPoly(c)})*${e}` : `(${formatPoly(c)})`);
  }
  return parts.length ? parts.join(' + ') : '0';
}
