import { gammaProduct } from '../algebra/gamma-product.ts';
import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import { InputError } from '../errors.ts';
import { inverse } from '../algebra/series-inverse.ts';
import { gFunction, gFunctionGammas, PLAIN_MEASURE, type LoopMeasure } from '../integrals/g-function.ts';

/**
 * Renormalization schemes (DESIGN §6). Every scheme fixes the per-loop normalization of the
 * measure and the renormalization map R:
 *   ms     d^Dk/π^{D/2} per loop,                       R = pole part K
 *   msbar  e^{γε} d^Dk/π^{D/2} per loop,                 R = K   (same counterterms as ms, graph by graph)
 *   g      d^Dk/π^{D/2} / (ε G0(ε)) per loop, G0 the theory's one-loop log-divergent propagator
 *          integral (G(1,1) in D0 = 4, G(1,2) in D0 = 6), so that G0 becomes exactly 1/ε;  R = K
 *   mom    e^{γε} d^Dk/π^{D/2} per loop (the measure drops out), R = evaluation at the subtraction
 *          point (two-point functions at p² = μ², four-point at the exceptional point p in at leg 1, out at leg 2)
 */
export type SchemeName = 'ms' | 'msbar' | 'g' | 'mom';
export const SCHEME_NAMES: readonly SchemeName[] = ['ms', 'msbar', 'g', 'mom'];

export interface Scheme {
  readonly name: SchemeName;
  readonly minimal: boolean;
  /** The per-loop factor of the measure as Gammas, e^{γε} and a power of ε. */
  measure(D0: number): LoopMeasure;
  /** The per-loop factor of the measure, as a series exact through ε^order. */
  loopFactor(D0: number, order: number): Series;
  readonly description: string;
}

export function parseScheme(name: string): Scheme {
  const n = name.toLowerCase().replace('-', '');
  if (!(SCHEME_NAMES as readonly string[]).includes(n)) {
    throw new InputError(`unknown scheme "${name}"`, undefined, `schemes: ${SCHEME_NAMES.join(', ')}`);
  }
  return schemeOf(n as SchemeName);
}

const E_GAMMA_MEASURE: LoopMeasure = { num: [], den: [], expEulerGamma: 1, epsPower: 0 };
const eGammaEps = (order: number) => gammaProduct({ num: [], expEulerGamma: 1 }, order);

export function schemeOf(name: SchemeName): Scheme {
  switch (name) {
    case 'ms':
      return { name, minimal: true, measure: () => PLAIN_MEASURE, loopFactor: () => Series.ONE, description: 'MS: measure d^Dk/pi^{D/2} per loop, R = pole part' };
    case 'msbar':
      return { name, minimal: true, measure: () => E_GAMMA_MEASURE, loopFactor: (_D0, order) => eGammaEps(order), description: 'MS-bar: measure e^{gamma_E eps} d^Dk/pi^{D/2} per loop, R = pole part' };
    case 'mom':
      return { name, minimal: false, measure: () => E_GAMMA_MEASURE, loopFactor: (_D0, order) => eGammaEps(order), description: 'MOM: subtraction at p^2 = mu^2 (two-point) and at the exceptional point p in at leg 1, out at leg 2 (four-point)' };
    case 'g':
      return {
        name,
        minimal: true,
        measure(D0) {
          const g0 = gFunctionGammas({ a: 1, b: Rational.ZERO }, { a: D0 / 2 - 1, b: Rational.ZERO }, D0);
          return { num: g0.den, den: g0.num, expEulerGamma: 0, epsPower: -1 };
        },
        loopFactor(D0, order) {
          // 1/(ε G0): G0 = G(1,1) in D0 = 4, G(1, D0/2 − 1) in general (indices summing to D0/2).
          const one = { a: 1, b: Rational.ZERO };
          const g0 = gFunction(one, { a: D0 / 2 - 1, b: Rational.ZERO }, D0, order + 2)!;
          const epsG0 = g0.mul(Series.monomial(Poly.ONE, 1));
          return inverse(epsG0, order);
        },
        description: 'G-scheme: measure d^Dk/pi^{D/2} / (eps G0) per loop, G0 the one-loop log-divergent propagator integral, R = pole part',
      };
  }
}
