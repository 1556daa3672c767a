import { InputError, LimitError } from '../errors.ts';
import type { Graph } from '../graph/types.ts';
import { Rational } from '../algebra/rational.ts';
import type { Theory } from '../theory/types.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import { estimateGraphCount } from './estimate-count.ts';
import { fillVertex } from './fill-vertex.ts';
import { generationContext, type GenerationContext } from './generation-context.ts';
import { initialStates } from './initial-states.ts';
import { LabelledCanonicalizer } from './labelled-canonical.ts';
import { legLabellings, stateEdges, stateGraph } from './label-legs.ts';
import { edgeFactor, freeAt, type PartialState } from './partial-state.ts';
import { hasScalelessPart } from './scaleless-parts.ts';
import { ColourTable, stateCanon } from './state-canonical.ts';
import { isViable } from './state-viability.ts';
import { vertexCountVectors } from './vertex-counts.ts';

/** Limits that refuse explosive requests (a LimitError names the one that was hit). */
export interface GenerateLimits {
  /** Largest accepted up-front estimate of the number of graphs (default 3,000,000: φ³ three-point graphs at 7 loops, about 1.8 million estimated and 979,864 generated, pass; 8 loops do not). */
  readonly maxGraphs?: number;
  /** Partial graphs examined before giving up (default 50,000,000). */
  readonly maxStates?: number;
}

export interface GenerateOptions {
  /** Half-edge labels of the external legs, leg 1 first (e.g. `["phi","phi","phi","phi"]`; `psi` for a fermion entering). */
  readonly residue: readonly string[];
  readonly loops: number;
  /** Keep graphs with scaleless tadpole parts, which vanish in massless dimensional regularization (default false). */
  readonly all?: boolean;
  readonly limits?: GenerateLimits;
  readonly cancel?: CancelToken;
  /** Called as the work advances: lines drawn so far over lines to draw, summed over vertex-count vectors. */
  readonly progress?: (done: number, total: number) => void;
}

/** One generated graph, legs labelled 1..n in residue order. */
export interface GeneratedGraph {
  /** Canonical notation with labelled legs (the theory's default field omitted). */
  readonly notation: string;
  /** The canonical graph (vertices 1…V in canonical order, fields written out). */
  readonly graph: Graph;
  /** Feynman symmetry factor S with legs fixed; the graph carries 1/S. */
  readonly symmetryFactor: bigint;
  /** Has a scaleless tadpole part (only with `all`; otherwise such graphs are not generated). */
  readonly vanishes: boolean;
  /** How many vertices of each theory vertex type (index into `theory.vertices`). */
  readonly vertexCounts: readonly number[];
}

export interface GenerationResult {
  readonly graphs: readonly GeneratedGraph[];
  /** Σ 1/S over the graphs. */
  readonly weight: Rational;
  /** Partial graphs examined (a measure of the work). */
  readonly states: number;
}

/**
 * Picks the vertex to complete next: the one with the fewest free half-edges (fewest fills),
 * then the most half-edges already on lines (so the graph grows from what exists and closed
 * parts show early), then the lowest index. Any choice would be correct (see below).
 */
function chooseVertex(ctx: GenerationContext, s: PartialState): number {
  const nl = ctx.labels.length;
  let best = -1;
  let bestLines = -1;
  let bestFree = Infinity;
  for (let v = 0; v < s.V; v++) {
    const f = freeAt(s, v, nl);
    if (f === 0) continue;
    // Half-edges already used by lines (self-loops count twice).
    let lines = ctx.types[s.type[v]!]!.valence - f;
    for (let l = 0; l < nl; l++) lines -= s.legs[v * nl + l]!;
    if (f < bestFree || (f === bestFree && lines > bestLines)) {
      best = v;
      bestLines = lines;
      bestFree = f;
    }
  }
  return best;
}

/**
 * Every 1PI graph of a theory with the given external legs (labelled 1..n) and loop number,
 * once per isomorphism class, with its symmetry factor.
 *
 * Method (vertex-by-vertex completion with isomorphism merging). For each vector of vertex
 * counts allowed by the legs and Euler's relation, start from the states with all vertices
 * present and the legs (unlabelled) distributed over them, no lines. A step takes a state,
 * picks one vertex with free half-edges and produces every way to use them all up with
 * lines to vertices that still have free half-edges. States are merged by their canonical
 * form, in which each vertex's colour records its type, legs and free half-edges per label;
 * they are processed in order of the number of lines drawn (each step draws at least one),
 * so every state is expanded once.
 *
 * Why every graph G is reached: call a state *compatible* with G when it is isomorphic, free
 * half-edges included, to G with only the lines at some set C of vertices drawn. The
 * leg-distribution state of G is compatible (C = ∅), and merging replaces a state by an
 * isomorphic one, which is compatible too. In a compatible state any vertex with free
 * half-edges corresponds to a vertex u of G outside C; G's lines at u that are not drawn
 * join vertices outside C, which still have free half-edges, so one of the fills of that
 * vertex draws exactly them and gives a compatible state with C ∪ {u}. Completeness follows
 * by induction; the pruning (state-viability.ts) only removes states none of whose
 * completions is connected, 1PI (and free of scaleless parts, unless `all`). Why only once:
 * complete states are distinct up to isomorphism with legs unlabelled, and their labelled
 * versions are one per orbit of the automorphism group on leg labellings (label-legs.ts).
 */
