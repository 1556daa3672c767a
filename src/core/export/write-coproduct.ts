/**
 * The coproduct written out: Δ(Γ) = Γ⊗1 + 1⊗Γ + Σ n γ⊗Γ/γ (the coaction, without Γ⊗1, for a
 * superficially convergent Γ), terms in the engine's order, rows broken by width.
 */
import type { GraphSymbols } from './graph-symbols.ts';
import type { LatexBlock } from './latex-blocks.ts';
import type { CoproductDocument, ResolvedLatexOptions } from './latex-document.ts';
import { atom, equationRows, type Term } from './latex-layout.ts';
import { legendBlock } from './write-legend.ts';

/** The terms of Δ(Γ) as layout terms. */
export function coproductTerms(doc: CoproductDocument, symbols: GraphSymbols): Term[] {
  const root = symbols.atom(doc.root.symbol, () => doc.root.graph);
  const unit = atom('\\unit', 0.6);
  const tp = atom('\\tp', 1.2);
  const terms: Term[] = [];
  const join = (...parts: { tex: string; width: number }[]) => atom(parts.map((p) => p.tex).join(''), parts.reduce((s, p) => s + p.width, 0));
  if (doc.divergent) terms.push({ sign: 1, factors: [join(root, tp, unit)] });
  terms.push({ sign: 1, factors: [join(unit, tp, root)] });
  for (const t of doc.terms) {
    const left = t.components.map((i) => symbols.atom(doc.subgraphs[i]!.symbol, () => doc.subgraphs[i]!.graph));
    const right = symbols.atom(t.cograph.symbol, () => t.cograph.graph);
    const coeff = t.multiplicity === 1 ? [] : [atom(`${t.multiplicity}\\,`, 1)];
    terms.push({ sign: 1, factors: [join(...coeff, ...left, tp, right)] });
  }
  return terms;
}

export function coproductBlocks(doc: CoproductDocument, symbols: GraphSymbols, o: ResolvedLatexOptions): LatexBlock[] {
  const classes = doc.terms.length;
  const note =
    `${doc.admissible} proper admissible subgraph${doc.admissible === 1 ? '' : 's'} in ${classes} class${classes === 1 ? '' : 'es'} of pairs $(\\gamma, \\Gr/\\gamma)$, ` +
    'legs unlabelled; each term names one representative.';
  const formula: LatexBlock = {
    heading: doc.divergent ? 'Coproduct' : 'Coaction (superficially convergent graph: no $\\Gr\\tp\\unit$ term)',
    note,
    rows: equationRows(o.graphs === 'pictures' ? `\\Cop\\Bigl(${symbols.atom(doc.root.symbol, () => doc.root.graph).tex}\\Bigr)` : `\\Cop(${symbols.atom(doc.root.symbol, () => doc.root.graph).tex})`, coproductTerms(doc, symbols), { width: o.lineWidth }),
  };
  const legend = legendBlock([doc.root, ...doc.subgraphs, ...doc.terms.map((t) => t.cograph)], doc.theory, o);
  return [formula, legend];
}
