import type { Scheme } from '../schemes/scheme.ts';
import type { Theory } from '../theory/types.ts';

/**
 * The conventions behind `coppice rg`'s numbers, printed beside them (DESIGN §2): the theory's
 * own conventions plus what this computation defines. Keys are stable (a CLI contract).
 */
export function rgConventions(theory: Theory, scheme: Scheme): Record<string, unknown> {
  const c = theory.conventions;
  const v = theory.vertices[0]!;
  const D = c.dimension === 'D0-eps' ? `D = ${theory.dimension} - eps` : `D = ${theory.dimension} - 2*eps`;
  return {
    dimension: D,
    euclidean: `each vertex contributes ${c.vertexSign === -1 ? '-' : '+'}${v.coupling} times its tree factor${v.tensor ? ` and tensor (${v.tensor}, the symmetrized delta-delta of norm 1)` : ''}; a graph carries 1/S`,
    vertexNormalization: `${v.coupling}*${v.normalization} * ${v.fields.join('*')} in the Lagrangian`,
    loopMeasure: scheme.description,
    couplingRescaling: `g = ${v.coupling}/(16 pi^2): with the scheme's measure the loop factor is exactly 1 per loop ((4 pi)^eps and e^{gamma_E eps} go into mu)`,
    zDefinitions: [...c.zDefinitions],
    zFromGraphs: 'Z - 1 = -sum over graphs of (vertex sign)^V * (tree factor)^k * groupFactor * S_R(graph) * g^L / S; Z_{m^2} from the two-point graphs with a phi^2 insertion (zero momentum, factor -1) on each line in turn',
    beta: `${c.betaSign === 1 ? 'beta(g) = mu dg/dmu' : 'beta(g) = -mu dg/dmu'} at fixed bare coupling, from g_0 = mu^{2 eps} g Z_lambda / Z_phi^2; the eps-dependent term is the monomial "eps*g"`,
    gammaPhi: c.gammaPhiHalf ? 'gamma_phi = (1/2) mu d ln Z_phi/dmu' : 'gamma_phi = mu d ln Z_phi/dmu',
    gammaMass: 'gamma_{m^2} = mu d ln m^2/dmu = -mu d ln(Z_{m^2}/Z_phi)/dmu (so 1/nu = 2 - gamma_{m^2}(g*))',
    values: 'coefficients of the RG functions at eps^0 (D -> 4) except the "eps*g" term of beta; monomials in the couplings; zero coefficients are omitted (see knownThrough)',
    scheme: scheme.name,
  };
}
