/**
 * The structure workbench's jobs: everything the panels show about one graph's
 * renormalization (power counting, divergent subgraphs and overlaps, the coproduct, the
 * counterterm formula tree and the marked counterterm diagrams), pages of its forests, and
 * its LaTeX. Results are plain data (pictures as SVG strings, formulas as KaTeX-safe TeX,
 * counts beyond 2^53 − 1 as decimal strings) so they cross the worker boundary unchanged.
 *
 * Forests: the stepper walks the forests of the proper divergent subgraphs (the empty forest
 * first). Adding Γ to each gives the forests of the BPHZ forest formula, one per unfolded term
 * of the formula tree, so the count shown is the "proper" count of `coppice inspect`.
 */
import { canonicalNotation } from '../canon/canonical-form.ts';
import { symmetryFactor } from '../canon/symmetry-factor.ts';
import { LimitError } from '../errors.ts';
import { coproductDocument, quotientSymbol } from '../export/coproduct-document.ts';
import { countertermDocument } from '../export/counterterm-document.ts';
import { graphSvg } from '../export/graph-svg.ts';
import { markedContraction, ROOT_SYMBOL, subgraphSymbol } from '../export/latex-graphs.ts';
import { toLatex } from '../export/to-latex.ts';
import { subgraphAsGraph } from '../graph/extract-subgraph.ts';
import { parseNotation } from '../graph/notation-parse.ts';
import { printNotation } from '../graph/notation-print.ts';
import type { Graph } from '../graph/types.ts';
import { countertermDiagrams } from '../hopf/counterterm-diagrams.ts';
import { unlabelledLegsClassifier } from '../hopf/default-classifier.ts';
import { buildFormulaTree, forestExpression, unfoldedTermCount, type FormulaTree } from '../hopf/formula-tree.ts';
import { HopfAlgebra, type GraphAnalysis } from '../hopf/hopf-algebra.ts';
import { forestToRootedTree, loopWeightedTreeFactorial, treeFactorial, type RootedTree } from '../hopf/rooted-tree.ts';
import { graphReportToJSON, inspectGraph, jsonCount } from '../inspect/graph-report.ts';
import { areCompatible } from '../subgraphs/compatibility.ts';
import { countMaximalForests } from '../subgraphs/count-forests.ts';
import type { DivergentSubgraph } from '../subgraphs/divergent-subgraphs.ts';
import { bindGraph, type BoundGraph } from '../theory/bind-graph.ts';
import { parseTheory } from '../theory/parse-theory.ts';
import type { Theory } from '../theory/types.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';

// ——— requests ———

export interface StructureJob {
  readonly kind: 'structure';
  readonly theory: Theory;
  readonly notation: string;
}

export type ForestSelection = 'all' | 'maximal';

export interface ForestPageJob {
  readonly kind: 'forest-page';
  readonly theory: Theory;
  readonly notation: string;
  readonly which: ForestSelection;
  /** Position of the first forest of the page (0-based) in the enumeration order. */
  readonly offset: number;
  readonly limit: number;
}

export type LatexSelection = 'coproduct' | 'counterterm';

export interface LatexJob {
  readonly kind: 'latex';
  readonly theory: Theory;
  readonly notation: string;
  readonly document: LatexSelection;
  /** `katex`: a fragment for the preview; `document`: a complete .tex file with TikZ pictures. */
  readonly target: 'katex' | 'document';
}

// ——— results ———

export type Count = number | string;

/** A graph the panels draw: its TeX symbol, notation and picture. */
export interface PictureInfo {
  readonly symbol: string;
  readonly notation: string;
  readonly svg: string;
}

export interface SubgraphInfo extends PictureInfo {
  /** Edge indices of Γ, ascending. */
  readonly edges: readonly number[];
  readonly loops: number;
  readonly omega: number;
  readonly residue: readonly string[];
  /** Indices of the subgraphs it overlaps (shares lines or vertices with, neither inside the other). */
  readonly overlaps: readonly number[];
  /** Indices of the subgraphs strictly inside it. */
  readonly contains: readonly number[];
}

export interface CoproductTermInfo {
  readonly multiplicity: number;
  /** Subgraph indices of γ's components (a representative of the class). */
  readonly components: readonly number[];
  readonly cograph: PictureInfo;
}

