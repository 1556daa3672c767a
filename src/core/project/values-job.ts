/**
 * The Values panel's jobs: one graph's counterterm S_R(Γ) in a scheme, its subtracted and
 * renormalized values and the checks (what `coppice counterterm --values` reports), with values
 * entered by hand flowing through; and the numerical period of a primitive graph with its
 * counterterm −P/(Lε). Results are plain data (text, KaTeX-safe TeX, numbers) for the worker
 * boundary.
 */
import { evaluatePolyApprox } from '../algebra/evaluate-numeric.ts';
import { expandExpression } from '../algebra/expand-expression.ts';
import { variableInfo } from '../algebra/variables.ts';
import { formatPoly, formatSeries } from '../algebra/format-text.ts';
import { polyToLatex, seriesToLatex } from '../algebra/format-latex.ts';
import type { Poly } from '../algebra/polynomial.ts';
import type { Series } from '../algebra/series.ts';
import { InputError } from '../errors.ts';
import { logPolyToLatex, polesToLatex, writeValuesDocument, type ValueCheckStatus } from '../export/write-values.ts';
import { conventionEntries } from '../export/write-document.ts';
import { loopNumber } from '../graph/connectivity.ts';
import { parseNotation } from '../graph/notation-parse.ts';
import { estimatePeriod, preparePeriod } from '../periods/period-estimate.ts';
import { PeriodGraphError, periodInput } from '../periods/period-input.ts';
import { periodCounterterm } from '../periods/period-counterterm.ts';
import { CountertermEngine, renormalizedValue } from '../renorm/counterterm-engine.ts';
import { infraredDivergence } from '../renorm/infrared-safety.ts';
import { momCounterterm } from '../renorm/mom-engine.ts';
import { atReferencePoint, logCoefficient } from '../renorm/momentum-series.ts';
import { polesNegligible } from '../renorm/negligible.ts';
import { checkRgPoles } from '../renorm/rg-pole-check.ts';
import { routedIntegral } from '../renorm/routed-integral.ts';
import { schemeOf, SCHEME_NAMES, type SchemeName } from '../schemes/scheme.ts';
import { bindGraph } from '../theory/bind-graph.ts';
import { parseTheory } from '../theory/parse-theory.ts';
import { omegaOfGraph } from '../theory/power-counting.ts';
import type { Theory } from '../theory/types.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';

/** A counterterm entered by hand: the graph class (notation) and the expression (exact, or approximate as `1.2345(6)`). */
export interface SuppliedValue {
  readonly notation: string;
  readonly expression: string;
  /** Where it came from, shown as the method (e.g. the period estimate). */
  readonly note?: string;
}

export interface ValuesJob {
  readonly kind: 'values';
  readonly theory: Theory;
  readonly notation: string;
  readonly scheme: SchemeName;
  readonly supplied?: readonly SuppliedValue[];
  /** Routings (and methods) compared in the minimal schemes (default 2). */
  readonly compareRoutings?: number;
}

export interface PeriodJob {
  readonly kind: 'period';
  readonly theory: Theory;
  readonly notation: string;
  readonly samples: number;
  readonly seed: number;
}

/** A Laurent series in ε as text and TeX, term by term. */
export interface SeriesInfo {
  readonly text: string;
  readonly tex: string;
  readonly exact: boolean;
  /** Nonzero coefficients; `value` ± `error` numerically when no free symbol (N) is left. */
  readonly terms: readonly { readonly power: number; readonly text: string; readonly value?: number; readonly error?: number }[];
}

export type ValueCheckId = 'finite' | 'local' | 'routings' | 'rg' | 'exp';

export interface ValueCheck {
  readonly id: ValueCheckId;
  readonly label: string;
  readonly status: ValueCheckStatus;
  /** What was checked, or what failed. */
  readonly detail: string;
}

