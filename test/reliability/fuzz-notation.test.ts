/**
 * Hostile input for the compact graph notation: parseNotation, then bindGraph against every
 * built-in theory, then (for graphs that bind) inspect with small work limits. Only
 * CoppiceErrors may escape; parse errors are InputErrors with an offset inside the text.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.ts';
import { inspectGraph } from '../../src/core/inspect/graph-report.ts';
import { MAX_NOTATION_LENGTH, parseNotation } from '../../src/core/graph/notation-parse.ts';
import { bindGraph } from '../../src/core/theory/bind-graph.ts';
import { builtinTheory, builtinTheoryNames } from '../../src/core/theory/builtin/index.ts';
import { printNotation } from '../../src/core/graph/notation-print.ts';
import { randomTheoryGraph, rng } from '../helpers/random-graphs.ts';
import { mutate, onlyCoppiceErrors, params, RUNS, soup } from './fuzz-helpers.ts';

const theories = builtinTheoryNames().map(builtinTheory);
const smallLimits = { maxVertexSubsets: 2000, maxDivergentSubgraphs: 200, maxForests: 2000, maxForestSearchSteps: 20_000 };

const vertex = fc.constantFrom('1', '2', '3', '4', 'a', 'b', 'c', '_', 'v10', '0');
const field = fc.constantFrom('phi', 'psi', 'psibar', 'A', 'sigma', "phi'", 'x', 'phibar');
const ctMark = fc.constantFrom('{phi,phi;p2}', '{phi,phi,phi,phi}', '{psi,psibar;pslash}', '{A,A;p2}', '{phi,phi;m2}', '{phi;}', '{', '{phi', '{phi,phi;p2', '{ phi , phi ; q }', '{}');
const end = fc.tuple(vertex, fc.option(ctMark, { freq: 5 })).map(([v, m]) => v + (m ?? ''));
const edge = fc.tuple(end, fc.constantFrom('-', '-', '>', '<', '--', '->', ''), end, fc.option(field, { freq: 2 })).map(([a, op, b, f]) => `${a}${op}${b}${f === null ? '' : `:${f}`}`);
const leg = fc.tuple(fc.constantFrom('', '', '>'), end, fc.constantFrom('', '', '>'), fc.option(field, { freq: 2 })).map(([pre, v, post, f]) => `${pre}${v}${post}${f === null ? '' : `:${f}`}`);
const wellFormed = fc.tuple(fc.array(edge, { maxLength: 8 }), fc.array(leg, { maxLength: 6 })).map(([es, ls]) => `${es.join(' ')} / ${ls.join(' ')}`);
// Graphs that belong to a theory (so binding and inspection run), printed, sometimes mutated.
const theoryGraph = fc
  .tuple(fc.constantFrom(...theories), fc.integer({ min: 1, max: 2 ** 31 - 1 }), fc.integer({ min: 1, max: 6 }), fc.constantFrom(0, 0.2, 0.5))
  .map(([t, seed, vertices, legProbability]) => {
    try {
      return printNotation(randomTheoryGraph(t, rng(seed), { vertices, legProbability, maxEdges: 10 }), { defaultField: t.defaultField });
    } catch {
      return '1-2 1-2 / 1 1 2 2'; // the generator found no connected graph of that size
    }
  });
const notation = fc.oneof(
  { weight: 3, arbitrary: theoryGraph },
  { weight: 2, arbitrary: mutate(theoryGraph, '-></:{},; \t\nab12_') },
  { weight: 2, arbitrary: wellFormed },
  { weight: 2, arbitrary: mutate(wellFormed, '-></:{},; \t\nab12_') },
  { weight: 2, arbitrary: soup(fc.oneof(edge, leg, fc.constant('/'))) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
);

function check(text: string): void {
  const out = onlyCoppiceErrors(text, () => {
    const g = parseNotation(text);
    for (const t of theories) {
      onlyCoppiceErrors(text, () => inspectGraph(bindGraph(g, t), { limits: smallLimits }));
    }
  });
  if (!out.ok && out.error instanceof InputError && out.error.position) {
    // The offset points into the text (or just past its end).
    expect(out.error.position.offset).toBeGreaterThanOrEqual(0);
    expect(out.error.position.offset).toBeLessThanOrEqual(text.length);
  }
}

describe('fuzz: compact notation → bindGraph (every built-in theory) → inspect', () => {
  it(`${RUNS} random notations raise only CoppiceErrors, each case bounded`, () => {
    fc.assert(fc.property(notation, (text) => check(text)), params());
  });

  it('huge and deep inputs are refused or handled without a crash', () => {
    const cases = [
      '1-2 '.repeat(20_000) + '/ 1 2', // 80 000 characters, 20 000 parallel lines
      'x'.repeat(MAX_NOTATION_LENGTH + 1),
      '{'.repeat(50_000),
      '1{' + 'phi,'.repeat(20_000) + 'phi} 1-2 / 2',
      Array.from({ length: 5000 }, (_, i) => `v${i}-v${i + 1}`).join(' ') + ' / v0 v5000', // a 5000-vertex chain
      '/ ' + '1 '.repeat(40_000),
      'a'.repeat(99_990) + '-b /',
    ];
    for (const text of cases) check(text);
    expect(() => parseNotation('x'.repeat(MAX_NOTATION_LENGTH + 1))).toThrow(InputError);
  });
});
