/** fast-check arbitraries for algebra values (test helper, shared by the algebra tests). */
import fc from 'fast-check';
import { monomial, Poly, Rational, Series } from '../../../src/core/algebra/index.ts';

/** Seeded runs: reproducible and fast. */
export const RUNS = { seed: 20240605, numRuns: 300 } as const;

export const rationalArb = fc
  .tuple(fc.bigInt({ min: -2000n, max: 2000n }), fc.bigInt({ min: 1n, max: 60n }))
  .map(([n, d]) => Rational.of(n, d));

export const nonZeroRationalArb = rationalArb.filter((r) => !r.isZero());

const VARS = ['N', 'g', 'pi', 'zeta(3)', 'zeta(5)', 'euler_gamma', 'log(2)'] as const;

export const monomialArb = fc
  .array(fc.tuple(fc.constantFrom(...VARS), fc.integer({ min: -1, max: 3 })), { maxLength: 3 })
  .map((fs) => monomial(fs.map(([name, exp]) => ({ name, exp }))));

export const polyArb = fc
  .array(fc.tuple(rationalArb, monomialArb), { maxLength: 4 })
  .map((ts) => Poly.fromTerms(ts.map(([coeff, mono]) => ({ coeff, mono }))));

/** Polynomials in the constants only (non-negative powers), as series coefficients. */
export const constPolyArb = fc
  .array(fc.tuple(rationalArb, fc.array(fc.tuple(fc.constantFrom('pi', 'zeta(3)', 'euler_gamma', 'N'), fc.integer({ min: 0, max: 2 })), { maxLength: 2 })), { maxLength: 3 })
  .map((ts) => Poly.fromTerms(ts.map(([coeff, fs]) => ({ coeff, mono: monomial(fs.map(([name, exp]) => ({ name, exp }))) }))));

/** Exact Laurent polynomials in ε (order Infinity). */
export const exactSeriesArb = fc
  .tuple(fc.integer({ min: -3, max: 2 }), fc.array(constPolyArb, { maxLength: 5 }))
  .map(([val, cs]) => Series.make(val, cs));

/** Exact Laurent polynomials whose leading coefficient is a non-zero rational (invertible). */
export const invertibleSeriesArb = fc
  .tuple(fc.integer({ min: -2, max: 2 }), nonZeroRationalArb, fc.array(constPolyArb, { maxLength: 4 }))
  .map(([val, lead, cs]) => Series.make(val, [Poly.constant(lead), ...cs]));

/** An exact series and a truncation order at or above its leading power. */
export const truncatedSeriesArb = fc
  .tuple(exactSeriesArb, fc.integer({ min: -1, max: 4 }))
  .map(([s, extra]) => ({ full: s, cut: s.truncate((Number.isFinite(s.val) ? s.val : 0) + extra) }));

/** Whether two series agree on every power through k. */
export function agreeThrough(a: Series, b: Series, k: number): boolean {
  if (k === Infinity) k = Math.max(a.top, b.top, 0);
  for (let p = Math.min(a.val, b.val, k); p <= k; p++) {
    if (!Number.isFinite(p)) return true;
    if (!a.coeff(p).equals(b.coeff(p))) return false;
  }
  return true;
}
