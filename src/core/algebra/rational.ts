/**
 * Exact rational numbers on BigInt, always normalized: the denominator is positive, the
 * sign sits in the numerator, and numerator and denominator are coprime.
 */

function gcd(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) {
    const t = a % b;
    a = b;
    b = t;
  }
  return a;
}

/** Greatest common divisor of two BigInts (non-negative result). */
export function bigGcd(a: bigint, b: bigint): bigint {
  return gcd(a, b);
}

/** An exact rational number n/d with d > 0 and gcd(n, d) = 1. Immutable. */
export class Rational {
  /** Numerator (carries the sign). */
  readonly n: bigint;
  /** Denominator, always positive. */
  readonly d: bigint;

  private constructor(n: bigint, d: bigint) {
    this.n = n;
    this.d = d;
  }

  static readonly ZERO = new Rational(0n, 1n);
  static readonly ONE = new Rational(1n, 1n);
  static readonly MINUS_ONE = new Rational(-1n, 1n);

  /** The rational n/d, normalized. Throws RangeError when d = 0. */
  static of(n: bigint | number, d: bigint | number = 1n): Rational {
    let nn = typeof n === 'bigint' ? n : BigInt(n);
    let dd = typeof d === 'bigint' ? d : BigInt(d);
    if (dd === 0n) throw new RangeError('rational with zero denominator');
    if (dd < 0n) {
      nn = -nn;
      dd = -dd;
    }
    if (dd === 1n) return new Rational(nn, 1n);
    const g = gcd(nn, dd);
    return g === 1n ? new Rational(nn, dd) : new Rational(nn / g, dd / g);
  }

  /** The integer k as a rational. */
  static int(k: bigint | number): Rational {
    return new Rational(typeof k === 'bigint' ? k : BigInt(k), 1n);
  }

  isZero(): boolean {
    return this.n === 0n;
  }
  isOne(): boolean {
    return this.n === 1n && this.d === 1n;
  }
  isInteger(): boolean {
    return this.d === 1n;
  }
  /** −1, 0 or 1. */
  sign(): number {
    return this.n > 0n ? 1 : this.n < 0n ? -1 : 0;
  }

  add(o: Rational): Rational {
    if (this.d === 1n && o.d === 1n) return new Rational(this.n + o.n, 1n);
    if (this.d === o.d) return Rational.of(this.n + o.n, this.d);
    return Rational.of(this.n * o.d + o.n * this.d, this.d * o.d);
  }
  sub(o: Rational): Rational {
    return this.add(o.neg());
  }
  mul(o: Rational): Rational {
    if (this.d === 1n && o.d === 1n) return new Rational(this.n * o.n, 1n);
    if (this.n === 0n || o.n === 0n) return Rational.ZERO;
    // Cross-cancel first: keeps intermediate numbers small.
    const g1 = gcd(this.n, o.d);
    const g2 = gcd(o.n, this.d);
    return new Rational((this.n / g1) * (o.n / g2), (this.d / g2) * (o.d / g1));
  }
  neg(): Rational {
    return new Rational(-this.n, this.d);
  }
  /** 1/x; throws RangeError for zero. */
  inv(): Rational {
    if (this.n === 0n) throw new RangeError('division by zero');
    return this.n < 0n ? new Rational(-this.d, -this.n) : new Rational(this.d, this.n);
  }
  div(o: Rational): Rational {
    return this.mul(o.inv());
  }
  /** x^k for an integer k (negative k inverts). */
  pow(k: number): Rational {
    if (!Number.isInteger(k)) throw new RangeError(`rational power needs an integer exponent, got ${k}`);
    if (k < 0) return this.inv().pow(-k);
    const K = BigInt(k);
    return new Rational(this.n ** K, this.d ** K);
  }
  /** −1, 0, 1 as this <, =, > o. */
  compare(o: Rational): number {
    const l = this.n * o.d;
    const r = o.n * this.d;
    return l < r ? -1 : l > r ? 1 : 0;
  }
  equals(o: Rational): boolean {
    return this.n === o.n && this.d === o.d;
  }
  abs(): Rational {
    return this.n < 0n ? this.neg() : this;
  }

  /** The nearest double (correctly handles numerators and denominators beyond 2^53). */
  toNumber(): number {
    const n = this.n;
    const d = this.d;
    const LIM = 1n << 53n;
    const an = n < 0n ? -n : n;
    if (an < LIM && d < LIM) return Number(n) / Number(d);
    // Scale so that the quotient has ~64 significant bits, then convert.
    const shift = bitLength(d) - bitLength(an) + 64;
    const q = shift >= 0 ? (an << BigInt(shift)) / d : an / (d << BigInt(-shift));
    const v = Number(q) * 2 ** -shift;
    return n < 0n ? -v : v;
  }

  /** `-3/8`, `5`: the canonical text form of a rational. */
  toString(): string {
    return this.d === 1n ? this.n.toString() : `${this.n}/${this.d}`;
  }
}

/** Number of bits of |x| (0 for 0). */
export function bitLength(x: bigint): number {
  if (x < 0n) x = -x;
  if (x === 0n) return 0;
  return x.toString(2).length;
}
