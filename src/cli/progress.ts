import { isatty } from 'node:tty';
import type { CliIO } from './command.ts';

/**
 * A progress bar on stderr when stderr is a terminal (commands run in a worker thread, so the
 * file descriptor is asked, not process.stderr.isTTY); undefined otherwise, so pipes and JSON
 * output stay clean. `unit` labels the count, or shows a percentage when absent.
 */
export function terminalProgress(io: CliIO, label: string, unit?: string): ((done: number, total: number) => void) | undefined {
  if (!isatty(2)) return undefined;
  let last = 0;
  return (done, total) => {
    const now = Date.now();
    if (done < total && now - last < 100) return;
    last = now;
    const width = 30;
    const t = Math.max(1, total);
    const filled = Math.min(width, Math.round((width * done) / t));
    const count = unit ? `${done}/${total} ${unit}` : `${Math.round((100 * done) / t)}%`;
    io.err(`\r  ${label} [${'#'.repeat(filled)}${' '.repeat(width - filled)}] ${count}${done >= total ? '\r\x1b[K' : ''}`);
  };
}
