/**
 * Approximate real numbers: a double `value` with an absolute error bound `error ≥ 0`.
 *
 * Error propagation is worst case (interval-like), so bounds never shrink by luck:
 *  - sum:      e = e₁ + e₂
 *  - product:  e = |x₁|e₂ + |x₂|e₁ + e₁e₂   (the quadratic term keeps the bound rigorous)
 *  - inverse:  e = e₁ / (|x₁|(|x₁| − e₁)), refused when the interval contains 0
 * and every operation adds the rounding of the double result (one ulp-scale term,
 * |result|·2⁻⁵²). Exact rationals entering an approximate computation are converted
 * with the same rounding allowance.
 */
import type { Rational } from './rational.ts';

const ROUND = 2 ** -52;

/** A real number known as value ± error (error is an absolute bound). Immutable. */
export class Approx {
  readonly value: number;
  readonly error: number;
  constructor(value: number, error: number) {
    if (!Number.isFinite(value) || !(error >= 0)) throw new RangeError(`invalid approximate value ${value} ± ${error}`);
    this.value = value;
    this.error = error;
  }

  /** An exact rational as an approximate value (error: its double rounding). */
  static fromRational(r: Rational): Approx {
    const v = r.toNumber();
    return new Approx(v, r.isInteger() && Math.abs(v) < 2 ** 53 ? 0 : Math.abs(v) * ROUND);
  }

  add(o: Approx): Approx {
    const v = this.value + o.value;
    return new Approx(v, this.error + o.error + Math.abs(v) * ROUND);
  }
  neg(): Approx {
    return new Approx(-this.value, this.error);
  }
  mul(o: Approx): Approx {
    const v = this.value * o.value;
    const e = Math.abs(this.value) * o.error + Math.abs(o.value) * this.error + this.error * o.error;
    return new Approx(v, e + Math.abs(v) * ROUND);
  }
  /** Whether the interval [value − error, value + error] contains 0. */
  containsZero(): boolean {
    return Math.abs(this.value) <= this.error;
  }
  inv(): Approx {
    const a = Math.abs(this.value);
    if (a <= this.error) throw new RangeError(`cannot divide by ${this.toString()}: the interval contains 0`);
    const v = 1 / this.value;
    return new Approx(v, this.error / (a * (a - this.error)) + Math.abs(v) * ROUND);
  }
  /** e^x, with the bound e^v (e^err − 1). */
  exp(): Approx {
    const v = Math.exp(this.value);
    return new Approx(v, v * Math.expm1(this.error) + v * ROUND);
  }

  /**
   * Concise notation `1.2345(12)`: the digits in parentheses are the error in units of the
   * last digit shown, rounded up to two significant digits. The parser reads it back.
   */
  toString(): string {
    return formatConcise(this.value, this.error);
  }
}

function formatConcise(value: number, error: number): string {
  if (error === 0 || !Number.isFinite(error)) {
    const s = plainDecimal(value, 17);
    return s.includes('.') ? `${s}(0)` : `${s}.0(0)`;
  }
  // Number of decimals so that the error shows as two digits.
  let decimals = 1 - Math.floor(Math.log10(error));
  if (decimals < 1) decimals = 1;
  if (decimals > 40) decimals = 40;
  const unit = 10 ** -decimals;
  let errDigits = Math.ceil(error / unit - 1e-9);
  if (errDigits < 1) errDigits = 1;
  return `${value.toFixed(decimals)}(${errDigits})`;
}

function plainDecimal(v: number, digits: number): string {
  const s = v.toPrecision(digits);
  if (!/e/.test(s)) return s.replace(/(\.\d*?)0+$/, '$1').replace(/\.$/, '.0');
  return v.toFixed(Math.min(40, Math.max(1, digits - Math.floor(Math.log10(Math.abs(v))) - 1)));
}
