import type { CountertermMark } from '../graph/types.ts';
import { fieldByName } from '../theory/bind-graph.ts';
import type { Theory } from '../theory/types.ts';

/**
 * What a contracted divergent component becomes in a cograph, one entry per counterterm
 * structure of its residue: `null` is an ordinary vertex of the theory (a vertex residue with
 * ω = its derivative count), otherwise a counterterm vertex with the residue and structure.
 *
 * The structure carries ω(γ) powers of momentum, so ω(Γ'/γ) = ω(Γ') for every Γ' ⊇ γ and the
 * subgraphs of a cograph correspond to the subgraphs of the graph that contain γ — what
 * coassociativity needs. All built-in theories are massless, so there is one structure per
 * residue; a massive theory would add `m2` beside `p2` for a scalar two-point residue.
 */
export function countertermMarks(theory: Theory, residue: readonly string[], omega: number): (CountertermMark | null)[] {
  const sorted = [...residue].sort();
  const key = sorted.join(',');
  const vertex = theory.vertices.find((v) => v.fields.join(',') === key);
  if (vertex && vertex.derivatives === omega) return [null];
  if (sorted.length === 2) {
    // Two-point residues: the structure carries ω powers of momentum — p² (ω = 2), p̸ for a
    // fermion (ω = 1), and a mass-type insertion m² (ω = 0, e.g. a self-energy that contains a
    // φ² insertion).
    const f = fieldByName(theory, sorted[0]!) ?? theory.fields.find((x) => x.antiparticle === sorted[0]);
    if (omega === 0) return [{ residue: sorted, structure: 'm2' }];
    if (f && f.statistics === 'fermion') return [{ residue: sorted, structure: 'pslash' }];
    return [{ residue: sorted, structure: 'p2' }];
  }
  const structure = omega <= 0 ? '' : omega === 1 ? 'p' : 'p2';
  return [{ residue: sorted, structure }];
}
