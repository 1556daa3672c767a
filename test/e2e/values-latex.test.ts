/** The LaTeX exports of the Values and Theory-run panels compile with pdflatex (no browser needed). */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runJob } from '../../src/core/project/index.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';

const CHAIN = '1-2 1-2 2-3 2-3 / 1 1 3 3';

const havePdflatex = (() => {
  try {
    execFileSync('pdflatex', ['--version'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
})();

describe.skipIf(!havePdflatex && !process.env.CI)('LaTeX export of values and RG functions', () => {
  it('compiles with pdflatex (the per-graph breakdown with TikZ pictures)', { timeout: 60_000 }, () => {
    const theory = builtinTheory('phi4');
    const rg = runJob({ kind: 'rg', theory, loops: 2, scheme: 'msbar', evaluate: true });
    const values = runJob({ kind: 'values', theory, notation: CHAIN, scheme: 'msbar' });
    if (!rg.ok || rg.result.kind !== 'rg' || !values.ok || values.result.kind !== 'values') throw new Error('jobs failed');
    const dir = mkdtempSync(join(tmpdir(), 'coppice-values-tex-'));
    for (const [name, text] of [['rg', rg.result.latex!], ['values', values.result.latex]] as const) {
      expect(text).toMatch(/S_R/);
      writeFileSync(join(dir, `${name}.tex`), text);
      execFileSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', `${name}.tex`], { cwd: dir, stdio: 'pipe', timeout: 50_000 });
      expect(existsSync(join(dir, `${name}.pdf`))).toBe(true);
    }
    expect(rg.result.latex).toMatch(/\\frac\{1\}\{6\}/);
  });
});
