/**
 * Formula layout: sums of products whose factors are symbols or operator brackets
 * `\Rmap[…]`, laid out as rows of an `aligned` environment. Brackets are sized by how deeply
 * they nest (fixed \bigl … \Biggl sizes, since \left…\right cannot span rows), rows break
 * before a term's sign when a width budget is exceeded, and one bracket depth can be made to
 * break before every term ("one subtraction level per line").
 */

export interface Atom {
  readonly tex: string;
  /** Estimated rendered width, in em-like units. */
  readonly width: number;
}

export interface Bracket {
  /** The operator written before the bracket, e.g. `\Rmap`. */
  readonly op: string;
  readonly terms: readonly Term[];
}

export interface Term {
  readonly sign: 1 | -1;
  readonly factors: readonly (Atom | Bracket)[];
}

export const atom = (tex: string, width: number): Atom => ({ tex, width });

const isBracket = (f: Atom | Bracket): f is Bracket => 'op' in f;

/** Nesting height: 1 for a bracket with no brackets inside. */
export function bracketHeight(b: Bracket): number {
  let h = 0;
  for (const t of b.terms) for (const f of t.factors) if (isBracket(f)) h = Math.max(h, bracketHeight(f));
  return h + 1;
}

const SIZES = ['', '\\bigl', '\\Bigl', '\\biggl', '\\Biggl'];
const openOf = (h: number) => `${SIZES[Math.min(h, SIZES.length) - 1]}[`;
const closeOf = (h: number) => `${SIZES[Math.min(h, SIZES.length) - 1]!.replace(/l$/, 'r')}]`;
/** Bracket sizes start this many steps up (pictures are taller than symbols). */
export type BracketBoost = number;

type Token = { readonly kind: 'text'; readonly tex: string; readonly width: number; readonly sign?: boolean } | { readonly kind: 'break'; readonly depth: number };

function termTokens(terms: readonly Term[], depth: number, out: Token[], boost = 0): void {
  terms.forEach((t, i) => {
    if (i > 0) {
      out.push({ kind: 'break', depth });
      out.push({ kind: 'text', tex: t.sign < 0 ? ' - ' : ' + ', width: 1.8, sign: true });
    } else if (t.sign < 0) out.push({ kind: 'text', tex: '-', width: 1.2 });
    t.factors.forEach((f, k) => {
      if (k > 0) out.push({ kind: 'text', tex: '\\,', width: 0.2 });
      if (!isBracket(f)) out.push({ kind: 'text', tex: f.tex, width: f.width });
      else {
        const h = bracketHeight(f) + boost;
        out.push({ kind: 'text', tex: `${f.op}${openOf(h)}`, width: 1.6 });
        termTokens(f.terms, depth + 1, out, boost);
        out.push({ kind: 'text', tex: closeOf(h), width: 0.5 });
      }
    });
  });
}

/** A sum written on one line (no breaks). */
export function sumTex(terms: readonly Term[], boost: BracketBoost = 0): string {
  const toks: Token[] = [];
  termTokens(terms, 0, toks, boost);
  return toks.map((t) => (t.kind === 'text' ? t.tex : '')).join('');
}

/** Estimated width of a sum on one line. */
export function sumWidth(terms: readonly Term[]): number {
  const toks: Token[] = [];
  termTokens(terms, 0, toks);
  return toks.reduce((s, t) => s + (t.kind === 'text' ? t.width : 0), 0);
}

export interface EquationLayout {
  /** Width budget per row. */
  readonly width: number;
  /** Break before every term of brackets at this depth (the top-level sum is depth 0, its brackets' terms depth 1). */
  readonly forceDepth?: number;
  /** Relation written at the alignment point (default `=`). */
  readonly relation?: string;
  /** Raise every bracket's size by this many steps (default 0). */
  readonly boost?: BracketBoost;
}

const indent = (depth: number) => (depth === 0 ? '\\quad' : '\\qquad' + '\\quad'.repeat(depth - 1));

/** Rows `lhs &= …`, `&\quad …` of an aligned environment for `lhs = terms`. */
export function equationRows(lhs: string, terms: readonly Term[], layout: EquationLayout): string[] {
  const toks: Token[] = [];
  termTokens(terms, 0, toks, layout.boost ?? 0);
  const rows: string[] = [];
  let row = `${lhs} &${layout.relation ?? '='} `;
  let width = 0;
  let fresh = false;
  const segmentWidth = (from: number) => {
    let w = 0;
    for (let j = from; j < toks.length; j++) {
      const t = toks[j]!;
      if (t.kind === 'break') break;
      w += t.width;
    }
    return w;
  };
  for (let i = 0; i < toks.length; i++) {
    const t = toks[i]!;
    if (t.kind === 'break') {
      const forced = layout.forceDepth === t.depth;
      if (forced || (width > 0 && width + segmentWidth(i + 1) > layout.width)) {
        rows.push(row.trimEnd());
        row = `&${indent(t.depth)} `;
        width = t.depth + 1;
        fresh = true;
      }
      continue;
    }
    row += fresh && t.sign ? `{}${t.tex.trimStart()}` : t.tex;
    fresh = false;
    width += t.width;
  }
  rows.push(row.trimEnd());
  return rows;
}

/** An aligned environment from rows (each row already has its `&`). */
export function alignedBlock(rows: readonly string[]): string {
  return `\\begin{aligned}\n${rows.map((r, i) => `  ${r}${i < rows.length - 1 ? ' \\\\' : ''}`).join('\n')}\n\\end{aligned}`;
}
