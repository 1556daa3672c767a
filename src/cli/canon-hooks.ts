/**
 * Wires the canon module into commands it does not own: `--graph nickel:<index>` wherever
 * a graph is read, and the "symmetryFactor" and "canonical" fields of `coppice inspect --json`.
 * Imported once, for its effect, by registry.ts.
 */
import { canonicalNotation, parseNickel, symmetryFactor } from '../core/canon/index.ts';
import { inspectExtensions } from './commands/inspect.ts';
import { graphReaders } from './inputs.ts';

/** A count as JSON: a number up to 2^53 − 1, a decimal string beyond (DESIGN §10). */
export function countToJSON(x: bigint): number | string {
  return x <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(x) : x.toString();
}

if (!graphReaders.has('nickel')) graphReaders.set('nickel', (text) => parseNickel(text));

inspectExtensions.push((bg) => ({
  symmetryFactor: countToJSON(symmetryFactor(bg.graph)),
  canonical: canonicalNotation(bg.graph, { defaultField: bg.theory.defaultField }),
}));
