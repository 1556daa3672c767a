import type { GenerationContext } from './generation-context.ts';

const lnFactorial = (n: number): number => {
  let s = 0;
  for (let i = 2; i <= n; i++) s += Math.log(i);
  return s;
};
/** ln((2m − 1)!!), the number of ways to pair 2m half-edges. */
const lnDoubleFactorialOdd = (h: number): number => lnFactorial(h) - lnFactorial(h / 2) - (h / 2) * Math.LN2;

/**
 * An up-front estimate of the number of graphs with labelled legs: for each vertex-count
 * vector, the zero-dimensional weight Σ 1/S of all graphs (connected or not) with those
 * vertices — the half-edge pairings, times the ways to attach the labelled legs, over the
 * relabellings of vertices and of the half-edges at each vertex (Phys. Rev. D18 (1978)
 * 1939). Disconnected and one-particle-reducible graphs make it an overestimate at low
 * orders; asymptotically connected 1PI graphs dominate, so it tracks the real count.
 *
 * Vacuum graphs (no legs): Σ 1/S undercounts the classes by their typical symmetry, which
 * without labelled legs to break it is large (φ⁴ at 10 loops: Σ 1/S ≈ 231 for 8296 graphs).
 * Rooting each graph at one of its H half-edges breaks it: the rooted graphs weigh
 * Σ H/S (orbit–stabilizer) and every unrooted graph gives at least one, so the estimate is
 * H·Σ 1/S (8316 for those 8296).
 */
export function estimateGraphCount(ctx: GenerationContext, vectors: readonly (readonly number[])[]): number {
  const nl = ctx.labels.length;
  let total = 0;
  for (const n of vectors) {
    const T = new Array<number>(nl).fill(0);
    ctx.types.forEach((t, i) => t.labels.forEach((c, l) => (T[l]! += n[i]! * c)));
    const legs = new Array<number>(nl).fill(0);
    for (const l of ctx.legs) legs[l.label]!++;
    let ln = 0;
    // Legs take ordered choices among the half-edges of their label.
    for (let l = 0; l < nl; l++) ln += lnFactorial(T[l]!) - lnFactorial(T[l]! - legs[l]!);
    for (const k of ctx.kinds) {
      if (k.oriented) ln += lnFactorial(T[k.head]! - legs[k.head]!);
      else ln += lnDoubleFactorialOdd(T[k.tail]! - legs[k.tail]!);
    }
    ctx.types.forEach((t, i) => {
      ln -= lnFactorial(n[i]!);
      for (const c of t.labels) ln -= n[i]! * lnFactorial(c);
    });
    const halfEdges = T.reduce((s, x) => s + x, 0);
    if (ctx.legs.length === 0 && halfEdges > 0) ln += Math.log(halfEdges);
    total += Math.exp(ln);
  }
  return total;
}
