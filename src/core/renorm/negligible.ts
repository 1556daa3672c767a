import { Approx } from '../algebra/approx.ts';
import type { Poly } from '../algebra/polynomial.ts';
import type { Series } from '../algebra/series.ts';

/** How many standard errors an approximate coefficient may sit from zero and still count as zero. */
export const CHECK_SIGMAS = 4;

/**
 * Zero for the purpose of a check: exactly zero, or — when values supplied by hand or periods
 * make coefficients approximate — every term within CHECK_SIGMAS errors of zero. Exact terms
 * must vanish exactly; a check on approximate data can only say "consistent within errors".
 */
export function isNegligible(p: Poly): boolean {
  return p.terms().every((t) => t.coeff instanceof Approx && Math.abs(t.coeff.value) <= CHECK_SIGMAS * t.coeff.error);
}

/** Every known coefficient of negative power negligible. */
export function polesNegligible(s: Series): boolean {
  return s.coeffs.every((c, i) => s.val + i >= 0 || isNegligible(c));
}

/** Every known coefficient negligible. */
export function seriesNegligible(s: Series): boolean {
  return s.coeffs.every(isNegligible);
}
