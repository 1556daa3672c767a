import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import { polesNegligible } from './negligible.ts';

/**
 * A value Σ_i c_i(ε) (p²/μ²)^{−l_i ε}: every term of a subtracted graph scales with its own
 * loop number l_i. Kept term by term so that locality (no ln p² in the poles) can be checked
 * and the renormalized value written as a polynomial in L = ln(p²/μ²).
 */
export interface ScalingTerm {
  readonly loops: number;
  readonly value: Series;
}

/** Σ_i c_i at p² = μ² (L = 0). */
export function atReferencePoint(terms: readonly ScalingTerm[]): Series {
  return terms.reduce((s, t) => s.add(t.value), Series.ZERO);
}

/** The coefficient of L^j: Σ_i c_i (−l_i ε)^j / j!. */
export function logCoefficient(terms: readonly ScalingTerm[], j: number): Series {
  let fact = Rational.ONE;
  for (let k = 2; k <= j; k++) fact = fact.mul(Rational.int(k));
  let out = Series.ZERO;
  for (const t of terms) {
    if (j > 0 && t.loops === 0) continue;
    const c = Rational.int(-t.loops).pow(j).div(fact);
    out = out.add(t.value.shift(j).scale(Poly.constant(c)));
  }
  return out;
}

/** Whether the pole part of every L^j coefficient with j ≥ 1 vanishes (locality), through j = maxJ. */
export function isLocal(terms: readonly ScalingTerm[], maxJ: number): boolean {
  for (let j = 1; j <= maxJ; j++) if (!polesNegligible(logCoefficient(terms, j))) return false;
  return true;
}
