/**
 * The exported documents compile with a real LaTeX (REFERENCES.md, "LaTeX": "compile with a real
 * LaTeX (Debian texlive-latex-base, plus texlive-pictures for TikZ)"; .ci/run installs both).
 * Two runs: the nested φ⁴ counterterm with pictures in the formulas (plain lines, crossed-circle
 * counterterm vertices), and a QED counterterm whose legend pictures use wavy photons and arrowed
 * fermions; the PDF is rendered to PNG when pdftoppm (poppler-utils) is present.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { toLatex } from '../../../src/core/export/to-latex.ts';
import { documents, NESTED } from './export-fixtures.ts';

const has = (cmd: string) => {
  try {
    execFileSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
};
const pdflatex = has('pdflatex');
const pdftoppm = has('pdftoppm');
const dir = mkdtempSync(join(tmpdir(), 'coppice-latex-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function compile(name: string, tex: string): string {
  writeFileSync(join(dir, `${name}.tex`), tex);
  try {
    execFileSync('pdflatex', ['-halt-on-error', '-interaction=nonstopmode', `${name}.tex`], { cwd: dir, stdio: 'pipe', timeout: 60_000 });
  } catch (e) {
    const out = String((e as { stdout?: Buffer }).stdout ?? '');
    throw new Error(`pdflatex failed on ${name}.tex:\n${out.split('\n').filter((l) => l.startsWith('!') || l.startsWith('l.')).join('\n')}`);
  }
  return join(dir, `${name}.pdf`);
}

describe.skipIf(!pdflatex && !process.env.CI)('pdflatex compiles the exported documents', () => {
  it('nested φ⁴ counterterm with TikZ pictures inline', () => {
    const tex = toLatex(documents('phi4', NESTED).counterterm, { graphs: 'pictures', version: 'test' });
    expect(tex).toContain('\\usebox{\\coppicepica}');
    const pdf = compile('nested', tex);
    expect(statSync(pdf).size).toBeGreaterThan(5000);
    if (pdftoppm) {
      execFileSync('pdftoppm', ['-r', '60', '-png', '-f', '1', '-l', '1', pdf, join(dir, 'nested')]);
      expect(existsSync(join(dir, 'nested-1.png')) || existsSync(join(dir, 'nested-01.png'))).toBe(true);
    }
  });

  it('QED counterterm (wavy and arrowed lines, Unicode in the theory title) and a coproduct in the same run', () => {
    const qed = documents('qed', '1>2 2>3 3>4 4>1 1-3 / 2 4');
    const tex = toLatex(qed.counterterm, { version: 'test' });
    expect(tex).toMatch(/\\draw\[coppice wavy\]/);
    expect(tex).toMatch(/\\draw\[coppice plain, coppice arrow\]/);
    // Splice the coproduct's body in, so one run checks both writers.
    const cop = toLatex(documents('yukawa', '1>2 2>3 3>4 1-4 2-3 / >1 4>').coproduct, { version: 'test' });
    const body = cop.slice(cop.indexOf('\\section*'), cop.indexOf('\\end{document}'));
    const pdf = compile('qed', tex.replace('\\end{document}', `\\clearpage\n${body}\\end{document}`));
    expect(statSync(pdf).size).toBeGreaterThan(5000);
  });
});
