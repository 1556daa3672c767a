import { CancelledError, CoppiceError, InputError, LimitError } from '../core/errors.ts';
import { parseArgs } from './args.ts';
import { EXIT, type CliIO } from './command.ts';
import { commands } from './registry.ts';

const VERSION = '0.1.0';

function helpText(): string {
  const width = Math.max(...commands.map((c) => c.name.length));
  return [
    'coppice — renormalization workbench (command line)',
    '',
    'usage: coppice <command> [flags]        coppice <command> --help',
    '',
    'commands:',
    ...commands.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`),
    '',
    'exit codes: 0 ok, 1 a check failed, 2 bad input, 3 a limit refused the request, 130 interrupted',
  ].join('\n');
}

/** Runs one command line in-process; never throws (bad input becomes exit 2 and a one-line message). */
export async function runCli(argv: readonly string[], io: CliIO): Promise<number> {
  const [verb, ...rest] = argv;
  if (verb === undefined || verb === '--help' || verb === '-h' || verb === 'help') {
    io.out(helpText() + '\n');
    return verb === undefined ? EXIT.badInput : EXIT.ok;
  }
  if (verb === '--version') {
    io.out(VERSION + '\n');
    return EXIT.ok;
  }
  const cmd = commands.find((c) => c.name === verb);
  if (!cmd) {
    io.err(`coppice: unknown command ${JSON.stringify(verb)}; known commands: ${commands.map((c) => c.name).join(', ')}\n`);
    return EXIT.badInput;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    io.out(cmd.usage.trimEnd() + '\n');
    return EXIT.ok;
  }
  try {
    const args = parseArgs(rest, cmd.flags);
    return await cmd.run(args, io);
  } catch (e) {
    return reportError(e, verb, io);
  }
}

function reportError(e: unknown, verb: string, io: CliIO): number {
  const oneLine = (s: string) => s.replace(/\s*\n\s*/g, ' ');
  if (e instanceof CancelledError) {
    io.err(`coppice ${verb}: interrupted\n`);
    return EXIT.interrupted;
  }
  if (e instanceof LimitError) {
    io.err(`coppice ${verb}: ${oneLine(e.describe())}\n`);
    return EXIT.limit;
  }
  if (e instanceof CoppiceError) {
    io.err(`coppice ${verb}: ${oneLine(e.describe())}\n`);
    return EXIT.badInput;
  }
  if (e instanceof RangeError && /Invalid array length|Maximum call stack/.test(e.message)) {
    io.err(`coppice ${verb}: the request is too large for this machine (${e.message})\n`);
    return EXIT.limit;
  }
  // A bug, not bad input: say so plainly, still without a stack trace unless asked.
  const msg = e instanceof Error ? e.message : String(e);
  io.err(`coppice ${verb}: internal error: ${oneLine(msg)} (set COPPICE_DEBUG=1 for a stack trace; please report it)\n`);
  if (typeof process !== 'undefined' && process.env.COPPICE_DEBUG && e instanceof Error) io.err(String(e.stack) + '\n');
  return 70;
}

export { InputError };
