import { expandExpression } from '../../core/algebra/expand-expression.ts';
import type { Series } from '../../core/algebra/series.ts';
import { InputError } from '../../core/errors.ts';
import { computeRg, rgConventions, rgReport, type RgCoefficients, type RgReport } from '../../core/rg/index.ts';
import { flag, flagAll, hasFlag, intFlag, requireFlag } from '../args.ts';
import { EXIT, type Command } from '../command.ts';
import { terminalProgress } from '../progress.ts';
import { resolveTheory } from '../inputs.ts';

const usage = `coppice rg --theory <name|file.json> --loops L --scheme <ms|msbar|g|mom> [--json] [--supply "<graph>=<expr>"]...

The renormalization-group functions of a quartic scalar theory (phi4, phi4-on) from every 1PI
graph with at most L loops: four-point graphs give Z_lambda, two-point graphs Z_phi (the p^2
counterterm), two-point graphs with a phi^2 insertion on each line in turn give Z_{m^2}; each
graph enters with its symmetry factor, vertex signs and group factor. Then, with
g = lambda/(16 pi^2) and D = 4 - 2 eps, beta(g) = mu dg/dmu through g^{L+1}, gamma_phi and
gamma_{m^2} through g^L. The conventions are printed beside the result. A graph that cannot be
evaluated is named, and every coefficient it enters is reported missing, never guessed.
Theories with fermion or gauge lines (yukawa, qed) are refused: their graphs are outside the
exact evaluator.

  --scheme   ms, msbar, g (the same RG functions; counterterms identical graph by graph in ms
             and msbar) or mom (momentum subtraction; in massless phi4 the exceptional point is
             infrared divergent for graphs with legs 1 and 2 on one vertex: those are named)
  --supply   the counterterm S_R of a graph the engine cannot evaluate (repeatable), as an
             expression in eps, e.g. "<notation>=-2*zeta(3)*eps^-1" or with an approximate
             number "1.2020569(1)"; approximate values are listed under "approximate" and
             their errors carried into the coefficients as {"approx", "error"}
  --json     {"couplings": ["g"], "beta": {"g": {"<monomial>": "<value>"}},
              "gamma": {"phi": {...}}, "gammaMass": {...}, "conventions": {...},
              "graphs": n, "notEvaluable": [notations], "approximate": [notations],
              "theory", "scheme", "loops", "knownThrough", "incomplete", "reasons", "checks"}
             monomials g, g^2, ...; the term -2 eps g of beta is the monomial "eps*g" with
             value "-2"; values are coefficients at eps^0 in canonical text; zero coefficients
             are omitted ("knownThrough" says how far each series is known); "graphs"
             counts the graph classes evaluated (four-point, two-point, and two-point with
             the phi^2 insertion, whose notation marks the insertion by a sigma leg)

Exit 0 when the RG pole relations hold, 1 when a check failed, 130 on Ctrl-C.
`;


function readSupplied(args: Parameters<Command['run']>[0]): Map<string, Series> {
  const out = new Map<string, Series>();
  for (const spec of flagAll(args, 'supply')) {
    const eq = spec.lastIndexOf('=');
    if (eq <= 0) throw new InputError(`--supply needs "<graph notation>=<expression>", got "${spec}"`, undefined, 'e.g. --supply "1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4=-2*zeta(3)*eps^-1"');
    out.set(spec.slice(0, eq).trim(), expandExpression(spec.slice(eq + 1), 0));
  }
  return out;
}

const show = (c: RgCoefficients) => {
  const parts = Object.entries(c).map(([m, v]) => `(${typeof v === 'string' ? v : `${v.approx} ± ${v.error}`})*${m}`);
  return parts.length ? parts.join(' + ') : '0';
};

function humanText(r: RgReport): string {
  const field = Object.keys(r.gamma)[0]!;
  const lines = [
    `RG functions of ${r.theory}, scheme ${r.scheme}, graphs through ${r.loops} loop${r.loops === 1 ? '' : 's'} (${r.graphs} graph classes)`,
    '',
    `  beta(g)       = ${show(r.beta.g!)}   [known through g^${r.knownThrough.beta.g}]`,
    `  gamma_${field}(g)  = ${show(r.gamma[field]!)}   [known through g^${r.knownThrough.gamma[field]}]`,
    `  gamma_m2(g)   = ${show(r.gammaMass)}   [known through g^${r.knownThrough.gammaMass}]`,
    '',
    `  RG pole relations (higher poles from the simple ones): ${r.checks.rgConsistent ? 'hold' : 'FAIL: ' + r.checks.failures.join('; ')}`,
  ];
  const missing = [...(r.incomplete.beta.g ?? []).map((m) => `beta ${m}`), ...(r.incomplete.gamma[field] ?? []).map((m) => `gamma_${field} ${m}`), ...r.incomplete.gammaMass.map((m) => `gamma_m2 ${m}`)];
  if (missing.length) lines.push(`  incomplete (not reported): ${missing.join(', ')}`);
  if (r.notEvaluable.length) {
    lines.push('', `  not evaluable (${r.notEvaluable.length}):`);
    for (const n of r.notEvaluable) lines.push(`    ${n}: ${r.reasons[n]}`);
  }
  if (r.approximate.length) lines.push('', `  approximate (supplied): ${r.approximate.join('; ')}`);
  lines.push('', '  conventions:');
  for (const [k, v] of Object.entries(r.conventions)) lines.push(`    ${k}: ${Array.isArray(v) ? v.join('; ') : String(v)}`);
  return lines.join('\n') + '\n';
}

export const rgCommand: Command = {
  name: 'rg',
  summary: 'beta and gamma functions of a theory from all its graphs, with the conventions',
  usage,
  flags: { booleans: ['json'], values: ['theory', 'loops', 'scheme', 'supply'] },
  run(args, io) {
    const theory = resolveTheory(flag(args, 'theory'), io);
    const loops = intFlag(args, 'loops', -1);
    if (loops < 0) requireFlag(args, 'loops', 'e.g. --loops 3');
    const schemeName = flag(args, 'scheme') ?? 'msbar';
    const progress = terminalProgress(io, 'rg', 'graphs');
    const r = computeRg(theory, { loops, scheme: schemeName, cancel: io.cancel, supplied: readSupplied(args), ...(progress ? { progress } : {}) });
    const report = rgReport(r, rgConventions(theory, r.scheme));
    io.out(hasFlag(args, 'json') ? JSON.stringify(report) + '\n' : humanText(report));
    return report.checks.rgConsistent ? EXIT.ok : EXIT.checkFailed;
  },
};
