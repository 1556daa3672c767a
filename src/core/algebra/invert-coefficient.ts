/**
 * Inverting a series coefficient. A polynomial is invertible in our ring only when it is a
 * single term c·m (c a non-zero exact rational or an approximate number away from 0):
 * its inverse is c⁻¹·m⁻¹ (monomials allow negative powers).
 */
import { AlgebraError } from './algebra-error.ts';
import { powMonomial } from './monomial.ts';
import { invNum } from './num.ts';
import { Poly } from './polynomial.ts';
import { formatPoly } from './format-text.ts';

/** 1/p for a single-term polynomial; AlgebraError otherwise. */
export function invertCoefficient(p: Poly): Poly {
  const t = p.singleTerm();
  if (!t) {
    if (p.isZero()) throw new AlgebraError('division by zero');
    throw new AlgebraError(
      `cannot divide by ${formatPoly(p)}: only single terms (a number times a product of constants and symbols) can be inverted exactly`,
      'rewrite the expression so that the divisor is a single term',
    );
  }
  let c;
  try {
    c = invNum(t.coeff);
  } catch (e) {
    throw new AlgebraError(`cannot divide by ${formatPoly(p)}: ${(e as Error).message}`);
  }
  return Poly.term(c, powMonomial(t.mono, -1));
}
