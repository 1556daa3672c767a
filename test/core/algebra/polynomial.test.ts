import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatPoly, fromJSON, monomial, parsePoly, Poly, polyToLatex, Rational, toJSON, variable, zetaPoly } from '../../../src/core/algebra/index.ts';
import { polyArb, RUNS } from './arbitraries.ts';

const q = (n: number, d = 1) => Rational.of(BigInt(n), BigInt(d));

describe('Poly', () => {
  it('satisfies the commutative ring axioms (property)', () => {
    fc.assert(
      fc.property(polyArb, polyArb, polyArb, (a, b, c) => {
        expect(a.add(b).equals(b.add(a))).toBe(true);
        expect(a.mul(b).equals(b.mul(a))).toBe(true);
        expect(a.add(b).add(c).equals(a.add(b.add(c)))).toBe(true);
        expect(a.mul(b).mul(c).equals(a.mul(b.mul(c)))).toBe(true);
        expect(a.mul(b.add(c)).equals(a.mul(b).add(a.mul(c)))).toBe(true);
        expect(a.sub(a).isZero()).toBe(true);
        expect(a.mul(Poly.ONE).equals(a)).toBe(true);
      }),
      RUNS,
    );
  });

  it('prints the canonical text form of DESIGN §4', () => {
    const p = Poly.fromTerms([
      { coeff: q(12), mono: variable('zeta(3)') },
      { coeff: q(145, 8), mono: monomial([]) },
    ]);
    expect(formatPoly(p)).toBe('145/8 + 12*zeta(3)');
    const n = Poly.fromTerms([
      { coeff: q(1, 3), mono: variable('N') },
      { coeff: q(8, 3), mono: monomial([]) },
    ]);
    expect(formatPoly(n)).toBe('8/3 + 1/3*N');
    expect(formatPoly(Poly.ZERO)).toBe('0');
    const mixed = Poly.fromTerms([
      { coeff: q(-1), mono: variable('pi', 2) },
      { coeff: q(-3, 2), mono: monomial([{ name: 'N', exp: 2 }, { name: 'zeta(3)', exp: 1 }]) },
      { coeff: q(1), mono: variable('euler_gamma') },
      { coeff: q(-7), mono: monomial([]) },
      { coeff: q(2), mono: variable('N') },
    ]);
    // degree in symbols first, then weight, then names; exponent 1 and coefficient 1 omitted
    expect(formatPoly(mixed)).toBe('-7 + euler_gamma - pi^2 + 2*N - 3/2*N^2*zeta(3)');
  });

  it('prints LaTeX', () => {
    const p = Poly.fromTerms([
      { coeff: q(12), mono: variable('zeta(3)') },
      { coeff: q(145, 8), mono: monomial([]) },
    ]);
    expect(polyToLatex(p)).toBe('\\frac{145}{8} + 12\\zeta(3)');
    expect(polyToLatex(Poly.term(q(-1, 6), monomial([{ name: 'pi', exp: 2 }, { name: 'euler_gamma', exp: 1 }])))).toBe('-\\frac{1}{6}\\pi^{2}\\gamma_E');
    expect(polyToLatex(Poly.term(q(2), variable('log(2)', 2)))).toBe('2(\\ln 2)^{2}');
  });

  it('parses its own canonical form back (property)', () => {
    fc.assert(fc.property(polyArb, (p) => parsePoly(formatPoly(p)).equals(p)), RUNS);
  });

  it('round-trips through the tagged JSON codec (property)', () => {
    fc.assert(fc.property(polyArb, (p) => (fromJSON(JSON.parse(JSON.stringify(toJSON(p)))) as Poly).equals(p)), RUNS);
  });

  it('rewrites even zeta values as powers of pi: zeta(2) = pi^2/6, zeta(4) = pi^4/90 (DLMF 25.6.1)', () => {
    expect(formatPoly(zetaPoly(2))).toBe('1/6*pi^2');
    expect(formatPoly(zetaPoly(4))).toBe('1/90*pi^4');
    expect(formatPoly(parsePoly('zeta(2)^2 - 5/2*zeta(4)'))).toBe('0');
  });
});
