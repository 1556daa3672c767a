/**
 * The complete .tex file: a comment header and a small visible table recording the Coppice
 * version, theory, scheme and conventions; the macros (\providecommand, so they can be
 * redefined); TikZ and its styles; then the blocks.
 */
import type { Conventions, Theory } from '../theory/types.ts';
import { tikzLibraries, tikzStyles } from './graph-tikz.ts';
import { documentBody, type LatexBlock } from './latex-blocks.ts';
import type { LatexDocument, ResolvedLatexOptions } from './latex-document.ts';
import { latexMacros, macroDefinitions, type LatexScheme } from './latex-macros.ts';
import { latexComment, latexText, latexTypewriter } from './latex-text.ts';

export function schemeText(s: LatexScheme): string {
  return s === 'symbolic' ? 'R symbolic (a renormalization map R, not evaluated)' : 'MS-bar pole part K (minimal subtraction of the poles in eps)';
}

/** The conventions as (name, value) pairs, in the order of the Conventions type. */
export function conventionEntries(c: Conventions): [string, string][] {
  return [
    ['dimension', c.dimension === 'D0-2eps' ? 'D = D0 - 2 eps' : 'D = D0 - eps'],
    ['vertex sign', c.vertexSign < 0 ? '-(coupling x tensor) per vertex' : '+(coupling x tensor) per vertex'],
    ['fermion loop sign', String(c.fermionLoopSign)],
    ['loop measure', c.loopMeasure],
    ['coupling rescaling', c.couplingRescaling],
    ['Z definitions', c.zDefinitions.join('; ')],
    ['gamma_phi', c.gammaPhiHalf ? '(1/2) mu d ln Z_phi / d mu' : 'mu d ln Z_phi / d mu'],
    ['beta', c.betaSign > 0 ? 'mu dg/dmu' : '-mu dg/dmu'],
  ];
}

const kindText = (doc: LatexDocument) => (doc.kind === 'coproduct' ? 'coproduct' : 'counterterm formula');

function recordEntries(doc: LatexDocument, theory: Theory, o: ResolvedLatexOptions): [string, string][] {
  return [
    ['written by', `Coppice ${o.version}`],
    ['content', `${kindText(doc)} of ${doc.root.notation}`],
    ['theory', `${theory.name} (${theory.title}), D0 = ${theory.dimension}`],
    ['scheme', schemeText(o.scheme)],
    ...conventionEntries(theory.conventions).map(([k, v]): [string, string] => [`convention: ${k}`, v]),
  ];
}

/** The preamble every exported document shares: article, amsmath, longtable, TikZ with our line styles. */
export function documentPreamble(extra: readonly string[] = []): string[] {
  return [
    '\\documentclass[10pt]{article}',
    '\\usepackage[margin=2cm]{geometry}',
    '\\usepackage{amsmath}',
    '\\usepackage{amssymb}',
    '\\usepackage{longtable}',
    '\\usepackage{tikz}',
    `\\usetikzlibrary{${tikzLibraries.join(',')}}`,
    '\\allowdisplaybreaks',
    tikzStyles(),
    ...extra,
  ];
}

/** The visible record of what a document was made from (version, theory, scheme, conventions). */
export function recordTable(rows: readonly (readonly [string, string])[], width: string): string {
  return [
    '\\begin{center}\\small',
    `\\begin{tabular}{@{}l p{${width}}@{}}`,
    ...rows.map(([k, v]) => `${latexText(k)} & ${k.startsWith('convention') ? latexTypewriter(v) : latexText(v)} \\\\`),
    '\\end{tabular}',
    '\\end{center}',
  ].join('\n');
}

export function fullDocument(doc: LatexDocument, blocks: readonly LatexBlock[], boxes: string, o: ResolvedLatexOptions): string {
  const theory = doc.theory;
  const record = recordEntries(doc, theory, o);
  const header = [...record.map(([k, v]) => latexComment(`${k}: ${v}`)), latexComment('Macros (edit the \\providecommand lines, or define them earlier, to change how formulas look):')];
  for (const m of latexMacros()) header.push(latexComment(`  ${m.name}${m.args ? `[${m.args}]` : ''}  ${m.meaning}`));
  const table = recordTable(record, '10cm');
  const title = doc.kind === 'coproduct' ? 'Coproduct of a Feynman graph' : 'Counterterm of a Feynman graph';
  return [
    ...header,
    ...documentPreamble(macroDefinitions(o.scheme)),
    '\\begin{document}',
    `\\section*{${title}}`,
    table,
    ...(boxes ? [boxes] : []),
    '',
    documentBody(blocks),
    '\\end{document}',
    '',
  ].join('\n');
}
