/**
 * The macros every exported formula is written in. A user changes how the output looks by
 * redefining them: the full document defines each with `\providecommand` (so a definition made
 * earlier wins), the KaTeX-safe fragment either starts with the same `\providecommand` lines or
 * leaves them to KaTeX's `macros` option (`katexMacros`).
 */

/** Which renormalization map the formulas apply: a symbolic R, or the minimal-subtraction pole part K. */
export type LatexScheme = 'symbolic' | 'pole-part';

export interface LatexMacro {
  /** The control sequence, with its backslash. */
  readonly name: string;
  readonly args: number;
  /** Default definition (`#1` … for arguments). */
  readonly body: string;
  readonly meaning: string;
}

const MACROS: readonly LatexMacro[] = [
  { name: '\\Kop', args: 0, body: '\\mathcal{K}', meaning: 'pole-part operator (minimal subtraction)' },
  { name: '\\Rop', args: 0, body: '\\mathcal{R}', meaning: 'symbolic renormalization map' },
  { name: '\\Rmap', args: 0, body: '\\Rop', meaning: 'the map the formulas apply (\\Rop, or \\Kop for the pole-part scheme)' },
  { name: '\\Sct', args: 0, body: 'S_{\\Rmap}', meaning: 'twisted antipode: the counterterm of a graph' },
  { name: '\\Rbar', args: 0, body: '\\bar{\\Rmap}', meaning: 'a graph with its subdivergences subtracted (no overall subtraction)' },
  { name: '\\Cop', args: 0, body: '\\Delta', meaning: 'coproduct (coaction for a convergent graph)' },
  { name: '\\tp', args: 0, body: '\\otimes', meaning: 'tensor product in the coproduct' },
  { name: '\\unit', args: 0, body: '1', meaning: 'unit of the graph algebra (the empty graph)' },
  { name: '\\Gr', args: 0, body: '\\Gamma', meaning: 'the graph' },
  { name: '\\sg', args: 1, body: '\\gamma_{#1}', meaning: 'its #1-th divergent subgraph' },
  { name: '\\cog', args: 2, body: '{#1}/{#2}', meaning: 'cograph: #1 with the components of #2 contracted' },
  { name: '\\zetaval', args: 1, body: '\\zeta(#1)', meaning: 'a Riemann zeta value in evaluated results' },
];

/** The macro table (names, argument counts, default definitions, meanings). */
export function latexMacros(): readonly LatexMacro[] {
  return MACROS;
}

const bodyFor = (m: LatexMacro, scheme: LatexScheme) => (m.name === '\\Rmap' && scheme === 'pole-part' ? '\\Kop' : m.body);

/** `\providecommand` lines, one per macro, for a preamble or the head of a KaTeX fragment. */
export function macroDefinitions(scheme: LatexScheme): string[] {
  return MACROS.map((m) => `\\providecommand{${m.name}}${m.args ? `[${m.args}]` : ''}{${bodyFor(m, scheme)}}`);
}

/** The same definitions in the shape KaTeX's `macros` option takes. */
export function katexMacros(scheme: LatexScheme): Record<string, string> {
  return Object.fromEntries(MACROS.map((m) => [m.name, bodyFor(m, scheme)]));
}

/** Rewrites `\zeta(n)` as written by the value formatter into the user-redefinable `\zetaval{n}`. */
export function withValueMacros(tex: string): string {
  return tex.replace(/\\zeta\((\d+)\)/g, '\\zetaval{$1}');
}

/**
 * What the app passes to KaTeX for a fragment: our macros (a user's own entries may be spread
 * over them) and an expansion limit large enough for big formulas (KaTeX's default is 1000).
 */
export function katexRenderSettings(scheme: LatexScheme): { macros: Record<string, string>; maxExpand: number } {
  return { macros: katexMacros(scheme), maxExpand: 1_000_000 };
}
