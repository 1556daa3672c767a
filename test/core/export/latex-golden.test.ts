/**
 * Golden strings for the KaTeX-safe fragments of small cases, worked out by hand (STYLE item 8:
 * "LaTeX through one toLatex path, tested against exact strings and by compiling").
 *
 * Sunset Γ = 1-2 1-2 1-2 (φ⁴): its divergent proper subgraphs are the three one-loop bubbles
 * (any two of the three lines), all in one class, each with the tadpole 1-1 as cograph, so
 * Δ(Γ) = Γ⊗1 + 1⊗Γ + 3 γ⊗Γ/γ.
 *
 * Nested Γ = 1-2 1-2 1-3 2-3 3-4 3-4: γ1 = lines 1,2 and γ2 = lines 5,6 (bubbles), γ3 = lines
 * 1–4 (the two-loop vertex graph around γ1). γ2 and γ3 share vertex 3 and are not nested, so the
 * forests containing Γ are {Γ}, {γ1,Γ}, {γ2,Γ}, {γ3,Γ}, {γ1,γ2,Γ}, {γ1,γ3,Γ} — six terms, signs
 * (−1)^{number of R}. S_R(Γ) = −R[Γ + S_R(γ1)Γ/γ1 + S_R(γ1)S_R(γ2)Γ/(γ1γ2) + S_R(γ2)Γ/γ2 + S_R(γ3)Γ/γ3]
 * with S_R(γ3) = −R[γ3 + S_R(γ1)γ3/γ1] (the twisted antipode, DESIGN §3).
 */
import { describe, expect, it } from 'vitest';
import { toLatex } from '../../../src/core/export/to-latex.ts';
import { equationRows, atom } from '../../../src/core/export/latex-layout.ts';
import { macroDefinitions } from '../../../src/core/export/latex-macros.ts';
import { documents, NESTED, SUNSET } from './export-fixtures.ts';

const katex = (doc: Parameters<typeof toLatex>[0]) => toLatex(doc, { target: 'katex', macros: 'external' });

