/**
 * Hostile theory files: near-valid files (a built-in theory with values replaced by wrong
 * types, keys deleted, unknown and prototype-polluting keys added, huge arrays, deep nesting),
 * character-level mutations of the JSON text, and random JSON. parseTheory must raise only
 * TheoryErrors (naming where), never pollute Object.prototype, and a theory it accepts must be
 * usable: a small graph binds (or is refused with a CoppiceError) and inspects.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { TheoryError } from '../../src/core/errors.ts';
import { parseNotation } from '../../src/core/graph/notation-parse.ts';
import { inspectGraph } from '../../src/core/inspect/graph-report.ts';
import { bindGraph } from '../../src/core/theory/bind-graph.ts';
import { phi3 } from '../../src/core/theory/builtin/phi3.ts';
import { phi4 } from '../../src/core/theory/builtin/phi4.ts';
import { phi4On } from '../../src/core/theory/builtin/phi4-on.ts';
import { qed } from '../../src/core/theory/builtin/qed.ts';
import { yukawa } from '../../src/core/theory/builtin/yukawa.ts';
import { MAX_THEORY_FILE_LENGTH, parseTheory } from '../../src/core/theory/parse-theory.ts';
import { mutate, onlyCoppiceErrors, params, RUNS } from './fuzz-helpers.ts';

type Json = null | boolean | number | string | Json[] | { [k: string]: Json };
const bases: Json[] = [phi4, phi3, phi4On, yukawa, qed].map((t) => JSON.parse(JSON.stringify(t)) as Json);
const graphs = ['1-2 1-2 / 1 1 2 2', '1-2 1-2 1-2 /', '1-2 2-3 3-1 / 1 2 3', '1>2:psi 2>1:psi / 1:phi 2:phi', '1>2 2>1 1-2:A / 1:A 2:A', '1-2 / 1 1 1 2 2 2'];
const protoKeys = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', '__defineGetter__'];

const scalar = fc.oneof(fc.constant(null), fc.boolean(), fc.double(), fc.integer({ min: -1e6, max: 1e6 }), fc.constantFrom(0, -1, 1, 4, 8, 9, 26, 27, 1e308, -0), fc.string({ maxLength: 8 }), fc.constantFrom('phi', 'psi', 'psibar', 'A', 'lambda', '1/24', 'boson', 'fermion', 'plain', 'D0-2eps', ''));
const randomJson: fc.Arbitrary<Json> = fc.letrec<{ j: Json }>((tie) => ({
  j: fc.oneof({ maxDepth: 3, depthSize: 'small' }, scalar, fc.array(tie('j'), { maxLength: 4 }), fc.dictionary(fc.oneof(fc.string({ maxLength: 6 }), fc.constantFrom(...protoKeys)), tie('j'), { maxKeys: 4 })),
})).j;
const deep = fc.integer({ min: 1, max: 1000 }).map((d) => JSON.parse('['.repeat(d) + ']'.repeat(d)) as Json);
const huge = fc.constantFrom(
  Array.from({ length: 20_000 }, () => 'phi'),
  Array.from({ length: 300 }, (_, i) => ({ name: `f${i}`, statistics: 'boson', propagatorWeight: 2, line: 'plain' })),
  Array.from({ length: 300 }, () => ({ fields: ['phi', 'phi', 'phi', 'phi'], coupling: 'lambda' })),
);

type Edit = { path: number[]; kind: 'replace' | 'delete' | 'addKey' | 'proto'; value: Json; key: string };
const edit = fc.record({
  path: fc.array(fc.nat(), { maxLength: 4 }),
  kind: fc.constantFrom<Edit['kind']>('replace', 'replace', 'delete', 'addKey', 'proto'),
  value: fc.oneof({ weight: 6, arbitrary: randomJson }, { weight: 1, arbitrary: deep }, { weight: 1, arbitrary: huge }),
  key: fc.oneof(fc.constantFrom(...protoKeys, 'name', 'fields', 'antiparticle', 'tensor', 'extra'), fc.string({ maxLength: 5 })),
});

/** Applies one edit at a pseudo-random position (path numbers pick children modulo their count). */
function applyEdit(root: Json, e: Edit): Json {
  const doc = JSON.parse(JSON.stringify(root)) as Json;
  let parent: Json[] | { [k: string]: Json } | null = null;
  let slot: string | number = '';
  let node: Json = doc;
  for (const step of e.path) {
    if (node === null || typeof node !== 'object') break;
    const keys: (string | number)[] = Array.isArray(node) ? node.map((_, i) => i) : Object.keys(node);
    if (keys.length === 0) break;
    parent = node;
    slot = keys[step % keys.length]!;
    node = (node as Record<string | number, Json>)[slot]!;
  }
  const target: Json = node;
  if (e.kind === 'replace') {
    if (parent === null) return e.value;
    (parent as Record<string | number, Json>)[slot] = e.value;
  } else if (e.kind === 'delete' && parent !== null) {
    if (Array.isArray(parent)) parent.splice(slot as number, 1);
    else delete parent[slot as string];
  } else if (target !== null && typeof target === 'object' && !Array.isArray(target)) {
    // defineProperty so that "__proto__" becomes an own key, as JSON.parse makes it.
    Object.defineProperty(target, e.kind === 'proto' ? '__proto__' : e.key, { value: e.value, enumerable: true, writable: true, configurable: true });
  }
  return doc;
}

