/**
 * Plain text inside LaTeX: escaping of the special characters, and the few non-ASCII symbols
 * our own strings use (theory titles: φ, ψ̄, λ, ⁴ …) written so pdflatex needs no extra fonts.
 */

const SPECIAL: Record<string, string> = {
  '\\': '\\textbackslash{}',
  '{': '\\{',
  '}': '\\}',
  $: '\\$',
  '&': '\\&',
  '#': '\\#',
  '%': '\\%',
  _: '\\_',
  '^': '\\^{}',
  '~': '\\~{}',
  '<': '\\textless{}',
  '>': '\\textgreater{}',
};

const MATH_SYMBOL: Record<string, string> = {
  α: '\\alpha', β: '\\beta', γ: '\\gamma', δ: '\\delta', ε: '\\varepsilon', λ: '\\lambda', μ: '\\mu',
  π: '\\pi', Σ: '\\Sigma', '□': '\\square', φ: '\\phi', ψ: '\\psi', ζ: '\\zeta', Γ: '\\Gamma', Δ: '\\Delta', ω: '\\omega',
  '·': '\\cdot', '×': '\\times', '⊗': '\\otimes', '≤': '\\le', '≥': '\\ge', '→': '\\to',
  '⁰': '^0', '¹': '^1', '²': '^2', '³': '^3', '⁴': '^4', '⁵': '^5', '⁶': '^6',
};

const TEXT_SYMBOL: Record<string, string> = { '−': '-', '–': '--', '—': '---', '’': "'", '‘': '`', '“': '``', '”': "''", ' ': ' ' };

/**
 * Text for a LaTeX text context (tabular cells, headings): specials escaped, known symbols as
 * math, a combining overline (ψ̄) as \bar, anything else unknown as `?`.
 */
export function latexText(s: string): string {
  let out = '';
  const chars = [...s.normalize('NFC')];
  for (let i = 0; i < chars.length; i++) {
    const c = chars[i]!;
    // A Latin letter with a combining macron (R̄, the subtracted value) has no precomposed form.
    if (/[A-Za-z]/.test(c) && chars[i + 1] === '\u0304') {
      out += `$\\bar{${c}}$`;
      i++;
      continue;
    }
    if (SPECIAL[c]) out += SPECIAL[c];
    else if (MATH_SYMBOL[c]) {
      const bar = chars[i + 1] === '\u0304';
      if (bar) i++;
      out += `\\ensuremath{${bar ? `\\bar{${MATH_SYMBOL[c]}}` : MATH_SYMBOL[c]}}`;
    } else if (TEXT_SYMBOL[c]) out += TEXT_SYMBOL[c];
    else if (c.charCodeAt(0) < 128) out += c;
    else out += '?';
  }
  return out;
}

/**
 * Text in typewriter type, safe in LaTeX and in KaTeX's text mode: only braces and the
 * characters our notation and convention strings use are escaped.
 */
export function latexTypewriter(s: string): string {
  return `\\texttt{${latexText(s)}}`;
}

/** A comment line (newlines flattened so the comment cannot end early). */
export function latexComment(s: string): string {
  return `% ${s.replace(/[\r\n]+/g, ' ')}`;
}