describe('KaTeX-safe fragments, exact', () => {
  it('sunset coproduct', () => {
    expect(katex(documents('phi4', SUNSET).coproduct)).toBe(
      [
        '\\begin{gathered}',
        '\\text{\\textbf{Coproduct}} \\\\[1ex]',
        '\\text{3 proper admissible subgraphs in 1 class of pairs $(\\gamma, \\Gr/\\gamma)$, legs unlabelled; each term names one representative.} \\\\[1ex]',
        '\\begin{aligned}',
        '  \\Cop(\\Gr) &= \\Gr\\tp\\unit + \\unit\\tp\\Gr + 3\\,\\sg{1}\\tp\\cog{\\Gr}{\\sg{1}}',
        '\\end{aligned} \\\\[1ex]',
        '\\text{\\textbf{Graphs}} \\\\[1ex]',
        '\\text{Lines are numbered as in the input notation of $\\Gr$.} \\\\[1ex]',
        '\\begin{array}{llllll}',
        '\\text{graph} & \\text{notation} & \\text{lines} & L & \\omega & \\text{residue} \\\\ \\hline',
        '\\Gr & \\text{\\texttt{1-2 1-2 1-2 / 1 2}} & \\text{1,2,3} & 2 & 2 & \\phi^{2} \\\\',
        '\\sg{1} & \\text{\\texttt{1-2 1-2 / 1 1 2 2}} & \\text{1,2} & 1 & 0 & \\phi^{4} \\\\',
        '\\cog{\\Gr}{\\sg{1}} & \\text{\\texttt{1-1 / 1 1}} & \\text{} & 1 & 2 & \\phi^{2}',
        '\\end{array}',
        '\\end{gathered}',
      ].join('\n'),
    );
  });

  it('nested vertex graph: counterterm, formula tree, six forest terms, legend', () => {
    expect(katex(documents('phi4', NESTED).counterterm)).toBe(
      [
        '\\begin{gathered}',
        '\\text{\\textbf{Counterterm}} \\\\[1ex]',
        '\\text{6 forest terms, one per forest containing $\\Gr$.} \\\\[1ex]',
        '\\begin{aligned}',
        '  \\Sct(\\Gr) &= -\\Rmap\\Bigl[\\Gr \\\\',
        '  &\\qquad {}- \\Rmap[\\sg{1}]\\,\\cog{\\Gr}{\\sg{1}} \\\\',
        '  &\\qquad {}+ \\Rmap[\\sg{1}]\\,\\Rmap[\\sg{2}]\\,\\cog{\\Gr}{(\\sg{1}\\sg{2})} \\\\',
        '  &\\qquad {}- \\Rmap[\\sg{2}]\\,\\cog{\\Gr}{\\sg{2}} \\\\',
        '  &\\qquad {}- \\Rmap\\bigl[\\sg{3} - \\Rmap[\\sg{1}]\\,\\cog{\\sg{3}}{\\sg{1}}\\bigr]\\,\\cog{\\Gr}{\\sg{3}}\\Bigr]',
        '\\end{aligned} \\\\[1ex]',
        '\\text{\\textbf{Formula tree}} \\\\[1ex]',
        '\\text{One equation per divergent subgraph, each subtracting its own subdivergences.} \\\\[1ex]',
        '\\begin{aligned}',
        '  \\Sct(\\Gr) &= -\\Rmap[\\Gr + \\Sct(\\sg{1})\\,\\cog{\\Gr}{\\sg{1}} + \\Sct(\\sg{1})\\,\\Sct(\\sg{2})\\,\\cog{\\Gr}{(\\sg{1}\\sg{2})} + \\Sct(\\sg{2})\\,\\cog{\\Gr}{\\sg{2}} \\\\',
        '  &\\qquad {}+ \\Sct(\\sg{3})\\,\\cog{\\Gr}{\\sg{3}}] \\\\',
        '  \\Sct(\\sg{1}) &= -\\Rmap[\\sg{1}] \\\\',
        '  \\Sct(\\sg{2}) &= -\\Rmap[\\sg{2}] \\\\',
        '  \\Sct(\\sg{3}) &= -\\Rmap[\\sg{3} + \\Sct(\\sg{1})\\,\\cog{\\sg{3}}{\\sg{1}}]',
        '\\end{aligned} \\\\[1ex]',
        '\\text{\\textbf{Forest terms}} \\\\[1ex]',
        '\\text{The sum of the signed terms is $\\Sct(\\Gr)$.} \\\\[1ex]',
        '\\begin{array}{lcl}',
        '\\text{forest} & \\text{sign} & \\text{term} \\\\ \\hline',
        '\\{\\Gr\\} & - & \\Rmap[\\Gr] \\\\',
        '\\{\\sg{1},\\Gr\\} & + & \\Rmap\\bigl[\\Rmap[\\sg{1}]\\,\\cog{\\Gr}{\\sg{1}}\\bigr] \\\\',
        '\\{\\sg{1},\\sg{2},\\Gr\\} & - & \\Rmap\\bigl[\\Rmap[\\sg{1}]\\,\\Rmap[\\sg{2}]\\,\\cog{\\Gr}{(\\sg{1}\\sg{2})}\\bigr] \\\\',
        '\\{\\sg{2},\\Gr\\} & + & \\Rmap\\bigl[\\Rmap[\\sg{2}]\\,\\cog{\\Gr}{\\sg{2}}\\bigr] \\\\',
        '\\{\\sg{3},\\Gr\\} & + & \\Rmap\\bigl[\\Rmap[\\sg{3}]\\,\\cog{\\Gr}{\\sg{3}}\\bigr] \\\\',
        '\\{\\sg{1},\\sg{3},\\Gr\\} & - & \\Rmap\\Bigl[\\Rmap\\bigl[\\Rmap[\\sg{1}]\\,\\cog{\\sg{3}}{\\sg{1}}\\bigr]\\,\\cog{\\Gr}{\\sg{3}}\\Bigr]',
        '\\end{array} \\\\[1ex]',
        '\\text{\\textbf{Graphs}} \\\\[1ex]',
        '\\text{Lines are numbered as in the input notation of $\\Gr$.} \\\\[1ex]',
        '\\begin{array}{llllll}',
        '\\text{graph} & \\text{notation} & \\text{lines} & L & \\omega & \\text{residue} \\\\ \\hline',
        '\\Gr & \\text{\\texttt{1-2 1-2 1-3 2-3 3-4 3-4 / 1 2 4 4}} & \\text{1,2,3,4,5,6} & 3 & 0 & \\phi^{4} \\\\',
        '\\sg{1} & \\text{\\texttt{1-2 1-2 / 1 1 2 2}} & \\text{1,2} & 1 & 0 & \\phi^{4} \\\\',
        '\\sg{2} & \\text{\\texttt{1-2 1-2 / 1 1 2 2}} & \\text{5,6} & 1 & 0 & \\phi^{4} \\\\',
        '\\sg{3} & \\text{\\texttt{1-2 1-3 2-3 2-3 / 1 1 2 3}} & \\text{1,2,3,4} & 2 & 0 & \\phi^{4}',
        '\\end{array}',
        '\\end{gathered}',
      ].join('\n'),
    );
  });

  it('the self-contained fragment starts with the \\providecommand lines, and the pole-part scheme rebinds \\Rmap', () => {
    const doc = documents('phi4', SUNSET).coproduct;
    expect(toLatex(doc, { target: 'katex' })).toBe(`${macroDefinitions('symbolic').join('\n')}\n${katex(doc)}`);
    expect(macroDefinitions('pole-part')).toContain('\\providecommand{\\Rmap}{\\Kop}');
    expect(macroDefinitions('symbolic')).toContain('\\providecommand{\\Rmap}{\\Rop}');
    expect(macroDefinitions('symbolic')).toContain('\\providecommand{\\zetaval}[1]{\\zeta(#1)}');
  });
});

