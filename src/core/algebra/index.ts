/**
 * Exact and approximate arithmetic (DESIGN §4): BigInt rationals, polynomials in constants
 * and symbols, precision-tracking Laurent series in ε, Gamma expansions, the expression
 * parser, the canonical text form, LaTeX, floating evaluation and the tagged JSON codec.
 */
export { Rational, bigGcd, bitLength } from './rational.ts';
export { Approx } from './approx.ts';
export { type Num, isExactNum, addNum, mulNum, negNum, invNum, isZeroNum, numToApprox } from './num.ts';
export { type VariableKind, type VariableInfo, variableInfo, compareVariables, SYMBOL_PATTERN } from './variables.ts';
export {
  type Factor,
  type Monomial,
  ONE_MONOMIAL,
  monomial,
  variable,
  mulMonomials,
  powMonomial,
  symbolDegree,
  weight,
  compareMonomials,
} from './monomial.ts';
export { Poly, type Term, constPoly } from './polynomial.ts';
export { bernoulli, factorial, MAX_BERNOULLI_INDEX } from './bernoulli.ts';
export { zetaPoly, zetaNumeric, evenZetaRational, MAX_ZETA_ARGUMENT } from './zeta.ts';
export { EULER_GAMMA, ZETA_TABLE, variableValue } from './constants.ts';
export { AlgebraError } from './algebra-error.ts';
export { Series } from './series.ts';
export { invertCoefficient } from './invert-coefficient.ts';
export { inverse, divide } from './series-inverse.ts';
export { expSeries, logSeries, log1pSeries } from './series-exp-log.ts';
export { logOfConstant, logOfRational, factorInteger } from './log-constant.ts';
export { powInteger, powSeries, MAX_EXPONENT, MAX_POWER_BITS } from './series-power.ts';
export { polePart, finitePart } from './pole-part.ts';
export { type ExpForm, EXP_FORM_ONE, mulExpForms, invertExpForm, expFormToSeries } from './exp-form.ts';
export { logGamma1p, gammaExpForm, splitGammaArgument, MAX_GAMMA_SHIFT } from './gamma.ts';
export { type GammaArg, type GammaProductSpec, gammaProduct, gammaProductForm, gammaSeries } from './gamma-product.ts';
export { type ExprNode, type ParseLimits, DEFAULT_PARSE_LIMITS, parseExpression } from './parse-expression.ts';
export { type ExpandOptions, expandExpression, MAX_EXPANSION_ORDER } from './expand-expression.ts';
export { MAX_TERM_PRODUCTS, withWorkBudget } from './work-budget.ts';
export { parsePoly } from './parse-poly.ts';
export { formatMonomial, formatPoly, formatSeries, formatSeriesExact } from './format-text.ts';
export { monomialToLatex, polyToLatex, seriesToLatex } from './format-latex.ts';
export { type SymbolValues, evaluatePoly, evaluatePolyApprox, evaluateSeriesAt } from './evaluate-numeric.ts';
export {
  type RationalJSON,
  type ApproxJSON,
  type PolyJSON,
  type SeriesJSON,
  type AlgebraJSON,
  type AlgebraValue,
  toJSON,
  fromJSON,
} from './codec.ts';
