/**
 * An up-front estimate of the number of connected vertex sets of a graph — the number of
 * sets `divergentSubgraphs` visits (one per connected vertex set) — so that a graph whose
 * search would blow the maxVertexSubsets limit is refused at once instead of after minutes.
 *
 * Method: stratified sampling. For each size k, the number of connected k-sets is
 * C(n, k)·p_k with p_k the probability that a uniformly random k-set induces a connected
 * subgraph; p_k is estimated from `samplesPerSize` random k-sets (each tested by a search
 * over the induced subgraph). The estimate is unbiased; sizes where no sample is connected
 * contribute nothing, so it errs low for sparse graphs, whose counts are small anyway.
 * Seeded, so the same graph always gets the same estimate.
 */

/** Deterministic 32-bit generator (mulberry32). */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Estimated number of connected vertex sets of the graph with these neighbour lists; the
 * sum stops early once it passes `stopAbove`. Samples per size: 200, fewer (at least 16)
 * for large graphs so that the whole estimate stays within a few million steps.
 */
export function estimateConnectedVertexSets(nbrs: readonly (readonly number[])[], stopAbove = Infinity, seed = 0x5eed): number {
  const n = nbrs.length;
  const halfEdges = nbrs.reduce((s, l) => s + l.length, 0);
  const samplesPerSize = Math.max(16, Math.min(200, Math.floor(4e6 / Math.max(1, n * (n + halfEdges)))));
  const rand = mulberry32(seed);
  const perm = Array.from({ length: n }, (_, i) => i);
  const inSet = new Int32Array(n);
  const seen = new Int32Array(n);
  let stamp = 0;
  const stack: number[] = [];
  let total = 0;
  let binom = 1; // C(n, k)
  for (let k = 1; k <= n; k++) {
    binom = (binom * (n - k + 1)) / k;
    let hits = 0;
    for (let s = 0; s < samplesPerSize; s++) {
      // A random k-set: the first k entries of a partial Fisher–Yates shuffle.
      for (let i = 0; i < k; i++) {
        const j = i + Math.floor(rand() * (n - i));
        const t = perm[i]!;
        perm[i] = perm[j]!;
        perm[j] = t;
      }
      stamp++;
      for (let i = 0; i < k; i++) inSet[perm[i]!] = stamp;
      seen[perm[0]!] = stamp;
      stack.push(perm[0]!);
      let reached = 1;
      while (stack.length) {
        const u = stack.pop()!;
        for (const w of nbrs[u]!) {
          if (inSet[w] === stamp && seen[w] !== stamp) {
            seen[w] = stamp;
            reached++;
            stack.push(w);
          }
        }
      }
      if (reached === k) hits++;
    }
    total += (binom * hits) / samplesPerSize;
    if (total > stopAbove) break;
  }
  return total;
}
