/**
 * The one LaTeX path (STYLE item 8): `toLatex(document, options)` hands the document to its
 * kind's writer, then assembles the blocks for the target — a complete .tex file with TikZ
 * pictures, or one KaTeX-safe display-math fragment.
 */
import { GraphSymbols } from './graph-symbols.ts';
import { katexBody, type LatexBlock } from './latex-blocks.ts';
import { resolveLatexOptions, type LatexDocument, type LatexOptions, type ResolvedLatexOptions } from './latex-document.ts';
import { expandMacros } from './expand-macros.ts';
import { macroDefinitions } from './latex-macros.ts';
import { coproductBlocks } from './write-coproduct.ts';
import { countertermBlocks } from './write-counterterm.ts';
import { fullDocument } from './write-document.ts';

/** The per-kind writers: each turns its document into blocks. */
function blocksOf(doc: LatexDocument, symbols: GraphSymbols, o: ResolvedLatexOptions): LatexBlock[] {
  switch (doc.kind) {
    case 'coproduct':
      return coproductBlocks(doc, symbols, o);
    case 'counterterm':
      return countertermBlocks(doc, symbols, o);
  }
}

export function toLatex(doc: LatexDocument, options: LatexOptions = {}): string {
  const o = resolveLatexOptions(options);
  const symbols = new GraphSymbols(doc.theory, o.graphs === 'pictures');
  const blocks = blocksOf(doc, symbols, o);
  if (o.target === 'katex') {
    const body = katexBody(blocks);
    if (o.macros === 'expanded') return expandMacros(body, o.scheme);
    return o.macros === 'inline' ? `${macroDefinitions(o.scheme).join('\n')}\n${body}` : body;
  }
  return fullDocument(doc, blocks, symbols.declarations(), o);
}
