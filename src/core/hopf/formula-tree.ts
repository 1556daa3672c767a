import { LimitError } from '../errors.ts';
import { fullEdgeSet, isSubset, edgeSetOf, type EdgeSet } from '../graph/edge-set.ts';
import type { BoundGraph } from '../theory/bind-graph.ts';
import { omegaOfGraph, residueOfGraph } from '../theory/power-counting.ts';
import { loopNumber } from '../graph/connectivity.ts';
import type { DivergentSubgraph } from '../subgraphs/divergent-subgraphs.ts';
import { admissibleSubgraphs } from './admissible.ts';

/**
 * The counterterm formula tree of the twisted antipode (DESIGN §3):
 *   S_R(γ) = −R[ φ(γ) + Σ_{α ⊂ γ admissible} Π_{c ∈ α} S_R(c) · φ(γ/α) ].
 * One node per divergent subgraph (the graph itself is node 0 when it is divergent… or the root
 * of the comodule coaction when it is not); each node lists its terms, a term naming the child
 * nodes (the components of α) whose counterterms multiply the cograph γ/α. Nodes are shared by
 * all terms that use them, so the tree is stored as a DAG and unfolded on demand.
 */
export interface FormulaNode {
  readonly id: number;
  /** Edge indices of the original graph (all edges for the root). */
  readonly edges: readonly number[];
  readonly edgeSet: EdgeSet;
  readonly loops: number;
  readonly omega: number;
  readonly residue: readonly string[];
  /** The first term has no children: φ(γ) itself. */
  readonly terms: readonly FormulaTerm[];
  /** Index into the proper divergent subgraph list, or −1 for the root. */
  readonly subgraphIndex: number;
}

export interface FormulaTerm {
  /** Node ids of the subtracted components, ascending. */
  readonly children: readonly number[];
}

export interface FormulaTree {
  readonly root: number;
  readonly nodes: readonly FormulaNode[];
  /** Whether the root graph is itself divergent (R applies to it: −R[…]) or not (no outer R). */
  readonly rootDivergent: boolean;
}

/** Builds the formula tree of a graph from its proper divergent subgraphs. */
export function buildFormulaTree(bg: BoundGraph, subgraphs: readonly DivergentSubgraph[], rootDivergent: boolean): FormulaTree {
  const E = bg.graph.edges.length;
  const full = fullEdgeSet(E);
  const nodes: FormulaNode[] = [];
  const order = subgraphs.map((_, i) => i).sort((a, b) => subgraphs[a]!.edgeList.length - subgraphs[b]!.edgeList.length);
  const nodeOfSub = new Map<number, number>();
  const make = (edgeSet: EdgeSet, edges: readonly number[], loops: number, omega: number, residue: readonly string[], subgraphIndex: number) => {
    const inside = order.filter((j) => j !== subgraphIndex && isSubset(subgraphs[j]!.edges, edgeSet) && subgraphs[j]!.edges !== edgeSet);
    const alphas = admissibleSubgraphs(inside.map((j) => subgraphs[j]!));
    const terms: FormulaTerm[] = [{ children: [] }];
    for (const a of alphas) terms.push({ children: a.components.map((c) => nodeOfSub.get(inside[c]!)!).sort((x, y) => x - y) });
    const node: FormulaNode = { id: nodes.length, edges, edgeSet, loops, omega, residue, terms, subgraphIndex };
    nodes.push(node);
    return node.id;
  };
  // Children first, so every term refers to nodes that exist.
  for (const i of order) {
    const s = subgraphs[i]!;
    nodeOfSub.set(i, make(s.edges, s.edgeList, s.loops, s.omega, s.residue, i));
  }
  const root = make(full, bg.graph.edges.map((_, i) => i), loopNumber(bg.graph), omegaOfGraph(bg), residueOfGraph(bg), -1);
  return { root, nodes, rootDivergent };
}

/** Number of unfolded terms below a node: one per forest of subgraphs inside it (itself included). */
export function unfoldedTermCount(tree: FormulaTree, id = tree.root, memo = new Map<number, bigint>()): bigint {
  const hit = memo.get(id);
  if (hit !== undefined) return hit;
  let total = 0n;
  for (const t of tree.nodes[id]!.terms) {
    let p = 1n;
    for (const c of t.children) p *= unfoldedTermCount(tree, c, memo);
    total += p;
  }
  memo.set(id, total);
  return total;
}

/** One term of the unfolded formula: a forest (node ids, root included) and its nested expression. */
export interface ForestTerm {
  readonly forest: readonly number[];
  /** Sign (−1)^(number of R operations). */
  readonly sign: 1 | -1;
  readonly expression: string;
}

/** Text of a node's graph in expressions: G for the root, g<i> for subgraph i (its index in the subgraph list). */
export function nodeName(tree: FormulaTree, id: number): string {
  const n = tree.nodes[id]!;
  return n.subgraphIndex < 0 ? 'G' : `g${n.subgraphIndex}`;
}

const quotient = (tree: FormulaTree, id: number, children: readonly number[]) =>
  children.length === 0 ? nodeName(tree, id) : `${nodeName(tree, id)}/(${children.map((c) => nodeName(tree, c)).join(' ')})`;

/** Unfolds the tree into forest-formula terms, refusing beyond `max` terms. */
export function unfoldFormulaTree(tree: FormulaTree, max = 100_000): ForestTerm[] {
  const count = unfoldedTermCount(tree);
  if (count > BigInt(max)) throw new LimitError('unfolding the counterterm formula', 'maxForestTerms', max, count.toString(), 'raise it with --max-forest-terms, or view the formula as a tree');
  const unfold = (id: number, outerR: boolean): { forest: number[]; r: number; expr: string }[] => {
    const out: { forest: number[]; r: number; expr: string }[] = [];
    for (const t of tree.nodes[id]!.terms) {
      let partial: { forest: number[]; r: number; exprs: string[] }[] = [{ forest: [id], r: outerR ? 1 : 0, exprs: [] }];
      for (const c of t.children) {
        const sub = unfold(c, true);
        partial = partial.flatMap((p) => sub.map((s) => ({ forest: [...p.forest, ...s.forest], r: p.r + s.r, exprs: [...p.exprs, s.expr] })));
      }
      for (const p of partial) {
        const body = [...p.exprs, quotient(tree, id, t.children)].join(' ');
        out.push({ forest: p.forest, r: p.r, expr: outerR ? `-R[${body}]` : body });
      }
    }
    return out;
  };
  return unfold(tree.root, tree.rootDivergent).map((t) => ({ forest: [...t.forest].sort((a, b) => a - b), sign: t.r % 2 === 0 ? 1 : -1, expression: t.expr }));
}

/**
 * The forest formula written directly from a forest (the second route, for the tests and the
 * forest table): each member's children are the members maximal inside it.
 */
export function forestExpression(tree: FormulaTree, forest: readonly number[]): string {
  const members = [...forest];
  const childrenOf = (id: number) => {
    const inside = members.filter((m) => m !== id && isSubset(tree.nodes[m]!.edgeSet, tree.nodes[id]!.edgeSet));
    return inside.filter((m) => !inside.some((o) => o !== m && isSubset(tree.nodes[m]!.edgeSet, tree.nodes[o]!.edgeSet))).sort((a, b) => a - b);
  };
  const expr = (id: number, outerR: boolean): string => {
    const ch = childrenOf(id);
    const body = [...ch.map((c) => expr(c, true)), quotient(tree, id, ch)].join(' ');
    return outerR ? `-R[${body}]` : body;
  };
  return expr(tree.root, tree.rootDivergent);
}

export { edgeSetOf };