export interface ValuesResult {
  readonly kind: 'values';
  readonly scheme: SchemeName;
  readonly schemeDescription: string;
  /** The conventions in force: the theory's, then the scheme's. */
  readonly conventions: readonly (readonly [string, string])[];
  readonly loops: number;
  readonly omega: number;
  readonly divergent: boolean;
  /** No proper divergent subgraph. */
  readonly primitive: boolean;
  /** Whether a period can be computed (primitive, logarithmically divergent, scalar), or why not. */
  readonly period: { readonly possible: boolean; readonly reason?: string };
  readonly evaluable: boolean;
  readonly reason?: string;
  readonly method: string;
  /** Momentum routed in at the first vertex, out at the second (names of the input graph's representative). */
  readonly routing: readonly [string, string] | null;
  readonly routingsCompared: number;
  /** The graph's own counterterm came from a value entered by hand. */
  readonly suppliedForGraph: boolean;
  /** The values entered by hand that the engine accepted, by target. */
  readonly suppliedUsed: readonly { readonly notation: string; readonly forGraph: boolean; readonly exact: boolean }[];
  readonly bare: SeriesInfo | null;
  readonly subtracted: SeriesInfo | null;
  readonly counterterm: SeriesInfo | null;
  /** φ_R at ε⁰ as coefficients of L^j (L = ln p²/μ²). */
  readonly renormalized: { readonly tex: string; readonly coefficients: readonly string[] } | null;
  readonly checks: readonly ValueCheck[];
  /** A complete .tex document of all this. */
  readonly latex: string;
}

export interface PeriodResult {
  readonly kind: 'period';
  readonly value: number;
  readonly error: number;
  readonly samples: number;
  readonly heppBound: number;
  readonly loops: number;
  /** −P/(Lε) ± error. */
  readonly counterterm: { readonly approx: number; readonly error: number };
  /** The counterterm as an expression the engine reads back (`-1.2345(6)*eps^-1`). */
  readonly expression: string;
}

const SCALAR = (t: Theory) => t.fields.every((f) => f.statistics === 'boson' && f.propagatorWeight === 2 && !f.antiparticle);

export function seriesInfo(s: Series, poles = false): SeriesInfo {
  const terms: { power: number; text: string; value?: number; error?: number }[] = [];
  s.coeffs.forEach((c, i) => {
    if (c.isZero()) return;
    const free = c.terms().some((t) => t.mono.factors.some((f) => variableInfo(f.name).kind === 'symbol'));
    const a = free ? null : evaluatePolyApprox(c);
    terms.push({ power: s.val + i, text: formatPoly(c), ...(a ? { value: a.value, error: a.error } : {}) });
  });
  return { text: formatSeries(s), tex: poles ? polesToLatex(s) : seriesToLatex(s), exact: s.isExact(), terms };
}

/** Reads a value entered by hand (the pole part: ε^−k … ε^−1). */
export function parseSupplied(expression: string): Series {
  const text = expression.trim();
  if (!text) throw new InputError('the value is empty', undefined, 'e.g. -1/3*eps^-2 + 1/6*eps^-1, or -2.404(1)*eps^-1');
  return expandExpression(text, -1);
}

const schemeName = (n: string): SchemeName => {
  const k = n.toLowerCase().replace('-', '') as SchemeName;
  if (!SCHEME_NAMES.includes(k)) throw new InputError(`unknown scheme "${n}"`, undefined, `schemes: ${SCHEME_NAMES.join(', ')}`);
  return k;
};

