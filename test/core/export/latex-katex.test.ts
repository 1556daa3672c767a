/**
 * Every KaTeX-safe fragment parses with KaTeX (REFERENCES.md, "LaTeX": "Exported LaTeX must
 * parse with KaTeX (npm katex)"), on seeded random graphs of every built-in theory, with the
 * macros inline (\providecommand) and passed through KaTeX's `macros` option; a user's own
 * definition of a macro wins over ours. The SVG pictures use the same layout.
 */
import katex from 'katex';
import { describe, expect, it } from 'vitest';
import { toLatex } from '../../../src/core/export/to-latex.ts';
import { katexMacros } from '../../../src/core/export/latex-macros.ts';
import { graphSvg } from '../../../src/core/export/graph-svg.ts';
import { builtinTheoryNames } from '../../../src/core/theory/builtin/index.ts';
import { randomTheoryGraph, rng } from '../../helpers/random-graphs.ts';
import { documents, NESTED } from './export-fixtures.ts';

// Macro definitions count against KaTeX's expansion limit (1000 by default), which large
// formulas pass; the preview raises it, or takes the fragment with the macros expanded.
const render = (tex: string, macros: Record<string, string> = {}, maxExpand = 1_000_000) =>
  katex.renderToString(tex, { displayMode: true, throwOnError: true, strict: 'ignore', macros: { ...macros }, maxExpand });
/** KaTeX's HTML without the MathML annotation (which repeats the source). */
const visible = (html: string) => html.replace(/<annotation[^>]*>[\s\S]*?<\/annotation>/g, '');

describe('KaTeX parses every fragment', () => {
  for (const name of builtinTheoryNames()) {
    it(`random graphs of ${name}: coproduct and counterterm, macros inline and as KaTeX macros`, () => {
      const random = rng(4000 + name.length * 17);
      let checked = 0;
      for (let k = 0; k < 12; k++) {
        const g = randomTheoryGraph(name, random, { vertices: 2 + Math.floor(random() * 4), legProbability: 0.2, maxEdges: 9 });
        const d = documents(name, g);
        for (const doc of [d.coproduct, d.counterterm]) {
          expect(() => render(toLatex(doc, { target: 'katex' }))).not.toThrow();
          expect(() => render(toLatex(doc, { target: 'katex', macros: 'external' }), katexMacros('symbolic'))).not.toThrow();
          expect(() => render(toLatex(doc, { target: 'katex', macros: 'expanded' }))).not.toThrow();
          checked++;
        }
      }
      expect(checked).toBe(24);
    });
  }

  it('the pole-part scheme and narrow lines parse too', () => {
    const d = documents('phi4', NESTED);
    expect(() => render(toLatex(d.counterterm, { target: 'katex', scheme: 'pole-part', lineWidth: 10 }))).not.toThrow();
  });

  it('a definition given to KaTeX wins over the fragment\'s \\providecommand', () => {
    const d = documents('phi4', NESTED);
    const user = { '\\Rop': '\\mathbb{T}', '\\cog': '#1/\\!\\!/#2' };
    const inline = render(toLatex(d.counterterm, { target: 'katex' }), user);
    const external = render(toLatex(d.counterterm, { target: 'katex', macros: 'external' }), { ...katexMacros('symbolic'), ...user });
    expect(visible(inline)).toBe(visible(external));
    expect(visible(inline)).not.toBe(visible(render(toLatex(d.counterterm, { target: 'katex' }))));
  });

  it('the expanded fragment renders exactly as the one with macros, and uses none of them', () => {
    // The Yukawa rainbow: a fermion self-energy nested inside another.
    const d = documents('yukawa', '1>2 2>3 3>4 1-4 2-3 / >1 4>');
    expect(d.counterterm.subgraphs.length).toBeGreaterThan(0);
    const expanded = toLatex(d.counterterm, { target: 'katex', macros: 'expanded' });
    expect(expanded).not.toMatch(/\\(Gr|sg|cog|Sct|Rmap|Rop|Kop|Cop|tp|unit|Rbar)(?![A-Za-z])/);
    expect(visible(render(expanded))).toBe(visible(render(toLatex(d.counterterm, { target: 'katex', macros: 'external' }), katexMacros('symbolic'))));
  });
});

describe('SVG pictures', () => {
  for (const name of builtinTheoryNames()) {
    it(`random graphs of ${name}: one path per line and leg (plus arrows), one mark per vertex`, () => {
      const random = rng(77 + name.length);
      for (let k = 0; k < 10; k++) {
        const g = randomTheoryGraph(name, random, { vertices: 1 + Math.floor(random() * 5), maxEdges: 10 });
        const d = documents(name, g);
        const svg = graphSvg(d.bg.graph, d.theory, { title: d.counterterm.root.notation });
        expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
        expect(svg.endsWith('</svg>')).toBe(true);
        expect(svg).not.toMatch(/NaN|Infinity/);
        const arrows = d.bg.graph.edges.filter((e) => e.oriented).length + d.bg.graph.legs.filter((l) => l.direction !== 'none').length;
        expect((svg.match(/<path /g) ?? []).length).toBe(d.bg.graph.edges.length + d.bg.graph.legs.length + arrows);
        expect((svg.match(/<circle /g) ?? []).length).toBe(d.bg.graph.vertices.length);
      }
    });
  }

  it('cographs draw their contracted vertices as crossed circles', () => {
    const d = documents('phi4', NESTED);
    const cograph = d.coproduct.terms[0]!.cograph;
    const svg = graphSvg(cograph.graph, d.theory);
    expect((svg.match(/<g><circle [^>]*fill="white"/g) ?? []).length).toBe(cograph.graph.vertices.filter((v) => v.counterterm).length);
    expect(cograph.graph.vertices.some((v) => v.counterterm)).toBe(true);
  });
});
