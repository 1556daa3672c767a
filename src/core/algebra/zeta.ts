/**
 * Riemann zeta values, exactly as polynomials (odd ζ(k) as basis constants, even ζ(2n)
 * reduced to rational × π^{2n}) and numerically.
 */
import { bernoulli, factorial } from './bernoulli.ts';
import { variable } from './monomial.ts';
import { Poly } from './polynomial.ts';
import { Rational } from './rational.ts';

/** Largest k accepted for ζ(k), exact or numeric. */
export const MAX_ZETA_ARGUMENT = 200;

const evenCache = new Map<number, Rational>();

/**
 * The rational r with ζ(2n) = r·π^{2n}:
 * ζ(2n) = (−1)^{n+1} B_{2n} (2π)^{2n} / (2 (2n)!)  (DLMF 25.6.2).
 */
export function evenZetaRational(twoN: number): Rational {
  if (!Number.isInteger(twoN) || twoN < 2 || twoN % 2 !== 0) throw new RangeError(`expected an even k ≥ 2, got ${twoN}`);
  const hit = evenCache.get(twoN);
  if (hit) return hit;
  const n = twoN / 2;
  const sign = n % 2 === 1 ? 1n : -1n;
  const r = bernoulli(twoN)
    .mul(Rational.of(sign * 2n ** BigInt(twoN), 2n * factorial(twoN)));
  evenCache.set(twoN, r);
  return r;
}

/** ζ(k) for an integer k ≥ 2 as an exact polynomial: `zeta(k)` for odd k, r·pi^k for even k. */
export function zetaPoly(k: number): Poly {
  if (!Number.isInteger(k) || k < 2) throw new RangeError(`zeta(k) needs an integer k ≥ 2 (ζ(1) is the pole), got ${k}`);
  if (k > MAX_ZETA_ARGUMENT) throw new RangeError(`zeta(${k}): argument exceeds ${MAX_ZETA_ARGUMENT}`);
  if (k % 2 === 0) return Poly.term(evenZetaRational(k), variable('pi', k));
  return Poly.term(Rational.ONE, variable(`zeta(${k})`));
}

/**
 * ζ(k) as a double by direct summation of the first M−1 terms with the Euler–Maclaurin tail
 * ∫_M^∞ x^{−k}dx + M^{−k}/2 + Σ_j B_{2j}/(2j)! · k(k+1)…(k+2j−2) M^{−k−2j+1}
 * (DLMF 2.10.1); M = 30 and six correction terms give full double precision for k ≥ 2.
 */
export function zetaNumeric(k: number): number {
  if (!Number.isInteger(k) || k < 2) throw new RangeError(`zeta(k) needs an integer k ≥ 2, got ${k}`);
  const M = 30;
  let s = 0;
  for (let n = M - 1; n >= 1; n--) s += n ** -k;
  let tail = M ** (1 - k) / (k - 1) + M ** -k / 2;
  let rising = k; // k(k+1)…(k+2j−2)
  for (let j = 1; j <= 6; j++) {
    const b = bernoulli(2 * j).toNumber() / Number(factorial(2 * j));
    tail += b * rising * M ** (-k - 2 * j + 1);
    rising *= (k + 2 * j - 1) * (k + 2 * j);
  }
  return s + tail;
}
