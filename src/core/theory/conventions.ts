import type { Conventions } from './types.ts';

/**
 * Textbook defaults (common practice; the conventions behind the φ⁴ values quoted in
 * "Critical Properties of φ⁴-Theories", World Scientific 2001, ch. 11): MS-bar-type
 * measure e^{γε} d^Dk/π^{D/2} per loop, D = D0 − 2ε, g = λ/(16π²), β = μ dg/dμ.
 */
export const defaultConventions: Conventions = {
  dimension: 'D0-2eps',
  vertexSign: -1,
  fermionLoopSign: -1,
  loopMeasure: 'e^{gamma_E eps} d^D k / pi^{D/2} per loop; (4 pi)^eps absorbed into the coupling',
  couplingRescaling: 'g = coupling / (16 pi^2)',
  zDefinitions: ['phi_0 = Z_phi^{1/2} phi', 'lambda_0 = mu^{2 eps} Z_lambda lambda / Z_phi^2', 'm_0^2 = Z_{m^2} m^2 / Z_phi'],
  gammaPhiHalf: true,
  betaSign: 1,
};
