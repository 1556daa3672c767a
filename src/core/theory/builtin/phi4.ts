import { defaultConventions } from '../conventions.ts';
import type { Theory } from '../types.ts';

/** Single real scalar with V = λφ⁴/4! in D0 = 4. */
export const phi4: Theory = {
  name: 'phi4',
  title: 'real scalar, quartic self-interaction λφ⁴/4!',
  dimension: 4,
  fields: [{ name: 'phi', statistics: 'boson', propagatorWeight: 2, line: 'plain', latex: '\\phi' }],
  vertices: [{ fields: ['phi', 'phi', 'phi', 'phi'], coupling: 'lambda', derivatives: 0, normalization: '1/24' }],
  couplings: [{ name: 'lambda', latex: '\\lambda' }],
  defaultField: 'phi',
  symbols: [],
  protectedResidues: [],
  conventions: defaultConventions,
};
