/**
 * Our own deterministic drawing of a Feynman graph, shared by the TikZ and SVG writers:
 * vertices start on a circle in depth-first order and relax under a small spring model;
 * parallel lines fan out as symmetric Bézier arcs; self-loops and external legs go into the
 * widest free angle around their vertex. Every line is one cubic Bézier from → to.
 */
import type { Graph, LegDirection } from '../graph/types.ts';

export interface Point {
  readonly x: number;
  readonly y: number;
}

export interface LaidLine {
  /** Index of the edge (or leg) in the graph. */
  readonly index: number;
  readonly from: Point;
  readonly c1: Point;
  readonly c2: Point;
  readonly to: Point;
  readonly field: string | null;
  /** The line carries an arrow from → to (a fermion line, or an oriented leg). */
  readonly arrow: boolean;
}

export interface GraphLayout {
  readonly vertices: readonly { readonly at: Point; readonly counterterm: boolean }[];
  readonly edges: readonly LaidLine[];
  readonly legs: readonly (LaidLine & { readonly direction: LegDirection })[];
  readonly bounds: { readonly minX: number; readonly minY: number; readonly maxX: number; readonly maxY: number };
}

const EDGE = 1.6;
const LEG = 0.6;
const LOOP = 1.15;
const pt = (x: number, y: number): Point => ({ x, y });
const lerp = (a: Point, b: Point, t: number) => pt(a.x + (b.x - a.x) * t, a.y + (b.y - a.y) * t);

function positions(g: Graph): Point[] {
  const n = g.vertices.length;
  if (n === 0) return []; // the empty graph (the unit 1 of the Hopf algebra)
  if (n === 1) return [pt(0, 0)];
  if (n === 2) return [pt(-EDGE / 2, 0), pt(EDGE / 2, 0)];
  const adj = g.vertices.map(() => new Set<number>());
  for (const e of g.edges) if (e.a !== e.b) {
    adj[e.a]!.add(e.b);
    adj[e.b]!.add(e.a);
  }
  // Depth-first order puts neighbours next to each other on the starting circle.
  const order: number[] = [];
  const seen = new Set<number>();
  const visit = (v: number) => {
    seen.add(v);
    order.push(v);
    for (const w of [...adj[v]!].sort((x, y) => x - y)) if (!seen.has(w)) visit(w);
  };
  for (let v = 0; v < n; v++) if (!seen.has(v)) visit(v);
  const r = (EDGE * n) / (2 * Math.PI) + 0.3;
  const p = new Array<{ x: number; y: number }>(n);
  order.forEach((v, k) => {
    const th = Math.PI - (2 * Math.PI * k) / n;
    p[v] = { x: r * Math.cos(th), y: r * Math.sin(th) };
  });
  for (let it = 0; it < 300; it++) {
    const step = 0.08 * (1 - it / 300);
    const f = p.map(() => ({ x: 0, y: 0 }));
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) {
      const dx = p[j]!.x - p[i]!.x;
      const dy = p[j]!.y - p[i]!.y;
      const d = Math.max(Math.hypot(dx, dy), 0.05);
      const s = (adj[i]!.has(j) ? d - EDGE : 0) - (EDGE * EDGE * 0.6) / (d * d);
      f[i]!.x += (s * dx) / d;
      f[i]!.y += (s * dy) / d;
      f[j]!.x -= (s * dx) / d;
      f[j]!.y -= (s * dy) / d;
    }
    for (let i = 0; i < n; i++) {
      p[i]!.x += Math.max(-0.3, Math.min(0.3, step * f[i]!.x));
      p[i]!.y += Math.max(-0.3, Math.min(0.3, step * f[i]!.y));
    }
  }
  // Centre, then turn the long axis horizontal (pictures sit on a line of formula) with vertex 0 on the left.
  const cx = p.reduce((s, q) => s + q.x, 0) / n;
  const cy = p.reduce((s, q) => s + q.y, 0) / n;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (const q of p) {
    sxx += (q.x - cx) ** 2;
    syy += (q.y - cy) ** 2;
    sxy += (q.x - cx) * (q.y - cy);
  }
  const th = 0.5 * Math.atan2(2 * sxy, sxx - syy);
  const c = Math.cos(th);
  const s = Math.sin(th);
  const turned = p.map((q) => pt((q.x - cx) * c + (q.y - cy) * s, -(q.x - cx) * s + (q.y - cy) * c));
  const flip = turned[0]!.x > 1e-9 ? -1 : 1;
  return turned.map((q) => pt(q.x * flip, q.y));
}

