/**
 * The Theory-run panel's job: every graph of a quartic scalar theory through L loops (browsable),
 * and — when asked to evaluate — their counterterms class by class with progress, the Z-factors,
 * β, γ_φ and γ_{m²} (src/core/rg) with the conventions, which graphs were approximate or missing,
 * numeric coefficients for the plot of β(g), and the LaTeX document with the per-graph breakdown.
 *
 * The computation is the rg module's `computeRg` (progress per graph class, cancellation through
 * its token) and its `rgReport`; this job turns them into what the panel shows.
 */
import { Approx } from '../algebra/approx.ts';
import { variableValue } from '../algebra/constants.ts';
import { polyToLatex } from '../algebra/format-latex.ts';
import { formatPoly } from '../algebra/format-text.ts';
import { numToApprox } from '../algebra/num.ts';
import type { Poly } from '../algebra/polynomial.ts';
import { Series } from '../algebra/series.ts';
import { variableInfo } from '../algebra/variables.ts';
import { InputError } from '../errors.ts';
import { graphSvg } from '../export/graph-svg.ts';
import { polesToLatex, writeRgDocument, type RgDocumentFunction } from '../export/write-values.ts';
import { collectGraphTerms, computeRg, insertionTheory, rgConventions, rgReport, unsupportedReason, type GSeries, type RgSeries, type GraphTerm, type RgComputation, type RgReport, type ZKind } from '../rg/index.ts';
import { schemeOf, SCHEME_NAMES, type SchemeName } from '../schemes/scheme.ts';
import { parseTheory } from '../theory/parse-theory.ts';
import type { Theory } from '../theory/types.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { parseSupplied, type SuppliedValue } from './values-job.ts';

export interface RgJob {
  readonly kind: 'rg';
  readonly theory: Theory;
  readonly loops: number;
  readonly scheme: SchemeName;
  /** false: generate and list the graphs only. */
  readonly evaluate: boolean;
  /** Counterterms entered by hand, by the graph's canonical notation: they replace the engine's and enter larger graphs' subtractions. */
  readonly supplied?: readonly SuppliedValue[];
}

export type RgGraphStatus = 'pending' | 'exact' | 'approximate' | 'missing';

export interface RgGraphInfo {
  readonly kind: ZKind;
  readonly loops: number;
  /** Canonical notation of the graph whose counterterm is taken (mass graphs: σ marks the φ² insertion). */
  readonly notation: string;
  /** What the editor opens: the graph itself, or for a mass graph its two-point graph. */
  readonly openNotation: string;
  /** Mass graphs: the line (1-based) of the two-point graph that carries the insertion. */
  readonly insertionLine?: number;
  readonly symmetryFactor: string;
  readonly groupFactorTex: string;
  readonly weightTex: string;
  readonly svg: string;
  readonly status: RgGraphStatus;
  readonly countertermTex?: string;
  readonly countertermText?: string;
  readonly reason?: string;
}

/** A coefficient as Σ value·∏ symbol^k with numeric values (constants like ζ(3) evaluated), for plots. */
export interface NumericPoly {
  readonly terms: readonly { readonly value: number; readonly error: number; readonly symbols: Readonly<Record<string, number>> }[];
}

export interface RgFunctionInfo {
  readonly id: 'beta' | 'gammaPhi' | 'gammaMass';
  /** TeX name, e.g. `\beta(g)`. */
  readonly tex: string;
  readonly knownThrough: number;
  readonly missing: readonly string[];
  readonly terms: readonly {
    /** Power of g. */
    readonly power: number;
    /** The term ∝ ε g of β. */
    readonly eps: boolean;
    readonly text: string;
    readonly tex: string;
    readonly exact: boolean;
    readonly numeric: NumericPoly;
  }[];
  /** The whole function in TeX, truncation included. */
  readonly formula: string;
}

export interface RgResult {
  readonly kind: 'rg';
  readonly theory: string;
  readonly theoryTitle: string;
  readonly scheme: SchemeName;
  readonly schemeDescription: string;
  readonly loops: number;
  readonly evaluated: boolean;
  /** `rgConventions`, key by key. */
  readonly conventions: readonly (readonly [string, string])[];
  /** ε in D = 4 − 2ε or D = 4 − ε (for the plot's label). */
  readonly dimension: 'D0-2eps' | 'D0-eps';
  readonly symbols: readonly string[];
  readonly graphs: readonly RgGraphInfo[];
  readonly classes: number;
  readonly functions: readonly RgFunctionInfo[];
  readonly z: readonly { readonly tex: string }[];
  readonly report: RgReport | null;
  readonly notEvaluable: readonly { readonly notation: string; readonly reason: string }[];
  readonly approximate: readonly string[];
  readonly latex: string | null;
}

type Eval = { ok: true; value: Series } | { ok: false; reason: string };

const KIND_ORDER: Record<ZKind, number> = { vertex: 0, field: 1, mass: 2 };