const nearValid = fc.tuple(fc.constantFrom(...bases), fc.array(edit, { minLength: 1, maxLength: 3 })).map(([b, edits]) => edits.reduce(applyEdit, b));
const text = fc.oneof(
  { weight: 5, arbitrary: nearValid.map((j) => JSON.stringify(j)) },
  { weight: 2, arbitrary: mutate(fc.constantFrom(...bases).map((b) => JSON.stringify(b)), '{}[]",:0123456789-.e \\tnul') },
  { weight: 1, arbitrary: randomJson.map((j) => JSON.stringify(j)) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 60 }) },
);

const prototypeKeys = () => Object.getOwnPropertyNames(Object.prototype).sort().join(',');
const cleanPrototype = prototypeKeys();

let accepted = 0;
function check(input: string | unknown): void {
  const out = onlyCoppiceErrors(input, () => {
    const t = parseTheory(input, 'theory file fuzz.json');
    for (const g of graphs) onlyCoppiceErrors(g, () => inspectGraph(bindGraph(parseNotation(g), t), { limits: { maxVertexSubsets: 1000 } }));
  });
  if (out.ok) accepted++;
  else {
    expect(out.error).toBeInstanceOf(TheoryError);
    expect((out.error as TheoryError).where).toMatch(/^theory file fuzz\.json/);
  }
  expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  expect(prototypeKeys()).toBe(cleanPrototype);
}

describe('fuzz: theory files', () => {
  it('the built-in theories pass unchanged (sanity check of the generator bases)', () => {
    for (const b of bases) expect(() => parseTheory(JSON.stringify(b))).not.toThrow();
  });

  it(`${RUNS} near-valid, mutated and random theory files (text) raise only TheoryErrors naming where`, () => {
    accepted = 0;
    fc.assert(fc.property(text, (t) => check(t)), params());
    // The generator reaches past the schema: some mutated files are still valid theories.
    expect(accepted).toBeGreaterThan(RUNS / 50);
  });

  it(`${RUNS} already-parsed objects (the app passes objects) raise only TheoryErrors`, () => {
    fc.assert(fc.property(fc.oneof({ weight: 4, arbitrary: nearValid }, { weight: 1, arbitrary: randomJson }), (j) => check(j)), params());
  });

  it('prototype-pollution keys, huge files and deep nesting', () => {
    const base = JSON.stringify(phi4);
    const cases = [
      base.replace('{', '{"__proto__":{"polluted":1},'),
      base.replace('"conventions":{', '"conventions":{"__proto__":{"polluted":1},'),
      base.replace('"fields":[{', '"fields":[{"constructor":{"prototype":{"polluted":1}},'),
      '['.repeat(200_000) + ']'.repeat(200_000),
      '{"a":'.repeat(100_000) + '1' + '}'.repeat(100_000),
      ' '.repeat(MAX_THEORY_FILE_LENGTH + 1),
      JSON.stringify({ ...phi4, fields: Array.from({ length: 50_000 }, () => phi4.fields[0]) }),
      JSON.stringify({ ...phi4, title: 'x'.repeat(900_000) }),
    ];
    for (const c of cases) check(c);
    expect(() => parseTheory(cases[0]!)).toThrow(TheoryError);
  });
});
