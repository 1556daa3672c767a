/**
 * Exact logarithms of constants. log is kept exact only for c = r·π^k with r a positive
 * rational: log c = Σ_p e_p·log(p) + k·log(pi), with r = Π p^{e_p} factored into primes.
 * An approximate positive number gives an approximate logarithm. Anything else (log of
 * ζ(3), of N, of 1 + π²) is refused.
 */
import { AlgebraError } from './algebra-error.ts';
import { Approx } from './approx.ts';
import { variable } from './monomial.ts';
import { Poly } from './polynomial.ts';
import { Rational } from './rational.ts';
import { formatPoly } from './format-text.ts';

/** Trial division bound; a cofactor below its square is prime. */
const TRIAL_LIMIT = 1_000_000n;

/** Prime factorization of a positive integer as [p, e] pairs; throws when it cannot be completed. */
export function factorInteger(n: bigint): [bigint, number][] {
  if (n < 1n) throw new RangeError('factorInteger needs a positive integer');
  const out: [bigint, number][] = [];
  const take = (p: bigint) => {
    let e = 0;
    while (n % p === 0n) {
      n /= p;
      e++;
    }
    if (e) out.push([p, e]);
  };
  take(2n);
  for (let p = 3n; p <= TRIAL_LIMIT && p * p <= n; p += 2n) take(p);
  if (n > 1n) {
    if (n >= TRIAL_LIMIT * TRIAL_LIMIT) {
      throw new AlgebraError(`cannot factor ${n} into primes (a factor beyond ${TRIAL_LIMIT} may remain), so its logarithm is not kept exact`);
    }
    out.push([n, 1]);
  }
  return out;
}

/** log r for a positive rational r, as a combination of log(p). */
export function logOfRational(r: Rational): Poly {
  if (r.sign() <= 0) throw new AlgebraError(`log of ${r.toString()} is not real`, 'logarithms need positive arguments');
  const terms = [];
  for (const [p, e] of factorInteger(r.n)) terms.push({ mono: variable(`log(${p})`), coeff: Rational.int(e) });
  for (const [p, e] of factorInteger(r.d)) terms.push({ mono: variable(`log(${p})`), coeff: Rational.int(-e) });
  return Poly.fromTerms(terms);
}

/** log c for a series' leading coefficient c (see the module comment). */
export function logOfConstant(c: Poly): Poly {
  const t = c.singleTerm();
  const refuse = () =>
    new AlgebraError(
      `the logarithm of ${formatPoly(c)} is not kept exact`,
      'only logarithms of positive rationals times powers of pi are exact (x^(a*eps) needs log x)',
    );
  if (!t) throw refuse();
  let piPower = 0;
  for (const f of t.mono.factors) {
    if (f.name !== 'pi') throw refuse();
    piPower = f.exp;
  }
  let out: Poly;
  if (t.coeff instanceof Approx) {
    if (t.coeff.value - t.coeff.error <= 0) throw new AlgebraError(`log of ${t.coeff.toString()}: the value may be ≤ 0`);
    const v = t.coeff.value;
    out = Poly.constant(new Approx(Math.log(v), Math.log(v) - Math.log(v - t.coeff.error) + Math.abs(Math.log(v)) * 2 ** -52));
  } else out = logOfRational(t.coeff);
  if (piPower) out = out.add(Poly.term(Rational.int(piPower), variable('log(pi)')));
  return out;
}