function numericPoly(p: Poly): NumericPoly {
  return {
    terms: p.terms().map((t) => {
      let v: Approx = numToApprox(t.coeff);
      const symbols: Record<string, number> = {};
      for (const f of t.mono.factors) {
        if (variableInfo(f.name).kind === 'symbol') symbols[f.name] = f.exp;
        else v = v.mul(new Approx(variableValue(f.name, {}) ** f.exp, 0));
      }
      return { value: v.value, error: v.error, symbols };
    }),
  };
}

const gTex = (k: number) => (k === 1 ? 'g' : `g^{${k}}`);

function sum(parts: string[]): string {
  if (!parts.length) return '0';
  return parts.reduce((acc, p, i) => (i === 0 ? p : p.startsWith('-') ? `${acc} - ${p.slice(1)}` : `${acc} + ${p}`), '');
}

function termTex(c: Poly, mono: string): string {
  const body = polyToLatex(c);
  if (body === '1') return mono;
  if (body === '-1') return `-${mono}`;
  return c.terms().length === 1 ? `${body}\\,${mono}` : `\\left(${body}\\right)${mono}`;
}

/** One RG function's ε⁰ coefficients (and β's ε g term) from its series, through `upTo`. */
function functionInfo(id: RgFunctionInfo['id'], tex: string, s: GSeries, knownThrough: number, missing: readonly string[], epsTerm: number | null): RgFunctionInfo {
  const terms: RgFunctionInfo['terms'][number][] = [];
  const texParts: string[] = [];
  if (epsTerm !== null) {
    terms.push({ power: 1, eps: true, text: String(epsTerm), tex: String(epsTerm), exact: true, numeric: { terms: [{ value: epsTerm, error: 0, symbols: {} }] } });
    texParts.push(epsTerm === 1 ? '\\varepsilon g' : epsTerm === -1 ? '-\\varepsilon g' : `${epsTerm}\\,\\varepsilon g`);
  }
  for (let k = 1; k <= knownThrough; k++) {
    const c = s.coeff(k);
    if (c.order < 0) continue;
    const v = c.coeff(0);
    if (v.isZero()) continue;
    terms.push({ power: k, eps: false, text: formatPoly(v), tex: polyToLatex(v), exact: v.isExact(), numeric: numericPoly(v) });
    texParts.push(termTex(v, gTex(k)));
  }
  return { id, tex, knownThrough, missing, terms, formula: `${tex} = ${sum(texParts)} + \\mathcal{O}(${gTex(knownThrough + 1)})` };
}

