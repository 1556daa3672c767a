import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fromJSON, Rational, toJSON } from '../../../src/core/algebra/index.ts';
import { nonZeroRationalArb, rationalArb, RUNS } from './arbitraries.ts';

describe('Rational', () => {
  it('normalizes: sign in the numerator, coprime, positive denominator', () => {
    const r = Rational.of(6n, -8n);
    expect([r.n, r.d]).toEqual([-3n, 4n]);
    expect(Rational.of(0n, -5n).d).toBe(1n);
    expect(() => Rational.of(1n, 0n)).toThrow(RangeError);
  });

  it('prints and encodes as tagged JSON with strings', () => {
    expect(Rational.of(-3n, 8n).toString()).toBe('-3/8');
    expect(JSON.stringify(toJSON(Rational.of(-3n, 8n)))).toBe('{"type":"Rational","n":"-3","d":"8"}');
  });

  it('converts huge numerators and denominators to the nearest double', () => {
    const big = Rational.of(10n ** 400n + 1n, 3n * 10n ** 399n);
    expect(big.toNumber()).toBeCloseTo(10 / 3, 14);
  });

  it('satisfies the field axioms (property)', () => {
    fc.assert(
      fc.property(rationalArb, rationalArb, rationalArb, (a, b, c) => {
        expect(a.add(b).equals(b.add(a))).toBe(true);
        expect(a.mul(b).equals(b.mul(a))).toBe(true);
        expect(a.add(b).add(c).equals(a.add(b.add(c)))).toBe(true);
        expect(a.mul(b).mul(c).equals(a.mul(b.mul(c)))).toBe(true);
        expect(a.mul(b.add(c)).equals(a.mul(b).add(a.mul(c)))).toBe(true);
        expect(a.sub(a).isZero()).toBe(true);
      }),
      RUNS,
    );
    fc.assert(fc.property(nonZeroRationalArb, (a) => a.mul(a.inv()).isOne()), RUNS);
  });

  it('round-trips through the codec (property)', () => {
    fc.assert(fc.property(rationalArb, (a) => (fromJSON(JSON.parse(JSON.stringify(toJSON(a)))) as Rational).equals(a)), RUNS);
  });

  it('compares consistently with the doubles it converts to (property)', () => {
    fc.assert(
      fc.property(rationalArb, rationalArb, (a, b) => {
        const c = a.compare(b);
        if (c < 0) expect(a.toNumber()).toBeLessThanOrEqual(b.toNumber());
        if (c === 0) expect(a.equals(b)).toBe(true);
      }),
      RUNS,
    );
  });
});
