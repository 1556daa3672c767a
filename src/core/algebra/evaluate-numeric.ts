/**
 * Floating evaluation: polynomials and series as doubles with an error bound. Exact
 * polynomials get only the rounding of double arithmetic; approximate coefficients add
 * their errors (propagated as in `approx.ts`). Free symbols take values from `symbols`.
 */
import { Approx } from './approx.ts';
import { variableValue } from './constants.ts';
import { numToApprox } from './num.ts';
import type { Poly } from './polynomial.ts';
import type { Series } from './series.ts';

/** Values of free symbols, e.g. `{ N: 1 }`. */
export type SymbolValues = Readonly<Record<string, number>>;

/** The value of a polynomial as value ± error. */
export function evaluatePolyApprox(p: Poly, symbols: SymbolValues = {}): Approx {
  let sum = new Approx(0, 0);
  for (const t of p.terms()) {
    let term = numToApprox(t.coeff);
    for (const f of t.mono.factors) {
      const v = variableValue(f.name, symbols);
      const x = v ** f.exp;
      term = term.mul(new Approx(x, Math.abs(x) * 2 ** -52 * (Math.abs(f.exp) + 1)));
    }
    sum = sum.add(term);
  }
  return sum;
}

/** The value of a polynomial as a double. */
export function evaluatePoly(p: Poly, symbols: SymbolValues = {}): number {
  return evaluatePolyApprox(p, symbols).value;
}

/**
 * The truncated series Σ_{k ≤ order} c_k x^k at ε = x (the neglected remainder is
 * O(x^{order+1}) and not included in the error).
 */
export function evaluateSeriesAt(s: Series, x: number, symbols: SymbolValues = {}): Approx {
  let sum = new Approx(0, 0);
  for (let i = 0; i < s.coeffs.length; i++) {
    const xk = x ** (s.val + i);
    sum = sum.add(evaluatePolyApprox(s.coeffs[i]!, symbols).mul(new Approx(xk, Math.abs(xk) * 2 ** -50)));
  }
  return sum;
}