export function runRg(req: RgJob, cancel: CancelToken = neverCancel, progress?: (fraction: number | null, stage: string) => void): RgResult {
  const theory = parseTheory(req.theory, `theory ${req.theory.name}`);
  const why = unsupportedReason(theory);
  if (why) throw new InputError(`the RG functions of theory ${theory.name} cannot be computed: ${why}`, undefined, 'the theory run covers phi4 and phi4-on; single graphs of other theories have the Values panel');
  if (!Number.isInteger(req.loops) || req.loops < 1 || req.loops > 6) throw new InputError(`loops must be an integer from 1 to 6, got ${req.loops}`);
  if (!SCHEME_NAMES.includes(req.scheme)) throw new InputError(`unknown scheme "${req.scheme}"`);
  const scheme = schemeOf(req.scheme);
  const aux = insertionTheory(theory);
  progress?.(0, 'generating the graphs');
  let computation: RgComputation | null = null;
  if (req.evaluate) {
    const supplied = new Map<string, Series>();
    for (const s of req.supplied ?? []) supplied.set(s.notation, parseSupplied(s.expression));
    computation = computeRg(theory, {
      loops: req.loops, scheme, cancel, supplied,
      progress: (done, total) => progress?.(done / total, `counterterm ${done} of ${total}`),
    });
  }
  const terms = computation?.terms ?? collectGraphTerms(theory, req.loops, cancel);
  const classes = [...new Set(terms.map((t) => t.notation))];
  const conventionsRecord = rgConventions(theory, scheme);
  const conventions = Object.entries(conventionsRecord).map(([k, v]): [string, string] => [k, Array.isArray(v) ? v.join('; ') : String(v)]);
  const drawTheory = (t: GraphTerm) => (t.kind === 'mass' ? aux : theory);
  const sorted = [...terms].sort((a, b) => a.loops - b.loops || KIND_ORDER[a.kind] - KIND_ORDER[b.kind]);
  const reasons = new Map((computation?.notEvaluable ?? []).map((n) => [n.notation, n.reason]));
  const values = new Map<string, Eval>();
  if (computation) for (const [n, v] of computation.counterterms) values.set(n, v ? { ok: true, value: v } : { ok: false, reason: reasons.get(n) ?? 'not evaluated' });

  const graphs: RgGraphInfo[] = sorted.map((t) => {
    const v = values.get(t.notation);
    const status: RgGraphStatus = !req.evaluate ? 'pending' : !v || !v.ok ? 'missing' : v.value.isExact() ? 'exact' : 'approximate';
    return {
      kind: t.kind, loops: t.loops, notation: t.notation,
      openNotation: t.parent?.notation ?? t.notation,
      ...(t.parent ? { insertionLine: t.parent.line + 1 } : {}),
      symmetryFactor: t.symmetryFactor.toString(),
      groupFactorTex: polyToLatex(t.groupFactor),
      weightTex: polyToLatex(t.weight),
      svg: graphSvg(t.graph, drawTheory(t), { unit: 16, title: t.notation }),
      status,
      ...(v?.ok ? { countertermTex: polesToLatex(v.value), countertermText: formatSeriesPoles(v.value) } : {}),
      ...(v && !v.ok ? { reason: v.reason } : {}),
    };
  });

  const base = {
    kind: 'rg' as const, theory: theory.name, theoryTitle: theory.title, scheme: req.scheme, schemeDescription: scheme.description, loops: req.loops,
    conventions, dimension: theory.conventions.dimension, symbols: [...theory.symbols], graphs, classes: classes.length,
  };
  if (!req.evaluate) {
    progress?.(1, 'done');
    return { ...base, evaluated: false, functions: [], z: [], report: null, notEvaluable: [], approximate: [], latex: null };
  }

  if (!computation) throw new Error('unreachable');
  const { z, rg } = computation;
  const report = rgReport(computation, conventionsRecord);
  const field = theory.defaultField;
  const epsBeta = Number(report.beta.g!['eps*g'] ?? (theory.conventions.dimension === 'D0-eps' ? -1 : -2) * theory.conventions.betaSign);
  const functions = [
    functionInfo('beta', '\\beta(g)', rg.beta, report.knownThrough.beta.g!, report.incomplete.beta.g!, epsBeta),
    functionInfo('gammaPhi', '\\gamma_\\phi(g)', rg.gammaField, report.knownThrough.gamma[field]!, report.incomplete.gamma[field]!, null),
    functionInfo('gammaMass', '\\gamma_{m^2}(g)', rg.gammaMass, report.knownThrough.gammaMass, report.incomplete.gammaMass, null),
  ];
  const zInfo = [
    { tex: 'Z_\\lambda', s: z.vertex },
    { tex: 'Z_\\phi', s: z.field },
    { tex: 'Z_{m^2}', s: z.mass },
  ];
  const docFunctions: RgDocumentFunction[] = functions.map((f) => ({
    tex: f.tex,
    knownThrough: f.knownThrough,
    missing: f.missing,
    terms: f.terms.map((t) => ({ monomial: t.eps ? '\\varepsilon g' : gTex(t.power), coefficient: t.eps ? t.text : rgCoefficient(f.id, rg, t.power) })),
  }));
  const latex = writeRgDocument({
    theory, scheme: { name: scheme.name, description: scheme.description }, loops: req.loops, conventions: conventionsRecord,
    graphs: sorted.map((t) => {
      const v = values.get(t.notation)!;
      return {
        kind: t.kind, loops: t.loops, notation: t.notation, graph: t.graph, drawTheory: drawTheory(t), symmetryFactor: t.symmetryFactor,
        groupFactor: t.groupFactor, weight: t.weight, counterterm: v.ok ? v.value : null, approximate: v.ok && !v.value.isExact(),
        ...(v.ok ? {} : { reason: v.reason }),
      };
    }),
    z: zInfo.map((x) => ({ tex: x.tex, coefficients: Array.from({ length: x.s.order + 1 }, (_, k) => x.s.coeff(k)), order: x.s.order })),
    functions: docFunctions,
    consistent: report.checks.rgConsistent,
    failures: report.checks.failures,
  });
  progress?.(1, 'done');
  return {
    ...base, evaluated: true, functions,
    z: zInfo.map((x) => ({ tex: zTex(x.tex, x.s) })),
    report, notEvaluable: computation.notEvaluable.map((n) => ({ notation: n.notation, reason: n.reason })), approximate: [...computation.approximate], latex,
  };
}

function rgCoefficient(id: RgFunctionInfo['id'], rg: RgSeries, k: number): Poly {
  const s = id === 'beta' ? rg.beta : id === 'gammaPhi' ? rg.gammaField : rg.gammaMass;
  return s.coeff(k).coeff(0);
}

function zTex(name: string, s: GSeries): string {
  const parts = ['1'];
  for (let k = 1; k <= s.order; k++) {
    const c = s.coeff(k);
    if (c.isZero()) continue;
    parts.push(`\\left(${polesToLatex(c)}\\right)${gTex(k)}`);
  }
  return `${name} = ${parts.join(' + ')} + \\mathcal{O}(${gTex(s.order + 1)})`;
}

function formatSeriesPoles(s: Series): string {
  const parts: string[] = [];
  s.coeffs.forEach((c, i) => {
    if (!c.isZero()) parts.push(`(${formatPoly(c)})*eps^${s.val + i}`);
  });
  return parts.join(' + ') || '0';
}
