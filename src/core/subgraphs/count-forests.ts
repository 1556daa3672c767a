import { LimitError } from '../errors.ts';
import { isSubset } from '../graph/edge-set.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { areCompatible } from './compatibility.ts';
import type { DivergentSubgraph } from './divergent-subgraphs.ts';
import { defaultSubgraphLimits, type SubgraphLimits } from './limits.ts';

/**
 * Number of forests (pairwise nested or vertex-disjoint sets, the empty one included) of the
 * given subgraphs, without listing them.
 *
 * A forest's maximal members are pairwise vertex-disjoint, and below each maximal member μ
 * sits an arbitrary forest of the subgraphs strictly inside μ. So with
 *   inner(μ) = number of forests of subgraphs strictly inside μ,
 * the count over a region is a weighted count of vertex-disjoint packings, Σ_M Π_{μ∈M} inner(μ),
 * computed by a dynamic programme over "vertices decided so far" (lowest undecided vertex is
 * either left uncovered or covered by one member). inner(μ) is the same count one level down.
 */
export function countForests(subs: readonly DivergentSubgraph[], cancel: CancelToken = neverCancel): bigint {
  const order = subs.map((_, i) => i).sort((a, b) => subs[a]!.edgeList.length - subs[b]!.edgeList.length);
  const inner = new Map<number, bigint>();
  for (const i of order) {
    cancel.throwIfCancelled();
    const mu = subs[i]!;
    const inside = order.filter((j) => j !== i && inner.has(j) && isSubset(subs[j]!.edges, mu.edges) && subs[j]!.edges !== mu.edges);
    inner.set(i, weightedPackings(subs, inside, inner));
  }
  return weightedPackings(
    subs,
    subs.map((_, i) => i),
    inner,
  );
}

function weightedPackings(subs: readonly DivergentSubgraph[], members: readonly number[], weight: ReadonlyMap<number, bigint>): bigint {
  if (members.length === 0) return 1n;
  // Relabel the vertices the members use as bits 0..k−1.
  const vids = [...new Set(members.flatMap((m) => subs[m]!.vertices))].sort((a, b) => a - b);
  const bit = new Map(vids.map((v, k) => [v, 1n << BigInt(k)]));
  const masks = members.map((m) => subs[m]!.vertices.reduce((s, v) => s | bit.get(v)!, 0n));
  const lowest = masks.map((m) => lowBit(m));
  const all = (1n << BigInt(vids.length)) - 1n;
  const memo = new Map<bigint, bigint>();
  const rec = (decided: bigint): bigint => {
    if (decided === all) return 1n;
    const hit = memo.get(decided);
    if (hit !== undefined) return hit;
    const free = lowBit(~decided & all);
    let total = rec(decided | free);
    for (let k = 0; k < members.length; k++) {
      if (lowest[k] === free && (masks[k]! & decided) === 0n) total += weight.get(members[k]!)! * rec(decided | masks[k]!);
    }
    memo.set(decided, total);
    return total;
  };
  return rec(0n);
}

function lowBit(m: bigint): bigint {
  return m & -m;
}

/**
 * Number of maximal forests: sets of pairwise compatible subgraphs to which none can be added
 * (maximal cliques of the compatibility graph, Bron–Kerbosch with Tomita pivoting, counted not
 * stored). Adding the graph itself (compatible with everything) does not change the count.
 * Bitsets are Uint32Array words: ~10× faster than BigInt masks here, which the chain of ten
 * bubbles (16 796 maximal forests) needs to stay well under the 50 ms budget.
 */
export function countMaximalForests(subs: readonly DivergentSubgraph[], opts: { limits?: Partial<SubgraphLimits>; cancel?: CancelToken } = {}): bigint {
  const limits = { ...defaultSubgraphLimits, ...opts.limits };
  const cancel = opts.cancel ?? neverCancel;
  const n = subs.length;
  if (n === 0) return 1n;
  const W = (n + 31) >>> 5;
  const adj: Uint32Array[] = subs.map(() => new Uint32Array(W));
  for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) {
    if (areCompatible(subs[i]!, subs[j]!)) {
      adj[i]![j >>> 5]! |= 1 << (j & 31);
      adj[j]![i >>> 5]! |= 1 << (i & 31);
    }
  }
  const popAnd = (a: Uint32Array, b: Uint32Array) => {
    let c = 0;
    for (let w = 0; w < W; w++) {
      let x = a[w]! & b[w]!;
      x -= (x >>> 1) & 0x55555555;
      x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
      c += (((x + (x >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
    }
    return c;
  };
  const isEmpty = (a: Uint32Array) => a.every((x) => x === 0);
  let steps = 0;
  let count = 0;
  let big = 0n; // overflow of `count` past 2^52 is folded in here
  const bk = (P: Uint32Array, X: Uint32Array) => {
    if (++steps > limits.maxForestSearchSteps) {
      throw new LimitError('counting maximal forests', 'maxForestSearchSteps', limits.maxForestSearchSteps, `more than ${limits.maxForestSearchSteps} search steps`, 'raise it with --max-forest-search-steps');
    }
    if ((steps & 0x3ff) === 0) cancel.throwIfCancelled();
    if (isEmpty(P)) {
      if (isEmpty(X)) {
        if (++count === 2 ** 52) {
          big += BigInt(count);
          count = 0;
        }
      }
      return;
    }
    // Pivot: the vertex of P ∪ X with most neighbours in P.
    let pivot = -1;
    let best = -1;
    for (let w = 0; w < W; w++) {
      let bits = P[w]! | X[w]!;
      while (bits) {
        const low = bits & -bits;
        const u = (w << 5) | (31 - Math.clz32(low));
        bits ^= low;
        const c = popAnd(P, adj[u]!);
        if (c > best) {
          best = c;
          pivot = u;
        }
      }
    }
    const pa = adj[pivot]!;
    for (let w = 0; w < W; w++) {
      let bits = P[w]! & ~pa[w]!;
      while (bits) {
        const low = bits & -bits;
        const v = (w << 5) | (31 - Math.clz32(low));
        bits ^= low;
        const av = adj[v]!;
        const P2 = new Uint32Array(W);
        const X2 = new Uint32Array(W);
        for (let k = 0; k < W; k++) {
          P2[k] = P[k]! & av[k]!;
          X2[k] = X[k]! & av[k]!;
        }
        bk(P2, X2);
        P[w]! &= ~low;
        X[w]! |= low;
      }
    }
  };
  const P0 = new Uint32Array(W);
  for (let i = 0; i < n; i++) P0[i >>> 5]! |= 1 << (i & 31);
  bk(P0, new Uint32Array(W));
  return big + BigInt(count);
}