export interface FormulaNodeInfo {
  readonly id: number;
  /** −1 for Γ. */
  readonly subgraphIndex: number;
  readonly symbol: string;
  readonly edges: readonly number[];
  readonly loops: number;
  readonly omega: number;
  readonly residue: readonly string[];
  /** Each term subtracts the counterterms of its children (node ids) from the cograph; the first has none. */
  readonly terms: readonly { readonly children: readonly number[]; readonly cographSymbol: string }[];
  /** Forest terms below this node (itself included). */
  readonly termCount: Count;
}

export interface CountertermDiagramInfo {
  readonly notation: string;
  readonly svg: string;
  readonly symmetryFactor: Count;
  readonly multiplicity: number;
  readonly insertions: readonly { readonly residue: readonly string[]; readonly structure: string; readonly loops: number }[];
  /** Subgraph indices of a representative γ. */
  readonly components: readonly number[];
}

export interface StructureResult {
  readonly kind: 'structure';
  readonly loops: number;
  readonly omega: number;
  readonly residue: readonly string[];
  readonly onePI: boolean;
  readonly divergent: boolean;
  readonly symmetryFactor: Count;
  readonly canonical: string;
  readonly warnings: readonly string[];
  readonly root: PictureInfo;
  readonly subgraphs: readonly SubgraphInfo[];
  readonly overlapping: readonly (readonly [number, number])[];
  readonly forests: { readonly proper: Count; readonly maximal: Count };
  readonly coproduct: { readonly divergent: boolean; readonly admissible: number; readonly terms: readonly CoproductTermInfo[] };
  readonly tree: { readonly root: number; readonly rootDivergent: boolean; readonly termCount: Count; readonly nodes: readonly FormulaNodeInfo[] };
  readonly diagrams: readonly CountertermDiagramInfo[];
}

export interface RootedTreeInfo {
  /** Subgraph index, −1 for Γ. */
  readonly subgraph: number;
  readonly loops: number;
  readonly children: readonly RootedTreeInfo[];
}

export interface WalkStep {
  /** TeX of the cograph, e.g. `\cog{\Gr}{(\sg{1}\sg{3})}`. */
  readonly symbol: string;
  /** Subgraph contracted at this step (−1 for the first step, Γ itself). */
  readonly contracted: number;
  readonly notation: string;
  readonly svg: string;
}

export interface ForestInfo {
  /** Position in the enumeration (0-based). */
  readonly index: number;
  /** Subgraph indices, ascending. */
  readonly members: readonly number[];
  /** (−1)^(number of R operations). */
  readonly sign: 1 | -1;
  /** The forest-formula term in the engine's text form (`-R[g0 G/(g0)]`). */
  readonly expression: string;
  /** The same term, KaTeX-safe (the export module's macros). */
  readonly tex: string;
  readonly rootedTree: RootedTreeInfo;
  readonly treeFactorial: Count;
  readonly loopTreeFactorial: Count;
  /** Γ → Γ/γ₁ → … contracting the members innermost first. */
  readonly walk: readonly WalkStep[];
}

export interface ForestPageResult {
  readonly kind: 'forest-page';
  readonly which: ForestSelection;
  readonly total: Count;
  readonly offset: number;
  readonly forests: readonly ForestInfo[];
}

export interface LatexResult {
  readonly kind: 'latex';
  readonly document: LatexSelection;
  readonly target: 'katex' | 'document';
  readonly text: string;
  /** Pictures of the graphs the fragment names, symbol by symbol (preview only). */
  readonly pictures: readonly PictureInfo[];
}

// ——— the analysis, memoized for the last graph (pages and LaTeX reuse it) ———

interface Analysis {
  readonly key: string;
  readonly bg: BoundGraph;
  readonly H: HopfAlgebra;
  readonly a: GraphAnalysis;
  readonly tree: FormulaTree;
  /** Formula-tree node id of each subgraph. */
  readonly nodeOf: readonly number[];
}

let last: Analysis | null = null;

