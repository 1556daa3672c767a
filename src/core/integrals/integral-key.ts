import { canonicalNotation } from '../canon/canonical-form.ts';
import type { Graph } from '../graph/types.ts';
import { indexToken } from './line-index.ts';
import type { PropIntegral } from './prop-integral.ts';

/** A key equal for two integrals exactly when they are isomorphic (s and t interchangeable, lines typed by index). */
export function integralKey(I: PropIntegral): string {
  const g: Graph = {
    vertices: Array.from({ length: I.vertexCount }, (_, i) => ({ name: `v${i}` })),
    edges: I.lines.map((l) => ({ a: l.u, b: l.v, field: indexToken(l.index), oriented: false })),
    legs: [
      { vertex: I.s, field: 'p', direction: 'none' },
      { vertex: I.t, field: 'p', direction: 'none' },
    ],
  };
  return canonicalNotation(g, { legs: 'unlabelled' });
}
