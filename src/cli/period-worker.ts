// Worker thread of `coppice period`: draws the blocks of samples the main thread asks for.
// A block's sums depend only on (seed, block index), so which worker draws it does not matter.
import { parentPort, workerData } from 'node:worker_threads';
import type { PeriodPlan } from '../core/periods/period-estimate.ts';
import { TropicalSampler } from '../core/periods/tropical-sampler.ts';

/** Main → worker: draw one block. */
export interface BlockRequest {
  readonly block: number;
  readonly count: number;
}

/** The data a worker starts with. */
export interface PeriodWorkerData {
  readonly plan: PeriodPlan;
  readonly seed: number;
}

const port = parentPort;
if (port) {
  const { plan, seed } = workerData as PeriodWorkerData;
  const sampler = new TropicalSampler(plan.graph, plan.tables);
  port.on('message', (req: BlockRequest) => {
    try {
      port.postMessage({ ok: true, result: sampler.sampleBlock(seed, req.block, req.count) });
    } catch (e) {
      port.postMessage({ ok: false, message: e instanceof Error ? e.message : String(e) });
    }
  });
}
