import { defaultConventions } from '../conventions.ts';
import type { Theory } from '../types.ts';

/** A real scalar and a Dirac fermion: y ψ̄ψφ + λφ⁴/4! in D0 = 4. */
export const yukawa: Theory = {
  name: 'yukawa',
  title: 'Yukawa theory: real scalar φ and Dirac fermion ψ, y ψ̄ψφ + λφ⁴/4!',
  dimension: 4,
  fields: [
    { name: 'phi', statistics: 'boson', propagatorWeight: 2, line: 'dashed', latex: '\\phi' },
    { name: 'psi', antiparticle: 'psibar', statistics: 'fermion', propagatorWeight: 1, line: 'arrow', latex: '\\psi' },
  ],
  vertices: [
    { fields: ['psibar', 'psi', 'phi'], coupling: 'y', derivatives: 0, normalization: '1' },
    { fields: ['phi', 'phi', 'phi', 'phi'], coupling: 'lambda', derivatives: 0, normalization: '1/24' },
  ],
  couplings: [
    { name: 'y', latex: 'y' },
    { name: 'lambda', latex: '\\lambda' },
  ],
  defaultField: 'phi',
  defaultOrientedField: 'psi',
  symbols: [],
  protectedResidues: [],
  conventions: {
    ...defaultConventions,
    zDefinitions: [...defaultConventions.zDefinitions, 'psi_0 = Z_psi^{1/2} psi', 'y_0 = mu^{eps} Z_y y / (Z_psi Z_phi^{1/2})'],
  },
};