/** Spreads `count` directions evenly over the widest free angle around a vertex (all round when it is free). */
function allocate(occupied: number[], count: number, preferred: number): number[] {
  if (count === 0) return [];
  const out: number[] = [];
  if (occupied.length === 0) {
    for (let k = 0; k < count; k++) out.push(preferred + (2 * Math.PI * k) / count);
  } else {
    const a = occupied.map((x) => ((x % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI)).sort((x, y) => x - y);
    let from = 0;
    let gap = -1;
    for (let i = 0; i < a.length; i++) {
      const g = (i + 1 < a.length ? a[i + 1]! : a[0]! + 2 * Math.PI) - a[i]!;
      if (g > gap + 1e-9) {
        gap = g;
        from = a[i]!;
      }
    }
    for (let k = 0; k < count; k++) out.push(from + (gap * (k + 1)) / (count + 1));
  }
  occupied.push(...out);
  return out;
}

export function layoutGraph(g: Graph): GraphLayout {
  const at = positions(g);
  const n = at.length;
  const cx = at.reduce((s, q) => s + q.x, 0) / n;
  const cy = at.reduce((s, q) => s + q.y, 0) / n;
  const occupied = at.map(() => [] as number[]);
  const edges: LaidLine[] = [];
  const groups = new Map<string, number[]>();
  g.edges.forEach((e, i) => {
    if (e.a === e.b) return;
    const key = `${Math.min(e.a, e.b)},${Math.max(e.a, e.b)}`;
    groups.set(key, [...(groups.get(key) ?? []), i]);
  });
  for (const [key, list] of groups) {
    const [lo, hi] = key.split(',').map(Number) as [number, number];
    const a = at[lo]!;
    const b = at[hi]!;
    const d = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    const nx = -(b.y - a.y) / d;
    const ny = (b.x - a.x) / d;
    list.forEach((i, j) => {
      const e = g.edges[i]!;
      const h = (j - (list.length - 1) / 2) * 0.42 * Math.min(d, EDGE) * 2;
      const q = pt((a.x + b.x) / 2 + nx * h, (a.y + b.y) / 2 + ny * h);
      const [s, t] = e.a === lo ? [a, b] : [b, a];
      edges.push({ index: i, from: s, c1: lerp(s, q, 2 / 3), c2: lerp(t, q, 2 / 3), to: t, field: e.field, arrow: e.oriented });
      occupied[e.a]!.push(Math.atan2(q.y - at[e.a]!.y, q.x - at[e.a]!.x));
      occupied[e.b]!.push(Math.atan2(q.y - at[e.b]!.y, q.x - at[e.b]!.x));
    });
  }
  const outward = (v: number) => (n === 1 ? Math.PI / 2 : Math.atan2(at[v]!.y - cy, at[v]!.x - cx));
  at.forEach((v, k) => {
    const loops = g.edges.map((e, i) => [e, i] as const).filter(([e]) => e.a === k && e.b === k);
    const dirs = allocate(occupied[k]!, loops.length, outward(k));
    loops.forEach(([e, i], j) => {
      const th = dirs[j]!;
      // A lone vertex's loops are drawn larger, so a wavy or curly loop stays legible.
      const size = n === 1 ? LOOP * 1.5 : LOOP;
      const c1 = pt(v.x + size * Math.cos(th - 0.5), v.y + size * Math.sin(th - 0.5));
      const c2 = pt(v.x + size * Math.cos(th + 0.5), v.y + size * Math.sin(th + 0.5));
      edges.push({ index: i, from: v, c1, c2, to: v, field: e.field, arrow: e.oriented });
      occupied[k]!.push(th - 0.45, th + 0.45);
    });
  });
  edges.sort((x, y) => x.index - y.index);
  const legDirs = at.map((_, k) => allocate(occupied[k]!, g.legs.filter((l) => l.vertex === k).length, outward(k)));
  const used = at.map(() => 0);
  const legs = g.legs.map((l, i) => {
    const v = at[l.vertex]!;
    const th = legDirs[l.vertex]![used[l.vertex]!++]!;
    const end = pt(v.x + LEG * Math.cos(th), v.y + LEG * Math.sin(th));
    const [s, t] = l.direction === 'in' ? [end, v] : [v, end];
    return { index: i, from: s, c1: lerp(s, t, 1 / 3), c2: lerp(s, t, 2 / 3), to: t, field: l.field, arrow: l.direction !== 'none', direction: l.direction };
  });
  const xs: number[] = [];
  const ys: number[] = [];
  const add = (q: Point) => {
    xs.push(q.x);
    ys.push(q.y);
  };
  at.forEach(add);
  // The curve stays inside the hull of its control points; arcs reach about 3/4 of the way.
  for (const e of [...edges, ...legs]) [e.from, lerp(e.from, e.c1, 0.75), lerp(e.to, e.c2, 0.75), e.to].forEach(add);
  const bounds = { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
  return { vertices: at.map((q, k) => ({ at: q, counterterm: !!g.vertices[k]!.counterterm })), edges, legs, bounds };
}
