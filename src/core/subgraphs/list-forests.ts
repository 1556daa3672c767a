import { LimitError } from '../errors.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { areCompatible } from './compatibility.ts';
import { countForests } from './count-forests.ts';
import type { DivergentSubgraph } from './divergent-subgraphs.ts';
import { defaultSubgraphLimits, type SubgraphLimits } from './limits.ts';

/**
 * Every forest of the given subgraphs (index sets into `subs`, ascending; the empty forest first).
 * The count is computed first and refused beyond `maxForests`, so nothing explodes in memory.
 */
export function listForests(subs: readonly DivergentSubgraph[], opts: { limits?: Partial<SubgraphLimits>; cancel?: CancelToken } = {}): number[][] {
  const limits = { ...defaultSubgraphLimits, ...opts.limits };
  const cancel = opts.cancel ?? neverCancel;
  const total = countForests(subs, cancel);
  if (total > BigInt(limits.maxForests)) {
    throw new LimitError('listing forests', 'maxForests', limits.maxForests, total.toString(), 'raise it with --max-forests, or ask for the count only');
  }
  const out: number[][] = [];
  const current: number[] = [];
  const rec = (from: number) => {
    out.push([...current]);
    if ((out.length & 0xfff) === 0) cancel.throwIfCancelled();
    for (let k = from; k < subs.length; k++) {
      if (current.every((j) => areCompatible(subs[j]!, subs[k]!))) {
        current.push(k);
        rec(k + 1);
        current.pop();
      }
    }
  };
  rec(0);
  return out;
}

/** Is this index set a forest (pairwise compatible)? */
export function isForest(subs: readonly DivergentSubgraph[], members: readonly number[]): boolean {
  for (let a = 0; a < members.length; a++) for (let b = a + 1; b < members.length; b++) if (!areCompatible(subs[members[a]!]!, subs[members[b]!]!)) return false;
  return true;
}
