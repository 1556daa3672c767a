/**
 * Products and quotients of Gamma functions Γ(n + aε) times e^{kγε}, expanded exactly as
 * one exp of a sum of log-series (see `exp-form.ts`). The consumer-facing helper for
 * one-loop formulas such as G(1,1) = Γ(ε)Γ(1−ε)²/Γ(2−2ε) · e^{γε}.
 */
import { EXP_FORM_ONE, expFormToSeries, invertExpForm, mulExpForms, type ExpForm } from './exp-form.ts';
import { gammaExpForm } from './gamma.ts';
import { variable } from './monomial.ts';
import { Poly } from './polynomial.ts';
import { Rational } from './rational.ts';
import { Series } from './series.ts';

/** The Gamma argument n + aε. */
export interface GammaArg {
  readonly n: number;
  readonly a: Rational | number;
}

/** Π Γ(num) / Π Γ(den) · e^{expEulerGamma·γε}. */
export interface GammaProductSpec {
  readonly num: readonly GammaArg[];
  readonly den?: readonly GammaArg[];
  /** k in the factor e^{kγε} (0 when absent). */
  readonly expEulerGamma?: Rational | number;
}

const asRational = (a: Rational | number): Rational => (a instanceof Rational ? a : Rational.int(a));

/** The series δ = aε. */
function deltaOf(arg: GammaArg): Series {
  const a = asRational(arg.a);
  return a.isZero() ? Series.ZERO : Series.monomial(Poly.constant(a), 1);
}

/** Number of poles (factors δ) the argument contributes: 1 for n ≤ 0 with a ≠ 0. */
function poleCount(arg: GammaArg): number {
  return arg.n <= 0 && !asRational(arg.a).isZero() ? 1 : 0;
}

/** The product in exponential form, log-series through at most ε^cap. */
export function gammaProductForm(spec: GammaProductSpec, cap: number): ExpForm {
  let form = EXP_FORM_ONE;
  for (const g of spec.num) form = mulExpForms(form, gammaExpForm(g.n, deltaOf(g), cap));
  for (const g of spec.den ?? []) form = mulExpForms(form, invertExpForm(gammaExpForm(g.n, deltaOf(g), cap)));
  const k = asRational(spec.expEulerGamma ?? 0);
  if (!k.isZero()) form = mulExpForms(form, { prefactor: Poly.ONE, epsPower: 0, log: Series.monomial(Poly.term(k, variable('euler_gamma')), 1) });
  return form;
}

/**
 * The Laurent expansion of Π Γ(n_i + a_i ε) / Π Γ(m_j + b_j ε) · e^{kγε}, exact through ε^order.
 *
 * @example gammaProduct({ num: [{ n: 0, a: 1 }, { n: 1, a: -1 }, { n: 1, a: -1 }], den: [{ n: 2, a: -2 }], expEulerGamma: 1 }, 0)
 *   // 1/ε + 2 + O(ε)
 */
export function gammaProduct(spec: GammaProductSpec, order: number): Series {
  const p = spec.num.reduce((s, g) => s - poleCount(g), 0) + (spec.den ?? []).reduce((s, g) => s + poleCount(g), 0);
  const form = gammaProductForm(spec, order - p);
  return expFormToSeries(form, order);
}

/** Γ(n + aε) alone, exact through ε^order. */
export function gammaSeries(n: number, a: Rational | number, order: number): Series {
  return gammaProduct({ num: [{ n, a }] }, order);
}
