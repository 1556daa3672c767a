import { readFileSync } from 'node:fs';
import { isMainThread, parentPort, Worker, workerData } from 'node:worker_threads';
import { CancelledError, InputError } from '../core/errors.ts';
import type { CancelToken } from '../core/util/cancel.ts';
import { runCli } from './run.ts';

// The process entry of `coppice`: wires real stdio, files and Ctrl-C to the in-process runner.
// Most engine loops are synchronous, and a SIGINT handler only runs when the event loop gets a
// turn, so the command runs in a worker thread and the main thread keeps the event loop free:
// on Ctrl-C it sets a flag in shared memory that the worker's cancel token reads. A loop that
// does not poll its token is stopped after a grace period; a second Ctrl-C stops at once.

/** Main thread → worker. */
interface EntryData {
  readonly argv: readonly string[];
  readonly flag: Int32Array;
}
/** Worker → main thread. */
type EntryMessage = { readonly out: string } | { readonly err: string } | { readonly code: number };

const GRACE_MS = 2000;

if (isMainThread) {
  const argv = process.argv.slice(2);
  const verb = argv[0] ?? '';
  const flag = new Int32Array(new SharedArrayBuffer(4));
  const worker = new Worker(new URL(import.meta.url), { workerData: { argv, flag } satisfies EntryData });
  let finished = false;
  const interrupted = () => {
    process.stderr.write(`coppice${verb ? ` ${verb}` : ''}: interrupted\n`);
    process.exit(130);
  };
  let interrupts = 0;
  process.on('SIGINT', () => {
    interrupts++;
    Atomics.store(flag, 0, 1);
    if (interrupts > 1) interrupted();
    else setTimeout(() => !finished && interrupted(), GRACE_MS).unref();
  });
  worker.on('message', (m: EntryMessage) => {
    if ('out' in m) process.stdout.write(m.out);
    else if ('err' in m) process.stderr.write(m.err);
    else {
      finished = true;
      process.exitCode = m.code;
    }
  });
  worker.on('error', (e: Error & { code?: string }) => {
    finished = true;
    if (e.code === 'ERR_WORKER_OUT_OF_MEMORY') {
      process.stderr.write(`coppice ${verb}: the request needs more memory than this process may use (raise it with node --max-old-space-size=<MB>, or ask for less)\n`);
      process.exitCode = 3;
    } else {
      process.stderr.write(`coppice ${verb}: internal error: ${e.message} (please report it)\n`);
      process.exitCode = 70;
    }
  });
  worker.on('exit', () => {
    if (!finished) {
      process.stderr.write(`coppice ${verb}: internal error: the command stopped without an exit code (please report it)\n`);
      process.exitCode = 70;
    }
  });
} else {
  const { argv, flag } = workerData as EntryData;
  const post = (m: EntryMessage) => parentPort!.postMessage(m);
  const cancel: CancelToken = {
    get cancelled() {
      return Atomics.load(flag, 0) !== 0;
    },
    throwIfCancelled() {
      if (Atomics.load(flag, 0) !== 0) throw new CancelledError('the command');
    },
  };
  const code = await runCli(argv, {
    out: (text) => post({ out: text }),
    err: (text) => post({ err: text }),
    readFile: (path) => {
      try {
        return readFileSync(path, 'utf8');
      } catch (e) {
        throw new InputError(`cannot read file "${path}": ${(e as NodeJS.ErrnoException).code ?? String(e)}`);
      }
    },
    cancel,
  });
  post({ code });
}
