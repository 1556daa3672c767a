import { evaluatePolyApprox, expandExpression, formatPoly, MAX_EXPANSION_ORDER, MAX_TERM_PRODUCTS, seriesToLatex, variableInfo, type Series } from '../../core/algebra/index.ts';
import { InputError, LimitError } from '../../core/errors.ts';
import { flag, hasFlag, type ParsedArgs } from '../args.ts';
import { EXIT, type CliIO, type Command } from '../command.ts';

const USAGE = `usage: coppice expand "<expression>" [--order n] [--json | --latex] [--max-term-products N]

The Laurent expansion in eps of an expression, exact through eps^n (default n = 0;
|n| at most ${MAX_EXPANSION_ORDER}). D = 4 - 2*eps conventions are up to you: eps is just the variable.

expressions: + - * / ^ and parentheses; integers, fractions 1/3, decimals 1.5 (exact, = 3/2)
and approximate values 1.234(5) (= 1.234 ± 0.005); eps, pi, euler_gamma, zeta(k),
Gamma(n + a*eps), exp(...), log(...) of positive rationals, and free symbols such as N.

output: one line per power of eps, from the leading pole through eps^n, each coefficient
in the canonical text form, with its floating value when it has no free symbols.
--json: {"series": {"<power>": "<canonical exact>", ...}, "order": n}, every power present
(zeros as "0"); when some coefficients are approximate, also "approximate": ["<power>", ...].
--latex: the expansion as one LaTeX expression.
--max-term-products: the work allowed, in products of polynomial terms weighted by their size
(default ${MAX_TERM_PRODUCTS}, a few seconds); larger requests are refused with exit 3.

example: coppice expand "Gamma(eps)*Gamma(1-eps)^2/Gamma(2-2*eps)*exp(euler_gamma*eps)" --order 2`;

function readOrder(args: ParsedArgs): number {
  const v = flag(args, 'order');
  if (v === undefined) return 0;
  if (!/^-?\d+$/.test(v)) throw new InputError(`--order must be an integer, got "${v}"`, undefined, 'write e.g. --order 2');
  const n = Number(v);
  if (!Number.isSafeInteger(n) || Math.abs(n) > MAX_EXPANSION_ORDER) {
    throw new LimitError('expansion order', 'maxOrder', MAX_EXPANSION_ORDER, v, `ask for an order between -${MAX_EXPANSION_ORDER} and ${MAX_EXPANSION_ORDER}`);
  }
  return n;
}

function readMaxTermProducts(args: ParsedArgs): number {
  const v = flag(args, 'max-term-products');
  if (v === undefined) return MAX_TERM_PRODUCTS;
  if (!/^\d+$/.test(v) || !Number.isSafeInteger(Number(v)) || Number(v) < 1) {
    throw new InputError(`--max-term-products must be a positive integer, got "${v}"`, undefined, `e.g. --max-term-products ${MAX_TERM_PRODUCTS * 10}`);
  }
  return Number(v);
}

/** The powers reported: from the leading pole (or eps^0) through the order. */
function powers(s: Series, order: number): number[] {
  const start = Math.min(Number.isFinite(s.val) ? s.val : 0, 0, order);
  const out: number[] = [];
  for (let p = start; p <= order; p++) out.push(p);
  return out;
}

function numericNote(s: Series, p: number): string {
  const c = s.coeff(p);
  if (c.isZero()) return '';
  if (c.terms().some((t) => t.mono.factors.some((f) => variableInfo(f.name).kind === 'symbol'))) return '';
  const v = evaluatePolyApprox(c);
  return c.isExact() ? `≈ ${Number(v.value.toPrecision(12))}` : `≈ ${v.toString()}, approximate`;
}

export const expandCommand: Command = {
  name: 'expand',
  summary: 'Laurent expansion in eps of an expression with Gammas, zeta values and constants',
  usage: USAGE,
  flags: { booleans: ['json', 'latex'], values: ['order', 'max-term-products'] },
  run(args: ParsedArgs, io: CliIO): number {
    if (args.positional.length !== 1) {
      throw new InputError(
        args.positional.length === 0 ? 'missing the expression to expand' : `expected one expression, got ${args.positional.length} words`,
        undefined,
        'quote the expression: coppice expand "Gamma(1+eps)" --order 3',
      );
    }
    const order = readOrder(args);
    const s = expandExpression(args.positional[0]!, order, { maxTermProducts: readMaxTermProducts(args), cancel: io.cancel });
    const ps = powers(s, order);
    const approximate = ps.filter((p) => !s.coeff(p).isExact()).map(String);
    if (hasFlag(args, 'json')) {
      // Written by hand so that the powers keep their numeric order (JS objects put "0" before "-1").
      const series = ps.map((p) => `${JSON.stringify(String(p))}:${JSON.stringify(formatPoly(s.coeff(p)))}`).join(',');
      const extra = approximate.length ? `,"approximate":${JSON.stringify(approximate)}` : '';
      io.out(`{"series":{${series}},"order":${order}${extra}}\n`);
      return EXIT.ok;
    }
    if (hasFlag(args, 'latex')) {
      io.out(seriesToLatex(s) + '\n');
      return EXIT.ok;
    }
    const labels = ps.map((p) => `eps^${p}`);
    const width = Math.max(...labels.map((l) => l.length));
    const lines = [`Laurent expansion in eps, exact through eps^${order}:`];
    ps.forEach((p, i) => {
      const text = formatPoly(s.coeff(p));
      const note = numericNote(s, p);
      lines.push(`  ${(labels[i]! + ':').padEnd(width + 1)}  ${text}${note ? `    (${note})` : ''}`);
    });
    lines.push(`  + O(eps^${order + 1})`);
    if (approximate.length) lines.push(`approximate coefficients (the rest are exact): ${approximate.map((p) => `eps^${p}`).join(', ')}`);
    io.out(lines.join('\n') + '\n');
    return EXIT.ok;
  },
};
