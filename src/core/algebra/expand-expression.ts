/**
 * Evaluating a parsed expression to its Laurent expansion in ε, exact through a requested
 * order. Every subexpression is computed with a truncation cap; since the series track
 * their own precision, the result says how far it is known, and when poles have eaten
 * orders the evaluation is repeated with a larger cap until the requested order is reached.
 *
 * Products are evaluated factor by factor, except that Gamma(...) and exp(...) factors of
 * one product are combined in exponential form (one exp of a sum of log-series).
 */
import { CoppiceError, InputError, LimitError } from '../errors.ts';
import { AlgebraError } from './algebra-error.ts';
import { EXP_FORM_ONE, expFormToSeries, invertExpForm, mulExpForms, type ExpForm } from './exp-form.ts';
import { gammaExpForm, splitGammaArgument } from './gamma.ts';
import { variable } from './monomial.ts';
import { parseExpression, type ExprNode } from './parse-expression.ts';
import { Poly } from './polynomial.ts';
import { divide } from './series-inverse.ts';
import { logSeries } from './series-exp-log.ts';
import { powSeries } from './series-power.ts';
import { Series } from './series.ts';
import { Rational } from './rational.ts';
import { MAX_ZETA_ARGUMENT, zetaPoly } from './zeta.ts';
import { MAX_TERM_PRODUCTS, withWorkBudget } from './work-budget.ts';
import type { CancelToken } from '../util/cancel.ts';

/** Highest order `expand` accepts. */
export const MAX_EXPANSION_ORDER = 40;

/** Options of `expandExpression`. */
export interface ExpandOptions {
  /** Name of the input in error messages (default "expression"). */
  readonly input?: string;
  /** Highest order accepted (default MAX_EXPANSION_ORDER = 40). */
  readonly maxOrder?: number;
  /** Products of polynomial terms allowed (default MAX_TERM_PRODUCTS); a LimitError names maxTermProducts. */
  readonly maxTermProducts?: number;
  /** Polled as the work is done. */
  readonly cancel?: CancelToken;
}

/**
 * The Laurent expansion of an expression (text or parsed), exact through ε^order.
 * Throws InputError (with the position) for bad or non-exact expressions and LimitError for
 * requests beyond the limits.
 */
export function expandExpression(expr: string | ExprNode, order: number, options: ExpandOptions = {}): Series {
  const maxOrder = options.maxOrder ?? MAX_EXPANSION_ORDER;
  if (!Number.isInteger(order)) throw new RangeError(`order must be an integer, got ${order}`);
  if (Math.abs(order) > maxOrder) {
    throw new LimitError('expansion order', 'maxOrder', maxOrder, order, `ask for an order between -${maxOrder} and ${maxOrder}`);
  }
  const source = typeof expr === 'string' ? expr : undefined;
  const input = options.input ?? 'expression';
  const tree = typeof expr === 'string' ? parseExpression(expr, input) : expr;
  const ctx: Ctx = { source, input };
  return withWorkBudget(options.maxTermProducts ?? MAX_TERM_PRODUCTS, options.cancel, () => expandTree(tree, order, maxOrder, ctx));
}

function expandTree(tree: ExprNode, order: number, maxOrder: number, ctx: Ctx): Series {
  let cap = order;
  for (let attempt = 0; attempt < 12; attempt++) {
    const s = evaluate(tree, cap, ctx);
    if (s.order >= order) return s.truncate(order);
    cap += order - s.order;
    if (cap > order + 4 * maxOrder + 40) break;
  }
  throw new LimitError('working order needed for the expansion', 'maxWorkingOrder', order + 4 * maxOrder + 40, 'more', 'the expression loses too many orders to poles; simplify it');
}

interface Ctx {
  readonly source: string | undefined;
  readonly input: string;
}

function located<T>(node: { readonly offset: number }, ctx: Ctx, f: () => T): T {
  try {
    return f();
  } catch (e) {
    if (e instanceof AlgebraError) throw new InputError(e.message, { input: ctx.input, offset: node.offset, source: ctx.source }, e.hint);
    if (e instanceof RangeError && !(e instanceof CoppiceError)) {
      throw new InputError(e.message, { input: ctx.input, offset: node.offset, source: ctx.source });
    }
    throw e;
  }
}

