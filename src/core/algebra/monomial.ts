/**
 * Monomials: products of variables to integer powers (negative powers allowed, so that
 * a single term can be inverted), kept as a sorted factor list with a canonical key.
 */
import { compareVariables, variableInfo } from './variables.ts';

/** One factor `name^exp` (exp ≠ 0). */
export interface Factor {
  readonly name: string;
  readonly exp: number;
}

/** A product of factors in the canonical variable order; `key` identifies it. */
export interface Monomial {
  readonly factors: readonly Factor[];
  /** Canonical key, e.g. `N^1*pi^2*zeta(3)^1`; the empty string for 1. */
  readonly key: string;
}

function keyOf(factors: readonly Factor[]): string {
  let s = '';
  for (let i = 0; i < factors.length; i++) s += (i ? '*' : '') + factors[i]!.name + '^' + factors[i]!.exp;
  return s;
}

/** The monomial 1. */
export const ONE_MONOMIAL: Monomial = { factors: [], key: '' };

/** Builds a monomial from factors in any order (equal names merge, zero powers drop). */
export function monomial(factors: readonly Factor[]): Monomial {
  const acc = new Map<string, number>();
  for (const f of factors) {
    variableInfo(f.name);
    acc.set(f.name, (acc.get(f.name) ?? 0) + f.exp);
  }
  const list = [...acc].filter(([, e]) => e !== 0).map(([name, exp]) => ({ name, exp }));
  list.sort((a, b) => compareVariables(a.name, b.name));
  return { factors: list, key: keyOf(list) };
}

/** The monomial `name^exp`. */
export function variable(name: string, exp = 1): Monomial {
  return monomial([{ name, exp }]);
}

/** Product of two monomials (merge of the sorted factor lists). */
export function mulMonomials(a: Monomial, b: Monomial): Monomial {
  if (a.factors.length === 0) return b;
  if (b.factors.length === 0) return a;
  const out: Factor[] = [];
  const fa = a.factors;
  const fb = b.factors;
  let i = 0;
  let j = 0;
  while (i < fa.length && j < fb.length) {
    const x = fa[i]!;
    const y = fb[j]!;
    const c = x.name === y.name ? 0 : compareVariables(x.name, y.name);
    if (c < 0) {
      out.push(x);
      i++;
    } else if (c > 0) {
      out.push(y);
      j++;
    } else {
      const e = x.exp + y.exp;
      if (e !== 0) out.push({ name: x.name, exp: e });
      i++;
      j++;
    }
  }
  while (i < fa.length) out.push(fa[i++]!);
  while (j < fb.length) out.push(fb[j++]!);
  return { factors: out, key: keyOf(out) };
}

/** m^k for an integer k. */
export function powMonomial(m: Monomial, k: number): Monomial {
  if (k === 0) return ONE_MONOMIAL;
  const f = m.factors.map((x) => ({ name: x.name, exp: x.exp * k }));
  return { factors: f, key: keyOf(f) };
}

/** Total degree in free symbols (N, g, …). */
export function symbolDegree(m: Monomial): number {
  let d = 0;
  for (const f of m.factors) if (variableInfo(f.name).kind === 'symbol') d += f.exp;
  return d;
}

/** Transcendental weight: π and γ and log count 1 per power, ζ(k) counts k. */
export function weight(m: Monomial): number {
  let w = 0;
  for (const f of m.factors) w += variableInfo(f.name).weight * f.exp;
  return w;
}

/**
 * The canonical term order: by degree in symbols, then transcendental weight, then names
 * (lexicographic over the factor lists: a factor of an earlier variable comes first, and a
 * higher power of the same variable comes first).
 */
export function compareMonomials(a: Monomial, b: Monomial): number {
  if (a.key === b.key) return 0;
  const d = symbolDegree(a) - symbolDegree(b);
  if (d !== 0) return d;
  const w = weight(a) - weight(b);
  if (w !== 0) return w;
  const n = Math.min(a.factors.length, b.factors.length);
  for (let i = 0; i < n; i++) {
    const x = a.factors[i]!;
    const y = b.factors[i]!;
    const c = compareVariables(x.name, y.name);
    if (c !== 0) return c;
    if (x.exp !== y.exp) return y.exp - x.exp;
  }
  return a.factors.length - b.factors.length;
}
