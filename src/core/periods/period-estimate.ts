import { InputError, LimitError } from '../errors.ts';
import { neverCancel, type CancelToken } from '../util/cancel.ts';
import type { PeriodGraph } from './period-graph.ts';
import { defaultPeriodLimits, type PeriodLimits } from './period-limits.ts';
import { buildSectorTables, type SectorTables } from './sector-tables.ts';
import { TropicalSampler, type BlockResult } from './tropical-sampler.ts';

/** Samples per block. Fixed: changing it changes every seeded result. */
export const PERIOD_BLOCK_SIZE = 4096;

/** What a Monte Carlo run needs, as plain data (typed arrays included) for worker threads. */
export interface PeriodPlan {
  readonly graph: PeriodGraph;
  readonly tables: SectorTables;
}

/** A Monte Carlo period: the mean, its standard error (1σ), the sample count and the Hepp bound. */
export interface PeriodEstimate {
  readonly value: number;
  readonly error: number;
  readonly samples: number;
  readonly heppBound: number;
}

export interface PeriodRunOptions {
  readonly samples: number;
  readonly seed: number;
  readonly limits?: Partial<PeriodLimits>;
  readonly cancel?: CancelToken;
  /** Called after each block with the estimate so far. */
  readonly onProgress?: (done: number, total: number) => void;
}

export function preparePeriod(g: PeriodGraph, opts: { limits?: Partial<PeriodLimits>; cancel?: CancelToken } = {}): PeriodPlan {
  return { graph: g, tables: buildSectorTables(g, opts) };
}

/** Refuses absurd sample counts and seeds up front. */
export function checkSampleRequest(samples: number, seed: number, limits: Partial<PeriodLimits> = {}): void {
  const max = limits.maxSamples ?? defaultPeriodLimits.maxSamples;
  if (!Number.isSafeInteger(samples) || samples < 1) throw new InputError(`the number of samples must be a positive integer, got ${samples}`);
  if (samples > max) throw new LimitError('Monte Carlo samples', 'maxSamples', max, samples, `raise it with --max-samples ${samples} if you mean it (each sample costs about 1–10 µs per core)`);
  if (!Number.isSafeInteger(seed) || seed < 0) throw new InputError(`the seed must be a non-negative integer below 2^53, got ${seed}`);
}

/** The blocks of a run: block k has PERIOD_BLOCK_SIZE samples except perhaps the last. */
export function blockSizes(samples: number): number[] {
  const out: number[] = [];
  for (let done = 0; done < samples; done += PERIOD_BLOCK_SIZE) out.push(Math.min(PERIOD_BLOCK_SIZE, samples - done));
  return out;
}

/**
 * Combines block results in block order (so the floating-point sums, and the value, do not
 * depend on which thread computed which block): mean·H and the standard error √(var/n)·H.
 */
export function combineBlocks(results: readonly BlockResult[], heppBound: number): PeriodEstimate {
  const sorted = [...results].sort((a, b) => a.block - b.block);
  let n = 0;
  let sum = 0;
  let sumSquares = 0;
  for (const r of sorted) {
    n += r.count;
    sum += r.sum;
    sumSquares += r.sumSquares;
  }
  if (n === 0) return { value: Number.NaN, error: Number.NaN, samples: 0, heppBound };
  const mean = sum / n;
  const variance = n > 1 ? Math.max(0, (sumSquares - n * mean * mean) / (n - 1)) : Number.NaN;
  return { value: mean * heppBound, error: Math.sqrt(variance / n) * heppBound, samples: n, heppBound };
}

/** Runs every block in this thread, in order. The CLI spreads the same blocks over workers. */
export function estimatePeriod(plan: PeriodPlan, opts: PeriodRunOptions): PeriodEstimate {
  checkSampleRequest(opts.samples, opts.seed, opts.limits);
  const cancel = opts.cancel ?? neverCancel;
  const sampler = new TropicalSampler(plan.graph, plan.tables);
  const sizes = blockSizes(opts.samples);
  const results: BlockResult[] = [];
  sizes.forEach((count, k) => {
    cancel.throwIfCancelled();
    results.push(sampler.sampleBlock(opts.seed, k, count));
    opts.onProgress?.(k + 1, sizes.length);
  });
  return combineBlocks(results, plan.tables.heppBound);
}
