/** Running the built `coppice` binary in a child process (`node scripts/build-cli.mjs` first). */
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';

export const BUNDLE = 'dist/cli/coppice.mjs';
export const built = existsSync(BUNDLE);

export interface BinResult {
  code: number | null;
  signal: NodeJS.Signals | null;
  out: string;
  err: string;
  /** Milliseconds from spawn (or from the interrupt, when one was sent) to exit. */
  ms: number;
}

/**
 * Runs `node --max-old-space-size=<heapMb> bin/coppice.mjs ...argv`; when `interruptAfterMs`
 * is given, sends SIGINT that long after the start. Kills the child after `timeoutMs`.
 */
export function runBin(argv: readonly string[], opts: { heapMb?: number; interruptAfterMs?: number; timeoutMs?: number } = {}): Promise<BinResult> {
  const child = spawn(process.execPath, [`--max-old-space-size=${opts.heapMb ?? 256}`, 'bin/coppice.mjs', ...argv], { stdio: ['ignore', 'pipe', 'pipe'] });
  let out = '';
  let err = '';
  child.stdout.on('data', (d: Buffer) => (out += d.toString()));
  child.stderr.on('data', (d: Buffer) => (err += d.toString()));
  let t0 = performance.now();
  const timers: NodeJS.Timeout[] = [];
  if (opts.interruptAfterMs !== undefined) {
    timers.push(setTimeout(() => {
      t0 = performance.now();
      child.kill('SIGINT');
    }, opts.interruptAfterMs));
  }
  timers.push(setTimeout(() => child.kill('SIGKILL'), opts.timeoutMs ?? 30_000));
  return new Promise((resolve) => {
    child.on('exit', (code, signal) => {
      for (const t of timers) clearTimeout(t);
      const ms = performance.now() - t0;
      // Let the pipes drain.
      setTimeout(() => resolve({ code, signal, out, err, ms }), 20);
    });
  });
}

/** A 4-regular circulant C_n(1,2): a vacuum φ⁴ graph with n vertices, 2n lines, n+1 loops. */
export function circulant(n: number): string {
  const edges: string[] = [];
  for (let i = 0; i < n; i++) edges.push(`v${i}-v${(i + 1) % n}`, `v${i}-v${(i + 2) % n}`);
  return `${edges.join(' ')} /`;
}
