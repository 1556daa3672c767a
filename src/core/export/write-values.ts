/**
 * LaTeX of values: one graph's counterterm S_R(Γ), its subtracted value and renormalized value
 * with the checks (`writeValuesDocument`), and a whole theory's Z-factors and RG functions with
 * the graph-by-graph breakdown — 1/S, group factor, coupling power, S_R(Γ) — (`writeRgDocument`).
 * Pure functions of plain inputs; each returns a complete .tex file (TikZ pictures of the graphs)
 * that pdflatex compiles with the packages of a basic TeX Live.
 */
import { polyToLatex, seriesToLatex } from '../algebra/format-latex.ts';
import type { Poly } from '../algebra/polynomial.ts';
import type { Series } from '../algebra/series.ts';
import type { Graph } from '../graph/types.ts';
import type { Theory } from '../theory/types.ts';
import { graphTikz } from './graph-tikz.ts';
import { latexComment, latexText, latexTypewriter } from './latex-text.ts';
import { conventionEntries, documentPreamble, recordTable } from './write-document.ts';

export type ValueCheckStatus = 'pass' | 'fail' | 'unchecked';

export interface ValuesDocumentInput {
  readonly theory: Theory;
  readonly notation: string;
  readonly graph: Graph;
  readonly scheme: { readonly name: string; readonly description: string };
  /** How the value was obtained, or why it could not be. */
  readonly method: string;
  readonly evaluable: boolean;
  readonly counterterm: Series | null;
  /** The unsubtracted value φ(Γ) on the routing at p² = μ², when it was computed. */
  readonly bare: Series | null;
  /** R̄Γ at p² = μ². */
  readonly subtracted: Series | null;
  /** φ_R as coefficients of L^j, L = ln(p²/μ²), at ε⁰. */
  readonly renormalized: readonly Poly[] | null;
  readonly checks: readonly { readonly label: string; readonly status: ValueCheckStatus; readonly detail: string }[];
  readonly supplied: readonly { readonly notation: string; readonly expression: string }[];
  readonly version?: string;
}

/** The polynomial Σ_j c_j L^j in LaTeX (L = ln(p²/μ²)). */
export function logPolyToLatex(coefficients: readonly Poly[], variable = 'L'): string {
  const parts: string[] = [];
  coefficients.forEach((c, j) => {
    if (c.isZero()) return;
    const body = polyToLatex(c);
    const pow = j === 0 ? '' : j === 1 ? variable : `${variable}^{${j}}`;
    if (!pow) parts.push(body);
    else if (body === '1') parts.push(pow);
    else if (body === '-1') parts.push(`-${pow}`);
    else parts.push(c.terms().length === 1 ? `${body}\\,${pow}` : `\\left(${body}\\right)${pow}`);
  });
  if (!parts.length) return '0';
  return parts.reduce((acc, p, i) => (i === 0 ? p : p.startsWith('-') ? `${acc} - ${p.slice(1)}` : `${acc} + ${p}`), '');
}

/** A counterterm (pole part): the series without the O(1) remainder the pole part carries. */
export function polesToLatex(s: Series): string {
  const t = seriesToLatex(s);
  return t.replace(/ \+ \\mathcal\{O\}\(1\)$/, '').replace(/^\\mathcal\{O\}\(1\)$/, '0');
}

const preamble = documentPreamble;


const mark = (s: ValueCheckStatus) => (s === 'pass' ? 'pass' : s === 'fail' ? 'FAIL' : 'not checked');

