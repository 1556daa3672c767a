/**
 * `coppice coproduct --latex` and `coppice counterterm --symbolic --latex` print a complete .tex
 * document that records the version, theory, scheme and conventions (issue 4, "LaTeX").
 */
import { describe, expect, it } from 'vitest';
import pkg from '../../package.json' with { type: 'json' };
import { cli } from '../helpers/cli.ts';

const NESTED = '1-2 1-2 1-3 2-3 3-4 3-4 / 1 2 4 4';

describe('--latex', () => {
  it('counterterm --symbolic --latex: a full document with the nested formula and six forest rows', async () => {
    const r = await cli('counterterm', '--symbolic', '--latex', '--theory', 'phi4', '--graph', NESTED);
    expect(r.code).toBe(0);
    const lines = r.out.split('\n');
    expect(lines[0]).toBe(`% written by: Coppice ${pkg.version}`);
    expect(r.out).toContain('% theory: phi4 (');
    expect(r.out).toContain('% scheme: R symbolic');
    expect(r.out).toContain('% convention: coupling rescaling: g = coupling / (16 pi^2)');
    expect(r.out).toContain('\\documentclass[10pt]{article}');
    expect(r.out).toContain('\\providecommand{\\Rmap}{\\Rop}');
    expect(r.out).toContain('  &\\qquad {}- \\Rmap\\bigl[\\sg{3} - \\Rmap[\\sg{1}]\\,\\cog{\\sg{3}}{\\sg{1}}\\bigr]\\,\\cog{\\Gr}{\\sg{3}}\\Bigr]');
    expect(lines.filter((l) => /^\$\\\{.*\\\}\$ & \$[+-]\$ & /.test(l))).toHaveLength(6);
    expect(r.out).toContain('\\begin{tikzpicture}');
    expect(r.out.trimEnd().endsWith('\\end{document}')).toBe(true);
  });

  it('coproduct --latex: Δ(Γ) of the sunset', async () => {
    const r = await cli('coproduct', '--latex', '--theory', 'phi4', '--graph', '1-2 1-2 1-2 / 1 2');
    expect(r.code).toBe(0);
    expect(r.out).toContain('% content: coproduct of 1-2 1-2 1-2 / 1 2');
    expect(r.out).toContain('  \\Cop(\\Gr) &= \\Gr\\tp\\unit + \\unit\\tp\\Gr + 3\\,\\sg{1}\\tp\\cog{\\Gr}{\\sg{1}}');
    expect(r.out.trimEnd().endsWith('\\end{document}')).toBe(true);
  });
});
