import { defaultConventions } from '../conventions.ts';
import type { Theory } from '../types.ts';

/** Single real scalar with V = gφ³/3! in D0 = 6 (D = 6 − 2ε). */
export const phi3: Theory = {
  name: 'phi3',
  title: 'real scalar, cubic self-interaction gφ³/3! in six dimensions',
  dimension: 6,
  fields: [{ name: 'phi', statistics: 'boson', propagatorWeight: 2, line: 'plain', latex: '\\phi' }],
  vertices: [{ fields: ['phi', 'phi', 'phi'], coupling: 'g', derivatives: 0, normalization: '1/6' }],
  couplings: [{ name: 'g', latex: 'g' }],
  defaultField: 'phi',
  symbols: [],
  protectedResidues: [
    {
      residue: ['phi'],
      reason: 'the one-point function (tadpole) is removed by shifting the field, and massless tadpoles vanish in dimensional regularization',
    },
  ],
  conventions: {
    ...defaultConventions,
    couplingRescaling: 'a = g^2 / (4 pi)^3',
    zDefinitions: ['phi_0 = Z_phi^{1/2} phi', 'g_0 = mu^{eps} Z_g g / Z_phi^{3/2}', 'm_0^2 = Z_{m^2} m^2 / Z_phi'],
  },
};
