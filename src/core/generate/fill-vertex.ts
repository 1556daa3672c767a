import type { GenerationContext } from './generation-context.ts';
import { addLine, cloneState, freeAt, type PartialState } from './partial-state.ts';

/** One way to spend a free half-edge of the vertex being filled: a line of kind k to w, drawn tail → head. */
interface Option {
  readonly k: number;
  readonly w: number;
  /** The filled vertex is the line's tail (`a`). */
  readonly fromV: boolean;
  /** Label used at the filled vertex and at w. */
  readonly atV: number;
  readonly atW: number;
}

/** Vertex code without the lines: vertices with equal codes and no lines are interchangeable. */
function freshKey(ctx: GenerationContext, s: PartialState, v: number): string | null {
  const nl = ctx.labels.length;
  const K = ctx.kinds.length;
  for (let k = 0; k < K; k++) if (s.loops[k * s.V + v]! > 0) return null;
  for (let u = 0; u < s.V; u++) {
    if (u === v) continue;
    for (let k = 0; k < K; k++) if (s.mult[(k * s.V + v) * s.V + u]! > 0 || s.mult[(k * s.V + u) * s.V + v]! > 0) return null;
  }
  return `${s.type[v]}|${Array.from(s.legs.subarray(v * nl, v * nl + nl)).join(',')}`;
}

/**
 * Every way to use up all free half-edges of vertex v with lines to vertices that still have
 * free half-edges (v itself included, for self-loops unless `noSelfLoops`), respecting labels
 * and arrows. Each child has v complete. Children differ as drawings; isomorphic children are
 * merged by the caller. One symmetry is broken here: vertices without any line yet and with
 * the same type and legs are interchangeable (a permutation of them is an automorphism of the
 * state), so only fills whose per-vertex line counts are lexicographically non-increasing
 * along each such group are produced — every other fill is the image of one of these under
 * such a permutation.
 * @internal
 */
export function fillVertex(ctx: GenerationContext, s: PartialState, v: number, noSelfLoops: boolean): PartialState[] {
  const nl = ctx.labels.length;
  const V = s.V;
  const rem = s.rem.slice();
  const options: Option[] = [];
  // Self-loops first (w = v), then the other vertices in index order.
  if (!noSelfLoops) ctx.kinds.forEach((kind, k) => options.push({ k, w: v, fromV: true, atV: kind.tail, atW: kind.head }));
  const groupPrev = new Int32Array(V).fill(-1);
  const lastOfGroup = new Map<string, number>();
  for (let w = 0; w < V; w++) {
    if (w === v || freeAt(s, w, nl) === 0) continue;
    const key = freshKey(ctx, s, w);
    if (key !== null) {
      const prev = lastOfGroup.get(key);
      if (prev !== undefined) groupPrev[w] = prev;
      lastOfGroup.set(key, w);
    }
    ctx.kinds.forEach((kind, k) => {
      options.push({ k, w, fromV: true, atV: kind.tail, atW: kind.head });
      if (kind.oriented) options.push({ k, w, fromV: false, atV: kind.head, atW: kind.tail });
    });
  }
  const counts = new Int32Array(options.length);
  // Index of each vertex's first option, to compare the count vectors of grouped vertices.
  const firstOption = new Int32Array(V).fill(-1);
  const optionsOf = new Int32Array(V);
  options.forEach((o, i) => {
    if (o.w === v) return;
    if (firstOption[o.w]! < 0) firstOption[o.w] = i;
    optionsOf[o.w]!++;
  });
  const lexNotGreater = (w: number): boolean => {
    // counts of w must not exceed (lexicographically) those of its group predecessor.
    const p = groupPrev[w]!;
    const a = firstOption[p]!;
    const b = firstOption[w]!;
    for (let i = 0; i < optionsOf[w]!; i++) {
      const x = counts[a + i]!;
      const y = counts[b + i]!;
      if (x !== y) return y < x;
    }
    return true;
  };
  let leftAtV = freeAt(s, v, nl);
  const out: PartialState[] = [];
  const rec = (i: number) => {
    if (i > 0) {
      // A vertex's count vector is final when its options are done, or when v is full.
      const prev = options[i - 1]!;
      const settled = i === options.length || options[i]!.w !== prev.w || leftAtV === 0;
      if (settled && prev.w !== v && groupPrev[prev.w]! >= 0 && !lexNotGreater(prev.w)) return;
    }
    if (leftAtV === 0) {
      // Remaining grouped vertices get nothing; that is lexicographically fine.
      const child = cloneState(s);
      options.forEach((o, j) => {
        for (let c = 0; c < counts[j]!; c++) {
          if (o.fromV) addLine(ctx, child, o.k, v, o.w);
          else addLine(ctx, child, o.k, o.w, v);
        }
      });
      out.push(child);
      return;
    }
    if (i === options.length) return;
    const o = options[i]!;
    const iv = v * nl + o.atV;
    const iw = o.w * nl + o.atW;
    // A self-loop takes two half-edges of v (tail and head labels, possibly equal).
    let max = o.w === v ? (o.atV === o.atW ? Math.floor(rem[iv]! / 2) : Math.min(rem[iv]!, rem[iw]!)) : Math.min(rem[iv]!, rem[iw]!);
    max = Math.max(0, max);
    for (let c = max; c >= 0; c--) {
      counts[i] = c;
      rem[iv]! -= c;
      rem[iw]! -= c;
      leftAtV -= o.w === v ? 2 * c : c;
      rec(i + 1);
      rem[iv]! += c;
      rem[iw]! += c;
      leftAtV += o.w === v ? 2 * c : c;
    }
    counts[i] = 0;
  };
  rec(0);
  return out;
}