describe('formula layout', () => {
  it('breaks before a sign when the width budget is exceeded, continuing indented', () => {
    const terms = [1, 2, 3, 4].map((k) => ({ sign: (k % 2 ? 1 : -1) as 1 | -1, factors: [atom(`x_{${k}}`, 5)] }));
    expect(equationRows('y', terms, { width: 15 })).toEqual(['y &= x_{1} - x_{2}', '&\\quad {}+ x_{3} - x_{4}']);
    expect(equationRows('y', terms, { width: 100 })).toEqual(['y &= x_{1} - x_{2} + x_{3} - x_{4}']);
  });

  it('sizes brackets by nesting depth', () => {
    const inner = { op: '\\Rmap', terms: [{ sign: 1 as const, factors: [atom('a', 1)] }] };
    const outer = { op: '\\Rmap', terms: [{ sign: 1 as const, factors: [inner, atom('b', 1)] }] };
    expect(equationRows('y', [{ sign: -1, factors: [outer] }], { width: 50 })).toEqual(['y &= -\\Rmap\\bigl[\\Rmap[a]\\,b\\bigr]']);
  });

  it('writes a long formula over several rows', () => {
    // The two-loop φ⁴ "eye" plus a bubble chain gives a root bracket with many terms.
    const rows = toLatex(documents('phi4', '1-2 1-2 2-3 2-3 3-4 3-4 4-5 4-5 / 1 1 5 5').counterterm, { target: 'katex', lineWidth: 30 });
    expect(rows.split('\n').filter((l) => l.trimStart().startsWith('&\\qquad')).length).toBeGreaterThan(5);
  });
});
