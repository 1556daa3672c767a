/**
 * Hostile expressions for `coppice expand`: parseExpression, then the full expansion at small
 * orders. Grammar-aware trees (Gammas, zeta values, exp, log, powers, free symbols) mixed with
 * mutations and junk. Only CoppiceErrors may escape (InputError with an offset, or LimitError).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expandExpression, MAX_EXPANSION_ORDER } from '../../src/core/algebra/index.ts';
import { DEFAULT_PARSE_LIMITS, parseExpression } from '../../src/core/algebra/parse-expression.ts';
import { InputError, LimitError } from '../../src/core/errors.ts';
import { mutate, onlyCoppiceErrors, params, RUNS, soup } from './fuzz-helpers.ts';

const atom = fc.oneof(
  fc.constantFrom('eps', 'ε', 'pi', 'π', 'euler_gamma', 'N', 'g', '0', '1', '2', '3', '1/2', '1.5', '0.25', '1.234(5)', '10', '-1', '2*eps', '-eps', 'zeta(3)', 'zeta(2)', 'zeta(5)', 'log(2)', 'Gamma(1+eps)', 'Gamma(1-eps)', 'Gamma(eps)', 'Gamma(2-2*eps)', 'exp(euler_gamma*eps)', 'Gamma(1/2)'),
  fc.integer({ min: 0, max: 99 }).map(String),
);
const expr: fc.Arbitrary<string> = fc.letrec<{ e: string }>((tie) => ({
  e: fc.oneof(
    { maxDepth: 4, depthSize: 'small' },
    atom,
    fc.tuple(tie('e'), fc.constantFrom('+', '-', '*', '/', '*', '/'), tie('e')).map(([a, op, b]) => `${a}${op}${b}`),
    fc.tuple(tie('e'), fc.constantFrom('2', '3', '-1', '-2', '1/2', 'eps', '(1+eps)', '0')).map(([a, k]) => `(${a})^${k}`),
    tie('e').map((a) => `(${a})`),
    tie('e').map((a) => `-${a}`),
    fc.tuple(fc.constantFrom('Gamma', 'exp', 'log', 'zeta'), tie('e')).map(([f, a]) => `${f}(${a})`),
    fc.tuple(fc.integer({ min: -3, max: 4 }), fc.constantFrom('', '+eps', '-eps', '+2*eps', '-eps/2', '+N*eps')).map(([n, d]) => `Gamma(${n}${d})`),
  ),
})).e;
const expression = fc.oneof(
  { weight: 5, arbitrary: expr },
  { weight: 2, arbitrary: mutate(expr, '()+-*/^.,1eps Ge') },
  { weight: 1, arbitrary: soup(atom, { separators: ['', ' ', '+', '*', '(', ')', '^'] }) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 30 }) },
);
const order = fc.integer({ min: -2, max: 3 });

let expanded = 0;
function check(text: string, n: number): void {
  const out = onlyCoppiceErrors({ text, n }, () => {
    parseExpression(text);
    expandExpression(text, n);
  });
  if (out.ok) expanded++;
  else {
    const e = out.error;
    expect(e instanceof InputError || e instanceof LimitError, `${e.name}: ${e.message}`).toBe(true);
    if (e instanceof InputError && e.position) expect(e.position.offset).toBeLessThanOrEqual(Math.max(text.length, DEFAULT_PARSE_LIMITS.maxLength));
  }
}

describe('fuzz: expressions for expand', () => {
  it(`${RUNS} random expressions: parse and expand (orders −2…3) raise only CoppiceErrors, each case bounded`, () => {
    expanded = 0;
    fc.assert(fc.property(expression, order, (text, n) => check(text, n)), params());
    expect(expanded).toBeGreaterThan(RUNS / 10); // the generator reaches the expansion code
  });

  it('huge and deep inputs', () => {
    const cases = [
      '('.repeat(10_000) + '1' + ')'.repeat(10_000),
      '-'.repeat(10_000) + '1',
      '2^'.repeat(5000) + '2',
      '1+'.repeat(40_000) + '1',
      'eps*'.repeat(20_000) + 'eps',
      '9'.repeat(5000),
      '1.' + '9'.repeat(999) + '(5)',
      'x'.repeat(DEFAULT_PARSE_LIMITS.maxLength + 1),
      'Gamma('.repeat(400) + 'eps' + ')'.repeat(400),
      'zeta(100000000000000000000)',
      'zeta(1000)',
      '2^1000000000',
      '(1+eps)^100000000000',
      '10^10^10',
      'eps^-1000000',
      'eps^1000000',
      '(1/eps)^1000',
      'Gamma(-1000000000+eps)',
      'Gamma(1000000+eps)',
      '1/(eps^40)',
      '99999999999999999999999999^99999',
      'exp(eps)^1000000',
    ];
    for (const text of cases) check(text, 2);
    expect(() => expandExpression('1', MAX_EXPANSION_ORDER + 1)).toThrow(LimitError);
  });
});
