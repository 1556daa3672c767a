/** Shared setup for the export tests: a graph bound to a built-in theory and its documents. */
import { parseNotation } from '../../../src/core/graph/notation-parse.ts';
import { bindGraph } from '../../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../../src/core/theory/builtin/index.ts';
import type { Graph } from '../../../src/core/graph/types.ts';
import { HopfAlgebra } from '../../../src/core/hopf/hopf-algebra.ts';
import { unlabelledLegsClassifier } from '../../../src/core/hopf/default-classifier.ts';
import { buildFormulaTree } from '../../../src/core/hopf/formula-tree.ts';
import { coproductDocument } from '../../../src/core/export/coproduct-document.ts';
import { countertermDocument } from '../../../src/core/export/counterterm-document.ts';

export function documents(theoryName: string, graph: string | Graph) {
  const theory = builtinTheory(theoryName);
  const bg = bindGraph(typeof graph === 'string' ? parseNotation(graph) : graph, theory);
  const H = new HopfAlgebra(theory, unlabelledLegsClassifier);
  const a = H.analyze(bg);
  const tree = buildFormulaTree(bg, a.subgraphs, a.divergent);
  return { theory, bg, coproduct: coproductDocument(H, bg), counterterm: countertermDocument(H, bg, tree) };
}

/** The two-loop sunset (φ⁴ self-energy) and the three-loop nested vertex graph. */
export const SUNSET = '1-2 1-2 1-2 / 1 2';
export const NESTED = '1-2 1-2 1-3 2-3 3-4 3-4 / 1 2 4 4';
