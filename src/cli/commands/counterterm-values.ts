import { formatPoly } from '../../core/algebra/format-text.ts';
import type { Series } from '../../core/algebra/series.ts';
import type { Poly } from '../../core/algebra/polynomial.ts';
import { printNotation } from '../../core/graph/notation-print.ts';
import { atReferencePoint } from '../../core/renorm/momentum-series.ts';
import { writeValuesDocument, type ValueCheckStatus } from '../../core/export/write-values.ts';
import pkg from '../../../package.json' with { type: 'json' };
import { InputError } from '../../core/errors.ts';
import { CountertermEngine, renormalizedValue } from '../../core/renorm/counterterm-engine.ts';
import { checkRgPoles } from '../../core/renorm/rg-pole-check.ts';
import { parseScheme } from '../../core/schemes/scheme.ts';
import { bindGraph } from '../../core/theory/bind-graph.ts';
import { flag, flagAll, hasFlag, intFlag, type ParsedArgs } from '../args.ts';
import { parseNotation } from '../../core/graph/notation-parse.ts';
import { expandExpression } from '../../core/algebra/expand-expression.ts';
import { EXIT, type CliIO } from '../command.ts';
import { readGraph, resolveTheory } from '../inputs.ts';
import { momCounterterm } from '../../core/renorm/mom-engine.ts';

/** `{"-2": "...", "-1": "..."}`: every power from the leading one through `top`, zeros as "0". */
export function seriesJSON(s: Series, top: number): Record<string, string> {
  const out: Record<string, string> = {};
  const low = s.coeffs.length ? Math.min(s.val, top) : top;
  for (let p = low; p <= top; p++) out[String(p)] = p <= s.order ? formatPoly(s.coeff(p)) : '?';
  return out;
}

