import { readFileSync } from 'node:fs';
import { InputError } from '../../src/core/errors.ts';
import { cancelSource } from '../../src/core/util/cancel.ts';
import { runCli } from '../../src/cli/run.ts';

/** Runs `coppice <argv>` in-process and collects what it prints. */
export async function cli(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = '';
  let err = '';
  const code = await runCli(argv, {
    out: (t) => (out += t),
    err: (t) => (err += t),
    readFile: (p) => {
      try {
        return readFileSync(p, 'utf8');
      } catch {
        throw new InputError(`cannot read file "${p}"`);
      }
    },
    cancel: cancelSource(),
  });
  return { code, out, err };
}
