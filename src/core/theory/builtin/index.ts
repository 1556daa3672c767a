import { InputError } from '../../errors.ts';
import { parseTheory } from '../parse-theory.ts';
import type { Theory } from '../types.ts';
import { phi3 } from './phi3.ts';
import { phi4 } from './phi4.ts';
import { phi4On } from './phi4-on.ts';
import { qed } from './qed.ts';
import { yukawa } from './yukawa.ts';

// Built-ins go through the same validation as user files, so they can't drift from the schema.
const builtins: ReadonlyMap<string, Theory> = new Map(
  [phi4, phi4On, phi3, yukawa, qed].map((t) => [t.name, parseTheory(t, `built-in theory ${t.name}`)]),
);

/** Names of the built-in theories. */
export function builtinTheoryNames(): string[] {
  return [...builtins.keys()];
}

/** A built-in theory by name; an InputError listing the names otherwise. */
export function builtinTheory(name: string): Theory {
  const t = builtins.get(name);
  if (!t) throw new InputError(`unknown theory "${name}"`, undefined, `built-in theories: ${builtinTheoryNames().join(', ')}; or give a theory file ending in .json`);
  return t;
}
