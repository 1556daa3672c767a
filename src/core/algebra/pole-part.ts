/**
 * The pole part K (the negative powers of ε, as in minimal subtraction) and the finite
 * remainder of a series.
 */
import { AlgebraError } from './algebra-error.ts';
import { Series } from './series.ts';

/**
 * K(s): the terms with negative powers of ε. The result is exact (order Infinity); throws
 * AlgebraError when s is not known through ε^{−1}.
 */
export function polePart(s: Series): Series {
  if (s.order < -1) {
    throw new AlgebraError(`the pole part needs the series through eps^-1, but it is known only through eps^${s.order}`, 'expand to a higher order');
  }
  if (s.val >= 0) return Series.ZERO;
  return Series.make(s.val, s.coeffs.slice(0, -s.val), Infinity);
}

/** s − K(s): the terms with powers ε^0 and higher, with s's order. */
export function finitePart(s: Series): Series {
  return s.sub(polePart(s));
}