export function generateGraphs(theory: Theory, opts: GenerateOptions): GenerationResult {
  const cancel = opts.cancel ?? neverCancel;
  if (!Number.isInteger(opts.loops) || opts.loops < 0) throw new InputError(`the loop number must be a non-negative integer, got ${opts.loops}`);
  const ctx = generationContext(theory, opts.residue);
  const all = opts.all ?? false;
  const vectors = vertexCountVectors(ctx, opts.loops);
  // Without legs every graph is scaleless as a whole (hasScalelessPart): none is kept unless `all`.
  if (ctx.legs.length === 0 && !all) return { graphs: [], weight: Rational.ZERO, states: 0 };
  const maxGraphs = opts.limits?.maxGraphs ?? 3_000_000;
  const estimate = estimateGraphCount(ctx, vectors);
  if (estimate > maxGraphs) {
    const shown = estimate < 1e15 ? String(Math.round(estimate)) : estimate.toExponential(2);
    throw new LimitError(`generating ${opts.loops}-loop graphs with legs ${opts.residue.join(',') || '(none)'} in theory ${theory.name}: about ${shown} graphs expected`, 'maxGraphs', maxGraphs, shown, 'ask for fewer loops, or raise the limit (--max-graphs) if the machine can take it');
  }
  const maxStates = opts.limits?.maxStates ?? 50_000_000;
  const colours = new ColourTable();
  const canon = new LabelledCanonicalizer(ctx, theory.defaultField);
  const graphs: GeneratedGraph[] = [];
  let states = 0;
  const totalLevels = vectors.reduce((t, c) => t + linesOf(ctx, c) + 1, 0);
  let levelsDone = 0;
  for (const counts of vectors) {
    const E = linesOf(ctx, counts);
    const buckets: Map<string, { s: PartialState; gens?: readonly Int32Array[] }>[] = Array.from({ length: E + 1 }, () => new Map());
    for (const s0 of initialStates(ctx, counts)) {
      if (!isViable(ctx, s0, !all)) continue;
      const c = stateCanon(ctx, s0, colours, { cancel });
      if (!buckets[0]!.has(c.key)) buckets[0]!.set(c.key, E === 0 ? { s: s0, gens: c.search.generators } : { s: s0 });
    }
    for (let e = 0; e < E; e++) {
      for (const { s } of buckets[e]!.values()) {
        if (++states > maxStates) throw new LimitError('graph generation: partial graphs examined', 'maxStates', maxStates, states, 'ask for fewer loops, or raise maxStates');
        if ((states & 255) === 0) cancel.throwIfCancelled();
        const v = chooseVertex(ctx, s);
        for (const child of fillVertex(ctx, s, v, !all)) {
          if (!isViable(ctx, child, !all)) continue;
          const c = stateCanon(ctx, child, colours, { cancel });
          const bucket = buckets[child.lines]!;
          if (!bucket.has(c.key)) bucket.set(c.key, child.lines === E ? { s: child, gens: c.search.generators } : { s: child });
        }
      }
      buckets[e]!.clear();
      opts.progress?.(++levelsDone, totalLevels);
    }
    for (const { s, gens } of buckets[E]!.values()) {
      cancel.throwIfCancelled();
      const edges = stateEdges(ctx, s);
      const lineFactor = edgeFactor(ctx, s);
      const labellings = legLabellings(ctx, s, gens!);
      // Whether a part is scaleless depends only on which vertices carry legs.
      const vanishes = all && hasScalelessPart(stateGraph(ctx, s, edges, labellings[0]!.vertexOfLeg));
      const vertexCounts = theoryCounts(ctx, counts);
      for (const { vertexOfLeg } of labellings) {
        // S = |vertex automorphisms fixing the legs| × permutations of parallel lines and self-loop flips.
        const cf = canon.canonical(s, edges, vertexOfLeg, { cancel });
        graphs.push({ notation: cf.notation, graph: cf.graph, symmetryFactor: cf.groupOrder * lineFactor, vanishes, vertexCounts });
      }
    }
    opts.progress?.(++levelsDone, totalLevels);
  }
  graphs.sort((x, y) => compareCounts(x.vertexCounts, y.vertexCounts) || (x.notation < y.notation ? -1 : x.notation > y.notation ? 1 : 0));
  let weight = Rational.ZERO;
  for (const g of graphs) weight = weight.add(Rational.of(1n, g.symmetryFactor));
  return { graphs, weight, states };
}

function linesOf(ctx: GenerationContext, counts: readonly number[]): number {
  let h = -ctx.legs.length;
  ctx.types.forEach((t, i) => (h += counts[i]! * t.valence));
  return h / 2;
}

function theoryCounts(ctx: GenerationContext, counts: readonly number[]): number[] {
  const out = new Array<number>(ctx.theory.vertices.length).fill(0);
  ctx.types.forEach((t, i) => (out[t.index] = counts[i]!));
  return out;
}

function compareCounts(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return 0;
}
