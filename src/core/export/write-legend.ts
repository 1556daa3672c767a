/**
 * The legend: every graph a formula names, with its compact notation, the lines of Γ it is made
 * of, loop number, ω and residue; in the full document also its picture.
 */
import type { Theory } from '../theory/types.ts';
import { graphTikz } from './graph-tikz.ts';
import type { LatexBlock } from './latex-blocks.ts';
import type { LatexGraph, ResolvedLatexOptions } from './latex-document.ts';
import { latexTypewriter } from './latex-text.ts';

/** A residue as a product of field symbols with powers, e.g. `\phi^{4}`, `A\,\bar{\psi}\,\psi`. */
export function residueLatex(theory: Theory, labels: readonly string[]): string {
  if (labels.length === 0) return '\\text{(none)}';
  const symbolOf = (label: string) => {
    const f = theory.fields.find((x) => x.name === label);
    if (f) return f.latex ?? `\\mathrm{${label.replace(/_/g, '\\_')}}`;
    const anti = theory.fields.find((x) => x.antiparticle === label);
    if (anti) return `\\bar{${anti.latex ?? `\\mathrm{${anti.name.replace(/_/g, '\\_')}}`}}`;
    return `\\mathrm{${label.replace(/_/g, '\\_')}}`;
  };
  const counts = new Map<string, number>();
  for (const l of labels) counts.set(l, (counts.get(l) ?? 0) + 1);
  return [...counts].map(([l, k]) => (k === 1 ? symbolOf(l) : `${symbolOf(l)}^{${k}}`)).join('\\,');
}

const linesText = (g: LatexGraph) => (g.lines ? g.lines.join(',') : '');

/** The legend block for the given graphs (in the order given). */
export function legendBlock(graphs: readonly LatexGraph[], theory: Theory, o: ResolvedLatexOptions): LatexBlock {
  const note = 'Lines are numbered as in the input notation of $\\Gr$.';
  if (o.target === 'katex') {
    const rows = graphs.map((g) =>
      [g.symbol, `\\text{${latexTypewriter(g.notation)}}`, `\\text{${linesText(g)}}`, String(g.loops), g.omega === null ? '' : String(g.omega), residueLatex(theory, g.residue)].join(' & '),
    );
    const head = ['\\text{graph}', '\\text{notation}', '\\text{lines}', 'L', '\\omega', '\\text{residue}'].join(' & ');
    return {
      heading: 'Graphs',
      note,
      array: `\\begin{array}{llllll}\n${head} \\\\ \\hline\n${rows.join(' \\\\\n')}\n\\end{array}`,
    };
  }
  const rows = graphs.map((g) =>
    [`$${g.symbol}$`, graphTikz(g.graph, theory, { scale: 0.5, lineNumbers: g.symbol === '\\Gr', padding: 0.35 }), `\\raggedright ${latexTypewriter(g.notation)}`, linesText(g), String(g.loops), g.omega === null ? '' : String(g.omega), `$${residueLatex(theory, g.residue)}$`].join(' &\n'),
  );
  const raw = [
    '\\begin{longtable}{@{}c c p{4.6cm} l c c l@{}}',
    'graph & picture & notation & lines & $L$ & $\\omega$ & residue \\\\ \\hline\\endhead',
    rows.map((r) => `${r} \\\\[1ex]`).join('\n'),
    '\\end{longtable}',
  ].join('\n');
  return { heading: 'Graphs', note: `${note} In the pictures a crossed circle is a contracted subgraph (a counterterm vertex).`, raw };
}