export function runValues(args: ParsedArgs, io: CliIO): number {
  const theory = resolveTheory(flag(args, 'theory'), io);
  const scheme = parseScheme(flag(args, 'scheme') ?? 'msbar');
  const bg = bindGraph(readGraph(flag(args, 'graph'), io), theory);
  const scalar = theory.fields.every((f) => f.statistics === 'boson' && f.propagatorWeight === 2 && !f.antiparticle);
  const names = (r: { u: number; v: number } | null) => (r ? [bg.graph.vertices[r.u]!.name, bg.graph.vertices[r.v]!.name] : null);
  let report: Record<string, unknown>;
  let failed = false;
  // What the LaTeX document needs, filled in by whichever path evaluates.
  let tex: { counterterm: Series | null; subtracted: Series | null; renormalized: Poly[] | null; method: string; checks: { label: string; status: ValueCheckStatus; detail: string }[] } = { counterterm: null, subtracted: null, renormalized: null, method: '', checks: [] };
  const status = (b: boolean | null | undefined): ValueCheckStatus => (b === true ? 'pass' : b === false ? 'fail' : 'unchecked');
  if (!scalar) {
    report = { scheme: scheme.name, evaluable: false, reason: `theory ${theory.name} has fermion or gauge lines: exact values are available for the scalar theories (phi4, phi4-on, phi3) only; supply values by hand` };
  } else if (!scheme.minimal) {
    const r = momCounterterm(theory, bg, { cancel: io.cancel });
    if (!r.ok) report = { scheme: scheme.name, evaluable: false, reason: r.reason };
    else {
      failed = !r.finite;
      tex = { counterterm: r.value, subtracted: r.value.neg(), renormalized: r.renormalized, method: r.method, checks: [{ label: 'finite', status: status(r.finite), detail: 'φ_R has no poles' }, { label: 'exponential in ln(p²/μ²)', status: r.expCheck.checked ? status(r.expCheck.ok) : 'unchecked', detail: r.expCheck.note }] };
      report = {
        scheme: scheme.name, evaluable: true, method: r.method, routing: names(r.routing), routingsCompared: 1,
        counterterm: seriesJSON(r.value, 0), finite: r.finite, local: true, routingsAgree: true,
        renormalized: Object.fromEntries(r.renormalized.map((c, j) => [String(j), formatPoly(c)])),
        expCheck: r.expCheck,
      };
    }
  } else {
    const engine = new CountertermEngine(theory, scheme, { cancel: io.cancel, compareRoutings: intFlag(args, 'compare-routings', 2) });
    for (const spec of flagAll(args, 'supply')) {
      const eq = spec.lastIndexOf('=');
      if (eq <= 0) throw new InputError(`--supply needs "<graph notation>=<expression>", got "${spec}"`, undefined, 'e.g. --supply "1-3 1-4 2-3 2-4 3-4 3-4 / 1 1 2 2=-1/3*eps^-3 + 2/3*eps^-2 - 1/3*eps^-1"');
      const g = bindGraph(parseNotation(spec.slice(0, eq).trim(), 'graph notation in --supply'), theory);
      engine.supplyCounterterm(g, expandExpression(spec.slice(eq + 1), -1));
    }
    const ct = engine.counterterm(bg);
    if (!ct.ok) report = { scheme: scheme.name, evaluable: false, reason: ct.reason };
    else {
      // The representative of the class may number vertices differently; report routing on the input graph when it is the representative.
      const rep = engine.algebra.representative(engine.algebra.classOf(bg));
      const a = engine.algebra.analyze(rep);
      const ren = renormalizedValue(ct.detail.subtracted, ct.value, bg.graph.edges.length);
      const rg = checkRgPoles(engine, a, ct.value);
      const routing = ct.detail.routing ? [rep.graph.vertices[ct.detail.routing.u]!.name, rep.graph.vertices[ct.detail.routing.v]!.name] : null;
      const poleOnly = ct.detail.poleOnly;
      failed = (!poleOnly && !ren.finite) || !ct.detail.local || !ct.detail.routingsAgree || (rg.checked && !rg.consistent);
      tex = {
        counterterm: ct.value,
        subtracted: poleOnly ? null : atReferencePoint(ct.detail.subtracted),
        renormalized: poleOnly ? null : ren.coefficients,
        method: ct.detail.method,
        checks: [
          poleOnly ? { label: 'finite', status: 'unchecked', detail: poleOnly } : { label: 'finite', status: status(ren.finite), detail: 'φ_R = R̄Γ + S_R(Γ) has no poles' },
          { label: 'local', status: status(ct.detail.local), detail: 'no ln(p²/μ²) in the pole part' },
          { label: 'routings agree', status: ct.detail.routingsCompared > 1 ? status(ct.detail.routingsAgree) : 'unchecked', detail: `${ct.detail.routingsCompared} compared` },
          { label: 'RG poles', status: rg.checked ? status(rg.consistent) : 'unchecked', detail: rg.reason ?? 'higher poles from the simple ones' },
        ],
      };
      report = {
        scheme: scheme.name, evaluable: true, method: ct.detail.method, routing, routingsCompared: ct.detail.routingsCompared,
        counterterm: seriesJSON(ct.value, -1), finite: poleOnly ? null : ren.finite, local: ct.detail.local, routingsAgree: ct.detail.routingsAgree,
        renormalized: poleOnly ? null : Object.fromEntries(ren.coefficients.map((c, j) => [String(j), formatPoly(c)])),
        ...(poleOnly ? { poleOnly } : {}),
        rgConsistent: rg.checked ? rg.consistent : null,
      };
    }
  }
  if (hasFlag(args, 'latex')) {
    io.out(
      writeValuesDocument({
        theory,
        notation: printNotation(bg.graph, { defaultField: theory.defaultField }),
        graph: bg.graph,
        scheme: { name: scheme.name, description: scheme.description },
        method: report.evaluable ? tex.method : String(report.reason),
        evaluable: report.evaluable === true,
        counterterm: tex.counterterm,
        bare: null,
        subtracted: tex.subtracted,
        renormalized: tex.renormalized,
        checks: tex.checks,
        supplied: flagAll(args, 'supply').map((x) => ({ notation: x.slice(0, x.lastIndexOf('=')).trim(), expression: x.slice(x.lastIndexOf('=') + 1).trim() })),
        version: pkg.version,
      }).trimEnd() + '\n',
    );
  } else if (hasFlag(args, 'json')) io.out(JSON.stringify(report) + '\n');
  else io.out(humanValues(report, theory.name) + '\n');
  return failed ? EXIT.checkFailed : EXIT.ok;
}

function humanValues(r: Record<string, unknown>, theory: string): string {
  if (!r.evaluable) return `not evaluable exactly [theory ${theory}, scheme ${r.scheme}]: ${r.reason}`;
  const series = (m: Record<string, string>, v: string) =>
    Object.entries(m).filter(([, c]) => c !== '0').map(([p, c]) => `(${c})${p === '0' ? '' : ` ${v}^${p}`}`).join(' + ') || '0';
  const mark = (b: unknown) => (b === true ? 'pass' : b === false ? 'FAIL' : 'not checked');
  return [
    `counterterm S_R  = ${series(r.counterterm as Record<string, string>, 'eps')}    [theory ${theory}, scheme ${r.scheme}]`,
    r.renormalized
      ? `renormalized     = ${series(r.renormalized as Record<string, string>, 'L')}    (L = ln(p²/μ²), at ε = 0${r.routing ? `, momentum routed ${(r.routing as string[]).join('→')}` : ''})`
      : `renormalized     not available: ${r.poleOnly ?? 'only the pole part is known'}`,
    `method           ${r.method}`,
    `checks           finite: ${mark(r.finite)}   local: ${mark(r.local)}   routings agree: ${(r.routingsCompared as number) >= 2 ? mark(r.routingsAgree) : 'not checked'} (${r.routingsCompared} compared)   RG poles: ${mark(r.rgConsistent)}`,
  ].join('\n');
}
