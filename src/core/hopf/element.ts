/**
 * Elements of the graph algebra H: finite Z-linear combinations of monomials, a monomial being a
 * multiset of connected graph classes (canonical keys) — the empty monomial is the unit 1.
 * Tensors in H⊗H (and H⊗H⊗H) are combinations of tuples of monomials. Coefficients are BigInt.
 */
export type Monomial = readonly string[];

const SEP = ' * ';
export const monomialKey = (m: Monomial): string => [...m].sort().join(SEP);
export const monomialOf = (key: string): Monomial => (key === '' ? [] : key.split(SEP));

/** A linear combination of monomials (or of tuples of monomials, for tensors), keyed canonically. */
export class Combination {
  readonly terms = new Map<string, bigint>();

  static of(entries: Iterable<[string, bigint]>): Combination {
    const c = new Combination();
    for (const [k, v] of entries) c.add(k, v);
    return c;
  }

  add(key: string, coeff: bigint): this {
    const v = (this.terms.get(key) ?? 0n) + coeff;
    if (v === 0n) this.terms.delete(key);
    else this.terms.set(key, v);
    return this;
  }

  addAll(other: Combination, scale = 1n): this {
    for (const [k, v] of other.terms) this.add(k, v * scale);
    return this;
  }

  get isZero(): boolean {
    return this.terms.size === 0;
  }

  equals(other: Combination): boolean {
    if (this.terms.size !== other.terms.size) return false;
    for (const [k, v] of this.terms) if (other.terms.get(k) !== v) return false;
    return true;
  }

  /** Sorted entries, for printing and comparison. */
  entries(): [string, bigint][] {
    return [...this.terms.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  }
}

/** Product in H: monomials multiply by multiset union. */
export function multiply(x: Combination, y: Combination): Combination {
  const out = new Combination();
  for (const [a, u] of x.terms) for (const [b, v] of y.terms) out.add(monomialKey([...monomialOf(a), ...monomialOf(b)]), u * v);
  return out;
}

const TSEP = ' ⊗ ';
export const tensorKey = (parts: readonly Monomial[]): string => parts.map(monomialKey).map((k) => (k === '' ? '1' : k)).join(TSEP);
export const tensorParts = (key: string): Monomial[] => key.split(TSEP).map((k) => (k === '1' ? [] : monomialOf(k)));

/** Product in H⊗…⊗H, factor by factor. */
export function multiplyTensors(x: Combination, y: Combination): Combination {
  const out = new Combination();
  for (const [a, u] of x.terms) {
    const pa = tensorParts(a);
    for (const [b, v] of y.terms) {
      const pb = tensorParts(b);
      out.add(tensorKey(pa.map((m, i) => [...m, ...pb[i]!])), u * v);
    }
  }
  return out;
}

/** A single monomial as a combination. */
export function single(m: Monomial, coeff = 1n): Combination {
  return Combination.of([[monomialKey(m), coeff]]);
}