function analysisOf(theorySpec: Theory, notation: string): Analysis {
  const key = `${JSON.stringify(theorySpec)}\n${notation}`;
  if (last?.key === key) return last;
  const theory = parseTheory(theorySpec, `theory ${theorySpec.name}`);
  const bg = bindGraph(parseNotation(notation), theory);
  const H = new HopfAlgebra(theory, unlabelledLegsClassifier);
  const a = H.analyze(bg);
  const tree = buildFormulaTree(bg, a.subgraphs, a.divergent);
  const nodeOf: number[] = [];
  for (const n of tree.nodes) if (n.subgraphIndex >= 0) nodeOf[n.subgraphIndex] = n.id;
  last = { key, bg, H, a, tree, nodeOf };
  return last;
}

const svgOf = (g: Graph, theory: Theory, title: string, lineNumbers = false) => graphSvg(g, theory, { unit: 22, title, lineNumbers });

function nodeSymbol(tree: FormulaTree, id: number): string {
  const s = tree.nodes[id]!.subgraphIndex;
  return s < 0 ? ROOT_SYMBOL : subgraphSymbol(s + 1);
}

export function runStructure(req: StructureJob, cancel: CancelToken = neverCancel, progress?: (fraction: number, stage: string) => void): StructureResult {
  progress?.(0, 'divergent subgraphs');
  const { bg, H, a, tree } = analysisOf(req.theory, req.notation);
  const theory = bg.theory;
  const report = inspectGraph(bg, { cancel });
  const json = graphReportToJSON(report) as { forests: { proper: Count; maximal: Count } };
  // The report and the algebra list the same proper subgraphs in the same order.
  const same = report.divergentSubgraphs.length === a.subgraphs.length && report.divergentSubgraphs.every((s, i) => s.edges === a.subgraphs[i]!.edges);
  if (!same) throw new Error('the report and the Hopf algebra disagree on the divergent subgraphs');
  cancel.throwIfCancelled();
  progress?.(0.3, 'coproduct');
  const subs = a.subgraphs;
  const subgraphs: SubgraphInfo[] = subs.map((s, i) => {
    const g = subgraphAsGraph(bg.graph, s.edgeList).graph;
    const symbol = subgraphSymbol(i + 1);
    const overlaps: number[] = [];
    const contains: number[] = [];
    subs.forEach((o, j) => {
      if (j === i) return;
      if (!areCompatible(s, o)) overlaps.push(j);
      else if ((o.edges & s.edges) === o.edges && o.edges !== s.edges) contains.push(j);
    });
    const notation = canonicalNotation(g, { legs: 'unlabelled', defaultField: theory.defaultField });
    return { symbol, notation, svg: svgOf(g, theory, notation), edges: [...s.edgeList], loops: s.loops, omega: s.omega, residue: [...s.residue], overlaps, contains };
  });
  const indexOfEdges = new Map(subs.map((s, i) => [s.edgeList.join(','), i]));
  const terms: CoproductTermInfo[] = a.terms.map((t) => {
    const components = t.components.map((c) => indexOfEdges.get(c.join(','))!);
    const graph = markedContraction(theory, bg.graph, components.map((i) => ({ edges: subs[i]!.edgeList, residue: subs[i]!.residue, omega: subs[i]!.omega })));
    const notation = canonicalNotation(H.representative(t.right).graph, { legs: 'unlabelled', defaultField: theory.defaultField });
    return { multiplicity: t.multiplicity, components, cograph: { symbol: quotientSymbol(ROOT_SYMBOL, components.map((i) => subgraphSymbol(i + 1))), notation, svg: svgOf(graph, theory, notation) } };
  });
  cancel.throwIfCancelled();
  progress?.(0.6, 'formula tree and counterterm diagrams');
  const memo = new Map<number, bigint>();
  const nodes: FormulaNodeInfo[] = tree.nodes.map((n) => ({
    id: n.id,
    subgraphIndex: n.subgraphIndex,
    symbol: nodeSymbol(tree, n.id),
    edges: [...n.edges],
    loops: n.loops,
    omega: n.omega,
    residue: [...n.residue],
    terms: n.terms.map((t) => ({ children: [...t.children], cographSymbol: t.children.length ? quotientSymbol(nodeSymbol(tree, n.id), t.children.map((c) => nodeSymbol(tree, c))) : nodeSymbol(tree, n.id) })),
    termCount: jsonCount(unfoldedTermCount(tree, n.id, memo)),
  }));
  const diagrams: CountertermDiagramInfo[] = countertermDiagrams(bg, subs, a.admissible).map((d) => {
    const components = d.components.map((c) => indexOfEdges.get(c.join(','))!);
    const marked = markedContraction(theory, bg.graph, components.map((i) => ({ edges: subs[i]!.edgeList, residue: subs[i]!.residue, omega: subs[i]!.omega })));
    return {
      notation: d.notation,
      svg: svgOf(marked, theory, d.notation),
      symmetryFactor: jsonCount(d.symmetryFactor),
      multiplicity: d.multiplicity,
      insertions: d.insertions.map((x) => ({ residue: [...x.residue], structure: x.structure, loops: x.loops })),
      components,
    };
  });
  const notation = printNotation(bg.graph, { defaultField: theory.defaultField });
  progress?.(1, 'done');
  return {
    kind: 'structure',
    loops: report.loops,
    omega: report.omega,
    residue: [...report.residue],
    onePI: report.onePI,
    divergent: report.divergent,
    symmetryFactor: jsonCount(symmetryFactor(bg.graph)),
    canonical: canonicalNotation(bg.graph, { defaultField: theory.defaultField }),
    warnings: [...report.warnings],
    root: { symbol: ROOT_SYMBOL, notation, svg: svgOf(bg.graph, theory, notation, true) },
    subgraphs,
    overlapping: report.overlapping.map(([i, j]) => [i, j] as const),
    forests: json.forests,
    coproduct: { divergent: a.divergent, admissible: a.admissible.length, terms },
    tree: { root: tree.root, rootDivergent: tree.rootDivergent, termCount: jsonCount(unfoldedTermCount(tree, tree.root, memo)), nodes },
    diagrams,
  };
}

