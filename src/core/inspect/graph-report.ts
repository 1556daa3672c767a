import { bridges, componentCount, isOnePIGraph, loopNumber } from '../graph/connectivity.ts';
import { fullEdgeSet } from '../graph/edge-set.ts';
import type { BoundGraph } from '../theory/bind-graph.ts';
import { countertermFor, couplingDimensions, omegaOfGraph, residueOfGraph } from '../theory/power-counting.ts';
import { overlappingPairs } from '../subgraphs/compatibility.ts';
import { countForests, countMaximalForests } from '../subgraphs/count-forests.ts';
import { divergentSubgraphs, type DivergentSubgraph, type DivergentSubgraphOptions } from '../subgraphs/divergent-subgraphs.ts';

/** Everything `coppice inspect` reports about a graph (the foundation's view of it). */
export interface GraphReport {
  readonly loops: number;
  readonly vertices: number;
  readonly edges: number;
  readonly legs: number;
  readonly onePI: boolean;
  readonly omega: number;
  readonly residue: readonly string[];
  /** The graph itself is 1PI with ω ≥ 0 (and has at least one loop). */
  readonly divergent: boolean;
  /** Connected proper divergent 1PI subgraphs, sorted by size then lexicographically. */
  readonly divergentSubgraphs: readonly DivergentSubgraph[];
  readonly overlapping: readonly [number, number][];
  readonly forests: { readonly proper: bigint; readonly maximal: bigint };
  readonly warnings: readonly string[];
}

const show = (r: readonly string[]) => `(${r.join(',')})`;

export function inspectGraph(bg: BoundGraph, opts: DivergentSubgraphOptions = {}): GraphReport {
  const g = bg.graph;
  const warnings: string[] = [];
  const loops = loopNumber(g);
  const onePI = isOnePIGraph(g);
  const omega = omegaOfGraph(bg);
  const residue = residueOfGraph(bg);
  const components = componentCount(g);
  if (components > 1) warnings.push(`the graph has ${components} connected components; counterterms are built for connected 1PI graphs`);
  else if (!onePI) {
    const br = bridges(g, g.edges.map((_, i) => i)).map((i) => i + 1);
    warnings.push(`the graph is not one-particle irreducible (cutting edge ${br.join(', edge ')} disconnects it); its divergences are those of its 1PI parts`);
  }
  const all = divergentSubgraphs(bg, opts);
  const full = fullEdgeSet(g.edges.length);
  const proper = all.filter((s) => s.edges !== full);
  const divergent = onePI && loops > 0 && omega >= 0 && components === 1;

  const seen = new Set<string>();
  const checkResidue = (r: readonly string[], what: string) => {
    const key = r.join(',');
    if (seen.has(key)) return;
    seen.add(key);
    const m = countertermFor(bg.theory, r);
    if (m.kind === 'protected') warnings.push(`no counterterm in the theory for residue ${show(r)} (${what}): it cancels by ${m.reason}`);
    if (m.kind === 'missing') warnings.push(`no counterterm in the theory for residue ${show(r)} (${what}): ${m.reason}`);
  };
  if (divergent) checkResidue(residue, 'the graph itself');
  for (const s of proper) checkResidue(s.residue, `subgraph with edges ${s.edgeList.map((i) => i + 1).join(',')}`);

  for (const [c, d] of couplingDimensions(bg.theory)) {
    if (d < 0) warnings.push(`theory ${bg.theory.name} is non-renormalizable by power counting: coupling ${c} has mass dimension ${d}, so ω grows with the loop number`);
  }
  return {
    loops,
    vertices: g.vertices.length,
    edges: g.edges.length,
    legs: g.legs.length,
    onePI,
    omega,
    residue,
    divergent,
    divergentSubgraphs: proper,
    overlapping: overlappingPairs(proper),
    forests: { proper: countForests(proper, opts.cancel), maximal: countMaximalForests(proper, opts) },
    warnings,
  };
}

/** Counts as JSON numbers up to 2^53 − 1, decimal strings beyond (DESIGN §10). */
export function jsonCount(n: bigint): number | string {
  return n <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(n) : n.toString();
}

/** The stable JSON shape of `coppice inspect --json`. */
export function graphReportToJSON(r: GraphReport): Record<string, unknown> {
  return {
    loops: r.loops,
    vertices: r.vertices,
    edges: r.edges,
    legs: r.legs,
    onePI: r.onePI,
    omega: r.omega,
    residue: [...r.residue],
    divergentSubgraphs: r.divergentSubgraphs.map((s) => ({ edges: [...s.edgeList], loops: s.loops, omega: s.omega, residue: [...s.residue] })),
    overlapping: r.overlapping.map(([i, j]) => [i, j]),
    forests: { proper: jsonCount(r.forests.proper), maximal: jsonCount(r.forests.maximal) },
    warnings: [...r.warnings],
  };
}
