import { InputError } from '../core/errors.ts';
import { parseNotation } from '../core/graph/notation-parse.ts';
import type { Graph } from '../core/graph/types.ts';
import { builtinTheory } from '../core/theory/builtin/index.ts';
import { parseTheory } from '../core/theory/parse-theory.ts';
import type { Theory } from '../core/theory/types.ts';
import type { CliIO } from './command.ts';

/** `--theory phi4` (a built-in) or `--theory my-theory.json` (a file). */
export function resolveTheory(spec: string | undefined, io: CliIO): Theory {
  if (spec === undefined) throw new InputError('missing --theory', undefined, 'e.g. --theory phi4 (built-in) or --theory my-theory.json');
  if (spec.endsWith('.json') || spec.includes('/') || spec.includes('\\')) return parseTheory(io.readFile(spec), `theory file ${spec}`);
  return builtinTheory(spec);
}

/** Graph readers by prefix (`nickel:` and others register here). The default is the compact notation. */
export const graphReaders: Map<string, (text: string) => Graph> = new Map();

/** `--graph "<notation>"`, or `--graph <prefix>:<text>` for a registered reader, or `--graph @file`. */
export function readGraph(spec: string | undefined, io: CliIO): Graph {
  if (spec === undefined) throw new InputError('missing --graph', undefined, 'e.g. --graph "1-2 1-2 / 1 1 2 2"');
  let text = spec;
  if (text.startsWith('@')) text = io.readFile(text.slice(1)).trim();
  const m = /^([a-z]+):(.*)$/s.exec(text);
  if (m && graphReaders.has(m[1]!)) return graphReaders.get(m[1]!)!(m[2]!);
  return parseNotation(text);
}
