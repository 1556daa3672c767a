/**
 * The counterterm of Γ written three ways: nested (−R[…] with the subgraphs' counterterms
 * substituted, one term of the outer subtraction per line), as the formula tree (one equation
 * per divergent subgraph), and optionally as the forest table (forest, sign, term).
 */
import { isSubset } from '../graph/edge-set.ts';
import { unfoldedTermCount, unfoldFormulaTree, type FormulaTree } from '../hopf/formula-tree.ts';
import { quotientSymbol } from './coproduct-document.ts';
import type { GraphSymbols } from './graph-symbols.ts';
import type { LatexBlock } from './latex-blocks.ts';
import type { CountertermDocument, ResolvedLatexOptions } from './latex-document.ts';
import { atom, equationRows, sumTex, type Atom, type Bracket, type Term } from './latex-layout.ts';
import { legendBlock } from './write-legend.ts';

const OP = '\\Rmap';
/** Above this many atoms the nested form is left out (the tree and table still show everything). */
const MAX_NESTED_SIZE = 600;

export function nodeSymbol(doc: CountertermDocument, id: number): string {
  const n = doc.tree.nodes[id]!;
  return n.subgraphIndex < 0 ? doc.root.symbol : doc.subgraphs[n.subgraphIndex]!.symbol;
}

function makeSymbols(doc: CountertermDocument, symbols: GraphSymbols) {
  const graphOf = (id: number) => {
    const n = doc.tree.nodes[id]!;
    return n.subgraphIndex < 0 ? doc.root.graph : doc.subgraphs[n.subgraphIndex]!.graph;
  };
  const node = (id: number): Atom => symbols.atom(nodeSymbol(doc, id), () => graphOf(id));
  const quotient = (id: number, children: readonly number[]): Atom =>
    children.length === 0 ? node(id) : symbols.atom(quotientSymbol(nodeSymbol(doc, id), children.map((c) => nodeSymbol(doc, c))), () => doc.quotient(id, children));
  return { node, quotient };
}

/** The bracket R[X_γ], X_γ = γ + Σ_α (−1)^{|α|} Π_{c∈α} R[X_c] γ/α. */
function nestedBracket(tree: FormulaTree, id: number, sym: ReturnType<typeof makeSymbols>): Bracket {
  return {
    op: OP,
    terms: tree.nodes[id]!.terms.map((t) => ({
      sign: t.children.length % 2 === 0 ? 1 : -1,
      factors: [...t.children.map((c) => nestedBracket(tree, c, sym)), sym.quotient(id, t.children)],
    })),
  };
}

function nestedSize(tree: FormulaTree, id: number, memo = new Map<number, number>()): number {
  const hit = memo.get(id);
  if (hit !== undefined) return hit;
  let s = 0;
  for (const t of tree.nodes[id]!.terms) {
    s += 1;
    for (const c of t.children) s += nestedSize(tree, c, memo);
    if (s > MAX_NESTED_SIZE) break;
  }
  memo.set(id, s);
  return s;
}

/** Nodes in breadth-first order from the root. */
function nodeOrder(tree: FormulaTree): number[] {
  const order = [tree.root];
  const seen = new Set(order);
  for (let k = 0; k < order.length; k++) {
    for (const t of tree.nodes[order[k]!]!.terms) for (const c of t.children) if (!seen.has(c)) {
      seen.add(c);
      order.push(c);
    }
  }
  return order;
}

/** The forest term written from the forest: every member's children are the members maximal inside it. */
function forestFactors(tree: FormulaTree, forest: readonly number[], sym: ReturnType<typeof makeSymbols>): Term[] {
  const childrenOf = (id: number) => {
    const inside = forest.filter((m) => m !== id && isSubset(tree.nodes[m]!.edgeSet, tree.nodes[id]!.edgeSet));
    return inside.filter((m) => !inside.some((o) => o !== m && isSubset(tree.nodes[m]!.edgeSet, tree.nodes[o]!.edgeSet))).sort((a, b) => a - b);
  };
  const inner = (id: number): (Atom | Bracket)[] => {
    const ch = childrenOf(id);
    return [...ch.map((c): Bracket => ({ op: OP, terms: [{ sign: 1, factors: inner(c) }] })), sym.quotient(id, ch)];
  };
  const body = inner(tree.root);
  return [{ sign: 1, factors: tree.rootDivergent ? [{ op: OP, terms: [{ sign: 1, factors: body }] }] : body }];
}