// ——— forests ———

/** Forests of `subs` in the order of `listForests` (the empty forest first), lazily. */
export function* forestsInOrder(subs: readonly DivergentSubgraph[], cancel: CancelToken = neverCancel): Generator<number[]> {
  const current: number[] = [];
  let steps = 0;
  function* rec(from: number): Generator<number[]> {
    yield [...current];
    if ((++steps & 0xfff) === 0) cancel.throwIfCancelled();
    for (let k = from; k < subs.length; k++) {
      if (current.every((j) => areCompatible(subs[j]!, subs[k]!))) {
        current.push(k);
        yield* rec(k + 1);
        current.pop();
      }
    }
  }
  yield* rec(0);
}

/** A forest to which no further subgraph can be added. */
export function isMaximalForest(subs: readonly DivergentSubgraph[], members: readonly number[]): boolean {
  const inside = new Set(members);
  for (let k = 0; k < subs.length; k++) if (!inside.has(k) && members.every((j) => areCompatible(subs[j]!, subs[k]!))) return false;
  return true;
}

/** The forest-formula term of a forest as TeX: (−1)^{|F|} R[… R[γ] … Γ/(…)]. */
export function forestTermTex(tree: FormulaTree, forest: readonly number[]): string {
  const childrenOf = (id: number) => {
    const n = tree.nodes[id]!;
    const inside = forest.filter((m) => m !== id && (tree.nodes[m]!.edgeSet & n.edgeSet) === tree.nodes[m]!.edgeSet);
    return inside.filter((m) => !inside.some((o) => o !== m && (tree.nodes[m]!.edgeSet & tree.nodes[o]!.edgeSet) === tree.nodes[m]!.edgeSet)).sort((x, y) => x - y);
  };
  let rs = 0;
  const body = (id: number): string => {
    const ch = childrenOf(id);
    const q = ch.length ? quotientSymbol(nodeSymbol(tree, id), ch.map((c) => nodeSymbol(tree, c))) : nodeSymbol(tree, id);
    return [...ch.map((c) => (rs++, `\\Rmap\\bigl[${body(c)}\\bigr]`)), q].join('\\,');
  };
  let tex = body(tree.root);
  if (tree.rootDivergent) {
    rs++;
    tex = `\\Rmap\\Bigl[${tex}\\Bigr]`;
  }
  return `${rs % 2 === 0 ? '+' : '-'}\\,${tex}`;
}

function rootedInfo(tree: FormulaTree, t: RootedTree): RootedTreeInfo {
  return { subgraph: tree.nodes[t.node]!.subgraphIndex, loops: t.loops, children: t.children.map((c) => rootedInfo(tree, c)) };
}

