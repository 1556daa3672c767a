import { Series } from '../algebra/series.ts';
import { canonicalNotation } from '../canon/canonical-form.ts';
import { InputError } from '../errors.ts';
import { parseNotation } from '../graph/notation-parse.ts';
import { CountertermEngine } from '../renorm/counterterm-engine.ts';
import { momCounterterm } from '../renorm/mom-engine.ts';
import { parseScheme, type Scheme } from '../schemes/scheme.ts';
import { bindGraph } from '../theory/bind-graph.ts';
import type { Theory } from '../theory/types.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { GSeries } from './g-series.ts';
import { collectGraphTerms, type GraphTerm, type ZKind } from './graph-terms.ts';
import { insertionTheory } from './mass-insertion.ts';
import { rgFunctions, type RgSeries, type ZFactors } from './rg-functions.ts';
import { requireSupported } from './theory-support.ts';

export interface RgOptions {
  /** Every graph with at most this many loops is used (φ⁴: β through g^{L+1}, γ's through g^L). */
  readonly loops: number;
  readonly scheme: string | Scheme;
  readonly cancel?: CancelToken;
  /** Called after each graph class is evaluated. */
  readonly progress?: (done: number, total: number) => void;
  /**
   * Counterterms S_R the user supplies, by the graph's canonical notation (as `notEvaluable`
   * names it): used where the engine cannot evaluate the graph. Inexact values make the graph
   * "approximate" and carry their errors into the coefficients. In the minimal schemes they also
   * enter the subtractions of every larger graph that contains them.
   */
  readonly supplied?: ReadonlyMap<string, Series>;
  /** Routings compared per graph by the minimal-scheme engine (default 1: the RG pole check is the cross-check here). */
  readonly compareRoutings?: number;
}

/** A graph class that could not be evaluated, and what it holds back. */
export interface NotEvaluableGraph {
  readonly notation: string;
  readonly kind: ZKind;
  readonly loops: number;
  readonly reason: string;
}

export interface RgComputation {
  readonly theory: Theory;
  readonly scheme: Scheme;
  readonly loops: number;
  readonly terms: readonly GraphTerm[];
  /** Distinct graph classes used (four-point, two-point, two-point with a φ² insertion). */
  readonly graphCount: number;
  readonly z: ZFactors;
  readonly rg: RgSeries;
  readonly notEvaluable: readonly NotEvaluableGraph[];
  readonly approximate: readonly string[];
  /** S_R of every graph class by notation (null: not evaluable) — the data behind the Z's. */
  readonly counterterms: ReadonlyMap<string, Series | null>;
}

type Eval = { ok: true; value: Series } | { ok: false; reason: string };

/**
 * The Z-factors and RG functions of a quartic scalar theory (φ⁴, O(N) φ⁴) from every graph
 * through `loops` loops: generation (symmetry and group factors), counterterms graph by graph
 * (one engine for the run, so subgraph counterterms are shared), Z − 1 = Σ weight·g^L·S_R, and
 * β, γ_φ, γ_{m²} from the Z's (rg-functions.ts). A graph that cannot be evaluated lowers the
 * order through which its Z-factor is known, so every coefficient it would enter is missing
 * from the result rather than wrong.
 */
export function computeRg(theory: Theory, opts: RgOptions): RgComputation {
  requireSupported(theory);
  if (!Number.isInteger(opts.loops) || opts.loops < 1 || opts.loops > 6) throw new InputError(`--loops must be an integer from 1 to 6, got ${opts.loops}`);
  const scheme = typeof opts.scheme === 'string' ? parseScheme(opts.scheme) : opts.scheme;
  const cancel = opts.cancel ?? neverCancel;
  const aux = insertionTheory(theory);
  const terms = collectGraphTerms(theory, opts.loops, cancel);
  const supplied = new Map<string, Series>();
  for (const [n, v] of opts.supplied ?? []) supplied.set(canonicalNotation(parseNotation(n, 'supplied graph'), { defaultField: theory.defaultField }), v);
  const evaluate = evaluator(aux, scheme, cancel, opts.compareRoutings ?? 1, supplied);

  const values = new Map<string, Eval>();
  const classes = [...new Set(terms.map((t) => t.notation))];
  const byNotation = new Map(terms.map((t) => [t.notation, t]));
  const approximate = new Set<string>();
  classes.forEach((n, i) => {
    cancel.throwIfCancelled();
    const own = supplied.get(n);
    values.set(n, own ? { ok: true, value: own } : evaluate(byNotation.get(n)!));
    if (own && !own.isExact()) approximate.add(n);
    opts.progress?.(i + 1, classes.length);
  });

  const notEvaluable: NotEvaluableGraph[] = [];
  for (const n of classes) {
    const v = values.get(n)!;
    const t = byNotation.get(n)!;
    if (!v.ok) notEvaluable.push({ notation: n, kind: t.kind, loops: t.loops, reason: v.reason });
  }
  const z = {
    vertex: zFactor(terms, 'vertex', values, opts.loops),
    field: zFactor(terms, 'field', values, opts.loops),
    mass: zFactor(terms, 'mass', values, opts.loops),
  };
  return { theory, scheme, loops: opts.loops, terms, graphCount: classes.length, z, rg: rgFunctions(z, theory.conventions), notEvaluable, approximate: [...approximate], counterterms: new Map([...values].map(([n, v]) => [n, v.ok ? v.value : null])) };
}

/** Counterterms graph by graph: the minimal-scheme engine (class-memoized) or momentum subtraction. */
function evaluator(aux: Theory, scheme: Scheme, cancel: CancelToken, compareRoutings: number, supplied: ReadonlyMap<string, Series>): (t: GraphTerm) => Eval {
  if (scheme.minimal) {
    const engine = new CountertermEngine(aux, scheme, { cancel, compareRoutings });
    // Supplied values enter the engine, so subtractions of larger graphs use them too.
    for (const [n, v] of supplied) engine.supplyCounterterm(bindGraph(parseNotation(n, 'supplied graph'), aux), v);
    return (t) => {
      const r = engine.counterterm(bindGraph(t.graph, aux));
      return r.ok ? { ok: true, value: r.value } : { ok: false, reason: r.reason };
    };
  }
  return (t) => {
    const r = momCounterterm(aux, bindGraph(t.graph, aux), { cancel });
    return r.ok ? { ok: true, value: r.value } : { ok: false, reason: r.reason };
  };
}

/** Z = 1 + Σ weight · g^L · S_R over the graphs of one kind, known through the last complete loop order. */
function zFactor(terms: readonly GraphTerm[], kind: ZKind, values: ReadonlyMap<string, Eval>, loops: number): GSeries {
  const coeffs: Series[] = [Series.ONE];
  let order = loops;
  for (const t of terms) {
    if (t.kind !== kind) continue;
    const v = values.get(t.notation)!;
    if (!v.ok) {
      order = Math.min(order, t.loops - 1);
      continue;
    }
    coeffs[t.loops] = (coeffs[t.loops] ?? Series.ZERO).add(v.value.scale(t.weight));
  }
  return GSeries.make(coeffs, order);
}

