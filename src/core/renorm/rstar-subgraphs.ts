import { LimitError } from '../errors.ts';
import type { PropIntegral } from '../integrals/prop-integral.ts';
import { infraredRegions, softRegion, type SoftRegion } from './infrared-safety.ts';
import { isCutVertex, linesBridgeless, linesConnected, loopsOfLines, touchedVertices, uvDegree, type ScalarGraph } from './scalar-graph.ts';

/** An ultraviolet subgraph of a scalar graph: lines (indices), its vertices and degree. */
export interface UvSubgraph {
  readonly lines: readonly number[];
  readonly vertices: ReadonlySet<number>;
  readonly degree: number;
}

const MAX_LINES = 18;

/**
 * Every UV-divergent subgraph (connected, one-particle irreducible, at least one loop,
 * D0·L − 2Σν ≥ 0) among the line subsets of g, the whole graph excluded unless `withWhole`.
 */
export function uvSubgraphs(g: ScalarGraph, D0: number, withWhole = false): UvSubgraph[] {
  const E = g.lines.length;
  if (E > MAX_LINES) throw new LimitError('listing UV subgraphs for R*', 'maxRStarLines', MAX_LINES, `${E} lines`, 'the graph is too large for subsets of lines');
  const out: UvSubgraph[] = [];
  const full = (1 << E) - 1;
  for (let m = 1; m <= full; m++) {
    if (m === full && !withWhole) continue;
    const idx = bits(m);
    const lines = idx.map((k) => g.lines[k]!);
    if (loopsOfLines(lines) === 0 || !linesConnected(lines) || !linesBridgeless(lines)) continue;
    const degree = uvDegree(lines, D0);
    if (degree >= 0) out.push({ lines: idx, vertices: touchedVertices(lines), degree });
  }
  return out;
}

/** Sets of pairwise vertex-disjoint UV subgraphs (the empty set included): the UV spinneys. */
export function uvSpinneys(subs: readonly UvSubgraph[]): number[][] {
  const out: number[][] = [];
  const rec = (start: number, chosen: number[], used: Set<number>) => {
    out.push([...chosen]);
    for (let i = start; i < subs.length; i++) {
      const s = subs[i]!;
      if ([...s.vertices].some((v) => used.has(v))) continue;
      const next = new Set(used);
      for (const v of s.vertices) next.add(v);
      rec(i + 1, [...chosen, i], next);
    }
  };
  rec(0, [], new Set());
  return out;
}

/**
 * The infrared subgraphs of an integral for R*: divergent soft regions whose dual vacuum graph
 * (hard part merged into one vertex O) does not fall apart at O. A region whose dual does is the
 * union of smaller regions that meet only in the hard part; its counterterm is their product,
 * carried by the spinneys below. (A dual that falls apart at an interior vertex stays: its pieces
 * are not regions by themselves.)
 */
export function infraredSubgraphs(I: PropIntegral, D0: number): SoftRegion[] {
  return infraredRegions(I, D0).filter((r) => !isCutVertex(dualGraph(I, r).lines, 0));
}

/** The dual vacuum graph of a soft region, O = vertex 0. */
export function dualGraph(I: PropIntegral, r: SoftRegion): ScalarGraph {
  return { vertexCount: r.dualVertexCount, lines: r.dualLines.map((d) => ({ u: d.u, v: d.v, index: I.lines[d.line]!.index })) };
}

/**
 * Sets of infrared subgraphs (the empty set included) that can go soft together: no common line,
 * no common interior vertex, and their union is itself a soft region.
 */
export function infraredSpinneys(I: PropIntegral, subs: readonly SoftRegion[], D0: number): number[][] {
  const out: number[][] = [];
  const maskOf = (r: SoftRegion) => r.softLines.reduce((m, k) => m | (1 << k), 0);
  const rec = (start: number, chosen: number[], lines: number, interior: Set<number>) => {
    out.push([...chosen]);
    for (let i = start; i < subs.length; i++) {
      const r = subs[i]!;
      const m = maskOf(r);
      if (m & lines) continue;
      if (r.interior.some((v) => interior.has(v))) continue;
      if (!softRegion(I, m | lines, D0)) continue;
      rec(i + 1, [...chosen, i], m | lines, new Set([...interior, ...r.interior]));
    }
  };
  rec(0, [], 0, new Set());
  return out;
}

export function bits(m: number): number[] {
  const out: number[] = [];
  for (let k = 0; m >> k; k++) if (m & (1 << k)) out.push(k);
  return out;
}
