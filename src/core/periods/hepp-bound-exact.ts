import { LimitError } from '../errors.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { defaultPeriodLimits, type PeriodLimits } from './period-limits.ts';
import { popcount, type SectorTables } from './sector-tables.ts';

/** A non-negative rational number in lowest terms. */
export interface ExactRational {
  readonly numerator: bigint;
  readonly denominator: bigint;
}

export interface ExactHeppOptions {
  readonly limits?: Partial<PeriodLimits>;
  readonly cancel?: CancelToken;
}

/**
 * The Hepp bound as an exact rational, by the recursion J(γ) = Σ_e J(γ∖e)/sdc(γ∖e) of
 * `buildSectorTables`, in integers: with Λ the lcm of every sdc that occurs, the numbers
 * n(γ) = J(γ)·Λ^{|γ|−1} satisfy n({e}) = 1 and n(γ) = Σ_e n(γ∖e)·(Λ/sdc(γ∖e)), so no gcd is
 * taken until the end. Work ~ 2^N·N BigInt steps; refused above `maxExactHeppEdges`.
 */
export function heppBoundExact(t: SectorTables, opts: ExactHeppOptions = {}): ExactRational {
  const limits = { ...defaultPeriodLimits, ...opts.limits };
  const cancel = opts.cancel ?? neverCancel;
  const N = t.edgeCount;
  if (N > limits.maxExactHeppEdges) {
    throw new LimitError('computing the exact Hepp bound', 'maxExactHeppEdges', limits.maxExactHeppEdges, `${N} edges`,
      `raise it with --max-exact-hepp-edges ${N} (time grows as 2^edges), or use the floating-point value`);
  }
  const size = 1 << N;
  const full = size - 1;
  const sdc = (m: number) => popcount(m) - t.halfDimension * t.loops[m]!;
  const values = new Set<number>();
  for (let m = 1; m < full; m++) values.add(sdc(m));
  let lcm = 1n;
  for (const v of values) lcm = (lcm / gcd(lcm, BigInt(v))) * BigInt(v);
  // Λ/sdc(γ) for every proper subset, as BigInt, cached by value.
  const factorOf = new Map<number, bigint>();
  const factor = (m: number) => {
    const s = sdc(m);
    let f = factorOf.get(s);
    if (f === undefined) factorOf.set(s, (f = lcm / BigInt(s)));
    return f;
  };
  const n = new Array<bigint>(size);
  for (let m = 1; m < size; m++) {
    if ((m & 0x3fff) === 0) cancel.throwIfCancelled();
    if ((m & (m - 1)) === 0) {
      n[m] = 1n;
      continue;
    }
    let acc = 0n;
    for (let r = m; r; r &= r - 1) {
      const sub = m ^ (r & -r);
      acc += n[sub]! * factor(sub);
    }
    n[m] = acc;
  }
  const num = n[full]!;
  const den = lcm ** BigInt(N - 1);
  const g = gcd(num, den);
  return { numerator: num / g, denominator: den / g };
}

function gcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a < 0n ? -a : a;
}

/** "p/q", or "p" for an integer. */
export function formatRational(r: ExactRational): string {
  return r.denominator === 1n ? r.numerator.toString() : `${r.numerator}/${r.denominator}`;
}

/** The nearest double to p/q (exact scaling, so huge numerators and denominators are fine). */
export function rationalToNumber(r: ExactRational): number {
  const p = r.numerator;
  const q = r.denominator;
  if (p === 0n) return 0;
  // Shift so the quotient has ~64 significant bits, then divide in floating point.
  const shift = BigInt(p.toString(2).length - q.toString(2).length - 64);
  const quotient = shift >= 0n ? p / (q << shift) : (p << -shift) / q;
  return Number(quotient) * 2 ** Number(shift);
}
