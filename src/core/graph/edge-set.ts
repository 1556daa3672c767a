/**
 * Subgraphs are edge sets, represented as BigInt bitsets (bit i = edge i in input order).
 * BigInt keeps the representation exact for any edge count; graphs here have tens of edges.
 */
export type EdgeSet = bigint;

export const EMPTY: EdgeSet = 0n;

export function edgeSetOf(indices: Iterable<number>): EdgeSet {
  let s = 0n;
  for (const i of indices) s |= 1n << BigInt(i);
  return s;
}

export function fullEdgeSet(edgeCount: number): EdgeSet {
  return (1n << BigInt(edgeCount)) - 1n;
}

export function hasEdge(s: EdgeSet, i: number): boolean {
  return ((s >> BigInt(i)) & 1n) === 1n;
}

/** Edge indices in ascending order. */
export function edgeIndices(s: EdgeSet): number[] {
  const out: number[] = [];
  let i = 0;
  while (s > 0n) {
    // Skip zero words quickly.
    if ((s & 0xffffffffn) === 0n) {
      s >>= 32n;
      i += 32;
      continue;
    }
    if (s & 1n) out.push(i);
    s >>= 1n;
    i++;
  }
  return out;
}

export function edgeCount(s: EdgeSet): number {
  let n = 0;
  while (s > 0n) {
    s &= s - 1n;
    n++;
  }
  return n;
}

/** True when a ⊆ b. */
export function isSubset(a: EdgeSet, b: EdgeSet): boolean {
  return (a & ~b) === 0n;
}