export function countertermBlocks(doc: CountertermDocument, symbols: GraphSymbols, o: ResolvedLatexOptions): LatexBlock[] {
  const { tree } = doc;
  const sym = makeSymbols(doc, symbols);
  const labels = makeSymbols(doc, symbols.labelsOnly());
  
  const blocks: LatexBlock[] = [];
  const boost = o.graphs === 'pictures' ? 2 : 0;
  const paren = (x: string) => (boost ? `\\Bigl(${x}\\Bigr)` : `(${x})`);
  const rootLhs = `${tree.rootDivergent ? '\\Sct' : '\\Rbar'}${paren(sym.node(tree.root).tex)}`;
  const count = unfoldedTermCount(tree);
  const countNote = `${count} forest term${count === 1n ? '' : 's'}, one per forest containing $\\Gr$.`;

  if (nestedSize(tree, tree.root) <= MAX_NESTED_SIZE) {
    const outer = nestedBracket(tree, tree.root, sym);
    const terms: readonly Term[] = tree.rootDivergent ? [{ sign: -1, factors: [outer] }] : outer.terms;
    blocks.push({
      heading: tree.rootDivergent ? 'Counterterm' : 'Subdivergences subtracted (superficially convergent graph: no overall subtraction)',
      note: countNote,
      rows: equationRows(rootLhs, terms, { width: o.lineWidth, forceDepth: tree.rootDivergent ? 1 : 0, boost }),
    });
  } else {
    blocks.push({ heading: 'Counterterm', note: `${countNote} The nested form is too long to write out; see the formula tree.` });
  }

  const rows: string[] = [];
  for (const id of nodeOrder(tree)) {
    const n = tree.nodes[id]!;
    const sum: Term[] = n.terms.map((t) => ({ sign: 1, factors: [...t.children.map((c) => atom(`\\Sct${paren(sym.node(c).tex)}`, 2.2 + sym.node(c).width)), sym.quotient(id, t.children)] }));
    const divergent = id !== tree.root || tree.rootDivergent;
    const lhs = id === tree.root ? rootLhs : `\\Sct${paren(sym.node(id).tex)}`;
    rows.push(...equationRows(lhs, divergent ? [{ sign: -1, factors: [{ op: OP, terms: sum }] }] : sum, { width: o.lineWidth, boost }));
  }
  blocks.push({ heading: 'Formula tree', note: 'One equation per divergent subgraph, each subtracting its own subdivergences.', rows });

  if (o.forestTable) {
    if (count > BigInt(o.maxForestRows)) {
      blocks.push({ heading: 'Forest terms', note: `${count} forest terms: more than the ${o.maxForestRows} the table is limited to.` });
    } else {
      const entries = unfoldFormulaTree(tree, o.maxForestRows).map((t) => ({
        forest: `\\{${t.forest.map((id) => labels.node(id).tex).join(',')}\\}`,
        sign: t.sign > 0 ? '+' : '-',
        term: sumTex(forestFactors(tree, t.forest, labels)),
      }));
      const head = o.target === 'katex' ? '\\text{forest} & \\text{sign} & \\text{term}' : 'forest & sign & term';
      const note = `The sum of the signed terms is ${tree.rootDivergent ? '$\\Sct(\\Gr)$' : '$\\Rbar(\\Gr)$'}.`;
      if (o.target === 'katex') {
        blocks.push({ heading: 'Forest terms', note, array: `\\begin{array}{lcl}\n${head} \\\\ \\hline\n${entries.map((e) => `${e.forest} & ${e.sign} & ${e.term}`).join(' \\\\\n')}\n\\end{array}` });
      } else {
        const body = entries.map((e) => `$${e.forest}$ & $${e.sign}$ & $${e.term}$ \\\\`).join('\n');
        blocks.push({ heading: 'Forest terms', note, raw: `\\begin{longtable}{@{}l c l@{}}\n${head} \\\\ \\hline\\endhead\n${body}\n\\end{longtable}` });
      }
    }
  }
  blocks.push(legendBlock([doc.root, ...doc.subgraphs], doc.theory, o));
  return blocks;
}
