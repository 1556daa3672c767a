import { describe, expect, it } from 'vitest';
import {
  evaluateSeriesAt,
  expandExpression,
  formatPoly,
  gammaProduct,
  gammaSeries,
  inverse,
  monomial,
  Poly,
  Rational,
  Series,
} from '../../../src/core/algebra/index.ts';
import { agreeThrough } from './arbitraries.ts';

const q = (n: number, d = 1) => Rational.of(BigInt(n), BigInt(d));

describe('Gamma expansions', () => {
  it('Γ(1+ε)Γ(1−ε) = πε/sin(πε) through ε^16 (DLMF 5.5.3; sin series DLMF 4.19.1)', () => {
    const K = 16;
    // sin(πε)/(πε) = Σ (−1)^k π^{2k} ε^{2k} / (2k+1)!, built here term by term.
    const coeffs: Poly[] = [];
    let fact = 1n;
    for (let k = 0; 2 * k <= K + 1; k++) {
      if (k > 0) fact *= BigInt(2 * k) * BigInt(2 * k + 1);
      coeffs.push(Poly.term(Rational.of(k % 2 ? -1n : 1n, fact), monomial([{ name: 'pi', exp: 2 * k }])));
      if (2 * k + 1 <= K + 1) coeffs.push(Poly.ZERO);
    }
    const sinOver = Series.make(0, coeffs, K + 1);
    const expected = inverse(sinOver, K);
    const got = gammaProduct({ num: [{ n: 1, a: 1 }, { n: 1, a: -1 }] }, K);
    expect(got.order).toBe(K);
    expect(agreeThrough(got, expected, K)).toBe(true);
    expect(formatPoly(got.coeff(2))).toBe('1/6*pi^2');
  });

  it('satisfies Γ(z+1) = zΓ(z) at z = n + aε, including negative n (DLMF 5.5.1)', () => {
    for (const n of [-3, -2, -1, 0, 1, 2, 5]) {
      for (const a of [q(1), q(-2), q(1, 3)]) {
        const K = 5;
        const lhs = gammaSeries(n + 1, a, K);
        const z = Series.make(0, [Poly.constant(q(n)), Poly.constant(a)]);
        const rhs = z.mul(gammaSeries(n, a, K + 1)).truncate(K);
        expect(agreeThrough(lhs, rhs, K)).toBe(true);
        expect(lhs.order).toBe(K);
      }
    }
  });

  it('Γ(−2+ε) = 1/(2ε) + 3/4 − γ/2 + O(ε) (DLMF 5.7.1 with 5.5.1; common practice)', () => {
    const s = gammaSeries(-2, 1, 0);
    expect(formatPoly(s.coeff(-1))).toBe('1/2');
    expect(formatPoly(s.coeff(0))).toBe('3/4 - 1/2*euler_gamma');
  });

  it('Γ(1.1) from the series at ε = 0.1 matches A&S Table 6.1 (0.95135 07699)', () => {
    const v = evaluateSeriesAt(gammaSeries(1, 1, 30), 0.1);
    expect(v.value).toBeCloseTo(0.9513507698668732, 12);
  });

  it('G(1,1) = Γ(ε)Γ(1−ε)²/Γ(2−2ε)·e^{γε} = 1/ε + 2 + (4 − π²/12)ε + … in D = 4 − 2ε ("Analytic Tools for Feynman Integrals", Springer 2012, ch. 1; common practice)', () => {
    const g = gammaProduct({ num: [{ n: 0, a: 1 }, { n: 1, a: -1 }, { n: 1, a: -1 }], den: [{ n: 2, a: -2 }], expEulerGamma: 1 }, 1);
    expect(g.val).toBe(-1);
    expect(formatPoly(g.coeff(-1))).toBe('1');
    expect(formatPoly(g.coeff(0))).toBe('2');
    expect(formatPoly(g.coeff(1))).toBe('4 - 1/12*pi^2');
    // The same through the parser (Gamma factors combined in exponential form).
    const parsed = expandExpression('Gamma(eps)*Gamma(1-eps)^2/Gamma(2-2*eps)*exp(euler_gamma*eps)', 3);
    expect(agreeThrough(parsed, gammaProduct({ num: [{ n: 0, a: 1 }, { n: 1, a: -1 }, { n: 1, a: -1 }], den: [{ n: 2, a: -2 }], expEulerGamma: 1 }, 3), 3)).toBe(true);
  });

  it('the exp-form product agrees with multiplying single Gamma series', () => {
    const spec = { num: [{ n: 0, a: 2 }, { n: -1, a: 1 }, { n: 3, a: q(-1, 2) }], den: [{ n: 1, a: 3 }] };
    const direct = gammaSeries(0, 2, 6).mul(gammaSeries(-1, 1, 7)).mul(gammaSeries(3, q(-1, 2), 8)).mul(inverse(gammaSeries(1, 3, 8), 8));
    const prod = gammaProduct(spec, 4);
    expect(agreeThrough(prod, direct, 4)).toBe(true);
  });

  it('Gamma with a general argument Γ(1 + ε + ε²) agrees with composition by hand', () => {
    const s = expandExpression('Gamma(1 + eps + eps^2)', 2);
    // lnΓ(1+δ) = −γδ + ζ(2)δ²/2 + …, δ = ε + ε² (DLMF 5.7.3)
    expect(formatPoly(s.coeff(1))).toBe('-euler_gamma');
    expect(formatPoly(s.coeff(2))).toBe('-euler_gamma + 1/12*pi^2 + 1/2*euler_gamma^2');
  });

  it('refuses Gamma at a pole without regulator and Gamma(1/2)', () => {
    expect(() => expandExpression('Gamma(0)', 0)).toThrow(/pole/);
    expect(() => expandExpression('Gamma(1/2 + eps)', 0)).toThrow(/integer/);
  });
});
