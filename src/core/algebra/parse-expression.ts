/**
 * The expression parser for user input (and for the canonical text form).
 *
 * Grammar (whitespace is free):
 *   sum     := product (('+' | '-') product)*
 *   product := unary (('*' | '/') unary)*
 *   unary   := ('+' | '-') unary | power
 *   power   := atom ('^' unary)?                      right-associative; -2^2 = -(2^2)
 *   atom    := number | '(' sum ')' | name | name '(' sum ')'
 *   number  := digits ['.' digits] ['(' digits ')']   1.5 is exactly 3/2; 1.234(5) is 1.234 ± 0.005
 *   name    := eps | ε | pi | π | euler_gamma | a free symbol (N, g, …)
 *   calls   := zeta(k) | Gamma(x) | exp(x) | log(x)
 *
 * Hostile input is refused up front: at most 100 000 characters, nesting depth 500 (parentheses and signs),
 * number literals of at most 1000 digits. Errors are InputErrors with the offset and
 * what was expected there.
 */
import { InputError } from '../errors.ts';
import { Approx } from './approx.ts';
import { Rational } from './rational.ts';

/** The parsed expression tree; every node records where it starts in the source. */
export type ExprNode =
  | { readonly kind: 'number'; readonly value: Rational | Approx; readonly offset: number }
  | { readonly kind: 'eps'; readonly offset: number }
  | { readonly kind: 'constant'; readonly name: 'pi' | 'euler_gamma'; readonly offset: number }
  | { readonly kind: 'symbol'; readonly name: string; readonly offset: number }
  | { readonly kind: 'call'; readonly fn: 'zeta' | 'Gamma' | 'exp' | 'log'; readonly arg: ExprNode; readonly offset: number }
  | { readonly kind: 'neg'; readonly arg: ExprNode; readonly offset: number }
  | { readonly kind: 'sum'; readonly terms: readonly { readonly sign: 1 | -1; readonly node: ExprNode }[]; readonly offset: number }
  | { readonly kind: 'product'; readonly factors: readonly { readonly op: '*' | '/'; readonly node: ExprNode; readonly offset: number }[]; readonly offset: number }
  | { readonly kind: 'power'; readonly base: ExprNode; readonly exponent: ExprNode; readonly offset: number };

/** Parser limits (the defaults are generous for hand-typed input). */
export interface ParseLimits {
  readonly maxLength: number;
  readonly maxDepth: number;
  readonly maxDigits: number;
}

/** Default limits: 100 000 characters, depth 500, 1000-digit literals. */
export const DEFAULT_PARSE_LIMITS: ParseLimits = { maxLength: 100_000, maxDepth: 500, maxDigits: 1000 };

const FUNCTIONS = new Set(['zeta', 'Gamma', 'exp', 'log']);
const HINTED: Record<string, string> = {
  e: 'write exp(...) for the exponential',
  E: 'write exp(...) for the exponential',
  gamma: 'write euler_gamma for Euler\'s constant or Gamma(...) for the function',
  Pi: 'write pi',
  epsilon: 'write eps',
  ln: 'write log(...)',
  sqrt: 'write x^(1/2)',
  O: 'the series remainder O(...) is not part of an expression; ask for the order with --order',
};

