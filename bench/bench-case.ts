/** One benchmark: a fixed piece of work, timed by scripts/bench.mjs against bench/baseline.json. */
export interface BenchCase {
  name: string;
  run: () => void;
  /** Runs per measurement (default: as many as fit in ~300 ms). */
  iterations?: number;
  /** The target for one run, in milliseconds, when it states one. */
  targetMs?: number;
  /** Items one run handles; times are reported per item (e.g. per graph). */
  perRun?: number;
  /** Minutes rather than seconds: run only with `npm run bench -- --heavy`. */
  heavy?: boolean;
}
