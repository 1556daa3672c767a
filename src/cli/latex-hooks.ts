import type { FormulaTree } from '../core/hopf/formula-tree.ts';
import type { HopfAlgebra } from '../core/hopf/hopf-algebra.ts';
import type { BoundGraph } from '../core/theory/bind-graph.ts';
import { coproductDocument } from '../core/export/coproduct-document.ts';
import { countertermDocument } from '../core/export/counterterm-document.ts';
import { toLatex } from '../core/export/to-latex.ts';
import pkg from '../../package.json' with { type: 'json' };

/** LaTeX writers for the Hopf-algebra commands: complete .tex documents with TikZ pictures. */
export const latexHooks: {
  coproduct: (H: HopfAlgebra, bg: BoundGraph) => string;
  counterterm: (H: HopfAlgebra, bg: BoundGraph, tree: FormulaTree) => string;
} = {
  coproduct: (H, bg) => toLatex(coproductDocument(H, bg), { version: pkg.version }).trimEnd(),
  counterterm: (H, bg, tree) => toLatex(countertermDocument(H, bg, tree), { version: pkg.version, scheme: 'symbolic' }).trimEnd(),
};
