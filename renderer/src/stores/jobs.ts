/**
 * Background jobs (one typed contract, src/core/project/jobs.ts). The runner is a Web Worker
 * in the browser and the app, the in-process runner where there is no Worker (component
 * tests). Results are frozen and kept out of Vue's deep reactivity.
 */
import { defineStore } from 'pinia';
import { markRaw, ref, shallowRef } from 'vue';
import { decodeTagged, encodeTagged, runJob, type JobOutcome, type JobProgress, type JobRequest, type JobRunner } from '../../../src/core/project/index.ts';

export type JobStatus = 'idle' | 'running' | 'done' | 'failed' | 'cancelled';

/** Runs jobs in the current thread (tests, or where Worker is missing). */
export function inProcessRunner(): JobRunner {
  return {
    async run(req, onProgress) {
      return runJob(req, onProgress ? { progress: onProgress } : {});
    },
    cancel() {},
  };
}

let makeRunner: () => JobRunner = inProcessRunner;
/** Chooses how jobs run (the worker runner in the app; call before the store is first used). */
export function setJobRunnerFactory(f: () => JobRunner): void {
  makeRunner = f;
}
/** A runner of its own (each store that runs jobs concurrently with others takes one). */
export function createJobRunner(): JobRunner {
  return makeRunner();
}

export const useJobsStore = defineStore('jobs', () => {
  const status = ref<JobStatus>('idle');
  const progress = ref<JobProgress | null>(null);
  const outcome = shallowRef<JobOutcome | null>(null);
  /** Key of the request the current outcome answers (e.g. theory + notation). */
  const key = ref<string | null>(null);
  const runner = makeRunner();
  let ticket = 0;

  async function run(req: JobRequest, requestKey: string): Promise<JobOutcome | null> {
    if (status.value === 'running') runner.cancel();
    const mine = ++ticket;
    status.value = 'running';
    progress.value = null;
    key.value = requestKey;
    // Through the tagged codec: no reactive proxies or raw BigInts cross the worker boundary.
    const plain = decodeTagged(encodeTagged(req)) as JobRequest;
    try {
      const out = await runner.run(plain, (p) => {
        if (mine === ticket) progress.value = p;
      });
      if (mine !== ticket) return null;
      outcome.value = markRaw(Object.freeze(out));
      status.value = out.ok ? 'done' : 'failed';
      return out;
    } catch (e) {
      if (mine !== ticket) return null;
      const failed: JobOutcome = { ok: false, error: { name: 'JobError', message: String((e as Error)?.message ?? e) } };
      outcome.value = markRaw(failed);
      status.value = (e as Error)?.name === 'CancelledError' ? 'cancelled' : 'failed';
      return null;
    }
  }

  function cancel(): void {
    if (status.value !== 'running') return;
    ticket++;
    runner.cancel();
    status.value = 'cancelled';
    progress.value = null;
  }

  function clear(): void {
    ticket++;
    status.value = 'idle';
    outcome.value = null;
    key.value = null;
  }

  return { status, progress, outcome, key, run, cancel, clear };
});
