import { defaultConventions } from '../conventions.ts';
import type { Theory } from '../types.ts';

/** N real scalars with O(N)-symmetric V = λ(φ·φ)²/4! in D0 = 4; the vertex tensor is the symmetrized δδ. */
export const phi4On: Theory = {
  name: 'phi4-on',
  title: 'O(N)-symmetric scalar, V = λ(φ·φ)²/4!',
  dimension: 4,
  fields: [{ name: 'phi', statistics: 'boson', propagatorWeight: 2, line: 'plain', latex: '\\phi' }],
  vertices: [
    { fields: ['phi', 'phi', 'phi', 'phi'], coupling: 'lambda', derivatives: 0, normalization: '1/24', tensor: 'on-symmetric-delta-delta' },
  ],
  couplings: [{ name: 'lambda', latex: '\\lambda' }],
  defaultField: 'phi',
  symbols: ['N'],
  protectedResidues: [],
  conventions: defaultConventions,
};
