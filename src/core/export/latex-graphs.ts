/**
 * The graphs a document names: Γ in its input order (so line numbers match what the user
 * wrote), its divergent subgraphs as graphs of their own, and cographs with every contracted
 * component drawn as a marked counterterm vertex.
 */
import { canonicalNotation } from '../canon/canonical-form.ts';
import { contractParts } from '../graph/contract.ts';
import { loopNumber } from '../graph/connectivity.ts';
import { subgraphAsGraph } from '../graph/extract-subgraph.ts';
import { printNotation } from '../graph/notation-print.ts';
import type { Graph } from '../graph/types.ts';
import { countertermMarks } from '../hopf/counterterm-structure.ts';
import type { BoundGraph } from '../theory/bind-graph.ts';
import { omegaOfGraph, residueOfGraph } from '../theory/power-counting.ts';
import type { DivergentSubgraph } from '../subgraphs/divergent-subgraphs.ts';
import type { Theory } from '../theory/types.ts';
import type { LatexGraph } from './latex-document.ts';

export const ROOT_SYMBOL = '\\Gr';
export const subgraphSymbol = (k: number): string => `\\sg{${k}}`;

/** Γ as the user wrote it. */
export function rootLatexGraph(bg: BoundGraph): LatexGraph {
  return {
    symbol: ROOT_SYMBOL,
    graph: bg.graph,
    notation: printNotation(bg.graph, { defaultField: bg.theory.defaultField }),
    lines: bg.graph.edges.map((_, i) => i + 1),
    loops: loopNumber(bg.graph),
    omega: omegaOfGraph(bg),
    residue: [...residueOfGraph(bg)].sort(),
  };
}

/** A divergent subgraph of Γ, named by `symbol`. */
export function subgraphLatexGraph(bg: BoundGraph, s: DivergentSubgraph, symbol: string): LatexGraph {
  const graph = subgraphAsGraph(bg.graph, s.edgeList).graph;
  return {
    symbol,
    graph,
    notation: canonicalNotation(graph, { legs: 'unlabelled', defaultField: bg.theory.defaultField }),
    lines: s.edgeList.map((e) => e + 1),
    loops: s.loops,
    omega: s.omega,
    residue: [...s.residue].sort(),
  };
}

/** A component to contract: its edges (indices into the graph being contracted), residue and ω. */
export interface ContractedComponent {
  readonly edges: readonly number[];
  readonly residue: readonly string[];
  readonly omega: number;
}

/** g with each component contracted to a vertex marked as a counterterm insertion of its residue. */
export function markedContraction(theory: Theory, g: Graph, parts: readonly ContractedComponent[]): Graph {
  return contractParts(
    g,
    parts.map((p) => ({ edges: p.edges, mark: countertermMarks(theory, p.residue, p.omega)[0] ?? { residue: [...p.residue].sort(), structure: '' } })),
  ).graph;
}

/**
 * The cograph γ/α inside Γ: γ (given by its edges in Γ, or all of Γ) as a graph, with the
 * components of α (edges in Γ, each inside γ) contracted and marked.
 */
export function quotientInside(bg: BoundGraph, outer: readonly number[] | null, inner: readonly DivergentSubgraph[]): Graph {
  if (outer === null) return markedContraction(bg.theory, bg.graph, inner.map((c) => ({ edges: c.edgeList, residue: c.residue, omega: c.omega })));
  const sorted = [...outer].sort((x, y) => x - y);
  const pos = new Map(sorted.map((e, i) => [e, i]));
  const g = subgraphAsGraph(bg.graph, sorted).graph;
  return markedContraction(bg.theory, g, inner.map((c) => ({ edges: c.edgeList.map((e) => pos.get(e)!), residue: c.residue, omega: c.omega })));
}
