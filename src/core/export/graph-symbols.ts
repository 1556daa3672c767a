/**
 * How formulas show a graph: its symbol (\Gr, \sg{2}, \cog{\Gr}{\sg{1}}) or, in the document's
 * pictures mode, its TikZ picture, typeset once into a box and reused wherever it occurs.
 */
import type { Graph } from '../graph/types.ts';
import type { Theory } from '../theory/types.ts';
import { layoutGraph } from './graph-layout.ts';
import { graphTikz } from './graph-tikz.ts';
import { atom, type Atom } from './latex-layout.ts';

/** Estimated width of a symbol like `\cog{\Gr}{(\sg{1}\sg{2})}`. */
export function symbolWidth(symbol: string): number {
  const count = (re: RegExp) => (symbol.match(re) ?? []).length;
  return count(/\\Gr\b/g) * 1 + count(/\\sg\{/g) * 1.6 + count(/\\cog\{/g) * 0.6 + count(/\(/g) * 0.8;
}

const letters = (k: number): string => {
  let s = '';
  let n = k;
  do {
    s = String.fromCharCode(97 + (n % 26)) + s;
    n = Math.floor(n / 26) - 1;
  } while (n >= 0);
  return s;
};

const PICTURE_SCALE = 0.38;

export class GraphSymbols {
  private readonly boxes = new Map<string, { name: string; tikz: string; width: number }>();

  constructor(
    private readonly theory: Theory,
    private readonly pictures: boolean,
  ) {}

  /** The atom for a graph known by `symbol`; `graph` is drawn in pictures mode. */
  atom(symbol: string, graph: () => Graph): Atom {
    if (!this.pictures) return atom(symbol, symbolWidth(symbol));
    let box = this.boxes.get(symbol);
    if (!box) {
      const g = graph();
      const b = layoutGraph(g).bounds;
      // Layout units × scale are centimetres; about 2.8 em per centimetre at 10pt.
      box = { name: `\\coppicepic${letters(this.boxes.size)}`, tikz: graphTikz(g, this.theory, { scale: PICTURE_SCALE }), width: (b.maxX - b.minX) * PICTURE_SCALE * 2.8 + 0.6 };
      this.boxes.set(symbol, box);
    }
    return atom(`\\usebox{${box.name}}`, box.width);
  }

  /** Symbols only, whatever the mode (for tables). */
  labelsOnly(): GraphSymbols {
    return new GraphSymbols(this.theory, false);
  }

  /** `\newsavebox` and `\sbox` lines for every picture used (empty in labels mode). */
  declarations(): string {
    return [...this.boxes.values()].map((b) => `\\newsavebox{${b.name}}\\sbox{${b.name}}{${b.tikz}}`).join('\n');
  }
}
