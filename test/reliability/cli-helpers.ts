/** Running `coppice` in-process and checking the DESIGN §10 exit-code and stream contract. */
import { readFileSync } from 'node:fs';
import { expect } from 'vitest';
import { runCli } from '../../src/cli/run.ts';
import { InputError } from '../../src/core/errors.ts';
import { cancelSource } from '../../src/core/util/cancel.ts';

export interface CliResult {
  code: number;
  out: string;
  err: string;
}

/** runCli in-process, collecting its streams. */
export async function runInProcess(argv: readonly string[]): Promise<CliResult> {
  let out = '';
  let err = '';
  const code = await runCli(argv, {
    out: (t) => (out += t),
    err: (t) => (err += t),
    readFile: (p) => {
      try {
        return readFileSync(p, 'utf8');
      } catch (e) {
        throw new InputError(`cannot read file "${p}": ${(e as NodeJS.ErrnoException).code ?? String(e)}`);
      }
    },
    cancel: cancelSource(),
  });
  return { code, out, err };
}

/** The DESIGN §10 stream contract for one finished command. */
export function expectContract(argv: readonly string[], r: CliResult): void {
  const where = `argv ${JSON.stringify(argv)} → ${r.code}, stderr ${JSON.stringify(r.err.slice(0, 400))}`;
  expect([0, 1, 2, 3], where).toContain(r.code);
  expect(r.err, where).not.toMatch(/internal error|\n\s+at .+[:(]\d+|Error: /);
  if (r.code >= 2) {
    expect(r.err.endsWith('\n') && r.err.indexOf('\n') === r.err.length - 1, `one line on stderr: ${where}`).toBe(true);
    expect(r.err, where).toMatch(/^coppice/);
  }
}

