/**
 * Hostile input for Nickel indices: parseNickel, then bind to φ⁴ / φ³ and take the graph's
 * own Nickel index back (toNickel runs the canonical search). Only CoppiceErrors may escape.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { toNickel } from '../../src/core/canon/nickel-index.ts';
import { MAX_NICKEL_LENGTH, NICKEL_DIGITS, parseNickel } from '../../src/core/canon/nickel-parse.ts';
import { InputError } from '../../src/core/errors.ts';
import { bindGraph } from '../../src/core/theory/bind-graph.ts';
import { builtinTheory } from '../../src/core/theory/builtin/index.ts';
import { mutate, onlyCoppiceErrors, params, RUNS, soup } from './fuzz-helpers.ts';

const phi4 = builtinTheory('phi4');
const phi3 = builtinTheory('phi3');

/** A syntactically valid index on up to `n` vertices: each list holds 'e's and numbers ≥ its own. */
const validIndex = fc.integer({ min: 1, max: 9 }).chain((n) =>
  fc
    .array(
      fc.nat({ max: n - 1 }).chain((v) => fc.array(fc.oneof(fc.constant('e'), fc.integer({ min: v, max: n - 1 }).map((d) => NICKEL_DIGITS[d]!)), { maxLength: 4 })),
      { minLength: n, maxLength: n },
    )
    .map((lists) => lists.map((l) => [...l].sort((x, y) => (x === 'e' ? -1 : y === 'e' ? 1 : NICKEL_DIGITS.indexOf(x) - NICKEL_DIGITS.indexOf(y))).join('')).join('|') + '|'),
);
const known = fc.constantFrom('e111|e|', 'ee0|', '123|23|3||', 'e12|e3|33||', 'ee11|22|ee|', 'e112|2|e|', 'e12|e23|3|e|', 'e123|e23|3|e|');
const nickel = fc.oneof(
  { weight: 3, arbitrary: validIndex },
  { weight: 3, arbitrary: mutate(fc.oneof(validIndex, known), 'e|0123456789AZ ez-') },
  { weight: 2, arbitrary: soup(fc.constantFrom('e', '|', '1', '2', '3', 'A', 'Z', 'ee', '||', '0', '9'), { separators: ['', '', '', ' '] }) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 30 }) },
);

function check(text: string): void {
  const out = onlyCoppiceErrors(text, () => {
    const g = parseNickel(text);
    for (const t of [phi4, phi3]) onlyCoppiceErrors(text, () => bindGraph(g, t));
    toNickel(g);
  });
  if (!out.ok) {
    expect(out.error).toBeInstanceOf(InputError);
    const p = (out.error as InputError).position;
    if (p) expect(p.offset).toBeGreaterThanOrEqual(0);
  }
}

describe('fuzz: Nickel index → bindGraph → toNickel', () => {
  it(`${RUNS} random indices raise only InputErrors, each case bounded`, () => {
    fc.assert(fc.property(nickel, (text) => check(text)), params());
  });

  it('huge inputs: too many vertices, too long, many parallel lines', () => {
    const cases = [
      'e|'.repeat(40), // 40 vertices: more than the 36 digits
      '1'.repeat(MAX_NICKEL_LENGTH + 1),
      '1'.repeat(5000) + '|e|', // 5000 parallel lines
      Array.from({ length: 35 }, (_, i) => `e${NICKEL_DIGITS[i + 1]}`).join('|') + '|e|', // a 36-vertex chain
      '|'.repeat(9000),
      ' '.repeat(9000) + 'e111|e|' + '\n'.repeat(3000),
    ];
    for (const text of cases) check(text);
  });
});
