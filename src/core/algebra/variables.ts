/**
 * The variables a polynomial may contain, and their fixed order.
 *
 * - free symbols (`N`, `g`, …): any identifier the parser does not reserve; weight 0;
 * - `pi` (weight 1 per power);
 * - `zeta(k)` for odd k ≥ 3 (weight k) — even zeta values are always rewritten as π^{2n};
 * - `euler_gamma` (weight 1);
 * - `log(p)` for a prime p and `log(pi)` (weight 1): these appear only from x^{aε} and
 *   log(x) with a positive rational (or π-power) x, the only logarithms kept exact.
 *
 * Inside a monomial the factors are ordered: symbols (by name), pi, zeta(k) by k,
 * euler_gamma, log(p) by p, log(pi).
 */

/** How a variable is classified. */
export type VariableKind = 'symbol' | 'pi' | 'zeta' | 'euler_gamma' | 'log';

/** A variable's classification, order rank and transcendental weight. */
export interface VariableInfo {
  readonly name: string;
  readonly kind: VariableKind;
  /** Ordering class: 0 symbols, 1 pi, 2 zeta, 3 euler_gamma, 4 log(p), 5 log(pi). */
  readonly group: number;
  /** Secondary order inside the group (k of zeta(k), p of log(p); 0 otherwise). */
  readonly index: number;
  readonly weight: number;
}

const cache = new Map<string, VariableInfo>();

/** Identifiers a free symbol may use. */
export const SYMBOL_PATTERN = /^[A-Za-z][A-Za-z0-9_]*$/;

/** Classifies a variable name; throws RangeError for names that are not variables. */
export function variableInfo(name: string): VariableInfo {
  const hit = cache.get(name);
  if (hit) return hit;
  let info: VariableInfo;
  let m: RegExpExecArray | null;
  if (name === 'pi') info = { name, kind: 'pi', group: 1, index: 0, weight: 1 };
  else if (name === 'euler_gamma') info = { name, kind: 'euler_gamma', group: 3, index: 0, weight: 1 };
  else if ((m = /^zeta\((\d+)\)$/.exec(name))) {
    const k = Number(m[1]);
    if (k < 3 || k % 2 === 0) throw new RangeError(`zeta(${k}) is not a basis constant (only odd k ≥ 3)`);
    info = { name, kind: 'zeta', group: 2, index: k, weight: k };
  } else if (name === 'log(pi)') info = { name, kind: 'log', group: 5, index: 0, weight: 1 };
  else if ((m = /^log\((\d+)\)$/.exec(name))) info = { name, kind: 'log', group: 4, index: Number(m[1]), weight: 1 };
  else if (SYMBOL_PATTERN.test(name)) info = { name, kind: 'symbol', group: 0, index: 0, weight: 0 };
  else throw new RangeError(`"${name}" is not a variable name`);
  cache.set(name, info);
  return info;
}

/** Total order of variables (negative when a comes first). */
export function compareVariables(a: string, b: string): number {
  if (a === b) return 0;
  const x = variableInfo(a);
  const y = variableInfo(b);
  if (x.group !== y.group) return x.group - y.group;
  if (x.index !== y.index) return x.index - y.index;
  return a < b ? -1 : 1;
}
