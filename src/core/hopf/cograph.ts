import { contractParts } from '../graph/contract.ts';
import type { Graph } from '../graph/types.ts';
import type { BoundGraph } from '../theory/bind-graph.ts';
import type { DivergentSubgraph } from '../subgraphs/divergent-subgraphs.ts';
import { countertermMarks } from './counterterm-structure.ts';

/**
 * The cographs Γ/γ of an admissible subgraph (given by its components): every component
 * contracted to the vertex its residue calls for. One cograph per combination of counterterm
 * structures (exactly one in massless theories).
 */
export function cographs(bg: BoundGraph, components: readonly DivergentSubgraph[]): Graph[] {
  const choices = components.map((c) => countertermMarks(bg.theory, c.residue, c.omega));
  const out: Graph[] = [];
  const pick = (k: number, marks: (ReturnType<typeof countertermMarks>[number])[]) => {
    if (k === components.length) {
      out.push(contractParts(bg.graph, components.map((c, i) => ({ edges: c.edgeList, mark: marks[i]! }))).graph);
      return;
    }
    for (const m of choices[k]!) pick(k + 1, [...marks, m]);
  };
  pick(0, []);
  return out;
}
