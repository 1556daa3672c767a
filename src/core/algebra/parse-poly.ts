/**
 * Reading a coefficient (an ε-free value) back from text, e.g. the canonical form
 * `145/8 + 12*zeta(3)`: parse, expand, and require the result to be an ε-free constant.
 */
import { InputError } from '../errors.ts';
import { expandExpression } from './expand-expression.ts';
import type { Poly } from './polynomial.ts';

/** The polynomial an ε-free expression denotes; InputError when it depends on ε. */
export function parsePoly(text: string, input = 'expression'): Poly {
  const s = expandExpression(text, 0, { input });
  if (s.val < 0 || s.order !== Infinity || s.coeffs.length > 1 || (s.coeffs.length === 1 && s.val !== 0)) {
    throw new InputError(`expected a value without eps, got a series in eps`, { input, offset: 0, source: text });
  }
  return s.coeff(0);
}
