/**
 * What `toLatex` writes: documents of a few kinds, each holding the engine's results and the
 * graphs they name. Builders (`coproductDocument`, `countertermDocument`) make them from the
 * Hopf algebra; `toLatex` turns any of them into a full .tex file or a KaTeX-safe fragment.
 */
import type { Graph } from '../graph/types.ts';
import type { FormulaTree } from '../hopf/formula-tree.ts';
import type { Theory } from '../theory/types.ts';
import type { LatexScheme } from './latex-macros.ts';

/** A graph the formulas name, with what the legend says about it. */
export interface LatexGraph {
  /** Its symbol in formulas, e.g. `\Gr`, `\sg{2}`, `\cog{\Gr}{\sg{1}}`. */
  readonly symbol: string;
  /** The graph itself (fields resolved); contracted vertices carry a counterterm mark. */
  readonly graph: Graph;
  /** Compact notation shown in the legend. */
  readonly notation: string;
  /** Line numbers (1-based, input order of Γ) it is made of; null for a cograph. */
  readonly lines: readonly number[] | null;
  readonly loops: number;
  /** Superficial degree of divergence ω; null when not computed. */
  readonly omega: number | null;
  /** Half-edge labels of its residue (external legs), sorted. */
  readonly residue: readonly string[];
}

/** One collected term n·γ⊗Γ/γ. */
export interface LatexCoproductTerm {
  readonly multiplicity: number;
  /** Indices into the document's `subgraphs`: the components of γ. */
  readonly components: readonly number[];
  readonly cograph: LatexGraph;
}

export interface CoproductDocument {
  readonly kind: 'coproduct';
  readonly theory: Theory;
  readonly root: LatexGraph;
  /** Divergent: Δ has the Γ⊗1 term; otherwise the coaction. */
  readonly divergent: boolean;
  /** The components named in the terms, numbered γ_1, γ_2, … in order of first use. */
  readonly subgraphs: readonly LatexGraph[];
  readonly admissible: number;
  readonly terms: readonly LatexCoproductTerm[];
}

export interface CountertermDocument {
  readonly kind: 'counterterm';
  readonly theory: Theory;
  readonly root: LatexGraph;
  /** The proper divergent subgraphs; subgraph i is γ_{i+1}. */
  readonly subgraphs: readonly LatexGraph[];
  readonly tree: FormulaTree;
  /** The cograph γ/α of a formula node and a set of its children (for pictures). */
  readonly quotient: (node: number, children: readonly number[]) => Graph;
}

export type LatexDocument = CoproductDocument | CountertermDocument;

export interface LatexOptions {
  /** `document` (default): a complete .tex file with TikZ pictures; `katex`: one display-math fragment KaTeX can parse. */
  readonly target?: 'document' | 'katex';
  /** Graphs in formulas as symbols with a legend (default), or as inline pictures (document target only). */
  readonly graphs?: 'labels' | 'pictures';
  /** Include the per-forest table (counterterm; default true). */
  readonly forestTable?: boolean;
  /** Largest number of forest-table rows (default 200); beyond it the table is left out with a note. */
  readonly maxForestRows?: number;
  /** The renormalization map written in the formulas (default `symbolic`). */
  readonly scheme?: LatexScheme;
  /** Line width budget in em-like units before a formula line is broken (default 44). */
  readonly lineWidth?: number;
  /**
   * KaTeX fragment: `inline` (default) starts with the `\providecommand` lines; `external` leaves
   * the definitions to KaTeX's `macros` option (`katexMacros`); `expanded` writes every macro out.
   * Large formulas need KaTeX's `maxExpand` raised unless expanded.
   */
  readonly macros?: 'inline' | 'external' | 'expanded';
  /** Older spelling of `macros`: true is `inline`, false is `external` (`macros` wins when both are given). */
  readonly inlineMacros?: boolean;
  /** Recorded in the document's header. */
  readonly version?: string;
}

/** Options with their defaults filled in. */
export interface ResolvedLatexOptions {
  readonly target: 'document' | 'katex';
  readonly graphs: 'labels' | 'pictures';
  readonly forestTable: boolean;
  readonly maxForestRows: number;
  readonly scheme: LatexScheme;
  readonly lineWidth: number;
  readonly macros: 'inline' | 'external' | 'expanded';
  readonly version: string;
}

export function resolveLatexOptions(o: LatexOptions = {}): ResolvedLatexOptions {
  const target = o.target ?? 'document';
  return {
    target,
    graphs: target === 'katex' ? 'labels' : (o.graphs ?? 'labels'),
    forestTable: o.forestTable ?? true,
    maxForestRows: o.maxForestRows ?? 200,
    scheme: o.scheme ?? 'symbolic',
    lineWidth: o.lineWidth ?? 44,
    macros: o.macros ?? (o.inlineMacros === false ? 'external' : 'inline'),
    version: o.version ?? 'unknown',
  };
}
