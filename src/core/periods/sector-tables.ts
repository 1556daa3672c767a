import { InputError, LimitError } from '../errors.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import type { PeriodGraph } from './period-graph.ts';
import { defaultPeriodLimits, MAX_PERIOD_EDGES_HARD, type PeriodLimits } from './period-limits.ts';

/**
 * Per-subset tables of the tropical sampler and the Hepp bound (floating point).
 *
 * For an edge subset γ let sdc(γ) = |γ| − h·L(γ) (superficial degree of convergence). In the
 * Hepp sector α_{σ1} > α_{σ2} > … > α_{σN}, with γ_j = {σ_j, …, σ_N} (the N−j+1 smallest
 * edges), the tropical integral of Ω/ψ_tr^h is Π_{j=2..N} 1/sdc(γ_j) (substitute
 * α_{σk} = t_2⋯t_k; the exponent of t_j is sdc(γ_j) − 1). Summing over sectors by removing the
 * largest edge first gives the recursion of "Tropical Monte Carlo quadrature for Feynman
 * integrals" (Borinsky, arXiv:2008.12310) and "Hepp's bound for Feynman graphs and matroids"
 * (Panzer, arXiv:1908.09820):
 *
 *     J({e}) = 1,   J(γ) = Σ_{e∈γ} J(γ∖e)/sdc(γ∖e),   Hepp bound H = J(E).
 *
 * Finite exactly when every proper non-empty subset has sdc > 0 (no subdivergence) — checked
 * here — and the integral is projective when sdc(E) = 0 (log divergence).
 */
export interface SectorTables {
  readonly edgeCount: number;
  readonly halfDimension: number;
  /** L(γ) for every subset mask γ. */
  readonly loops: Uint8Array;
  /** J(γ)/sdc(γ) for every proper non-empty γ; the Hepp bound J(E) at the full mask. */
  readonly weight: Float64Array;
  /** The Hepp bound, as a float. */
  readonly heppBound: number;
}

export interface SectorTableOptions {
  readonly limits?: Partial<PeriodLimits>;
  readonly cancel?: CancelToken;
}

export function buildSectorTables(g: PeriodGraph, opts: SectorTableOptions = {}): SectorTables {
  const limits = { ...defaultPeriodLimits, ...opts.limits };
  const cancel = opts.cancel ?? neverCancel;
  const N = g.edgeCount;
  const h = g.halfDimension;
  const maxEdges = Math.min(limits.maxEdges, MAX_PERIOD_EDGES_HARD);
  if (N > maxEdges) {
    throw new LimitError('building the Hepp-sector tables (2^edges entries)', 'maxEdges', maxEdges, `${N} edges`,
      N > MAX_PERIOD_EDGES_HARD ? `at most ${MAX_PERIOD_EDGES_HARD} edges are supported` : `raise it with --max-edges ${N} (memory grows as 2^edges · 9 bytes per worker)`);
  }
  if (N === 0) throw new InputError('the graph has no edges, so it has no period', undefined, 'give a graph with loops');
  if (h * g.loops !== N) {
    throw new InputError(`the graph is not logarithmically divergent: it has ${N} edges but ${h}·L = ${h * g.loops}`, undefined,
      'a period needs exactly h·L edges (2L in four dimensions)');
  }
  const size = 1 << N;
  const full = size - 1;
  const loops = new Uint8Array(size);
  const weight = new Float64Array(size);
  const ends = g.ends;
  const parent = new Int32Array(g.vertexCount);
  const find = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]!]!;
    return x;
  };
  for (let mask = 1; mask < size; mask++) {
    if ((mask & 0xffff) === 0) cancel.throwIfCancelled();
    // L(mask) = L(rest) + 1 exactly when the lowest edge closes a cycle in the rest.
    const low = 31 - Math.clz32(mask & -mask);
    const rest = mask & (mask - 1);
    for (let v = 0; v < g.vertexCount; v++) parent[v] = v;
    for (let m = rest; m; m &= m - 1) {
      const e = 31 - Math.clz32(m & -m);
      const ra = find(ends[2 * e]!);
      const rb = find(ends[2 * e + 1]!);
      if (ra !== rb) parent[ra] = rb;
    }
    const closes = find(ends[2 * low]!) === find(ends[2 * low + 1]!);
    loops[mask] = loops[rest]! + (closes ? 1 : 0);
    let pop = 0;
    let j = 0;
    for (let m = mask; m; m &= m - 1) {
      pop++;
      const bit = m & -m;
      if (mask !== bit) j += weight[mask ^ bit]!;
    }
    if (pop === 1) j = 1;
    const sdc = pop - h * loops[mask]!;
    if (mask === full) {
      weight[mask] = j;
    } else {
      if (sdc <= 0) throw subdivergence(mask, sdc);
      weight[mask] = j / sdc;
    }
  }
  return { edgeCount: N, halfDimension: h, loops, weight, heppBound: weight[full]! };
}

function subdivergence(mask: number, sdc: number): InputError {
  const lines: number[] = [];
  for (let e = 0; e < 32; e++) if ((mask >>> e) & 1) lines.push(e + 1);
  return new InputError(`the graph has a divergent subgraph (lines ${lines.join(',')}, degree of convergence ${sdc}), so it is not primitive and ∫Ω/ψ^h diverges`,
    undefined, 'periods are defined for primitive graphs only');
}

/** Number of set bits of a subset mask. @internal */
export function popcount(m: number): number {
  m = m - ((m >>> 1) & 0x55555555);
  m = (m & 0x33333333) + ((m >>> 2) & 0x33333333);
  return (Math.imul((m + (m >>> 4)) & 0x0f0f0f0f, 0x01010101) >>> 24);
}
