import { Rational } from '../algebra/rational.ts';
import type { BoundGraph } from '../theory/bind-graph.ts';
import { fieldByName } from '../theory/bind-graph.ts';
import { addIndex, ONE_INDEX, type LineIndex } from '../integrals/line-index.ts';
import type { PropIntegral, PropLine } from '../integrals/prop-integral.ts';

/** A graph turned into a propagator integral, or the reason it cannot be. */
export type Routed = { ok: true; integral: PropIntegral } | { ok: false; reason: string };

/**
 * The propagator-type integral of a (bound) graph with the external momentum routed in at
 * vertex u and out at v; external legs carry no momentum. Scalar lines have index 1 (weight 2);
 * a two-point counterterm vertex of structure p² multiplies its line by k² (the two lines through
 * it merge, indices adding to ν1 + ν2 − 1), a mass insertion m² merges them with nothing added.
 */
export function routedIntegral(bg: BoundGraph, u: number, v: number): Routed {
  const g = bg.graph;
  for (const e of g.edges) {
    const f = fieldByName(bg.theory, e.field!)!;
    if (f.statistics !== 'boson' || f.propagatorWeight !== 2 || f.antiparticle) {
      return { ok: false, reason: `lines of field ${f.name} (${f.statistics}, weight ${f.propagatorWeight}) are outside the exact evaluator, which handles massless scalar lines only; supply the value by hand` };
    }
  }
  let lines: PropLine[] = g.edges.map((e) => ({ u: e.a, v: e.b, index: ONE_INDEX }));
  for (let x = 0; x < g.vertices.length; x++) {
    const ct = g.vertices[x]!.counterterm;
    if (!ct || ct.structure === '') continue;
    if (ct.structure !== 'p2' && ct.structure !== 'm2') return { ok: false, reason: `a counterterm vertex of structure ${ct.structure} is outside the scalar evaluator` };
    if (x === u || x === v) return { ok: false, reason: 'the external momentum would enter at a two-point counterterm vertex' };
    const at = lines.map((l, k) => ({ l, k })).filter(({ l }) => l.u === x || l.v === x);
    if (at.length === 1 && at[0]!.l.u === at[0]!.l.v) return { ok: true, integral: { vertexCount: g.vertices.length, s: u, t: v, lines: [{ u: x, v: x, index: ONE_INDEX }] } };
    if (at.length !== 2) return { ok: false, reason: 'a two-point counterterm vertex must sit on one line' };
    const [p, q] = at;
    const a = p!.l.u === x ? p!.l.v : p!.l.u;
    const b = q!.l.u === x ? q!.l.v : q!.l.u;
    const shift: LineIndex = { a: ct.structure === 'p2' ? -1 : 0, b: Rational.ZERO };
    const merged = addIndex(addIndex(p!.l.index, q!.l.index), shift);
    lines = lines.filter((_, k) => k !== p!.k && k !== q!.k);
    lines.push({ u: a, v: b, index: merged });
  }
  return { ok: true, integral: { vertexCount: g.vertices.length, s: u, t: v, lines } };
}
