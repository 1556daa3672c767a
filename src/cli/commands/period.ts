import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { CancelledError, InputError } from '../../core/errors.ts';
import { printNotation } from '../../core/graph/notation-print.ts';
import { formatRational, heppBoundExact, rationalToNumber } from '../../core/periods/hepp-bound-exact.ts';
import { blockSizes, checkSampleRequest, combineBlocks, preparePeriod, type PeriodEstimate, type PeriodPlan } from '../../core/periods/period-estimate.ts';
import { PeriodGraphError, periodInput } from '../../core/periods/period-input.ts';
import { defaultPeriodLimits, type PeriodLimits } from '../../core/periods/period-limits.ts';
import { periodCounterterm } from '../../core/periods/period-counterterm.ts';
import { TropicalSampler, type BlockResult } from '../../core/periods/tropical-sampler.ts';
import type { CancelToken } from '../../core/util/cancel.ts';
import { flag, hasFlag, intFlag, type ParsedArgs } from '../args.ts';
import { EXIT, type CliIO, type Command } from '../command.ts';
import { readGraph, resolveTheory } from '../inputs.ts';
import type { BlockRequest, PeriodWorkerData } from '../period-worker.ts';

const usage = `coppice period --theory phi4 --graph "<notation>" [--samples n] [--seed s] [--workers w] [--json]

The period P = ∫Ω/ψ² of a primitive logarithmically divergent graph, by tropical importance
sampling (Borinsky, arXiv:2008.12310), with its statistical error, the Hepp bound, and the
MS-bar counterterm −P/(Lε). The graph is a four-point primitive graph, or a completed
(vacuum, 4-regular) graph, from which one vertex is removed.

  --theory         built-in theory (phi4) or a theory file
  --graph          the graph in compact notation, e.g. "1-2 1-3 1-4 2-3 2-4 3-4 / 1 2 3 4"; @file reads a file
  --samples        Monte Carlo samples (default 1000000; 1e6 notation accepted)
  --seed           seed (default 1): the same seed gives the same value for any number of workers
  --workers        worker threads (default: all cores)
  --remove-vertex  completed graph: the vertex to remove (default the first); the period does not depend on it
  --json           machine-readable output on stdout
  --quiet          no progress lines on stderr
  --max-samples, --max-edges, --max-exact-hepp-edges   raise the work limits
`;

