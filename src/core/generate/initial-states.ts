import type { GenerationContext } from './generation-context.ts';
import { emptyState, type PartialState } from './partial-state.ts';

/**
 * The states with no lines: the vertices (n_t of type t, in type order) with the external
 * legs, unlabelled, distributed over them — one state per isomorphism class. Without lines,
 * vertices of one type are interchangeable, so the classes are the distributions whose
 * per-vertex leg-count vectors are lexicographically non-increasing along each type.
 * @internal
 */
export function initialStates(ctx: GenerationContext, counts: readonly number[]): PartialState[] {
  const nl = ctx.labels.length;
  const type: number[] = [];
  counts.forEach((c, t) => {
    for (let i = 0; i < c; i++) type.push(t);
  });
  const V = type.length;
  const left = new Array<number>(nl).fill(0);
  for (const l of ctx.legs) left[l.label]!++;
  const legs = new Int8Array(V * nl);
  const out: PartialState[] = [];
  const notAbovePrevious = (v: number): boolean => {
    if (v === 0 || type[v - 1] !== type[v]) return true;
    for (let l = 0; l < nl; l++) {
      const x = legs[(v - 1) * nl + l]!;
      const y = legs[v * nl + l]!;
      if (x !== y) return y < x;
    }
    return true;
  };
  const rec = (v: number, l: number) => {
    if (v === V) {
      if (left.every((x) => x === 0)) out.push(emptyState(ctx, type, legs.slice()));
      return;
    }
    if (l === nl) {
      if (notAbovePrevious(v)) rec(v + 1, 0);
      return;
    }
    const cap = Math.min(left[l]!, ctx.types[type[v]!]!.labels[l]!);
    for (let c = cap; c >= 0; c--) {
      legs[v * nl + l] = c;
      left[l]! -= c;
      rec(v, l + 1);
      left[l]! += c;
    }
    legs[v * nl + l] = 0;
  };
  rec(0, 0);
  return out;
}
