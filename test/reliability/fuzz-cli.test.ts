/**
 * Hostile command lines: runCli in-process with random argv built from the real verbs and
 * flags, real and broken values, and junk. The contract (DESIGN §10): exit code 0, 1, 2 or 3
 * (never 70, "internal error"); when non-zero, exactly one line on stderr and no stack trace.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { commands } from '../../src/cli/registry.ts';
import { phi4 } from '../../src/core/theory/builtin/phi4.ts';
import { expectContract, runInProcess } from './cli-helpers.ts';
import { params, RUNS } from './fuzz-helpers.ts';

const dir = mkdtempSync(join(tmpdir(), 'coppice-fuzz-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const file = (name: string, text: string) => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};
const files = {
  theory: file('good.json', JSON.stringify(phi4)),
  badTheory: file('bad.json', '{"name": "x", "fields": [}'),
  wrongTheory: file('wrong.json', JSON.stringify({ ...phi4, dimension: 'four' })),
  graph: file('graph.txt', '1-2 1-2 / 1 1 2 2\n'),
  junk: file('junk.txt', '\u0000\uFFFD{{{'),
  missing: join(dir, 'missing.json'),
};

const graphs = [
  '1-2 1-2 / 1 1 2 2', '1-2 1-2 1-2 / 1 2', '1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4', '1-2 1-2 2-3 3-1 3-1 / 1 2 2 3', '1-1 / 1 1', '/',
  '1>2:psi 2>1:psi / 1:A 2:A', 'a>b b>a a-b:A / >a a>', '1-2 2-3 3-1 / 1 2 3', '1-c{phi,phi;p2} c-2 / 1 2', 'nickel:e111|e|', 'nickel:ee11|22|ee|',
  'nickel:e12|e3|33||', 'nickel:junk', `@${files.graph}`, `@${files.junk}`, `@${files.missing}`, '1-2 / 1', '1-2 1-2 / 1 1 2', '1-', '', ' ', '1--2 /',
];
const theories = ['phi4', 'phi3', 'qed', 'yukawa', 'phi4-on', 'phi5', '', files.theory, files.badTheory, files.wrongTheory, files.missing, 'x/y'];
const numbers = ['0', '1', '2', '3', '-1', '40', '41', '1000', '1e3', '1e12', '100000000000', '2.5', 'abc', '', '99999999999999999999', '-0', '0x10', ' 1'];
const expressions = ['Gamma(1+eps)', 'Gamma(eps)*Gamma(1-eps)^2/Gamma(2-2*eps)', 'zeta(3)*eps', '1/eps', '1/(1+N)', 'log(eps)', 'Gamma(', 'x y', '', ')', '2^1000000', 'exp(1)', 'zeta(1)'];
const junkWord = fc.string({ unit: 'binary', maxLength: 8 });

const verb = fc.oneof({ weight: 12, arbitrary: fc.constantFrom(...commands.map((c) => c.name)) }, { weight: 1, arbitrary: fc.constantFrom('help', '--help', '-h', '--version', 'INSPECT', 'generate', '--json') }, { weight: 1, arbitrary: junkWord });
const valueFlag = (name: string, values: fc.Arbitrary<string>) =>
  fc.tuple(values, fc.boolean()).map(([v, joined]) => (joined ? [`--${name}=${v}`] : [`--${name}`, v]));
const word = fc.oneof(
  { weight: 6, arbitrary: valueFlag('graph', fc.oneof(fc.constantFrom(...graphs), junkWord)) },
  { weight: 5, arbitrary: valueFlag('theory', fc.constantFrom(...theories)) },
  { weight: 3, arbitrary: fc.constantFrom('--json', '--latex', '--nickel', '--symbolic', '--quiet', '--unlabelled-legs', '--json=1', '--', '-', '-h', '--help', '--').map((f) => [f]) },
  { weight: 2, arbitrary: valueFlag('order', fc.constantFrom(...numbers)) },
  { weight: 2, arbitrary: valueFlag('samples', fc.constantFrom('1', '100', '1000', '1e3', '0', '-5', 'many', '1e11', '1e12', '100000000000', '1.5')) },
  { weight: 2, arbitrary: fc.tuple(fc.constantFrom('seed', 'workers', 'max-vertex-subsets', 'max-forest-search-steps', 'max-forest-terms', 'max-edges', 'max-exact-hepp-edges', 'max-samples', 'remove-vertex', 'nope'), fc.constantFrom(...numbers.filter((n) => !/1e12|1000000/.test(n)))).chain(([f, v]) => valueFlag(f, fc.constant(v))) },
  { weight: 3, arbitrary: fc.constantFrom(...expressions).map((e) => [e]) },
  { weight: 1, arbitrary: junkWord.map((w) => [w]) },
  { weight: 1, arbitrary: fc.constantFrom('--graph', '--theory', '--order', '--samples').map((f) => [f]) }, // a value flag at the end
);
const soupArgv = fc.tuple(verb, fc.array(word, { maxLength: 7 })).map(([v, ws]) => [v, ...ws.flat()]);

/** Mostly-sensible requests per verb, so the commands run to the end; extra words perturb them. */
const g = fc.constantFrom(...graphs.slice(0, 14));
const t = fc.constantFrom('phi4', 'phi4', 'phi3', 'qed', 'yukawa', 'phi4-on', files.theory);
const opt = (...f: string[]) => fc.subarray(f);
const template = fc.oneof(
  fc.tuple(t, g, opt('--json', '--nickel')).map(([th, gr, o]) => ['inspect', '--theory', th, '--graph', gr, ...o]),
  fc.tuple(fc.constantFrom(...expressions), fc.constantFrom('0', '1', '2', '-1', '3', '41', '1000'), opt('--json', '--latex')).map(([e, n, o]) => ['expand', e, '--order', n, ...o]),
  fc.tuple(fc.constantFrom('1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4', '1-2 1-3 1-4 1-5 2-3 2-4 2-5 3-4 3-5 4-5 /', '1-2 1-2 / 1 1 2 2', 'nickel:e112|e3|e3|e|'), fc.constantFrom('100', '1000', '1e3', '1e11', '1e12'), opt('--json', '--quiet')).map(([gr, n, o]) => ['period', '--theory', 'phi4', '--graph', gr, '--samples', n, ...o]),
  fc.tuple(fc.constantFrom('coproduct', 'counterterm'), t, g, opt('--json', '--latex', '--symbolic', '--symbolic')).map(([c, th, gr, o]) => [c, '--theory', th, '--graph', gr, ...o]),
  fc.tuple(g, g, opt('--json', '--unlabelled-legs')).map(([a, b, o]) => ['iso', '--graph', a, '--graph', b, ...o]),
  // Small loop numbers only, except 12 and 100 loops with four legs, which the up-front estimate
  // refuses (vacuum graphs at 12 loops are not refused up front: see limits.test.ts).
  fc.tuple(t, fc.constantFrom('0', '2', '4', 'phi,phi', 'psi,psibar', '', 'x'), fc.constantFrom('0', '1', '2', '-1', 'two'), opt('--json', '--all')).map(([th, legs, loops, o]) => ['generate', '--theory', th, '--legs', legs, '--loops', loops, ...o]),
  fc.constantFrom('12', '100').map((loops) => ['generate', '--theory', 'phi4', '--legs', '4', '--loops', loops]),
);
const perturbed = fc.tuple(template, fc.array(word, { maxLength: 2 })).map(([a, ws]) => [...a, ...ws.flat()]);
const argvArb = fc.oneof({ weight: 3, arbitrary: template }, { weight: 2, arbitrary: perturbed }, { weight: 2, arbitrary: soupArgv });

