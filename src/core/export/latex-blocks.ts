/**
 * The pieces a writer produces, and how each target puts them together: the full document
 * writes `align*` environments, tables and TikZ boxes; the KaTeX fragment stacks the same
 * formulas as `aligned` and `array` inside one `gathered` display.
 */

export interface LatexBlock {
  /** Heading, plain text (already LaTeX-safe). */
  readonly heading: string;
  /** Rows of an aligned display (each with its `&`). */
  readonly rows?: readonly string[];
  /** A display-math `array` (KaTeX) … */
  readonly array?: string;
  /** … or document-only LaTeX standing in its place (tabulars, longtables). */
  readonly raw?: string;
  /** A sentence under the heading (LaTeX text, safe in KaTeX's \text). */
  readonly note?: string;
}

/** The blocks as the body of a .tex document. */
export function documentBody(blocks: readonly LatexBlock[]): string {
  const out: string[] = [];
  for (const b of blocks) {
    out.push(`\\subsection*{${b.heading}}`);
    if (b.note) out.push(b.note, '');
    if (b.rows) out.push('\\begin{align*}', b.rows.map((r, i) => `  ${r}${i < b.rows!.length - 1 ? ' \\\\' : ''}`).join('\n'), '\\end{align*}');
    if (b.raw) out.push(b.raw);
    else if (b.array) out.push('\\[', b.array, '\\]');
    out.push('');
  }
  return out.join('\n');
}

/** The blocks as one KaTeX-safe display-math string. */
export function katexBody(blocks: readonly LatexBlock[]): string {
  const parts: string[] = [];
  for (const b of blocks) {
    parts.push(`\\text{\\textbf{${b.heading}}}`);
    if (b.note) parts.push(`\\text{${b.note}}`);
    if (b.rows) parts.push(`\\begin{aligned}\n${b.rows.map((r, i) => `  ${r}${i < b.rows!.length - 1 ? ' \\\\' : ''}`).join('\n')}\n\\end{aligned}`);
    if (b.array) parts.push(b.array);
  }
  return `\\begin{gathered}\n${parts.join(' \\\\[1ex]\n')}\n\\end{gathered}`;
}
