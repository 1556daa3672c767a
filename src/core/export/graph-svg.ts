/**
 * SVG pictures of graphs for the app's LaTeX preview (KaTeX cannot draw TikZ), from the same
 * layout as the TikZ pictures: the same curves, dashes, arrows, waves, coils and vertex marks.
 * Strokes use `currentColor`, so the picture takes the surrounding text colour.
 */
import type { Graph } from '../graph/types.ts';
import type { Theory } from '../theory/types.ts';
import { layoutGraph, type LaidLine, type Point } from './graph-layout.ts';
import { bezierAt, lineStyleOf } from './graph-tikz.ts';

export interface SvgOptions {
  /** Pixels per layout unit (default 28). */
  readonly unit?: number;
  /** Accessible name of the picture (e.g. the graph's notation). */
  readonly title?: string;
  /** Write each internal line's number beside it. */
  readonly lineNumbers?: boolean;
}

const n2 = (x: number) => {
  const r = Math.round(x * 10) / 10;
  return Object.is(r, -0) ? '0' : String(r);
};
const xmlEscape = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

function tangentAt(l: LaidLine, t: number): Point {
  const u = 1 - t;
  const x = 3 * u * u * (l.c1.x - l.from.x) + 6 * u * t * (l.c2.x - l.c1.x) + 3 * t * t * (l.to.x - l.c2.x);
  const y = 3 * u * u * (l.c1.y - l.from.y) + 6 * u * t * (l.c2.y - l.c1.y) + 3 * t * t * (l.to.y - l.c2.y);
  const d = Math.hypot(x, y) || 1;
  return { x: x / d, y: y / d };
}

/** Points along the curve with a sideways wave (wavy) or a coil (curly), in layout units. */
function wiggle(l: LaidLine, coil: boolean): Point[] {
  const samples: Point[] = [];
  for (let k = 0; k <= 200; k++) samples.push(bezierAt(l, k / 200));
  let length = 0;
  const arc = [0];
  for (let k = 1; k < samples.length; k++) arc.push((length += Math.hypot(samples[k]!.x - samples[k - 1]!.x, samples[k]!.y - samples[k - 1]!.y)));
  const period = coil ? 0.2 : 0.26;
  const waves = Math.max(1, Math.round(length / period));
  const amp = coil ? 0.11 : 0.07;
  return samples.map((p, k) => {
    const phase = (2 * Math.PI * waves * arc[k]!) / (length || 1);
    const t = tangentAt(l, k / 200);
    const side = amp * Math.sin(phase);
    const along = coil ? amp * 1.4 * (1 - Math.cos(phase)) : 0;
    return { x: p.x - t.y * side + t.x * along, y: p.y + t.x * side + t.y * along };
  });
}

/** An SVG document (a string) of the graph. */
export function graphSvg(g: Graph, theory: Theory, opts: SvgOptions = {}): string {
  const u = opts.unit ?? 28;
  const lay = layoutGraph(g);
  const pad = 0.35;
  const { minX, minY, maxX, maxY } = lay.bounds;
  const X = (p: Point) => n2((p.x - minX + pad) * u);
  const Y = (p: Point) => n2((maxY - p.y + pad) * u);
  const w = n2((maxX - minX + 2 * pad) * u);
  const h = n2((maxY - minY + 2 * pad) * u);
  const out = [`<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${w} ${h}" width="${w}" height="${h}" role="img" fill="none" stroke="currentColor" stroke-width="1.4" stroke-linecap="round">`];
  if (opts.title) out.push(`<title>${xmlEscape(opts.title)}</title>`);
  const line = (l: LaidLine) => {
    const style = lineStyleOf(theory, l.field);
    if (style === 'wavy' || style === 'curly') {
      const pts = wiggle(l, style === 'curly');
      out.push(`<path d="M${pts.map((p) => `${X(p)} ${Y(p)}`).join(' L')}"/>`);
    } else {
      const dash = style === 'dashed' ? ' stroke-dasharray="4 3"' : '';
      out.push(`<path d="M${X(l.from)} ${Y(l.from)} C${X(l.c1)} ${Y(l.c1)} ${X(l.c2)} ${Y(l.c2)} ${X(l.to)} ${Y(l.to)}"${dash}/>`);
    }
    if (l.arrow) {
      const m = bezierAt(l, 0.58);
      const t = tangentAt(l, 0.58);
      const s = 0.13;
      const tip = { x: m.x + t.x * s, y: m.y + t.y * s };
      const b1 = { x: m.x - t.x * s - t.y * s * 0.8, y: m.y - t.y * s + t.x * s * 0.8 };
      const b2 = { x: m.x - t.x * s + t.y * s * 0.8, y: m.y - t.y * s - t.x * s * 0.8 };
      out.push(`<path d="M${X(tip)} ${Y(tip)} L${X(b1)} ${Y(b1)} L${X(b2)} ${Y(b2)} Z" fill="currentColor" stroke-width="0.8"/>`);
    }
  };
  lay.legs.forEach(line);
  lay.edges.forEach(line);
  for (const v of lay.vertices) {
    const cx = X(v.at);
    const cy = Y(v.at);
    if (!v.counterterm) out.push(`<circle cx="${cx}" cy="${cy}" r="${n2(0.06 * u)}" fill="currentColor" stroke="none"/>`);
    else {
      const r = 0.13 * u;
      const d = n2(r * Math.SQRT1_2);
      out.push(`<g><circle cx="${cx}" cy="${cy}" r="${n2(r)}" fill="white" stroke-width="1"/><path d="M${n2(+cx - +d)} ${n2(+cy - +d)} l${n2(2 * +d)} ${n2(2 * +d)} M${n2(+cx - +d)} ${n2(+cy + +d)} l${n2(2 * +d)} ${n2(-2 * +d)}" stroke-width="1"/></g>`);
    }
  }
  if (opts.lineNumbers) {
    for (const e of lay.edges) {
      const m = bezierAt(e, 0.5);
      out.push(`<text x="${X(m)}" y="${Y(m)}" font-size="${n2(0.3 * u)}" fill="currentColor" stroke="white" stroke-width="3" paint-order="stroke" text-anchor="middle" dominant-baseline="central">${e.index + 1}</text>`);
    }
  }
  out.push('</svg>');
  return out.join('\n');
}
