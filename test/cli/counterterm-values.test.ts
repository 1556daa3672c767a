import { describe, expect, it } from 'vitest';
import { cli } from '../helpers/cli.ts';

describe('coppice counterterm --scheme', () => {
  it('JSON shape for the nested two-loop graph (MS-bar)', async () => {
    const r = await cli('counterterm', '--theory', 'phi4', '--scheme', 'msbar', '--graph', '1-2 1-2 1-3 2-3 / 1 2 3 3', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j).toMatchObject({ scheme: 'msbar', evaluable: true, counterterm: { '-2': '1/2', '-1': '-1/2' }, finite: true, local: true, routingsAgree: true, rgConsistent: true });
    expect(j.routing).toHaveLength(2);
    expect(j.routingsCompared).toBeGreaterThanOrEqual(2);
    expect(typeof j.method).toBe('string');
    expect(Object.keys(j.renormalized)).toEqual(['0', '1', '2']);
  });
  it('not evaluable: reason given, exit 0 (nothing failed)', async () => {
    const r = await cli('counterterm', '--theory', 'phi4', '--scheme', 'ms', '--graph', '1-3 1-4 1-5 2-3 2-4 2-5 3-4 3-5 4-5 / 1 2', '--json'); // a five-loop self-energy no route reaches yet
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.evaluable).toBe(false);
    expect(j.reason).toMatch(/routing/);
  });
  it('a four-loop self-energy through □_p: the pole part, with the renormalized value plainly not available (text and JSON)', async () => {
    const g = '1-3 1-4 1-4 2-3 2-3 2-4 3-4 / 1 2';
    const text = await cli('counterterm', '--theory', 'phi4', '--scheme', 'ms', '--graph', g);
    expect(text.code).toBe(0);
    expect(text.out).toMatch(/counterterm S_R {2}= \(1\/12\) eps\^-3 \+ \(-1\/6\) eps\^-2 \+ \(1\/3\) eps\^-1/);
    expect(text.out).toMatch(/renormalized {5}not available: the □_p route/);
    const j = JSON.parse((await cli('counterterm', '--theory', 'phi4', '--scheme', 'ms', '--graph', g, '--json')).out);
    expect(j).toMatchObject({ evaluable: true, finite: null, renormalized: null, local: true, routingsAgree: true, rgConsistent: true });
    expect(j.method).toMatch(/□_p/);
    expect(typeof j.poleOnly).toBe('string');
  });
  it('fermion theories say plainly that values must be supplied', async () => {
    const j = JSON.parse((await cli('counterterm', '--theory', 'qed', '--scheme', 'msbar', '--graph', '1>2 2>1 / 1 2', '--json')).out);
    expect(j.evaluable).toBe(false);
    expect(j.reason).toMatch(/supply/);
  });
  it('momentum subtraction: the labelled t-channel bubble subtracted at p² = μ² (through ε⁰)', async () => {
    const j = JSON.parse((await cli('counterterm', '--theory', 'phi4', '--scheme', 'mom', '--graph', '1-2 1-2 / 1 2 1 2', '--json')).out);
    // −G(1,1)e^{γε} = −1/ε − 2 + O(ε) (REFERENCES.md: G(1,1) = 1/ε + 2 + O(ε)).
    expect(j.counterterm).toEqual({ '-1': '-1', '0': '-2' });
    expect(j.renormalized).toEqual({ '0': '0', '1': '-1' });
  });
  it('momentum subtraction refuses an infrared-unsafe exceptional point', async () => {
    const j = JSON.parse((await cli('counterterm', '--theory', 'phi4', '--scheme', 'mom', '--graph', '1-2 1-2 / 1 1 2 2', '--json')).out);
    expect(j.evaluable).toBe(false);
    expect(j.reason).toMatch(/same vertex/);
  });
  it('an unknown scheme is bad input', async () => {
    const r = await cli('counterterm', '--theory', 'phi4', '--scheme', 'dimred', '--graph', '1-2 1-2 / 1 1 2 2');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/unknown scheme/);
  });
  it('human output names the checks', async () => {
    const r = await cli('counterterm', '--theory', 'phi3', '--scheme', 'msbar', '--graph', '1-2 2-3 3-1 / 1 2 3');
    expect(r.out).toMatch(/finite: pass/);
  });
});

describe('values supplied by hand', () => {
  it('an approximate subgraph counterterm flows through the subtraction with its error, checks consistent within errors', async () => {
    const j = JSON.parse((await cli('counterterm', '--theory', 'phi4', '--scheme', 'msbar', '--graph', '1-2 1-2 1-3 2-3 / 1 2 3 3', '--supply', '1-2 1-2 / 1 1 2 2=-1.0001(2)*eps^-1', '--json')).out);
    expect(j.counterterm['-2']).toMatch(/^0\.500/);
    expect(j.counterterm['-2']).toMatch(/\(\d+\)$/);
    expect(j.finite).toBe(true);
  });
  it('a wrong exact value is caught by the checks (exit 1)', async () => {
    const r = await cli('counterterm', '--theory', 'phi4', '--scheme', 'msbar', '--graph', '1-2 1-2 1-3 2-3 / 1 2 3 3', '--supply', '1-2 1-2 / 1 1 2 2=-2*eps^-1', '--json');
    expect(r.code).toBe(1);
    const j = JSON.parse(r.out);
    expect(j.finite === false || j.local === false || j.rgConsistent === false).toBe(true);
  });
  it('malformed --supply is bad input', async () => {
    expect((await cli('counterterm', '--theory', 'phi4', '--graph', '1-2 1-2 / 1 1 2 2', '--supply', 'nonsense')).code).toBe(2);
  });
});

import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

describe('coppice counterterm --scheme --latex', () => {
  const hasLatex = spawnSync('pdflatex', ['--version']).status === 0;
  it('writes a document with the counterterm, the renormalized value and the checks', async () => {
    const r = await cli('counterterm', '--theory', 'phi4', '--scheme', 'msbar', '--graph', '1-2 1-2 1-3 2-3 / 1 2 3 3', '--latex');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/\\documentclass/);
    expect(r.out).toContain("S_R(\\Gamma) &= \\frac{1}{2}\\,\\varepsilon^{-2} - \\frac{1}{2}\\,\\varepsilon^{-1}");
    expect(r.out).not.toMatch(/\?/); // every character was written in LaTeX
  });
  // Exported LaTeX must compile with a real LaTeX (REFERENCES.md, "LaTeX"; CI installs texlive).
  it.skipIf(!hasLatex && !process.env.CI)('compiles with pdflatex', async () => {
    const r = await cli('counterterm', '--theory', 'phi3', '--scheme', 'g', '--graph', '1-2 2-3 3-1 / 1 2 3', '--latex');
    const dir = mkdtempSync(join(tmpdir(), 'coppice-tex-'));
    writeFileSync(join(dir, 'v.tex'), r.out);
    execFileSync('pdflatex', ['-halt-on-error', '-interaction=nonstopmode', 'v.tex'], { cwd: dir, stdio: 'ignore' });
    expect(existsSync(join(dir, 'v.pdf'))).toBe(true);
  });
});
