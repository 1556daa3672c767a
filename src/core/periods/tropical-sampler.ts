import { blockGenerator, type Xoshiro128 } from './block-random.ts';
import type { PeriodGraph } from './period-graph.ts';
import { SectorDeterminant } from './sector-determinant.ts';
import type { SectorTables } from './sector-tables.ts';

/** Sums over one block of samples of x = (ψ_tr/ψ)^h, whose mean times the Hepp bound is the period. */
export interface BlockResult {
  readonly block: number;
  readonly count: number;
  readonly sum: number;
  readonly sumSquares: number;
}

/**
 * Tropical importance sampling ("Tropical Monte Carlo quadrature for Feynman integrals",
 * Borinsky, arXiv:2008.12310), specialised to the period ∫Ω/ψ^h of a primitive graph:
 *
 * 1. Draw a Hepp sector with probability ∝ its tropical integral, largest edge first: from the
 *    current subset γ (starting with all edges) remove edge e with probability
 *    J(γ∖e)/(sdc(γ∖e)·J(γ)) — `SectorTables.weight` — until one edge is left.
 * 2. In the chart α_max = 1, α_{σk} = t_2⋯t_k, draw t_j with density sdc(γ_j)·t^{sdc(γ_j)−1},
 *    i.e. log t_j = log(U)/sdc(γ_j). The point α then has density (Ω/ψ_tr^h)/H.
 * 3. Weight by the true integrand: x = (ψ_tr/ψ)^h, so E[x]·H = ∫Ω/ψ^h = P. Since
 *    ψ_tr ≤ ψ ≤ (#spanning trees)·ψ_tr the weight lies in (0, 1]: the variance is finite.
 *
 * The edges kept while removing (no loop lost) form the minimum spanning tree that attains
 * ψ_tr, which `SectorDeterminant` uses to get ψ/ψ_tr stably.
 */
export class TropicalSampler {
  private readonly g: PeriodGraph;
  private readonly t: SectorTables;
  private readonly det: SectorDeterminant;
  private readonly isTree: Uint8Array;
  private readonly logAlpha: Float64Array;
  private readonly sqrtAlpha: Float64Array;

  constructor(g: PeriodGraph, t: SectorTables) {
    this.g = g;
    this.t = t;
    this.det = new SectorDeterminant(g);
    this.isTree = new Uint8Array(g.edgeCount);
    this.logAlpha = new Float64Array(g.edgeCount);
    this.sqrtAlpha = new Float64Array(g.edgeCount);
  }

  /** Draws `count` samples of block `block` for `seed` (same inputs, same sums, on any thread). */
  sampleBlock(seed: number, block: number, count: number): BlockResult {
    const rng = blockGenerator(seed, block);
    let sum = 0;
    let sumSquares = 0;
    for (let i = 0; i < count; i++) {
      const x = this.sample(rng);
      sum += x;
      sumSquares += x * x;
    }
    return { block, count, sum, sumSquares };
  }

  /** One weight x = (ψ_tr/ψ)^h at a point drawn from the tropical density. */
  sample(rng: Xoshiro128): number {
    const { isTree, logAlpha, sqrtAlpha } = this;
    const { loops, weight } = this.t;
    const h = this.t.halfDimension;
    const N = this.g.edgeCount;
    let gamma = (1 << N) - 1;
    let size = N;
    let logA = 0;
    while (size > 1) {
      // J(γ) = weight(γ)·sdc(γ) for a proper subset; the Hepp bound itself at the full set.
      const total = size === N ? weight[gamma]! : weight[gamma]! * (size - h * loops[gamma]!);
      const u = rng.uniform() * total;
      let acc = 0;
      let bit = 0;
      for (let m = gamma; m; m &= m - 1) {
        bit = m & -m;
        acc += weight[gamma ^ bit]!;
        if (acc > u) break;
      }
      const e = 31 - Math.clz32(bit);
      const next = gamma ^ bit;
      logAlpha[e] = logA;
      isTree[e] = loops[gamma] === loops[next] ? 1 : 0;
      size--;
      logA += Math.log(rng.uniform()) / (size - h * loops[next]!);
      gamma = next;
    }
    const last = 31 - Math.clz32(gamma);
    logAlpha[last] = logA;
    isTree[last] = loops[gamma] === 0 ? 1 : 0;
    for (let e = 0; e < N; e++) sqrtAlpha[e] = Math.exp(0.5 * logAlpha[e]!);
    const r = this.det.ratio(isTree, sqrtAlpha);
    return h === 2 ? 1 / (r * r) : r ** -h;
  }
}

/** Convenience: one block without keeping a sampler around. */
export function sampleBlock(g: PeriodGraph, t: SectorTables, seed: number, block: number, count: number): BlockResult {
  return new TropicalSampler(g, t).sampleBlock(seed, block, count);
}
