import type { GenerationContext } from './generation-context.ts';

/**
 * A graph under construction: every vertex is present with its type and its external legs;
 * some lines are drawn, and each vertex knows how many half-edges of each label are still
 * free. Stored as small typed arrays (V ≤ 64 vertices, multiplicities ≤ 15).
 *
 * - `rem[v * nl + l]`: free half-edges of label l at v;
 * - `legs[v * nl + l]`: external legs of label l at v (legs are unlabelled here);
 * - `mult[(k * V + a) * V + b]`: lines of kind k from a to b (a ≠ b; an unoriented kind is
 *   stored at both (a, b) and (b, a));
 * - `loops[k * V + v]`: self-loops of kind k at v.
 *
 * @internal
 */
export interface PartialState {
  readonly V: number;
  readonly type: Int8Array;
  readonly rem: Int8Array;
  readonly legs: Int8Array;
  readonly mult: Int8Array;
  readonly loops: Int8Array;
  /** Number of lines drawn so far. */
  lines: number;
}

/** A state with the given vertex types and leg counts, no lines, every half-edge free that is not a leg. */
export function emptyState(ctx: GenerationContext, type: readonly number[], legs: Int8Array): PartialState {
  const V = type.length;
  const nl = ctx.labels.length;
  const K = ctx.kinds.length;
  const rem = new Int8Array(V * nl);
  type.forEach((t, v) => ctx.types[t]!.labels.forEach((c, l) => (rem[v * nl + l] = c - legs[v * nl + l]!)));
  return { V, type: Int8Array.from(type), rem, legs, mult: new Int8Array(K * V * V), loops: new Int8Array(K * V), lines: 0 };
}

export function cloneState(s: PartialState): PartialState {
  return { V: s.V, type: s.type, legs: s.legs, rem: s.rem.slice(), mult: s.mult.slice(), loops: s.loops.slice(), lines: s.lines };
}

/** Draws one line of kind k from a to b (a = b: a self-loop), using the free half-edges. */
export function addLine(ctx: GenerationContext, s: PartialState, k: number, a: number, b: number): void {
  const kind = ctx.kinds[k]!;
  const nl = ctx.labels.length;
  s.rem[a * nl + kind.tail]!--;
  s.rem[b * nl + kind.head]!--;
  if (a === b) s.loops[k * s.V + a]!++;
  else {
    s.mult[(k * s.V + a) * s.V + b]!++;
    if (!kind.oriented) s.mult[(k * s.V + b) * s.V + a]!++;
  }
  s.lines++;
}

/** Free half-edges at v, all labels together. */
export function freeAt(s: PartialState, v: number, nl: number): number {
  let r = 0;
  for (let l = 0; l < nl; l++) r += s.rem[v * nl + l]!;
  return r;
}

/** Lines between a and b (a ≠ b), every kind and direction. */
export function linesBetween(ctx: GenerationContext, s: PartialState, a: number, b: number): number {
  let c = 0;
  const V = s.V;
  ctx.kinds.forEach((kind, k) => {
    c += s.mult[(k * V + a) * V + b]!;
    if (kind.oriented) c += s.mult[(k * V + b) * V + a]!;
  });
  return c;
}

const factorial = (k: number): bigint => {
  let f = 1n;
  for (let i = 2; i <= k; i++) f *= BigInt(i);
  return f;
};

/**
 * The half-edge permutations of a complete state that move no vertex: k parallel lines of
 * one kind and direction permute in k! ways, k self-loops of a kind in k! ways, and an
 * unoriented self-loop also flips end for end (a fermion self-loop cannot: its ends differ).
 */
export function edgeFactor(ctx: GenerationContext, s: PartialState): bigint {
  const V = s.V;
  let f = 1n;
  ctx.kinds.forEach((kind, k) => {
    for (let a = 0; a < V; a++) {
      const loops = s.loops[k * V + a]!;
      f *= factorial(loops) * (kind.oriented ? 1n : 1n << BigInt(loops));
      for (let b = kind.oriented ? 0 : a + 1; b < V; b++) if (b !== a) f *= factorial(s.mult[(k * V + a) * V + b]!);
    }
  });
  return f;
}
