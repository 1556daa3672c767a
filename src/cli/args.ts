import { InputError } from '../core/errors.ts';

/** Parsed command line: positional words and flags (repeatable flags keep every value). */
export interface ParsedArgs {
  readonly positional: string[];
  readonly flags: Map<string, string[]>;
}

/** What a command accepts: boolean switches and flags that take a value. */
export interface FlagSpec {
  readonly booleans: readonly string[];
  readonly values: readonly string[];
}

/**
 * A small, strict argument parser: `--name value`, `--name=value`, boolean `--name`.
 * Unknown flags are errors that name the flag and list the known ones.
 */
export function parseArgs(argv: readonly string[], spec: FlagSpec): ParsedArgs {
  const positional: string[] = [];
  const flags = new Map<string, string[]>();
  const add = (k: string, v: string) => flags.set(k, [...(flags.get(k) ?? []), v]);
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a === '--') {
      positional.push(...argv.slice(i + 1));
      break;
    }
    if (!a.startsWith('--') || a === '-') {
      positional.push(a);
      continue;
    }
    const eq = a.indexOf('=');
    const name = eq >= 0 ? a.slice(2, eq) : a.slice(2);
    if (spec.booleans.includes(name)) {
      if (eq >= 0) throw new InputError(`flag --${name} takes no value`, { input: 'command line', offset: 0, source: a });
      add(name, 'true');
    } else if (spec.values.includes(name)) {
      let v: string | undefined;
      if (eq >= 0) v = a.slice(eq + 1);
      else {
        v = argv[i + 1];
        i++;
      }
      if (v === undefined) throw new InputError(`flag --${name} needs a value`, undefined, `write --${name} <value>`);
      add(name, v);
    } else {
      const known = [...spec.booleans, ...spec.values].map((f) => `--${f}`).join(', ');
      throw new InputError(`unknown flag --${name}`, undefined, known ? `known flags: ${known}` : 'this command takes no flags');
    }
  }
  return { positional, flags };
}

export function flag(args: ParsedArgs, name: string): string | undefined {
  const v = args.flags.get(name);
  return v ? v[v.length - 1] : undefined;
}

export function flagAll(args: ParsedArgs, name: string): string[] {
  return args.flags.get(name) ?? [];
}

export function hasFlag(args: ParsedArgs, name: string): boolean {
  return args.flags.has(name);
}

export function requireFlag(args: ParsedArgs, name: string, hint: string): string {
  const v = flag(args, name);
  if (v === undefined) throw new InputError(`missing --${name}`, undefined, hint);
  return v;
}

/** A non-negative integer flag, with a clear error naming the flag. */
export function intFlag(args: ParsedArgs, name: string, fallback: number): number {
  const v = flag(args, name);
  if (v === undefined) return fallback;
  if (!/^\d+$/.test(v)) throw new InputError(`--${name} must be a non-negative integer, got "${v}"`);
  const n = Number(v);
  if (!Number.isSafeInteger(n)) throw new InputError(`--${name} is too large: ${v}`);
  return n;
}
