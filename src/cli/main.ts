import { readFileSync } from 'node:fs';
import { InputError } from '../core/errors.ts';
import { cancelSource } from '../core/util/cancel.ts';
import { runCli } from './run.ts';

// The process entry of `coppice`: wires real stdio, files and Ctrl-C to the in-process runner.
const cancel = cancelSource('the command');
let interrupts = 0;
process.on('SIGINT', () => {
  interrupts++;
  cancel.cancel();
  if (interrupts > 1) process.exit(130);
});

const code = await runCli(process.argv.slice(2), {
  out: (t) => process.stdout.write(t),
  err: (t) => process.stderr.write(t),
  readFile: (path) => {
    try {
      return readFileSync(path, 'utf8');
    } catch (e) {
      throw new InputError(`cannot read file "${path}": ${(e as NodeJS.ErrnoException).code ?? String(e)}`);
    }
  },
  cancel,
});
process.exitCode = code;
