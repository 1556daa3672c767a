/**
 * Products in exponential form: c · ε^p · exp(L) with c a single-term coefficient, p an
 * integer and L a series vanishing at ε = 0. Products of Gamma functions and factors
 * e^{kγε} multiply in this form by adding log-series, and are expanded with one `exp` at
 * the end — the efficient path for many Gammas.
 */
import { Poly } from './polynomial.ts';
import { expSeries } from './series-exp-log.ts';
import { invertCoefficient } from './invert-coefficient.ts';
import { Series } from './series.ts';

/** c · ε^epsPower · exp(log). */
export interface ExpForm {
  readonly prefactor: Poly;
  readonly epsPower: number;
  /** Vanishes at ε = 0; its order bounds the precision of the whole form. */
  readonly log: Series;
}

/** The form of 1. */
export const EXP_FORM_ONE: ExpForm = { prefactor: Poly.ONE, epsPower: 0, log: Series.ZERO };

/** Product of two forms. */
export function mulExpForms(a: ExpForm, b: ExpForm): ExpForm {
  return { prefactor: a.prefactor.mul(b.prefactor), epsPower: a.epsPower + b.epsPower, log: a.log.add(b.log) };
}

/** Inverse of a form. */
export function invertExpForm(a: ExpForm): ExpForm {
  return { prefactor: invertCoefficient(a.prefactor), epsPower: -a.epsPower, log: a.log.neg() };
}

/** The series of a form, computed through at most ε^cap (known through epsPower + log.order). */
export function expFormToSeries(f: ExpForm, cap: number): Series {
  return expSeries(f.log, cap - f.epsPower).scale(f.prefactor).shift(f.epsPower);
}
