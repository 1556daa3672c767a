import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Approx, evaluatePolyApprox, parsePoly, Poly, Rational } from '../../../src/core/algebra/index.ts';
import { RUNS } from './arbitraries.ts';

const approxArb = fc
  .tuple(fc.double({ min: -100, max: 100, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }))
  .map(([v, e]) => new Approx(v, e));

describe('Approx', () => {
  it('error bounds contain every value of the inputs’ intervals (property)', () => {
    fc.assert(
      fc.property(approxArb, approxArb, fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), (a, b, s, t) => {
        const x = a.value + s * a.error;
        const y = b.value + t * b.error;
        const sum = a.add(b);
        const prod = a.mul(b);
        expect(Math.abs(x + y - sum.value)).toBeLessThanOrEqual(sum.error * (1 + 1e-12) + 1e-12);
        expect(Math.abs(x * y - prod.value)).toBeLessThanOrEqual(prod.error * (1 + 1e-12) + 1e-12);
      }),
      RUNS,
    );
  });

  it('combines with exact values: the result is approximate only where it must be', () => {
    const p = parsePoly('1/3 + 2.50(10)*zeta(3)');
    expect(p.isExact()).toBe(false);
    const v = evaluatePolyApprox(p);
    expect(v.value).toBeCloseTo(1 / 3 + 2.5 * 1.2020569031595942854, 12);
    expect(v.error).toBeGreaterThanOrEqual(0.1 * 1.2020569031595942854);
    expect(Poly.constant(Rational.of(1n, 3n)).isExact()).toBe(true);
  });

  it('refuses to divide by an interval containing zero', () => {
    expect(() => new Approx(0.1, 0.2).inv()).toThrow(RangeError);
  });

  it('prints concise notation that the parser reads back', () => {
    const a = new Approx(1.23456, 0.0012);
    expect(a.toString()).toBe('1.2346(12)');
    const back = parsePoly(a.toString()).terms()[0]!.coeff as Approx;
    expect(Math.abs(back.value - a.value)).toBeLessThanOrEqual(back.error);
  });
});
