/**
 * A budget of polynomial term products for one expansion, with cancellation. Series products,
 * exp and log spend their time in `Poly.sumOfProducts`/`Poly.mul`, which announce the number
 * of term products they are about to compute (|a|·|b| per pair of coefficients, known before
 * the work is done). Inside `withWorkBudget` the count is checked against the limit and the
 * cancel token is polled; outside it (the counterterm engine, tests) charging is a no-op.
 * Synchronous code only: the budget is the one of the innermost running `withWorkBudget`.
 */
import { LimitError } from '../errors.ts';
import type { CancelToken } from '../util/cancel.ts';

/**
 * Default limit, in term products weighted by coefficient size (64-bit words of both factors):
 * about 3 s of exact arithmetic on a slow shared core. Γ(ε)^10 Γ(1−ε)^10/Γ(2−2ε)^5 needs under
 * 10⁶ through ε^20 (1.4 s), under 3·10⁶ through ε^25, about 10⁷ through ε^30 and far more
 * through ε^40 (minutes); the usual one- and two-loop products at low orders need a few
 * thousand.
 */
export const MAX_TERM_PRODUCTS = 3_000_000;

interface Budget {
  used: number;
  readonly max: number;
  readonly cancel: CancelToken | undefined;
}

let current: Budget | null = null;

/** Runs `f` with a budget of `max` term products and the cancel token polled as work is charged. */
export function withWorkBudget<T>(max: number, cancel: CancelToken | undefined, f: () => T): T {
  const prev = current;
  current = { used: 0, max, cancel };
  try {
    return f();
  } finally {
    current = prev;
  }
}

/** Announces `n` term products about to be computed; throws LimitError past the budget, CancelledError when cancelled. */
export function chargeTermProducts(n: number): void {
  const b = current;
  if (!b) return;
  b.used += n;
  b.cancel?.throwIfCancelled();
  if (b.used > b.max) {
    throw new LimitError(
      'expansion work (products of polynomial terms weighted by their size, counted before each step)',
      'maxTermProducts',
      b.max,
      `more than ${b.max}`,
      'ask for a lower order or fewer factors, or raise it with --max-term-products',
    );
  }
}
