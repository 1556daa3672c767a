import { Approx } from '../algebra/approx.ts';
import { formatPoly } from '../algebra/format-text.ts';
import { variableInfo } from '../algebra/variables.ts';
import { evaluatePolyApprox } from '../algebra/evaluate-numeric.ts';
import { polePart } from '../algebra/pole-part.ts';
import type { Poly } from '../algebra/polynomial.ts';
import type { Series } from '../algebra/series.ts';
import type { RgComputation } from './compute-rg.ts';
import type { GSeries } from './g-series.ts';

/** A coefficient: canonical text when exact, value ± error when a supplied approximate counterterm entered. */
export type RgValue = string | { readonly approx: string | number; readonly error: number };
/** Monomial in the couplings (`g^2`, `eps*g`) → value. */
export type RgCoefficients = Record<string, RgValue>;

/** The `coppice rg --json` document (CLI contract; see the command's usage for each key). */
export interface RgReport {
  readonly couplings: string[];
  readonly beta: Record<string, RgCoefficients>;
  readonly gamma: Record<string, RgCoefficients>;
  readonly gammaMass: RgCoefficients;
  readonly conventions: Record<string, unknown>;
  readonly graphs: number;
  readonly notEvaluable: string[];
  readonly approximate: string[];
  /** Extensions beside the contract's keys. */
  readonly theory: string;
  readonly scheme: string;
  readonly loops: number;
  /** Highest power of g through which each function is known (beyond it: not computed or incomplete). */
  readonly knownThrough: { beta: Record<string, number>; gamma: Record<string, number>; gammaMass: number };
  /** Monomials the requested loop order should give but which are missing, and why. */
  readonly incomplete: { beta: Record<string, string[]>; gamma: Record<string, string[]>; gammaMass: string[] };
  /** Why each graph in notEvaluable could not be evaluated. */
  readonly reasons: Record<string, string>;
  readonly checks: { readonly rgConsistent: boolean; readonly failures: string[] };
}

const mono = (k: number, eps = false) => `${eps ? 'eps*' : ''}${k === 1 ? 'g' : `g^${k}`}`;

function value(p: Poly): RgValue {
  if (p.isExact()) return formatPoly(p);
  const free = p.terms().some((t) => t.mono.factors.some((f) => variableInfo(f.name).kind === 'symbol'));
  if (free) return { approx: formatPoly(p), error: Math.max(...p.terms().map((t) => (t.coeff instanceof Approx ? t.coeff.error : 0))) };
  const a = evaluatePolyApprox(p);
  return { approx: a.value, error: a.error };
}

interface Column {
  coefficients: RgCoefficients;
  knownThrough: number;
  missing: string[];
  failures: string[];
}

/**
 * One RG function's coefficients at ε⁰ (D → 4). A coefficient is reported when its ε-series is
 * known through ε⁰; its poles must vanish (else a failure of RG consistency is recorded). The
 * term −2εg of β is the monomial `eps*g` (−1 in the convention D = 4 − ε). Zero coefficients
 * are left out; `knownThrough` says how far the series is known.
 */
function column(s: GSeries, name: string, from: number, upTo: number, epsTerm: number | null): Column {
  const coefficients: RgCoefficients = {};
  const missing: string[] = [];
  const failures: string[] = [];
  let knownThrough = Math.min(s.order, upTo);
  for (let k = from; k <= upTo; k++) {
    if (k > s.order) {
      missing.push(mono(k));
      continue;
    }
    const c: Series = s.coeff(k);
    if (c.order < 0) {
      missing.push(mono(k));
      knownThrough = Math.min(knownThrough, k - 1);
      continue;
    }
    if (!polePart(c).isZero()) failures.push(`${name}: the coefficient of ${mono(k)} keeps poles in eps`);
    if (k === 1 && epsTerm !== null) {
      coefficients[mono(1, true)] = String(epsTerm);
    }
    const v = c.coeff(0);
    if (!v.isZero()) coefficients[mono(k)] = value(v);
  }
  return { coefficients, knownThrough, missing, failures };
}

/** The JSON document of a computation (shape: the `coppice rg` contract, plus extensions). */
export function rgReport(r: RgComputation, conventions: Record<string, unknown>): RgReport {
  const epsBeta = (r.theory.conventions.dimension === 'D0-eps' ? -1 : -2) * r.theory.conventions.betaSign;
  const b = column(r.rg.beta, 'beta', 1, r.loops + 1, epsBeta);
  const f = column(r.rg.gammaField, 'gamma_phi', 1, r.loops, null);
  const m = column(r.rg.gammaMass, 'gamma_m2', 1, r.loops, null);
  const field = r.theory.defaultField;
  const reasons: Record<string, string> = {};
  for (const n of r.notEvaluable) reasons[n.notation] = n.reason;
  const failures = [...b.failures, ...f.failures, ...m.failures];
  return {
    couplings: ['g'],
    beta: { g: b.coefficients },
    gamma: { [field]: f.coefficients },
    gammaMass: m.coefficients,
    conventions,
    graphs: r.graphCount,
    notEvaluable: r.notEvaluable.map((n) => n.notation),
    approximate: [...r.approximate],
    theory: r.theory.name,
    scheme: r.scheme.name,
    loops: r.loops,
    knownThrough: { beta: { g: b.knownThrough }, gamma: { [field]: f.knownThrough }, gammaMass: m.knownThrough },
    incomplete: { beta: { g: b.missing }, gamma: { [field]: f.missing }, gammaMass: m.missing },
    reasons,
    checks: { rgConsistent: failures.length === 0, failures },
  };
}
