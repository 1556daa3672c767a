/**
 * Limits on work that can explode, with defaults generous enough for 7–8 loop graphs.
 * Each is named as the option that raises it; a LimitError says so.
 */
export interface SubgraphLimits {
  /** Connected vertex subsets visited while looking for divergent subgraphs. */
  readonly maxVertexSubsets: number;
  /** Divergent subgraphs kept. */
  readonly maxDivergentSubgraphs: number;
  /** Forests materialized by `listForests` (counting is never limited by this). */
  readonly maxForests: number;
  /** Search steps spent counting maximal forests. */
  readonly maxForestSearchSteps: number;
}

export const defaultSubgraphLimits: SubgraphLimits = {
  maxVertexSubsets: 5_000_000,
  maxDivergentSubgraphs: 100_000,
  maxForests: 1_000_000,
  maxForestSearchSteps: 20_000_000,
};
