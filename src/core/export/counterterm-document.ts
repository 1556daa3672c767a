import type { FormulaTree } from '../hopf/formula-tree.ts';
import type { HopfAlgebra } from '../hopf/hopf-algebra.ts';
import type { BoundGraph } from '../theory/bind-graph.ts';
import type { CountertermDocument } from './latex-document.ts';
import { quotientInside, rootLatexGraph, subgraphLatexGraph, subgraphSymbol } from './latex-graphs.ts';

/**
 * The counterterm formula tree of Γ as a document. Subgraph i of the engine's list of proper
 * divergent subgraphs (`g<i>` in the text and JSON output) is γ_{i+1}.
 */
export function countertermDocument(H: HopfAlgebra, bg: BoundGraph, tree: FormulaTree): CountertermDocument {
  const a = H.analyze(bg);
  const subgraphs = a.subgraphs.map((s, i) => subgraphLatexGraph(bg, s, subgraphSymbol(i + 1)));
  const quotient = (node: number, children: readonly number[]) => {
    const n = tree.nodes[node]!;
    const inner = children.map((c) => a.subgraphs[tree.nodes[c]!.subgraphIndex]!);
    return quotientInside(bg, n.subgraphIndex < 0 ? null : n.edges, inner);
  };
  return { kind: 'counterterm', theory: bg.theory, root: rootLatexGraph(bg), subgraphs, tree, quotient };
}
