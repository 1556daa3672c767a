import type { BenchCase } from '../bench-case.ts';
import { expandExpression, gammaProduct, Rational } from '../../src/core/algebra/index.ts';

/**
 * Exact ε-expansion of a product of 12 Gamma functions through ε^8 (the target:
 * under 10 ms): six in the numerator, six in the denominator, with poles (n ≤ 0), shifts
 * up to 3 and rational coefficients of ε, times e^{2γε}; once through the helper and once
 * through the parser.
 */
const spec = {
  num: [
    { n: 0, a: 1 },
    { n: 1, a: -1 },
    { n: 1, a: -1 },
    { n: -1, a: 2 },
    { n: 2, a: Rational.of(1n, 2n) },
    { n: 3, a: -3 },
  ],
  den: [
    { n: 2, a: -2 },
    { n: 1, a: 1 },
    { n: 1, a: -3 },
    { n: 2, a: Rational.of(-3n, 2n) },
    { n: 1, a: 4 },
    { n: 3, a: -1 },
  ],
  expEulerGamma: 2,
};

const text =
  'Gamma(eps)*Gamma(1-eps)^2*Gamma(-1+2*eps)*Gamma(2+eps/2)*Gamma(3-3*eps)' +
  '/(Gamma(2-2*eps)*Gamma(1+eps)*Gamma(1-3*eps)*Gamma(2-3/2*eps)*Gamma(1+4*eps)*Gamma(3-eps))*exp(2*euler_gamma*eps)';

export const cases: BenchCase[] = [
  { name: 'expand product of 12 Gammas to eps^8', run: () => void gammaProduct(spec, 8), targetMs: 10 },
  { name: 'expand product of 12 Gammas to eps^8 (parsed expression)', run: () => void expandExpression(text, 8), targetMs: 10 },
];