export function writeValuesDocument(d: ValuesDocumentInput): string {
  const record: [string, string][] = [
    ['written by', `Coppice${d.version ? ` ${d.version}` : ''}`],
    ['graph', d.notation],
    ['theory', `${d.theory.name} (${d.theory.title}), D0 = ${d.theory.dimension}`],
    ['scheme', d.scheme.description],
    ...conventionEntries(d.theory.conventions).map(([k, v]): [string, string] => [`convention: ${k}`, v]),
  ];
  const body: string[] = [];
  body.push(`\\[ \\Gamma \\;=\\; ${graphTikz(d.graph, d.theory, { scale: 0.6, lineNumbers: true })} \\qquad \\text{${latexText(d.notation)}} \\]`);
  body.push(`\\paragraph{Method.} ${latexText(d.method)}`);
  if (d.supplied.length) {
    body.push('\\paragraph{Values entered by hand.}');
    body.push('\\begin{itemize}');
    for (const s of d.supplied) body.push(`\\item ${latexTypewriter(s.notation)}: ${latexTypewriter(s.expression)}`);
    body.push('\\end{itemize}');
  }
  if (d.evaluable) {
    body.push('\\begin{align*}');
    const rows: string[] = [];
    if (d.bare) rows.push(`\\phi(\\Gamma)\\big|_{p^2=\\mu^2} &= ${seriesToLatex(d.bare)}`);
    if (d.subtracted) rows.push(`\\bar R\\,\\Gamma\\big|_{p^2=\\mu^2} &= ${seriesToLatex(d.subtracted)}`);
    if (d.counterterm) rows.push(`S_R(\\Gamma) &= ${polesToLatex(d.counterterm)}`);
    if (d.renormalized) rows.push(`\\phi_R(\\Gamma)\\big|_{\\varepsilon=0} &= ${logPolyToLatex(d.renormalized)}, \\qquad L = \\ln(p^2/\\mu^2)`);
    body.push(rows.join(' \\\\\n'));
    body.push('\\end{align*}');
  }
  if (d.checks.length) {
    body.push('\\paragraph{Checks.}');
    body.push('\\begin{center}\\small\\begin{tabular}{@{}l l p{10cm}@{}}');
    for (const c of d.checks) body.push(`${latexText(c.label)} & ${mark(c.status)} & ${latexText(c.detail)} \\\\`);
    body.push('\\end{tabular}\\end{center}');
  }
  return [
    ...record.map(([k, v]) => latexComment(`${k}: ${v}`)),
    ...preamble(),
    '\\begin{document}',
    '\\section*{Counterterm of a Feynman graph}',
    recordTable(record, '11cm'),
    ...body,
    '\\end{document}',
    '',
  ].join('\n');
}

// ——— whole theories ———

export interface RgDocumentGraph {
  readonly kind: 'vertex' | 'field' | 'mass';
  readonly loops: number;
  readonly notation: string;
  readonly graph: Graph;
  /** The theory the graph is drawn in (the φ² insertion's auxiliary theory for mass graphs). */
  readonly drawTheory: Theory;
  readonly symmetryFactor: bigint;
  readonly groupFactor: Poly;
  /** Everything but g^L and S_R: Z − 1 ⊃ weight · g^L · S_R(Γ). */
  readonly weight: Poly;
  /** S_R(Γ), or null when it could not be evaluated. */
  readonly counterterm: Series | null;
  readonly approximate: boolean;
  readonly reason?: string;
}

export interface RgDocumentFunction {
  /** LaTeX name, e.g. `\beta(g)`. */
  readonly tex: string;
  /** Terms in order: LaTeX monomial (`g^{2}`, `\varepsilon g`) and coefficient. */
  readonly terms: readonly { readonly monomial: string; readonly coefficient: Poly | string }[];
  readonly knownThrough: number;
  readonly missing: readonly string[];
}

export interface RgDocumentInput {
  readonly theory: Theory;
  readonly scheme: { readonly name: string; readonly description: string };
  readonly loops: number;
  /** `rgConventions`: printed beside the result. */
  readonly conventions: Readonly<Record<string, unknown>>;
  readonly graphs: readonly RgDocumentGraph[];
  /** Z-factors as series in g with ε-series coefficients (Z_λ, Z_φ, Z_{m²}). */
  readonly z: readonly { readonly tex: string; readonly coefficients: readonly Series[]; readonly order: number }[];
  readonly functions: readonly RgDocumentFunction[];
  readonly consistent: boolean;
  readonly failures: readonly string[];
  readonly version?: string;
}

const KIND_TEX: Record<RgDocumentGraph['kind'], string> = { vertex: 'Z_\\lambda', field: 'Z_\\phi', mass: 'Z_{m^2}' };
const gPow = (k: number) => (k === 1 ? 'g' : `g^{${k}}`);

function functionLine(f: RgDocumentFunction): string {
  const parts = f.terms.map((t) => {
    const c = typeof t.coefficient === 'string' ? t.coefficient : polyToLatex(t.coefficient);
    const single = typeof t.coefficient === 'string' || t.coefficient.terms().length <= 1;
    if (c === '1') return t.monomial;
    if (c === '-1') return `-${t.monomial}`;
    return single ? `${c}\\,${t.monomial}` : `\\left(${c}\\right)${t.monomial}`;
  });
  const sum = parts.length ? parts.reduce((acc, p, i) => (i === 0 ? p : p.startsWith('-') ? `${acc} - ${p.slice(1)}` : `${acc} + ${p}`), '') : '0';
  return `${f.tex} &= ${sum} + \\mathcal{O}(${gPow(f.knownThrough + 1)})`;
}

