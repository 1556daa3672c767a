// The engine's Web Worker: runs jobs of the one typed contract off the UI thread.
import { expose } from 'comlink';
import { runJob, type JobOutcome, type JobProgress, type JobRequest } from '../../../src/core/project/jobs.ts';

const api = {
  run(req: JobRequest, onProgress?: (p: JobProgress) => void): JobOutcome {
    return runJob(req, onProgress ? { progress: (p) => void onProgress(p) } : {});
  },
};
export type EngineWorkerApi = typeof api;
expose(api);
