import { canonicalNotation } from '../canon/canonical-form.ts';
import type { HopfAlgebra } from '../hopf/hopf-algebra.ts';
import type { BoundGraph } from '../theory/bind-graph.ts';
import type { CoproductDocument, LatexCoproductTerm, LatexGraph } from './latex-document.ts';
import { markedContraction, rootLatexGraph, ROOT_SYMBOL, subgraphLatexGraph, subgraphSymbol } from './latex-graphs.ts';

/** `\cog{outer}{…}` for a list of component symbols: γ alone, or the product in parentheses. */
export function quotientSymbol(outer: string, parts: readonly string[]): string {
  return `\\cog{${outer}}{${parts.length === 1 ? parts[0]! : `(${parts.join('')})`}}`;
}

/**
 * The coproduct of Γ as a document: Γ⊗1 (divergent Γ) + 1⊗Γ + Σ n γ⊗Γ/γ, one term per class of
 * pairs with the engine's representative γ; components are numbered γ_1, γ_2, … as first used.
 */
export function coproductDocument(H: HopfAlgebra, bg: BoundGraph): CoproductDocument {
  const a = H.analyze(bg);
  const root = rootLatexGraph(bg);
  const subgraphs: LatexGraph[] = [];
  const indexOfEdges = new Map<string, number>();
  const nameOf = (edges: readonly number[]): number => {
    const key = edges.join(',');
    const hit = indexOfEdges.get(key);
    if (hit !== undefined) return hit;
    const s = a.subgraphs.find((x) => x.edgeList.join(',') === key);
    if (!s) throw new Error(`coproduct component ${key} is not a divergent subgraph`);
    subgraphs.push(subgraphLatexGraph(bg, s, subgraphSymbol(subgraphs.length + 1)));
    indexOfEdges.set(key, subgraphs.length - 1);
    return subgraphs.length - 1;
  };
  const terms: LatexCoproductTerm[] = a.terms.map((t) => {
    const components = t.components.map(nameOf);
    const comps = components.map((i) => subgraphs[i]!);
    const graph = markedContraction(
      bg.theory,
      bg.graph,
      t.components.map((edges, k) => ({ edges, residue: comps[k]!.residue, omega: comps[k]!.omega ?? 0 })),
    );
    const cograph: LatexGraph = {
      symbol: quotientSymbol(ROOT_SYMBOL, comps.map((c) => c.symbol)),
      graph,
      notation: canonicalNotation(H.representative(t.right).graph, { legs: 'unlabelled', defaultField: bg.theory.defaultField }),
      lines: null,
      loops: root.loops - comps.reduce((s, c) => s + c.loops, 0),
      omega: root.omega,
      residue: root.residue,
    };
    return { multiplicity: t.multiplicity, components, cograph };
  });
  return { kind: 'coproduct', theory: bg.theory, root, divergent: a.divergent, subgraphs, admissible: a.admissible.length, terms };
}
