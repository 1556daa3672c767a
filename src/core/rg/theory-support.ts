import { TheoryError } from '../errors.ts';
import type { Theory } from '../theory/types.ts';

/**
 * Which theories the RG computation covers: one real massless scalar with a single quartic
 * vertex (any internal-symmetry tensor the group-factor code knows) in D0 = 4 — φ⁴ and O(N) φ⁴.
 * Anything else is refused with the reason: fermion and gauge lines are outside the exact
 * evaluator (massless scalar lines only), and cubic or several couplings need a coupling
 * rescaling and a β matrix that this computation does not set up. Returns null when supported.
 */
export function unsupportedReason(theory: Theory): string | null {
  const fermions = theory.fields.filter((f) => f.statistics === 'fermion' || f.antiparticle || f.propagatorWeight !== 2);
  if (fermions.length > 0) {
    return `its graphs have ${fermions.map((f) => `${f.name} (${f.statistics}, propagator weight ${f.propagatorWeight})`).join(', ')} lines, which the exact evaluator does not handle (massless scalar lines only), so no counterterm of theirs can be evaluated`;
  }
  if (theory.fields.length !== 1) return 'it has several fields; the RG computation handles one scalar field';
  if (theory.dimension !== 4) return `it lives in D0 = ${theory.dimension}; the RG computation handles quartic theories in D0 = 4 (g = coupling/(16 pi^2))`;
  if (theory.vertices.length !== 1 || theory.vertices[0]!.fields.length !== 4 || theory.vertices[0]!.derivatives !== 0) {
    return 'the RG computation handles a single quartic vertex without derivatives (one coupling)';
  }
  if (!/^\s*\d+\s*(\/\s*\d+\s*)?$/.test(theory.vertices[0]!.normalization)) return `the vertex normalization "${theory.vertices[0]!.normalization}" is not a plain rational`;
  return null;
}

/** Throws a TheoryError naming why the theory's RG functions cannot be computed here. */
export function requireSupported(theory: Theory): void {
  const why = unsupportedReason(theory);
  if (why) {
    throw new TheoryError(
      `the RG functions of theory ${theory.name} cannot be computed: ${why}`,
      `theory ${theory.name}`,
      'rg covers phi4 and phi4-on (and user theories of the same shape); counterterms of single scalar graphs are available through coppice counterterm',
    );
  }
}
