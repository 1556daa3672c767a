/**
 * Bernoulli numbers B_n as exact rationals (B₁ = −1/2), from the recurrence
 * Σ_{k=0}^{m} C(m+1, k) B_k = 0 for m ≥ 1 (DLMF 24.5.3 with x = 0). Cached.
 */
import { Rational } from './rational.ts';

const cache: Rational[] = [Rational.ONE];

/** Limit on n: the recurrence is quadratic, and nothing here needs more. */
export const MAX_BERNOULLI_INDEX = 400;

/** The Bernoulli number B_n. */
export function bernoulli(n: number): Rational {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`Bernoulli index must be a non-negative integer, got ${n}`);
  if (n > MAX_BERNOULLI_INDEX) throw new RangeError(`Bernoulli index ${n} exceeds ${MAX_BERNOULLI_INDEX}`);
  while (cache.length <= n) {
    const m = cache.length; // compute B_m
    if (m > 1 && m % 2 === 1) {
      cache.push(Rational.ZERO);
      continue;
    }
    // B_m = −1/(m+1) Σ_{k<m} C(m+1,k) B_k
    let sum = Rational.ZERO;
    let binom = 1n; // C(m+1, 0)
    for (let k = 0; k < m; k++) {
      if (!cache[k]!.isZero()) sum = sum.add(cache[k]!.mul(Rational.int(binom)));
      binom = (binom * BigInt(m + 1 - k)) / BigInt(k + 1);
    }
    cache.push(sum.mul(Rational.of(-1n, BigInt(m + 1))));
  }
  return cache[n]!;
}

/** n! as a BigInt. */
export function factorial(n: number): bigint {
  let f = 1n;
  for (let i = 2; i <= n; i++) f *= BigInt(i);
  return f;
}
