import { InputError } from '../errors.ts';
import { isOnePIGraph } from '../graph/connectivity.ts';
import type { Graph } from '../graph/types.ts';
import { divergentSubgraphs } from '../subgraphs/divergent-subgraphs.ts';
import type { SubgraphLimits } from '../subgraphs/limits.ts';
import { bindGraph, type BoundGraph } from '../theory/bind-graph.ts';
import { omegaOfGraph } from '../theory/power-counting.ts';
import type { Theory } from '../theory/types.ts';
import type { CancelToken } from '../util/cancel.ts';
import { periodGraphFromEdges, type PeriodGraph } from './period-graph.ts';
import { removeVertex, vertexByName } from './remove-vertex.ts';

/** Why a graph has no period: callers (the CLI) add their own pointers to other tools. */
export type PeriodRefusal = 'not-scalar' | 'not-1pi' | 'not-log-divergent' | 'not-primitive' | 'not-completed';

/** A graph refused by the period machinery, with the reason as data. */
export class PeriodGraphError extends InputError {
  readonly reason: PeriodRefusal;
  constructor(reason: PeriodRefusal, message: string, hint?: string) {
    super(message, undefined, hint);
    this.reason = reason;
  }
}

export interface PeriodInput {
  readonly periodGraph: PeriodGraph;
  /** The four-point (or, generally, log-divergent) graph whose period is taken, bound to the theory. */
  readonly bound: BoundGraph;
  /** Name of the vertex removed from a completed graph, or null when the input was not completed. */
  readonly removedVertex: string | null;
}

export interface PeriodInputOptions {
  /** For a completed graph: the name of the vertex to remove (default: the first vertex). */
  readonly removeVertex?: string;
  readonly subgraphLimits?: Partial<SubgraphLimits>;
  readonly cancel?: CancelToken;
}

/**
 * Checks that `g` has a period in `theory` and returns the data to compute it. Accepted:
 * a primitive (no proper divergent subgraph) logarithmically divergent graph with massless
 * scalar lines 1/p² and non-derivative vertices — in φ⁴ a four-point graph with 2L lines — or a
 * completed φ⁴ graph (vacuum, 4-regular), from which one vertex is removed first.
 */
export function periodInput(g: Graph, theory: Theory, opts: PeriodInputOptions = {}): PeriodInput {
  let graph = g;
  let removed: string | null = null;
  if (g.legs.length === 0 && g.edges.length > 0) {
    if (theory.dimension !== 4) {
      throw new PeriodGraphError('not-completed', `a vacuum graph has no period in theory ${theory.name}: completion is defined for φ⁴-type theories in four dimensions`, 'give the log-divergent graph itself');
    }
    const degree = g.vertices.map(() => 0);
    for (const e of g.edges) {
      degree[e.a]!++;
      degree[e.b]!++;
    }
    const bad = degree.findIndex((d) => d !== 4);
    if (bad >= 0) {
      throw new PeriodGraphError('not-completed', `a vacuum graph must be completed (every vertex 4-valent) to have a period, but vertex "${g.vertices[bad]!.name}" has ${degree[bad]} lines`, 'give a four-point primitive graph, or its completion');
    }
    const v = opts.removeVertex === undefined ? 0 : vertexByName(g, opts.removeVertex);
    removed = g.vertices[v]!.name;
    graph = removeVertex(g, v);
  } else if (opts.removeVertex !== undefined) {
    throw new InputError('only a completed (vacuum) graph has a vertex to remove', undefined, 'drop the vertex-removal option for a graph with legs');
  }
  const bg = bindGraph(graph, theory);
  return { periodGraph: periodGraphOfBound(bg, opts), bound: bg, removedVertex: removed };
}

/** The checks of `periodInput` on a graph already bound to its theory. */
export function periodGraphOfBound(bg: BoundGraph, opts: PeriodInputOptions = {}): PeriodGraph {
  const t = bg.theory;
  const g = bg.graph;
  if (t.dimension % 2 !== 0) throw new PeriodGraphError('not-scalar', `periods need an even dimension, theory ${t.name} has D0 = ${t.dimension}`);
  const heavy = bg.edgeWeight.findIndex((w) => w !== 2);
  if (heavy >= 0) {
    throw new PeriodGraphError('not-scalar', `line ${heavy + 1} (field ${g.edges[heavy]!.field}) is not a massless scalar 1/p² line, so ∫Ω/ψ^h is not its integral`, 'periods are defined for scalar graphs (e.g. φ⁴)');
  }
  const ct = bg.vertexKind.findIndex((k) => k < 0);
  if (ct >= 0) throw new PeriodGraphError('not-primitive', `vertex "${g.vertices[ct]!.name}" is a counterterm vertex; a period belongs to a graph without insertions`);
  const deriv = bg.vertexDerivatives.findIndex((d) => d !== 0);
  if (deriv >= 0) throw new PeriodGraphError('not-scalar', `vertex "${g.vertices[deriv]!.name}" carries derivatives, so ∫Ω/ψ^h is not its integral`);
  if (g.edges.length === 0 || !isOnePIGraph(g)) {
    throw new PeriodGraphError('not-1pi', 'the graph is not one-particle irreducible (or has no lines); only 1PI graphs can be primitive');
  }
  const omega = omegaOfGraph(bg);
  if (omega !== 0) {
    throw new PeriodGraphError('not-log-divergent', `the graph has superficial degree of divergence ω = ${omega}, not 0; a period is the residue of a logarithmically divergent graph`,
      omega > 0 ? 'in φ⁴ take a four-point graph' : 'a convergent graph has no counterterm');
  }
  const divergent = divergentSubgraphs(bg, { ...(opts.subgraphLimits ? { limits: opts.subgraphLimits } : {}), ...(opts.cancel ? { cancel: opts.cancel } : {}) });
  const proper = divergent.filter((s) => s.edgeList.length < g.edges.length);
  if (proper.length > 0) {
    const first = proper[0]!;
    throw new PeriodGraphError('not-primitive', `the graph is not primitive: it has ${proper.length} proper divergent subgraph${proper.length === 1 ? '' : 's'} (e.g. lines ${first.edgeList.map((e) => e + 1).join(',')}, ω = ${first.omega})`,
      'its counterterm needs the subtractions of the forest formula, not a period');
  }
  return periodGraphFromEdges(g.vertices.length, g.edges.map((e) => [e.a, e.b] as const), t.dimension / 2);
}
