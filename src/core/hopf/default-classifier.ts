import { canonicalNotation } from '../canon/canonical-form.ts';
import type { GraphClassifier } from './graph-classifier.ts';

/** Classes with external legs unlabelled (legs of one field and direction interchangeable). */
export const unlabelledLegsClassifier: GraphClassifier = {
  canonical: (g) => canonicalNotation(g, { legs: 'unlabelled' }),
};
