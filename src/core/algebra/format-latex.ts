/**
 * LaTeX output: `\frac{145}{8} + 12\zeta(3)`, `\pi^{2}`, `\gamma_E`, `\ln 2`, and series
 * as sums of `(…)\,\varepsilon^{k}` plus `\mathcal{O}(\varepsilon^{k})`. Same term order
 * as the canonical text form.
 */
import { Approx } from './approx.ts';
import type { Monomial } from './monomial.ts';
import type { Poly } from './polynomial.ts';
import { Rational } from './rational.ts';
import type { Series } from './series.ts';
import { variableInfo } from './variables.ts';

function latexVariable(name: string): string {
  const info = variableInfo(name);
  switch (info.kind) {
    case 'pi':
      return '\\pi';
    case 'euler_gamma':
      return '\\gamma_E';
    case 'zeta':
      return `\\zeta(${info.index})`;
    case 'log':
      return info.group === 5 ? '\\ln\\pi' : `\\ln ${info.index}`;
    case 'symbol':
      return name.length === 1 ? name : `\\mathrm{${name.replace(/_/g, '\\_')}}`;
  }
}

/** `N^{2}\pi^{2}\zeta(3)` — factors juxtaposed, exponents in braces. */
export function monomialToLatex(m: Monomial): string {
  return m.factors
    .map((f) => {
      const v = latexVariable(f.name);
      if (f.exp === 1) return v;
      // (\ln 2)^{2}, \zeta(3)^{2}
      return (v.startsWith('\\ln') ? `(${v})` : v) + `^{${f.exp}}`;
    })
    .join(' ')
    .replace(/ (?=\\)/g, '');
}

function rationalToLatex(r: Rational): string {
  return r.isInteger() ? r.n.toString() : `\\frac{${r.n}}{${r.d}}`;
}

/** LaTeX of a polynomial, e.g. `\frac{145}{8} + 12\zeta(3)`. */
export function polyToLatex(p: Poly): string {
  const terms = p.terms();
  if (terms.length === 0) return '0';
  return terms
    .map((t, i) => {
      const c = t.coeff;
      const negative = c instanceof Rational ? c.sign() < 0 : c.value < 0;
      const abs = c instanceof Rational ? c.abs() : negative ? c.neg() : c;
      const mono = monomialToLatex(t.mono);
      let body: string;
      if (abs instanceof Approx) body = mono ? `${abs.toString()}\\,${mono}` : abs.toString();
      else if (mono === '') body = rationalToLatex(abs);
      else if (abs.isOne()) body = mono;
      else body = rationalToLatex(abs) + (/^\d/.test(mono) ? '\\,' : '') + mono;
      if (i === 0) return negative ? `-${body}` : body;
      return negative ? ` - ${body}` : ` + ${body}`;
    })
    .join('');
}

/** LaTeX of a series, with the remainder `\mathcal{O}(\varepsilon^{k})` when truncated. */
export function seriesToLatex(s: Series): string {
  const parts: string[] = [];
  for (let i = 0; i < s.coeffs.length; i++) {
    const c = s.coeffs[i]!;
    if (c.isZero()) continue;
    const k = s.val + i;
    const e = k === 0 ? '' : k === 1 ? '\\varepsilon' : `\\varepsilon^{${k}}`;
    const single = c.terms().length === 1 && c.terms()[0]!.coeff instanceof Rational;
    const body = polyToLatex(c);
    if (!e) parts.push(body);
    else if (body === '1') parts.push(e);
    else if (body === '-1') parts.push(`-${e}`);
    else parts.push(single ? `${body}\\,${e}` : `\\left(${body}\\right)${e}`);
  }
  if (s.order !== Infinity) {
    const k = s.order + 1;
    parts.push(`\\mathcal{O}(${k === 0 ? '1' : k === 1 ? '\\varepsilon' : `\\varepsilon^{${k}}`})`);
  }
  if (parts.length === 0) return '0';
  return parts.reduce((acc, p, i) => (i === 0 ? p : p.startsWith('-') ? `${acc} - ${p.slice(1)}` : `${acc} + ${p}`), '');
}