export const periodCommand: Command = {
  name: 'period',
  summary: 'numerical period of a primitive graph (tropical Monte Carlo), Hepp bound, counterterm',
  usage,
  flags: {
    booleans: ['json', 'quiet'],
    values: ['theory', 'graph', 'samples', 'seed', 'workers', 'remove-vertex', 'max-samples', 'max-edges', 'max-exact-hepp-edges', 'max-vertex-subsets'],
  },
  async run(args, io) {
    const limits: PeriodLimits = {
      maxSamples: countFlag(args, 'max-samples', defaultPeriodLimits.maxSamples),
      maxEdges: intFlag(args, 'max-edges', defaultPeriodLimits.maxEdges),
      maxExactHeppEdges: intFlag(args, 'max-exact-hepp-edges', defaultPeriodLimits.maxExactHeppEdges),
    };
    const samples = countFlag(args, 'samples', 1_000_000);
    const seed = intFlag(args, 'seed', 1);
    checkSampleRequest(samples, seed, limits);
    const workers = args.flags.has('workers') ? intFlag(args, 'workers', 1) : availableParallelism();
    if (workers < 1) throw new InputError('--workers must be at least 1');
    const theory = resolveTheory(flag(args, 'theory'), io);
    const graph = readGraph(flag(args, 'graph'), io);
    const removeVertex = flag(args, 'remove-vertex');
    let input;
    try {
      input = periodInput(graph, theory, {
        ...(removeVertex !== undefined ? { removeVertex } : {}),
        ...(args.flags.has('max-vertex-subsets') ? { subgraphLimits: { maxVertexSubsets: intFlag(args, 'max-vertex-subsets', 0) } } : {}),
        cancel: io.cancel,
      });
    } catch (e) {
      throw e instanceof PeriodGraphError ? new InputError(e.message, undefined, refusalHint(e)) : e;
    }
    const plan = preparePeriod(input.periodGraph, { limits, cancel: io.cancel });
    const started = Date.now();
    const progress = hasFlag(args, 'quiet') ? undefined : progressPrinter(io, samples, plan.tables.heppBound, started);
    const results = await runBlocks(plan, seed, samples, workers, io.cancel, progress);
    const estimate = combineBlocks(results, plan.tables.heppBound);
    const seconds = (Date.now() - started) / 1000;
    const exact = plan.graph.edgeCount <= limits.maxExactHeppEdges ? heppBoundExact(plan.tables, { limits, cancel: io.cancel }) : undefined;
    const hepp = exact ? { text: formatRational(exact), value: rationalToNumber(exact) } : { text: undefined, value: plan.tables.heppBound };
    const L = plan.graph.loops;
    const used = Math.min(workers, blockSizes(samples).length);
    const counterterm = periodCounterterm(estimate, L);
    if (hasFlag(args, 'json')) {
      io.out(JSON.stringify({
        value: estimate.value, error: estimate.error, samples: estimate.samples,
        heppBound: hepp.text ?? hepp.value, heppBoundApprox: hepp.value,
        counterterm, loops: L, seed, removedVertex: input.removedVertex,
      }) + '\n');
      return EXIT.ok;
    }
    const lines = [
      `graph        ${printNotation(input.bound.graph, { defaultField: theory.defaultField })}   [theory ${theory.name}]`,
      `             ${L} loops, ${plan.graph.edgeCount} lines, primitive, logarithmically divergent${input.removedVertex !== null ? `; completed graph with vertex "${input.removedVertex}" removed` : ''}`,
      `period       P = ${withError(estimate.value, estimate.error)}   (relative error ${(estimate.error / estimate.value).toExponential(1)}, 1σ)`,
      `samples      ${estimate.samples.toLocaleString('en-US')}, seed ${seed}, ${used} worker${used === 1 ? '' : 's'}, ${seconds.toFixed(1)} s (${formatRate(estimate.samples / Math.max(seconds, 1e-3))} samples/s)`,
      `Hepp bound   H = ${hepp.text === undefined ? hepp.value.toPrecision(10) : /^\d+$/.test(hepp.text) ? hepp.text : `${hepp.text} ≈ ${hepp.value.toPrecision(10)}`}${hepp.text === undefined ? ' (floating point)' : ' (exact)'}   P/H = ${(estimate.value / hepp.value).toPrecision(4)}`,
      `counterterm  −P/(Lε) = ${withError(counterterm['-1'].approx, counterterm['-1'].error)} /ε   (MS-bar, L = ${L})`,
      '',
      'method: tropical importance sampling, arXiv:2008.12310; error is the standard error of the mean.',
    ];
    io.out(lines.join('\n') + '\n');
    return EXIT.ok;
  },
};

function refusalHint(e: PeriodGraphError): string {
  const tools = 'list its divergent subgraphs with `coppice inspect --theory <t> --graph <g>`, and get its counterterm (forest formula) with `coppice counterterm --symbolic --theory <t> --graph <g>`';
  switch (e.reason) {
    case 'not-primitive':
      return `a period exists only for primitive graphs; ${tools}`;
    case 'not-log-divergent':
      return `a period is the residue of a logarithmically divergent graph (ω = 0; in φ⁴ a four-point graph); ${tools}`;
    case 'not-completed':
      return 'give a four-point primitive graph, or a completed one (vacuum, every vertex 4-valent)';
    default:
      return e.hint ?? tools;
  }
}

