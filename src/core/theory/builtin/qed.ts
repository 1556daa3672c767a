import { defaultConventions } from '../conventions.ts';
import type { Theory } from '../types.ts';

/** Spinor QED in Feynman gauge, massless electron, D0 = 4. */
export const qed: Theory = {
  name: 'qed',
  title: 'quantum electrodynamics (Dirac fermion ψ, photon A, Feynman gauge)',
  dimension: 4,
  fields: [
    { name: 'A', statistics: 'boson', propagatorWeight: 2, line: 'wavy', latex: 'A' },
    { name: 'psi', antiparticle: 'psibar', statistics: 'fermion', propagatorWeight: 1, line: 'arrow', latex: '\\psi' },
  ],
  vertices: [{ fields: ['psibar', 'psi', 'A'], coupling: 'e', derivatives: 0, normalization: '1' }],
  couplings: [{ name: 'e', latex: 'e' }],
  defaultField: 'A',
  defaultOrientedField: 'psi',
  symbols: [],
  protectedResidues: [
    { residue: ['A'], reason: "Furry's theorem (charge conjugation): closed fermion loops with an odd number of photons cancel in pairs" },
    { residue: ['A', 'A', 'A'], reason: "Furry's theorem (charge conjugation): closed fermion loops with an odd number of photons cancel in pairs" },
    { residue: ['A', 'A', 'A', 'A'], reason: 'gauge invariance (the Ward identity makes light-by-light scattering transverse, so the divergence cancels in the sum of graphs)' },
  ],
  conventions: {
    ...defaultConventions,
    couplingRescaling: 'a = e^2 / (16 pi^2)',
    zDefinitions: ['psi_0 = Z_2^{1/2} psi', 'A_0 = Z_3^{1/2} A', 'e_0 = mu^{eps} Z_1 e / (Z_2 Z_3^{1/2}), Z_1 = Z_2 (Ward identity)'],
  },
};