/** Keeps every random period request small: no huge sample counts through raised limits. */
function bounded(argv: string[]): string[] {
  if (argv[0] !== 'period') return argv;
  const safe = argv.filter((a, i) => !/^--max-samples/.test(a) && !/^--max-samples$/.test(argv[i - 1] ?? ''));
  return safe.some((a) => a.startsWith('--samples')) ? safe : [...safe, '--samples', '1000'];
}

describe('fuzz: command lines', () => {
  it(`${RUNS} random command lines keep the exit-code and stream contract`, async () => {
    const seen = new Map<number, number>();
    await fc.assert(
      fc.asyncProperty(argvArb, async (raw) => {
        const argv = bounded(raw);
        const t0 = performance.now();
        const r = await runInProcess(argv);
        const ms = performance.now() - t0;
        seen.set(r.code, (seen.get(r.code) ?? 0) + 1);
        expectContract(argv, r);
        expect(ms, `argv ${JSON.stringify(argv)} took ${ms.toFixed(0)} ms`).toBeLessThan(3000);
      }),
      params(),
    );
    // Every outcome class is exercised, not just "bad input".
    for (const code of [0, 1, 2, 3]) expect(seen.get(code) ?? 0, `exit ${code} seen ${seen.get(code) ?? 0} times`).toBeGreaterThan(0);
  });
});
