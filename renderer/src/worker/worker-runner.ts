/** A JobRunner on a module Web Worker through Comlink; cancelling terminates the worker (the fallback of DESIGN §1). */
import { proxy, wrap, type Remote } from 'comlink';
import { CancelledError } from '../../../src/core/errors.ts';
import type { JobRunner } from '../../../src/core/project/jobs.ts';
import type { EngineWorkerApi } from './engine.worker.ts';

export function workerRunner(): JobRunner {
  let worker: Worker | null = null;
  let remote: Remote<EngineWorkerApi> | null = null;
  let rejectCurrent: ((e: Error) => void) | null = null;
  const ensure = () => {
    if (!remote) {
      worker = new Worker(new URL('./engine.worker.ts', import.meta.url), { type: 'module', name: 'coppice-engine' });
      remote = wrap<EngineWorkerApi>(worker);
    }
    return remote;
  };
  return {
    run(req, onProgress) {
      const r = ensure();
      return new Promise((resolve, reject) => {
        rejectCurrent = reject;
        r.run(req, onProgress ? proxy(onProgress) : undefined).then(resolve, reject).finally(() => {
          rejectCurrent = null;
        });
      });
    },
    cancel() {
      worker?.terminate();
      worker = null;
      remote = null;
      rejectCurrent?.(new CancelledError('the background job'));
      rejectCurrent = null;
    },
  };
}
