/**
 * Graph links (`coppice://graph?graph=…&theory=…&name=…`): found on the command line (Windows,
 * Linux) or in open-url events (macOS). A link comes from outside the app, so its parameters
 * are validated like any input — known parameters only, each once, a built-in theory, a
 * notation that parses (and binds to the theory when one is named), bounded lengths — and a
 * link that fails is refused with a message, never opened.
 */
import { CoppiceError } from '../core/errors.ts';
import { parseNotation } from '../core/graph/notation-parse.ts';
import { LINK_SCHEME, type GraphLink } from '../core/project/ipc-contract.ts';
import { bindGraph } from '../core/theory/bind-graph.ts';
import { builtinTheory, builtinTheoryNames } from '../core/theory/builtin/index.ts';

export const MAX_LINK_LENGTH = 200_000;
export const MAX_LINK_NOTATION = 100_000;
export const MAX_LINK_NAME = 200;
const PARAMS = new Set(['graph', 'notation', 'theory', 'name']);

/** The outcome of checking one link: the link, or why it was refused. */
export type LinkCheck = { readonly link: GraphLink } | { readonly error: string };

/** Validates a `coppice://graph?…` link. */
export function checkGraphLink(url: string): LinkCheck {
  const refuse = (why: string): LinkCheck => ({ error: `refused link: ${why}` });
  if (url.length > MAX_LINK_LENGTH) return refuse(`longer than ${MAX_LINK_LENGTH} characters`);
  const m = /^coppice:\/\/\/?graph\/?\?(.*)$/is.exec(url.trim());
  if (!m) return refuse('not of the form coppice://graph?graph=…&theory=…');
  const params = new Map<string, string>();
  for (const pair of m[1]!.split('&')) {
    if (pair === '') continue;
    const eq = pair.indexOf('=');
    if (eq <= 0) return refuse(`malformed parameter ${JSON.stringify(pair.slice(0, 40))}`);
    const key = pair.slice(0, eq);
    if (!PARAMS.has(key)) return refuse(`unknown parameter ${JSON.stringify(key.slice(0, 40))} (known: graph, theory, name)`);
    if (params.has(key)) return refuse(`parameter ${key} given twice`);
    let value: string;
    try {
      value = decodeURIComponent(pair.slice(eq + 1).replace(/\+/g, ' '));
    } catch {
      return refuse(`parameter ${key} is not valid percent-encoding`);
    }
    params.set(key, value);
  }
  if (params.has('graph') && params.has('notation')) return refuse('both graph and notation given');
  const notation = (params.get('graph') ?? params.get('notation'))?.trim();
  if (!notation) return refuse('no graph given');
  if (notation.length > MAX_LINK_NOTATION) return refuse(`the graph is longer than ${MAX_LINK_NOTATION} characters`);
  const theory = params.get('theory');
  if (theory !== undefined && !builtinTheoryNames().includes(theory)) {
    return refuse(`unknown theory ${JSON.stringify(theory.slice(0, 64))} (built-in: ${builtinTheoryNames().join(', ')})`);
  }
  const name = params.get('name');
  if (name !== undefined && (name.length > MAX_LINK_NAME || /[\u0000-\u001f\u007f]/.test(name))) {
    return refuse(`the name must be at most ${MAX_LINK_NAME} characters without control characters`);
  }
  try {
    const g = parseNotation(notation, 'graph in the link');
    if (theory !== undefined) bindGraph(g, builtinTheory(theory));
  } catch (e) {
    return refuse(e instanceof CoppiceError ? e.describe() : 'the graph could not be read');
  }
  return { link: { notation, ...(theory !== undefined ? { theory } : {}), ...(name ? { name } : {}) } };
}

/** The valid graph links among the arguments; each refused one is reported through `onRefused`. */
export function linksFromArgv(argv: readonly string[], onRefused: (message: string) => void = () => {}): GraphLink[] {
  const out: GraphLink[] = [];
  for (const a of argv) {
    if (!a.toLowerCase().startsWith(`${LINK_SCHEME}://`)) continue;
    const r = checkGraphLink(a);
    if ('link' in r) out.push(r.link);
    else onRefused(r.error);
  }
  return out;
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
