import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, LimitError } from '../../../src/core/errors.ts';
import { expandExpression, formatPoly, formatSeriesExact, parseExpression, seriesToLatex } from '../../../src/core/algebra/index.ts';
import { agreeThrough, RUNS, truncatedSeriesArb } from './arbitraries.ts';

function inputError(f: () => unknown): InputError {
  try {
    f();
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('expected an InputError');
}

describe('parseExpression and expandExpression', () => {
  it('evaluates arithmetic, fractions, decimals and constants exactly', () => {
    const s = expandExpression('1/3 + 2*(1/2)^2 - 1.5 + pi^2/6 - zeta(2)', 0);
    expect(formatPoly(s.coeff(0))).toBe('-2/3');
    expect(formatPoly(expandExpression('-2^2', 0).coeff(0))).toBe('-4');
    expect(formatPoly(expandExpression('2^-1', 0).coeff(0))).toBe('1/2');
    expect(formatPoly(expandExpression('(N+1)^2/N', 0).coeff(0))).toBe('N^-1 + 2 + N');
  });

  it('expands in eps, with ε-dependent exponents kept exact through log(p)', () => {
    const s = expandExpression('4^eps', 2);
    expect(formatPoly(s.coeff(1))).toBe('2*log(2)');
    expect(formatPoly(s.coeff(2))).toBe('2*log(2)^2');
    const t = expandExpression('(1 - eps)^-1', 3);
    expect([0, 1, 2, 3].map((p) => formatPoly(t.coeff(p)))).toEqual(['1', '1', '1', '1']);
  });

  it('recovers orders lost to poles by evaluating deeper', () => {
    // (1/ε)·(ε·(1 + ε + …)) needs the inner factor one order further
    const s = expandExpression('(1/eps)*(eps/(1-eps))', 4);
    expect(s.order).toBe(4);
    expect(formatPoly(s.coeff(4))).toBe('1');
    const g = expandExpression('Gamma(eps)^3*eps^3', 2);
    expect(g.order).toBe(2);
  });

  it('reports the position and what was expected', () => {
    expect(inputError(() => parseExpression('1 + * 2')).position?.offset).toBe(4);
    expect(inputError(() => parseExpression('(1 + 2')).position?.offset).toBe(6);
    expect(inputError(() => parseExpression('2 pi')).message).toMatch(/expected an operator/);
    expect(inputError(() => parseExpression('foo(1)')).message).toMatch(/unknown function "foo"/);
    expect(inputError(() => parseExpression('gamma')).hint).toMatch(/euler_gamma/);
    expect(inputError(() => expandExpression('1 + 1/(1+N)', 0)).position?.offset).toBe(5);
    expect(inputError(() => expandExpression('zeta(1)', 0)).position?.offset).toBe(0);
    expect(inputError(() => expandExpression('log(eps)', 0)).message).toMatch(/log\(eps\)/);
  });

  it('refuses hostile input quickly: deep nesting, giant exponents, huge literals, long input', () => {
    expect(inputError(() => parseExpression('('.repeat(100_000) + '1' + ')'.repeat(100_000))).message).toMatch(/too long|nested/);
    expect(inputError(() => parseExpression('('.repeat(5000) + '1' + ')'.repeat(5000))).message).toMatch(/nested too deeply/);
    expect(inputError(() => parseExpression('-'.repeat(5000) + '1')).message).toMatch(/nested too deeply/);
    expect(inputError(() => parseExpression('9'.repeat(2000))).message).toMatch(/longer than/);
    expect(() => expandExpression('2^(10^10)', 0)).toThrow(LimitError);
    expect(() => expandExpression('(10^999)^(10^4)', 0)).toThrow(LimitError);
    expect(() => expandExpression('zeta(100000)', 0)).toThrow(LimitError);
    expect(() => expandExpression('Gamma(100000 + eps)', 0)).toThrow(LimitError);
    expect(() => expandExpression('1', 41)).toThrow(LimitError);
    // a long flat sum does not overflow the stack
    expect(formatPoly(expandExpression(Array(20000).fill('1').join('+'), 0).coeff(0))).toBe('20000');
  });

  it('reads approximate values 1.234(5) and says the result is approximate', () => {
    const s = expandExpression('1.234(5)*eps + 1/3', 1);
    expect(s.coeff(0).isExact()).toBe(true);
    expect(s.coeff(1).isExact()).toBe(false);
    const c = s.coeff(1).terms()[0]!.coeff as { value: number; error: number };
    expect(c.value).toBeCloseTo(1.234, 12);
    expect(c.error).toBeGreaterThanOrEqual(0.005);
  });

  it('parse(print(series)) = series for random exact series (property)', () => {
    fc.assert(
      fc.property(truncatedSeriesArb, ({ cut }) => {
        const text = formatSeriesExact(cut);
        const k = Number.isFinite(cut.order) ? cut.order : 6;
        const back = expandExpression(text, Math.max(-40, Math.min(40, k)));
        expect(agreeThrough(back, cut, Math.min(k, 40))).toBe(true);
      }),
      { ...RUNS, numRuns: 200 },
    );
  });

  it('prints series in LaTeX', () => {
    expect(seriesToLatex(expandExpression('Gamma(eps)*exp(euler_gamma*eps)', 1))).toBe('\\varepsilon^{-1} + \\frac{1}{12}\\pi^{2}\\,\\varepsilon + \\mathcal{O}(\\varepsilon^{2})');
  });
});
