import type { Graph } from '../graph/types.ts';

/**
 * Decides isomorphism classes for the algebra: `canonical(g)` is equal for two graphs exactly
 * when they are isomorphic with external legs unlabelled (legs of one field and direction are
 * interchangeable). Graphs must have their fields resolved. The canonical-form module supplies it.
 */
export interface GraphClassifier {
  canonical(g: Graph): string;
}