/** Parses an expression; `input` names it in error messages. */
export function parseExpression(source: string, input = 'expression', limits: ParseLimits = DEFAULT_PARSE_LIMITS): ExprNode {
  if (source.length > limits.maxLength) {
    throw new InputError(`expression too long (${source.length} characters, at most ${limits.maxLength})`, { input, offset: limits.maxLength, source: source.slice(0, 200) });
  }
  let pos = 0;
  let depth = 0;
  const fail = (msg: string, at = pos, hint?: string): never => {
    throw new InputError(msg, { input, offset: at, source }, hint);
  };
  const skip = () => {
    while (pos < source.length && /\s/.test(source[pos]!)) pos++;
  };
  const peek = (): string => {
    skip();
    return source[pos] ?? '';
  };
  const describe = (): string => (pos >= source.length ? 'end of input' : `"${source[pos]}"`);
  const enter = () => {
    if (++depth > limits.maxDepth) fail(`expression nested too deeply (more than ${limits.maxDepth} levels)`, pos, 'simplify the expression');
  };

  const parseSum = (): ExprNode => {
    enter();
    const start = (skip(), pos);
    const terms: { sign: 1 | -1; node: ExprNode }[] = [{ sign: 1, node: parseProduct() }];
    for (let c = peek(); c === '+' || c === '-'; c = peek()) {
      pos++;
      terms.push({ sign: c === '+' ? 1 : -1, node: parseProduct() });
    }
    depth--;
    return terms.length === 1 ? terms[0]!.node : { kind: 'sum', terms, offset: start };
  };
  const parseProduct = (): ExprNode => {
    const start = (skip(), pos);
    const factors: { op: '*' | '/'; node: ExprNode; offset: number }[] = [{ op: '*', node: parseUnary(), offset: start }];
    for (let c = peek(); c === '*' || c === '/'; c = peek()) {
      const at = pos++;
      factors.push({ op: c, node: parseUnary(), offset: at });
    }
    return factors.length === 1 ? factors[0]!.node : { kind: 'product', factors, offset: start };
  };
  const parseUnary = (): ExprNode => {
    enter();
    const c = peek();
    let node: ExprNode;
    if (c === '-' || c === '+') {
      const at = pos++;
      const arg = parseUnary();
      node = c === '-' ? { kind: 'neg', arg, offset: at } : arg;
    } else node = parsePower();
    depth--;
    return node;
  };
  const parsePower = (): ExprNode => {
    const start = (skip(), pos);
    const base = parseAtom();
    if (peek() !== '^') return base;
    pos++;
    return { kind: 'power', base, exponent: parseUnary(), offset: start };
  };
  const parseNumber = (): ExprNode => {
    const start = pos;
    const m = /^(\d+)(?:\.(\d+))?/.exec(source.slice(pos, pos + limits.maxDigits + 2));
    if (!m) return fail('expected a number');
    if (m[0].length > limits.maxDigits) fail(`number literal longer than ${limits.maxDigits} digits`, start);
    pos += m[0].length;
    if (m[2] === undefined) return { kind: 'number', value: Rational.int(BigInt(m[1]!)), offset: start };
    const scale = 10n ** BigInt(m[2].length);
    const exact = Rational.of(BigInt(m[1]! + m[2]), scale);
    const u = /^\((\d{1,17})\)/.exec(source.slice(pos, pos + 20));
    if (!u) return { kind: 'number', value: exact, offset: start };
    pos += u[0].length;
    const value = Number(m[0]);
    const error = Number(u[1]) * 10 ** -m[2].length;
    return { kind: 'number', value: new Approx(value, error + Math.abs(value) * 2 ** -52), offset: start };
  };
  const parseAtom = (): ExprNode => {
    const c = peek();
    const start = pos;
    if (c === '') return fail('expected a number, a name or "(" but found end of input');
    if (/\d/.test(c)) return parseNumber();
    if (c === '(') {
      pos++;
      const inner = parseSum();
      if (peek() !== ')') fail(`expected ")" to close the "(" at character ${start + 1}, found ${describe()}`);
      pos++;
      return inner;
    }
    if (c === 'ε') {
      pos++;
      return { kind: 'eps', offset: start };
    }
    if (c === 'π') {
      pos++;
      return { kind: 'constant', name: 'pi', offset: start };
    }
    const m = /^[A-Za-z][A-Za-z0-9_]*/.exec(source.slice(pos, pos + 200));
    if (!m) return fail(`expected a number, a name or "(" but found ${describe()}`);
    const name = m[0];
    pos += name.length;
    if (FUNCTIONS.has(name)) {
      if (peek() !== '(') fail(`expected "(" after ${name}`, pos, `write ${name}(...)`);
      pos++;
      enter();
      const arg = parseSum();
      depth--;
      if (peek() !== ')') fail(`expected ")" to close ${name}(, found ${describe()}`);
      pos++;
      return { kind: 'call', fn: name as 'zeta' | 'Gamma' | 'exp' | 'log', arg, offset: start };
    }
    if (name === 'eps') return { kind: 'eps', offset: start };
    if (name === 'pi' || name === 'euler_gamma') return { kind: 'constant', name, offset: start };
    if (HINTED[name] !== undefined) return fail(`"${name}" is not a known name`, start, HINTED[name]);
    if (peek() === '(') return fail(`unknown function "${name}"`, start, 'functions: zeta, Gamma, exp, log');
    return { kind: 'symbol', name, offset: start };
  };

  const tree = parseSum();
  if (peek() !== '') {
    const c = source[pos]!;
    fail(
      /[\d(A-Za-z]/.test(c) ? `expected an operator (+ - * / ^) before ${describe()}` : `unexpected ${describe()}`,
      pos,
      /[\d(A-Za-z]/.test(c) ? 'multiplication must be written with *' : undefined,
    );
  }
  return tree;
}
