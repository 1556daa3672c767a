/**
 * Plain-TikZ pictures of graphs, drawn from our own layout: one \draw per line in the style of
 * its field (solid, dashed, arrowed, wavy, curly), ordinary vertices as dots, counterterm
 * vertices as crossed circles. Needs the TikZ libraries in `tikzLibraries` and the styles of
 * `tikzStyles` (the full document's preamble has both).
 */
import type { Graph } from '../graph/types.ts';
import type { LineStyle, Theory } from '../theory/types.ts';
import { layoutGraph, type LaidLine, type Point } from './graph-layout.ts';

export const tikzLibraries = ['decorations.markings', 'decorations.pathmorphing'] as const;

/** The `\tikzset` block defining our styles: `coppice plain`, `coppice dashed`, … */
export function tikzStyles(): string {
  return [
    '\\tikzset{',
    '  coppice graph/.style={line width=0.6pt, line cap=round},',
    '  coppice plain/.style={},',
    '  coppice dashed/.style={dash pattern=on 2.2pt off 1.6pt},',
    '  coppice arrow/.style={postaction={decorate}, decoration={markings, mark=at position 0.58 with {\\arrow{>}}}},',
    '  coppice wavy/.style={decorate, decoration={snake, amplitude=1.1pt, segment length=4pt}},',
    '  coppice curly/.style={decorate, decoration={coil, aspect=0.5, amplitude=1.6pt, segment length=3pt}},',
    '  coppice vertex/.style={circle, fill, inner sep=0pt, minimum size=3.2pt},',
    '  coppice counterterm/.style={circle, draw, fill=white, inner sep=0pt, minimum size=7pt, line width=0.5pt,',
    '    path picture={\\draw[line width=0.5pt] (path picture bounding box.south west) -- (path picture bounding box.north east)',
    '      (path picture bounding box.north west) -- (path picture bounding box.south east);}},',
    '  coppice line number/.style={font=\\tiny, inner sep=0.5pt, fill=white, fill opacity=0.8, text opacity=1},',
    '}',
  ].join('\n');
}

/** How a field's lines are drawn (plain when the field is unknown). */
export function lineStyleOf(theory: Theory, field: string | null): LineStyle {
  const f = theory.fields.find((x) => x.name === field || x.antiparticle === field);
  return f ? f.line : 'plain';
}

export interface TikzOptions {
  /** TikZ scale (default 0.55). */
  readonly scale?: number;
  /** Write each internal line's number (1-based) beside it. */
  readonly lineNumbers?: boolean;
  /** Extra space above and below the drawing, in layout units (default 0). */
  readonly padding?: number;
}

const num = (x: number) => {
  const r = Math.round(x * 100) / 100;
  return Object.is(r, -0) ? '0' : String(r);
};
const coord = (p: Point) => `(${num(p.x)},${num(p.y)})`;

function bezierAt(l: LaidLine, t: number): Point {
  const u = 1 - t;
  const a = u * u * u;
  const b = 3 * u * u * t;
  const c = 3 * u * t * t;
  const d = t * t * t;
  return { x: a * l.from.x + b * l.c1.x + c * l.c2.x + d * l.to.x, y: a * l.from.y + b * l.c1.y + c * l.c2.y + d * l.to.y };
}

function drawLine(theory: Theory, l: LaidLine): string {
  const style = lineStyleOf(theory, l.field);
  const styles = [`coppice ${style === 'arrow' ? 'plain' : style}`];
  if (l.arrow) styles.push('coppice arrow');
  const straight = Math.abs((l.c1.x - l.from.x) * (l.to.y - l.from.y) - (l.c1.y - l.from.y) * (l.to.x - l.from.x)) < 1e-6 && (l.from.x !== l.to.x || l.from.y !== l.to.y);
  const path = straight ? `${coord(l.from)} -- ${coord(l.to)}` : `${coord(l.from)} .. controls ${coord(l.c1)} and ${coord(l.c2)} .. ${coord(l.to)}`;
  return `  \\draw[${styles.join(', ')}] ${path};`;
}

/** A `tikzpicture` of the graph, vertically centred on the math axis (usable inline in formulas). */
export function graphTikz(g: Graph, theory: Theory, opts: TikzOptions = {}): string {
  const lay = layoutGraph(g);
  const lines = [`\\begin{tikzpicture}[coppice graph, scale=${opts.scale ?? 0.55}, baseline={([yshift=-0.6ex]current bounding box.center)}]`];
  for (const l of lay.legs) lines.push(drawLine(theory, l));
  for (const e of lay.edges) lines.push(drawLine(theory, e));
  lay.vertices.forEach((v) => lines.push(v.counterterm ? `  \\node[coppice counterterm] at ${coord(v.at)} {};` : `  \\node[coppice vertex] at ${coord(v.at)} {};`));
  if (opts.lineNumbers) {
    for (const e of lay.edges) {
      const m = bezierAt(e, 0.5);
      lines.push(`  \\node[coppice line number] at ${coord(m)} {${e.index + 1}};`);
    }
  }
  if (opts.padding) {
    const { minX, minY, maxX, maxY } = lay.bounds;
    lines.push(`  \\path ${coord({ x: minX, y: minY - opts.padding })} ${coord({ x: maxX, y: maxY + opts.padding })};`);
  }
  lines.push('\\end{tikzpicture}');
  return lines.join('\n');
}

export { bezierAt };
