import type { CancelToken } from '../core/util/cancel.ts';
import type { FlagSpec, ParsedArgs } from './args.ts';

/** Exit codes: a CLI contract (DESIGN §10). */
export const EXIT = { ok: 0, checkFailed: 1, badInput: 2, limit: 3, interrupted: 130 } as const;

/** Where a command writes: injected so tests can run commands in-process. */
export interface CliIO {
  out(text: string): void;
  err(text: string): void;
  /** Reads a file the user named (theory files, graph files). */
  readFile(path: string): string;
  cancel: CancelToken;
}

/** One `coppice <verb>`: its flags, its one-line summary, its usage text, and its body. */
export interface Command {
  readonly name: string;
  readonly summary: string;
  readonly usage: string;
  readonly flags: FlagSpec;
  /** Returns the exit code. Throws CoppiceErrors for bad input or limits. */
  run(args: ParsedArgs, io: CliIO): number | Promise<number>;
}