function evaluate(node: ExprNode, cap: number, ctx: Ctx): Series {
  return located(node, ctx, () => evaluateHere(node, cap, ctx));
}

function evaluateHere(node: ExprNode, cap: number, ctx: Ctx): Series {
  switch (node.kind) {
    case 'number':
      return Series.constant(Poly.constant(node.value));
    case 'eps':
      return Series.EPS;
    case 'constant':
    case 'symbol':
      return Series.constant(Poly.term(Rational.ONE, variable(node.name)));
    case 'neg':
      return evaluate(node.arg, cap, ctx).neg();
    case 'sum': {
      let s = Series.ZERO;
      for (const t of node.terms) {
        const v = evaluate(t.node, cap, ctx);
        s = s.add(t.sign === 1 ? v : v.neg());
      }
      return s.truncate(cap);
    }
    case 'product':
      return evaluateProduct(node.factors, cap, ctx);
    case 'power': {
      const base = evaluate(node.base, cap, ctx);
      const exponent = evaluate(node.exponent, cap, ctx);
      return powSeries(base, exponent, cap);
    }
    case 'call':
      return evaluateCall(node, cap, ctx);
  }
}

function evaluateCall(node: Extract<ExprNode, { kind: 'call' }>, cap: number, ctx: Ctx): Series {
  switch (node.fn) {
    case 'zeta': {
      const arg = evaluate(node.arg, 0, ctx);
      const k = arg.isExact() && arg.order === Infinity && arg.val >= 0 && arg.coeffs.length <= 1 ? arg.coeff(0).asRational() : undefined;
      if (!k || !k.isInteger() || k.n < 2n) {
        throw new AlgebraError('zeta(k) needs an integer k ≥ 2', 'zeta(1) is the pole of the zeta function; write zeta(3), zeta(4), …');
      }
      if (k.n > BigInt(MAX_ZETA_ARGUMENT)) throw new LimitError('zeta argument', 'maxZetaArgument', MAX_ZETA_ARGUMENT, k.n.toString(), `use zeta(k) with k ≤ ${MAX_ZETA_ARGUMENT}`);
      return Series.constant(zetaPoly(Number(k.n)));
    }
    case 'log':
      return logSeries(evaluate(node.arg, cap, ctx), cap);
    case 'Gamma':
    case 'exp':
      return expFormToSeries(expFormOf(node, cap + 1, ctx), cap);
  }
}

/** Γ(x) or exp(x) in exponential form, log-series through ε^cap. */
function expFormOf(node: Extract<ExprNode, { kind: 'call' }>, cap: number, ctx: Ctx): ExpForm {
  const arg = evaluate(node.arg, cap, ctx);
  if (node.fn === 'exp') {
    if (arg.val < 1 && !arg.isZero()) {
      throw new AlgebraError(
        arg.val < 0 ? 'exp of a series with a pole in eps has no Laurent expansion' : 'exp of an argument that does not vanish at eps = 0 is not exact',
        'exp(...) takes arguments like euler_gamma*eps; move constant factors outside',
      );
    }
    return { prefactor: Poly.ONE, epsPower: 0, log: arg };
  }
  const { n, delta } = splitGammaArgument(arg);
  return gammaExpForm(n, delta, cap);
}

type ProductFactors = Extract<ExprNode, { kind: 'product' }>['factors'];
type CallNode = Extract<ExprNode, { kind: 'call' }>;
interface Flat {
  readonly sign: 1 | -1;
  readonly node: ExprNode;
  readonly offset: number;
}

/** Flattens nested products: a/(b*c) becomes a, b⁻¹, c⁻¹. */
function flatten(factors: ProductFactors, sign: 1 | -1, out: Flat[]): Flat[] {
  for (const f of factors) {
    const s = (f.op === '*' ? sign : -sign) as 1 | -1;
    if (f.node.kind === 'product') flatten(f.node.factors, s, out);
    else out.push({ sign: s, node: f.node, offset: f.offset });
  }
  return out;
}

