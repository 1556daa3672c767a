import type { Graph } from '../graph/types.ts';
import { automorphismGroup } from './automorphism-group.ts';
import type { SearchOptions } from './search-tree.ts';

const factorial = (k: number): bigint => {
  let f = 1n;
  for (let i = 2; i <= k; i++) f *= BigInt(i);
  return f;
};

/**
 * The part of the symmetry factor that fixes every vertex: the permutations of half-edges
 * that move no vertex. Identical parallel lines (same field, same arrow) permute among
 * themselves, k of them in k! ways; a self-loop without an arrow can also be flipped end for
 * end (factor 2); a fermion self-loop cannot, since its two ends differ (ψ and ψ̄).
 */
export function edgePermutationFactor(g: Graph): bigint {
  const bundles = new Map<string, number>();
  let flips = 0;
  for (const e of g.edges) {
    let key: string;
    if (e.a === e.b) {
      key = `${e.a} ${e.a} ${e.oriented ? '>' : '-'}${e.field ?? ''}`;
      if (!e.oriented) flips++;
    } else if (e.oriented) key = `${e.a} ${e.b} >${e.field ?? ''}`;
    else key = `${Math.min(e.a, e.b)} ${Math.max(e.a, e.b)} -${e.field ?? ''}`;
    bundles.set(key, (bundles.get(key) ?? 0) + 1);
  }
  let f = 1n << BigInt(flips);
  for (const k of bundles.values()) f *= factorial(k);
  return f;
}

/**
 * The Feynman symmetry factor S of a graph (the graph carries 1/S): the number of
 * permutations of its half-edges that preserve it with every external leg fixed. It is the
 * order of the vertex automorphism group (legs fixed) times `edgePermutationFactor`, because
 * every vertex automorphism lifts to exactly that many half-edge permutations.
 *
 *     symmetryFactor(parseNotation('1-2 1-2 1-2 / 1 2'))   // 6n, the two-loop sunset
 */
export function symmetryFactor(g: Graph, opts: SearchOptions = {}): bigint {
  // Vertices with neither lines nor legs carry no half-edges: exchanging them is a vertex
  // automorphism but no half-edge permutation, so their k! is divided out again.
  const used = new Set<number>([...g.edges.flatMap((e) => [e.a, e.b]), ...g.legs.map((l) => l.vertex)]);
  const isolated = new Map<string, number>();
  g.vertices.forEach((v, i) => {
    if (used.has(i)) return;
    const key = v.counterterm ? `${v.counterterm.residue.join(',')};${v.counterterm.structure}` : '';
    isolated.set(key, (isolated.get(key) ?? 0) + 1);
  });
  let exchanges = 1n;
  for (const k of isolated.values()) exchanges *= factorial(k);
  return (automorphismGroup(g, { ...opts, legs: 'labelled' }).order * edgePermutationFactor(g)) / exchanges;
}