/** A count such as 1000000 or 1e6 (must be an integer). */
function countFlag(args: ParsedArgs, name: string, fallback: number): number {
  const v = flag(args, name);
  if (v === undefined) return fallback;
  if (!/^\d+(\.\d+)?(e\d+)?$/i.test(v)) throw new InputError(`--${name} must be a positive integer such as 100000 or 1e5, got "${v}"`);
  const n = Number(v);
  if (!Number.isInteger(n) || n < 1) throw new InputError(`--${name} must be a positive integer, got "${v}"`);
  return n;
}

/** Draws every block, in workers when the worker bundle is there (else in this thread), and returns them in block order. */
async function runBlocks(plan: PeriodPlan, seed: number, samples: number, workers: number, cancel: CancelToken, progress?: (r: readonly BlockResult[]) => void): Promise<BlockResult[]> {
  const sizes = blockSizes(samples);
  const workerFile = fileURLToPath(new URL('./period-worker.mjs', import.meta.url));
  const results: BlockResult[] = [];
  if (!existsSync(workerFile)) {
    // Running from the sources (tests): same blocks, same sums, one thread.
    const sampler = new TropicalSampler(plan.graph, plan.tables);
    for (let k = 0; k < sizes.length; k++) {
      await new Promise((r) => setImmediate(r));
      cancel.throwIfCancelled();
      results.push(sampler.sampleBlock(seed, k, sizes[k]!));
      progress?.(results);
    }
    return results;
  }
  const n = Math.min(workers, sizes.length);
  const pool: Worker[] = [];
  return await new Promise<BlockResult[]>((resolve, reject) => {
    let next = 0;
    let finished = false;
    const done = (err?: unknown) => {
      if (finished) return;
      finished = true;
      clearInterval(watch);
      for (const w of pool) void w.terminate();
      if (err) reject(err);
      else resolve(results.sort((a, b) => a.block - b.block));
    };
    const feed = (w: Worker) => {
      if (next < sizes.length) {
        const req: BlockRequest = { block: next, count: sizes[next]! };
        next++;
        w.postMessage(req);
      }
    };
    const watch = setInterval(() => {
      if (cancel.cancelled) done(new CancelledError('the period computation'));
    }, 50);
    const data: PeriodWorkerData = { plan, seed };
    for (let i = 0; i < n; i++) {
      const w = new Worker(workerFile, { workerData: data });
      pool.push(w);
      w.on('message', (msg: { ok: true; result: BlockResult } | { ok: false; message: string }) => {
        if (!msg.ok) return done(new Error(`period worker failed: ${msg.message}`));
        results.push(msg.result);
        if (cancel.cancelled) return done(new CancelledError('the period computation'));
        progress?.(results);
        if (results.length === sizes.length) return done();
        feed(w);
      });
      w.on('error', (e) => done(e));
      // Two requests in flight per worker, so none waits for the main thread.
      feed(w);
      feed(w);
    }
  });
}

/** Progress lines on stderr, at most every 2 s, after the first 2 s. */
function progressPrinter(io: CliIO, samples: number, hepp: number, started: number): (r: readonly BlockResult[]) => void {
  let last = started;
  return (results) => {
    const now = Date.now();
    if (now - last < 2000) return;
    last = now;
    const e: PeriodEstimate = combineBlocks(results, hepp);
    io.err(`period: ${((100 * e.samples) / samples).toFixed(0)}% (${formatRate(e.samples)} of ${formatRate(samples)} samples), P ≈ ${withError(e.value, e.error)}\n`);
  };
}

function formatRate(x: number): string {
  if (x >= 1e9) return `${(x / 1e9).toFixed(2)}G`;
  if (x >= 1e6) return `${(x / 1e6).toFixed(2)}M`;
  if (x >= 1e3) return `${(x / 1e3).toFixed(1)}k`;
  return x.toFixed(0);
}

/** "7.2123 ± 0.0065": the value to the second significant digit of its error. */
export function withError(value: number, error: number): string {
  if (!Number.isFinite(error) || error <= 0) return `${value.toPrecision(8)} ± ${error}`;
  const digits = Math.max(0, Math.min(15, 1 - Math.floor(Math.log10(error))));
  return `${value.toFixed(digits)} ± ${error.toFixed(digits)}`;
}
