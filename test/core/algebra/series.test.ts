import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  divide,
  expSeries,
  formatSeries,
  fromJSON,
  inverse,
  logSeries,
  polePart,
  Poly,
  powInteger,
  Rational,
  Series,
  toJSON,
} from '../../../src/core/algebra/index.ts';
import { agreeThrough, exactSeriesArb, invertibleSeriesArb, RUNS, truncatedSeriesArb } from './arbitraries.ts';

const c = (n: number, d = 1) => Poly.constant(Rational.of(BigInt(n), BigInt(d)));

describe('Series: ring axioms on exact Laurent polynomials (property)', () => {
  it('add and mul are commutative, associative and distributive', () => {
    fc.assert(
      fc.property(exactSeriesArb, exactSeriesArb, exactSeriesArb, (a, b, d) => {
        expect(agreeThrough(a.add(b), b.add(a), 12)).toBe(true);
        expect(agreeThrough(a.mul(b), b.mul(a), 12)).toBe(true);
        expect(agreeThrough(a.mul(b).mul(d), a.mul(b.mul(d)), 12)).toBe(true);
        expect(agreeThrough(a.mul(b.add(d)), a.mul(b).add(a.mul(d)), 12)).toBe(true);
        expect(a.sub(a).isZero()).toBe(true);
        expect(a.mul(b).order).toBe(Infinity);
      }),
      RUNS,
    );
  });
});

describe('Series: precision rules (property)', () => {
  // Soundness: an operation on truncated inputs agrees with the exact result through the
  // order it claims. Rules: knuth-style truncated power series arithmetic (common practice).
  it('a ± b is known through min(k_a, k_b)', () => {
    fc.assert(
      fc.property(truncatedSeriesArb, truncatedSeriesArb, (a, b) => {
        const r = a.cut.add(b.cut);
        expect(r.order).toBe(Math.min(a.cut.order, b.cut.order));
        expect(agreeThrough(r, a.full.add(b.full), r.order)).toBe(true);
      }),
      RUNS,
    );
  });

  it('a·b is known through min(k_a + v_b, k_b + v_a)', () => {
    fc.assert(
      fc.property(truncatedSeriesArb, truncatedSeriesArb, (a, b) => {
        const r = a.cut.mul(b.cut);
        if (a.cut.isZero() || b.cut.isZero()) return;
        expect(r.order).toBe(Math.min(a.cut.order + b.cut.val, b.cut.order + a.cut.val));
        expect(agreeThrough(r, a.full.mul(b.full), r.order)).toBe(true);
      }),
      RUNS,
    );
  });

  it('1/ε loses an order at both ends; 1/a is known through k_a − 2v_a', () => {
    const a = Series.make(1, [c(1), c(2), c(3)], 3); // ε + 2ε² + 3ε³ + O(ε⁴)
    const inv = inverse(a, 10);
    expect(inv.val).toBe(-1);
    expect(inv.order).toBe(1);
    fc.assert(
      fc.property(invertibleSeriesArb, fc.integer({ min: 0, max: 4 }), (full, extra) => {
        const cut = full.truncate(full.val + extra);
        const r = inverse(cut, 6);
        const single = cut.coeffs.length === 1 && cut.order === Infinity;
        expect(r.order).toBe(single ? Infinity : Math.min(cut.order - 2 * cut.val, 6));
        expect(agreeThrough(r, inverse(full, 6), r.order)).toBe(true);
        // a · (1/a) = 1 as far as known
        const one = cut.mul(r);
        expect(agreeThrough(one, Series.ONE, one.order)).toBe(true);
      }),
      RUNS,
    );
  });

  it('exp and log are inverse to each other and keep the order', () => {
    fc.assert(
      fc.property(exactSeriesArb, fc.integer({ min: 0, max: 6 }), (s, k) => {
        const a = Series.make(1, s.coeffs).truncate(k + 1); // vanishes at ε = 0
        const e = expSeries(a, 6);
        expect(e.order).toBe(a.isZero() ? Infinity : Math.min(a.order, 6));
        const back = logSeries(e, 6);
        expect(agreeThrough(back, a, back.order)).toBe(true);
      }),
      { ...RUNS, numRuns: 200 },
    );
  });

  it('powers agree with repeated products', () => {
    fc.assert(
      fc.property(invertibleSeriesArb, fc.integer({ min: -3, max: 4 }), (a, k) => {
        const p = powInteger(a, k, 6);
        let ref = Series.ONE;
        for (let i = 0; i < Math.abs(k); i++) ref = ref.mul(a);
        if (k < 0) ref = inverse(ref, 6);
        expect(p.order).toBeGreaterThanOrEqual(Math.min(6, ref.order));
        expect(agreeThrough(p, ref, Math.min(p.order, ref.order))).toBe(true);
      }),
      { ...RUNS, numRuns: 200 },
    );
  });
});

describe('Series: named cases', () => {
  it('geometric series: 1/(1 − ε) = Σ ε^k, truncated at the cap', () => {
    const r = inverse(Series.make(0, [c(1), c(-1)]), 5);
    expect(r.order).toBe(5);
    expect(r.coeffs.map((x) => x.asRational()!.toString())).toEqual(['1', '1', '1', '1', '1', '1']);
  });

  it('zero known through ε^2 is O(ε^3), and multiplying by 1/ε² leaves O(ε)', () => {
    const z = Series.bigO(2);
    expect(z.val).toBe(3);
    const r = z.mul(Series.monomial(Poly.ONE, -2));
    expect(r.order).toBe(0);
    expect(r.coeff(0).isZero()).toBe(true);
    expect(() => r.coeff(1)).toThrow(RangeError);
  });

  it('refuses to divide by a series whose leading term is unknown', () => {
    expect(() => divide(Series.ONE, Series.bigO(3), 5)).toThrow(/leading term is unknown/);
  });

  it('pole part K keeps the negative powers, exactly', () => {
    const s = Series.make(-2, [c(1), c(2), c(3), c(4)], 1);
    const k = polePart(s);
    expect(formatSeries(k)).toBe('(1)*eps^-2 + (2)*eps^-1');
    expect(k.order).toBe(Infinity);
    expect(() => polePart(Series.make(-3, [c(1)], -2))).toThrow(/eps\^-1/);
  });

  it('truncation order edge cases: truncating an exact constant keeps it exact', () => {
    expect(Series.constant(c(5)).truncate(3).order).toBe(Infinity);
    expect(Series.constant(c(5)).truncate(-3).order).toBe(-3);
    expect(Series.constant(c(5)).truncate(-3).val).toBe(-2);
    expect(Series.EPS.truncate(0).order).toBe(0);
  });

  it('round-trips through the tagged JSON codec (property)', () => {
    fc.assert(
      fc.property(truncatedSeriesArb, ({ cut }) => {
        const back = fromJSON(JSON.parse(JSON.stringify(toJSON(cut)))) as Series;
        expect(back.order).toBe(cut.order);
        expect(agreeThrough(back, cut, Number.isFinite(cut.order) ? cut.order : 12)).toBe(true);
      }),
      RUNS,
    );
  });
});
