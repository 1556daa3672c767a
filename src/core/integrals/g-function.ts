import { gammaProduct, type GammaArg } from '../algebra/gamma-product.ts';
import { Rational } from '../algebra/rational.ts';
import type { Series } from '../algebra/series.ts';
import { Series as SeriesValue } from '../algebra/series.ts';
import type { LineIndex } from './line-index.ts';

/**
 * The one-loop massless propagator integral (DESIGN §5; common practice, e.g. "Analytic Tools for
 * Feynman Integrals", Springer Tracts in Modern Physics 250 (2012), ch. 1):
 *   ∫ d^Dk/π^{D/2} 1/[(k²)^{ν1} ((p−k)²)^{ν2}] = G(ν1,ν2) (p²)^{D/2−ν1−ν2},
 *   G(ν1,ν2) = Γ(ν1+ν2−D/2) Γ(D/2−ν1) Γ(D/2−ν2) / [Γ(ν1) Γ(ν2) Γ(D−ν1−ν2)],
 * with D = D0 − 2ε. Returns null when a Gamma in the numerator sits at a non-positive integer
 * with no ε to regulate it (an unregulated divergence), and exact 0 when the denominator does
 * (a numerator line that makes the integral scaleless).
 */
export function gFunction(nu1: LineIndex, nu2: LineIndex, D0: number, order: number, measure: LoopMeasure = PLAIN_MEASURE): Series | null {
  const { num, den } = gFunctionGammas(nu1, nu2, D0);
  const atPole = (g: GammaArg) => g.n <= 0 && (g.a as Rational).isZero();
  if (den.some(atPole)) return SeriesValue.ZERO;
  if (num.some(atPole)) return null;
  // One Gamma product with the measure's own Gammas and e^{γε}: the γ_E of the G-function and of
  // the MS-bar measure cancel inside the log-series instead of in long products of polynomials.
  return gammaProduct({ num: [...num, ...measure.num], den: [...den, ...measure.den], expEulerGamma: measure.expEulerGamma }, order - measure.epsPower).shift(measure.epsPower);
}

/** The Gamma arguments of G(ν1,ν2). */
export function gFunctionGammas(nu1: LineIndex, nu2: LineIndex, D0: number): { num: GammaArg[]; den: GammaArg[] } {
  const half = D0 / 2; // D/2 = half − ε
  const arg = (a: number, b: Rational): GammaArg => ({ n: a, a: b });
  const num = [arg(nu1.a + nu2.a - half, nu1.b.add(nu2.b).add(Rational.ONE)), arg(half - nu1.a, Rational.MINUS_ONE.sub(nu1.b)), arg(half - nu2.a, Rational.MINUS_ONE.sub(nu2.b))];
  const den = [arg(nu1.a, nu1.b), arg(nu2.a, nu2.b), arg(D0 - nu1.a - nu2.a, Rational.int(-2).sub(nu1.b).sub(nu2.b))];
  return { num, den };
}

/** A per-loop measure factor written as ε^epsPower · Π Γ(num)/Π Γ(den) · e^{kγε}. */
export interface LoopMeasure {
  readonly num: readonly GammaArg[];
  readonly den: readonly GammaArg[];
  readonly expEulerGamma: number;
  readonly epsPower: number;
}

export const PLAIN_MEASURE: LoopMeasure = { num: [], den: [], expEulerGamma: 0, epsPower: 0 };