export function runValues(req: ValuesJob, cancel: CancelToken = neverCancel, progress?: (fraction: number | null, stage: string) => void): ValuesResult {
  progress?.(0, 'binding the graph');
  const theory = parseTheory(req.theory, `theory ${req.theory.name}`);
  const sName = schemeName(req.scheme);
  const scheme = schemeOf(sName);
  const graph = parseNotation(req.notation);
  const bg = bindGraph(graph, theory);
  const loops = loopNumber(bg.graph);
  const omega = omegaOfGraph(bg);
  const conventions: [string, string][] = [...conventionEntries(theory.conventions), ['scheme', scheme.description]];
  const supplied = req.supplied ?? [];

  let period: ValuesResult['period'] = { possible: false, reason: 'a period needs a scalar theory' };
  if (SCALAR(theory)) {
    try {
      periodInput(graph, theory, { cancel });
      period = { possible: true };
    } catch (e) {
      if (e instanceof PeriodGraphError) period = { possible: false, reason: e.message };
      else throw e;
    }
  }

  const base = { kind: 'values' as const, scheme: sName, schemeDescription: scheme.description, conventions, loops, omega, divergent: omega >= 0, period };
  const checks: ValueCheck[] = [];
  const done = (r: Omit<ValuesResult, keyof typeof base | 'latex' | 'checks'> & { bareS?: Series | null; subS?: Series | null; ctS?: Series | null; renP?: readonly Poly[] | null }): ValuesResult => {
    progress?.(1, 'done');
    const { bareS, subS, ctS, renP, ...rest } = r;
    const latex = writeValuesDocument({
      theory, notation: req.notation, graph: bg.graph, scheme: { name: sName, description: scheme.description },
      method: r.evaluable ? r.method : `not evaluable: ${r.reason}`, evaluable: r.evaluable,
      counterterm: ctS ?? null, bare: bareS ?? null, subtracted: subS ?? null, renormalized: renP ?? null,
      checks, supplied: supplied.map((s) => ({ notation: s.notation, expression: s.expression })),
    });
    return { ...base, ...rest, primitive: rest.primitive, checks, latex };
  };
  const none = { bare: null, subtracted: null, counterterm: null, renormalized: null, routing: null, routingsCompared: 0, suppliedForGraph: false, suppliedUsed: [] };

  if (!scheme.minimal) {
    if (!SCALAR(theory)) return done({ ...none, primitive: false, evaluable: false, reason: `theory ${theory.name} has fermion or gauge lines: exact values are for the scalar theories only`, method: '' });
    if (supplied.length) {
      checks.push({ id: 'exp', label: 'values by hand', status: 'unchecked', detail: 'values entered by hand are used in the minimal schemes (MS, MS-bar, G) only; momentum subtraction evaluates every graph itself' });
    }
    progress?.(null, 'evaluating at the subtraction point');
    const r = momCounterterm(theory, bg, { cancel });
    if (!r.ok) return done({ ...none, primitive: false, evaluable: false, reason: r.reason, method: '' });
    const ren = r.renormalized;
    checks.unshift(
      { id: 'finite', label: 'finite', status: r.finite ? 'pass' : 'fail', detail: r.finite ? 'the poles cancel in R̄Γ + S_R at every power of L' : 'poles in ε remain in the renormalized value' },
      { id: 'local', label: 'local', status: 'unchecked', detail: 'momentum subtraction subtracts at a point: the counterterm is local by construction' },
      { id: 'routings', label: 'routings agree', status: 'unchecked', detail: 'the subtraction point fixes the routing (1 compared)' },
      { id: 'rg', label: 'RG poles', status: 'unchecked', detail: 'the pole relations hold in minimal schemes; momentum subtraction has finite counterterm parts' },
      { id: 'exp', label: 'exponentiation', status: r.expCheck.checked ? (r.expCheck.ok ? 'pass' : 'fail') : 'unchecked', detail: r.expCheck.note },
    );
    const names = [bg.graph.vertices[r.routing.u]!.name, bg.graph.vertices[r.routing.v]!.name] as const;
    return done({
      ...none, primitive: false, evaluable: true, method: r.method, routing: names, routingsCompared: 1,
      counterterm: seriesInfo(r.value), renormalized: { tex: logPolyToLatex(ren), coefficients: ren.map(formatPoly) }, ctS: r.value, renP: ren,
    });
  }

  const engine = new CountertermEngine(theory, scheme, { cancel, compareRoutings: req.compareRoutings ?? 2 });
  const used: { notation: string; forGraph: boolean; exact: boolean }[] = [];
  const ownClass = engine.algebra.classOf(bg);
  for (const s of supplied) {
    const g = bindGraph(parseNotation(s.notation, 'graph notation of a value entered by hand'), theory);
    const value = parseSupplied(s.expression);
    engine.supplyCounterterm(g, value, s.note ?? 'value entered by hand');
    used.push({ notation: s.notation, forGraph: engine.algebra.classOf(g) === ownClass, exact: value.isExact() });
  }
  const suppliedForGraph = engine.isSupplied(bg);
  const analysis = engine.algebra.analyze(bg);
  const primitive = analysis.subgraphs.length === 0;
  if (!SCALAR(theory) && !suppliedForGraph) {
    return done({ ...none, primitive, suppliedUsed: used, evaluable: false, reason: `theory ${theory.name} has fermion or gauge lines: exact values are available for the scalar theories (phi4, phi4-on, phi3) only; enter the value by hand`, method: '' });
  }
  progress?.(null, 'evaluating the counterterm');
  const ct = engine.counterterm(bg);
  cancel.throwIfCancelled();
  if (!ct.ok) return done({ ...none, primitive, suppliedUsed: used, evaluable: false, reason: ct.reason, method: '' });
  const rep = engine.algebra.representative(ownClass);
  const routing = ct.detail.routing ? ([rep.graph.vertices[ct.detail.routing.u]!.name, rep.graph.vertices[ct.detail.routing.v]!.name] as const) : null;

  if (suppliedForGraph || ct.detail.poleOnly) {
    const why = ct.detail.poleOnly ?? 'Γ\'s own counterterm was entered by hand: nothing to check it against';
    const compared = ct.detail.poleOnly && ct.detail.routingsCompared >= 2;
    checks.push(
      { id: 'finite', label: 'finite', status: 'unchecked', detail: why },
      { id: 'local', label: 'local', status: 'unchecked', detail: why },
      compared
        ? { id: 'routings', label: 'routings agree', status: ct.detail.routingsAgree ? 'pass' : 'fail', detail: `each logarithmic graph of the route on ${ct.detail.routingsCompared} routings${ct.detail.routingsAgree ? '' : ': their counterterms differ'}` }
        : { id: 'routings', label: 'routings agree', status: 'unchecked', detail: why },
    );
  } else {
    progress?.(0.8, 'checks');
    const maxJ = bg.graph.edges.length;
    const ren = renormalizedValue(ct.detail.subtracted, ct.value, maxJ);
    const bad: number[] = [];
    for (let j = 0; j <= maxJ; j++) {
      let c = logCoefficient(ct.detail.subtracted, j);
      if (j === 0) c = c.add(ct.value);
      if (!polesNegligible(c)) bad.push(j);
    }
    const approxNote = ct.value.isExact() ? '' : ' (approximate data: within 4 standard errors)';
    checks.push(
      { id: 'finite', label: 'finite', status: ren.finite ? 'pass' : 'fail', detail: ren.finite ? `the poles of R̄Γ + S_R cancel at every power of L${approxNote}` : `poles in ε remain at ${bad.map((j) => (j === 0 ? 'L⁰' : `L^${j}`)).join(', ')}` },
      { id: 'local', label: 'local', status: ct.detail.local ? 'pass' : 'fail', detail: ct.detail.local ? 'no ln p² multiplies a pole of R̄Γ' : 'ln p² multiplies a pole of R̄Γ: the counterterm would not be local' },
      ct.detail.routingsCompared >= 2
        ? { id: 'routings', label: 'routings agree', status: ct.detail.routingsAgree ? 'pass' : 'fail', detail: `${ct.detail.routingsCompared} routings or methods compared${ct.detail.routingsAgree ? '' : ': their counterterms differ'}` }
        : { id: 'routings', label: 'routings agree', status: 'unchecked', detail: `${ct.detail.routingsCompared} routing evaluated: nothing to compare` },
    );
    const renP = ren.coefficients;
    const subS = atReferencePoint(ct.detail.subtracted);
    let bareS: Series | null = null;
    if (ct.detail.routing) {
      const main = routedIntegral(rep, ct.detail.routing.u, ct.detail.routing.v);
      if (main.ok && !infraredDivergence(main.integral, theory.dimension)) {
        try {
          bareS = engine.evaluator.evaluate(main.integral, 0);
        } catch {
          bareS = null;
        }
      }
    }
    const rg = checkRgPoles(engine, engine.algebra.analyze(rep), ct.value);
    checks.push({ id: 'rg', label: 'RG poles', status: !rg.checked ? 'unchecked' : rg.consistent ? 'pass' : 'fail', detail: rg.reason ?? (rg.checked ? (rg.consistent ? 'the higher poles follow from the simple poles of the graph and its subgraphs' : 'the higher poles do not follow from the simple poles') : 'not checked') });
    return done({
      primitive, evaluable: true, method: ct.detail.method, routing, routingsCompared: ct.detail.routingsCompared, suppliedForGraph, suppliedUsed: used,
      bare: bareS ? seriesInfo(bareS) : null, subtracted: seriesInfo(subS), counterterm: seriesInfo(ct.value, true),
      renormalized: { tex: logPolyToLatex(renP), coefficients: renP.map(formatPoly) },
      bareS, subS, ctS: ct.value, renP,
    });
  }
  const rg = checkRgPoles(engine, engine.algebra.analyze(rep), ct.value);
  checks.push({ id: 'rg', label: 'RG poles', status: !rg.checked ? 'unchecked' : rg.consistent ? 'pass' : 'fail', detail: rg.reason ?? (rg.consistent ? 'the higher poles follow from the simple poles (of the value entered and the subgraphs)' : 'the higher poles do not follow from the simple poles') });
  return done({
    primitive, evaluable: true, method: ct.detail.method, routing, routingsCompared: ct.detail.routingsCompared, suppliedForGraph, suppliedUsed: used,
    bare: null, subtracted: null, counterterm: seriesInfo(ct.value, true), renormalized: null, ctS: ct.value,
  });
}

