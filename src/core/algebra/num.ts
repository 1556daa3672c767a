/**
 * Scalars of polynomials: an exact Rational or an approximate value. Mixing the two gives
 * an approximate result; exactness is therefore visible at every term.
 */
import { Approx } from './approx.ts';
import { Rational } from './rational.ts';

/** A polynomial coefficient: exact or approximate. */
export type Num = Rational | Approx;

/** Whether a scalar is exact. */
export function isExactNum(x: Num): x is Rational {
  return x instanceof Rational;
}

function toApprox(x: Num): Approx {
  return x instanceof Rational ? Approx.fromRational(x) : x;
}

export function addNum(a: Num, b: Num): Num {
  if (a instanceof Rational && b instanceof Rational) return a.add(b);
  return toApprox(a).add(toApprox(b));
}

export function mulNum(a: Num, b: Num): Num {
  if (a instanceof Rational && b instanceof Rational) return a.mul(b);
  // An exact zero annihilates even an approximate factor.
  if ((a instanceof Rational && a.isZero()) || (b instanceof Rational && b.isZero())) return Rational.ZERO;
  return toApprox(a).mul(toApprox(b));
}

export function negNum(a: Num): Num {
  return a.neg();
}

/** 1/a; throws RangeError for an exact zero or an interval containing zero. */
export function invNum(a: Num): Num {
  return a.inv();
}

/** Exactly zero (an approximate value is never exactly zero). */
export function isZeroNum(a: Num): boolean {
  return a instanceof Rational && a.isZero();
}

/** The scalar as a double together with its error bound. */
export function numToApprox(a: Num): Approx {
  return toApprox(a);
}
