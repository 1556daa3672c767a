import { Poly } from '../algebra/polynomial.ts';
import { Rational } from '../algebra/rational.ts';
import { Series } from '../algebra/series.ts';
import { addIndex } from '../integrals/line-index.ts';
import type { PropIntegral, PropLine } from '../integrals/prop-integral.ts';
import { infraredRegions } from './infrared-safety.ts';

/** One term of R̃ applied to an integral: Π Z̃ over the deleted soft lines, times what is left. */
export interface InfraredTerm {
  readonly coefficient: Series;
  readonly integral: PropIntegral;
  /** Soft lines deleted (indices into the chain-merged integral). */
  readonly deleted: readonly number[];
}

/** Lines in series through vertices without external momentum merged into single lines (indices add). */
export function mergeChains(I: PropIntegral): PropIntegral {
  let lines: PropLine[] = [...I.lines];
  for (let guard = 0; guard < 10_000; guard++) {
    const degree = new Map<number, number[]>();
    lines.forEach((l, k) => {
      for (const x of l.u === l.v ? [l.u] : [l.u, l.v]) degree.set(x, [...(degree.get(x) ?? []), k]);
      if (l.u === l.v) degree.set(l.u, [...degree.get(l.u)!, k]);
    });
    const w = [...degree.entries()].find(([x, ks]) => x !== I.s && x !== I.t && ks.length === 2 && ks[0] !== ks[1]);
    if (!w) break;
    const [x, [k1, k2]] = w as [number, [number, number]];
    const a = lines[k1]!;
    const b = lines[k2]!;
    const ends = [a.u === x ? a.v : a.u, b.u === x ? b.v : b.u];
    lines = lines.filter((_, k) => k !== k1 && k !== k2);
    lines.push({ u: ends[0]!, v: ends[1]!, index: addIndex(a.index, b.index) });
  }
  return { ...I, lines };
}

/**
 * The infrared R-operation R̃ for soft regions made of single lines — the common case of lines in
 * series through a vertex that lost its external legs ("Infrared R-operation and ultraviolet
 * counterterms in the MS-scheme", Phys. Lett. B114 (1982) 340; "R*-operation corrected",
 * Phys. Lett. B144 (1984) 419). A soft line 1/(k²)^ν with ν = D0/2 (+ bε) diverges logarithmically
 * at k → 0: near the origin ∫ d^Dk/π^{D/2} f(k)/(k²)^ν = f(0)·2/Γ(D/2)·1/(D − 2ν) + regular, so its
 * MS infrared counterterm is Z̃ = 1/(Γ(D0/2)(1+b)ε) times δ(k) — the line deleted, the rest
 * evaluated with that momentum at zero. R̃ sums over every set of such lines:
 *   R̃ X = Σ_T Π_{ℓ∈T} Z̃(ℓ) · X∖T.
 * Returns null (with a reason) when some divergent soft region is not a union of such lines — then
 * the general R* with multi-line infrared subgraphs would be needed.
 */
export function infraredSubtractions(I: PropIntegral, D0: number): { ok: true; terms: InfraredTerm[]; softLines: number } | { ok: false; reason: string } {
  const M = mergeChains(I);
  const regions = infraredRegions(M, D0);
  if (regions.length === 0) return { ok: true, terms: [{ coefficient: Series.ONE, integral: I, deleted: [] }], softLines: 0 };
  const singles = new Set(regions.filter((r) => r.softLines.length === 1 && r.degree === 0).map((r) => r.softLines[0]!));
  for (const r of regions) {
    if (r.softLines.length === 1 && r.degree < 0) return { ok: false, reason: `a soft line of index ${M.lines[r.softLines[0]!]!.index.a} diverges worse than logarithmically in the infrared` };
    if (!r.softLines.every((k) => singles.has(k))) return { ok: false, reason: 'an infrared-divergent soft subgraph is not a chain of lines (needs the general R*)' };
  }
  const chain = [...singles].sort((x, y) => x - y);
  const gammaHalf = factorial(D0 / 2 - 1);
  const zTilde = (k: number) => {
    const b = M.lines[k]!.index.b;
    return Series.monomial(Poly.constant(Rational.ONE.div(gammaHalf.mul(Rational.ONE.add(b)))), -1);
  };
  const terms: InfraredTerm[] = [];
  for (let mask = 0; mask < 1 << chain.length; mask++) {
    const deleted = chain.filter((_, i) => mask & (1 << i));
    let coefficient = Series.ONE;
    for (const k of deleted) coefficient = coefficient.mul(zTilde(k));
    terms.push({ coefficient, integral: { ...M, lines: M.lines.filter((_, k) => !deleted.includes(k)) }, deleted });
  }
  return { ok: true, terms, softLines: chain.length };
}

function factorial(n: number): Rational {
  let f = Rational.ONE;
  for (let k = 2; k <= n; k++) f = f.mul(Rational.int(k));
  return f;
}
