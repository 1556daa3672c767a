import { describe, expect, it } from 'vitest';
import { bernoulli, EULER_GAMMA, evaluatePoly, variableValue, zetaNumeric, zetaPoly } from '../../../src/core/algebra/index.ts';

/** ζ(s) by plain summation to M with the integral tail M^{1−s}/(s−1) and the half term (written here, independent of the engine). */
function zetaBySummation(s: number, M = 200_000): number {
  let sum = 0;
  for (let n = M; n >= 1; n--) sum += n ** -s;
  return sum - M ** -s / 2 + M ** (1 - s) / (s - 1);
}

describe('zeta values and constants', () => {
  it('Bernoulli numbers: B_2 = 1/6, B_4 = −1/30, B_12 = −691/2730, B_odd>1 = 0 (DLMF Table 24.2.1)', () => {
    expect(bernoulli(1).toString()).toBe('-1/2');
    expect(bernoulli(2).toString()).toBe('1/6');
    expect(bernoulli(4).toString()).toBe('-1/30');
    expect(bernoulli(12).toString()).toBe('-691/2730');
    expect(bernoulli(7).isZero()).toBe(true);
  });

  it('ζ(2n) via Bernoulli numbers (DLMF 25.6.2) agrees with numeric summation for 2n = 2…20', () => {
    for (let k = 2; k <= 20; k += 2) {
      const exact = evaluatePoly(zetaPoly(k));
      expect(Math.abs(exact - zetaBySummation(k))).toBeLessThan(1e-12);
      expect(Math.abs(zetaNumeric(k) - exact)).toBeLessThan(2e-16 * exact * 4);
    }
  });

  it('tabulated γ, ζ(3), ζ(5), ζ(7), ζ(9) (DLMF 5.2.3, 25.6; A&S Table 23.3) agree with summation', () => {
    expect(EULER_GAMMA).toBe(0.57721566490153286061);
    expect(variableValue('zeta(3)')).toBe(1.2020569031595942854);
    expect(variableValue('zeta(5)')).toBe(1.0369277551433699263);
    expect(variableValue('zeta(7)')).toBe(1.0083492773819228268);
    for (const k of [3, 5, 7, 9, 11, 13]) {
      expect(Math.abs(zetaNumeric(k) - zetaBySummation(k))).toBeLessThan(1e-12);
      expect(Math.abs(zetaNumeric(k) - variableValue(`zeta(${k})`))).toBeLessThan(4e-16);
    }
    // γ = H_n − ln n − 1/(2n) + 1/(12n²) − 1/(120n⁴) + … (Euler–Maclaurin; DLMF 5.11.8 for ψ) at n = 1000.
    const n = 1000;
    let h = 0;
    for (let j = n; j >= 1; j--) h += 1 / j;
    const gamma = h - Math.log(n) - 1 / (2 * n) + 1 / (12 * n * n) - 1 / (120 * n ** 4);
    expect(Math.abs(gamma - EULER_GAMMA)).toBeLessThan(1e-14);
  });

  it('refuses ζ(1) and odd constants below 3', () => {
    expect(() => zetaPoly(1)).toThrow(RangeError);
  });
});
