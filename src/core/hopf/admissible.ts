import { LimitError } from '../errors.ts';
import type { EdgeSet } from '../graph/edge-set.ts';
import type { DivergentSubgraph } from '../subgraphs/divergent-subgraphs.ts';
import { areVertexDisjoint } from '../subgraphs/compatibility.ts';

/** An admissible subgraph: vertex-disjoint connected divergent 1PI components. */
export interface AdmissibleSubgraph {
  /** Indices into the list of connected divergent subgraphs it was built from, ascending. */
  readonly components: readonly number[];
  readonly edges: EdgeSet;
}

export const DEFAULT_MAX_ADMISSIBLE = 200_000;

/**
 * All nonempty admissible subgraphs made of the given connected divergent subgraphs: sets of
 * pairwise vertex-disjoint members (components that shared a vertex would be one component, so
 * such a union is admissible only if it is itself in the list). Refused beyond `max`.
 */
export function admissibleSubgraphs(connected: readonly DivergentSubgraph[], max = DEFAULT_MAX_ADMISSIBLE): AdmissibleSubgraph[] {
  const out: AdmissibleSubgraph[] = [];
  const chosen: number[] = [];
  const rec = (from: number, edges: EdgeSet) => {
    for (let k = from; k < connected.length; k++) {
      if (!chosen.every((j) => areVertexDisjoint(connected[j]!, connected[k]!))) continue;
      chosen.push(k);
      const e = edges | connected[k]!.edges;
      if (out.length >= max) {
        throw new LimitError('listing admissible subgraphs', 'maxAdmissible', max, `more than ${max}`, 'raise it with --max-admissible, or work with a smaller graph');
      }
      out.push({ components: [...chosen], edges: e });
      rec(k + 1, e);
      chosen.pop();
    }
  };
  rec(0, 0n);
  return out;
}