function zLine(z: RgDocumentInput['z'][number]): string {
  const parts = ['1'];
  for (let k = 1; k < z.coefficients.length && k <= z.order; k++) {
    const c = z.coefficients[k];
    if (!c || c.isZero()) continue;
    parts.push(`\\left(${polesToLatex(c)}\\right) ${gPow(k)}`);
  }
  return `${z.tex} &= ${parts.join(' + ')} + \\mathcal{O}(${gPow(z.order + 1)})`;
}

export function writeRgDocument(d: RgDocumentInput): string {
  const record: [string, string][] = [
    ['written by', `Coppice${d.version ? ` ${d.version}` : ''}`],
    ['content', `Z-factors and RG functions through ${d.loops} loop${d.loops === 1 ? '' : 's'}`],
    ['theory', `${d.theory.name} (${d.theory.title}), D0 = ${d.theory.dimension}`],
    ['scheme', d.scheme.description],
    ...Object.entries(d.conventions).filter(([k]) => k !== 'scheme' && k !== 'loopMeasure').map(([k, v]): [string, string] => [`convention: ${k}`, Array.isArray(v) ? v.join('; ') : String(v)]),
  ];
  const missing = d.graphs.filter((g) => !g.counterterm);
  const approx = d.graphs.filter((g) => g.counterterm && g.approximate);
  const body: string[] = [];
  body.push('\\subsection*{Renormalization-group functions}');
  body.push('\\begin{align*}');
  body.push(d.functions.map(functionLine).join(' \\\\\n'));
  body.push('\\end{align*}');
  body.push(`\\noindent RG consistency (every pole of the RG functions cancels): ${d.consistent ? 'pass' : 'FAIL'}.${d.failures.length ? ` ${latexText(d.failures.join('; '))}` : ''}`);
  if (missing.length) body.push(`\\par\\noindent Not evaluated (their orders are left out): ${missing.map((g) => latexTypewriter(g.notation)).join(', ')}.`);
  if (approx.length) body.push(`\\par\\noindent Approximate values entered by hand: ${approx.map((g) => latexTypewriter(g.notation)).join(', ')}.`);
  body.push('\\subsection*{Renormalization constants}');
  body.push('\\begin{align*}');
  body.push(d.z.map(zLine).join(' \\\\\n'));
  body.push('\\end{align*}');
  body.push('\\subsection*{Graph by graph}');
  body.push(`\\noindent Each graph enters its renormalization constant as $Z - 1 \\ni w \\cdot g^{L} \\cdot S_R(\\Gamma)$, with $w = -(\\text{vertex sign})^V (\\text{tree factor})^{k} \\, c_\\Gamma / S$ (${latexText('see zFromGraphs in the conventions above')}).`);
  body.push('{\\small');
  // Fixed column widths: longtable then aligns its chunks in a single pdflatex run.
  body.push('\\begin{longtable}{@{}p{0.6cm} p{1.7cm} p{0.8cm} p{0.7cm} p{2.5cm} p{2.5cm} p{0.6cm} p{4.2cm}@{}}');
  const head = '\\# & $\\Gamma$ & $Z$ & $1/S$ & $c_\\Gamma$ & $w$ & $g^L$ & $S_R(\\Gamma)$ \\\\ \\hline';
  body.push(`${head}\n\\endfirsthead\n${head}\n\\endhead`);
  d.graphs.forEach((g, i) => {
    const pic = graphTikz(g.graph, g.drawTheory, { scale: 0.32 });
    const ct = g.counterterm ? `$${polesToLatex(g.counterterm)}$${g.approximate ? ' (approx.)' : ''}` : `not evaluated${g.reason ? `: ${latexText(g.reason.slice(0, 160))}` : ''}`;
    body.push(`${i + 1} & ${pic} & $${KIND_TEX[g.kind]}$ & $\\frac{1}{${g.symmetryFactor}}$ & $${polyToLatex(g.groupFactor)}$ & $${polyToLatex(g.weight)}$ & $${gPow(g.loops)}$ & ${ct} \\\\[2pt]`);
  });
  body.push('\\end{longtable}');
  body.push('}');
  return [
    ...record.map(([k, v]) => latexComment(`${k}: ${v}`)),
    ...preamble(),
    '\\begin{document}',
    `\\section*{Renormalization of ${latexText(d.theory.name)} through ${d.loops} loop${d.loops === 1 ? '' : 's'}}`,
    recordTable(record, '11cm'),
    ...body,
    '\\end{document}',
    '',
  ].join('\n');
}
