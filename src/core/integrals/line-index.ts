import { Rational } from '../algebra/rational.ts';
import { Poly } from '../algebra/polynomial.ts';
import { Series } from '../algebra/series.ts';

/** A propagator index ν = a + bε (line 1/(k²)^ν); a an integer, b rational. */
export interface LineIndex {
  readonly a: number;
  readonly b: Rational;
}

export const ONE_INDEX: LineIndex = { a: 1, b: Rational.ZERO };

export function addIndex(x: LineIndex, y: LineIndex): LineIndex {
  return { a: x.a + y.a, b: x.b.add(y.b) };
}

export function shiftIndex(x: LineIndex, da: number): LineIndex {
  return { a: x.a + da, b: x.b };
}

export function isZeroIndex(x: LineIndex): boolean {
  return x.a === 0 && x.b.isZero();
}

/** An integer index (no ε part): the triangle rule may lower it. */
export function isIntegerIndex(x: LineIndex): boolean {
  return x.b.isZero();
}

/** ν as an exact series a + bε. */
export function indexSeries(x: LineIndex): Series {
  const c = Series.constant(Poly.constant(Rational.int(x.a)));
  return x.b.isZero() ? c : c.add(Series.monomial(Poly.constant(x.b), 1));
}

/** Compact text for keys and messages: `1`, `2-eps`, `1+1/2eps`. */
export function indexText(x: LineIndex): string {
  if (x.b.isZero()) return String(x.a);
  const b = x.b.toString();
  return `${x.a}${x.b.sign() > 0 ? '+' : ''}${b}eps`;
}

/** A field-name-safe token for canonical keys (letters, digits, _ only). */
export function indexToken(x: LineIndex): string {
  const s = (n: bigint | number) => (BigInt(n) < 0n ? `m${-BigInt(n)}` : `${n}`);
  if (x.b.isZero()) return `i${s(x.a)}`;
  const [num, den] = x.b.toString().split('/');
  return `i${s(x.a)}_${s(BigInt(num!))}d${den ?? '1'}`;
}
