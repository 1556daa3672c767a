import { addIndex, isZeroIndex } from './line-index.ts';
import { compactIntegral, mergeVertices, type PropIntegral } from './prop-integral.ts';

/** The outcome of the reductions that need no integration: a simpler integral, or a value of 0 or 1. */
export type Simplified = { kind: 'integral'; integral: PropIntegral } | { kind: 'zero'; why: string } | { kind: 'one' };

/**
 * Reductions that are exact identities of dimensionally regularized massless integrals:
 * a line of index 0 is no line (its ends merge); a self-loop or any part without the external
 * momentum is scaleless and vanishes; lines in series at a vertex without external momentum
 * merge (indices add); a vertex hanging by one line carries zero momentum into a scaleless part.
 */
export function simplifyIntegral(input: PropIntegral): Simplified {
  let I = input;
  for (let guard = 0; guard < 10_000; guard++) {
    const zero = I.lines.findIndex((l) => isZeroIndex(l.index));
    if (zero >= 0) {
      const l = I.lines[zero]!;
      const rest = { ...I, lines: I.lines.filter((_, k) => k !== zero) };
      if (l.u === l.v) return { kind: 'zero', why: 'scaleless tadpole (a loop of index 0)' };
      I = mergeVertices(rest, Math.min(l.u, l.v), Math.max(l.u, l.v));
      continue;
    }
    if (I.lines.some((l) => l.u === l.v)) return { kind: 'zero', why: 'massless tadpole (a self-loop is scaleless)' };
    if (I.s === I.t) return I.lines.length === 0 ? { kind: 'one' } : { kind: 'zero', why: 'no external momentum flows through the graph (scaleless)' };
    const degree = new Array<number>(I.vertexCount).fill(0);
    for (const l of I.lines) {
      degree[l.u]!++;
      degree[l.v]!++;
    }
    const hanging = degree.findIndex((d, v) => d === 1 && v !== I.s && v !== I.t);
    if (hanging >= 0) return { kind: 'zero', why: 'a part attached by one line carries no momentum (scaleless)' };
    const series = degree.findIndex((d, v) => d === 2 && v !== I.s && v !== I.t);
    if (series >= 0) {
      const [k1, k2] = I.lines.map((l, k) => [l, k] as const).filter(([l]) => l.u === series || l.v === series).map(([, k]) => k);
      const l1 = I.lines[k1!]!;
      const l2 = I.lines[k2!]!;
      const x = l1.u === series ? l1.v : l1.u;
      const y = l2.u === series ? l2.v : l2.u;
      const lines = I.lines.filter((_, k) => k !== k1 && k !== k2);
      lines.push({ u: x, v: y, index: addIndex(l1.index, l2.index) });
      I = { ...I, lines };
      continue;
    }
    break;
  }
  I = compactIntegral(I);
  if (I.lines.length === 0) return { kind: 'zero', why: 's and t are not connected' };
  return { kind: 'integral', integral: I };
}
