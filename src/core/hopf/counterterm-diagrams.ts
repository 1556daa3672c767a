import { contractParts } from '../graph/contract.ts';
import { canonicalNotation } from '../canon/canonical-form.ts';
import { symmetryFactor } from '../canon/symmetry-factor.ts';
import type { BoundGraph } from '../theory/bind-graph.ts';
import type { DivergentSubgraph } from '../subgraphs/divergent-subgraphs.ts';
import type { AdmissibleSubgraph } from './admissible.ts';
import { countertermMarks } from './counterterm-structure.ts';

/** An insertion of a counterterm vertex: which residue, its structure, and the loop order it carries. */
export interface CountertermInsertion {
  readonly residue: readonly string[];
  readonly structure: string;
  readonly loops: number;
}

/**
 * A counterterm diagram of renormalized perturbation theory: the cograph Γ/γ with every
 * contracted vertex marked as a counterterm vertex (δλ, δZ, …) of γ's loop order. Its own
 * symmetry factor counts automorphisms that fix the legs and keep marked vertices marked.
 */
export interface CountertermDiagram {
  /** The marked diagram in canonical notation (legs labelled as in Γ). */
  readonly notation: string;
  readonly insertions: readonly CountertermInsertion[];
  readonly symmetryFactor: bigint;
  /** Number of admissible subgraphs of Γ that give this marked diagram. */
  readonly multiplicity: number;
  /** Edge lists of a representative γ's components. */
  readonly components: readonly (readonly number[])[];
}

export function countertermDiagrams(bg: BoundGraph, subgraphs: readonly DivergentSubgraph[], admissible: readonly AdmissibleSubgraph[]): CountertermDiagram[] {
  const byKey = new Map<string, { notation: string; insertions: CountertermInsertion[]; symmetryFactor: bigint; multiplicity: number; components: number[][] }>();
  for (const a of admissible) {
    const comps = a.components.map((i) => subgraphs[i]!);
    const parts = comps.map((c) => {
      const m = countertermMarks(bg.theory, c.residue, c.omega)[0];
      return { edges: c.edgeList, mark: m ?? { residue: [...c.residue].sort(), structure: '' } };
    });
    const marked = contractParts(bg.graph, parts).graph;
    const notation = canonicalNotation(marked, { defaultField: bg.theory.defaultField });
    const insertions = comps
      .map((c, i) => ({ residue: parts[i]!.mark.residue, structure: parts[i]!.mark.structure, loops: c.loops }))
      .sort((x, y) => (x.residue.join() + x.structure + x.loops < y.residue.join() + y.structure + y.loops ? -1 : 1));
    const key = `${notation}|${insertions.map((x) => `${x.residue.join(',')};${x.structure};${x.loops}`).join('|')}`;
    const hit = byKey.get(key);
    if (hit) hit.multiplicity++;
    else byKey.set(key, { notation, insertions, symmetryFactor: symmetryFactor(marked), multiplicity: 1, components: comps.map((c) => [...c.edgeList]) });
  }
  return [...byKey.values()];
}