/** Writes a ± error as the engine's approximate-number syntax: 1.2345(67). */
export function approxLiteral(value: number, error: number): string {
  if (!Number.isFinite(error) || error <= 0) return String(value);
  const digits = Math.max(0, Math.min(15, 1 - Math.floor(Math.log10(error))));
  const scaled = Math.round(error * 10 ** digits);
  return `${value.toFixed(digits)}(${scaled})`;
}

export function runPeriod(req: PeriodJob, cancel: CancelToken = neverCancel, progress?: (fraction: number | null, stage: string) => void): PeriodResult {
  progress?.(0, 'preparing the sector tables');
  const theory = parseTheory(req.theory, `theory ${req.theory.name}`);
  const input = periodInput(parseNotation(req.notation), theory, { cancel });
  const plan = preparePeriod(input.periodGraph, { cancel });
  let lastPercent = -1;
  const estimate = estimatePeriod(plan, {
    samples: req.samples,
    seed: req.seed,
    cancel,
    onProgress: (k, n) => {
      const pc = Math.floor((100 * k) / n);
      if (pc !== lastPercent) {
        lastPercent = pc;
        progress?.(k / n, `sampling (${Math.min(req.samples, k * 4096).toLocaleString('en-US')} of ${req.samples.toLocaleString('en-US')})`);
      }
    },
  });
  const L = plan.graph.loops;
  const c = periodCounterterm(estimate, L)['-1'];
  progress?.(1, 'done');
  return { kind: 'period', value: estimate.value, error: estimate.error, samples: estimate.samples, heppBound: estimate.heppBound, loops: L, counterterm: c, expression: `${approxLiteral(c.approx, c.error)}*eps^-1` };
}

/** The TeX of a polynomial, for panels that show one coefficient (re-exported for the renderer). */
export const polyTex = polyToLatex;
