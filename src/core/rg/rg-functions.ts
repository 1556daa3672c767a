import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import type { Conventions } from '../theory/types.ts';
import { GSeries } from './g-series.ts';

/** The three renormalization constants as series in g (ε-dependent coefficients). */
export interface ZFactors {
  /** Z_λ: the vertex counterterm, λ₀ φ₀⁴ = μ^{2ε} Z_λ λ φ⁴. */
  readonly vertex: GSeries;
  /** Z_φ: φ₀ = Z_φ^{1/2} φ. */
  readonly field: GSeries;
  /** Z_{m²}: m₀² φ₀² = Z_{m²} m² φ², i.e. m₀² = Z_{m²} m² / Z_φ. */
  readonly mass: GSeries;
}

/** β, γ_φ, γ_{m²} as series in g whose coefficients are still ε-series (poles must vanish). */
export interface RgSeries {
  readonly beta: GSeries;
  readonly gammaField: GSeries;
  readonly gammaMass: GSeries;
}

/**
 * RG functions from the Z-factors, exactly as the definitions say, with no ε → 0 shortcut:
 *   g₀ = μ^{2ε} g Z_g(g),  Z_g = Z_λ / Z_φ²  (λ₀ = μ^{2ε} Z_λ λ / Z_φ²; D = 4 − 2ε),
 *   0 = μ d ln g₀/dμ  ⇒  β = μ dg/dμ = −2εg / (1 + g ∂_g ln Z_g),
 *   γ_φ = ½ μ d ln Z_φ/dμ = ½ (β/g) · g∂_g ln Z_φ,
 *   γ_{m²} = μ d ln m²/dμ = −μ d ln(Z_{m²}/Z_φ)/dμ = −(β/g) · g∂_g (ln Z_{m²} − ln Z_φ).
 * The results are Laurent series in ε at each order of g. Because β is computed from all poles
 * of Z_g, not only the simple ones, the vanishing of every pole of β, γ_φ and γ_{m²} is the RG
 * consistency of the higher poles (they must follow from the simple poles); in a minimal scheme
 * this reduces to β = −2εg + 2g² ∂_g z₁(g), z₁ the residue of Z_g, and γ_φ = −g ∂_g z₁^φ (½ included).
 * In D = D0 − ε (the convention 'D0-eps') the engine's ε is half the convention's; only the
 * ε-dependent term of β changes (−2εg → −εg), which the report handles.
 * Conventions: betaSign −1 reports −μ dg/dμ; gammaPhiHalf false drops the ½.
 */
export function rgFunctions(z: ZFactors, conventions: Conventions): RgSeries {
  const lnZg = z.vertex.sub(GSeries.one(z.vertex.order)).log1p().sub(logZ(z.field).scale(Rational.int(2)));
  const X = lnZg.gDerivative();
  const minusTwoEps = Series.monomial(Poly.constant(Rational.int(-2)), 1);
  /** β/g = −2ε/(1 + X). */
  const betaOverG = X.inverseOnePlus().scaleSeries(minusTwoEps);
  const beta = betaOverG.shift(1);
  const lnZphi = logZ(z.field);
  const half = conventions.gammaPhiHalf ? Rational.of(1, 2) : Rational.ONE;
  const gammaField = betaOverG.mul(lnZphi.gDerivative()).scale(half);
  const gammaMass = betaOverG.mul(logZ(z.mass).sub(lnZphi).gDerivative()).neg();
  const sign = Rational.int(conventions.betaSign);
  return { beta: beta.scale(sign), gammaField, gammaMass };
}

function logZ(Z: GSeries): GSeries {
  return Z.sub(GSeries.one(Z.order)).log1p();
}
