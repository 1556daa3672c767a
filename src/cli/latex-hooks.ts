import type { FormulaTree } from '../core/hopf/formula-tree.ts';
import type { HopfAlgebra } from '../core/hopf/hopf-algebra.ts';
import type { BoundGraph } from '../core/theory/bind-graph.ts';
import { InputError } from '../core/errors.ts';

/** LaTeX writers for the Hopf-algebra commands; the export module installs the real ones. */
export const latexHooks: {
  coproduct: (H: HopfAlgebra, bg: BoundGraph) => string;
  counterterm: (H: HopfAlgebra, bg: BoundGraph, tree: FormulaTree) => string;
} = {
  coproduct: () => {
    throw new InputError('LaTeX output of the coproduct is not available in this build');
  },
  counterterm: () => {
    throw new InputError('LaTeX output of the counterterm is not available in this build');
  },
};
