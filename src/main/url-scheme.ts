/** Graph links (`coppice://graph?notation=…`): found on the command line (Windows, Linux) or in open-url events (macOS). */
import { LINK_SCHEME, parseGraphLink, type GraphLink } from '../core/project/ipc-contract.ts';

export function linksFromArgv(argv: readonly string[]): GraphLink[] {
  return argv.filter((a) => a.toLowerCase().startsWith(`${LINK_SCHEME}://`)).map(parseGraphLink).filter((l): l is GraphLink => l !== null);
}

/** The value of `--project <path>` (or `--project=<path>`) on the command line. */
export function projectFromArgv(argv: readonly string[]): string | null {
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a === '--project' && argv[i + 1]) return argv[i + 1]!;
    if (a.startsWith('--project=')) return a.slice('--project='.length);
  }
  const file = argv.slice(1).find((a) => a.endsWith('.coppice.json'));
  return file ?? null;
}