function forestInfo(an: Analysis, index: number, members: readonly number[]): ForestInfo {
  const { bg, a, tree, nodeOf } = an;
  const theory = bg.theory;
  const forest = [tree.root, ...members.map((m) => nodeOf[m]!)].sort((x, y) => x - y);
  const expression = forestExpression(tree, forest);
  const rooted = forestToRootedTree(tree, forest);
  const rCount = (expression.match(/R\[/g) ?? []).length;
  // Innermost first: a member comes after every member inside it.
  const order = [...members].sort((x, y) => a.subgraphs[x]!.edgeList.length - a.subgraphs[y]!.edgeList.length || x - y);
  const walk: WalkStep[] = [{ symbol: ROOT_SYMBOL, contracted: -1, notation: printNotation(bg.graph, { defaultField: theory.defaultField }), svg: svgOf(bg.graph, theory, 'Γ') }];
  for (let k = 1; k <= order.length; k++) {
    const done = order.slice(0, k);
    const outer = done.filter((m) => !done.some((o) => o !== m && (a.subgraphs[m]!.edges & a.subgraphs[o]!.edges) === a.subgraphs[m]!.edges));
    const g = markedContraction(theory, bg.graph, outer.map((m) => ({ edges: a.subgraphs[m]!.edgeList, residue: a.subgraphs[m]!.residue, omega: a.subgraphs[m]!.omega })));
    const notation = canonicalNotation(g, { legs: 'unlabelled', defaultField: theory.defaultField });
    walk.push({ symbol: quotientSymbol(ROOT_SYMBOL, outer.map((m) => subgraphSymbol(m + 1))), contracted: order[k - 1]!, notation, svg: svgOf(g, theory, notation) });
  }
  return {
    index,
    members: [...members],
    sign: rCount % 2 === 0 ? 1 : -1,
    expression,
    tex: forestTermTex(tree, forest),
    rootedTree: rootedInfo(tree, rooted),
    treeFactorial: jsonCount(treeFactorial(rooted)),
    loopTreeFactorial: jsonCount(loopWeightedTreeFactorial(rooted)),
    walk,
  };
}

/** Largest page the worker ships at once. */
export const MAX_FOREST_PAGE = 200;

export function runForestPage(req: ForestPageJob, cancel: CancelToken = neverCancel): ForestPageResult {
  const an = analysisOf(req.theory, req.notation);
  const subs = an.a.subgraphs;
  const limit = Math.max(0, Math.min(MAX_FOREST_PAGE, Math.floor(req.limit)));
  const offset = Math.max(0, Math.floor(req.offset));
  const total = req.which === 'all' ? inspectCount(an) : countMaximalForests(subs, { cancel });
  const forests: ForestInfo[] = [];
  let k = 0;
  for (const f of forestsInOrder(subs, cancel)) {
    if (req.which === 'maximal' && !isMaximalForest(subs, f)) continue;
    if (k >= offset) forests.push(forestInfo(an, k, f));
    k++;
    if (forests.length >= limit) break;
    if (k > 5_000_000) throw new LimitError('paging forests', 'offset', 5_000_000, String(offset), 'step through fewer forests, or choose the maximal ones');
  }
  return { kind: 'forest-page', which: req.which, total: jsonCount(total), offset, forests };
}

function inspectCount(an: Analysis): bigint {
  return unfoldedTermCount(an.tree);
}

export function runLatex(req: LatexJob): LatexResult {
  const an = analysisOf(req.theory, req.notation);
  const { bg, H, tree } = an;
  const doc = req.document === 'coproduct' ? coproductDocument(H, bg) : countertermDocument(H, bg, tree);
  const text = toLatex(doc, req.target === 'katex' ? { target: 'katex', inlineMacros: false, maxForestRows: 60 } : { target: 'document', graphs: 'pictures' });
  if (req.target === 'document') return { kind: 'latex', document: req.document, target: req.target, text, pictures: [] };
  const graphs = doc.kind === 'coproduct' ? [doc.root, ...doc.subgraphs, ...doc.terms.map((t) => t.cograph)] : [doc.root, ...doc.subgraphs];
  const pictures = graphs.map((g) => ({ symbol: g.symbol, notation: g.notation, svg: svgOf(g.graph, bg.theory, g.notation, g.symbol === ROOT_SYMBOL) }));
  return { kind: 'latex', document: req.document, target: req.target, text, pictures };
}
