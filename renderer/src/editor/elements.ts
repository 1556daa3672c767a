/**
 * Cytoscape elements for a document graph: vertices, lines (drawn by the field's own
 * convention), and external legs as a line to a small numbered end. Pure data, so it is
 * tested headless and reused by the benchmark.
 */
import type { ElementDefinition } from 'cytoscape';
import type { LineStyle, Theory } from '../../../src/core/index.ts';
import type { DocGraph, Point } from '../../../src/core/project/index.ts';

/** Suffix of the id of a leg's free end (the leg's line has the leg's own id). */
export const LEG_END = '~end';
export const LEG_LENGTH = 64;
const PARALLEL_GAP = 56;

export function lineStyleOf(theory: Theory, field: string | null, oriented: boolean): LineStyle {
  const name = field ?? (oriented && theory.defaultOrientedField ? theory.defaultOrientedField : theory.defaultField);
  const f = theory.fields.find((x) => x.name === name || x.antiparticle === name);
  return f?.line ?? 'plain';
}

/**
 * Control points of an unbundled Bézier line: a bow of height `bow` (0 = straight), with a
 * wave on top for gauge bosons (`wavy`) and a tighter one for `curly`.
 */
export function controlPoints(style: LineStyle, bow: number, length: number): { distances: number[]; weights: number[] } {
  if (style !== 'wavy' && style !== 'curly') return { distances: [bow], weights: [0.5] };
  const period = style === 'wavy' ? 9 : 6;
  const amp = style === 'wavy' ? 6 : 8;
  // Keep the wave clear of the end nodes, or Cytoscape cannot find the line's endpoints.
  const margin = Math.min(0.3, 12 / Math.max(length, 1));
  const n = Math.max(4, Math.round((length * (1 - 2 * margin)) / period));
  const distances: number[] = [];
  const weights: number[] = [];
  for (let i = 0; i < n; i++) {
    const w = margin + ((i + 0.5) / n) * (1 - 2 * margin);
    weights.push(Number(w.toFixed(4)));
    distances.push(Number((2 * bow * w * (1 - w) + (i % 2 ? -amp : amp)).toFixed(2)));
  }
  return { distances, weights };
}

const dist = (a: Point, b: Point) => Math.hypot(a.x - b.x, a.y - b.y);

/** Where the free ends of a vertex's legs go: away from its neighbours, spread around that direction. */
export function legEnds(g: DocGraph): Map<string, Point> {
  const pos = new Map(g.vertices.map((v) => [v.id, v.position]));
  const cx = g.vertices.reduce((s, v) => s + v.position.x, 0) / Math.max(1, g.vertices.length);
  const cy = g.vertices.reduce((s, v) => s + v.position.y, 0) / Math.max(1, g.vertices.length);
  const out = new Map<string, Point>();
  for (const v of g.vertices) {
    const legs = g.legs.filter((l) => l.vertex === v.id);
    if (!legs.length) continue;
    let dx = 0;
    let dy = 0;
    for (const e of g.edges) {
      if (e.source === e.target && e.source === v.id) dy -= 1; // loops are drawn upwards
      else if (e.source === v.id || e.target === v.id) {
        const o = pos.get(e.source === v.id ? e.target : e.source)!;
        const d = dist(o, v.position) || 1;
        dx += (o.x - v.position.x) / d;
        dy += (o.y - v.position.y) / d;
      }
    }
    if (Math.hypot(dx, dy) < 1e-6) {
      dx = cx - v.position.x;
      dy = cy - v.position.y;
    }
    const base = Math.hypot(dx, dy) < 1e-6 ? Math.PI / 2 : Math.atan2(-dy, -dx);
    const spread = Math.min(0.55, 1.6 / legs.length);
    legs.forEach((l, k) => {
      const t = base + (k - (legs.length - 1) / 2) * spread;
      out.set(l.id, { x: Math.round(v.position.x + LEG_LENGTH * Math.cos(t)), y: Math.round(v.position.y + LEG_LENGTH * Math.sin(t)) });
    });
  }
  return out;
}

export interface ElementOptions {
  /** Ids of vertices, lines and legs with a validation issue. */
  readonly invalid?: ReadonlySet<string>;
  readonly showNames?: boolean;
}

export function graphElements(g: DocGraph, theory: Theory, opts: ElementOptions = {}): ElementDefinition[] {
  const invalid = opts.invalid ?? new Set<string>();
  const pos = new Map(g.vertices.map((v) => [v.id, v.position]));
  const els: ElementDefinition[] = g.vertices.map((v) => ({
    group: 'nodes',
    data: { id: v.id, kind: 'vertex', label: opts.showNames === false ? '' : v.name },
    position: { x: v.position.x, y: v.position.y },
    classes: ['vertex', v.counterterm ? 'counterterm' : '', invalid.has(v.id) ? 'invalid' : ''].filter(Boolean).join(' '),
  }));

  // Parallel lines between the same two vertices bow apart; loops at a vertex turn around it.
  const groups = new Map<string, string[]>();
  for (const e of g.edges) {
    const key = e.source === e.target ? `loop:${e.source}` : [e.source, e.target].sort().join('|');
    groups.set(key, [...(groups.get(key) ?? []), e.id]);
  }
  const loopDirections = [0, 180, 90, -90, 45, -135, 135, -45];
  for (const e of g.edges) {
    const style = lineStyleOf(theory, e.field, e.oriented);
    const loop = e.source === e.target;
    const key = loop ? `loop:${e.source}` : [e.source, e.target].sort().join('|');
    const group = groups.get(key)!;
    const k = group.indexOf(e.id);
    const classes = ['line', `line-${style}`, e.oriented ? 'oriented' : '', loop ? 'loop' : '', invalid.has(e.id) ? 'invalid' : ''];
    if (loop) {
      els.push({ group: 'edges', data: { id: e.id, kind: 'line', source: e.source, target: e.target, field: e.field ?? '', loopDirection: `${loopDirections[k % 8]}deg` }, classes: classes.filter(Boolean).join(' ') });
      continue;
    }
    let bow = (k - (group.length - 1) / 2) * PARALLEL_GAP;
    if (e.source > e.target) bow = -bow;
    const { distances, weights } = controlPoints(style, bow, dist(pos.get(e.source)!, pos.get(e.target)!));
    els.push({ group: 'edges', data: { id: e.id, kind: 'line', source: e.source, target: e.target, field: e.field ?? '', cpd: distances, cpw: weights }, classes: classes.filter(Boolean).join(' ') });
  }

  const ends = legEnds(g);
  g.legs.forEach((l, i) => {
    const end = `${l.id}${LEG_END}`;
    const style = lineStyleOf(theory, l.field, l.direction !== 'none');
    els.push({ group: 'nodes', data: { id: end, kind: 'leg-end', leg: l.id, label: String(i + 1) }, position: ends.get(l.id)!, classes: 'leg-end', grabbable: false });
    const [source, target] = l.direction === 'out' ? [l.vertex, end] : [end, l.vertex];
    const { distances, weights } = controlPoints(style, 0, LEG_LENGTH);
    const classes = ['line', 'leg', `line-${style}`, l.direction !== 'none' ? 'oriented' : '', invalid.has(l.id) ? 'invalid' : ''];
    els.push({ group: 'edges', data: { id: l.id, kind: 'leg', source, target, field: l.field ?? '', cpd: distances, cpw: weights }, classes: classes.filter(Boolean).join(' ') });
  });
  return els;
}
