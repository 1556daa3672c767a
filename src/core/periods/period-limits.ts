/**
 * Work limits of the period machinery, each named as the option that raises it (a LimitError
 * says so). The subset tables of the tropical sampler hold one number per edge subset, so their
 * size doubles with every edge: 22 edges (11 loops) is about 32 MB per table.
 */
export interface PeriodLimits {
  /** Largest number of Monte Carlo samples accepted in one request. */
  readonly maxSamples: number;
  /** Largest number of edges whose subset tables are built (2^edges entries). */
  readonly maxEdges: number;
  /** Largest number of edges for which the Hepp bound is also computed exactly (BigInt recursion). */
  readonly maxExactHeppEdges: number;
}

export const defaultPeriodLimits: PeriodLimits = {
  maxSamples: 1e10,
  maxEdges: 22,
  maxExactHeppEdges: 20,
};

/** Hard ceiling: edge subsets are 32-bit masks. */
export const MAX_PERIOD_EDGES_HARD = 28;