/** Γ(x)^k or exp(x)^k with an integer literal k (k = 1 for a bare call). */
function gammaLike(node: ExprNode): { call: CallNode; k: number } | undefined {
  const isCall = (n: ExprNode): n is CallNode => n.kind === 'call' && (n.fn === 'Gamma' || n.fn === 'exp');
  if (isCall(node)) return { call: node, k: 1 };
  if (node.kind !== 'power' || !isCall(node.base)) return undefined;
  let e = node.exponent;
  let sign = 1;
  if (e.kind === 'neg') {
    sign = -1;
    e = e.arg;
  }
  if (e.kind !== 'number' || !(e.value instanceof Rational) || !e.value.isInteger() || e.value.abs().compare(Rational.int(64)) > 0) return undefined;
  return { call: node.base, k: sign * Number(e.value.n) };
}

function powExpForm(f: ExpForm, k: number): ExpForm {
  const base = k < 0 ? invertExpForm(f) : f;
  const m = Math.abs(k);
  return { prefactor: base.prefactor.pow(m), epsPower: base.epsPower * m, log: base.log.scale(Rational.int(m)) };
}

/**
 * A product: Gamma/exp factors (with integer powers) go into one exponential form, the
 * others are multiplied or divided as series. The leading power V of the whole product is
 * found first, so that every piece is computed to exactly the relative precision cap − V.
 */
function evaluateProduct(factors: ProductFactors, cap: number, ctx: Ctx): Series {
  const flat = flatten(factors, 1, []);
  const special: { f: Flat; call: CallNode; k: number; arg: Series; pole: number }[] = [];
  const regular: { f: Flat; value: Series }[] = [];
  let V = 0;
  for (const f of flat) {
    const g = gammaLike(f.node);
    if (g) {
      const arg = evaluate(g.call.arg, cap, ctx);
      let pole = 0;
      if (g.call.fn === 'Gamma') {
        const { n, delta } = located(g.call, ctx, () => splitGammaArgument(arg));
        if (n <= 0 && Number.isFinite(delta.val)) pole = delta.val;
      }
      special.push({ f, call: g.call, k: g.k * f.sign, arg, pole });
      V -= pole * g.k * f.sign;
    } else {
      const value = evaluate(f.node, cap, ctx);
      regular.push({ f, value });
      if (Number.isFinite(value.val)) V += f.sign * value.val;
    }
  }
  const rel = cap - V;
  let form: ExpForm = EXP_FORM_ONE;
  for (const sp of special) {
    const arg = rel > cap && sp.arg.order < rel ? evaluate(sp.call.arg, rel, ctx) : sp.arg;
    const one = located(sp.call, ctx, (): ExpForm => {
      if (sp.call.fn === 'exp') {
        if (arg.val < 1 && !arg.isZero()) {
          throw new AlgebraError(
            arg.val < 0 ? 'exp of a series with a pole in eps has no Laurent expansion' : 'exp of an argument that does not vanish at eps = 0 is not exact',
            'exp(...) takes arguments like euler_gamma*eps; move constant factors outside',
          );
        }
        return { prefactor: Poly.ONE, epsPower: 0, log: arg };
      }
      const { n, delta } = splitGammaArgument(arg);
      return gammaExpForm(n, delta, rel);
    });
    form = mulExpForms(form, located(sp.f, ctx, () => powExpForm(one, sp.k)));
  }
  let numerator = Series.ONE;
  let denominator = Series.ONE;
  for (const r of regular) {
    let v = r.value;
    const need = (Number.isFinite(v.val) ? v.val : 0) + rel;
    if (v.order < need && need > cap) v = evaluate(r.f.node, need, ctx);
    if (r.f.sign === 1) numerator = numerator.mul(v);
    else denominator = denominator.mul(v);
  }
  const main = form === EXP_FORM_ONE ? Series.ONE : expFormToSeries(form, cap - (V - form.epsPower));
  const top = numerator.mul(main);
  if (denominator === Series.ONE) return top.truncate(cap);
  return located(flat.find((f) => f.sign === -1)!, ctx, () => divide(top, denominator, cap));
}
